"""Towers whose nodes are partitions and whose steps add (and maybe remove) one box.

Shared by ``general-linear`` (add a box: the Pieri rule V_λ ⊗ V = ⊕ V_{λ+□}, Fulton and Harris,
*Representation Theory*, 6.1 and A.7), ``orthogonal`` and ``symplectic`` (add or remove a box,
both ends admissible: the product with V by the Newell–Littlewood rule and King's modification
rules, King, J. Math. Phys. 12, 1971; the Bratteli diagrams of the Brauer algebras, Wenzl,
*On the structure of Brauer's centralizer algebras*, Ann. of Math. 128, 1988; Goodman and
Wallach, *Symmetry, Representations, and Invariants*, 2009, ch. 10).

A subclass says which partitions are admissible (label modules of its group), whether a step
may remove a box, and what a node's dimension is; the rest (labels, order, parents, the size
estimate) is here.
"""

from __future__ import annotations

from math import comb, isqrt
from typing import Sequence

from engine.errors import SpecError
from engine.partitions import (
    Partition,
    format_partition,
    larger_by_one_box,
    parse_partition,
    smaller_by_one_box,
)
from engine.specs import int_param
from engine.capabilities import AlgebraLevel, Capability, DiagramAlgebra, Encodings, SizeGuard
from engine.tower import Edge, Tower

#: the largest N accepted for dim V
MAX_N = 1000

#: estimates stop counting once past this many edges (far over any limit)
ESTIMATE_CAP = 10**15
#: up to this level estimates sum level by level; past it they bound the last level times the count
_SUMMED_LEVELS = 20_000


def bounded_partition_counts(limit: int, rows: int, cap: int = ESTIMATE_CAP) -> list[int]:
    """[number of partitions of j with at most ``rows`` parts, for j = 0..limit], each capped at
    ``cap``; by the dynamic programme over part sizes 1..rows (conjugation turns "at most rows
    parts" into "parts at most rows"; Andrews, *The Theory of Partitions*, ch. 1)."""
    ways = [1] + [0] * limit
    for part in range(1, min(rows, limit) + 1):
        for total in range(part, limit + 1):
            value = ways[total] + ways[total - part]
            ways[total] = value if value < cap else cap
    return ways


class CountTable:
    """``bounded_partition_counts`` computed lazily: first to 512, then (only when asked beyond,
    which happens when the counts grow slowly, i.e. few rows) to the end, so that an estimate that
    reaches the cap early never pays for a long table."""

    _FIRST = 512

    def __init__(self, limit: int, rows: int) -> None:
        self.limit = limit
        self.rows = rows
        self._table = bounded_partition_counts(min(limit, self._FIRST), rows)

    def __getitem__(self, j: int) -> int:
        if j >= len(self._table):
            self._table = bounded_partition_counts(self.limit, self.rows)
        return self._table[j]


def orthogonal_counts(n: int, limit: int, cap: int = ESTIMATE_CAP) -> list[int] | None:
    """[partitions λ of j with λ'_1 + λ'_2 ≤ n, for j = 0..limit] (the labels of O(n)-modules),
    or None when the table would cost too much to make.

    With s = λ'_2 rows of length ≥ 2 and r = λ'_1 rows, removing the first column leaves a
    partition with exactly s parts, of j − r: so the count is [j ≤ n] + Σ_{s ≥ 1} Σ_{r=s}^{n−s}
    P_{≤s}(j − r − s), P_{≤s}(m) the partitions of m into at most s parts (Andrews, *The Theory
    of Partitions*, ch. 1), a difference of prefix sums for each s."""
    top = min(n // 2, limit // 2)
    if top * (limit + 1) > 3_000_000:
        return None
    out = [1 if j <= n else 0 for j in range(limit + 1)]
    ways = [1] + [0] * limit  # P_{≤s}(m), built up part size by part size (conjugation)
    for s in range(1, top + 1):
        for total in range(s, limit + 1):
            value = ways[total] + ways[total - s]
            ways[total] = value if value < cap else cap
        prefix = [0] * (limit + 2)  # prefix[m + 1] = Σ_{m' ≤ m} P_{≤s}(m')
        for m in range(limit + 1):
            prefix[m + 1] = min(prefix[m] + ways[m], cap)
        for j in range(2 * s, limit + 1):
            high, low = j - 2 * s, j - n - 1
            value = prefix[high + 1] - (prefix[low + 1] if low >= 0 else 0)
            out[j] = min(out[j] + value, cap)
    return out


def vector_dimension(family: str, params: dict[str, str], minimum: int = 1) -> int:
    """The spec key ``n`` (dim V), between ``minimum`` and MAX_N; a SpecError otherwise."""
    n = int_param(family, params, "n", minimum=minimum)
    if n > MAX_N:
        raise SpecError(f"{family}: n={n} is too large (at most {MAX_N})")
    return n


def corner_bound(size: int) -> int:
    """At most this many boxes can be added to (or removed from) a partition of ``size``:
    a partition with c removable corners has size ≥ c(c+1)/2."""
    return isqrt(2 * size) + 2


class OneBoxTower(Tower):
    """A tower of partitions; each step adds a box (and removes one, when ``removes``)."""

    #: whether a step may also remove a box (O(N), Sp(2M)) or only adds one (GL_N)
    removes: bool = True

    def __init__(self, spec: str, n: int, rows: int) -> None:
        super().__init__(spec)
        #: dim V
        self.n = n
        #: a bound on the number of rows of an admissible partition (used by the estimate)
        self.rows = rows

    def admissible(self, lam: Partition) -> bool:
        """Whether λ labels a module of the group (e.g. at most N rows)."""
        raise NotImplementedError

    def admissible_text(self) -> str:
        """The rule of ``admissible`` in words, for error messages."""
        raise NotImplementedError

    def step_key(self, index: int) -> int:
        return 0  # every step tensors with the same V

    def space_key(self, index: int) -> int:
        # O, Sp: level k holds partitions of sizes ≡ k (mod 2), each level containing the one two
        # below; GL: level k holds the partitions of k, its own space
        return index % 2 if self.removes else index

    def tensor_dimension(self, index: int) -> int:
        return self.n**index

    # ----- graph ----------------------------------------------------------------------------
    def root(self) -> Partition:
        return ()

    def children(self, index: int, node: Partition) -> Sequence[Edge]:
        ok = self.admissible
        out: list[Edge] = [(lam, 1) for lam in larger_by_one_box(node) if ok(lam)]
        if self.removes:
            out.extend((mu, 1) for mu in smaller_by_one_box(node))
        return out

    def parents(self, index: int, node: Partition) -> Sequence[Edge]:
        if index == 0:
            return []
        if not self.removes:
            return [(mu, 1) for mu in smaller_by_one_box(node)]
        return self.children(index - 1, node)  # the step graph is symmetric

    def on_level(self, index: int, lam: Partition) -> bool:
        """Whether λ has a path to level ``index`` (the rule the tests hold path counting to)."""
        size = sum(lam)
        if not self.admissible(lam):
            return False
        if not self.removes:
            return size == index
        return size <= index and (index - size) % 2 == 0

    # ----- capabilities ---------------------------------------------------------------------
    #: path encodings of the family, its default first
    encodings: tuple[str, ...] = ("updown", "labels")

    def capabilities(self) -> list[Capability]:
        found: list[Capability] = [SizeGuard(self.estimate_edges, self.estimate_nodes), Encodings(self.encodings)]
        if type(self).algebra_level is not OneBoxTower.algebra_level:
            found.append(DiagramAlgebra(self.algebra_level, self.first_unfaithful()))
        return found

    def algebra_level(self, index: int) -> AlgebraLevel:
        """The diagram algebra at a level (families with one override this)."""
        raise NotImplementedError

    def first_unfaithful(self) -> int | None:
        """The first level index where the algebra stops acting faithfully (families override)."""
        raise NotImplementedError

    def generic_dimension(self, index: int) -> int:
        return self.algebra_level(index).dimension

    def algebra_name(self, index: int) -> str:
        return self.algebra_level(index).name

    # ----- size -----------------------------------------------------------------------------
    def size_counts(self, upto: int) -> "CountTable | list[int]":
        """The admissible partitions of each size j ≤ upto (an upper count): by default those with
        at most ``rows`` rows, which is exact for GL_N and Sp(2M)."""
        return CountTable(upto, self.rows)

    def _estimates(self, upto: int) -> tuple[int, int]:
        """(edges, nodes) over levels 0..upto: Σ over levels of (nodes on the level) × (a bound on
        the steps out of one node: at most rows+1 addable and rows removable corners, and at most
        √(2k)+2 of either).  Nodes on level k: the admissible partitions of k (GL), or of j ≤ k
        with j ≡ k (mod 2) (O, Sp); past level 20000 the last level's bound times the number of
        levels, with the compositions bound C(k+rows−1, rows−1) for the count."""
        factor = 2 if self.removes else 1
        if upto > _SUMMED_LEVELS:
            count = self.level_node_count(upto)
            nodes = count * (upto // 2 + 1 if self.removes else 1)
            degree = factor * min(self.rows + 1, corner_bound(upto))
            return min((upto + 1) * nodes * degree, ESTIMATE_CAP), min((upto + 1) * nodes, ESTIMATE_CAP)
        counts = self.size_counts(upto)
        total = all_nodes = 0
        level_nodes = [0, 0]  # running Σ_{j ≤ k, j ≡ k} counts[j], by parity
        for k in range(upto + 1):
            if self.removes:
                level_nodes[k % 2] += counts[k]
                nodes = level_nodes[k % 2]
            else:
                nodes = counts[k]
            all_nodes += nodes
            if k < upto:  # the edges out of the top level are not walked
                total += nodes * factor * min(self.rows + 1, corner_bound(k))
            if total >= ESTIMATE_CAP:
                return ESTIMATE_CAP, min(all_nodes, ESTIMATE_CAP)
        return total, all_nodes

    def level_node_count(self, index: int) -> int:
        """The admissible partitions of ``index`` (an upper count, capped): exact for GL_N to level
        20000, past it the compositions bound C(k+rows−1, rows−1)."""
        if index > _SUMMED_LEVELS:
            return min(comb(index + self.rows - 1, self.rows - 1), ESTIMATE_CAP)
        return self.size_counts(index)[index]

    def estimate_edges(self, upto: int) -> int:
        return self._estimates(upto)[0]

    def estimate_nodes(self, upto: int) -> int:
        return self._estimates(upto)[1]

    # ----- labels ---------------------------------------------------------------------------
    def format(self, node: Partition) -> str:
        return format_partition(node)

    def parse(self, text: str, index: int) -> Partition:
        if self.removes:
            where = f"of size ≤ {index} and ≡ {index} mod 2" if index else "of size 0"
        else:
            where = f"of {index}"
        expected = f"a partition {where} with {self.admissible_text()}, e.g. {self._example(index)}"
        return self.read_label(text, index, expected, parse_partition, lambda lam: self.on_level(index, lam))

    def _example(self, index: int) -> str:
        lam: Partition = (index,) if index else ()
        if not self.admissible(lam):  # (k) is not admissible only for O(1), where (1) or () is
            lam = (1,) if index % 2 else ()
        return format_partition(lam)

    def sort_key(self, node: Partition, index: int = 0) -> tuple[int, ...]:
        """Smaller partitions first; within one size, (k) first (reverse lexicographic)."""
        return (sum(node),) + tuple(-x for x in node)

    def sort_nodes(self, nodes, index: int) -> list[Partition]:
        """``sort_key``'s order without a key function: by size, then plain tuple order reversed
        (several times faster on a level of 200,000 partitions)."""
        by_size: dict[int, list[Partition]] = {}
        for node in nodes:
            by_size.setdefault(sum(node), []).append(node)
        out: list[Partition] = []
        for size in sorted(by_size):
            out.extend(sorted(by_size[size], reverse=True))
        return out
