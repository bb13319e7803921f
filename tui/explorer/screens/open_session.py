"""Open a session: the session files of the default folder listed newest first, or a typed path
(Tab completes it, as a shell does); the path is checked as it is typed."""

from __future__ import annotations

import time
from pathlib import Path

from rich.text import Text
from textual import on
from textual.app import ComposeResult
from textual.binding import Binding
from textual.containers import Vertical
from textual.screen import ModalScreen
from textual.widgets import Input, OptionList, Static
from textual.widgets.option_list import Option

from tui.explorer.session_files import check_open_path, complete_path, default_folder, resolve, session_files


def _when(path: Path) -> str:
    try:
        return time.strftime("%Y-%m-%d %H:%M", time.localtime(path.stat().st_mtime))
    except OSError:
        return ""


class OpenSession(ModalScreen[str | None]):
    """Dismissed with the path to open, or None."""

    BINDINGS = [
        Binding("escape", "dismiss_none", "cancel", key_display="Esc"),
        Binding("tab", "complete", "complete", show=False, priority=True),
        Binding("down", "pick(1)", show=False, priority=True),
        Binding("up", "pick(-1)", show=False, priority=True),
    ]

    def __init__(self, **kwargs: object) -> None:
        super().__init__(**kwargs)  # type: ignore[arg-type]
        self.folder = default_folder()
        self.files = session_files(self.folder)

    def compose(self) -> ComposeResult:
        with Vertical(classes="dialog"):
            yield Static(Text("Open a session"), classes="dialog-title")
            count = f"{len(self.files)} session files" if self.files else "no session files yet"
            yield Static(Text(f"{count} in {self.folder}"), classes="dialog-hint")
            yield OptionList(*[Option(Text(f"{p.name:<32} {_when(p)}")) for p in self.files], id="open-list")
            yield Input(placeholder="or type a file name or path", id="open-input")
            yield Static("", id="open-hint", classes="dialog-hint")
            yield Static("", id="open-error", classes="dialog-error")
            yield Static(Text("Enter: open   ↑↓: choose   Tab: complete the path   Esc: cancel"), classes="dialog-keys")

    def on_mount(self) -> None:
        field = self.query_one("#open-input", Input)
        field.cursor_blink = False
        field.focus()
        listing = self.query_one("#open-list", OptionList)
        listing.display = bool(self.files)
        if self.files:
            listing.highlighted = 0
        self._show("")

    def _show(self, text: str) -> str | None:
        error, hint = check_open_path(text)
        if not text.strip() and self.files:
            error, hint = None, ""
        self.query_one("#open-hint", Static).update(Text(hint))
        self.query_one("#open-error", Static).update(Text(f"✗ {error}" if error else ""))
        return error

    @on(Input.Changed, "#open-input")
    def _changed(self, event: Input.Changed) -> None:
        self._show(event.value)

    @on(Input.Submitted, "#open-input")
    def _submitted(self, event: Input.Submitted) -> None:
        if not event.value.strip():
            self._open_listed()
        elif self._show(event.value) is None:
            self.dismiss(str(resolve(event.value)))

    @on(OptionList.OptionSelected, "#open-list")
    def _selected(self, event: OptionList.OptionSelected) -> None:
        self.dismiss(str(self.files[event.option_index]))

    def _open_listed(self) -> None:
        listing = self.query_one("#open-list", OptionList)
        if self.files and listing.highlighted is not None:
            self.dismiss(str(self.files[listing.highlighted]))

    def action_complete(self) -> None:
        field = self.query_one("#open-input", Input)
        completed = complete_path(field.value)
        if completed != field.value:
            field.value = completed
            field.cursor_position = len(completed)

    def action_pick(self, step: int) -> None:
        listing = self.query_one("#open-list", OptionList)
        if self.files:
            current = listing.highlighted or 0
            listing.highlighted = max(0, min(len(self.files) - 1, current + step))

    def action_dismiss_none(self) -> None:
        self.dismiss(None)
