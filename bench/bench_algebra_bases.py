"""Speed of the diagram bases and products against plain-Python floors (issue 10).

    uv run python bench/bench_algebra_bases.py            # 5 repeats, medians
    uv run python bench/bench_algebra_bases.py --repeat 3

Cases and floors:
- every diagram of P_5 (Bell(10) = 115,975) listed, and listed then ranked one by one with
  ``rank``; floor: a recursive set-partition generator (append to a block, recurse, pop) that
  yields the same tuples of blocks, its ranks taken from ``enumerate``;
- every diagram of B_7 (13!! = 135,135), the same way; floor: a recursive perfect-matching
  generator;
- one product of two P_6 diagrams (``compose``), the median over 20,000 random pairs; floor: the
  textbook union–find on the 3k points (union every block's points, then group by root);
- a 100-term × 100-term product in P_6 (``multiply``); floor: the same 10,000 gluings by the
  floor's union–find and a dict accumulation.
Targets (issue 10): < 1 s, < 1 s, < 20 µs, < 0.3 s.
"""

from __future__ import annotations

import argparse
import random
import statistics
import time
from fractions import Fraction

from engine.algebras.bases import count, iter_basis, rank, unrank
from engine.algebras.diagrams import compose
from engine.algebras.products import multiply
from engine.capabilities import AlgebraLevel


def level(kind: str, r: int) -> AlgebraLevel:
    return AlgebraLevel(kind, kind, r, False, 4, 4, "", "symmetric", 0, Fraction(r), 2 * r)


def floor_partitions(n: int):
    blocks: list[list[int]] = []

    def rec(v: int):
        if v == n:
            yield tuple(map(tuple, blocks))
            return
        for b in blocks:
            b.append(v)
            yield from rec(v + 1)
            b.pop()
        blocks.append([v])
        yield from rec(v + 1)
        blocks.pop()

    return rec(0)


def floor_matchings(points: list[int], prefix: tuple = ()):
    if not points:
        yield prefix
        return
    first, rest = points[0], points[1:]
    for j in range(len(rest)):
        yield from floor_matchings(rest[:j] + rest[j + 1:], prefix + ((first, rest[j]),))


def floor_compose(d1, d2, r: int):
    parent = list(range(3 * r))

    def find(a: int) -> int:
        while parent[a] != a:
            parent[a] = parent[parent[a]]
            a = parent[a]
        return a

    for d, shift in ((d1, 0), (d2, r)):
        for block in d:
            a = find(block[0] + shift)
            for v in block[1:]:
                b = find(v + shift)
                if a != b:
                    parent[b] = a
    groups: dict[int, list[int]] = {}
    for v in list(range(r)) + list(range(2 * r, 3 * r)):
        groups.setdefault(find(v), []).append(v if v < r else v - r)
    loops = len({find(v) for v in range(r, 2 * r)} - set(groups))
    return tuple(map(tuple, groups.values())), loops


def median_time(work, repeat: int) -> float:
    times = []
    for _ in range(repeat):
        start = time.perf_counter()
        work()
        times.append(time.perf_counter() - start)
    return statistics.median(times)


def report(name: str, ours: float, floor: float, target: str) -> None:
    print(f"{name:<44} ours {ours * 1e3:9.3f} ms   floor {floor * 1e3:9.3f} ms   ratio {ours / floor:5.2f}   "
          f"target {target}")


def main() -> None:
    parser = argparse.ArgumentParser()
    parser.add_argument("--repeat", type=int, default=5)
    repeat = parser.parse_args().repeat

    for lev, floor_gen in ((level("partition", 5), lambda: floor_partitions(10)),
                           (level("brauer", 7), lambda: floor_matchings(list(range(14))))):
        total = count(lev)
        assert sum(1 for _ in floor_gen()) == total
        listed = median_time(lambda: sum(1 for _ in iter_basis(lev)), repeat)

        def list_and_rank():
            for i, d in enumerate(iter_basis(lev)):
                if rank(lev, d, check=False) != i:
                    raise AssertionError(i)

        ranked = median_time(list_and_rank, repeat)
        floor = median_time(lambda: sum(1 for _ in enumerate(floor_gen())), repeat)
        report(f"{lev.kind} k={lev.vertices}: list {total:,}", listed, floor, "-")
        report(f"{lev.kind} k={lev.vertices}: list and rank {total:,}", ranked, floor, "< 1 s")

    lev = level("partition", 6)
    rng = random.Random(6)
    pairs = [(unrank(lev, rng.randrange(count(lev))), unrank(lev, rng.randrange(count(lev)))) for _ in range(20000)]
    for d1, d2 in pairs[:200]:
        assert floor_compose(d1, d2, 6) == compose(d1, d2, 6)
    ours = median_time(lambda: [compose(a, b, 6) for a, b in pairs], repeat) / len(pairs)
    floor = median_time(lambda: [floor_compose(a, b, 6) for a, b in pairs], repeat) / len(pairs)
    report("one P_6 product (per pair)", ours, floor, "< 0.020 ms")

    e1 = {unrank(lev, rng.randrange(count(lev))): rng.randint(-9, 9) or 1 for _ in range(100)}
    e2 = {unrank(lev, rng.randrange(count(lev))): rng.randint(-9, 9) or 1 for _ in range(100)}

    def floor_product():
        out: dict = {}
        for a, c1 in e1.items():
            for b, c2 in e2.items():
                d, loops = floor_compose(a, b, 6)
                out[d] = out.get(d, 0) + c1 * c2 * 4 ** loops
        return {d: c for d, c in out.items() if c}

    assert floor_product() == multiply(e1, e2, lev)
    ours = median_time(lambda: multiply(e1, e2, lev), repeat)
    floor = median_time(floor_product, repeat)
    report(f"P_6: {len(e1)} terms x {len(e2)} terms", ours, floor, "< 300 ms")


if __name__ == "__main__":
    main()
