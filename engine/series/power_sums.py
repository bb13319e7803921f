"""The multiplicity as a sum over the eigenvalues of the whole step, read off its generating function.

For towers without a character table, and for towers with half levels (``symmetric:n=N``,
``alternating:n=N``), the whole step W = R·I (restrict to the half-level group, induce back) is
the McKay matrix of V = C^N, the permutation module: its eigenvalues are the character values of
V, the fixed-point counts of the classes (0, 1, ..., N; Serre, *Linear Representations of Finite
Groups*, 1977, §2.3 and ex. 2.6; the eigenvectors are the columns of the character table, common
practice).  They are rational integers, so the generating function N(t)/D(t) of a node
(``rational.py``) has D(t) = Π_λ (1 − λt)^{e_λ} over the integers, and by partial fractions

    m(k) = Σ_λ P_λ(k)·λ^k + Σ_{k0 ≤ deg N − deg D} c_{k0}·[k = k0]        (every k ≥ 0)

with P_λ of degree below e_λ (Stanley, *Enumerative Combinatorics* vol. 1, Theorem 4.1.1; the
polynomial part of N/D, when deg N ≥ deg D, gives the [k = k0]).  For a group's step W is diagonalisable, so the P_λ are constants and only
[k = 0] can occur: it is the contribution of the eigenvalue 0, written 0^k (1 at k = 0, else 0),
as the S_N formula and the sums over characters write it.

Shift convention: a whole-level node is m(k) at level k; a half-level node is m(k+1/2) at level
k + 1/2, the same sum in the whole steps k taken before the last restriction (the exponent is k,
not k + 1 as in ``engine.closed_forms``, whose coefficients are these divided by λ).  The
coefficients are found exactly: the factors of D by python-flint (``fmpz_poly.factor``), the P_λ
and c_{k0} by solving the linear system of the first terms over the rationals, checked on twice as
many more.  Where D does not split over the rationals (su2 towers: 2cos(2πj/n)) there is no such
form here and ``None`` is returned."""

from __future__ import annotations

from dataclasses import dataclass
from fractions import Fraction

from engine.series.rational import Series, expand


@dataclass(frozen=True)
class PowerSum:
    """m(k) = Σ coefficient·k^power·base^k over ``terms``, plus ``corrections`` [k = k0]."""

    label: str
    half: bool
    terms: tuple[tuple[int, int, Fraction], ...]  # (base λ ≠ 0, power of k, coefficient)
    corrections: tuple[tuple[int, Fraction], ...] = ()  # (k0, coefficient)

    def value(self, k: int) -> int:
        total = sum((c * k ** p * b ** k for b, p, c in self.terms), Fraction(0))
        total += sum((c for k0, c in self.corrections if k0 == k), Fraction(0))
        if total.denominator != 1:
            raise ArithmeticError("a power sum gave a non-integral multiplicity")
        return int(total)

    def heading(self) -> str:
        return "m(k+1/2)" if self.half else "m(k)"

    def text(self) -> str:
        """Written as ``eigen_sums.EigenSum.text``: (1/12)·3^k − (1/3)·0^k + (1/4)·(-1)^k."""
        items = [(b, p, c) for b, p, c in self.terms]
        items += [(0, 0, c) for k0, c in self.corrections if k0 == 0]
        items.sort(key=lambda t: (-t[0], -t[1]))
        parts: list[tuple[bool, str]] = []
        for base, power, coefficient in items:
            b = str(base) if base >= 0 else f"({base})"
            k = "" if power == 0 else ("k·" if power == 1 else f"k^{power}·")
            parts.append((coefficient < 0, _scaled(abs(coefficient), f"{k}{b}^k")))
        for k0, coefficient in self.corrections:
            if k0:
                parts.append((coefficient < 0, _scaled(abs(coefficient), f"[k = {k0}]")))
        if not parts:
            return "0"
        text = ("−" if parts[0][0] else "") + parts[0][1]
        for negative, body in parts[1:]:
            text += f" {'−' if negative else '+'} {body}"
        return text


def _scaled(size: Fraction, body: str) -> str:
    if size == 1:
        return body
    shown = str(size.numerator) if size.denominator == 1 else f"({size})"
    return f"{shown}·{body}"


def integer_roots(denominator: tuple[int, ...]) -> dict[int, int] | None:
    """λ → e_λ with D(t) = Π (1 − λt)^{e_λ}, or None when D does not split over the rationals."""
    degree = len(denominator) - 1
    if degree == 0:
        return {}
    from flint import fmpz_poly

    reversed_poly = fmpz_poly(list(reversed(denominator)))  # x^d D(1/x), monic since D(0) = 1
    _, factors = reversed_poly.factor()
    roots: dict[int, int] = {}
    for factor, multiplicity in factors:
        if factor.degree() != 1:
            return None
        lead, constant = int(factor[1]), int(factor[0])
        if constant % lead:
            return None  # cannot happen for a monic polynomial (Gauss's lemma)
        roots[-constant // lead] = multiplicity
    return roots


def _solve(rows: list[list[Fraction]], right: list[Fraction]) -> list[Fraction]:
    """The unique solution of a square nonsingular system (Gauss–Jordan over the rationals)."""
    n = len(rows)
    a = [row[:] + [r] for row, r in zip(rows, right)]
    for col in range(n):
        pivot = next(r for r in range(col, n) if a[r][col] != 0)
        a[col], a[pivot] = a[pivot], a[col]
        inverse = 1 / a[col][col]
        a[col] = [x * inverse for x in a[col]]
        for r in range(n):
            if r != col and a[r][col] != 0:
                factor = a[r][col]
                a[r] = [x - factor * y for x, y in zip(a[r], a[col])]
    return [a[r][n] for r in range(n)]


def power_sum(series: Series) -> PowerSum | None:
    """The sum over eigenvalues of one node's multiplicities, from its N(t)/D(t)."""
    roots = integer_roots(series.denominator)
    if roots is None:
        return None
    numerator = () if series.numerator == (0,) else series.numerator
    extra = len(numerator) - (len(series.denominator) - 1)  # deg N − deg D + 1 corrections when ≥ 1
    basis: list[tuple[str, int, int]] = [("power", base, p) for base in sorted(roots, reverse=True)
                                         for p in range(roots[base])]
    basis += [("at", k0, 0) for k0 in range(max(extra, 0))]

    def column(kind: str, a: int, p: int, k: int) -> Fraction:
        if kind == "at":
            return Fraction(1 if k == a else 0)
        return Fraction(k ** p * a ** k)

    size = len(basis)
    values = expand(series.numerator, series.denominator, 3 * size + 8)
    if size == 0:
        return PowerSum(series.label, series.half, ())
    rows = [[column(kind, a, p, k) for kind, a, p in basis] for k in range(size)]
    solution = _solve(rows, [Fraction(v) for v in values[:size]])
    found = PowerSum(
        series.label, series.half,
        tuple((a, p, c) for (kind, a, p), c in zip(basis, solution) if kind == "power" and c),
        tuple((a, c) for (kind, a, _), c in zip(basis, solution) if kind == "at" and c),
    )
    if any(found.value(k) != v for k, v in enumerate(values)):
        raise ArithmeticError("the power sum does not reproduce the series")
    return found


def node_power_sum(view, half: bool, label: str) -> PowerSum | None:
    """The power sum of the node named ``label`` (a whole-level or, with ``half``, a half-level one)."""
    from engine.series.rational import node_series

    labels = view.half_labels if half else view.labels
    return power_sum(node_series(view, half, labels.index(label)))
