"""The sums bar: Σm, Σm², Σm·dim of the current level, the diagram algebra, faithfulness."""

from __future__ import annotations

from dataclasses import dataclass

from rich.text import Text
from textual.widgets import Static

from tui.numbers import short_int


@dataclass
class SumsLine:
    level: str
    multiplicities: int
    squares: int
    weighted: int
    tensor_dimension: int
    generic_dimension: int | None
    algebra: str | None
    #: where the centralizer stops being faithful: a level text, "" when not within ``searched``,
    #: None while the search runs or when the tower knows no generic dimension
    unfaithful_from: str | None
    searched: str = ""


def sums_text(line: SumsLine, width: int) -> str:
    """One line; numbers shortened to fit (the CLI has them exact)."""
    w = 10 if width >= 100 else 7
    tick = "✓" if line.weighted == line.tensor_dimension else f"✗≠{short_int(line.tensor_dimension, w)}"
    parts = [
        f"Σm {short_int(line.multiplicities, w)}",
        f"Σm² {short_int(line.squares, w)}",
        f"Σm·dim {short_int(line.weighted, w)} {tick}",
    ]
    if line.generic_dimension is not None:
        name = line.algebra or "algebra"
        parts.append(f"dim {name} {short_int(line.generic_dimension, w)}")
        if line.unfaithful_from is None:
            parts.append("faithful? …")
        elif line.unfaithful_from:
            parts.append(f"unfaithful from {line.unfaithful_from}")
        else:
            parts.append(f"faithful to {line.searched}")
    text = "  ".join(parts)
    if len(text) > width and line.generic_dimension is not None:
        parts = [p.replace("Σm·dim", "Σmd") for p in parts]
        text = " ".join(parts)
    return text


class SumsBar(Static):
    """A one-line Static; the main screen gives it a SumsLine (or a message while building)."""

    def show(self, line: SumsLine | None, message: str = "") -> None:
        self._line = line
        self._message = message
        self._redraw()

    def on_resize(self) -> None:
        self._redraw()

    def _redraw(self) -> None:
        line = getattr(self, "_line", None)
        message = getattr(self, "_message", "")
        if line is None:
            self.update(Text(message))
            return
        self.update(Text(sums_text(line, self.size.width or 80)), layout=False)
