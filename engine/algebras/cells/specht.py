"""Specht modules of S_t in Young's seminormal form: exact rational matrices and the invariant form.

Basis: the standard Young tableaux of shape λ, each written as the tuple of the rows of the entries
0, 1, ..., t−1 (its Yamanouchi word), in lexicographic order of that tuple (the row-reading tableau
first).  The transposition s_i of i and i+1 acts by Young's seminormal form (Young 1931; James and
Kerber, *The Representation Theory of the Symmetric Group*, 1981, §3.3; Sagan, *The Symmetric
Group*, 2001, exercises to §2.8): with the axial distance ρ = c(i+1) − c(i), c the content
(column − row) of an entry,

    s_i·v_T = (1/ρ)·v_T + a·v_{s_iT},   a = 1 when ρ > 0,  a = 1 − 1/ρ² when ρ < 0,

the second term present only when s_iT (entries i and i+1 swapped) is standard (|ρ| ≥ 2).  Every
entry is rational, so products and forms stay exact.  The S_t-invariant form is diagonal in this
basis (the basis vectors are eigenvectors of the Jucys–Murphy elements with distinct eigenvalues),
⟨v_T, v_T⟩ = γ_T with γ_{s_iT} = (1 − 1/ρ²)·γ_T when ρ > 0 and γ of the row-reading tableau 1.

A permutation σ of the t strands is a tuple (σ(0), ..., σ(t−1)); ``matrix(λ, σ)`` is its matrix,
a homomorphism: matrix(σ∘τ) = matrix(σ)·matrix(τ).
"""

from __future__ import annotations

from fractions import Fraction
from functools import lru_cache

Partition = tuple[int, ...]
Tableau = tuple[int, ...]  # the row of each entry 0..t−1
Matrix = tuple[tuple[Fraction, ...], ...]


@lru_cache(maxsize=None)
def standard_tableaux(shape: Partition) -> tuple[Tableau, ...]:
    """The standard Young tableaux of the shape as row words, in lexicographic order."""
    t = sum(shape)
    found: list[Tableau] = []

    def grow(word: list[int], filled: list[int]) -> None:
        if len(word) == t:
            found.append(tuple(word))
            return
        for row, length in enumerate(shape):
            if filled[row] < length and (row == 0 or filled[row - 1] > filled[row]):
                filled[row] += 1
                word.append(row)
                grow(word, filled)
                word.pop()
                filled[row] -= 1

    grow([], [0] * len(shape))
    return tuple(found)


def contents(word: Tableau) -> tuple[int, ...]:
    """The content (column − row) of each entry of the tableau."""
    seen: dict[int, int] = {}
    out = []
    for row in word:
        column = seen.get(row, 0)
        seen[row] = column + 1
        out.append(column - row)
    return tuple(out)


@lru_cache(maxsize=None)
def generator(shape: Partition, i: int) -> Matrix:
    """The matrix of s_i (swap i and i+1), columns the images of the basis vectors."""
    basis = standard_tableaux(shape)
    position = {word: n for n, word in enumerate(basis)}
    size = len(basis)
    rows = [[Fraction(0)] * size for _ in range(size)]
    for n, word in enumerate(basis):
        c = contents(word)
        rho = c[i + 1] - c[i]
        rows[n][n] = Fraction(1, rho)
        if abs(rho) >= 2:
            swapped = list(word)
            swapped[i], swapped[i + 1] = swapped[i + 1], swapped[i]
            m = position[tuple(swapped)]
            rows[m][n] = Fraction(1) if rho > 0 else 1 - Fraction(1, rho * rho)
    return tuple(tuple(r) for r in rows)


def _multiply(a: Matrix, b: Matrix) -> Matrix:
    size = len(a)
    columns = list(zip(*b)) if b else []
    return tuple(tuple(sum((x * y for x, y in zip(row, col) if x and y), Fraction(0)) for col in columns)
                 for row in a)


def identity(size: int) -> Matrix:
    return tuple(tuple(Fraction(int(i == j)) for j in range(size)) for i in range(size))


@lru_cache(maxsize=100_000)
def matrix(shape: Partition, sigma: tuple[int, ...]) -> Matrix:
    """The matrix of the permutation σ on the Specht module of the shape.

    σ with a descent at i (σ(i) > σ(i+1)) is (σ∘s_i)∘s_i with σ∘s_i shorter, so
    matrix(σ) = matrix(σ∘s_i)·matrix(s_i)."""
    for i in range(len(sigma) - 1):
        if sigma[i] > sigma[i + 1]:
            shorter = list(sigma)
            shorter[i], shorter[i + 1] = shorter[i + 1], shorter[i]
            return _multiply(matrix(shape, tuple(shorter)), generator(shape, i))
    return identity(len(standard_tableaux(shape)))


@lru_cache(maxsize=None)
def form(shape: Partition) -> tuple[Fraction, ...]:
    """γ_T for each basis tableau: the diagonal of the invariant form, γ of the first tableau 1."""
    basis = standard_tableaux(shape)
    if not basis:
        return ()
    position = {word: n for n, word in enumerate(basis)}
    gamma: list[Fraction | None] = [None] * len(basis)
    gamma[0] = Fraction(1)
    todo = [0]
    while todo:
        n = todo.pop()
        word = basis[n]
        c = contents(word)
        for i in range(len(word) - 1):
            rho = c[i + 1] - c[i]
            if abs(rho) < 2:
                continue
            swapped = list(word)
            swapped[i], swapped[i + 1] = swapped[i + 1], swapped[i]
            m = position[tuple(swapped)]
            if gamma[m] is None:
                factor = 1 - Fraction(1, rho * rho)
                gamma[m] = gamma[n] * factor if rho > 0 else gamma[n] / factor
                todo.append(m)
    return tuple(g for g in gamma if g is not None)
