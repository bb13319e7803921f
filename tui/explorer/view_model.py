"""From the explorer's state to what the widgets draw: level data, pane layout, marks, details, sums.

No mathematics here: every number comes from the Diagram.  ``level_data`` runs in a worker (it
formats every label once, to size the pane); the other functions only read what is there.
"""

from __future__ import annotations

from dataclasses import dataclass, field
from typing import Any, Callable

from rich.cells import cell_len

from engine.diagram import Diagram, LevelSums
from engine.levels import format_level
from engine.tower import Node
from tui.explorer.state import ExplorerState
from tui.explorer.widgets.details import NodeDetails
from tui.explorer.widgets.level_pane import LevelRows, PaneMarks, natural_width
from tui.explorer.widgets.sums_bar import SumsLine
from tui.numbers import short_int

#: levels with at most this many nodes get their dimension column sized exactly
EXACT_COLUMNS_UP_TO = 2000
#: narrowest side pane, in cells (border and scroll bar included); side panes may cut labels
MIN_SIDE_WIDTH = 14
#: the most panes the layout chooses by itself (more with the + key)
AUTO_MOST = 5
#: narrowest details pane
MIN_DETAILS = 24


@dataclass
class LevelData:
    """One level as the panes show it: built, or reached by a jump (``jumped``)."""

    index: int
    nodes: list[Any]
    multiplicity: dict[Any, int]
    label_width: int
    m_width: int
    d_width: int
    jumped: bool = False
    position: dict[Any, int] = field(default_factory=dict)

    @property
    def width(self) -> int:
        return natural_width(self.label_width, self.m_width, self.d_width)


def level_text(diagram: Diagram, index: int) -> str:
    return format_level(diagram.tower.level_of(index))


#: a build estimated to walk at most this many edges is preferred to a matrix-power jump
BUILD_RATHER_THAN_JUMP = 3_000_000


def by_jump(diagram: Diagram, index: int) -> bool:
    """Whether the explorer reaches level ``index`` by the family's jump rather than by building.

    Matrix-power jumps (families without a closed form: a finite node set) are quick: taken when a
    build would be long.  A closed form would have to be evaluated on every node of the level
    (every partition of N, with numbers of the level's size) and cannot be cancelled: the panes
    build those levels instead (the CLI answers single nodes deep down by the closed form)."""
    if not diagram.can_jump or index <= diagram.built:
        return False
    from engine.capabilities import ClosedForm, SizeGuard

    tower = diagram.tower
    if tower.capability(ClosedForm) is not None:
        return False
    guard = tower.capability(SizeGuard)
    estimate = None if guard is None else guard.edges(index)
    return estimate is None or estimate > BUILD_RATHER_THAN_JUMP


def level_data(diagram: Diagram, index: int) -> LevelData:
    """The level (built, or by a jump where building it would be long), its display order and its
    column widths.  Call from a worker: it may build, and it formats every label."""
    tower = diagram.tower
    jumped = by_jump(diagram, index)
    if jumped:
        level, nodes = diagram.level_at(index), diagram.nodes_at(index)
    else:
        level, nodes = diagram.level(index), diagram.nodes(index)
    fmt = tower.format
    labels = list(map(fmt, nodes))
    if "".join(labels).isascii():  # one cell a character: no per-label cell count needed
        label_width = max(map(len, labels), default=1)
    else:
        label_width = max(map(cell_len, labels), default=1)
    m_width = len(short_int(max(level.values(), default=0), 11 if len(nodes) <= EXACT_COLUMNS_UP_TO else 8))
    if len(nodes) <= EXACT_COLUMNS_UP_TO:
        d_width = max((len(short_int(tower.dimension(index, v), 7)) for v in nodes), default=1)
    else:
        d_width = 7
    position = {v: n for n, v in enumerate(nodes)}
    return LevelData(index, nodes, level, label_width, max(m_width, 1), max(d_width, 3), jumped, position)


def level_sums(diagram: Diagram, data: LevelData) -> LevelSums:
    return diagram.sums_of(data.index, data.multiplicity) if data.jumped else diagram.sums(data.index)


# ----- layout ---------------------------------------------------------------------------------------
def details_width(width: int) -> int:
    return 28 if width < 110 else 36 if width < 170 else 44


@dataclass(frozen=True)
class Layout:
    count: int
    current_width: int
    details_width: int


def layout(width: int, details: bool, requested: int | None, current: int, side: int) -> Layout:
    """How many panes, and how wide the current one and the details pane are.

    The current pane gets its natural width (labels whole); the details pane gives up cells down to
    MIN_DETAILS for it.  Side panes share what is left: automatically three panes when two side
    panes of MIN_SIDE_WIDTH fit, five only when all five fit at their natural width (fewer, wider
    panes before more narrow ones); ``requested`` (the + and - keys) overrides the count.
    """
    dw = details_width(width) if details else 0
    if details and current > width - dw:
        dw = max(MIN_DETAILS, width - current)
    room = width - dw
    current = min(current, room)
    if requested is not None:
        most = 1 + 2 * max(0, (room - current) // (2 * MIN_SIDE_WIDTH))
        count = max(1, min(requested, most))
        if count % 2 == 0 and count > 1:
            count -= 1
        return Layout(count, current, dw)
    count = 1
    if current + 2 * MIN_SIDE_WIDTH <= room:
        count = 3
        while count + 2 <= AUTO_MOST and current + (count + 1) * side <= room:
            count += 2
    return Layout(count, current, dw)


def first_shown(diagram: Diagram, index: int, count: int) -> int:
    """Index of the leftmost pane: the current level mid-way, shifted to stay within the tower."""
    first = max(0, index - (count - 1) // 2)
    last = diagram.tower.max_index
    if last is not None:
        first = max(0, min(first, last - count + 1))
    return first


def span(diagram: Diagram, index: int, count: int) -> list[int]:
    """The levels the panes show, nearest to the current one first (the order to build them)."""
    first = first_shown(diagram, index, count)
    last = diagram.tower.max_index
    shown = [i for i in range(first, first + count) if last is None or i <= last]
    return sorted(shown, key=lambda i: (abs(i - index), -i))


# ----- rows, marks, details, sums ---------------------------------------------------------------------
def level_rows(diagram: Diagram, data: LevelData | None) -> LevelRows | None:
    if data is None:
        return None
    tower = diagram.tower
    kind = tower.level_kind(data.index)
    title = level_text(diagram, data.index) + (f" {kind}" if kind else "")
    return LevelRows(
        index=data.index,
        nodes=data.nodes,
        multiplicity=data.multiplicity,
        label=tower.format,
        dimension=lambda node, i=data.index: tower.dimension(i, node),
        m_width=data.m_width,
        d_width=data.d_width,
        label_width=data.label_width,
        title=title,
        position=data.position,
    )


def parents_shown(state: ExplorerState, shown: dict[int, LevelData]) -> list[tuple[Node, int]] | None:
    """The selection's parents with edge counts; None while a level reached by a jump waits for
    the level before it (asking the diagram would jump there on the UI thread)."""
    diagram, index, node = state.diagram, state.index, state.node
    if node is None or index == 0:
        return []
    if index - 1 <= diagram.built:
        return diagram.parents(index, node)
    before = shown.get(index - 1)
    candidates = diagram.tower.parents(index, node)
    if before is None or candidates is None:
        return None
    return [(p, e) for p, e in candidates if p in before.position]


def links(state: ExplorerState, index: int, shown: dict[int, LevelData] | None = None) -> dict[Node, int]:
    """Edge counts joining the selection to the nodes of level ``index`` (a neighbouring level)."""
    diagram = state.diagram
    if state.node is None:
        return {}
    if index == state.index - 1:
        return dict(parents_shown(state, shown or {}) or [])
    if index == state.index + 1:
        return dict(diagram.children(state.index, state.node))
    return {}


def pane_marks(state: ExplorerState, index: int, cursor: int | None,
               shown: dict[int, LevelData] | None = None) -> PaneMarks:
    """Marks for the pane of level ``index`` given the selection at ``state.index``."""
    path = state.highlighted[index] if 0 <= index < len(state.highlighted) else None
    return PaneMarks(
        cursor=cursor if index == state.index else None,
        links=links(state, index, shown),
        path_node=path,
        bookmarked=frozenset(n for i, n in state.bookmarks if i == index),
        noted=frozenset(n for i, n in state.notes if i == index),
    )


def _formatted(fmt: Callable[[Node], str], edges: list[tuple[Node, int]] | None) -> list[tuple[str, int]] | None:
    """Edges with their nodes' labels; None (not known yet) stays None."""
    return None if edges is None else [(fmt(n), e) for n, e in edges]


def node_details(state: ExplorerState, data: LevelData | None,
                 shown: dict[int, LevelData] | None = None) -> NodeDetails | None:
    diagram, index, node = state.diagram, state.index, state.node
    if node is None or data is None:
        return None
    tower = diagram.tower
    fmt = tower.format
    last = tower.max_index
    has_next = last is None or index < last
    return NodeDetails(
        label=fmt(node),
        level=level_text(diagram, index),
        kind=tower.level_kind(index),
        dimension=tower.dimension(index, node),
        multiplicity=data.multiplicity.get(node, 0),
        parents=_formatted(fmt, parents_shown(state, shown or {})),
        children=[(fmt(c), e) for c, e in diagram.children(index, node)] if has_next else [],
        parent_level=level_text(diagram, index - 1) if index > 0 else None,
        child_level=level_text(diagram, index + 1) if has_next else None,
        note=state.notes.get((index, node), ""),
        bookmarked=(index, node) in state.bookmarks,
        formula=diagram.formula(index, node),
        cell=cell_line(diagram, index, node, data.multiplicity.get(node, 0)),
    )


def cell_line(diagram: Diagram, index: int, node: Node, multiplicity: int) -> str | None:
    """The node's cell module: its label and dimension, the rank of its Gram form at the parameter
    (where quick) and whether it equals the multiplicity; None where the family has no algebra."""
    algebra = diagram.algebra(index)
    if algebra is None:
        return None
    from engine.algebras.cells.node_cell import node_cell
    from engine.errors import UserError

    try:
        found = node_cell(algebra, node)
    except (UserError, MemoryError, RecursionError):
        return None
    if found is None:
        if algebra.vertices > 8:
            return f"of {algebra.name}: in the algebra view (a, then c)"
        return f"none of {algebra.name} has this node as its head"
    x = "0" if algebra.parameter is None else str(algebra.parameter)
    head = f"{found.label} of {algebra.name}, dimension {found.dimension:,}"
    if found.rank is None:
        return f"{head}; its Gram rank at x = {x}: in the algebra view (a, then c)"
    agree = "= m ✓" if found.rank == multiplicity else f"≠ m = {multiplicity} ✗"
    return f"{head}; rank of its Gram form at x = {x}: {found.rank:,} {agree}"


def sums_line(state: ExplorerState, sums: LevelSums | None, unfaithful: tuple[int, int | None] | None) -> SumsLine | None:
    """The sums of the current level; ``unfaithful`` is the search result ``(searched up to, first
    unfaithful index or None)`` or None while it runs."""
    diagram, index = state.diagram, state.index
    if sums is None:
        return None
    found: str | None = None
    searched = ""
    if unfaithful is not None:
        upto, first = unfaithful
        if first is not None:
            found = level_text(diagram, first)
        elif upto >= index:
            found, searched = "", level_text(diagram, upto)
    return SumsLine(
        level=level_text(diagram, index),
        multiplicities=sums.multiplicities,
        squares=sums.squares,
        weighted=sums.weighted,
        tensor_dimension=sums.tensor_dimension,
        generic_dimension=sums.generic_dimension,
        algebra=None if (algebra := diagram.algebra(index)) is None else algebra.name,
        unfaithful_from=found,
        searched=searched,
    )
