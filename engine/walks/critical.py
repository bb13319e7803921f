"""The critical group of the McKay graph: Z^{r−1}/(rows of C̃), C = (dim V)·I − M the McKay–Cartan
matrix of the repeating step and C̃ it without the root's row and column.

For a graph Laplacian this is the sandpile (critical) group, of order the number of spanning trees
(Kirchhoff's matrix-tree theorem; Biggs, *Chip-firing and the critical group of a graph*, J.
Algebraic Combin. 9, 1999); its invariant factors are the Smith normal form's diagonal (Newman,
*Integral Matrices*, 1972, II).  python-flint's ``fmpz_mat.snf`` computes it exactly; sympy's
``smith_normal_form`` is the tests' reference."""

from __future__ import annotations

from dataclasses import dataclass

from engine.errors import TooLarge
from engine.series.finite import FiniteView

#: reduced matrices above this size are refused
MAX_SIZE = 600


@dataclass(frozen=True)
class CriticalGroup:
    invariant_factors: tuple[int, ...]  # > 1, ascending, each dividing the next
    free_rank: int  # copies of Z (C̃ singular: V not faithful, or a graph not connected)
    order: int | None  # None when infinite
    determinant: int

    def text(self) -> str:
        parts = [f"Z/{d}" for d in self.invariant_factors] + ["Z"] * self.free_rank
        return " × ".join(parts) if parts else "trivial (0)"


def reduced_cartan(view: FiniteView) -> list[list[int]]:
    """C̃: (dim V)·I − M without the root's row and column (rows and columns in display order)."""
    n, r = view.constant, view.root
    keep = [i for i in range(view.size) if i != r]
    return [[(n if i == j else 0) - view.matrix[i][j] for j in keep] for i in keep]


def critical_group(view: FiniteView) -> CriticalGroup:
    if view.size - 1 > MAX_SIZE:
        raise TooLarge(f"{view.spec}: the reduced McKay–Cartan matrix is {view.size - 1}×{view.size - 1}; "
                       f"its Smith normal form is limited to {MAX_SIZE} rows")
    c = reduced_cartan(view)
    if not c:
        return CriticalGroup((), 0, 1, 1)
    from flint import fmpz_mat

    matrix = fmpz_mat(c)
    snf = matrix.snf()
    diagonal = [abs(int(snf[i, i])) for i in range(len(c))]
    factors = tuple(sorted(d for d in diagonal if d > 1))
    free = sum(1 for d in diagonal if d == 0)
    determinant = int(matrix.det())
    order = None if free else abs(determinant)
    return CriticalGroup(factors, free, order, determinant)
