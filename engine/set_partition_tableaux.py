"""Set-partition tableaux: a second basis listing for the nodes of the S_N tower.

V^{⊗k} ≅ ⊕_t S(k,t)·Ind_{S_{N−t}}^{S_N} 1 (the S_N-orbits on [N]^k are the set partitions of [k]
into t ≤ N blocks) and Ind_{S_{N−t}}^{S_N} 1 holds S^λ f^{λ/(N−t)} times (Pieri rule: Macdonald,
*Symmetric Functions and Hall Polynomials*, I.5), so
m_λ(k) = Σ_t S(k,t)·f^{λ/(N−t)}.  A *set-partition tableau* of shape λ at level k realises one
term of that sum: a set partition of {1,…,k} into t blocks, the blocks numbered 1..t in the order
of their least elements, block j written in the box that holds j in a standard skew tableau of
shape λ/(N−t).  At the half level k+1/2 (μ ⊢ N−1) the count is Σ_t S(k+1,t+1)·f^{μ/(N−1−t)}: a set
partition of {1,…,k+1} into t+1 blocks, the block holding k+1 set aside, the other t blocks
placed in a standard skew tableau of shape μ/(N−1−t).

**Order** (rank 0 first):
1. by the number t of placed blocks, ascending;
2. then by the set partition, as its restricted growth string a_1 a_2 … (a_i the number of the
   block holding i, blocks numbered by least element) in lexicographic order (Stanton and White,
   *Constructive Combinatorics*, 1986; Knuth, TAOCP 4A, §7.2.1.5);
3. then by the skew tableau: by the row of its largest entry, top row first, then recursively by
   the tableau left when that box is removed.

Every listing is lazy: each item is built from its rank by counting (no earlier item is built).
"""

from __future__ import annotations

from dataclasses import dataclass
from functools import lru_cache
from typing import Iterator

from engine.combinatorics import stirling2
from engine.encodings.drawing import draw_grid
from engine.errors import UserError
from engine.partitions import Partition, contains, removable_corners, remove_box, skew_tableaux_count
from engine.paths import check_rank


@dataclass(frozen=True)
class SetPartitionTableau:
    """One filling: ``blocks`` in the order of least elements, ``cells[r][c]`` the number (1-based)
    of the block in box (r, c) of ``shape``, or 0 for a box of ``inner``."""

    shape: Partition
    inner: Partition
    blocks: tuple[tuple[int, ...], ...]
    cells: tuple[tuple[int, ...], ...]
    #: at half levels, the block holding k+1 (not placed); else None
    aside: tuple[int, ...] | None = None

    def draw(self) -> list[str]:
        """Box drawing: the inner boxes as ``·``, the others holding their block, e.g. ``1,3``."""
        grid = [["·" if j == 0 else ",".join(map(str, self.blocks[j - 1])) for j in row] for row in self.cells]
        lines = draw_grid(grid)
        if self.aside is not None:
            lines.append("set aside: " + ",".join(map(str, self.aside)))
        return lines


def _inner(top: int, t: int) -> Partition:
    return (top - t,) if top - t > 0 else ()


@lru_cache(maxsize=4096)
def _completions(k: int, t: int, placed: int, used: int) -> int:
    """Ways to extend a restricted growth string of length ``placed`` using ``used`` blocks to one of
    length k using exactly t blocks: W(i,j) = j·W(i+1,j) + W(i+1,j+1), W(k,j) = [j = t]."""
    if used > t or t - used > k - placed:
        return 0
    if placed == k:
        return 1
    return used * _completions(k, t, placed + 1, used) + _completions(k, t, placed + 1, used + 1)


def set_partition_of_rank(k: int, t: int, rank: int) -> tuple[tuple[int, ...], ...]:
    """The set partition of {1..k} into t blocks whose restricted growth string has this rank in
    lexicographic order, as blocks ordered by least element."""
    blocks: list[list[int]] = []
    for element in range(1, k + 1):
        for choice in range(len(blocks) + 1):
            used = max(len(blocks), choice + 1)
            ways = _completions(k, t, element, used)
            if rank < ways:
                if choice == len(blocks):
                    blocks.append([element])
                else:
                    blocks[choice].append(element)
                break
            rank -= ways
        else:
            raise AssertionError("rank beyond S(k,t)")
    return tuple(tuple(b) for b in blocks)


def skew_tableau_of_rank(outer: Partition, inner: Partition, rank: int) -> list[tuple[int, int]]:
    """Boxes (row, column) holding 1, 2, ... of the standard skew tableau of shape outer/inner with
    this rank (largest entry's row from the top row down, then recursively)."""
    placed: list[tuple[int, int]] = []
    shape = outer
    while shape != inner:
        for row in removable_corners(shape):
            smaller = remove_box(shape, row)
            if not contains(smaller, inner):
                continue
            count = skew_tableaux_count(smaller, inner)
            if rank < count:
                placed.append((row, shape[row] - 1))
                shape = smaller
                break
            rank -= count
        else:
            raise AssertionError("rank beyond f^{outer/inner}")
    placed.reverse()
    return placed


class SetPartitionTableaux:
    """The set-partition tableaux of shape ``shape`` at level index ``index`` of ``symmetric:n=N``
    (index 2k: level k, λ ⊢ N; index 2k+1: level k+1/2, μ ⊢ N−1)."""

    def __init__(self, n: int, index: int, shape: Partition) -> None:
        self.n = n
        self.index = index
        self.shape = shape
        self.half = index % 2 == 1
        self.k = index // 2
        self.top = n - 1 if self.half else n
        if sum(shape) != self.top:
            raise UserError(f"{shape} is not a partition of {self.top}, so not a node of this level")
        # (t, number of set partitions, tableaux per set partition) for each term with a filling
        self.terms: list[tuple[int, int, int]] = []
        for t in range(self.top + 1):
            partitions = stirling2(self.k + 1, t + 1) if self.half else stirling2(self.k, t)
            per = skew_tableaux_count(shape, _inner(self.top, t))
            if partitions and per:
                self.terms.append((t, partitions, per))

    @property
    def total(self) -> int:
        """Σ_t S(k,t)·f^{λ/(N−t)} (or Σ_t S(k+1,t+1)·f^{μ/(N−1−t)} at a half level)."""
        return sum(count * per for _, count, per in self.terms)

    def unrank(self, rank: int) -> SetPartitionTableau:
        check_rank(rank, self.total, f"shape {self.shape}")
        for t, count, per in self.terms:
            if rank < count * per:
                which, rank = divmod(rank, per)
                return self._build(t, which, rank)
            rank -= count * per
        raise AssertionError("rank beyond the total")

    def _build(self, t: int, which: int, rank: int) -> SetPartitionTableau:
        inner = _inner(self.top, t)
        if self.half:
            every = set_partition_of_rank(self.k + 1, t + 1, which)
            aside = next(b for b in every if self.k + 1 in b)
            blocks = tuple(b for b in every if b is not aside)
        else:
            aside = None
            blocks = set_partition_of_rank(self.k, t, which)
        cells = [[0] * part for part in self.shape]
        for entry, (r, c) in enumerate(skew_tableau_of_rank(self.shape, inner, rank), 1):
            cells[r][c] = entry
        return SetPartitionTableau(self.shape, inner, blocks, tuple(tuple(r) for r in cells), aside)

    def iterate(self, start: int = 0) -> Iterator[SetPartitionTableau]:
        """The fillings from rank ``start`` on, built one at a time."""
        for rank in range(start, self.total):
            yield self.unrank(rank)
