"""Speed of cell-module Gram determinants and of the semisimplicity report.

    uv run python bench/bench_cells.py          # everything (a few minutes)
    uv run python bench/bench_cells.py --quick  # the three determinants only

Targets (the issue): the Gram determinant of the TL_12 cell module with no through line
(dimension 132) in under 1 s; of the P_4 cell module of λ̄ = () and of the B_6 cell module of
λ = () in under 1 s and 2 s; per family, the largest k whose whole semisimplicity report stays
under 10 s.  Floors: sympy's determinant over Q[x] of the same matrix (``DomainMatrix``), where it
finishes in reasonable time, and our own evaluation–interpolation without the reflection split.
"""

from __future__ import annotations

import sys
import time
from fractions import Fraction

from engine.algebras.cells import symmetry
from engine.algebras.cells.gram import GramMatrix
from engine.algebras.cells.labels import read_cell_label
from engine.algebras.cells.modules import CellModule
from engine.algebras.cells.report import level_report
from engine.capabilities import DiagramAlgebra
from engine.diagram import Diagram
from engine.errors import TooLarge
from engine.specs import parse_spec


def timed(work):
    start = time.perf_counter()
    out = work()
    return out, time.perf_counter() - start


def sympy_determinant(gram: GramMatrix) -> list[int]:
    import sympy
    from sympy.polys.matrices import DomainMatrix

    x = sympy.Symbol("x")
    entries = [[sympy.Integer(0)] * gram.size for _ in range(gram.size)]
    for i, row in enumerate(gram.rows):
        for j, c, q in row:
            entries[i][j] += sympy.Rational(q.numerator, q.denominator) * x**c
    matrix = DomainMatrix.from_Matrix(sympy.Matrix(entries)).convert_to(sympy.QQ[x])
    return [int(c) for c in sympy.Poly(matrix.det().as_expr(), x).all_coeffs()[::-1]]


def unsplit(gram: GramMatrix) -> list[int]:
    plain = GramMatrix(gram.size, gram.rows, gram.gamma, None)
    return plain.determinant()


def determinant_case(spec: str, index: int, label: str, target: float, with_sympy: bool) -> None:
    level = parse_spec(spec).capability(DiagramAlgebra).at(index)
    module = CellModule(level, read_cell_label(level, label))
    gram, build = timed(lambda: GramMatrix.of(module))
    det, seconds = timed(gram.determinant)
    total = build + seconds
    line = (f"{level.name} cell {label}: dimension {gram.size}, degree {len(det) - 1}: {total:.2f} s "
            f"(matrix {build:.2f} s, determinant {seconds:.2f} s; target {target} s: "
            f"{'met' if total < target else 'MISSED'})")
    print(line)
    if symmetry.applies(module):
        plain, plain_seconds = timed(lambda: unsplit(gram))
        assert plain == det
        print(f"    without the reflection split: {plain_seconds:.2f} s (ratio {plain_seconds / seconds:.1f})")
    if with_sympy:
        reference, sympy_seconds = timed(lambda: sympy_determinant(gram))
        assert reference == det
        print(f"    sympy DomainMatrix over Q[x]: {sympy_seconds:.2f} s (ratio {sympy_seconds / seconds:.1f})")


def largest_report(spec: str, limit: float = 10.0, top: int = 12) -> None:
    tower = parse_spec(spec)
    diagram = Diagram(tower)
    algebra = tower.capability(DiagramAlgebra)
    best, best_time = None, 0.0
    for index in range(top + 1):
        try:
            level = algebra.at(index)
            nodes = diagram.level(index)
            _, seconds = timed(lambda: level_report(level, nodes, tower.format))
        except TooLarge as refused:
            print(f"    {spec} index {index}: refused up front ({refused})")
            break
        except Exception as stop:  # the end of a mixed word
            print(f"    {spec} index {index}: {stop}")
            break
        if seconds > limit:
            print(f"    {level.name}: {seconds:.1f} s (over {limit} s)")
            break
        best, best_time = level.name, seconds
    print(f"{spec}: largest level with the whole report under {limit} s: {best} ({best_time:.2f} s)")


def main() -> None:
    quick = "--quick" in sys.argv
    determinant_case("symplectic:n=2", 12, "()", 1.0, with_sympy=False)
    determinant_case("symplectic:n=2", 10, "()", 1.0, with_sympy=True)
    determinant_case("symmetric:n=8", 8, "()", 1.0, with_sympy=True)
    determinant_case("orthogonal:n=3", 6, "()", 2.0, with_sympy=True)
    if quick:
        return
    for spec in ("symmetric:n=3", "symmetric:n=8", "orthogonal:n=3", "symplectic:n=4", "symplectic:n=2",
                 "general-linear:n=3", "mixed:n=3,word=vdvdvdvdvdvd", "mixed:n=3,word=vvvvvvdddddd"):
        largest_report(spec)


if __name__ == "__main__":
    main()
