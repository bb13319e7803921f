"""The action of a diagram algebra on V^{⊗k} (V = C^n), exact and sparse.

A tensor index (i_1, ..., i_k) ∈ [0, n)^k is the integer Σ i_j n^{k−j} (the first factor most
significant).  The matrix of a diagram has its rows indexed by the labels of the top vertices and its
columns by the labels of the bottom vertices, so that with the contract's product (d1 above d2,
d1's bottom glued to d2's top) action(d1·d2) = action(d1)·action(d2).

- partition (P_k(n), S_n): the entry is 1 when the labels are constant on every block, 0 otherwise
  (the classical action: Jones, "The Potts model and the symmetric group", 1994; Martin 1994; the
  2005 survey of partition algebras in the European J. Combin., §3).
- half partition (P_{k+1/2}(n), S_{n−1}): a diagram of k+1 vertices per row acts on V^{⊗(k+1)} as
  above; its matrix is restricted to the indices whose last factor is the last basis vector of V
  (top and bottom), which identifies that subspace with V^{⊗k}.  Since k+1 and (k+1)' share a
  block, a diagram's entries vanish unless both last labels agree, so the glued middle vertex k+1
  carries the same fixed label and the restriction is a homomorphism (the stabilizer S_{n−1} of the
  last basis vector commutes with it).  The matrix is n^k × n^k.
- brauer with the group orthogonal (B_k(n), O(n)): pairs, the same δ rule (the standard symmetric
  form δ_ij; Brauer, Ann. of Math. 1937).
- brauer with the group symplectic (B_k(−n), Sp(n), n = 2m) and temperley-lieb (TL_k(−2),
  planar Brauer diagrams, Sp(2) = SL_2): V carries the form ω(e_a, e_b) = J_ab with
  J = [[0, I_m], [−I_m, 0]].  A bottom–bottom pair {i < j} contributes J(b_i, b_j) (the form), a
  top–top pair {i < j} contributes T(a_i, a_j) with T = J^{-1} = −J (the invariant tensor), a
  vertical pair δ(a_i, b_j); the product is multiplied by the sign ε(d) = sign(α)·sign(β), where α
  lists the top vertices as the top pairs (each ascending, pairs in any order) followed by the top
  ends of the vertical pairs ascending, and β lists the bottom pairs followed by the bottom ends of
  the vertical pairs in the same order.  So a permutation σ acts by sign(σ) times the permutation
  of the factors and a loop has the value Σ J_ab T_ab = −n: the sign-twisted Brauer action of
  B_k(−n) (Brauer 1937; Goodman–Wallach, *Symmetry, Representations, and Invariants*, 2009, §10.1);
  the tests prove the homomorphism property and the commutation with explicit symplectic matrices.
- symmetric-group (CS_k, GL_n): permutations of the tensor factors (Schur–Weyl duality).
- walled-brauer (GL_n on a word of V's and V*'s): the i-th factor is V for the letter v and V*
  for d (dual basis); vertical edges are δ, a top horizontal edge is the invariant Σ e_a ⊗ e^a, a
  bottom one the contraction V ⊗ V* → C; all entries 0/1 (Koike 1989; Turaev 1989).
"""

from __future__ import annotations

from typing import Iterator

from engine.algebras.diagrams import Blocks
from engine.capabilities import AlgebraLevel
from engine.errors import TooLarge, UserError

#: the most nonzero entries one action matrix (or one stack of them) may hold
ENTRY_LIMIT = 6_000_000

Sparse = dict[int, dict[int, int]]


def space_dimension(level: AlgebraLevel) -> int:
    """The dimension of the tensor space the level's algebra acts on: n^k (n^k at a half level k+1/2)."""
    factors = level.vertices - 1 if level.half else level.vertices
    return level.n ** factors


def entry_count(d: Blocks, level: AlgebraLevel) -> int:
    """The number of nonzero entries of the diagram's matrix (before the symplectic signs)."""
    free = len(d) - (1 if level.half and level.vertices else 0)
    return level.n ** free  # symplectic: a pair's second label is fixed by the first (J is monomial)


def _signed(level: AlgebraLevel) -> bool:
    return level.group == "symplectic"


def guard(total_entries: int, what: str = "the action") -> None:
    """TooLarge, with the estimate, past ``ENTRY_LIMIT`` nonzero entries."""
    if total_entries > ENTRY_LIMIT:
        raise TooLarge(f"{what} would hold about {total_entries:,} nonzero matrix entries "
                       f"(the limit is {ENTRY_LIMIT:,}); take a smaller level or n")


def _permutation_sign(seq: list[int]) -> int:
    seen = [False] * len(seq)
    sign = 1
    for i in range(len(seq)):
        if not seen[i]:
            j, length = i, 0
            while not seen[j]:
                seen[j] = True
                j = seq[j]
                length += 1
            if length % 2 == 0:
                sign = -sign
    return sign


def symplectic_sign(d: Blocks, r: int) -> int:
    """ε(d) = sign(α)·sign(β) of the module docstring (a Brauer diagram with r vertices per row)."""
    top_pairs = [b for b in d if b[1] < r]
    bottom_pairs = [(b[0] - r, b[1] - r) for b in d if b[0] >= r]
    verticals = sorted((b[0], b[1] - r) for b in d if b[0] < r <= b[1])
    alpha = [v for pair in top_pairs for v in pair] + [t for t, _ in verticals]
    beta = [v for pair in bottom_pairs for v in pair] + [b for _, b in verticals]
    return _permutation_sign(alpha) * _permutation_sign(beta)


def entries(d: Blocks, level: AlgebraLevel) -> Iterator[tuple[int, int, int]]:
    """(row, column, value) for every nonzero entry of the diagram's matrix on V^{⊗k}."""
    side = space_dimension(level)
    keys, values = flat_entries(d, level, side)
    if values is None:
        for key in keys:
            row, col = divmod(key, side)
            yield row, col, 1
    else:
        for key, value in zip(keys, values):
            row, col = divmod(key, side)
            yield row, col, value


def flat_entries(d: Blocks, level: AlgebraLevel, stride: int) -> tuple[list[int], list[int] | None]:
    """The nonzero entries of the diagram's matrix as keys row·stride + column and their values
    (None: every value is 1).  Built block by block, each block's labels added to all keys so far."""
    n, r = level.n, level.vertices
    factors = r - 1 if level.half else r
    weight = [n ** (factors - 1 - i) if i < factors else 0 for i in range(r)]
    if _signed(level):
        return _symplectic_entries(d, n, r, weight, stride)
    keys = [0]
    for block in d:
        w = sum(weight[v] for v in block if v < r) * stride + sum(weight[v - r] for v in block if v >= r)
        if level.half and block[-1] == 2 * r - 1:
            # the block of k+1 and (k+1)' carries the last label n−1 (the last factor is outside the index)
            keys = [key + (n - 1) * w for key in keys]
            continue
        steps = [a * w for a in range(n)]
        keys = [key + step for key in keys for step in steps]
    return keys, None


def _symplectic_entries(d: Blocks, n: int, r: int, weight: list[int], stride: int) -> tuple[list[int], list[int]]:
    if n % 2:
        raise UserError(f"the symplectic action needs an even n, got n={n}")
    m = n // 2
    keys, values = [0], [symplectic_sign(d, r)]
    for a, b in d:
        # (key step, sign) per label x of the pair's first end; its partner is x (vertical) or x ± m
        if b < r:  # top pair: T = −J, T(x, x+m) = −1, T(x, x−m) = +1
            w1, w2 = weight[a] * stride, weight[b] * stride
            steps = [(x * w1 + (x + m) * w2, -1) if x < m else (x * w1 + (x - m) * w2, 1) for x in range(n)]
        elif a >= r:  # bottom pair: J(x, x+m) = 1, J(x, x−m) = −1
            w1, w2 = weight[a - r], weight[b - r]
            steps = [(x * w1 + (x + m) * w2, 1) if x < m else (x * w1 + (x - m) * w2, -1) for x in range(n)]
        else:
            w = weight[a] * stride + weight[b - r]
            steps = [(x * w, 1) for x in range(n)]
        keys = [key + step for key in keys for step, _ in steps]
        values = [value * sign for value in values for _, sign in steps]
    return keys, values


def diagram_matrix(d: Blocks, level: AlgebraLevel) -> Sparse:
    """The diagram's matrix as rows: {row: {column: value}}."""
    guard(entry_count(d, level))
    out: Sparse = {}
    for row, col, value in entries(d, level):
        out.setdefault(row, {})[col] = value
    return out


def element_matrix(element: dict[Blocks, int], level: AlgebraLevel) -> Sparse:
    """The matrix of an integer combination of diagrams (zero entries dropped)."""
    guard(sum(entry_count(d, level) for d in element))
    out: Sparse = {}
    for d, c in element.items():
        for row, col, value in entries(d, level):
            line = out.setdefault(row, {})
            total = line.get(col, 0) + c * value
            if total:
                line[col] = total
            else:
                del line[col]
                if not line:
                    del out[row]
    return out


def acts_as_zero(element: dict[Blocks, int], level: AlgebraLevel) -> bool:
    """Whether the element's matrix on V^{⊗k} is zero (computed entry by entry, exactly)."""
    return not element_matrix(element, level)


def multiply_sparse(a: Sparse, b: Sparse) -> Sparse:
    """The product of two sparse matrices (exact integers)."""
    out: Sparse = {}
    for i, row in a.items():
        acc: dict[int, int] = {}
        for k, x in row.items():
            other = b.get(k)
            if other:
                for j, y in other.items():
                    acc[j] = acc.get(j, 0) + x * y
        acc = {j: v for j, v in acc.items() if v}
        if acc:
            out[i] = acc
    return out


def index_of(labels: tuple[int, ...], n: int) -> int:
    """The integer of a tensor index (i_1, ..., i_k), 0-based labels."""
    value = 0
    for a in labels:
        value = value * n + a
    return value


def labels_of(index: int, n: int, factors: int) -> tuple[int, ...]:
    out = []
    for _ in range(factors):
        index, a = divmod(index, n)
        out.append(a)
    return tuple(reversed(out))


def image_of_tensor(element: dict[Blocks, int], level: AlgebraLevel, labels: tuple[int, ...]) -> dict[tuple[int, ...], int]:
    """The element applied to the basis tensor e_{i_1} ⊗ ... ⊗ e_{i_k} (0-based labels): a
    combination {labels: coefficient} of basis tensors (the column of the matrix)."""
    factors = level.vertices - 1 if level.half else level.vertices
    if len(labels) != factors:
        raise UserError(f"{level.name} acts on {factors} tensor factors; the tensor has {len(labels)}")
    if any(not 0 <= a < level.n for a in labels):
        raise UserError(f"tensor labels run from 1 to {level.n}")
    col = index_of(labels, level.n)
    guard(sum(entry_count(d, level) for d in element))
    out: dict[int, int] = {}
    for d, c in element.items():
        for row, j, value in entries(d, level):
            if j == col:
                out[row] = out.get(row, 0) + c * value
    return {labels_of(row, level.n, factors): v for row, v in sorted(out.items()) if v}
