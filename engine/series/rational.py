"""Generating functions Σ_k m_X(k) t^k = N(t)/D(t) of the nodes of a finite tower.

The multiplicities are the entries of e_root·W^k (times R at half levels), so the series is the
entry of e_root·(I − tW)^{-1} (times R): rational with D dividing det(I − tW), of degree at most
n, and N of degree below n (Cramer's rule; Stanley, *Enumerative Combinatorics* vol. 1, 4.7, the
transfer-matrix method).  N/D in lowest terms is the shortest linear recurrence of the sequence,
found exactly from its first 2n + 4 terms by the Berlekamp–Massey algorithm (Massey, *Shift-register
synthesis and BCH decoding*, IEEE Trans. Inf. Theory 15, 1969) over the rationals; D(0) = 1, and D
has integer coefficients because the terms are integers (Fatou's lemma, Stanley EC1 ex. 4.3)."""

from __future__ import annotations

from dataclasses import dataclass
from fractions import Fraction

from engine.errors import TooLarge
from engine.series.finite import FiniteView

#: node sets above this size are refused (the terms cost n³ products)
MAX_NODES = 400


@dataclass(frozen=True)
class Series:
    label: str
    half: bool
    numerator: tuple[int, ...]
    denominator: tuple[int, ...]

    def value(self, k: int) -> int:
        """The k-th coefficient of N/D (by the recurrence D gives)."""
        return expand(self.numerator, self.denominator, k + 1)[k]


def terms(view: FiniteView, count: int) -> tuple[list[list[int]], list[list[int]]]:
    """Multiplicities at whole levels 0..count−1 (rows: k, columns: nodes) and at half levels."""
    if view.size > MAX_NODES:
        raise TooLarge(f"{view.spec} has {view.size} nodes per level; series and walks are limited to "
                       f"{MAX_NODES} (about {view.size ** 3:,} products of big integers)")
    from flint import fmpz_mat

    w = fmpz_mat([list(row) for row in view.matrix])
    r = fmpz_mat([list(row) for row in view.half_matrix]) if view.period == 2 else None
    v = fmpz_mat(1, view.size, [1 if i == view.root else 0 for i in range(view.size)])
    whole, half = [], []
    for _ in range(count):
        whole.append([int(x) for x in v.entries()])
        if r is not None:
            half.append([int(x) for x in (v * r).entries()])
        v = v * w
    return whole, half


def berlekamp_massey(sequence: list[int]) -> list[Fraction]:
    """The connection polynomial C (C[0] = 1) of the shortest linear recurrence of ``sequence``."""
    c: list[Fraction] = [Fraction(1)]
    b: list[Fraction] = [Fraction(1)]
    length, shift, last = 0, 1, Fraction(1)
    for n, term in enumerate(sequence):
        d = Fraction(term) + sum((c[i] * sequence[n - i] for i in range(1, min(length, len(c) - 1) + 1)), Fraction(0))
        if d == 0:
            shift += 1
            continue
        coef = d / last
        new = c + [Fraction(0)] * max(0, len(b) + shift - len(c))
        for i, x in enumerate(b):
            new[i + shift] -= coef * x
        if 2 * length <= n:
            b, length, last, shift = c, n + 1 - length, d, 1
        else:
            shift += 1
        c = new
    return (c + [Fraction(0)] * (length + 1))[: length + 1]


def _trim(poly: list[int]) -> tuple[int, ...]:
    while len(poly) > 1 and poly[-1] == 0:
        poly = poly[:-1]
    return tuple(poly) if poly else (0,)


def rational_function(sequence: list[int]) -> tuple[tuple[int, ...], tuple[int, ...]]:
    """(N, D) in lowest terms with D(0) = 1 for a sequence known to satisfy a recurrence of order
    at most len(sequence)/2 − 1."""
    connection = berlekamp_massey(sequence)
    length = len(connection) - 1
    if any(x.denominator != 1 for x in connection):  # cannot happen for integer sequences (Fatou)
        raise ArithmeticError("Berlekamp–Massey gave a non-integral denominator")
    d = [int(x) for x in connection]
    n = [sum(d[i] * sequence[j - i] for i in range(0, j + 1) if i < len(d)) for j in range(length)]
    return _trim(n), _trim(d)


def expand(numerator: tuple[int, ...], denominator: tuple[int, ...], count: int) -> list[int]:
    """The first ``count`` coefficients of N/D (D(0) = 1)."""
    out: list[int] = []
    for k in range(count):
        value = numerator[k] if k < len(numerator) else 0
        value -= sum(denominator[i] * out[k - i] for i in range(1, min(k, len(denominator) - 1) + 1))
        out.append(value)
    return out


def node_series(view: FiniteView, half: bool, position: int) -> Series:
    """The generating function of one node (a half-level node: over the levels k + 1/2)."""
    return all_series(view, [(half, position)])[0]


def all_series(view: FiniteView, which: list[tuple[bool, int]] | None = None) -> list[Series]:
    """Series of the given nodes (default: every whole-level node, then every half-level node)."""
    if which is None:
        which = [(False, i) for i in range(view.size)] + [(True, j) for j in range(len(view.half_nodes))]
    whole, half = terms(view, 2 * view.size + 4)
    out = []
    for is_half, position in which:
        rows = half if is_half else whole
        sequence = [row[position] for row in rows]
        numerator, denominator = rational_function(sequence)
        label = (view.half_labels if is_half else view.labels)[position]
        out.append(Series(label, is_half, numerator, denominator))
    return out


def polynomial_text(coefficients: tuple[int, ...], variable: str = "t") -> str:
    """1 − 3t + 2t^2 (constant term first)."""
    parts: list[str] = []
    for e, c in enumerate(coefficients):
        if not c:
            continue
        size = abs(c)
        body = str(size) if e == 0 else (("" if size == 1 else f"{size}·") + (variable if e == 1 else f"{variable}^{e}"))
        sign = "-" if c < 0 else "+"
        parts.append((f"−{body}" if sign == "-" else body) if not parts else f" {'−' if sign == '-' else '+'} {body}")
    return "".join(parts) or "0"
