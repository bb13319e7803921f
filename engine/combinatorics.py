"""Classical counting sequences, exact.

Sources: Stanley, *Enumerative Combinatorics* vol. 1 (2nd ed.), 1.9 (Stirling numbers of the
second kind, OEIS A008277; Bell numbers, OEIS A000110); Graham, Knuth, Patashnik, *Concrete
Mathematics*, 6.1 (explicit formula S(k,t) = (1/t!) Σ_j (−1)^{t−j} C(t,j) j^k).
"""

from __future__ import annotations

import threading
from functools import lru_cache
from math import comb, factorial


@lru_cache(maxsize=4096)
def stirling2_row(k: int, upto: int) -> tuple[int, ...]:
    """(S(k,0), ..., S(k,upto)) by the explicit formula; fast for huge k and small upto."""
    row = []
    for t in range(upto + 1):
        if t > k:
            row.append(0)
            continue
        total = 0
        for j in range(t + 1):
            term = comb(t, j) * j**k  # 0**0 == 1
            total += -term if (t - j) % 2 else term
        row.append(total // factorial(t))
    return tuple(row)


def stirling2(k: int, t: int) -> int:
    """S(k, t): set partitions of a k-set into t blocks (OEIS A008277)."""
    if t < 0:
        return 0
    return stirling2_row(k, t)[t]


#: B(0), B(1), ... as far as computed, and the last row of the Bell triangle (levels ask for
#: B(2k) level after level: continuing the triangle makes all of them cost what the last one does)
_BELLS: list[int] = [1]
_BELL_ROW: list[int] = [1]
_BELL_LOCK = threading.Lock()


def bell(k: int) -> int:
    """Bell number B(k), the number of set partitions of a k-set (OEIS A000110),
    by the Bell triangle (Aitken's array), continued from the last row computed."""
    global _BELL_ROW
    if k < len(_BELLS):
        return _BELLS[k]
    with _BELL_LOCK:
        row = _BELL_ROW
        while len(_BELLS) <= k:
            new = [row[-1]]
            for x in row:
                new.append(new[-1] + x)
            row = _BELL_ROW = new
            _BELLS.append(row[0])
    return _BELLS[k]


def double_factorial_odd(k: int) -> int:
    """(2k−1)!! = 1·3·5···(2k−1), the number of perfect matchings of 2k points (OEIS A001147)."""
    result = 1
    for j in range(1, 2 * k, 2):
        result *= j
    return result


def catalan(n: int) -> int:
    """C(2n, n)/(n+1) (OEIS A000108)."""
    return comb(2 * n, n) // (n + 1)
