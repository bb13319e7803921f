"""Dimensions of the irreducible modules of the classical groups, exact.

Cells of a partition are counted here from 1: row i, column j; λ'_j is the length of column j
(λ_j = 0 past the last row, λ'_i = 0 past the last column); h(i, j) is the hook length.

Sources:
- GL_N, the hook-content formula: dim V_λ = Π_{(i,j)∈λ} (N + j − i) / h(i, j)
  (Stanley, *Enumerative Combinatorics* vol. 2, Cor. 7.21.4; Macdonald, *Symmetric Functions
  and Hall Polynomials*, I.3 Example 4).
- O(N) and Sp(2M), the products of El Samra and King (N. El Samra and R. C. King, *Dimensions of
  irreducible representations of the classical Lie groups*, J. Phys. A 12, 1979; reference details
  from memory, the products are held against Weyl's formulas in the tests):
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
from math import factorial

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
    """dim of the GL_n-module V_λ (0 when λ has more than n rows).

    By the hook-content formula (one factor per cell), or, when λ has many more cells than
    n², by Weyl's formula Π_{i<j≤n} (λ_i − λ_j + j − i)/(j − i) (one factor per pair of rows;
    Fulton and Harris, *Representation Theory*, 15.17): deep levels have huge partitions.
    """
    if len(lam) > n:
        return 0
    if n * n < sum(lam):
        rows = lam + (0,) * (n - len(lam))
        num = den = 1
        for i in range(n):
            for j in range(i + 1, n):
                num *= rows[i] - rows[j] + j - i
                den *= j - i
        return _exact(num, den)
    return _exact(*_cell_product(lam, lambda i, j: n + j - i))


def general_linear_dimensions_of_level(n: int, k: int, nodes, multiplicities) -> list[int]:
    """dim V_λ for the partitions λ of k at level k of V^{⊗k}, V = C^n, given their multiplicities.

    The hook-content formula dim V_λ = Π_cells (n + c)/h (Stanley, *Enumerative Combinatorics 2*,
    Cor. 7.21.4) with the hook length formula f^λ = k!/Π h (Frame, Robinson and Thrall 1954) gives
    dim V_λ = f^λ·Π_cells (n + c)/k!; the multiplicity of V_λ in V^{⊗k} is f^λ (Schur–Weyl
    duality), so with it the hooks are not needed, and the contents of row i are one rising
    factorial (n − i)(n − i + 1)…(n − i + λ_i − 1), read from a table."""
    from math import factorial

    rising: list[list[int]] = []
    for i in range(min(n, k)):
        row = [1]
        for j in range(k):
            row.append(row[-1] * (n - i + j))
        rising.append(row)
    whole = factorial(k)
    out = []
    for lam, m in zip(nodes, multiplicities):
        if m == 0 or len(lam) > n or sum(lam) != k:
            out.append(general_linear_dimension(n, lam))
            continue
        content = 1
        for i, part in enumerate(lam):
            content *= rising[i][part]
        out.append(m * content // whole)
    return out


def _el_samra_king(n: int, lam: Partition, row_shift: int, col_shift: int, diagonal_by_rows: bool) -> int:
    """Π (n + r_ij)/h(i,j) with r_ij = λ_i + λ_j − i − j + row_shift above the diagonal and
    r_ij = −λ'_i − λ'_j + i + j + col_shift below it; the diagonal goes with the rows or columns."""
    size = sum(lam)
    rows = (0,) + lam + (0,) * size  # 1-based, padded with zeros
    cols = (0,) + conjugate(lam) + (0,) * size

    def shift(i: int, j: int) -> int:
        if i < j or (i == j and diagonal_by_rows):
            return n + rows[i] + rows[j] - i - j + row_shift
        return n - cols[i] - cols[j] + i + j + col_shift

    return _exact(*_cell_product(lam, shift))


@lru_cache(maxsize=200_000)
def orthogonal_dimension(n: int, lam: Partition) -> int:
    """dim of the O(n)-module [λ] (λ'_1 + λ'_2 ≤ n) by the El Samra–King product."""
    return _el_samra_king(n, lam, 0, -2, diagonal_by_rows=True)


@lru_cache(maxsize=200_000)
def symplectic_dimension(n: int, lam: Partition) -> int:
    """dim of the Sp(n)-module ⟨λ⟩ (n = 2M even, ℓ(λ) ≤ M) by the El Samra–King product."""
    return _el_samra_king(n, lam, 2, 0, diagonal_by_rows=False)


def mixed_weight(n: int, pair: PartitionPair) -> tuple[int, ...]:
    """The highest weight (α_1, …, α_p, 0, …, 0, −β_q, …, −β_1) of length n."""
    alpha, beta = pair
    zeros = n - len(alpha) - len(beta)
    if zeros < 0:
        raise ValueError(f"ℓ(α) + ℓ(β) exceeds {n}")
    return alpha + (0,) * zeros + tuple(-b for b in reversed(beta))


@lru_cache(maxsize=200_000)
def mixed_dimension(n: int, pair: PartitionPair) -> int:
    """dim of the rational GL_n-module of the pair (α, β), by Weyl's dimension formula.

    The factors with both i and j in the block of z zeros are 1; those with one end there
    telescope into factorials: for a row i of α, Π_j (w_i − i + j)/(j − i) over the block
    p ≤ j < p+z is (w_i−i+p+z−1)!/(w_i−i+p−1)! · (p−1−i)!/(p+z−1−i)!, and likewise for β.
    """
    alpha, beta = pair
    p, q = len(alpha), len(beta)
    z = n - p - q
    w = mixed_weight(n, pair)
    outside = list(range(p)) + list(range(p + z, n))
    num = den = 1
    for a, i in enumerate(outside):
        wi = w[i] - i
        for j in outside[a + 1 :]:
            num *= wi - w[j] + j
            den *= j - i
    if z:
        for i in range(p):
            shift = w[i] - i
            num *= factorial(shift + p + z - 1) * factorial(p - 1 - i)
            den *= factorial(shift + p - 1) * factorial(p + z - 1 - i)
        for j in range(p + z, n):
            b = j - w[j]
            num *= factorial(b - p) * factorial(j - p - z)
            den *= factorial(b - p - z) * factorial(j - p)
    return _exact(num, den)
