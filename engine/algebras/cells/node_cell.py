"""The cell module belonging to one node of the tower, for the explorer's details: its label, its
dimension (by formula) and, where cheap, the rank of its Gram form at the level's parameter, which
equals the node's multiplicity (the theory of cellular algebras, defined in 1996; the simple head of the cell module at x = N is the node's centralizer module).
How labels match nodes is ``engine.algebras.cells.labels.node_of``."""

from __future__ import annotations

from dataclasses import dataclass
from typing import TYPE_CHECKING, Hashable

from engine.algebras.cells.labels import cell_labels, matching_note, node_of
from engine.algebras.cells.report import cell_dimension, estimated_work

if TYPE_CHECKING:
    from engine.capabilities import AlgebraLevel

#: estimated work (``estimated_work`` units) computed at once for the details pane (~10 ms)
QUICK_WORK = 10**7
#: beyond this many vertices per row the cell modules are not looked at from the details pane
#: (their dimensions are counted by listing half diagrams and tableaux)
QUICK_VERTICES = 8


@dataclass(frozen=True)
class NodeCell:
    label: str
    dimension: int
    #: the rank of the Gram form at the parameter, or None when it would not be quick
    rank: int | None
    note: str


def node_cell(level: "AlgebraLevel", node: Hashable, work_limit: int = QUICK_WORK) -> NodeCell | None:
    """The cell module whose head is ``node``'s module at x = N, or None when no label matches or
    the level has more than ``QUICK_VERTICES`` vertices per row."""
    if level.vertices > QUICK_VERTICES:
        return None
    from engine.algebras.cells.gram import GramMatrix
    from engine.algebras.cells.modules import CellModule

    for label in cell_labels(level):
        if node_of(level, label) != node:
            continue
        dimension = cell_dimension(level, label)
        rank = None
        if estimated_work(level, label) <= work_limit:
            x = level.parameter if level.parameter is not None else 0
            rank = GramMatrix.of(CellModule(level, label)).rank_at(x)
        return NodeCell(label.text, dimension, rank, matching_note(level))
    return None
