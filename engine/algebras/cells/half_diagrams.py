"""Half diagrams: the top halves of basis diagrams, which index the cell modules' bases.

A diagram of an algebra in the tower cuts into a top half (how the top vertices are joined among
themselves), a bottom half, and a bijection between the *propagating* blocks (those meeting both
rows) of the two halves (the 1996 paper that defined cellular algebras, §4–§6;
a 2005 survey of partition algebras, §3, for those).
A half diagram on r vertices 0..r−1 is ``(blocks, marks)``: a set partition of the vertices (blocks
ascending, sorted by their smallest vertex) and, for each block, its mark:

- ``UNMARKED`` (−1): the block does not propagate;
- a colour 0, 1, ...: the block propagates; blocks of one colour are permuted among themselves by
  the algebra (one colour, except walled Brauer: colour 0 for the letter v, 1 for d);
- ``FIXED`` (−2): at a half level k+1/2 of the partition tower, the block of vertex k+1, which is
  joined to (k+1)' in every diagram and so propagates always, without being permuted.

Which half diagrams each algebra has (``half_diagrams(level, counts)``, ``counts[c]`` propagating
blocks of colour c):

| kind | half diagrams |
|---|---|
| partition | any set partition of 1..k, any ``counts[0]`` blocks marked |
| partition, half level | set partitions of 1..k+1, the block of k+1 FIXED, ``counts[0]`` other blocks marked |
| brauer | partial matchings: pairs (arcs) and marked single vertices |
| temperley-lieb | planar partial matchings, no arc above a single vertex |
| symmetric-group | every vertex a marked single vertex |
| walled-brauer | arcs join a v and a d; single v's colour 0, single d's colour 1 |

Listed in a fixed order: by the blocks (restricted growth string order for set partitions), then
the marked set in lexicographic order.
"""

from __future__ import annotations

from itertools import combinations
from math import comb
from typing import TYPE_CHECKING, Iterator

from engine.combinatorics import stirling2

if TYPE_CHECKING:
    from engine.capabilities import AlgebraLevel

UNMARKED = -1
FIXED = -2
HalfDiagram = tuple[tuple[tuple[int, ...], ...], tuple[int, ...]]


def set_partitions(r: int) -> Iterator[tuple[tuple[int, ...], ...]]:
    """Set partitions of 0..r−1 by restricted growth strings, in lexicographic order of the string."""
    if r == 0:
        yield ()
        return
    word = [0] * r

    def rec(i: int, top: int) -> Iterator[tuple[tuple[int, ...], ...]]:
        if i == r:
            blocks: list[list[int]] = [[] for _ in range(top + 1)]
            for v, b in enumerate(word):
                blocks[b].append(v)
            yield tuple(tuple(b) for b in blocks)
            return
        for b in range(top + 2):
            word[i] = b
            yield from rec(i + 1, max(top, b))

    word[0] = 0
    yield from rec(1, 0)


def partial_matchings(r: int, allowed=lambda a, b: True) -> Iterator[tuple[tuple[int, ...], ...]]:
    """Set partitions of 0..r−1 into pairs and singletons (pairs {a, b} with ``allowed(a, b)``),
    the smallest vertex decided first: single before paired, partners ascending."""
    used = [False] * r

    def rec(i: int, blocks: list[tuple[int, ...]]) -> Iterator[tuple[tuple[int, ...], ...]]:
        while i < r and used[i]:
            i += 1
        if i == r:
            yield tuple(sorted(blocks))
            return
        used[i] = True
        blocks.append((i,))
        yield from rec(i + 1, blocks)
        blocks.pop()
        for j in range(i + 1, r):
            if not used[j] and allowed(i, j):
                used[j] = True
                blocks.append((i, j))
                yield from rec(i + 1, blocks)
                blocks.pop()
                used[j] = False
        used[i] = False

    yield from rec(0, [])


def matchings_with_singles(r: int, t: int, planar: bool = False) -> Iterator[tuple[tuple[int, ...], ...]]:
    """The partial matchings of 0..r−1 with exactly t singletons (planar: no two arcs cross and no
    arc passes over a singleton), in the order of ``partial_matchings`` filtered, but pruned: a
    branch stops as soon as the singletons can no longer come out at t."""
    used = [False] * r
    blocks: list[tuple[int, ...]] = []

    def rec(i: int, left: int, singles: int, ends: tuple[int, ...]) -> Iterator[tuple[tuple[int, ...], ...]]:
        # left: unused vertices from i on; ends: the right ends of the arcs around i (planar)
        while i < r and used[i]:
            i += 1
        if i == r:
            yield tuple(sorted(blocks))
            return
        if planar:
            ends = tuple(e for e in ends if e > i)
        used[i] = True
        if singles and not ends:
            blocks.append((i,))
            yield from rec(i + 1, left - 1, singles - 1, ends)
            blocks.pop()
        if left - 2 >= singles:
            stop = min(ends, default=r) if planar else r
            for j in range(i + 1, stop):
                if used[j] or (planar and (j - i) % 2 == 0):
                    continue
                used[j] = True
                blocks.append((i, j))
                yield from rec(i + 1, left - 2, singles, ends + (j,) if planar else ends)
                blocks.pop()
                used[j] = False
        used[i] = False

    if 0 <= t <= r and (r - t) % 2 == 0:
        yield from rec(0, r, t, ())


def half_diagrams(level: "AlgebraLevel", counts: tuple[int, ...]) -> Iterator[HalfDiagram]:
    """The half diagrams of the level's algebra with ``counts[c]`` propagating blocks of colour c."""
    r, kind = level.vertices, level.kind
    if kind == "partition":
        (t,) = counts
        for blocks in set_partitions(r):
            if level.half:
                fixed = next(b for b, block in enumerate(blocks) if r - 1 in block)
                others = [b for b in range(len(blocks)) if b != fixed]
                for chosen in combinations(others, t):
                    marks = [UNMARKED] * len(blocks)
                    marks[fixed] = FIXED
                    for b in chosen:
                        marks[b] = 0
                    yield blocks, tuple(marks)
            else:
                for chosen in combinations(range(len(blocks)), t):
                    marks = [UNMARKED] * len(blocks)
                    for b in chosen:
                        marks[b] = 0
                    yield blocks, tuple(marks)
        return
    if kind == "walled-brauer":
        word = level.word
        for blocks in partial_matchings(r, lambda a, b: word[a] != word[b]):
            marks = tuple(UNMARKED if len(b) == 2 else (0 if word[b[0]] == "v" else 1) for b in blocks)
            if tuple(marks.count(c) for c in range(2)) == counts:
                yield blocks, marks
        return
    (t,) = counts
    if kind == "symmetric-group":
        if t == r:
            yield tuple((v,) for v in range(r)), (0,) * r
        return
    for blocks in matchings_with_singles(r, t, planar=kind == "temperley-lieb"):
        yield blocks, tuple(UNMARKED if len(b) == 2 else 0 for b in blocks)


def count_half_diagrams(level: "AlgebraLevel", counts: tuple[int, ...]) -> int:
    """The number of half diagrams by formula (tested against the listing).

    partition: Σ_b S(k, b)·C(b, t) (S the Stirling numbers of the second kind, OEIS A008277);
    half level: Σ_b S(k+1, b)·C(b−1, t); brauer: C(k, t)·(k−t−1)!!; temperley-lieb: the ballot
    number C(k, j) − C(k, j−1), j = (k−t)/2 (OEIS A008315); symmetric-group: 1 when t = k;
    walled Brauer of r v's and s d's with j arcs: C(r, j)·C(s, j)·j!."""
    r, kind = level.vertices, level.kind
    if kind == "partition":
        (t,) = counts
        if level.half:
            return sum(stirling2(r, b) * comb(b - 1, t) for b in range(1, r + 1))
        return sum(stirling2(r, b) * comb(b, t) for b in range(r + 1))
    if kind == "walled-brauer":
        v, d = level.word.count("v"), level.word.count("d")
        a, b = counts
        j = v - a
        if j < 0 or d - b != j:
            return 0
        from math import factorial
        return comb(v, j) * comb(d, j) * factorial(j)
    (t,) = counts
    if t > r or (r - t) % 2 and kind != "symmetric-group":
        return 0
    if kind == "symmetric-group":
        return int(t == r)
    j = (r - t) // 2
    if kind == "temperley-lieb":
        return comb(r, j) - (comb(r, j - 1) if j else 0)
    odd = 1
    for m in range(1, 2 * j, 2):
        odd *= m
    return comb(r, t) * odd
