"""The path browser: the paths to one node, by rank, with their encoding drawn.

Built as ``PathBrowser(diagram, index, node)``; every path shown is posted as ``PathShown`` (the
explorer highlights it in the level panes).  Keys: type a rank (42, 10^12, 3*10^12, 1e12, -1 for
the last) or a path in the current encoding (a tableau ``1,2,4/3``, ``+1 -1 +2``, labels) and
Enter to jump, ↓/↑ next and previous path, PgDn/PgUp ten on, ctrl+t the next
encoding, Escape to close.  The screen holds no mathematics: it asks ``engine.paths``.
"""

from __future__ import annotations

from textual.app import ComposeResult
from textual.binding import Binding
from textual.containers import Vertical, VerticalScroll
from textual.screen import ModalScreen
from textual.widgets import Input, Static

from engine.diagram import Diagram
from engine.encodings import encodings_for, get_encoding
from engine.errors import UserError
from engine.levels import format_level
from engine.paths import PathIndex, parse_rank
from engine.tower import Node
from tui.explorer.messages import PathShown

_LOG10_2 = 0.30102999566398120


def show_int(n: int) -> str:
    """An exact int in full up to 40 digits, else as d.dddddd×10^e (never a str() over 4,300 digits)."""
    if n.bit_length() <= 132:
        return str(n)
    exponent = int((n.bit_length() - 1) * _LOG10_2)
    leading = n // 10 ** max(exponent - 7, 0)
    while leading >= 10**8:
        leading //= 10
        exponent += 1
    digits = str(leading)
    return f"{digits[0]}.{digits[1:7]}×10^{exponent}"


class PathBrowser(ModalScreen[None]):
    """Browse the paths from the root to ``node`` at level index ``index``."""

    DEFAULT_CSS = """
    PathBrowser { align: center middle; }
    PathBrowser > #path-box {
        width: 90%; height: 90%; border: round $accent; background: $panel; padding: 0 1;
    }
    PathBrowser #path-title { text-style: bold; }
    PathBrowser #path-drawing { height: 1fr; }
    PathBrowser #path-keys { color: $text-muted; }
    """

    BINDINGS = [
        Binding("escape", "close", "Close"),
        Binding("down", "step(1)", "Next path"),
        Binding("up", "step(-1)", "Previous path"),
        Binding("pagedown", "step(10)", "10 on", show=False),
        Binding("pageup", "step(-10)", "10 back", show=False),
        Binding("ctrl+t", "next_encoding", "Encoding"),
    ]

    def __init__(self, diagram: Diagram, index: int, node: Node, encoding: str | None = None) -> None:
        super().__init__()
        self.diagram = diagram
        self.index = index
        self.node = node
        self.paths = PathIndex(diagram)
        self.total = self.paths.total(index, node)
        tower = diagram.tower
        self.encodings = encodings_for(tower) or [get_encoding(tower, "labels")]
        chosen = get_encoding(tower, encoding)
        self.encoding = chosen
        if chosen not in self.encodings:
            self.encodings.append(chosen)
        self.rank = 0
        self.path = None

    def compose(self) -> ComposeResult:
        tower = self.diagram.tower
        title = (
            f"Paths to {tower.format(self.node)} at level {format_level(tower.level_of(self.index))} "
            f"of {tower.spec}: {show_int(self.total)}"
        )
        with Vertical(id="path-box"):
            yield Static(title, id="path-title", markup=False)
            yield Input(placeholder="a rank (42, 10^12, -1 for the last) or a path in this encoding, then Enter", id="path-rank")
            yield Static("", id="path-position", markup=False)
            with VerticalScroll(id="path-drawing"):
                yield Static("", id="path-encoding", markup=False)
            yield Static("↓/↑ next/previous · PgDn/PgUp ±10 · ctrl+t encoding · Esc close", id="path-keys")

    def on_mount(self) -> None:
        self.show_rank(0)

    # ----- actions --------------------------------------------------------------------------
    def show_rank(self, rank: int) -> None:
        """Show the path of this rank (clamped to 0..total−1) and post it."""
        rank = min(max(rank, 0), self.total - 1)
        self.rank = rank
        self.path = self.paths.unrank(self.index, self.node, rank)
        self._redraw()
        self.post_message(PathShown(list(self.path.nodes)))

    def _redraw(self) -> None:
        if self.path is None:
            return
        tower = self.diagram.tower
        encoding = self.encoding
        self.query_one("#path-position", Static).update(
            f"path {show_int(self.rank)} of 0..{show_int(self.total - 1)} · {encoding.title} ({encoding.name})"
        )
        lines = encoding.draw(tower, encoding.encode(tower, self.path))
        text = encoding.path_text(tower, self.path)
        if text not in lines:
            lines = [text, *lines]
        self.query_one("#path-encoding", Static).update("\n".join(lines))

    def action_step(self, by: int) -> None:
        self.show_rank(self.rank + by)

    def action_next_encoding(self) -> None:
        at = self.encodings.index(self.encoding)
        self.encoding = self.encodings[(at + 1) % len(self.encodings)]
        self._redraw()

    def action_close(self) -> None:
        self.dismiss(None)

    def on_input_submitted(self, event: Input.Submitted) -> None:
        event.stop()
        try:
            rank = self.find(event.value)
        except UserError as exc:
            self.notify(str(exc), severity="error", markup=False)
            return
        self.show_rank(rank)

    def find(self, text: str) -> int:
        """The rank asked for: a rank, or a path written in the current encoding (a tableau, an
        up–down sequence, labels); a UserError saying what is accepted otherwise."""
        try:
            rank = parse_rank(text, self.total)
            if rank >= self.total:
                raise UserError(f"rank {show_int(rank)} is past the last path (ranks 0..{show_int(self.total - 1)})")
            return rank
        except UserError as not_rank:
            tower = self.diagram.tower
            try:
                path = self.encoding.path_from_text(tower, text)
                self.paths.check(path, self.index, self.node)
            except UserError as not_path:
                looks_like_rank = text.strip().lstrip("-").replace("_", "")[:1].isdigit()
                raise (not_rank if looks_like_rank and not any(c in text for c in "(/+,") else not_path)
            return self.paths.rank(path)
