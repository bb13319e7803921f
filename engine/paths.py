"""Paths from the root to a node of a Bratteli diagram: counting, ranking, unranking, listing.

The number of paths from the root to a node is its multiplicity (Bratteli 1972; Goodman, de la
Harpe, Jones, *Coxeter Graphs and Towers of Algebras*, 1989, ch. 2), and the paths index the
Gelfand–Tsetlin basis of the centralizer's irreducible module (the construction of Gelfand and
Tsetlin, 1950, for a chain of algebras with simple branching; Goodman, de la Harpe, Jones, ch. 2).

**Edges.**  Where two nodes are joined by e > 1 edges, these are e distinct edges, numbered
1..e.  A path is therefore a sequence of nodes (one per level index 0..L) *and* the number of the
edge taken at each step (always 1 across a single edge); paths that differ only in an edge number
are different paths, so the number of paths is still the multiplicity.

**Order.**  Paths to a node v at index L are ordered by their *last* step first:
1. by the parent u at index L−1, in the level's display order (the tower's ``sort_key``);
2. then by the number of the edge u → v;
3. then, recursively, by the path from the root to u.
Equivalently: read the steps from the node back to the root and compare lexicographically.
Each (parent, edge) pair owns a block of m(u) consecutive ranks, so ranking and unranking are
sums over the levels of a mixed-radix number whose digits are weighted by multiplicities
(the standard ranking of a combinatorial class by its counting recursion: Nijenhuis and Wilf,
*Combinatorial Algorithms*, 2nd ed., 1978): no path is ever enumerated, so rank 10^30 is
as quick as rank 0 once the levels are built.
"""

from __future__ import annotations

from dataclasses import dataclass
from typing import Iterator, Sequence

from engine.diagram import Diagram
from engine.errors import UserError
from engine.levels import format_level
from engine.numbers_in import NumberError, describe, quote, read_big
from engine.tower import Node


@dataclass(frozen=True)
class Path:
    """A path from the root: ``nodes[i]`` at index i, ``edges[i-1]`` the number (1-based) of the edge
    taken from ``nodes[i-1]`` to ``nodes[i]``."""

    nodes: tuple[Node, ...]
    edges: tuple[int, ...]

    def __post_init__(self) -> None:
        if len(self.edges) != max(len(self.nodes) - 1, 0):
            raise ValueError("a path needs one edge number per step")

    @classmethod
    def simple(cls, nodes: Sequence[Node]) -> "Path":
        """A path that crosses only single edges (every edge number 1)."""
        return cls(tuple(nodes), (1,) * max(len(nodes) - 1, 0))

    @property
    def end(self) -> Node:
        return self.nodes[-1]


class PathError(UserError):
    """A sequence that is not a path of the tower, or a rank out of range."""


# (parent, edges from parent, multiplicity of parent)
_Incoming = tuple[tuple[Node, int, int], ...]


class PathIndex:
    """Ranks and paths of every node of one diagram (caches each node's incoming edges)."""

    def __init__(self, diagram: Diagram) -> None:
        self.diagram = diagram
        self._incoming: dict[tuple[int, Node], _Incoming] = {}

    # ----- counting -------------------------------------------------------------------------
    def total(self, index: int, node: Node) -> int:
        """The number of paths from the root to ``node`` (its multiplicity)."""
        return self.diagram.multiplicity(index, node)

    def incoming(self, index: int, node: Node) -> _Incoming:
        """(parent, edge count, parent's multiplicity) for the parents with a path, in display order."""
        key = (index, node)
        found = self._incoming.get(key)
        if found is None:
            diagram = self.diagram
            diagram.ensure(index)
            level = diagram.level(index - 1) if index > 0 else {}
            found = tuple((p, e, level[p]) for p, e in diagram.parents(index, node) if level.get(p, 0) > 0)
            self._incoming[key] = found
        return found

    # ----- ranking --------------------------------------------------------------------------
    def check(self, path: Path, index: int | None = None, node: Node | None = None) -> None:
        """Raise PathError unless ``path`` is a path of the tower (ending at ``node`` at ``index``)."""
        tower = self.diagram.tower
        nodes = path.nodes
        if index is not None and len(nodes) != index + 1:
            raise PathError(
                f"a path to level {format_level(tower.level_of(index))} has {index + 1} nodes "
                f"(levels 0..{format_level(tower.level_of(index))}), this one has {len(nodes)}"
            )
        if not nodes or nodes[0] != tower.root():
            first = tower.format(nodes[0]) if nodes else "nothing"
            raise PathError(f"a path starts at the root {tower.format(tower.root())}, not at {first}")
        if node is not None and nodes[-1] != node:
            raise PathError(f"this path ends at {tower.format(nodes[-1])}, not at {tower.format(node)}")
        self.diagram.ensure(len(nodes) - 1)
        for i in range(1, len(nodes)):
            edges = dict((p, e) for p, e, _ in self.incoming(i, nodes[i]))
            count = edges.get(nodes[i - 1], 0)
            where = format_level(tower.level_of(i))
            if count == 0:
                raise PathError(
                    f"no edge from {tower.format(nodes[i - 1])} to {tower.format(nodes[i])} "
                    f"(step to level {where})"
                )
            if not 1 <= path.edges[i - 1] <= count:
                raise PathError(
                    f"{tower.format(nodes[i - 1])} and {tower.format(nodes[i])} are joined by {count} "
                    f"edge(s), numbered 1..{count}; edge {path.edges[i - 1]} does not exist"
                )

    def rank(self, path: Path) -> int:
        """The rank of a path among the paths to its end node, in the documented order."""
        self.check(path)
        rank = 0
        nodes, edges = path.nodes, path.edges
        for i in range(len(nodes) - 1, 0, -1):
            parent, number = nodes[i - 1], edges[i - 1]
            for p, e, m in self.incoming(i, nodes[i]):
                if p == parent:
                    rank += (number - 1) * m
                    break
                rank += e * m
        return rank

    def unrank(self, index: int, node: Node, rank: int) -> Path:
        """The path of the given rank (0 ≤ rank < total) to ``node`` at ``index``."""
        total = self.total(index, node)
        check_rank(rank, total, self.diagram.tower.format(node))
        self.diagram.ensure(index)
        nodes: list[Node] = [node]
        edges: list[int] = []
        current = node
        for i in range(index, 0, -1):
            for p, e, m in self.incoming(i, current):
                block = e * m
                if rank < block:
                    number, rank = divmod(rank, m)
                    edges.append(number + 1)
                    current = p
                    break
                rank -= block
            else:  # pragma: no cover - the multiplicities sum to the total
                raise AssertionError("rank beyond the multiplicities")
            nodes.append(current)
        nodes.reverse()
        edges.reverse()
        return Path(tuple(nodes), tuple(edges))

    def iterate(self, index: int, node: Node, start: int = 0) -> Iterator[Path]:
        """Paths to ``node`` in order, from rank ``start``: each next path by one successor step
        (no recursion, so deep levels are fine)."""
        total = self.total(index, node)
        if start >= total:
            return
        path = self.unrank(index, node, start)
        nodes, edges = list(path.nodes), list(path.edges)
        # position of each step's (parent, edge) in the incoming list of nodes[i]
        slots = [0] * (index + 1)
        for i in range(1, index + 1):
            slots[i] = [p for p, _, _ in self.incoming(i, nodes[i])].index(nodes[i - 1])
        yield Path(tuple(nodes), tuple(edges))
        for _ in range(start + 1, total):
            i = 1
            while True:  # the least significant step that can still advance
                incoming = self.incoming(i, nodes[i])
                count = incoming[slots[i]][1]
                if edges[i - 1] < count:
                    edges[i - 1] += 1
                    break
                if slots[i] + 1 < len(incoming):
                    slots[i] += 1
                    edges[i - 1] = 1
                    nodes[i - 1] = incoming[slots[i]][0]
                    break
                i += 1
            for j in range(i - 1, 0, -1):  # below it: the first path to the new parent
                slots[j] = 0
                nodes[j - 1] = self.incoming(j, nodes[j])[0][0]
                edges[j - 1] = 1
            yield Path(tuple(nodes), tuple(edges))


def check_rank(rank: int, total: int, what: str) -> None:
    if total == 0:
        raise PathError(f"{what} has no path from the root")
    if not 0 <= rank < total:
        raise PathError(
            f"rank {describe(rank)} is out of range: {what} has {describe(total)} paths, ranks 0..{describe(total - 1)}"
        )


#: digits a typed rank may have (converting text to an int costs about n² steps)
MAX_RANK_DIGITS = 100_000


def parse_rank(text: str, total: int | None = None) -> int:
    """Read a rank: ``1234``, ``1_000_000``, ``10^12``, ``3*10^12``, ``10**12``, ``1e12`` (exact).
    A negative rank counts from the end (−1 is the last path) when ``total`` is given.  Read by
    ``engine.numbers_in.read_big``: ASCII digits, powers bounded by their digits before computing."""
    body = text.strip().replace("_", "").replace(" ", "")
    negative = body.startswith("-")
    if negative:
        body = body[1:]
    try:
        value = read_big(body, "a rank", max_digits=MAX_RANK_DIGITS)
    except NumberError as exc:
        raise PathError(f"not a rank: {exc} (-1 for the last)") from None
    if negative:
        if total is None:
            raise PathError(f"rank {quote(text)} is negative")
        value = total - value
        if value < 0:
            raise PathError(f"rank {quote(text)} reaches before the first path (there are {describe(total)})")
    return value
