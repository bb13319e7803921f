"""Figures: the cost of the crossing-reducing node order against the plain order, and of writing
TikZ and SVG, as ratios (no timed unit tests; run by hand: uv run python bench/bench_figures.py)."""

from __future__ import annotations

import itertools
import time

from engine.diagram import Diagram
from engine.export.figure import FigureOptions
from engine.export.layout import lay_out
from engine.export.svg import to_svg
from engine.export.tikz import to_tikz
from engine.specs import parse_spec


def best_of(work, repeat: int = 5) -> float:
    times = []
    for _ in range(repeat):
        start = time.perf_counter()
        work()
        times.append(time.perf_counter() - start)
    return min(times)


def one_sided_minimum(top, bottom, edges) -> int:
    """The fewest crossings between two rows with ``top`` fixed: an exact dynamic programme over
    the subsets of ``bottom`` (the crossings are a sum over ordered pairs, so the best linear order
    of a set is the best order of the set without its last node plus that node's pair costs)."""
    where = {n: k for k, n in enumerate(top)}
    ends = {b: [where[a] for a, bb, _ in edges if bb == b] for b in bottom}
    nodes = list(bottom)
    n = len(nodes)
    before = [[sum(1 for x in ends[nodes[u]] for y in ends[nodes[v]] if x > y) for v in range(n)] for u in range(n)]
    best = [0] + [None] * ((1 << n) - 1)
    for subset in range(1, 1 << n):
        options = []
        for v in range(n):
            if subset >> v & 1:
                rest = subset & ~(1 << v)
                options.append(best[rest] + sum(before[u][v] for u in range(n) if rest >> u & 1))
        best[subset] = min(options)
    return best[-1]


def crossing_lower_bound(layout) -> int:
    """Σ over consecutive rows of their own fewest crossings (both rows free: every order of the
    smaller row, the exact one-sided minimum of the other): no order of the whole figure does
    better.  Exponential; for small figures only."""
    total = 0
    for i, edges in enumerate(layout.edges):
        top, bottom = layout.rows[i], layout.rows[i + 1]
        if len(top) > len(bottom):
            top, bottom, edges = bottom, top, [(b, a, e) for a, b, e in edges]
        total += min(one_sided_minimum(list(p), bottom, edges) for p in itertools.permutations(top))
    return total


def main() -> None:
    for spec, upto in (("symmetric:n=6", 8), ("orthogonal:n=3", 6), ("symmetric:n=8", 10), ("su2:kind=icosahedral", 20)):
        d = Diagram(parse_spec(spec))
        d.ensure(upto)
        plain = best_of(lambda: lay_out(d, upto, "plain"))
        bary = best_of(lambda: lay_out(d, upto, "barycentre"))
        tikz = best_of(lambda: to_tikz(d, upto, FigureOptions(young=True)))
        svg = best_of(lambda: to_svg(d, upto, FigureOptions(young=True)))
        layout = lay_out(d, upto)
        nodes = sum(len(r) for r in layout.rows)
        print(f"{spec} to index {upto} ({nodes} nodes): crossings {layout.plain_crossings} plain, "
              f"{layout.crossings} barycentre; barycentre/plain time {bary / plain:.1f}x "
              f"({bary * 1000:.1f} ms); TikZ {tikz * 1000:.1f} ms, SVG {svg * 1000:.1f} ms")

    layout = lay_out(Diagram(parse_spec("symmetric:n=6")), 8)
    print(f"symmetric:n=6 to level 4: {layout.crossings} crossings; no order can have fewer than "
          f"{crossing_lower_bound(layout)} (exact per-row-pair minimum)")


if __name__ == "__main__":
    main()
