"""Speed of ranking and unranking paths on nodes with far more than 10^20 paths.

    uv run python bench/bench_paths.py

Targets (the issue): unranking rank 10^20 returns in well under a second once the levels are
built; rank 10^30 as quick as rank 0.  Building the levels is timed separately.
"""

from __future__ import annotations

import time

from engine.diagram import Diagram
from engine.paths import PathIndex
from engine.specs import parse_spec

CASES = [
    # (spec, level index, node)
    ("symmetric:n=7", 60, (3, 2, 1, 1)),
    ("symmetric:n=12", 80, (6, 3, 2, 1)),
    ("symmetric:n=20", 200, (8, 5, 3, 2, 1, 1)),
]


def best_of(work, repeat: int = 5) -> float:
    times = []
    for _ in range(repeat):
        start = time.perf_counter()
        work()
        times.append(time.perf_counter() - start)
    return min(times)


def main() -> None:
    for spec, index, node in CASES:
        tower = parse_spec(spec)
        diagram = Diagram(tower)
        start = time.perf_counter()
        diagram.ensure(index)
        built = time.perf_counter() - start
        paths = PathIndex(diagram)
        total = paths.total(index, node)
        print(f"{spec} level {tower.level_of(index)} {node}: about 10^{len(str(total)) - 1} paths; "
              f"levels built in {built:.3f} s")
        paths.unrank(index, node, 0)  # fill the per-node caches once (first call)
        for rank in (0, 10**20, 10**30, total - 1):
            if rank >= total:
                continue
            first = time.perf_counter()
            path = PathIndex(diagram).unrank(index, node, rank)  # cold caches
            cold = time.perf_counter() - first
            warm = best_of(lambda: paths.unrank(index, node, rank))
            back = best_of(lambda: paths.rank(path))
            assert paths.rank(path) == rank
            label = {0: "0", 10**20: "10^20", 10**30: "10^30"}.get(rank, "last")
            print(f"  unrank {label:>5}: {cold * 1e3:8.2f} ms cold, {warm * 1e3:7.3f} ms warm; rank back {back * 1e3:7.3f} ms")
        listing = best_of(lambda: [p for p, _ in zip(paths.iterate(index, node, total // 2), range(1000))], 3)
        print(f"  1,000 consecutive paths from the middle: {listing * 1e3:.1f} ms")


if __name__ == "__main__":
    main()
