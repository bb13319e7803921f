"""A small modal asking for one line of text, checked as it is typed, the error shown inline."""

from __future__ import annotations

from typing import Callable

from rich.text import Text
from textual import on
from textual.app import ComposeResult
from textual.binding import Binding
from textual.containers import Vertical
from textual.screen import ModalScreen
from textual.widgets import Input, Static

#: a checker returns (error or None, a hint line shown under the field); an empty error refuses the
#: value without a message (nothing typed yet)
Checker = Callable[[str], tuple[str | None, str]]
#: an acceptor does the work on Enter and returns the message of a failure (the dialog stays) or None
Acceptor = Callable[[str], str | None]


class Prompt(ModalScreen[str | None]):
    """Ask for a value; Enter accepts it when the checker finds no error, Escape gives None."""

    BINDINGS = [Binding("escape", "dismiss_none", "cancel", key_display="Esc")]

    def __init__(self, title: str, question: str, value: str = "", check: Checker | None = None,
                 placeholder: str = "", accept: Acceptor | None = None, **kwargs: object) -> None:
        super().__init__(**kwargs)  # type: ignore[arg-type]
        self.accept = accept
        self.title_text = title
        self.question = question
        self.value = value
        self.check = check
        self.placeholder = placeholder

    def compose(self) -> ComposeResult:
        with Vertical(classes="dialog"):
            yield Static(Text(self.title_text), classes="dialog-title")
            yield Static(Text(self.question), classes="dialog-question")
            yield Input(self.value, placeholder=self.placeholder, id="prompt-input")
            yield Static("", id="prompt-hint", classes="dialog-hint")
            yield Static("", id="prompt-error", classes="dialog-error")
            yield Static(Text("Enter: accept   Esc: cancel"), classes="dialog-keys")

    def on_mount(self) -> None:
        field = self.query_one("#prompt-input", Input)
        field.cursor_blink = False
        field.focus()
        self._show(field.value)

    def _show(self, value: str) -> str | None:
        error, hint = (None, "") if self.check is None else self.check(value)
        self.query_one("#prompt-hint", Static).update(Text(hint))
        self.query_one("#prompt-error", Static).update(Text(f"✗ {error}" if error else ""))
        return error

    @on(Input.Changed, "#prompt-input")
    def _changed(self, event: Input.Changed) -> None:
        self._show(event.value)

    @on(Input.Submitted, "#prompt-input")
    def _submitted(self, event: Input.Submitted) -> None:
        if self._show(event.value) is not None:
            return
        failure = None if self.accept is None else self.accept(event.value)
        if failure is None:
            self.dismiss(event.value)
        else:
            self.query_one("#prompt-error", Static).update(Text(f"✗ {failure}"))

    def action_dismiss_none(self) -> None:
        self.dismiss(None)
