"""Small hand-made towers for the path tests, standing in for families merged elsewhere (each
declares the path encodings of the family it stands for) and for towers with multiple edges.

Their graphs are the textbook ones: Young's lattice (Sagan, *The Symmetric Group*, §5.1), the
stable Brauer branching graph (add or remove one box; Goodman and Wallach, *Symmetry,
Representations, and Invariants*, ch. 10), the stable walled Brauer graph on pairs of partitions
(V adds a box to the first or removes one from the second, V* the reverse; common practice)."""

from __future__ import annotations

from engine.capabilities import Encodings
from engine.matrix_tower import MatrixTower, NodeSet, Step
from engine.partitions import (
    Partition,
    format_partition,
    larger_by_one_box,
    parse_partition,
    smaller_by_one_box,
)
from engine.tower import Tower


class _PartitionTower(Tower):
    """Shared plumbing: partitions as labels, dimensions not used by the path tests (set to 1)."""

    encodings: tuple[str, ...] = ("updown", "labels")

    def capabilities(self):
        return [Encodings(self.encodings)]

    def dimension(self, index, node):
        return 1

    def tensor_dimension(self, index):
        return 1

    def format(self, node):
        return format_partition(node)

    def parse(self, text, index):
        return parse_partition(text)

    def sort_key(self, node, index=0):
        return tuple(-x for x in node)


class YoungLatticeTower(_PartitionTower):
    """GL_N on C^N: level k holds the partitions of k with at most N rows; a step adds a box."""

    family = "general-linear"
    encodings = ("tableau", "updown", "labels")

    def __init__(self, n: int) -> None:
        super().__init__(f"test-general-linear:n={n}")
        self.n = n

    def root(self) -> Partition:
        return ()

    def children(self, index, node):
        return [(p, 1) for p in larger_by_one_box(node) if len(p) <= self.n]


class BrauerLatticeTower(_PartitionTower):
    """The stable range of O(N) (N large): a step adds or removes one box."""

    def __init__(self, family: str = "orthogonal") -> None:
        super().__init__(f"test-{family}")
        self.family = family

    def root(self) -> Partition:
        return ()

    def children(self, index, node):
        return [(p, 1) for p in smaller_by_one_box(node) + larger_by_one_box(node)]


class WalledTower(Tower):
    """The stable range of GL_N on a word in V and V*: nodes are pairs (λ, μ)."""

    family = "mixed"

    def capabilities(self):
        return [Encodings(("pairs",))]

    def __init__(self, word: str) -> None:
        super().__init__(f"test-mixed:word={word}")
        self.word = word
        self.max_index = len(word)

    def root(self):
        return ((), ())

    def children(self, index, node):
        lam, mu = node
        if self.word[index] == "d":
            lam, mu = mu, lam
        out = [(a, mu) for a in larger_by_one_box(lam)] + [(lam, b) for b in smaller_by_one_box(mu)]
        if self.word[index] == "d":
            out = [(b, a) for a, b in out]
        return [(pair, 1) for pair in out]

    def dimension(self, index, node):
        return 1

    def tensor_dimension(self, index):
        return 1

    def format(self, node):
        return "(" + format_partition(node[0]) + "," + format_partition(node[1]) + ")"

    def parse(self, text, index):
        body = text.strip()[1:-1]
        split = body.index(")") + 1
        return (parse_partition(body[:split]), parse_partition(body[split + 1 :]))

    def sort_key(self, node, index=0):
        return (tuple(-x for x in node[0]), tuple(-x for x in node[1]))


def cyclic_tower(m: int, up: int, down: int) -> MatrixTower:
    """C_m on a module whose tensor graph joins x_j to x_{j+1} by ``up`` edges and to x_{j−1} by
    ``down`` edges (a sum of characters; multiple edges when up or down exceeds 1)."""
    nodes = NodeSet(f"C{m}", tuple(f"x{j}" for j in range(m)), (1,) * m)
    matrix = tuple(
        tuple((up if j == (i + 1) % m else 0) + (down if j == (i - 1) % m else 0) for j in range(m)) for i in range(m)
    )
    return MatrixTower(f"test-graph:C{m}", "graph", [Step("tensor", nodes, nodes, matrix)], "x0")
