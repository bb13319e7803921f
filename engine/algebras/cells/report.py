"""One cell module's answer (``cell_answer``) and the semisimplicity report of a level
(``level_report``): the parameters where the algebra is not semisimple, and at x = N each cell
module's dimension, Gram rank and the tower's node it belongs to.

A cellular algebra is semisimple exactly when the form of every cell module is non-degenerate
(the 1996 paper that defined cellular algebras, Theorem 3.8), so the algebra of the
level fails to be semisimple at x exactly at the roots of the cells' Gram determinants.  At x = N
the rank of a cell's Gram matrix is the dimension of its simple quotient; when the cell's label
matches a node of the tower (``labels.node_of``), that dimension is the node's multiplicity (the
centralizer's simple module), which the report checks against the Bratteli diagram.  A cell whose
label names no node of the level but whose rank is positive is a simple module of the abstract
algebra that V^{⊗k} does not see (it lies in the kernel of the action).
"""

from __future__ import annotations

from dataclasses import dataclass, field
from fractions import Fraction
from math import ceil, log2
from typing import TYPE_CHECKING, Callable, Hashable

from engine.algebras.cells.gram import GramMatrix, factorization
from engine.algebras.cells.half_diagrams import count_half_diagrams
from engine.algebras.cells.labels import CellLabel, cell_labels, matching_note, node_of, read_cell_label
from engine.algebras.cells.modules import CellModule
from engine.algebras.cells.specht import standard_tableaux
from engine.errors import TooLarge

if TYPE_CHECKING:
    from engine.capabilities import AlgebraLevel

#: estimated work (≈ 8·10⁸ units a second on the bench machine) above which a request is refused
WORK_LIMIT = 10**11


@dataclass
class CellAnswer:
    """One cell module at one level: what ``gram`` prints."""

    level: "AlgebraLevel"
    label: CellLabel
    dimension: int
    rank: int
    determinant: list[int]
    roots: list[tuple[Fraction, int]]
    others: list[tuple[list[int], int]]
    node: Hashable | None
    gram: GramMatrix | None = None

    @property
    def through(self) -> int:
        return sum(self.label.counts) + (1 if self.level.half else 0)


def cell_dimension(level: "AlgebraLevel", label: CellLabel) -> int:
    """dim W(λ) = (half diagrams) · f^λ, by formula (``count_half_diagrams``, hook lengths)."""
    f = 1
    for shape in label.shapes:
        f *= len(standard_tableaux(shape))
    return count_half_diagrams(level, label.counts) * f


def estimated_work(level: "AlgebraLevel", label: CellLabel) -> int:
    """dim³ (one determinant) × (degree bound + 1) (evaluation points) × primes (≈ dim·log₂dim/50)."""
    dim = cell_dimension(level, label)
    if dim == 0:
        return 0
    if level.kind == "symmetric-group":  # one half diagram: G′ is the identity, det 1
        return dim**2 * 100
    free = level.vertices - sum(label.counts)
    per_row = free if level.kind == "partition" else free // 2
    primes = max(1, ceil(dim * log2(dim + 1) / 50))
    return dim**3 * (dim * per_row + 1) * primes


def guard(level: "AlgebraLevel", labels: list[CellLabel], what: str) -> None:
    work = sum(estimated_work(level, label) for label in labels)
    if work > WORK_LIMIT:
        largest = max(labels, key=lambda label: cell_dimension(level, label))
        raise TooLarge(f"{what} of {level.name} would take about {work / 8e8:.0f} s (estimated; the largest cell "
                       f"module, {largest.text}, has dimension {cell_dimension(level, largest)}); the limit is "
                       f"{WORK_LIMIT / 8e8:.0f} s")


def cell_answer(level: "AlgebraLevel", label: CellLabel | str, keep_matrix: bool = False,
                cancel: Callable[[], bool] | None = None) -> CellAnswer:
    """Dimension, rank at the level's parameter, Gram determinant and its roots for one cell."""
    if isinstance(label, str):
        label = read_cell_label(level, label)
    guard(level, [label], f"the Gram determinant of the cell module {label.text}")
    module = CellModule(level, label)
    gram = GramMatrix.of(module, cancel)
    determinant = gram.determinant(cancel)
    roots, others = factorization(determinant)
    x = level.parameter if level.parameter is not None else 0
    return CellAnswer(level, label, module.dimension, gram.rank_at(x), determinant, roots, others,
                      node_of(level, label), gram if keep_matrix else None)


@dataclass
class NodeCheck:
    """One row of the table at x = N."""

    cell: CellAnswer
    node_label: str | None
    multiplicity: int
    #: "yes" (rank = multiplicity), "no" (they differ), "not a node" (the label names no node here)
    agree: str


@dataclass
class LevelReport:
    level: "AlgebraLevel"
    rows: list[NodeCheck]
    #: nodes of the tower at this level that no cell label matched (label, multiplicity)
    unmatched: list[tuple[str, int]] = field(default_factory=list)

    @property
    def note(self) -> str:
        return matching_note(self.level)

    @property
    def rational_parameters(self) -> list[Fraction]:
        """The rational x where some cell's Gram determinant vanishes, ascending."""
        return sorted({root for row in self.rows for root, _ in row.cell.roots})

    @property
    def other_factors(self) -> list[list[int]]:
        """Irreducible factors of degree ≥ 2 of the Gram determinants (their roots are irrational)."""
        seen: list[list[int]] = []
        for row in self.rows:
            for factor, _ in row.cell.others:
                if factor not in seen:
                    seen.append(factor)
        return sorted(seen, key=lambda f: (len(f), f))

    @property
    def semisimple_at_parameter(self) -> bool | None:
        """Whether the algebra is semisimple at its parameter (None for CS_k: no parameter; it is
        semisimple, Maschke's theorem)."""
        return all(row.cell.rank == row.cell.dimension for row in self.rows)

    @property
    def agree(self) -> bool:
        return not self.unmatched and all(row.agree != "no" for row in self.rows)


def level_report(level: "AlgebraLevel", nodes: dict[Hashable, int], format_node: Callable[[Hashable], str],
                 cancel: Callable[[], bool] | None = None,
                 progress: Callable[[float, float], None] | None = None) -> LevelReport:
    """The semisimplicity report of a level; ``nodes`` is the tower's level (node → multiplicity)."""
    labels = cell_labels(level)
    guard(level, labels, "the semisimplicity report")
    rows = []
    matched = set()
    work = [estimated_work(level, label) + 1 for label in labels]
    done = 0
    for label, cost in zip(labels, work):
        if cell_dimension(level, label) == 0:
            done += cost
            continue
        answer = cell_answer(level, label, cancel=cancel)
        node = answer.node
        if node is not None and node in nodes:
            matched.add(node)
            m = nodes[node]
            rows.append(NodeCheck(answer, format_node(node), m, "yes" if m == answer.rank else "no"))
        else:
            rows.append(NodeCheck(answer, None, 0, "not a node"))
        done += cost
        if progress is not None:
            progress(done, sum(work))
    unmatched = [(format_node(node), m) for node, m in nodes.items() if node not in matched]
    return LevelReport(level, rows, unmatched)
