"""Find a node on the current level by typing its label (a prefix or any part of it)."""

from __future__ import annotations

from typing import Any

from rich.text import Text
from textual import on
from textual.app import ComposeResult
from textual.binding import Binding
from textual.containers import Vertical
from textual.screen import ModalScreen
from textual.widgets import Input, OptionList, Static
from textual.widgets.option_list import Option

from engine.diagram import Diagram
from engine.errors import UserError

#: most matches listed at once
MOST_SHOWN = 50


class FindNode(ModalScreen[Any]):
    """Dismissed with the chosen node, or None."""

    BINDINGS = [
        Binding("escape", "dismiss_none", "cancel", key_display="Esc"),
        Binding("down", "pick(1)", show=False, priority=True),
        Binding("up", "pick(-1)", show=False, priority=True),
    ]

    def __init__(self, diagram: Diagram, index: int, nodes: list[Any] | None = None,
                 multiplicity: dict[Any, int] | None = None, **kwargs: object) -> None:
        super().__init__(**kwargs)  # type: ignore[arg-type]
        self.diagram = diagram
        self.index = index
        #: the level's nodes in display order (a level reached by a jump is not in the diagram)
        self.nodes = diagram.nodes(index) if nodes is None else nodes
        self.level = diagram.level(index) if multiplicity is None else multiplicity
        self._labels: list[str] | None = None
        self._found: list[Any] = []

    def compose(self) -> ComposeResult:
        tower = self.diagram.tower
        from engine.levels import format_level

        level = format_level(tower.level_of(self.index))
        with Vertical(classes="dialog"):
            yield Static(Text(f"Find a node on level {level}"), classes="dialog-title")
            yield Input(placeholder="type a label, e.g. (3,1) or 3 1", id="find-input")
            yield OptionList(id="find-list")
            yield Static("", id="find-status", classes="dialog-hint")
            yield Static(Text("Enter: go   ↑↓: choose   Esc: cancel"), classes="dialog-keys")

    def on_mount(self) -> None:
        field = self.query_one("#find-input", Input)
        field.cursor_blink = False
        field.focus()
        self._search("")

    def _search(self, query: str) -> None:
        nodes = self.nodes
        tower = self.diagram.tower
        found: list[Any] = []
        text = query.strip()
        matches = len(nodes)
        if text:
            exact = None
            try:  # the label as the tower reads it (accepts 3,1 and 3 1 for partitions)
                node = tower.parse(text, self.index)
                if self.level.get(node, 0) > 0:
                    exact = node
                    found.append(node)
            except UserError:
                pass
            if self._labels is None:
                self._labels = [tower.format(n) for n in nodes]
            squeezed = text.replace(" ", "")
            matches = 0
            for node, label in zip(nodes, self._labels):
                if squeezed in label:
                    matches += 1
                    if node != exact and len(found) < MOST_SHOWN:
                        found.append(node)
            if exact is not None and squeezed not in tower.format(exact):
                matches += 1
        else:
            found = list(nodes[:MOST_SHOWN])
        self._found = found
        listing = self.query_one("#find-list", OptionList)
        listing.set_options([Option(Text(tower.format(n))) for n in found])
        if found:
            listing.highlighted = 0
        total = len(nodes)
        if not found:
            status = "no node on this level has that label"
        elif not text:
            status = f"{total:,} nodes on this level; type to narrow"
        else:
            word = "node matches" if matches == 1 else "nodes match"
            status = f"{matches:,} {word} of {total:,}" + (f" (first {len(found)} listed)" if matches > len(found) else "")
        self.query_one("#find-status", Static).update(Text(status))

    @on(Input.Changed, "#find-input")
    def _changed(self, event: Input.Changed) -> None:
        self._search(event.value)

    @on(Input.Submitted, "#find-input")
    def _submitted(self) -> None:
        listing = self.query_one("#find-list", OptionList)
        if self._found:
            self.dismiss(self._found[listing.highlighted or 0])

    @on(OptionList.OptionSelected, "#find-list")
    def _selected(self, event: OptionList.OptionSelected) -> None:
        self.dismiss(self._found[event.option_index])

    def action_pick(self, step: int) -> None:
        listing = self.query_one("#find-list", OptionList)
        if self._found:
            current = listing.highlighted or 0
            listing.highlighted = max(0, min(len(self._found) - 1, current + step))

    def action_dismiss_none(self) -> None:
        self.dismiss(None)
