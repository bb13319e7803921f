"""Exact linear algebra for the kernel of the action: ranks modulo primes and rational reconstruction.

A rank modulo a prime p of an integer matrix is at most its rational rank (a nonzero minor mod p is
a nonzero minor), and so is the rank of A·S for any matrix S; with a proven upper bound (Σm² of
the Bratteli diagram: the image of the algebra lies in the centralizer) equality proves the rank.
Rational reconstruction of a residue modulo p by the extended Euclidean algorithm (Wang's method;
von zur Gathen–Gerhard, *Modern Computer Algebra*, §5.10) turns a kernel vector mod p into a
candidate over Q, which is then checked exactly.
"""

from __future__ import annotations

from math import gcd, isqrt
from typing import Sequence

#: two primes just below 2^62 (checked by sympy.isprime in the tests)
PRIMES = (4611686018427387847, 4611686018427387817)


def matrix_mod(rows: int, cols: int, cells: dict[int, int], p: int):
    """A flint nmod_mat of the given size from {row·cols + col: value}."""
    from flint import nmod_mat

    flat = [0] * (rows * cols)
    for key, value in cells.items():
        flat[key] = value % p
    return nmod_mat(rows, cols, flat, p)


def rank_mod(rows: int, cols: int, cells: dict[int, int], p: int) -> int:
    if rows == 0 or cols == 0:
        return 0
    return matrix_mod(rows, cols, cells, p).rank()


def rational(residue: int, p: int) -> tuple[int, int] | None:
    """(a, b) with a ≡ residue·b (mod p), |a|, b ≤ sqrt(p/2), or None (Wang's reconstruction)."""
    bound = isqrt(p // 2)
    r0, r1 = p, residue % p
    s0, s1 = 0, 1
    while r1 > bound:
        q = r0 // r1
        r0, r1 = r1, r0 - q * r1
        s0, s1 = s1, s0 - q * s1
    if s1 == 0 or abs(s1) > bound:
        return None
    if s1 < 0:
        r1, s1 = -r1, -s1
    if gcd(r1, s1) != 1:
        return None
    return r1, s1


def primitive(values: Sequence[tuple[int, int]]) -> list[int] | None:
    """Fractions a/b → the primitive integer vector on the same line (first nonzero positive)."""
    from math import lcm

    denominator = 1
    for _, b in values:
        denominator = lcm(denominator, b)
    ints = [a * (denominator // b) for a, b in values]
    g = 0
    for v in ints:
        g = gcd(g, v)
    if g == 0:
        return None
    ints = [v // g for v in ints]
    first = next(v for v in ints if v)
    return [-v for v in ints] if first < 0 else ints


def crt(r1: int, p1: int, r2: int, p2: int) -> int:
    """The residue modulo p1·p2 that is r1 mod p1 and r2 mod p2."""
    return (r1 + p1 * ((r2 - r1) * pow(p1, -1, p2) % p2)) % (p1 * p2)
