"""Speed of the rank and kernel of the action on V^{⊗k} (issue 10).

    uv run python bench/bench_algebra_kernel.py             # the P_4(3) cases
    uv run python bench/bench_algebra_kernel.py --search    # also the largest (n, k) per family under 10 s

Cases:
- ``algebra symmetric:n=3 --level 4`` (the document the command prints: 4140 diagrams on an
  81-dimensional space, rank 1094, computed) against a direct python-flint rank of the same
  4140 × 6561 matrix (every diagram's 81 × 81 action matrix flattened into one row, built from
  the same entries, ``nmod_mat`` modulo the same prime, ``rank()``); target: within 1.5×;
- ``kernel symmetric:n=3 --level 4`` (20 elements, the generator and its note); target < 10 s;
- with ``--search``: per family, the largest k (for a few n) whose ``algebra`` document takes
  under 10 s with ``rank_method`` computed.
Ratios are printed; nothing here is a unit test.
"""

from __future__ import annotations

import argparse
import time

from engine.algebras.action import flat_entries, space_dimension
from engine.algebras.bases import iter_basis
from engine.algebras.linalg import PRIMES
from engine.capabilities import DiagramAlgebra
from engine.export.kernel_documents import algebra_document, kernel_document
from engine.specs import parse_spec


def direct_rank(spec: str, index: int) -> tuple[int, float]:
    """The floor: the whole stacked matrix, dense, one flint rank."""
    from flint import nmod_mat

    start = time.perf_counter()
    tower = parse_spec(spec)
    level = tower.capability(DiagramAlgebra).at(index)
    side = space_dimension(level)
    width = side * side
    diagrams = list(iter_basis(level))
    flat = [0] * (len(diagrams) * width)
    for i, d in enumerate(diagrams):
        keys, values = flat_entries(d, level, side)
        base = i * width
        if values is None:
            for key in keys:
                flat[base + key] = 1
        else:
            for key, value in zip(keys, values):
                flat[base + key] = value % PRIMES[0]
    found = nmod_mat(len(diagrams), width, flat, PRIMES[0]).rank()
    return found, time.perf_counter() - start


def timed(work):
    start = time.perf_counter()
    result = work()
    return result, time.perf_counter() - start


def search(limit: float) -> None:
    families = [("symmetric:n={n}", (2, 3, 4), 2), ("orthogonal:n={n}", (2, 3, 4), 1),
                ("symplectic:n={n}", (2, 4), 1), ("general-linear:n={n}", (2, 3, 4), 1),
                ("mixed:n={n},word=vdvdvdvdvdvd", (2, 3), 1)]
    for pattern, ns, step in families:
        for n in ns:
            spec = pattern.format(n=n)
            tower = parse_spec(spec)
            best = None
            index = step
            while True:
                try:
                    doc, seconds = timed(lambda: algebra_document(tower, index))
                except Exception as exc:  # a size guard: report where it stopped
                    print(f"  {spec:<34} stops at index {index}: {str(exc)[:70]}")
                    break
                if doc["rank_method"] != "computed" or seconds > limit:
                    print(f"  {spec:<34} {doc['algebra']:<14} {doc['rank_method']:<9} {seconds:6.2f} s (past the limit)")
                    break
                best = (doc["algebra"], doc["basis"], seconds)
                index += step
                if spec.startswith("mixed") and index > 12:
                    break
            if best:
                print(f"  {spec:<34} largest under {limit:.0f} s: {best[0]} ({best[1]} diagrams, {best[2]:.2f} s)")


def main() -> None:
    parser = argparse.ArgumentParser()
    parser.add_argument("--search", action="store_true")
    parser.add_argument("--limit", type=float, default=10.0)
    args = parser.parse_args()
    tower = parse_spec("symmetric:n=3")
    doc, ours = timed(lambda: algebra_document(tower, 8))
    rank, floor = direct_rank("symmetric:n=3", 8)
    print(f"algebra symmetric:n=3 --level 4: rank {doc['rank']} ({doc['rank_method']}) in {ours:.2f} s; "
          f"direct flint rank of the 4140 x 6561 matrix: {rank} in {floor:.2f} s; "
          f"ratio ours/direct {ours / floor:.2f} (target <= 1.5)")
    kernel, seconds = timed(lambda: kernel_document(tower, 8, 20))
    print(f"kernel symmetric:n=3 --level 4: dimension {kernel['dimension']}, {len(kernel['elements'])} elements, "
          f"ideal {kernel.get('ideal_dimension')} in {seconds:.2f} s (target < 10 s)")
    if args.search:
        search(args.limit)


if __name__ == "__main__":
    main()
