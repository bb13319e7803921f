"""Young diagrams and tableaux drawn with box characters (English convention: first row on top,
rows left-justified; Macdonald, *Symmetric Functions and Hall Polynomials*, I.1)."""

from __future__ import annotations

from typing import Sequence


def draw_grid(rows: Sequence[Sequence[str]]) -> list[str]:
    """Lines drawing rows of cells (weakly decreasing lengths), each cell as wide as the widest entry.
    An empty shape is drawn as ``∅``."""
    rows = [list(r) for r in rows if r]
    if not rows:
        return ["∅"]
    width = max(len(cell) for row in rows for cell in row)
    bar = "─" * (width + 2)

    def border(upper: int, lower: int) -> str:
        """The line between a row of ``upper`` cells above and ``lower`` cells below."""
        span = max(upper, lower)
        return bar.join(_corner(j, upper, lower) for j in range(span + 1))

    lines = [border(0, len(rows[0]))]
    for i, row in enumerate(rows):
        lines.append("│" + "│".join(f" {cell:>{width}} " for cell in row) + "│")
        lines.append(border(len(row), len(rows[i + 1]) if i + 1 < len(rows) else 0))
    return lines


def _corner(j: int, upper: int, lower: int) -> str:
    """The junction at column line j between a row of ``upper`` cells above and ``lower`` below."""
    up = j <= upper and upper > 0  # a vertical line comes down from above
    down = j <= lower and lower > 0  # a vertical line goes on below
    left = j > 0 and (j <= upper or j <= lower)  # a horizontal line comes from the left
    right = j < upper or j < lower  # a horizontal line goes on to the right
    return _JUNCTIONS[(up, down, left, right)]


_JUNCTIONS = {
    (False, True, False, True): "┌",
    (False, True, True, True): "┬",
    (False, True, True, False): "┐",
    (True, True, False, True): "├",
    (True, True, True, True): "┼",
    (True, True, True, False): "┤",
    (True, False, False, True): "└",
    (True, False, True, True): "┴",
    (True, False, True, False): "┘",
    (True, True, False, False): "│",
    (False, False, True, True): "─",
    (True, False, False, False): "╵",
    (False, True, False, False): "╷",
    (False, False, False, False): " ",
    (False, False, True, False): "─",
    (False, False, False, True): "─",
}


def draw_shape(shape: Sequence[int]) -> list[str]:
    """A Young diagram with empty boxes."""
    return draw_grid([[" "] * part for part in shape])
