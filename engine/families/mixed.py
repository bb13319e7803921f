"""``mixed:n=N,word=W``: GL_N on V^{w_1} ⊗ … ⊗ V^{w_k}, each letter ``v`` (V = C^N) or ``d`` (V*);
centralizers: the walled Brauer algebras B_{r,s}(N).

Nodes are pairs (α, β) of partitions with ℓ(α) + ℓ(β) ≤ N, the rational GL_N-modules of highest
weight (α_1, …, α_p, 0, …, 0, −β_q, …, −β_1) (Koike, Adv. Math. 74, 1989; Stembridge, *Rational
tableaux and the tensor algebra of gl_n*, J. Combin. Theory A 46, 1987).  The root is ((), ()).
Tensoring with V adds e_i to the weight wherever the result stays dominant (Pieri rule, Fulton and
Harris, *Representation Theory*, 6.1): a box is added to α or removed from β; with V* a box is added
to β or removed from α; every result admissible.  Level i of the tower is the product of the first i
letters; there are len(W) + 1 levels.

Dimensions by Weyl's dimension formula (engine.classical_dimensions).  The walled Brauer algebra
B_{r,s}(N) (Turaev 1989; Koike 1989;
*Tensor product representations of general linear groups and their connections with Brauer
algebras*, J. Algebra 166, 1994), for r letters v and s letters d, has dimension (r+s)! and maps onto
the centralizer, injectively exactly while r + s ≤ N.
"""

from __future__ import annotations

from fractions import Fraction
from math import factorial
from typing import TYPE_CHECKING, Sequence

from engine.capabilities import AlgebraLevel, Capability, DiagramAlgebra, Encodings, SizeGuard
from engine.classical_dimensions import mixed_dimension
from engine.errors import SpecError
from engine.partition_pairs import PartitionPair, format_pair, parse_pair
from engine.partition_tower import ESTIMATE_CAP, CountTable, corner_bound, vector_dimension
from engine.partitions import Partition, larger_by_one_box, smaller_by_one_box
from engine.specs import Family
from engine.tower import Edge, Tower

if TYPE_CHECKING:
    from engine.pair_counts import PairCounts

_MAX_WORD = 100_000

class MixedTower(Tower):
    family = "mixed"

    def __init__(self, spec: str, n: int, word: str) -> None:
        super().__init__(spec)
        self.n = n
        self.word = word
        self.max_index = len(word)
        self._pairs: "PairCounts | None" = None  # the exact node counts of the size guard, kept
        self._estimated: dict[int, tuple[int, int]] = {}
        # r_i and s_i: letters v and d among the first i letters
        self._r = [0]
        for letter in word:
            self._r.append(self._r[-1] + (letter == "v"))

    def counts(self, index: int) -> tuple[int, int]:
        """(r, s): how many letters v and d the first ``index`` letters hold."""
        r = self._r[index]
        return r, index - r

    def step_key(self, index: int) -> str:
        return self.word[index]

    def level_kind(self, index: int) -> str:
        return f"GL_{self.n}"

    # ----- graph ----------------------------------------------------------------------------
    def root(self) -> PartitionPair:
        return ((), ())

    def _tensor(self, letter: str, node: PartitionPair) -> list[Edge]:
        """Edges of node ⊗ V (letter v) or node ⊗ V* (letter d)."""
        grow, shrink = node if letter == "v" else (node[1], node[0])
        room = self.n - len(grow) - len(shrink)
        out: list[PartitionPair] = [g for g in larger_by_one_box(grow) if len(g) == len(grow) or room > 0]
        pairs = [(g, shrink) for g in out] + [(grow, s) for s in smaller_by_one_box(shrink)]
        if letter == "d":
            pairs = [(b, a) for a, b in pairs]
        return [(p, 1) for p in pairs]

    def children(self, index: int, node: PartitionPair) -> Sequence[Edge]:
        return self._tensor(self.word[index], node)

    def parents(self, index: int, node: PartitionPair) -> Sequence[Edge]:
        """ν ⊂ μ ⊗ V iff μ ⊂ ν ⊗ V*: the parents are the step of the opposite letter."""
        if index == 0:
            return []
        return self._tensor("d" if self.word[index - 1] == "v" else "v", node)

    def on_level(self, index: int, node: PartitionPair) -> bool:
        """The rule: |α| = r − t, |β| = s − t for some t ≥ 0, and ℓ(α) + ℓ(β) ≤ N (Koike 1989, §2)."""
        alpha, beta = node
        r, s = self.counts(index)
        a, b = sum(alpha), sum(beta)
        return len(alpha) + len(beta) <= self.n and a <= r and b <= s and r - a == s - b

    # ----- numbers --------------------------------------------------------------------------
    def dimension(self, index: int, node: PartitionPair) -> int:
        return mixed_dimension(self.n, node)

    def tensor_dimension(self, index: int) -> int:
        return self.n**index

    def capabilities(self) -> list[Capability]:
        return [SizeGuard(self.estimate_edges, self.estimate_nodes), Encodings(("pairs",)),
                DiagramAlgebra(self.algebra_level, self.first_unfaithful())]

    def first_unfaithful(self) -> int | None:
        """B_{r,s}(N) → End is injective iff r + s ≤ N (the walled Brauer second fundamental
        theorem; Koike 1989), so the first unfaithful index is N+1 when the word is that long."""
        return self.n + 1 if self.n + 1 <= self.max_index else None

    def algebra_level(self, index: int) -> AlgebraLevel:
        """The walled Brauer algebra of the first k letters (r v's, s d's), of dimension (r+s)!
        (Turaev 1989; Koike 1989; the sources in the module docstring)."""
        r, s = self.counts(index)
        return AlgebraLevel("walled-brauer", f"B_{{{r},{s}}}({self.n})", index, False, self.n, self.n,
                            self.word[:index], "general-linear", factorial(index), Fraction(index), index)

    def generic_dimension(self, index: int) -> int:
        return self.algebra_level(index).dimension

    def algebra_name(self, index: int) -> str:
        return self.algebra_level(index).name

    def _estimates(self, upto: int) -> tuple[int, int]:
        """(edges, nodes) over levels 0..upto: the nodes of each level counted exactly
        (``engine.pair_counts``: pairs with ℓ(α) + ℓ(β) ≤ N), times a bound on the children of a
        node (one box added to α or removed from β, or the reverse: at most ℓ(α) + 1 + ℓ(β) ≤ N + 1,
        and at most two corner bounds √(2k) + 2).  Once the exact count's budget is spent, each
        level is bounded by Σ_t p_N(r−t)·p_N(s−t) (p_N: partitions with at most N rows), past
        level 2000 by (min(r,s)+1)·p_N(r)·p_N(s) (p_N grows), which costs one step."""
        upto = min(upto, self.max_index)
        if upto in self._estimated:  # the diagram asks for edges and nodes of the same levels
            return self._estimated[upto]
        if self._pairs is None:
            from engine.pair_counts import PairCounts

            self._pairs = PairCounts(self.n)
        counts = None
        total = all_nodes = 0
        for index in range(upto + 1):
            r, s = self.counts(index)
            nodes = self._pairs.level(r, s)
            if nodes is None:
                counts = counts or CountTable(upto, self.n)
                if index <= 2000:
                    nodes = sum(counts[r - t] * counts[s - t] for t in range(min(r, s) + 1))
                else:
                    nodes = (min(r, s) + 1) * counts[r] * counts[s]
            all_nodes += nodes
            if index < upto:  # the edges out of the top level are not walked
                total += nodes * min(self.n + 1, 2 * corner_bound(index))
            if total >= ESTIMATE_CAP:
                total, all_nodes = ESTIMATE_CAP, min(all_nodes, ESTIMATE_CAP)
                break
        self._estimated[upto] = total, all_nodes
        return total, all_nodes

    def estimate_edges(self, upto: int) -> int:
        return self._estimates(upto)[0]

    def estimate_nodes(self, upto: int) -> int:
        return self._estimates(upto)[1]

    # ----- labels ---------------------------------------------------------------------------
    def format(self, node: PartitionPair) -> str:
        return format_pair(node)

    def parse(self, text: str, index: int) -> PartitionPair:
        r, s = self.counts(index)
        expected = (
            f"a pair (α,β) with |α| = {r} − t, |β| = {s} − t for some t ≥ 0 and ℓ(α) + ℓ(β) ≤ {self.n}, "
            f"e.g. {format_pair(self._example(r, s))}"
        )
        return self.read_label(text, index, expected, parse_pair, lambda pair: self.on_level(index, pair))

    def _example(self, r: int, s: int) -> PartitionPair:
        t = min(r, s)
        alpha: Partition = (r - t,) if r > t else ()
        beta: Partition = (s - t,) if s > t else ()
        return alpha, beta

    def sort_key(self, node: PartitionPair, index: int = 0) -> tuple:
        """Smaller pairs first; then α, then β in reverse lexicographic order."""
        alpha, beta = node
        return (sum(alpha) + sum(beta), tuple(-x for x in alpha), tuple(-x for x in beta))


def _build(spec: str, params: dict[str, str]) -> MixedTower:
    n = vector_dimension("mixed", params)
    word = params.get("word", "")
    if not word or set(word) - {"v", "d"}:
        raise SpecError(f"mixed: key 'word' must be a non-empty word in the letters v and d (e.g. vvdd), got {word!r}")
    if len(word) > _MAX_WORD:
        raise SpecError(f"mixed: the word has {len(word)} letters, at most {_MAX_WORD} are accepted")
    return MixedTower(spec, n, word)


FAMILY = Family(
    name="mixed",
    summary="GL_N on a product of copies of C^N (v) and its dual (d) in the order of a word; centralizers: walled Brauer algebras",
    keys={"n": "N, the dimension of V (N ≥ 1)", "word": "a word in v (V) and d (the dual V*), e.g. vvdd or vdvd"},
    build=_build,
    required=("n", "word"),
    rank=33,
    example="mixed:n=3,word=vvdd",
    examples=("mixed:n=2,word=vdvd",),
    capabilities=(SizeGuard, DiagramAlgebra, Encodings,),
)
