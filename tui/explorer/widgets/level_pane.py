"""One level of the diagram as a virtualized list (Line API): only the visible rows are formatted.

The first line is a column header (``node``, ``m``, ``dim``); then a row reads ``▶• label*✎   m  dim``: the first cell is the selection (``▶``) or, in a
neighbouring pane, the number of edges joining the node to the selected one (``1``…``9``, ``+``);
the second marks a highlighted path (``•``); after the label ``*`` marks a bookmark and ``✎`` a
note.  Numbers are right-aligned and shortened (``3.18e41``); the details pane has them exact.
"""

from __future__ import annotations

from dataclasses import dataclass, field
from typing import Any, Callable

from rich.cells import cell_len
from rich.segment import Segment
from textual import events
from textual.cache import LRUCache
from textual.geometry import Size
from textual.message import Message
from textual.scroll_view import ScrollView
from textual.strip import Strip

from tui.numbers import short_int


@dataclass
class LevelRows:
    """The rows of one level, lazily: nodes in display order, multiplicities, labels, dimensions."""

    index: int
    nodes: list[Any]
    multiplicity: dict[Any, int]
    label: Callable[[Any], str]
    dimension: Callable[[Any], int]
    #: cells for the multiplicity and dimension columns
    m_width: int = 8
    d_width: int = 7
    #: cells of the longest label of the level
    label_width: int = 8
    title: str = ""
    #: node → row, for scrolling to given nodes
    position: dict[Any, int] = field(default_factory=dict)

    def __len__(self) -> int:
        return len(self.nodes)


#: cells a pane spends besides the label and the numbers: the two mark cells, a space before each
#: number column, one spare cell, the scroll bar and the right border
_FRAME = 2 + 1 + 1 + 1 + 1 + 1


def natural_width(label_width: int, m_width: int, d_width: int) -> int:
    """Cells a pane needs to show every label, multiplicity and dimension whole."""
    return label_width + max(m_width, 1) + max(d_width, 3) + _FRAME


@dataclass
class PaneMarks:
    """What the pane marks besides its rows: the selection, links to it, a path, bookmarks, notes."""

    cursor: int | None = None
    links: dict[Any, int] = field(default_factory=dict)
    path_node: Any = None
    bookmarked: frozenset[Any] = frozenset()
    noted: frozenset[Any] = frozenset()


class LevelPane(ScrollView, can_focus=False):
    """A level's nodes; the main screen sets rows and marks, the pane draws the visible lines."""

    @dataclass
    class Clicked(Message):
        """A click on a row (``row`` is None for the title or the header: the level itself)."""

        index: int
        row: int | None

    COMPONENT_CLASSES = {"level-pane--cursor", "level-pane--link", "level-pane--path", "level-pane--header"}

    DEFAULT_CSS = """
    LevelPane { overflow-x: hidden; scrollbar-size-vertical: 1; }
    LevelPane > .level-pane--cursor { text-style: reverse bold; }
    LevelPane > .level-pane--link { text-style: bold; }
    LevelPane > .level-pane--path { text-style: underline; }
    LevelPane > .level-pane--header { text-style: dim; }
    """

    def __init__(self, **kwargs: Any) -> None:
        super().__init__(**kwargs)
        self.rows: LevelRows | None = None
        self.marks = PaneMarks()
        self._generation = 0
        # A few screens' worth of lines: every Strip carries several small caches that the cyclic
        # garbage collector must walk, so a larger cache makes its full passes stall key presses.
        self._strips: LRUCache[tuple[int, int, int, bool], Strip] = LRUCache(256)
        self._waiting = ""

    # ----- data in ------------------------------------------------------------------------------------
    def show(self, rows: LevelRows | None, marks: PaneMarks) -> None:
        """New rows (or none) and marks; keeps the scroll position when the level is the same."""
        same_level = rows is not None and self.rows is not None and rows.index == self.rows.index
        self.rows = rows
        self.marks = marks
        self._generation += 1
        self._strips.clear()
        self.virtual_size = Size(0, 0 if rows is None else len(rows) + 1)
        if not same_level:
            self.scroll_to(y=0, animate=False, immediate=True)
        self.border_title = "" if rows is None else self._title(rows)
        self.refresh()

    def _title(self, rows: LevelRows) -> str:
        """``level kind · count``, the kind left out (then the count) when the pane is too narrow."""
        room = (self.size.width or 80) - 3
        for title in (f"{rows.title} · {len(rows):,}", f"{rows.title.split(' ')[0]} · {len(rows):,}",
                      rows.title.split(" ")[0]):
            if cell_len(title) <= room:
                return title
        return rows.title.split(" ")[0]

    def on_resize(self) -> None:
        if self.rows is not None:
            self.border_title = self._title(self.rows)

    def show_waiting(self, title: str, text: str) -> None:
        """No rows yet: the level is being built (or cannot be)."""
        self.rows = None
        self.marks = PaneMarks()
        self._waiting = text
        self._generation += 1
        self._strips.clear()
        self.virtual_size = Size(0, 0)
        self.border_title = title
        self.refresh()

    def move_cursor(self, cursor: int) -> None:
        """Move the selection only: repaint two lines, scroll it into view."""
        old = self.marks.cursor
        self.marks.cursor = cursor
        for row in (old, cursor):
            if row is not None:
                self.refresh_line(row + 1 - self.scroll_offset.y)
        self.scroll_to_center_if_needed(cursor)

    def page(self) -> int:
        """Rows in one screenful (the header line excluded)."""
        return max(1, (self.scrollable_content_region.height or 2) - 1)

    def scroll_to_center_if_needed(self, row: int) -> None:
        height = self.page()
        top = self.scroll_offset.y
        if not top <= row < top + height:
            self.scroll_to(y=max(0, row - height // 2), animate=False, immediate=True)

    def scroll_to_nodes(self, nodes: list[Any]) -> None:
        """Bring the rows of ``nodes`` into view: all of them, centred, when they fit, else the first."""
        rows = self.rows
        if rows is None or not nodes:
            return
        found = sorted(p for p in (rows.position.get(n) for n in nodes) if p is not None)
        if not found:
            return
        height = self.page()
        top = self.scroll_offset.y
        if top <= found[0] and found[-1] < top + height:
            return
        low, high = found[0], found[-1]
        start = low - max(0, (height - (high - low + 1)) // 2) if high - low < height else low
        self.scroll_to(y=max(0, start), animate=False, immediate=True)

    def on_click(self, event: events.Click) -> None:
        if self.rows is None:
            return
        offset = event.get_content_offset(self)
        if offset is None or offset.y == 0:
            self.post_message(self.Clicked(self.rows.index, None))
            return
        row = self.scroll_offset.y + offset.y - 1
        if 0 <= row < len(self.rows):
            self.post_message(self.Clicked(self.rows.index, row))

    # ----- drawing ------------------------------------------------------------------------------------
    def notify_style_update(self) -> None:
        super().notify_style_update()
        self._strips.clear()

    def render_line(self, y: int) -> Strip:
        width = self.scrollable_content_region.width
        try:
            if y == 0:
                return self._header(width)
            return self._line(self.scroll_offset.y + y - 1, width)
        except Exception as exc:  # noqa: BLE001 - a drawing fault must never end the app
            return Strip([Segment(f"! {type(exc).__name__}"[:width], self.rich_style)]).adjust_cell_length(
                width, self.rich_style
            )

    def _header(self, width: int) -> Strip:
        style = self.rich_style + self.get_component_rich_style("level-pane--header")
        rows = self.rows
        if rows is None:
            return Strip([Segment(self._waiting[:width], style)]).adjust_cell_length(width, self.rich_style)
        m_width, d_width = self._columns(rows, width)
        numbers = f" {'m':>{m_width}}" + (f" {'dim':>{d_width}}" if d_width else "")
        text = "  node".ljust(max(width - cell_len(numbers), 0)) + numbers
        return Strip([Segment(text[:width], style)]).adjust_cell_length(width, self.rich_style)

    def _line(self, row: int, width: int) -> Strip:
        rows = self.rows
        if rows is None or row < 0 or row >= len(rows) or width <= 0:
            return Strip.blank(width, self.rich_style)
        on_cursor = row == self.marks.cursor
        key = (row, width, self._generation, on_cursor)
        strip = self._strips.get(key)
        if strip is None:
            strip = self._strips[key] = self._format(rows, row, width, on_cursor)
        return strip

    @staticmethod
    def _columns(rows: LevelRows, width: int) -> tuple[int, int]:
        """Widths of the multiplicity and dimension columns: full, then shorter numbers, then no
        dimension (the details pane has it), so that a narrow pane keeps some of the label; the
        same for every row of the pane, so the columns line up."""
        want = 2 + min(rows.label_width, 8)  # the marks and (up to) eight cells of label
        d_full = max(rows.d_width, 3)
        choices = ((rows.m_width, d_full), (min(rows.m_width, 6), min(d_full, 5)), (min(rows.m_width, 6), 0),
                   (min(rows.m_width, 5), 0))
        want_all = 2 + rows.label_width
        for m_width, d_width in choices:  # first whatever keeps every label whole
            if want_all + 1 + m_width + (1 + d_width if d_width else 0) <= width:
                return m_width, d_width
        for m_width, d_width in choices:
            if want + 1 + m_width + (1 + d_width if d_width else 0) <= width:
                return m_width, d_width
        return choices[-1]

    def _format(self, rows: LevelRows, row: int, width: int, on_cursor: bool) -> Strip:
        node = rows.nodes[row]
        marks = self.marks
        edges = marks.links.get(node)
        first = "▶" if on_cursor else (" " if edges is None else (str(edges) if edges < 10 else "+"))
        second = "•" if node == marks.path_node and marks.path_node is not None else " "
        flags = ("*" if node in marks.bookmarked else "") + ("✎" if node in marks.noted else "")
        label = rows.label(node)
        m_width, d_width = self._columns(rows, width)
        numbers = f" {short_int(rows.multiplicity.get(node, 0), m_width):>{m_width}}"
        if d_width:
            numbers += f" {short_int(rows.dimension(node), d_width):>{d_width}}"
        room = max(width - 2 - cell_len(numbers), 1)
        if cell_len(label) + cell_len(flags) <= room:
            label += flags
        elif cell_len(label) > room:  # flags go first; a label is cut only in a pane too narrow for it
            label = label[: max(room - 1, 0)] + "…"
        text = f"{first}{second}{label}".ljust(2 + room) + numbers
        style = self.rich_style
        if on_cursor:
            style = style + self.get_component_rich_style("level-pane--cursor")
        elif edges is not None:
            style = style + self.get_component_rich_style("level-pane--link")
        elif second != " ":
            style = style + self.get_component_rich_style("level-pane--path")
        return Strip([Segment(text, style)]).adjust_cell_length(width, style if on_cursor else self.rich_style)

