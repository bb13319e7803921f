"""The diagram basis of each algebra: counted by formula, listed by rank without building the list.

Vertices are the ints of ``engine.algebras.diagrams`` (top i ↦ i−1, bottom i' ↦ r+i−1, r the
vertices per row).  The order of the ranks, per kind:

- **partition** (P_k): a set partition of the 2r vertices is its restricted growth string
  a_0 a_1 ... a_{2r−1} (a_v = the number of the block of vertex v, blocks numbered by their first
  vertex; a_0 = 0, a_v ≤ 1 + max(a_0..a_{v−1})); ranks follow the lexicographic order of these
  strings (Stanton–White, *Constructive Combinatorics*, 1986, §3; the counting table
  T[i][m] = m·T[i+1][m] + T[i+1][m+1] ranks and unranks).  Rank 0 is the single block of all
  vertices.  Count Bell(2k) (OEIS A000110).
- **half partition** (P_{k+1/2}, r = k+1): the last bottom vertex lies in the block of the last top
  vertex, so the diagram is a set partition of the first 2r−1 vertices, ranked as above; count
  Bell(2k+1).
- **brauer** (B_k): a perfect matching is the sequence j_0 j_1 ... where j_t is the position of
  the partner of the smallest unmatched vertex among the vertices still unmatched after it; ranks
  follow the lexicographic order of these sequences (rank = Σ j_t·(2r−2t−3)!!).  Count (2k−1)!!
  (OEIS A001147).
- **temperley-lieb** (TL_k): read the boundary 1, 2, ..., k, k', ..., 1'; a planar matching is its
  Dyck word (a vertex opens when its partner comes later on the boundary); ranks follow the
  lexicographic order with "open" before "close" (ballot-number table).  Count Catalan(k) (A000108).
- **symmetric-group** (CS_k): the permutation σ (top i joined to bottom σ(i)); ranks follow the
  lexicographic order of (σ(1), ..., σ(k)) (Lehmer codes).  Count k!.
- **walled-brauer** (word w of r letters): swapping the top and bottom vertex of every position
  whose letter is d turns a walled Brauer diagram into a permutation diagram, a bijection onto
  S_r (the usual "flip the dual strands", as in the 1994 study of mixed tensor spaces, J. Algebra); ranks are the ranks
  of that permutation.  Count r! = (#v + #d)!.
"""

from __future__ import annotations

from functools import lru_cache
from itertools import permutations
from math import factorial
from typing import Iterator

from engine.algebras.diagrams import Blocks, canonical, format_diagram, in_basis
from engine.capabilities import AlgebraLevel
from engine.combinatorics import bell, catalan, double_factorial_odd
from engine.errors import TooLarge, UserError

#: the most vertices per row listed by rank (the rank tables hold (2r)^2 integers of up to
#: Bell(2r) size; 100 vertices keep them to a few megabytes)
MAX_VERTICES = 100


def check_size(vertices: int, name: str = "") -> None:
    """TooLarge past ``MAX_VERTICES`` vertices per row."""
    if vertices > MAX_VERTICES:
        what = f"{name}: " if name else ""
        raise TooLarge(f"{what}diagrams with {vertices} vertices per row; bases are listed and ranked up to "
                       f"{MAX_VERTICES} vertices per row")


def count(level: AlgebraLevel) -> int:
    """The number of basis diagrams, by formula (see the module docstring for the sources)."""
    r, kind = level.vertices, level.kind
    if kind == "partition":
        return bell(2 * r - 1) if level.half and r else bell(2 * r)
    if kind == "brauer":
        return double_factorial_odd(r)
    if kind == "temperley-lieb":
        return catalan(r)
    if kind in ("symmetric-group", "walled-brauer"):
        return factorial(r)
    raise UserError(f"unknown kind of diagram algebra {kind!r}")


def _check_rank(level: AlgebraLevel, i: int) -> None:
    check_size(level.vertices, level.name)
    total = count(level)
    if not 0 <= i < total:
        raise UserError(f"no diagram of rank {i} in {level.name}: ranks run from 0 to {total - 1}")


# ----- set partitions: restricted growth strings ---------------------------------------------
@lru_cache(maxsize=64)
def _rgs_table(n: int) -> tuple[tuple[int, ...], ...]:
    """T[i][m]: completions of positions i..n−1 of a restricted growth string with m blocks used."""
    table = [[0] * (n + 2) for _ in range(n + 1)]
    for m in range(n + 2):
        table[n][m] = 1
    for i in range(n - 1, -1, -1):
        for m in range(n + 1):
            table[i][m] = m * table[i + 1][m] + table[i + 1][m + 1]
    return tuple(tuple(row) for row in table)


def _rgs_rank(d: Blocks, n: int) -> int:
    """The rank of the restricted growth string of the blocks' vertices below n."""
    table = _rgs_table(n)
    a = [0] * (n + 1)
    for b, block in enumerate(d):
        for v in block:
            a[v] = b
    rank, m = 0, 0
    for i in range(n):
        v = a[i]
        rank += v * table[i + 1][m]
        if v == m:
            m += 1
    return rank


def _rgs_unrank(i: int, n: int) -> list[int]:
    table = _rgs_table(n)
    a, m = [], 0
    for p in range(n):
        below = table[p + 1][m]
        v = min(i // below, m)
        i -= v * below
        a.append(v)
        if v == m:
            m += 1
    return a


def _rgs_blocks(a: list[int], extra: int | None = None) -> Blocks:
    """The blocks of a restricted growth string on the vertices 0..len(a)−1.  With ``extra`` (a
    half diagram: the vertex r−1), the vertex len(a) (the last bottom vertex) joins its block."""
    blocks: list[list[int]] = []
    for v, b in enumerate(a):
        if b == len(blocks):
            blocks.append([v])
        else:
            blocks[b].append(v)
    if extra is not None:
        blocks[a[extra]].append(len(a))
    return tuple(map(tuple, blocks))


def _iter_partitions(n: int) -> Iterator[Blocks]:
    """Every set partition of 0..n−1 as blocks, in the order of the restricted growth strings:
    the strings of length n−1 by successor, the last vertex placed in each block in turn."""
    if n <= 1:
        yield ((0,),) if n else ()
        return
    v = n - 1
    for a in _iter_rgs(n - 1, 0):
        prefix = _rgs_blocks(a)
        for b in range(len(prefix)):
            yield prefix[:b] + (prefix[b] + (v,),) + prefix[b + 1:]
        yield prefix + ((v,),)


def _iter_rgs(n: int, start: int) -> Iterator[list[int]]:
    """Restricted growth strings of length n in lexicographic order from rank ``start`` (one list,
    changed in place)."""
    if n == 0:
        if start == 0:
            yield []
        return
    a = _rgs_unrank(start, n)
    top = [0] * n  # top[i] = max(a[0..i])
    m = 0
    for i, v in enumerate(a):
        m = max(m, v)
        top[i] = m
    while True:
        yield a
        i = n - 1
        while i > 0 and a[i] > top[i - 1]:
            i -= 1
        if i == 0:
            return
        a[i] += 1
        m = max(top[i - 1], a[i])
        top[i] = m
        for j in range(i + 1, n):
            a[j] = 0
            top[j] = m


def set_partitions(n: int) -> Iterator[Blocks]:
    """Every set partition of 0..n−1 (blocks canonical), in restricted-growth-string order."""
    return _iter_partitions(n)


# ----- perfect matchings ------------------------------------------------------------------------
_DOUBLE = [double_factorial_odd(t) for t in range(64)]


def _matching_unrank(i: int, n: int) -> Blocks:
    free = list(range(n))
    pairs = []
    while free:
        first = free.pop(0)
        below = double_factorial_odd(len(free) // 2)
        j, i = divmod(i, below)
        pairs.append((first, free.pop(j)))
    return tuple(pairs)


def _matching_rank(d: Blocks, n: int) -> int:
    """Σ j_t·(n−2t−3)!!: in canonical order the t-th pair starts at the smallest unmatched vertex,
    and j_t counts the unmatched vertices below its partner (a bit mask)."""
    free = (1 << n) - 1
    rank, left = 0, n // 2
    for a, b in d:
        free ^= 1 << a
        left -= 1
        rank += (free & ((1 << b) - 1)).bit_count() * (_DOUBLE[left] if left < 64 else double_factorial_odd(left))
        free ^= 1 << b
    return rank


def _iter_matchings(free: list[int], prefix: tuple) -> Iterator[Blocks]:
    if len(free) == 2:
        yield prefix + ((free[0], free[1]),)
        return
    first = free[0]
    rest = free[1:]
    for j in range(len(rest)):
        yield from _iter_matchings(rest[:j] + rest[j + 1:], prefix + ((first, rest[j]),))


# ----- planar matchings: Dyck words ---------------------------------------------------------------
@lru_cache(maxsize=64)
def _dyck_table(n: int) -> tuple[tuple[int, ...], ...]:
    """D[i][h]: ways to finish a Dyck word of length n from position i at height h."""
    table = [[0] * (n + 2) for _ in range(n + 1)]
    table[n][0] = 1
    for i in range(n - 1, -1, -1):
        for h in range(n + 1):
            table[i][h] = table[i + 1][h + 1] + (table[i + 1][h - 1] if h else 0)
    return tuple(tuple(row) for row in table)


def _boundary(r: int) -> list[int]:
    return list(range(r)) + [2 * r - 1 - j for j in range(r)]


def _planar_unrank(i: int, r: int) -> Blocks:
    n = 2 * r
    table, boundary = _dyck_table(n), _boundary(r)
    stack, pairs, h = [], [], 0
    for p in range(n):
        opening = table[p + 1][h + 1]
        if i < opening:
            stack.append(boundary[p])
            h += 1
        else:
            i -= opening
            pairs.append((stack.pop(), boundary[p]))
            h -= 1
    return canonical(pairs)


def _planar_rank(d: Blocks, r: int) -> int:
    n = 2 * r
    table, boundary = _dyck_table(n), _boundary(r)
    position = {v: p for p, v in enumerate(boundary)}
    later = {}
    for a, b in d:
        pa, pb = position[a], position[b]
        later[min(pa, pb)] = True
        later[max(pa, pb)] = False
    rank, h = 0, 0
    for p in range(n):
        if later[p]:
            h += 1
        else:
            rank += table[p + 1][h + 1]
            h -= 1
    return rank


# ----- permutations: Lehmer codes -------------------------------------------------------------------
def _perm_unrank(i: int, r: int) -> list[int]:
    free = list(range(r))
    out = []
    for t in range(r, 0, -1):
        j, i = divmod(i, factorial(t - 1))
        out.append(free.pop(j))
    return out


def _perm_rank(sigma: list[int]) -> int:
    r = len(sigma)
    free = list(range(r))
    rank = 0
    for t, s in enumerate(sigma):
        j = free.index(s)
        free.pop(j)
        rank += j * factorial(r - 1 - t)
    return rank


def _perm_blocks(sigma, r: int) -> Blocks:
    return tuple((i, r + s) for i, s in enumerate(sigma))


def _flip(d: Blocks, level: AlgebraLevel) -> Blocks:
    """Swap top and bottom vertex at every position whose letter is d (an involution)."""
    r, word = level.vertices, level.word
    swap = [v if word[v % r] == "v" else (v + r) % (2 * r) for v in range(2 * r)]
    return canonical([swap[a], swap[b]] for a, b in d)


# ----- the public interface -------------------------------------------------------------------
def unrank(level: AlgebraLevel, i: int) -> Blocks:
    """The basis diagram of rank i (0 ≤ i < count(level)); UserError otherwise."""
    _check_rank(level, i)
    r, kind = level.vertices, level.kind
    if kind == "partition":
        if level.half and r:
            return _rgs_blocks(_rgs_unrank(i, 2 * r - 1), extra=r - 1)
        return _rgs_blocks(_rgs_unrank(i, 2 * r))
    if kind == "brauer":
        return _matching_unrank(i, 2 * r)
    if kind == "temperley-lieb":
        return _planar_unrank(i, r)
    d = _perm_blocks(_perm_unrank(i, r), r)
    return _flip(d, level) if kind == "walled-brauer" else d


def rank(level: AlgebraLevel, d: Blocks, check: bool = True) -> int:
    """The rank of a basis diagram; UserError when it is not a diagram of the level's basis
    (``check=False``: the caller knows it is, e.g. a product of basis diagrams)."""
    r, kind = level.vertices, level.kind
    check_size(r, level.name)
    if check and not in_basis(d, level):
        raise UserError(f"{format_diagram(d, r)[:200]} is not a basis diagram of {level.name}")
    if kind == "partition":
        return _rgs_rank(d, 2 * r - 1 if level.half and r else 2 * r)
    if kind == "brauer":
        return _matching_rank(d, 2 * r)
    if kind == "temperley-lieb":
        return _planar_rank(d, r)
    if kind == "walled-brauer":
        d = _flip(d, level)
    return _perm_rank([b - r for _, b in d])


def iter_basis(level: AlgebraLevel, start: int = 0) -> Iterator[Blocks]:
    """The basis diagrams from rank ``start`` to the last, lazily (nothing is listed ahead)."""
    total = count(level)
    if start >= total:
        return
    _check_rank(level, start)
    r, kind = level.vertices, level.kind
    if kind == "partition":
        if level.half and r:
            for a in _iter_rgs(2 * r - 1, start):
                yield _rgs_blocks(a, extra=r - 1)
        elif start == 0:
            yield from _iter_partitions(2 * r)
        else:
            for a in _iter_rgs(2 * r, start):
                yield _rgs_blocks(a)
    elif kind == "brauer" and start == 0 and r:
        yield from _iter_matchings(list(range(2 * r)), ())
    elif kind == "symmetric-group" and start == 0:
        for sigma in permutations(range(r)):
            yield _perm_blocks(sigma, r)
    else:
        for i in range(start, total):
            yield unrank(level, i)
