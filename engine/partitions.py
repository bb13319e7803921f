"""Integer partitions: the value type, its notation, and the classical counts.

A partition is a plain ``tuple`` of positive ints in weakly decreasing order;
the empty partition is ``()``.  Plain tuples keep the hot loops of the diagram
fast (hashing and comparing a tuple is done in C).

Sources: Macdonald, *Symmetric Functions and Hall Polynomials* (2nd ed., 1995),
ch. I.1 (conjugate, corners, contents, hooks); Sagan, *The Symmetric Group*
(2nd ed., 2001), 3.10 (hook length formula of Frame, Robinson and Thrall, 1954);
Stanley, *Enumerative Combinatorics* vol. 2, 7.16.3 (Aitken's determinant for
skew standard tableaux).
"""

from __future__ import annotations

import re
from fractions import Fraction
from functools import lru_cache
from math import factorial
from typing import Iterator

from engine.errors import UserError
from engine.numbers_in import explain_non_digits, is_digits, quote

Partition = tuple[int, ...]

_SEPARATORS = re.compile(r"[\s,]+")


class PartitionError(UserError):
    """A string that does not denote a partition."""


#: digits of one part (no tower reaches a partition with a part of 10^18 boxes)
MAX_PART_DIGITS = 18
#: characters of a partition's text (a partition of a usable size is far shorter)
MAX_PARTITION_TEXT = 100_000


def parse_partition(text: str) -> Partition:
    """Read ``(3,1,1)``, ``3,1,1``, ``3 1 1`` or ``()``; raise PartitionError otherwise.  Parts are
    ASCII digits (``engine.numbers_in``), their length checked before conversion."""
    if len(text) > MAX_PARTITION_TEXT:
        raise PartitionError(f"{quote(text)} is too long for a partition (at most {MAX_PARTITION_TEXT:,} characters)")
    body = text.strip()
    if body.startswith("(") and body.endswith(")"):
        body = body[1:-1].strip()
    elif "(" in body or ")" in body:
        raise PartitionError(f"unbalanced parentheses in partition {quote(text)}")
    if not body:
        return ()
    parts: list[int] = []
    for piece in _SEPARATORS.split(body):
        if not piece:
            continue
        if not is_digits(piece):
            raise PartitionError(
                f"{quote(text)} is not a partition: {quote(piece)} is not a whole number "
                f"({explain_non_digits(piece)}; write e.g. (3,1,1), 3,1,1 or 3 1 1)"
            )
        if len(piece) > MAX_PART_DIGITS:
            raise PartitionError(f"{quote(text)} is not a partition of a usable size: a part has {len(piece):,} digits")
        parts.append(int(piece))
    while parts and parts[-1] == 0:
        parts.pop()
    if any(p <= 0 for p in parts):
        raise PartitionError(f"{quote(text)} is not a partition: zero part before a positive one")
    if any(a < b for a, b in zip(parts, parts[1:])):
        raise PartitionError(f"{quote(text)} is not a partition: parts must be weakly decreasing")
    return tuple(parts)


def format_partition(p: Partition) -> str:
    """``(3,1,1)``; the empty partition is ``()``."""
    return "(" + ",".join(map(str, p)) + ")"


def size(p: Partition) -> int:
    return sum(p)


def conjugate(p: Partition) -> Partition:
    """The transpose λ' (Macdonald I.1): λ'_j = #{i : λ_i ≥ j}."""
    if not p:
        return ()
    return tuple(sum(1 for part in p if part >= j) for j in range(1, p[0] + 1))


def removable_corners(p: Partition) -> list[int]:
    """Rows i (0-based) whose last box can be removed leaving a partition."""
    n = len(p)
    return [i for i in range(n) if i == n - 1 or p[i] > p[i + 1]]


def addable_corners(p: Partition) -> list[int]:
    """Rows i (0-based, possibly len(p)) where a box can be added leaving a partition."""
    return [i for i in range(len(p) + 1) if i == 0 or p[i - 1] > (p[i] if i < len(p) else 0)]


def remove_box(p: Partition, row: int) -> Partition:
    if p[row] == 1:
        return p[:row] + p[row + 1 :]
    return p[:row] + (p[row] - 1,) + p[row + 1 :]


def smaller_by_one_box(p: Partition) -> list[Partition]:
    """Every partition obtained by removing one corner box, top row first."""
    last = len(p) - 1
    out = []
    for r in range(last):
        if p[r] > p[r + 1]:
            out.append(p[:r] + (p[r] - 1,) + p[r + 1 :])
    if last >= 0:
        out.append(p[:last] if p[last] == 1 else p[:last] + (p[last] - 1,))
    return out


def larger_by_one_box(p: Partition) -> list[Partition]:
    """Every partition obtained by adding one box at an addable corner, top row first."""
    if not p:
        return [(1,)]
    out = [(p[0] + 1,) + p[1:]]
    for r in range(1, len(p)):
        if p[r - 1] > p[r]:
            out.append(p[:r] + (p[r] + 1,) + p[r + 1 :])
    out.append(p + (1,))
    return out


def boxes(p: Partition) -> Iterator[tuple[int, int]]:
    """Cells (i, j), 0-based row and column."""
    for i, part in enumerate(p):
        for j in range(part):
            yield i, j


def contents(p: Partition) -> list[int]:
    """Content j − i of every cell (Macdonald I.1, Example 1.1)."""
    return [j - i for i, j in boxes(p)]


def hook_lengths(p: Partition) -> list[int]:
    """Hook length λ_i − j + λ'_j − i − 1 of every cell (0-based i, j)."""
    c = conjugate(p)
    return [p[i] - j + c[j] - i - 1 for i, j in boxes(p)]


@lru_cache(maxsize=1 << 20)
def standard_tableaux_count(p: Partition) -> int:
    """f^λ, the number of standard Young tableaux of shape λ: the dimension of the Specht module S^λ.

    Computed by Frobenius's formula f^λ = n!·Π_{i<j}(l_i − l_j)/Π_i l_i!, l_i = λ_i + ℓ − i
    (Fulton and Harris, *Representation Theory*, (4.11)), which is the hook length formula
    n!/Π hooks (Frame, Robinson, Thrall 1954; Sagan, *The Symmetric Group*, Thm 3.10.2) with
    O(ℓ²) rather than O(n) factors.
    """
    ell = len(p)
    beta = [p[i] + ell - 1 - i for i in range(ell)]
    numerator = 1
    for i in range(ell):
        bi = beta[i]
        for j in range(i + 1, ell):
            numerator *= bi - beta[j]
    denominator = 1
    for b in beta:
        denominator *= factorial(b)
    return factorial(sum(p)) * numerator // denominator


def hook_length_product(p: Partition) -> int:
    """Π of the hook lengths of λ (so f^λ = |λ|!/this, Frame–Robinson–Thrall)."""
    prod = 1
    for h in hook_lengths(p):
        prod *= h
    return prod


def contains(outer: Partition, inner: Partition) -> bool:
    return len(inner) <= len(outer) and all(a >= b for a, b in zip(outer, inner))


@lru_cache(maxsize=200_000)
def skew_tableaux_count(outer: Partition, inner: Partition) -> int:
    """f^{λ/μ}, the number of standard Young tableaux of skew shape λ/μ.

    Aitken's determinant (Stanley, EC2, Cor. 7.16.3):
    f^{λ/μ} = |λ/μ|! · det[ 1/(λ_i − μ_j − i + j)! ]_{i,j ≤ ℓ(λ)}, with 1/m! = 0 for m < 0.
    Zero when μ is not contained in λ.
    """
    if not contains(outer, inner):
        return 0
    n = sum(outer) - sum(inner)
    if n == 0:
        return 1
    if not inner:
        return standard_tableaux_count(outer)
    ell = len(outer)
    mu = list(inner) + [0] * (ell - len(inner))
    matrix = [
        [
            Fraction(1, factorial(outer[i] - mu[j] - i + j)) if outer[i] - mu[j] - i + j >= 0 else Fraction(0)
            for j in range(ell)
        ]
        for i in range(ell)
    ]
    det = _determinant(matrix)
    value = det * factorial(n)
    assert value.denominator == 1
    return int(value)


def _determinant(rows: list[list[Fraction]]) -> Fraction:
    """Exact Gaussian elimination over the rationals."""
    a = [row[:] for row in rows]
    n = len(a)
    det = Fraction(1)
    for col in range(n):
        pivot = next((r for r in range(col, n) if a[r][col] != 0), None)
        if pivot is None:
            return Fraction(0)
        if pivot != col:
            a[col], a[pivot] = a[pivot], a[col]
            det = -det
        det *= a[col][col]
        inv = 1 / a[col][col]
        for r in range(col + 1, n):
            factor = a[r][col] * inv
            if factor:
                for c in range(col, n):
                    a[r][c] -= factor * a[col][c]
    return det


def partitions_of(n: int, max_part: int | None = None, max_length: int | None = None) -> Iterator[Partition]:
    """All partitions of n in reverse lexicographic order ((n) first), optionally bounded."""
    if max_part is None:
        max_part = n
    if max_length is None:
        max_length = n

    def rec(remaining: int, largest: int, length_left: int) -> Iterator[Partition]:
        if remaining == 0:
            yield ()
            return
        if length_left == 0:
            return
        for first in range(min(remaining, largest), 0, -1):
            if first * length_left < remaining:
                break
            for rest in rec(remaining - first, first, length_left - 1):
                yield (first,) + rest

    yield from rec(n, max_part, max_length)


@lru_cache(maxsize=8192)
def partition_count(n: int, max_part: int | None = None, max_length: int | None = None) -> int:
    """Number of partitions of n with parts ≤ max_part and at most max_length parts
    (OEIS A000041 when unbounded), by the usual dynamic programme over part sizes
    (Andrews, *The Theory of Partitions*, ch. 1 and 3)."""
    if n < 0:
        return 0
    k = n if max_part is None else min(max_part, n)
    if max_length is None or max_length >= n:
        ways = [1] + [0] * n
        for part in range(1, k + 1):
            for total in range(part, n + 1):
                ways[total] += ways[total - part]
        return ways[n]
    # dp[l][s]: partitions of s into exactly l parts, all ≤ the parts seen so far
    dp = [[0] * (n + 1) for _ in range(max_length + 1)]
    dp[0][0] = 1
    for part in range(1, k + 1):
        for length in range(1, max_length + 1):
            row, shorter = dp[length], dp[length - 1]
            for total in range(part, n + 1):
                row[total] += shorter[total - part]
    return sum(dp[length][n] for length in range(max_length + 1))
