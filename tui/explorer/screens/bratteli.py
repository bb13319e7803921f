"""The Bratteli diagram around the current level, drawn (``bratteli_view.py``); ← → move the window."""

from __future__ import annotations

from typing import TYPE_CHECKING

from rich.text import Text
from textual.app import ComposeResult
from textual.binding import Binding
from textual.containers import ScrollableContainer
from textual.screen import Screen
from textual.widgets import Footer, Static

from engine.levels import format_level
from tui.explorer.bratteli_view import GAP, MOST_LEVELS, DiagramModel, diagram_model, render

if TYPE_CHECKING:
    from tui.explorer.state import ExplorerState


class BratteliScreen(Screen[None]):
    BINDINGS = [
        Binding("escape", "close", "back", key_display="Esc"),
        Binding("v", "close", "back", show=False),
        Binding("left,h", "shift(-1)", "earlier levels", key_display="←"),
        Binding("right,l", "shift(1)", "later levels", key_display="→"),
    ]

    def __init__(self, state: "ExplorerState", **kwargs: object) -> None:
        super().__init__(**kwargs)  # type: ignore[arg-type]
        self.state = state
        self.centre = state.index
        self.model: DiagramModel | None = None

    def compose(self) -> ComposeResult:
        yield Static("", id="diagram-title")
        with ScrollableContainer(id="diagram-body"):
            yield Static("", id="diagram-text")
        yield Footer(compact=True, show_command_palette=False)

    def on_mount(self) -> None:
        self.redraw()

    def on_resize(self) -> None:
        self.redraw()

    def redraw(self) -> None:
        state = self.state
        diagram, tower = state.diagram, state.tower
        width = self.size.width or 80
        label_width = 10
        count = max(1, min(MOST_LEVELS, (width + GAP) // (label_width + GAP)))
        selected = None if state.node is None else (state.index, state.node)
        self.model = diagram_model(diagram, self.centre, count, selected)
        level = format_level(tower.level_of(self.centre))
        title = Text(f"Bratteli diagram of {tower.spec} around level {level}", style="bold")
        title.append("   bold: paths through the selection; digits: edge counts above 1", style="dim")
        self.query_one("#diagram-title", Static).update(title)
        height = (self.size.height or 24) - 3
        body = render(self.model, tower.format, lambda i: format_level(tower.level_of(i)), height)
        self.query_one("#diagram-text", Static).update(body)

    def action_shift(self, step: int) -> None:
        last = self.state.tower.max_index
        target = self.centre + step
        if target < 0 or (last is not None and target > last):
            return
        self.centre = target
        self.redraw()

    def action_close(self) -> None:
        self.dismiss(None)
