"""Figures: the cost of the crossing-reducing node order against the plain order, and of writing
TikZ and SVG, as ratios (no timed unit tests; run by hand: uv run python bench/bench_figures.py)."""

from __future__ import annotations

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


if __name__ == "__main__":
    main()
