"""``symmetric:n=N``: S_N on its permutation module V = C^N; centralizers: partition algebras.

Levels 0, 1/2, 1, 3/2, ...: level k holds the partitions λ of N with N − λ_1 ≤ k (irreducible
S_N-modules in V^{⊗k}); level k+1/2 holds the partitions μ of N−1 with (N−1) − μ_1 ≤ k
(V^{⊗k} restricted to S_{N−1}).  k → k+1/2 removes a box (restriction), k+1/2 → k+1 adds one
(induction), since V = Ind_{S_{N−1}}^{S_N} 1 (Jones, *The Potts model and the symmetric group*,
1994; Martin, *Temperley–Lieb algebras for non-planar statistical mechanics — the partition
algebra construction*, J. Knot Theory Ramifications 3, 1994).

Dimensions: f^λ by the hook length formula.  Tensor dimension N^k at k and at k+1/2.  Generic
dimension: the partition algebra P_k(N) has dimension Bell(2k), P_{k+1/2}(N) has Bell(2k+1)
(OEIS A000110); the centralizer dimension is Σ_{j≤N} S(2k, j), equal to Bell(2k) iff 2k ≤ N.
"""

from __future__ import annotations

from math import isqrt, log, log10
from typing import Iterable, Sequence

from engine.capabilities import (
    AlgebraLevel,
    Capability,
    CharacterData,
    ClosedForm,
    DiagramAlgebra,
    Encodings,
    FiniteSteps,
    LevelJump,
    SizeGuard,
    finite_steps_of_size,
)
from engine.closed_forms import SymmetricClosedForm, symmetric_closed_form
from engine.combinatorics import bell
from engine.errors import SpecError
from engine.partitions import (
    Partition,
    format_partition,
    larger_by_one_box,
    parse_partition,
    partition_count,
    partitions_of,
    smaller_by_one_box,
    standard_tableaux_count,
)
from engine.specs import Family, choice_param, int_param
from engine.tower import Edge, Tower


class SymmetricTower(Tower):
    family = "symmetric"

    def __init__(self, spec: str, n: int, halves: bool = True) -> None:
        super().__init__(spec)
        self.n = n
        self.halves = halves
        self.steps_per_unit = 2 if halves else 1

    # ----- levels ---------------------------------------------------------------------------
    def _is_half(self, index: int) -> bool:
        return self.halves and index % 2 == 1

    def _k(self, index: int) -> int:
        """The integer part k of the level (index 2k or 2k+1 with halves)."""
        return index // 2 if self.halves else index

    def step_key(self, index: int) -> int:
        return index % 2 if self.halves else 0

    def space_key(self, index: int) -> int:
        return index % 2 if self.halves else 0  # partitions of N, and of N−1 at half levels

    def level_kind(self, index: int) -> str:
        return f"S_{self.n - 1}" if self._is_half(index) else f"S_{self.n}"

    # ----- graph ----------------------------------------------------------------------------
    def root(self) -> Partition:
        return (self.n,)

    def children(self, index: int, node: Partition) -> Sequence[Edge]:
        if not self.halves:
            return self._restrict_induce(node)
        if index % 2 == 0:
            return [(mu, 1) for mu in smaller_by_one_box(node)]
        return [(lam, 1) for lam in larger_by_one_box(node)]

    def parents(self, index: int, node: Partition) -> Sequence[Edge]:
        if index == 0:
            return []
        if not self.halves:
            return self._restrict_induce(node)
        if index % 2 == 1:  # a half level: parents at the integer level below have one box more
            return [(lam, 1) for lam in larger_by_one_box(node)]
        return [(mu, 1) for mu in smaller_by_one_box(node)]

    @staticmethod
    def _restrict_induce(node: Partition) -> list[Edge]:
        """Edges of one whole step λ → ν through the hidden half level: the number of μ with
        μ ⊂ λ and μ ⊂ ν, one box smaller."""
        counts: dict[Partition, int] = {}
        for mu in smaller_by_one_box(node):
            for nu in larger_by_one_box(mu):
                counts[nu] = counts.get(nu, 0) + 1
        return list(counts.items())

    # ----- numbers --------------------------------------------------------------------------
    def dimension(self, index: int, node: Partition) -> int:
        return standard_tableaux_count(node)

    def tensor_dimension(self, index: int) -> int:
        return self.n ** self._k(index)

    def generic_dimension(self, index: int) -> int:
        return self.algebra_level(index).dimension

    def algebra_name(self, index: int) -> str:
        return self.algebra_level(index).name

    def reachable(self, index: int, node: Partition) -> bool:
        k = self._k(index)
        top = self.n - 1 if self._is_half(index) else self.n
        return sum(node) == top and top - (node[0] if node else 0) <= k

    def closed_form(self, index: int, node: Partition) -> SymmetricClosedForm:
        """m_λ(k) = Σ_t S(k,t)·f^{λ/(N−t)}, m_μ(k+1/2) = Σ_t S(k+1,t+1)·f^{μ/(N−1−t)}
        (``engine.closed_forms``, where the sources are)."""
        return symmetric_closed_form(self.n, node, self._is_half(index))

    def multiplicity(self, index: int, node: Partition) -> int:
        """The closed form at this level; 0 for nodes without a path.  Without half levels a
        whole step restricts and induces, so level k is the integer level k of the tower."""
        if not self.reachable(index, node):
            return 0
        return self.closed_form(index, node).value(self._k(index))

    def deep_level(self, index: int) -> dict[Partition, int]:
        """Every node with a path at this level and its multiplicity, by the closed form."""
        top = self.n - 1 if self._is_half(index) else self.n
        k = self._k(index)
        return {lam: self.multiplicity(index, lam) for lam in partitions_of(top) if top - lam[0] <= k} if top else \
            {(): self.multiplicity(index, ())}

    def capabilities(self) -> list[Capability]:
        found: list[Capability] = [
            SizeGuard(self.estimate_edges, self.estimate_nodes, extra=self.estimate_extra),
            ClosedForm(self.multiplicity, self.reachable, self.estimate_digits, self.formula, self.closed_form),
            LevelJump(self.deep_level, self.estimate_digits),
            DiagramAlgebra(self.algebra_level, self.first_unfaithful()),
            Encodings(("vacillating", "updown") if self.halves else ("vacillating",),
                      set_partition_tableaux=self._set_partition_tableaux if self.halves else None),
            finite_steps_of_size(self, partition_count(self.n) + (partition_count(self.n - 1) if self.halves else 0)),
        ]
        return found

    def first_unfaithful(self) -> int:
        """P_k(N) acts faithfully on V^{⊗k} iff 2k ≤ N, P_{k+1/2}(N) iff 2k+1 ≤ N (Jones 1994;
        Martin 1994; a 2005 survey of partition algebras states it as a theorem): the
        centralizer has dimension Σ_{j≤N} S(2k, j), which is Bell(2k) iff 2k ≤ N."""
        return self.n + 1 if self.halves else self.n // 2 + 1

    def _set_partition_tableaux(self, index: int, node: Partition) -> object:
        from engine.set_partition_tableaux import SetPartitionTableaux

        return SetPartitionTableaux(self.n, index, node)

    def algebra_level(self, index: int) -> AlgebraLevel:
        """P_k(N), of dimension Bell(2k), and P_{k+1/2}(N), of dimension Bell(2k+1) (OEIS A000110;
        Martin 1994, Jones 1994).  Without half levels, P_k(N) at every level."""
        k = self._k(index)
        half = self._is_half(index)
        name = f"P_{{{k}+1/2}}({self.n})" if half else f"P_{k}({self.n})"
        return AlgebraLevel("partition", name, k + 1 if half else k, half, self.n, self.n, "", "symmetric",
                            bell(2 * k + 1) if half else bell(2 * k), self.level_of(index), index)

    def estimate_digits(self, index: int) -> int:
        """Digits of N^(k+1) at most: the closed form sums terms C(t,j)·j^k (j ≤ t ≤ N), and the
        multiplicity itself is at most N^k, the dimension of the tensor space."""
        return int((self._k(index) + 1) * log10(self.n)) + 1

    def formula(self, index: int, node: Partition) -> str:
        """m in k by the Stirling-number closed form (engine.closed_forms)."""
        form = self.closed_form(index, node)
        return f"{form.name()} = {form.stirling_text()}"

    def level_size(self, index: int) -> int:
        """Number of nodes with a path on a level: partitions (top−j, ν) with ν ⊢ j, ν_1 ≤ top−j."""
        top = self.n - 1 if self._is_half(index) else self.n
        k = self._k(index)
        return sum(partition_count(j, max_part=top - j) for j in range(min(k, top) + 1) if top - j >= 0)

    def _level_sizes(self, upto: int) -> tuple[int, int]:
        """(Σ nodes × corners, Σ nodes) over levels 0..upto; past the stable range (index 2N+2,
        where the levels stop growing) the last two levels repeat.  A node (N−j, ν) of level k
        has j ≤ k and at most min(√(2N), √(2j)+1)+2 corners (a partition with c corners has at
        least c(c+1)/2 boxes); without half levels a step restricts and induces (corners², and
        at most p(N) distinct children)."""
        def corners(index: int) -> int:
            c = min(isqrt(2 * self.n) + 2, isqrt(2 * min(self._k(index), self.n)) + 3)
            return c if self.halves else min(c * c, partition_count(self.n))

        stable_from = 2 * self.n + 2 if self.halves else self.n + 1
        edges = nodes = 0
        for index in range(min(upto, stable_from) + 1):
            size = self.level_size(index)
            nodes += size
            if index < upto:  # the edges out of the top level are not walked
                edges += size * corners(index)
        if upto > stable_from:
            size = max(self.level_size(stable_from), self.level_size(stable_from - 1))
            nodes += (upto - stable_from) * size
            edges += (upto - stable_from) * size * corners(stable_from)
        return edges, nodes

    def estimate_edges(self, upto: int) -> int:
        """Nodes per level times a bound on corners (a partition of N has at most √(2N)+1)."""
        return self._level_sizes(upto)[0]

    def estimate_nodes(self, upto: int) -> int:
        return self._level_sizes(upto)[1]

    def estimate_extra(self, upto: int) -> int:
        """The Bell triangle up to row M = 2k+2 behind the dimensions of P_k(N) and P_{k+1/2}(N):
        row i holds i numbers of about the digits of B(i), which grow nearly linearly, so the
        triangle is about (2/3)·(M²/2) additions of numbers of B(M)'s digits, in 9-digit limbs;
        ln B(M) ≈ M(ln M − ln ln M − 1 + (ln ln M + 1)/ln M) (de Bruijn, *Asymptotic Methods in
        Analysis*, §6.2; within 1% of the digits of B(2000))."""
        rows = 2 * self._k(upto) + 2
        ln_rows = log(max(rows, 3))
        ln_ln = log(ln_rows)
        digits = rows * (ln_rows - ln_ln - 1 + (ln_ln + 1) / ln_rows) / log(10)
        return rows * rows // 3 * (int(max(digits, 1.0)) // 9 + 1)

    # ----- labels ---------------------------------------------------------------------------
    def format(self, node: Partition) -> str:
        return format_partition(node)

    def parse(self, text: str, index: int) -> Partition:
        top = self.n - 1 if self._is_half(index) else self.n
        expected = f"a partition of {top}, e.g. {format_partition((top - 1, 1) if top > 1 else (top,) if top else ())}"
        return self.read_label(text, index, expected, parse_partition, lambda lam: sum(lam) == top)

    def sort_key(self, node: Partition, index: int = 0) -> tuple[int, ...]:
        """Reverse lexicographic order: (4), (3,1), (2,2), (2,1,1), (1,1,1,1)."""
        return tuple(-x for x in node)

    def sort_nodes(self, nodes: Iterable[Partition], index: int) -> list[Partition]:
        # all nodes of a level have the same size, so reverse lexicographic order is plain
        # tuple order reversed (no key function: several times faster on 200,000 nodes)
        return sorted(nodes, reverse=True)


def _build(spec: str, params: dict[str, str]) -> Tower:
    n = int_param("symmetric", params, "n", minimum=1)
    if "module" in params:
        from engine.families.characters import symmetric_module_tower

        if "halves" in params:
            raise SpecError("symmetric: halves= applies to the permutation module only; drop it when module= is given")
        return symmetric_module_tower(spec, n, params["module"])
    halves = choice_param("symmetric", params, "halves", ("yes", "no"), "yes") == "yes"
    if n > 400:
        raise SpecError(f"symmetric: n={n} is too large (at most 400)")
    return SymmetricTower(spec, n, halves)


FAMILY = Family(
    name="symmetric",
    summary="S_N on its permutation module C^N; centralizers: partition algebras P_k(N), half levels S_{N-1}",
    keys={
        "n": "N, the degree (N ≥ 1)",
        "halves": "yes (default) or no: hide the half levels",
        "module": "V as a partition or a sum of partitions of N, e.g. (5,1) or (4)+(3,1) or 2*(3,1); "
        "the tower is then built from the character table of S_N (Murnaghan–Nakayama), whole levels only, N ≤ 14",
    },
    build=_build,
    required=("n",),
    rank=10,
    example="symmetric:n=4",
    examples=("symmetric:n=3,halves=no", "symmetric:n=4,module=(3,1)"),
    capabilities=(SizeGuard, ClosedForm, LevelJump, DiagramAlgebra, Encodings, FiniteSteps, CharacterData),
)

