"""The tensor-product random walk on the irreducibles: P(i→j) = M_ij·d_j/(d_i·dim V).

Σ_j M_ij d_j = dim V·d_i makes P stochastic; Σ_i d_i M_ij = dim V·d_j makes π_i = d_i²/|G| (the
Plancherel measure) stationary, and it is the only one when V is faithful (Burnside–Brauer: every
irreducible is in some V^{⊗k}, so the chain is irreducible).  The eigenvalues of P are
χ_V(C)/dim V over the classes C (Fulman, and earlier Diaconis, *Group Representations in
Probability and Statistics*, 1988, ch. 3; common practice).  Started at the trivial module, the
law after k steps is μ_k(j) = m_j(k)·d_j/(dim V)^k, m_j(k) the multiplicity of j in V^{⊗k}, so
the distances are computed on integers and divided once:
total variation ‖μ_k − π‖ = ½ Σ_j |μ_k(j) − π_j|, separation s_k = max_j (1 − μ_k(j)/π_j)
(Aldous and Diaconis, *Strong uniform times and finite random walks*, Adv. Appl. Math. 8, 1987).
The lazy walk ½(I + P) has μ_k(j) = a_j(k)·d_j/(2·dim V)^k with a(k) = a(k−1)·(dim V·I + M)."""

from __future__ import annotations

from dataclasses import dataclass
from fractions import Fraction
from math import log10

from engine.errors import TooLarge, UserError
from engine.series.finite import FiniteView
from engine.walks.graph import closed_class, distances, period

#: limb products a walk may take (steps · nodes² · digits/9)
MAX_WORK = 4 * 10 ** 9


@dataclass(frozen=True)
class Walk:
    labels: tuple[str, ...]
    stationary: tuple[Fraction, ...]
    plancherel: bool  # π_i = d_i²/Σd² on every node (V faithful)
    reached: int
    period: int  # of the walk taken (1 for the lazy walk)
    lazy: bool
    total_variation: tuple[Fraction, ...]
    separation: tuple[Fraction, ...]

    def mixing_time(self, epsilon: Fraction) -> int | None:
        """The first k with total variation ≤ ε among the steps computed (None: not within them)."""
        return next((k for k, d in enumerate(self.total_variation) if d <= epsilon), None)


def transition(view: FiniteView) -> list[list[Fraction]]:
    n, d = view.constant, view.dimensions
    return [[Fraction(m * d[j], d[i] * n) for j, m in enumerate(row)] for i, row in enumerate(view.matrix)]


def stationary(view: FiniteView) -> tuple[tuple[Fraction, ...], bool]:
    """The stationary law of the walk from the root (zero off the nodes it reaches), and whether it
    is the Plancherel measure on every node."""
    reached = distances(view)
    if not closed_class(view):
        raise UserError(f"{view.spec}: the walk from the root reaches nodes it cannot come back from, "
                        "so it has no single stationary law")
    total = sum(view.dimensions[i] ** 2 for i in reached)
    guess = [Fraction(view.dimensions[i] ** 2, total) if i in reached else Fraction(0) for i in range(view.size)]
    p = transition(view)
    if all(sum(guess[i] * p[i][j] for i in reached) == guess[j] for j in range(view.size)):
        return tuple(guess), len(reached) == view.size
    return _solve(p, sorted(reached), view.size), False


def _solve(p: list[list[Fraction]], nodes: list[int], size: int) -> tuple[Fraction, ...]:
    """π(P − I) = 0, Σπ = 1 on one closed class, by exact Gaussian elimination."""
    r = len(nodes)
    rows = [[p[nodes[i]][nodes[j]] - (1 if i == j else 0) for i in range(r)] + [Fraction(0)] for j in range(r)]
    rows[-1] = [Fraction(1)] * r + [Fraction(1)]
    for c in range(r):
        pivot = next(i for i in range(c, r) if rows[i][c] != 0)
        rows[c], rows[pivot] = rows[pivot], rows[c]
        for i in range(r):
            if i != c and rows[i][c] != 0:
                f = rows[i][c] / rows[c][c]
                rows[i] = [a - f * b for a, b in zip(rows[i], rows[c])]
    out = [Fraction(0)] * size
    for c in range(r):
        out[nodes[c]] = rows[c][r] / rows[c][c]
    return tuple(out)


def check_steps(view: FiniteView, steps: int, lazy: bool = False) -> None:
    if steps < 0:
        raise UserError(f"--steps must be 0 or more, got {steps}")
    base = view.constant * (2 if lazy else 1)
    work = steps * view.size ** 2 * (int(steps * log10(max(base, 2)) / 9) + 1)
    if work > MAX_WORK:
        raise TooLarge(f"a walk of {steps} steps on {view.size} nodes would take about {work:.1e} products of "
                       f"9-digit limbs (limit {MAX_WORK:.0e}); ask for fewer steps")


def walk(view: FiniteView, steps: int, lazy: bool = False) -> Walk:
    """The walk from the root for k = 0..steps: exact distances to its stationary law."""
    check_steps(view, steps, lazy)
    from flint import fmpz_mat

    pi, plancherel = stationary(view)
    common = 1
    for x in pi:
        common = common * x.denominator // _gcd(common, x.denominator)
    weights = [int(x * common) for x in pi]  # π_j = weights_j / common
    n, d = view.constant, view.dimensions
    base = 2 * n if lazy else n
    m = [list(row) for row in view.matrix]
    if lazy:
        for i in range(view.size):
            m[i][i] += n
    step = fmpz_mat(m)
    vector = fmpz_mat(1, view.size, [1 if i == view.root else 0 for i in range(view.size)])
    tv, sep = [], []
    scale = 1
    support = [j for j in range(view.size) if weights[j]]
    for k in range(steps + 1):
        a = [int(x) * d[j] * common for j, x in enumerate(vector.entries())]  # μ_k(j)·common·scale
        tv.append(Fraction(sum(abs(a[j] - weights[j] * scale) for j in range(view.size)), 2 * common * scale))
        low = min(support, key=lambda j: Fraction(a[j], weights[j]))
        sep.append(1 - Fraction(a[low], weights[low] * scale))
        if k < steps:
            vector = vector * step
            scale *= base
    return Walk(view.labels, pi, plancherel, len(distances(view)), 1 if lazy else period(view), lazy,
                tuple(tv), tuple(sep))


def _gcd(a: int, b: int) -> int:
    from math import gcd

    return gcd(a, b)


def eigenvalues(tower, view: FiniteView) -> list[tuple[str, object]] | None:
    """(class, χ_V(C)/dim V) for character towers without half levels; None otherwise."""
    from engine.capabilities import CharacterData
    from engine.class_functions import exact

    data = tower.capability(CharacterData)
    if data is None or view.period != 1:
        return None
    n = view.constant
    out = []
    for name, value in zip(data.table.classes, data.module):
        q = exact(value)
        out.append((name, q / n if q is not None else value * Fraction(1, n)))
    return out


def characteristic_factors(view: FiniteView) -> list[tuple[str, int]]:
    """The factors of det(tI − M) with their multiplicities: the eigenvalues of P are their roots
    divided by dim V (flint's integer factorisation)."""
    from flint import fmpz_mat

    content, factors = fmpz_mat([list(row) for row in view.matrix]).charpoly().factor()
    from engine.series.rational import polynomial_text

    return [(polynomial_text(tuple(int(c) for c in f.coeffs())), e) for f, e in factors]
