"""From the explorer's state to what the widgets draw: pane rows and marks, node details, sums.

No mathematics here: every number comes from the Diagram (built by a worker beforehand; these
functions only read built levels and cached results).
"""

from __future__ import annotations

from engine.diagram import Diagram
from engine.levels import format_level
from engine.tower import Node
from tui.numbers import short_int
from tui.explorer.state import ExplorerState
from tui.explorer.widgets.details import NodeDetails
from tui.explorer.widgets.level_pane import LevelRows, PaneMarks
from tui.explorer.widgets.sums_bar import SumsLine

#: levels with at most this many nodes get their dimension column sized exactly
EXACT_COLUMNS_UP_TO = 2000
#: narrowest level pane, in cells (border included)
MIN_PANE_WIDTH = 16


def level_text(diagram: Diagram, index: int) -> str:
    return format_level(diagram.tower.level_of(index))


def pane_count(width: int, details: bool, most: int) -> int:
    """How many level panes fit beside the details pane (odd, so the current one can sit mid-way)."""
    room = width - (details_width(width) if details else 0)
    count = max(1, min(most, room // MIN_PANE_WIDTH))
    if count > 1 and count % 2 == 0:
        count -= 1
    return count


def details_width(width: int) -> int:
    return 28 if width < 110 else 36 if width < 170 else 44


def first_shown(diagram: Diagram, index: int, count: int) -> int:
    """Index of the leftmost pane: the current level mid-way, shifted to stay within the tower."""
    first = max(0, index - (count - 1) // 2)
    last = diagram.tower.max_index
    if last is not None:
        first = max(0, min(first, last - count + 1))
    return first


def last_needed(diagram: Diagram, index: int, count: int) -> int:
    """The deepest level index the panes (and the current node's children) need built."""
    top = max(first_shown(diagram, index, count) + count - 1, index + 1)
    last = diagram.tower.max_index
    return top if last is None else min(top, last)


def level_rows(diagram: Diagram, index: int) -> LevelRows | None:
    """The rows of a built level (None past the tower's end or beyond what is built)."""
    tower = diagram.tower
    if index < 0 or index > diagram.built:
        return None
    nodes = diagram.nodes(index)
    level = diagram.level(index)
    m_width = len(short_int(max(level.values(), default=0), 8))
    if len(nodes) <= EXACT_COLUMNS_UP_TO:
        d_width = max((len(short_int(tower.dimension(index, v), 7)) for v in nodes), default=1)
    else:
        d_width = 7
    kind = tower.level_kind(index)
    title = f"{level_text(diagram, index)}" + (f" {kind}" if kind else "")
    return LevelRows(
        index=index,
        nodes=nodes,
        multiplicity=level,
        label=tower.format,
        dimension=lambda node, i=index: tower.dimension(i, node),
        m_width=m_width,
        d_width=d_width,
        title=title,
    )


def pane_marks(state: ExplorerState, index: int, cursor: int | None) -> PaneMarks:
    """Marks for the pane of level ``index`` given the selection at ``state.index``."""
    diagram = state.diagram
    links: dict[Node, int] = {}
    if state.node is not None and index != state.index and 0 <= index <= diagram.built:
        if index == state.index - 1:
            links = dict(diagram.parents(state.index, state.node))
        elif index == state.index + 1:
            links = dict(diagram.children(state.index, state.node))
    path = state.highlighted[index] if 0 <= index < len(state.highlighted) else None
    return PaneMarks(
        cursor=cursor if index == state.index else None,
        links=links,
        path_node=path,
        bookmarked=frozenset(n for i, n in state.bookmarks if i == index),
        noted=frozenset(n for i, n in state.notes if i == index),
    )


def node_details(state: ExplorerState) -> NodeDetails | None:
    diagram, index, node = state.diagram, state.index, state.node
    if node is None or index > diagram.built:
        return None
    tower = diagram.tower
    fmt = tower.format
    last = tower.max_index
    has_next = (last is None or index < last) and index + 1 <= diagram.built
    return NodeDetails(
        label=fmt(node),
        level=level_text(diagram, index),
        kind=tower.level_kind(index),
        dimension=tower.dimension(index, node),
        multiplicity=diagram.multiplicity(index, node),
        parents=[(fmt(p), e) for p, e in diagram.parents(index, node)],
        children=[(fmt(c), e) for c, e in diagram.children(index, node)] if has_next else [],
        parent_level=level_text(diagram, index - 1) if index > 0 else None,
        child_level=level_text(diagram, index + 1) if has_next else None,
        note=state.notes.get((index, node), ""),
        bookmarked=(index, node) in state.bookmarks,
        formula=diagram.formula(index, node),
    )


def sums_line(state: ExplorerState, unfaithful: tuple[int, int | None] | None) -> SumsLine | None:
    """The sums of the current level (cached by the build worker); ``unfaithful`` is the search
    result ``(searched up to, first unfaithful index or None)`` or None while it runs."""
    diagram, index = state.diagram, state.index
    if index > diagram.built:
        return None
    sums = diagram.sums(index)
    tower = diagram.tower
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
