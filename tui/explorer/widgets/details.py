"""The details pane: everything about the selected node, numbers exact."""

from __future__ import annotations

from dataclasses import dataclass, field

from rich.text import Text
from textual.app import ComposeResult
from textual.containers import VerticalScroll
from textual.widgets import Static

from tui.numbers import exact_int, wrap_text
from tui.explorer.young import draw_label


@dataclass
class NodeDetails:
    label: str
    level: str
    kind: str
    dimension: int
    multiplicity: int
    #: None while the level before a jumped level is being worked out
    parents: list[tuple[str, int]] | None = field(default_factory=list)
    children: list[tuple[str, int]] = field(default_factory=list)
    parent_level: str | None = None
    child_level: str | None = None
    note: str = ""
    bookmarked: bool = False
    formula: str | None = None
    #: the node's cell module of the level's diagram algebra, one line (None: the family has none)
    cell: str | None = None


def _neighbours(text: Text, title: str, level: str | None, items: list[tuple[str, int]] | None,
                width: int) -> None:
    if level is None:
        return
    if items is None:
        text.append(f"{title} at {level}: ", style="bold")
        text.append("working them out…\n", style="italic")
        return
    text.append(f"{title} at {level}: {len(items)}\n", style="bold")
    line = " "
    for label, edges in items:
        token = f"{label}×{edges}"
        if len(line) + len(token) + 1 > width and line.strip():
            text.append(line.rstrip() + "\n")
            line = " "
        line += token + " "
    if line.strip():
        text.append(line.rstrip() + "\n")


#: lines of a closed form shown while it is folded
FOLDED_LINES = 3


def details_text(info: NodeDetails | None, width: int, height: int, unfold: bool = False) -> Text:
    """The pane's text for ``info`` at ``width`` cells (``height`` bounds the diagram drawing); a
    closed form longer than FOLDED_LINES lines is folded unless ``unfold``."""
    width = max(width, 12)
    text = Text(no_wrap=False, overflow="fold")
    if info is None:
        text.append("no node selected", style="italic")
        return text
    text.append(info.label, style="bold")
    if info.bookmarked:
        text.append("  * bookmarked")
    text.append("\n")
    kind = f" ({info.kind})" if info.kind else ""
    text.append(f"level {info.level}{kind}\n")
    text.append("dimension ", style="bold")
    dim = exact_int(info.dimension)
    text.append((dim if len(dim) + 10 <= width else "\n" + "\n".join(wrap_text(dim, width))) + "\n")
    text.append("multiplicity\n", style="bold")
    for line in wrap_text(exact_int(info.multiplicity), width - 1):
        text.append(" " + line + "\n")
    if info.formula:
        text.append("in k ", style="bold")
        formula = info.formula
        room = max(width * FOLDED_LINES - 5, 10)
        if not unfold and len(formula) > room:
            text.append(formula[:room] + "…\n")
            text.append(" (z unfolds)\n", style="italic")
        else:
            text.append(formula + "\n")
    if info.cell:
        text.append("cell module ", style="bold")
        text.append(info.cell + "\n")
    _neighbours(text, "parents", info.parent_level, info.parents, width)
    _neighbours(text, "children", info.child_level, info.children, width)
    drawing = draw_label(info.label, width, max(height // 2, 5))
    if drawing:
        text.append("\n".join(drawing) + "\n")
    if info.note:
        text.append("note ", style="bold")
        text.append(info.note + "\n")
    return text


class DetailsPane(VerticalScroll, can_focus=False):
    """A scrolling pane holding the details text (scrolled by the [ and ] keys of the main screen)."""

    def __init__(self, **kwargs: object) -> None:
        super().__init__(**kwargs)  # type: ignore[arg-type]
        self.info: NodeDetails | None = None
        self.unfold = False

    def compose(self) -> ComposeResult:
        yield Static(id="details-text")

    def show(self, info: NodeDetails | None) -> None:
        self.info = info
        self._redraw()

    def on_resize(self) -> None:
        self._redraw()

    def _redraw(self) -> None:
        width = self.scrollable_content_region.width or 26
        height = self.scrollable_content_region.height or 20
        self.query_one("#details-text", Static).update(details_text(self.info, width - 1, height, self.unfold))
