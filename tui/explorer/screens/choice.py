"""A small modal asking to pick one of a few answers, each with its key (e.g. save / discard / stay)."""

from __future__ import annotations

from rich.text import Text
from textual import events
from textual.app import ComposeResult
from textual.containers import Vertical
from textual.screen import ModalScreen
from textual.widgets import Static

from tui.explorer.actions import key_text


class Choice(ModalScreen[str | None]):
    """Dismissed with the answer's value; ``answers`` are (key, value, label)."""

    def __init__(self, title: str, question: str, answers: list[tuple[str, str, str]], **kwargs: object) -> None:
        super().__init__(**kwargs)  # type: ignore[arg-type]
        self.title_text = title
        self.question = question
        self.answers = answers

    def compose(self) -> ComposeResult:
        with Vertical(classes="dialog"):
            yield Static(Text(self.title_text), classes="dialog-title")
            yield Static(Text(self.question), id="choice-question")
            keys = "   ".join(f"{key_text(k)}: {label}" for k, _, label in self.answers)
            yield Static(Text(keys), classes="dialog-keys", id="choice-keys")

    def on_key(self, event: events.Key) -> None:
        for key, value, _ in self.answers:
            if event.key == key:
                event.stop()
                event.prevent_default()
                self.dismiss(value)
                return
