"""A tower given by finite matrices: the shape shared by tensor-graph files, character tables and
the finite subgroups of SU(2).

Node sets are lists of named irreducible modules with their dimensions.  A *step* is a matrix
M (rows: the source set, columns: the target set) of non-negative integers: M_ij is the
multiplicity of target module j in (source module i) ⊗ V, or in its restriction or induction.
The tower repeats a *pattern* of one step (levels 0, 1, 2, ...) or two steps (levels 0, 1/2, 1,
..., e.g. restrict to a subgroup, then induce back).

Σ_j M_ij d_j = c·d_i for every i (c = dim V for a tensor step, 1 for a restriction, the index
[G:H] for an induction) makes Σ m·dim at level i equal to the product of the constants of the
steps taken (McKay, *Graphs, singularities and finite groups*, Proc. Symp. Pure Math. 37, 1980;
Goodman, de la Harpe, Jones, *Coxeter Graphs and Towers of Algebras*, 1989, 2.1).
"""

from __future__ import annotations

from engine.records import record
from typing import Hashable, Sequence

from engine.capabilities import Capability, Encodings, FiniteSteps, LevelJump, SizeGuard, StepMatrix
from engine.errors import UserError
from engine.tower import Edge, Tower


@record
class NodeSet:
    """Named irreducible modules with their dimensions.  ``values`` (optional) are the node values
    the tower hands out in their place (e.g. partitions as tuples); by default the labels."""

    name: str
    labels: tuple[str, ...]
    dimensions: tuple[int, ...]
    values: tuple[Hashable, ...] | None = None

    def index(self, label: str) -> int:
        return self.labels.index(label)

    def node(self, i: int) -> Hashable:
        return self.labels[i] if self.values is None else self.values[i]


@record
class Step:
    name: str
    source: NodeSet
    target: NodeSet
    matrix: tuple[tuple[int, ...], ...]

    def constant(self) -> int:
        """The c with M·d_target = c·d_source; a UserError naming the first row that breaks it."""
        c = None
        for i, row in enumerate(self.matrix):
            total = sum(m * d for m, d in zip(row, self.target.dimensions))
            di = self.source.dimensions[i]
            if total % di:
                raise UserError(
                    f"step {self.name!r}: row {self.source.labels[i]!r} gives Σ_j M_ij·d_j = {total}, "
                    f"not a multiple of its dimension {di}"
                )
            here = total // di
            if c is None:
                c = here
            elif here != c:
                raise UserError(
                    f"step {self.name!r}: row {self.source.labels[i]!r} gives Σ_j M_ij·d_j = {total} = "
                    f"{here}·{di}, but earlier rows give {c}·d_i (the module tensored must be the same for all)"
                )
        return c or 0


class MatrixTower(Tower):
    """A tower walking a repeating pattern of steps between finite node sets."""

    def __init__(self, spec: str, family: str, pattern: Sequence[Step], root: str, kinds: Sequence[str] = ()) -> None:
        super().__init__(spec)
        if len(pattern) not in (1, 2):
            raise UserError(f"{spec}: a pattern has one step (whole levels) or two (half levels), not {len(pattern)}")
        for a, b in zip(pattern, list(pattern[1:]) + [pattern[0]]):
            if a.target != b.source:
                raise UserError(f"{spec}: step {a.name!r} ends in {a.target.name!r} but {b.name!r} starts in {b.source.name!r}")
        first = pattern[0].source
        if root not in first.labels:
            raise UserError(f"{spec}: the root {root!r} is not a node of {first.name!r}")
        self.family = family
        self.pattern = tuple(pattern)
        self.steps_per_unit = len(pattern)
        self._root = first.node(first.index(root))
        self._kinds = tuple(kinds)
        self._constants = [s.constant() for s in pattern]
        self._edges = [
            {
                step.source.node(i): [(step.target.node(j), m) for j, m in enumerate(row) if m]
                for i, row in enumerate(step.matrix)
            }
            for step in pattern
        ]
        self._reverse = [
            {
                step.target.node(j): [(step.source.node(i), row[j]) for i, row in enumerate(step.matrix) if row[j]]
                for j in range(len(step.target.labels))
            }
            for step in pattern
        ]
        self._dims = [{s.source.node(i): d for i, d in enumerate(s.source.dimensions)} for s in pattern]
        self._order = [{s.source.node(k): k for k in range(len(s.source.labels))} for s in pattern]
        self._labels = {s.source.node(k): label for s in pattern for k, label in enumerate(s.source.labels)}

    def node_set(self, index: int) -> NodeSet:
        return self.pattern[index % len(self.pattern)].source

    def step_key(self, index: int) -> int:
        return index % len(self.pattern)

    def space_key(self, index: int) -> int:
        return index % len(self.pattern)  # the node set of the level

    def level_kind(self, index: int) -> str:
        return self._kinds[index % len(self._kinds)] if self._kinds else self.node_set(index).name

    def root(self) -> Hashable:
        return self._root

    def children(self, index: int, node: Hashable) -> Sequence[Edge]:
        return self._edges[index % len(self.pattern)][node]

    def parents(self, index: int, node: Hashable) -> Sequence[Edge]:
        if index == 0:
            return []
        return self._reverse[(index - 1) % len(self.pattern)].get(node, [])

    def dimension(self, index: int, node: Hashable) -> int:
        return self._dims[index % len(self.pattern)][node]

    def tensor_dimension(self, index: int) -> int:
        full, rest = divmod(index, len(self.pattern))
        value = 1
        for c in self._constants:
            value *= c
        value = value**full
        for c in self._constants[:rest]:
            value *= c
        return value

    #: levels whose node sets are walked exactly by the estimate (then the last ones repeat)
    _WALKED = 64

    def _estimates(self, upto: int) -> tuple[int, int]:
        """(edges, nodes) over levels 0..upto: the node sets with a path walked for the first
        levels (no multiplicities), then the largest of the last levels walked, repeated."""
        period = len(self.pattern)
        current = {self._root}
        edges = nodes = 0
        recent: list[tuple[int, int]] = []
        walked = min(upto, self._WALKED)
        for index in range(walked + 1):
            step = self._edges[index % period]
            out = sum(len(step[node]) for node in current)
            nodes += len(current)
            edges += out if index < upto else 0
            recent = (recent + [(out, len(current))])[-2 * period:]
            if index < walked:
                current = {child for node in current for child, _ in step[node]}
        rest = upto - walked
        if rest > 0:
            edges += rest * max(e for e, _ in recent)
            nodes += rest * max(n for _, n in recent)
        return edges, nodes

    def estimate_edges(self, upto: int) -> int:
        return self._estimates(upto)[0]

    def estimate_nodes(self, upto: int) -> int:
        return self._estimates(upto)[1]

    #: path encodings (a walk on the graph: the sequence of node names)
    encodings: tuple[str, ...] = ("walk",)

    def capabilities(self) -> list[Capability]:
        steps = FiniteSteps.of([self._step_matrix(s) for s in self.pattern],
                               self.pattern[0].source.labels.index(self._labels[self._root]))
        from engine.jumps import jump_digits, jump_level

        return [
            SizeGuard(self.estimate_edges, self.estimate_nodes),
            steps,
            LevelJump(lambda index: jump_level(steps, index), lambda index: jump_digits(steps, index)),
            Encodings(self.encodings),
        ]

    def _step_matrix(self, step: Step) -> StepMatrix:
        src, dst = step.source, step.target
        return StepMatrix(
            step.name, src.name, dst.name,
            tuple(src.node(i) for i in range(len(src.labels))), tuple(dst.node(j) for j in range(len(dst.labels))),
            src.labels, dst.labels, src.dimensions, dst.dimensions, step.matrix, step.constant(),
        )

    def format(self, node: Hashable) -> str:
        return self._labels[node]

    #: other spellings accepted on input (e.g. a node's former name) → the label
    label_aliases: dict[str, str] = {}

    def parse(self, text: str, index: int) -> Hashable:
        label = self.normalize_label(text.strip())
        nodes = self.node_set(index)
        if label == "trivial" and label not in nodes.labels and self._root in self._order[self.step_key(index)]:
            return self._root  # the root is the trivial module of its node set
        if label not in nodes.labels:
            at = self.labels_at(index)
            if len(at) <= 12:
                raise self.label_error(text, index, f"one of {', '.join(at)}", listed=True)
            raise self.label_error(text, index, f"one of its {len(at)} nodes, e.g. {', '.join(at[:6])}")
        return nodes.node(nodes.index(label))

    def normalize_label(self, text: str) -> str:
        """Other spellings of a label (``label_aliases``); subclasses may accept more."""
        return self.label_aliases.get(text, text)

    def labels_at(self, index: int) -> list[str]:
        """The labels of the nodes with a path from the root at level ``index``, in display order:
        the reachable sets repeat with the pattern, so a cycle of them is found and skipped."""
        period = len(self.pattern)
        current = frozenset([self._root])
        seen: dict[tuple[int, frozenset], int] = {}
        i = 0
        while i < index:
            state = (i % period, current)
            if state in seen:
                left = (index - i) % (i - seen[state])
                index = i + left
                seen = {}
                if not left:
                    break
            seen[(i % period, current)] = i
            current = frozenset(c for n in current for c, _ in self._edges[i % period][n])
            i += 1
        order = self._order[self.step_key(index)]
        return [self._labels[n] for n in sorted(current, key=lambda n: order.get(n, 0))]

    def sort_key(self, node: Hashable, index: int = 0) -> object:
        return self._order[index % len(self.pattern)].get(node, 0)

    def mckay_matrix(self, step: int = 0) -> Step:
        return self.pattern[step]
