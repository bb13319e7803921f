"""``alternating:n=N``: the alternating group A_N on C^N, by restriction from S_N; half levels A_{N−1}.

Irreducibles of A_N (James and Kerber, *The Representation Theory of the Symmetric Group*, 1981,
2.5; Fulton and Harris, *Representation Theory*, 1991, §5.1): for λ ≠ λ' the Specht modules S^λ and
S^{λ'} restrict to the same irreducible V_λ of dimension f^λ; a self-conjugate λ = λ' restricts to
two irreducibles V_λ+ and V_λ− of dimension f^λ/2 each.

Labels: λ ≠ λ' is written by the larger of λ, λ' in lexicographic order of the parts, e.g. ``(3,1)``
(not ``(2,1,1)``); a self-conjugate λ gives ``(2,2)+`` and ``(2,2)-``.  On input, the conjugate
spelling is accepted too.

Branching A_N ↓ A_{N−1} follows from S_N ↓ S_{N−1} (remove a box): V_λ (λ ≠ λ') contains V_μ once
for each μ ⊂ λ one box smaller with μ ≠ μ', and both V_μ± when μ = μ' (λ ≠ λ' never contains both
μ and μ' for μ ≠ μ', since μ ∪ μ' would be λ and self-conjugate).  For λ = λ', V_λ+ and V_λ− are
swapped by a transposition of S_{N−1}, so each holds V_μ once for every pair {μ, μ'} ⊂ λ with
μ ≠ μ', and one of V_μ± for the self-conjugate μ ⊂ λ (if any): we label so that + goes to + and −
to −.  Induction is the transpose (Frobenius reciprocity).  V = C^N = Ind_{A_{N−1}}^{A_N} 1 for
N ≥ 3 (A_N is transitive on [N] with point stabiliser A_{N−1}), so restrict-then-induce is ⊗ V.

Closed form: restricting V^{⊗k} from S_N, the multiplicity of V_λ is m_λ + m_{λ'} (λ ≠ λ') and that of
V_λ± is m_λ, with m the multiplicities of the ``symmetric`` tower.
"""

from __future__ import annotations

from typing import Sequence

from engine.capabilities import (
    Capability,
    ClosedForm,
    Encodings,
    FiniteSteps,
    LevelJump,
    SizeGuard,
    finite_steps_of_size,
)
from engine.errors import SpecError
from engine.families.symmetric import SymmetricTower
from engine.partitions import (
    Partition,
    conjugate,
    format_partition,
    larger_by_one_box,
    parse_partition,
    partition_count,
    smaller_by_one_box,
    standard_tableaux_count,
)
from engine.specs import Family, int_param
from engine.tower import Edge, Tower
from engine.specs import Family, int_param
from engine.tower import Edge, Tower

#: a node: (λ, "") for λ ≠ λ' (λ the larger of the pair), (λ, "+") or (λ, "-") for λ = λ'
Node = tuple[Partition, str]


def canonical(lam: Partition) -> Partition:
    """The larger of λ and λ' (lexicographic order of the parts)."""
    return max(lam, conjugate(lam))


def nodes_of(lam: Partition) -> list[Node]:
    """The A-irreducibles in the restriction of S^λ."""
    if lam == conjugate(lam):
        return [(lam, "+"), (lam, "-")]
    return [(canonical(lam), "")]


class AlternatingTower(Tower):
    family = "alternating"
    steps_per_unit = 2

    def __init__(self, spec: str, n: int) -> None:
        super().__init__(spec)
        self.n = n
        self.symmetric = SymmetricTower(spec, n)

    def step_key(self, index: int) -> int:
        return index % 2

    def space_key(self, index: int) -> int:
        return index % 2

    def level_kind(self, index: int) -> str:
        return f"A_{self.n - 1}" if index % 2 else f"A_{self.n}"

    def root(self) -> Node:
        return ((self.n,), "")

    @staticmethod
    def _restrict(node: Node) -> list[Edge]:
        lam, sign = node
        out: list[Edge] = []
        seen: set[Partition] = set()
        for mu in smaller_by_one_box(lam):
            if mu == conjugate(mu):
                out += [((mu, sign), 1)] if sign else [((mu, "+"), 1), ((mu, "-"), 1)]
            elif canonical(mu) not in seen:  # for λ = λ' the pair {μ, μ'} gives one edge
                seen.add(canonical(mu))
                out.append(((canonical(mu), ""), 1))
        return out

    @staticmethod
    def _induce(node: Node) -> list[Edge]:
        mu, sign = node
        out: list[Edge] = []
        seen: set[Node] = set()
        for lam in list(larger_by_one_box(mu)) + ([] if sign else [conjugate(x) for x in larger_by_one_box(mu)]):
            for target in nodes_of(lam):
                if target not in seen and (node, 1) in AlternatingTower._restrict(target):
                    seen.add(target)
                    out.append((target, 1))
        return out

    def children(self, index: int, node: Node) -> Sequence[Edge]:
        return self._induce(node) if index % 2 else self._restrict(node)

    def parents(self, index: int, node: Node) -> Sequence[Edge]:
        if index == 0:
            return []
        return self._restrict(node) if index % 2 == 0 else self._induce(node)

    def dimension(self, index: int, node: Node) -> int:
        lam, sign = node
        f = standard_tableaux_count(lam)
        return f // 2 if sign else f

    def tensor_dimension(self, index: int) -> int:
        return self.n ** (index // 2)

    def multiplicity(self, index: int, node: Node) -> int:
        lam, sign = node
        m = self.symmetric.multiplicity(index, lam)
        if sign or lam == conjugate(lam):
            return m if sign else 0
        return m + self.symmetric.multiplicity(index, conjugate(lam))

    def reachable(self, index: int, node: Node) -> bool:
        lam, sign = node
        return self.symmetric.reachable(index, lam) or self.symmetric.reachable(index, conjugate(lam))

    def deep_level(self, index: int) -> dict[Node, int]:
        """Every node with a path at this level, by the S_N closed form (restricted to A_N)."""
        out: dict[Node, int] = {}
        for lam in self.symmetric.deep_level(index):
            for node in nodes_of(lam):
                if node not in out:
                    m = self.multiplicity(index, node)
                    if m:
                        out[node] = m
        return out

    def capabilities(self) -> list[Capability]:
        found: list[Capability] = [
            SizeGuard(self.estimate_edges, self.symmetric.estimate_nodes),
            ClosedForm(self.multiplicity, self.reachable, self.estimate_digits),
            LevelJump(self.deep_level, self.estimate_digits),
            Encodings(("labels",)),
            finite_steps_of_size(self, 2 * (partition_count(self.n) + partition_count(self.n - 1))),
        ]
        return found

    def estimate_digits(self, index: int) -> int:
        return self.symmetric.estimate_digits(index)

    def estimate_edges(self, upto: int) -> int:
        return self.symmetric.estimate_edges(upto)

    def format(self, node: Node) -> str:
        lam, sign = node
        return format_partition(lam) + sign

    def parse(self, text: str, index: int) -> Node:
        top = self.n - 1 if index % 2 else self.n
        body = text.strip()
        sign = body[-1] if body[-1:] in ("+", "-") else ""
        expected = f"a partition of {top} (self-conjugate ones with + or -, e.g. (2,2)+)"
        lam = self.read_label(
            text, index, expected, lambda _: parse_partition(body[:-1] if sign else body),
            lambda lam: sum(lam) == top and bool(sign) == (lam == conjugate(lam)),
        )
        return (lam, sign) if sign else (canonical(lam), "")

    def sort_key(self, node: Node, index: int = 0) -> tuple:
        lam, sign = node
        return (tuple(-x for x in lam), sign == "-")


def _build(spec: str, params: dict[str, str]) -> AlternatingTower:
    n = int_param("alternating", params, "n", minimum=0)
    if n < 3:
        raise SpecError(f"alternating: n must be at least 3 (A_1 and A_2 are trivial and C^N is not induced from A_{{N-1}}), got {n}")
    if n > 400:
        raise SpecError(f"alternating: n={n} is too large (at most 400)")
    return AlternatingTower(spec, n)


FAMILY = Family(
    name="alternating",
    summary="A_N on C^N, by restriction from S_N; half levels A_{N-1}",
    keys={"n": "N, the degree (N ≥ 3)"},
    build=_build,
    required=("n",),
    rank=20,
    example="alternating:n=5",
    examples=("alternating:n=4",),
    capabilities=(SizeGuard, ClosedForm, LevelJump, Encodings, FiniteSteps,),
)
