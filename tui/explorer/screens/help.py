"""The help screen: every key of the explorer, from the action registry."""

from __future__ import annotations

from rich.text import Text
from textual.app import ComposeResult
from textual.binding import Binding
from textual.containers import Vertical, VerticalScroll
from textual.screen import ModalScreen
from textual.widgets import Static

from tui.explorer.actions import ALL, Act, key_text

INTRO = (
    "Each pane is one level of the tower: every node with its multiplicity m (how often the "
    "irreducible module occurs in the tensor space, the number of paths from the root) and its "
    "dimension. ▶ marks the selection; a digit beside a node in the next or previous pane counts "
    "the edges joining it to the selection; • marks a highlighted path; * a bookmark; ✎ a note."
)


def help_text(acts: tuple[Act, ...] = ALL) -> Text:
    text = Text()
    text.append(INTRO + "\n")
    group = None
    for act in acts:
        if act.group != group:
            group = act.group
            text.append(f"\n{group}\n", style="bold underline")
        keys = " ".join(key_text(k) for k in act.keys)
        text.append(f"  {keys:<16}", style="bold")
        text.append(f"{act.help}\n")
    text.append("\nIn dialogs: Enter accepts, Esc cancels, Tab moves between fields.\n")
    return text


class HelpScreen(ModalScreen[None]):
    BINDINGS = [
        Binding("escape", "close", "close", key_display="Esc"),
        Binding("question_mark", "close", "close", show=False),
        Binding("q", "close", "close", show=False),
        Binding("f1", "close", "close", show=False),
        Binding("down,j", "scroll(1)", "scroll", show=False),
        Binding("up,k", "scroll(-1)", "scroll", show=False),
    ]

    def compose(self) -> ComposeResult:
        with Vertical(classes="dialog help-dialog"):
            yield Static(Text("Keys of the explorer"), classes="dialog-title")
            with VerticalScroll(id="help-body"):
                yield Static(help_text(), id="help-text")
            yield Static(Text("Esc, q or ?: close   ↑↓: scroll"), classes="dialog-keys")

    def action_close(self) -> None:
        self.dismiss(None)

    def action_scroll(self, lines: int) -> None:
        self.query_one("#help-body", VerticalScroll).scroll_relative(y=lines, animate=False)
