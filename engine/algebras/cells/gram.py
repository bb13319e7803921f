"""Gram matrices of cell modules, their determinants as exact polynomials in x, and ranks at x = N.

With the basis h ⊗ v_T of ``modules``, the Gram matrix is G = Γ·G′: Γ the diagonal of the Specht
module's invariant form (γ_T), G′ the matrix of blocks x^c·σ (c closed loops, σ the Specht matrix
of the induced permutation; zero blocks where propagating blocks are lost).

**The determinant we report** is det G′ = det G / (∏_T γ_T)^(number of half diagrams): the Gram
determinant with the Specht module's form scaled to determinant 1.  It does not depend on the basis
chosen for the Specht module (a change of Specht basis conjugates every σ), it lies in Z[x] (the
Specht module has an integral form: James, *The Representation Theory of the Symmetric Groups*,
LNM 682, 1978), and where the Specht module is one-dimensional (Temperley–Lieb, CS_k's trivial and
sign modules, λ = () or (t)) it is the plain Gram determinant of the diagram basis.

**How it is computed**: det G′(x) has degree at most D = Σ_rows max_entries c; its coefficients
are at most H = ∏_rows ‖row‖₂ (Hadamard's inequality on |x| = 1, then Cauchy's estimate), where a
row's entries are the sums of the absolute values of their coefficients.  For each prime p of a
set whose product exceeds 2H, det G′(a) mod p at a = 0..D (python-flint ``nmod_mat``), then
Newton's forward-difference interpolation mod p; the coefficients follow by the Chinese remainder
theorem (balanced residues).  Exact by construction: no floats, no probabilistic step.  Where a
symmetry of the half diagrams applies (``symmetry``: rotation or reflection, one-dimensional Specht
modules) the matrix is first split into orthogonal blocks and their determinants multiplied.
"""

from __future__ import annotations

from dataclasses import dataclass
from fractions import Fraction
from functools import cached_property
from math import lcm
from typing import TYPE_CHECKING, Callable

from engine.algebras.cells.modules import CellModule
from engine.errors import Cancelled

if TYPE_CHECKING:
    pass

Entry = tuple[int, Fraction]  # x^c with a rational coefficient
_PRIME_START = 1 << 50  # python-flint's nmod_mat is fastest near 50 bits (bench_cells)


def _primes(count_bits: int, avoid: int, start: int = _PRIME_START):
    """Primes below ``start`` (descending) not dividing ``avoid``."""
    import flint

    p = start
    while True:
        p -= 1
        if flint.fmpz(p).is_prime() and avoid % p:
            yield p


@dataclass
class GramMatrix:
    """G′ as a sparse matrix: ``rows[i]`` lists (column, c, coefficient); ``gamma`` the diagonal Γ."""

    size: int
    rows: list[list[tuple[int, int, Fraction]]]
    gamma: list[Fraction]
    #: the cell module it came from (for the reflection split of ``symmetry``), if any
    module: CellModule | None = None

    @classmethod
    def of(cls, module: CellModule, cancel: Callable[[], bool] | None = None) -> "GramMatrix":
        f = module.specht_size
        n = len(module.halves)
        rows: list[list[tuple[int, int, Fraction]]] = [[] for _ in range(n * f)]
        halves = module.halves
        for i in range(n):
            if cancel is not None and cancel():
                raise Cancelled()
            for j in range(i, n):
                found = module.pair(halves[i], halves[j])
                if found is None:
                    continue
                c, perms = found
                inverse = tuple(tuple(sorted(range(len(p)), key=p.__getitem__)) for p in perms)
                for a, b, sigma in ((i, j, perms), (j, i, inverse)) if i != j else ((i, j, perms),):
                    m = module.specht_matrix(sigma)
                    for u in range(f):
                        row = rows[a * f + u]
                        for w in range(f):
                            if m[u][w]:
                                row.append((b * f + w, c, m[u][w]))
        gamma = list(module.specht_form) * n
        return cls(n * f, rows, gamma, module)

    @cached_property
    def degree_bound(self) -> int:
        return sum(max((c for _, c, _ in row), default=0) for row in self.rows)

    @cached_property
    def denominators(self) -> int:
        return lcm(1, *{q.denominator for row in self.rows for _, _, q in row})

    def coefficient_bound_squared(self) -> Fraction:
        """H² = ∏_rows Σ_columns (Σ |coefficients|)²."""
        if self.denominators == 1:
            whole = 1
            for row in self.rows:
                sums_int: dict[int, int] = {}
                for j, _, q in row:
                    sums_int[j] = sums_int.get(j, 0) + abs(q.numerator)
                whole *= sum(s * s for s in sums_int.values())
            return Fraction(whole)
        total = Fraction(1)
        for row in self.rows:
            sums: dict[int, Fraction] = {}
            for j, _, q in row:
                sums[j] = sums.get(j, Fraction(0)) + abs(q)
            total *= sum((s * s for s in sums.values()), Fraction(0))
        return total

    def at(self, x: int | Fraction) -> list[list[Fraction]]:
        """G′ at a number x (dense)."""
        out = [[Fraction(0)] * self.size for _ in range(self.size)]
        x = Fraction(x)
        for i, row in enumerate(self.rows):
            for j, c, q in row:
                out[i][j] += q * x**c
        return out

    def symmetric_entry(self, i: int, j: int) -> tuple[int, Fraction] | None:
        """The Gram matrix G = Γ·G′ at (i, j) as x^c·q, or None when zero."""
        for col, c, q in self.rows[i]:
            if col == j:
                return c, self.gamma[i] * q
        return None

    def rank_at(self, x: int | Fraction) -> int:
        """The exact rank of the Gram matrix at the number x (python-flint ``fmpq_mat``)."""
        import flint

        if self.size == 0:
            return 0
        dense = self.at(x)
        return flint.fmpq_mat([[flint.fmpq(q.numerator, q.denominator) for q in row] for row in dense]).rank()

    def determinant(self, cancel: Callable[[], bool] | None = None) -> list[int]:
        """det G′ as integer coefficients, constant term first, no trailing zeros ([0] when zero)."""
        import flint

        if self.size == 0:
            return [1]
        from engine.algebras.cells import symmetry

        if self.module is not None and symmetry.applies(self.module):
            import flint

            blocks, change_squared = symmetry.split(self.module, self)
            product = flint.fmpz_poly([1])
            for block in blocks:
                product *= flint.fmpz_poly(block.determinant(cancel))
            quotient, remainder = divmod(product, flint.fmpz_poly([change_squared]))
            assert remainder == 0, "the symmetry split must divide exactly"
            return [int(c) for c in quotient.coeffs()] or [0]
        degree = self.degree_bound
        bound = 4 * self.coefficient_bound_squared()  # (2H)²
        modulus = 1
        residues: list[int] = []
        for p in _primes(0, self.denominators):
            if modulus * modulus > bound:
                break
            if cancel is not None and cancel():
                raise Cancelled()
            coefficients = self._determinant_mod(p, degree, flint)
            if modulus == 1:
                residues = coefficients
            else:
                inverse = pow(modulus, -1, p)
                residues = [r + modulus * (((c - r) * inverse) % p) for r, c in zip(residues, coefficients)]
            modulus *= p
        half = modulus // 2
        out = [r - modulus if r > half else r for r in residues]
        while len(out) > 1 and out[-1] == 0:
            out.pop()
        return out

    @cached_property
    def _by_power(self) -> dict[int, list[tuple[int, int, int, int]]]:
        """c → the entries (i, j, numerator, denominator) of x^c."""
        out: dict[int, list[tuple[int, int, int, int]]] = {}
        for i, row in enumerate(self.rows):
            for j, c, q in row:
                out.setdefault(c, []).append((i, j, q.numerator, q.denominator))
        return out

    def _determinant_mod(self, p: int, degree: int, flint) -> list[int]:
        inverses: dict[int, int] = {1: 1}
        by_power: dict[int, list[list[int]]] = {}
        for c, entries in self._by_power.items():
            dense = [[0] * self.size for _ in range(self.size)]
            for i, j, num, den in entries:
                inv = inverses.get(den)
                if inv is None:
                    inv = inverses[den] = pow(den, -1, p)
                dense[i][j] = (dense[i][j] + num * inv) % p
            by_power[c] = dense
        powers = sorted(by_power)
        matrices = [flint.nmod_mat(by_power[c], p) for c in powers]
        values = []
        for a in range(degree + 1):
            total = matrices[0] * pow(a, powers[0], p)
            for c, m in zip(powers[1:], matrices[1:]):
                total = total + m * pow(a, c, p)
            values.append(int(total.det()))
        # Newton's form: Δ^m y(0)/m! is the t^m coefficient of e^(−t)·Σ_j y_j t^j/j! (the binomial
        # transform, Graham–Knuth–Patashnik, Concrete Mathematics §5.3); then Horner's rule on
        # Σ_m Δ^m y(0)/m!·x(x−1)…(x−m+1).
        size = len(values)
        inverse_factorials = [1] * size
        factorial = 1
        for m in range(1, size):
            factorial = factorial * m % p
        inverse = pow(factorial, -1, p)
        for m in range(size - 1, -1, -1):
            inverse_factorials[m] = inverse
            inverse = inverse * m % p if m else inverse
        ordinary = flint.nmod_poly([y * f % p for y, f in zip(values, inverse_factorials)], p)
        alternating = flint.nmod_poly([f if m % 2 == 0 else -f % p for m, f in enumerate(inverse_factorials)], p)
        product = ordinary.mul_low(alternating, size)
        scaled = [int(product[m]) if m <= product.degree() else 0 for m in range(size)]
        poly = flint.nmod_poly([scaled[-1]], p)
        for m in range(len(scaled) - 2, -1, -1):
            poly = poly * flint.nmod_poly([-m % p, 1], p) + scaled[m]
        coefficients = [int(c) for c in poly.coeffs()]
        return coefficients + [0] * (degree + 1 - len(coefficients))


def rational_roots(coefficients: list[int]) -> list[tuple[Fraction, int]]:
    """The rational roots of the polynomial with their multiplicities, ascending (python-flint's
    factorisation over Z)."""
    return factorization(coefficients)[0]


def factorization(coefficients: list[int]) -> tuple[list[tuple[Fraction, int]], list[tuple[list[int], int]]]:
    """(rational roots with multiplicities, other irreducible factors with multiplicities)."""
    import flint

    if not any(coefficients) or len(coefficients) == 1:
        return [], []
    _, factors = flint.fmpz_poly(coefficients).factor()
    roots, others = [], []
    for factor, m in factors:
        c = [int(v) for v in factor.coeffs()]
        if len(c) == 2:
            roots.append((Fraction(-c[0], c[1]), m))
        else:
            others.append((c, m))
    roots.sort()
    others.sort(key=lambda item: (len(item[0]), item[0]))
    return roots, others


def other_factors(coefficients: list[int]) -> list[tuple[list[int], int]]:
    """The irreducible factors of degree ≥ 2 (integer coefficients, constant first) with their
    multiplicities: their roots are the irrational parameters where the determinant vanishes."""
    return factorization(coefficients)[1]
