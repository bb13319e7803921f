"""The growth of the multiplicities: m_i(k) ~ p·d_i·(dim V)^k/|G| for k in the node's residue class
modulo the period p, and 0 in the others.

For a faithful V the McKay graph is connected and its Perron–Frobenius eigenvalue dim V has left
eigenvector (d_i) (Σ_i d_i M_ij = dim V·d_j), so e_root M^k ≈ (dim V)^k·d·(d_root/Σd²) summed over
the p eigenvalues dim V·e^{2πir/p} of modulus dim V (Perron–Frobenius for irreducible periodic
matrices: Gantmacher, *The Theory of Matrices* vol. 2, 1959, XIII §5; for towers: Goodman, de la
Harpe, Jones, *Coxeter Graphs and Towers of Algebras*, 1989, 1.3).  Here |G| is read as Σ d_i²
over the nodes reached (the order of G/ker V); at a half level k+1/2 the same with the half
nodes' dimensions and |H| = Σ d_x²."""

from __future__ import annotations

from dataclasses import dataclass
from fractions import Fraction

from engine.series.finite import FiniteView
from engine.walks.graph import distances, period


@dataclass(frozen=True)
class Growth:
    label: str
    half: bool
    dimension: int
    base: int  # dim V (or [G:H])
    order: int  # Σ d² over the nodes reached (|G/ker V|); |H| side for half-level nodes
    period: int
    residue: int | None  # k ≡ residue (mod period) where m ≠ 0; None: never reached
    #: (k, m(k)·order/(period·d·base^k)) at a few k of the right residue: tends to 1
    ratios: tuple[tuple[int, Fraction], ...]

    def leading(self) -> str:
        scale = Fraction(self.period * self.dimension, self.order)
        where = "" if self.period == 1 else f" for k ≡ {self.residue} (mod {self.period}), 0 otherwise"
        return f"m(k) ~ ({scale})·{self.base}^k{where}"


def growth(view: FiniteView, half: bool, position: int, values: list[int]) -> Growth:
    """The asymptotic line of one node, with the exact ratios at the last levels of ``values``
    (its multiplicities at k = 0, 1, ...)."""
    reached = distances(view)
    p = period(view)
    if half:
        hits = {j for i in reached for j, m in enumerate(view.half_matrix[i]) if m}
        order = sum(view.half_dimensions[j] ** 2 for j in hits)
        dimension = view.half_dimensions[position]
        residues = {reached[i] % p for i in reached if view.half_matrix[i][position]}
    else:
        order = sum(view.dimensions[i] ** 2 for i in reached)
        dimension = view.dimensions[position]
        residues = {reached[position] % p} if position in reached else set()
    residue = min(residues) if residues else None
    ratios = []
    for k in range(max(0, len(values) - 3 * p), len(values)):
        if residue is not None and k % p == residue:
            ratios.append((k, Fraction(values[k] * order, p * dimension * view.constant ** k)))
    label = (view.half_labels if half else view.labels)[position]
    return Growth(label, half, dimension, view.constant, order, p, residue, tuple(ratios))
