"""One exact view of a finite tower's repeating step, shared by series, walks and critical groups.

For one step M (tensoring with V) the whole step is M; for two half steps R (restrict) and I
(induce) it is W = R·I (restriction then induction, Σ_j W_ij d_j = [G:H]·d_i), and a half-level
node x at level k+1/2 has multiplicity (e_root W^k R)_x (Goodman, de la Harpe, Jones, *Coxeter
Graphs and Towers of Algebras*, 1989, 2.1)."""

from __future__ import annotations

from dataclasses import dataclass

from engine.capabilities import FiniteSteps, Node, require
from engine.errors import UserError


@dataclass(frozen=True)
class FiniteView:
    """Whole-level nodes in display order, their dimensions, the whole step W (rows and columns
    in that order), its constant n (Σ_j W_ij d_j = n·d_i: dim V, or [G:H]), the root's position,
    and for towers with half levels the first half step R to the half-level nodes."""

    spec: str
    nodes: tuple[Node, ...]
    labels: tuple[str, ...]
    dimensions: tuple[int, ...]
    matrix: tuple[tuple[int, ...], ...]
    constant: int
    root: int
    period: int
    half_nodes: tuple[Node, ...] = ()
    half_labels: tuple[str, ...] = ()
    half_dimensions: tuple[int, ...] = ()
    half_matrix: tuple[tuple[int, ...], ...] = ()

    @property
    def size(self) -> int:
        return len(self.nodes)


def finite_view(tower, who: str) -> FiniteView:
    """The view of ``tower``'s FiniteSteps; the one-line UserError of ``require`` without one."""
    steps: FiniteSteps = require(tower, FiniteSteps, who)
    first = steps.steps[0]
    whole = steps.whole_step()
    order = _display_order(tower, first.rows, 0)
    matrix = tuple(tuple(whole.matrix[i][j] for j in order) for i in order)
    root = order.index(steps.root_position)
    view = dict(
        spec=tower.spec, nodes=tuple(first.rows[i] for i in order), labels=tuple(first.row_labels[i] for i in order),
        dimensions=tuple(first.row_dimensions[i] for i in order), matrix=matrix, constant=whole.constant,
        root=root, period=steps.period,
    )
    if steps.period == 2:
        half = _display_order(tower, first.columns, 1)
        view.update(
            half_nodes=tuple(first.columns[j] for j in half), half_labels=tuple(first.column_labels[j] for j in half),
            half_dimensions=tuple(first.column_dimensions[j] for j in half),
            half_matrix=tuple(tuple(first.matrix[i][j] for j in half) for i in order),
        )
    return FiniteView(**view)


def _display_order(tower, nodes: tuple[Node, ...], index: int) -> list[int]:
    try:
        ordered = tower.sort_nodes(list(nodes), index)
        position = {node: i for i, node in enumerate(nodes)}
        return [position[node] for node in ordered]
    except (TypeError, KeyError):
        return list(range(len(nodes)))


def locate(tower, view: FiniteView, label: str) -> tuple[bool, int]:
    """(half, position) of the node named ``label``: a whole-level node, else a half-level one."""
    errors: list[str] = []
    for half, nodes in ((False, view.nodes), (True, view.half_nodes)):
        if half and view.period == 1:
            break
        try:
            node = tower.parse(label, 1 if half else 0)
        except UserError as error:
            errors.append(str(error))
            continue
        if node in nodes:
            return half, nodes.index(node)
    shown = ", ".join(view.labels[:12]) + (" ..." if view.size > 12 else "")
    raise UserError(f"{label[:60]!r} is not a node of {view.spec} (whole-level nodes: {shown})")
