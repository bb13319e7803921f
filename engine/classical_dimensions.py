"""Dimensions of the irreducible modules of the classical groups, exact.

Cells of a partition are counted here from 1: row i, column j; λ'_j is the length of column j
(λ_j = 0 past the last row, λ'_i = 0 past the last column); h(i, j) is the hook length.

Sources:
- GL_N, the hook-content formula: dim V_λ = Π_{(i,j)∈λ} (N + j − i) / h(i, j)
  (Stanley, *Enumerative Combinatorics* vol. 2, Cor. 7.21.4; Macdonald, *Symmetric Functions
  and Hall Polynomials*, I.3 Example 4).
- O(N) and Sp(2M), the products of El Samra and King (N. El Samra and R. C. King, *Dimensions of
  irreducible representations of the classical Lie groups*, J. Phys. A 12, 1979):
  dim[λ]_O(N) = Π (N + r_ij)/h(i,j), r_ij = λ_i + λ_j − i − j (i ≤ j), −λ'_i − λ'_j + i + j − 2 (i > j);
  dim⟨λ⟩_Sp(2M) = Π (2M + s_ij)/h(i,j), s_ij = λ_i + λ_j − i − j + 2 (i < j), −λ'_i − λ'_j + i + j (i ≥ j).
- GL_N at an integral dominant weight w (rational modules), Weyl's dimension formula in type A:
  dim = Π_{i<j} (w_i − w_j + j − i)/(j − i) (Fulton and Harris, *Representation Theory*, 15.17;
  the weight of the mixed pair (α, β) is (α_1, …, α_p, 0, …, 0, −β_q, …, −β_1), Koike, *On the
  decomposition of tensor products of the representations of the classical groups*, Adv. Math.
  74, 1989, §1).
"""

from __future__ import annotations

from functools import lru_cache

from engine.partitions import Partition, conjugate

PartitionPair = tuple[Partition, Partition]


def _cell_product(lam: Partition, shift) -> tuple[int, int]:
    """(Π shift(i, j), Π h(i, j)) over the cells of λ, 1-based; ``shift`` gives the numerator."""
    conj = conjugate(lam)
    num = den = 1
    for i, part in enumerate(lam, 1):
        for j in range(1, part + 1):
            num *= shift(i, j)
            den *= part - j + conj[j - 1] - i + 1
    return num, den


def _exact(num: int, den: int) -> int:
    value, rest = divmod(num, den)
    if rest:
        raise ArithmeticError(f"dimension formula gave the non-integer {num}/{den}")
    return value


@lru_cache(maxsize=200_000)
def general_linear_dimension(n: int, lam: Partition) -> int:
    """dim of the GL_n-module V_λ by the hook-content formula (0 when λ has more than n rows)."""
    return _exact(*_cell_product(lam, lambda i, j: n + j - i))


@lru_cache(maxsize=200_000)
def orthogonal_dimension(n: int, lam: Partition) -> int:
    """dim of the O(n)-module [λ] (λ'_1 + λ'_2 ≤ n) by the El Samra–King product."""
    conj = conjugate(lam)

    def row(i: int) -> int:
        return lam[i - 1] if i <= len(lam) else 0

    def col(j: int) -> int:
        return conj[j - 1] if j <= len(conj) else 0

    def shift(i: int, j: int) -> int:
        if i <= j:
            return n + row(i) + row(j) - i - j
        return n - col(i) - col(j) + i + j - 2

    return _exact(*_cell_product(lam, shift))


@lru_cache(maxsize=200_000)
def symplectic_dimension(n: int, lam: Partition) -> int:
    """dim of the Sp(n)-module ⟨λ⟩ (n = 2M even, ℓ(λ) ≤ M) by the El Samra–King product."""
    conj = conjugate(lam)

    def row(i: int) -> int:
        return lam[i - 1] if i <= len(lam) else 0

    def col(j: int) -> int:
        return conj[j - 1] if j <= len(conj) else 0

    def shift(i: int, j: int) -> int:
        if i < j:
            return n + row(i) + row(j) - i - j + 2
        return n - col(i) - col(j) + i + j

    return _exact(*_cell_product(lam, shift))


def mixed_weight(n: int, pair: PartitionPair) -> tuple[int, ...]:
    """The highest weight (α_1, …, α_p, 0, …, 0, −β_q, …, −β_1) of length n."""
    alpha, beta = pair
    zeros = n - len(alpha) - len(beta)
    if zeros < 0:
        raise ValueError(f"ℓ(α) + ℓ(β) exceeds {n}")
    return alpha + (0,) * zeros + tuple(-b for b in reversed(beta))


@lru_cache(maxsize=256)
def _weyl_denominator(n: int) -> int:
    """Π_{i<j} (j − i) = 1!·2!···(n−1)!."""
    den = 1
    for gap in range(1, n):
        den *= gap ** (n - gap)
    return den


@lru_cache(maxsize=200_000)
def mixed_dimension(n: int, pair: PartitionPair) -> int:
    """dim of the rational GL_n-module of the pair (α, β), by Weyl's dimension formula."""
    w = mixed_weight(n, pair)
    num = 1
    for i in range(n):
        wi = w[i] - i
        for j in range(i + 1, n):
            num *= wi - w[j] + j
    return _exact(num, _weyl_denominator(n))
