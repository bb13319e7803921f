"""How many nodes a level of the mixed tower has, counted exactly (for its size guard).

A level with r letters v and s letters d holds the pairs (α, β) with |α| = r − t, |β| = s − t for
some t ≥ 0 and ℓ(α) + ℓ(β) ≤ N (Koike, Adv. Math. 74, 1989, §2; Stembridge, J. Combin. Theory A
46, 1987).  With G(x, y) the pairs of sizes x and y,

    nodes(r, s) = Σ_{t=0}^{min(r,s)} G(r − t, s − t),    G(x, y) = Σ_{a=0}^{N} E(x, a) · B(y, N − a),

B(m, ℓ) the partitions of m into at most ℓ parts and E(x, a) = B(x, a) − B(x, a − 1) those into
exactly a parts; B by the recurrence B(m, ℓ) = B(m, ℓ − 1) + B(m − ℓ, ℓ) (Andrews, *The Theory of
Partitions*, ch. 1).  The sums along each diagonal r − s are kept, so a word's levels cost one G
each where the diagonal continues.  Counting P_N(x)·P_N(y) instead (each of ℓ(α), ℓ(β) ≤ N on its
own) overcounts without bound when N is small: min(r, s) + 1 against 1 for N = 1, r = s.
"""

from __future__ import annotations

import threading

#: elementary steps (additions, products) one PairCounts may spend; past them ``level`` says None
BUDGET = 400_000


class PairCounts:
    def __init__(self, n: int, budget: int = BUDGET) -> None:
        self.n = n
        self.budget = budget
        self.work = 0
        #: _columns[m][ℓ] = B(m, ℓ) for ℓ = 0..min(N, m) (B(m, ℓ) = B(m, m) past m)
        self._columns: list[list[int]] = []
        #: diagonal d ≥ 0 → [Σ_{u' ≤ u} G(u' + d, u') for u = 0, 1, ...]
        self._diagonals: dict[int, list[int]] = {}
        self._lock = threading.Lock()  # the explorer may estimate from two threads

    def at_most(self, m: int, parts: int) -> int:
        """B(m, parts): partitions of m into at most ``parts`` parts (parts ≤ N)."""
        while len(self._columns) <= m:
            k = len(self._columns)
            column = [1 if k == 0 else 0]
            for length in range(1, min(self.n, k) + 1):
                column.append(column[-1] + self.at_most(k - length, length))
            self._columns.append(column)
            self.work += len(column)
        column = self._columns[m]
        return column[min(parts, len(column) - 1)]

    def exactly(self, m: int, parts: int) -> int:
        if parts == 0:
            return 1 if m == 0 else 0
        return self.at_most(m, parts) - self.at_most(m, parts - 1)

    def pairs(self, x: int, y: int) -> int:
        """G(x, y): pairs (α ⊢ x, β ⊢ y) with ℓ(α) + ℓ(β) ≤ N."""
        n = self.n
        if x + y <= n:  # no pair is too long
            return self.at_most(x, x) * self.at_most(y, y)
        if x > y:
            x, y = y, x  # G is symmetric; sum over the lengths of the smaller one
        top = min(n, x)
        self.work += top + 1
        return sum(self.exactly(x, a) * self.at_most(y, n - a) for a in range(top + 1))

    def level(self, r: int, s: int) -> int | None:
        """nodes(r, s), or None once the budget is spent."""
        d, u = abs(r - s), min(r, s)
        with self._lock:
            sums = self._diagonals.setdefault(d, [])
            while len(sums) <= u:
                if self.work > self.budget:
                    return None
                k = len(sums)
                sums.append((sums[-1] if sums else 0) + self.pairs(k + d, k))
            return sums[u]
