"""Independent reference computations for the classical towers' tests (no engine code).

Weyl's character formula as a ratio of alternating sums over the Weyl group, evaluated exactly
at a rational torus point, and Weyl's dimension formula as a product over the positive roots
(Fulton and Harris, *Representation Theory*, 24.1 and 24.6; Humphreys, *Introduction to Lie
Algebras and Representation Theory*, 24.3).  Root systems and ρ as tabulated in Bourbaki,
*Lie Groups and Lie Algebras* ch. VI, Planches I–IV:

- A (GL_N, rank N in the e-basis): roots e_i − e_j, ρ = (N−1, …, 0), W = permutations;
- B_M (SO(2M+1)): e_i ± e_j, e_i; ρ = (M−1/2, …, 1/2); W = signed permutations;
- C_M (Sp(2M)): e_i ± e_j, 2e_i; ρ = (M, …, 1); W = signed permutations;
- D_M (SO(2M)): e_i ± e_j; ρ = (M−1, …, 0); W = signed permutations with an even number of signs.

Weights are handled doubled (2λ, 2ρ are integers for B); a torus point is t = (t_1, …, t_M) with
x_j = t_j², so the monomial x^μ is Π t_j^{2μ_j}.
"""

from __future__ import annotations

from fractions import Fraction
from functools import lru_cache
from itertools import permutations, product

Weight = tuple[int, ...]


def _perm_sign(perm: tuple[int, ...]) -> int:
    sign = 1
    seen = [False] * len(perm)
    for start in range(len(perm)):
        if seen[start]:
            continue
        length = 0
        j = start
        while not seen[j]:
            seen[j] = True
            j = perm[j]
            length += 1
        if length % 2 == 0:
            sign = -sign
    return sign


@lru_cache(maxsize=None)
def weyl_group(kind: str, rank: int) -> tuple[tuple[tuple[int, ...], tuple[int, ...], int], ...]:
    """Elements (perm, signs, ε) acting by (w v)_j = signs_j · v_{perm_j}."""
    out = []
    sign_choices = [(1,) * rank] if kind == "A" else list(product((1, -1), repeat=rank))
    for perm in permutations(range(rank)):
        for signs in sign_choices:
            negatives = signs.count(-1)
            if kind == "D" and negatives % 2:
                continue
            out.append((perm, signs, _perm_sign(perm) * (-1) ** negatives))
    return tuple(out)


def rho_doubled(kind: str, rank: int) -> Weight:
    if kind == "A":
        return tuple(2 * (rank - 1 - i) for i in range(rank))
    if kind == "B":
        return tuple(2 * (rank - i) - 1 for i in range(rank))
    if kind == "C":
        return tuple(2 * (rank - i) for i in range(rank))
    if kind == "D":
        return tuple(2 * (rank - 1 - i) for i in range(rank))
    raise ValueError(kind)


def positive_roots(kind: str, rank: int) -> list[tuple[int, ...]]:
    def unit(i: int, c: int = 1) -> list[int]:
        v = [0] * rank
        v[i] = c
        return v

    roots = []
    for i in range(rank):
        for j in range(i + 1, rank):
            minus = unit(i)
            minus[j] = -1
            roots.append(tuple(minus))
            if kind != "A":
                plus = unit(i)
                plus[j] = 1
                roots.append(tuple(plus))
        if kind == "B":
            roots.append(tuple(unit(i)))
        if kind == "C":
            roots.append(tuple(unit(i, 2)))
    return roots


def _pad(weight: tuple[int, ...], rank: int) -> Weight:
    if len(weight) > rank:
        raise ValueError(f"weight {weight} longer than rank {rank}")
    return tuple(weight) + (0,) * (rank - len(weight))


def weyl_dimension(kind: str, rank: int, weight: tuple[int, ...]) -> int:
    """Π_{α>0} ⟨λ+ρ, α⟩ / ⟨ρ, α⟩."""
    lam2 = [2 * x for x in _pad(weight, rank)]
    rho2 = rho_doubled(kind, rank)
    value = Fraction(1)
    for root in positive_roots(kind, rank):
        top = sum((a + b) * c for a, b, c in zip(lam2, rho2, root))
        bottom = sum(b * c for b, c in zip(rho2, root))
        value *= Fraction(top, bottom)
    assert value.denominator == 1
    return int(value)


def _alternant(kind: str, exps2: Weight, t: tuple[Fraction, ...]) -> Fraction:
    total = Fraction(0)
    for perm, signs, eps in weyl_group(kind, len(t)):
        term = Fraction(eps)
        for j in range(len(t)):
            term *= t[j] ** (signs[j] * exps2[perm[j]])
        total += term
    return total


def weyl_character(kind: str, rank: int, weight: tuple[int, ...], t: tuple[Fraction, ...]) -> Fraction:
    """χ_λ(x) = Σ_w ε(w) x^{w(λ+ρ)} / Σ_w ε(w) x^{wρ}, at x_j = t_j²."""
    rho2 = rho_doubled(kind, rank)
    lam2 = tuple(2 * x + r for x, r in zip(_pad(weight, rank), rho2))
    return _alternant(kind, lam2, t) / _alternant(kind, rho2, t)


def orthogonal_star(n: int, lam: tuple[int, ...]) -> tuple[int, ...]:
    """λ*: the first column of λ cut to n − λ'_1 when λ'_1 > n/2 (the det twist), else λ."""
    if 2 * len(lam) > n:
        return lam[: n - len(lam)]
    return lam


def orthogonal_on_torus(n: int, lam: tuple[int, ...], t: tuple[Fraction, ...] | None):
    """Dimension (t None) or torus character of the O(n)-module [λ], through SO(n): [λ] restricts
    to the SO(n)-module of highest weight λ*, and for n even with ℓ(λ*) = n/2 to the sum of those
    of λ* and of λ* with its last entry negated (Weyl, *The Classical Groups*, V.9; Goodman and
    Wallach, *Symmetry, Representations, and Invariants*, 5.5.5)."""
    rank = n // 2
    kind = "B" if n % 2 else "D"
    star = _pad(orthogonal_star(n, lam), rank)
    weights = [star]
    if kind == "D" and rank and star[-1] > 0:
        weights.append(star[:-1] + (-star[-1],))
    if t is None:
        return sum(weyl_dimension(kind, rank, w) for w in weights)
    return sum(weyl_character(kind, rank, w, t) for w in weights)


def vector_trace(kind: str, t: tuple[Fraction, ...]) -> Fraction:
    """Trace of the torus point on V: Σ x_j (A), Σ (x_j + 1/x_j) (C, D), plus 1 for B."""
    xs = [s * s for s in t]
    if kind == "A":
        return sum(xs, Fraction(0))
    total = sum((x + 1 / x for x in xs), Fraction(0))
    return total + 1 if kind == "B" else total


#: generic rational torus coordinates (distinct, not ±1, pairwise not inverse)
GENERIC_POINT = (Fraction(2), Fraction(3, 2), Fraction(5, 3), Fraction(7, 5), Fraction(11, 7), Fraction(13, 4))


def generic_point(rank: int) -> tuple[Fraction, ...]:
    return GENERIC_POINT[:rank]
