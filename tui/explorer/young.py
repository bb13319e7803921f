"""Young diagrams drawn with box characters, from a node's label text.

Presentation only: the explorer knows nodes through ``tower.format(node)``; a label written as a
partition ``(3,1)`` or as a pair of partitions ``((2,1),(1))`` is drawn, any other label is not.
"""

from __future__ import annotations

import re

Shape = tuple[int, ...]

_PARTITION = re.compile(r"^\((\d+(?:,\d+)*)?\)$")
_PAIR = re.compile(r"^\((\((?:\d+(?:,\d+)*)?\)),(\((?:\d+(?:,\d+)*)?\))\)$")

# box-drawing character at a grid vertex, by the segments meeting there: (up, down, left, right)
_JOINS = {
    (0, 1, 0, 1): "┌", (0, 1, 1, 0): "┐", (1, 0, 0, 1): "└", (1, 0, 1, 0): "┘",
    (0, 1, 1, 1): "┬", (1, 0, 1, 1): "┴", (1, 1, 0, 1): "├", (1, 1, 1, 0): "┤",
    (1, 1, 1, 1): "┼", (0, 0, 1, 1): "─", (1, 1, 0, 0): "│",
    (0, 0, 0, 1): "╶", (0, 0, 1, 0): "╴", (1, 0, 0, 0): "╵", (0, 1, 0, 0): "╷",
}


def _shape(text: str) -> Shape | None:
    match = _PARTITION.match(text)
    if match is None:
        return None
    parts = tuple(int(p) for p in match.group(1).split(",")) if match.group(1) else ()
    if any(p <= 0 for p in parts) or any(a < b for a, b in zip(parts, parts[1:])):
        return None
    return parts


def shapes_of_label(label: str) -> list[Shape] | None:
    """``[(3,1)]`` for ``(3,1)``, ``[(2,1), (1,)]`` for ``((2,1),(1))``, None for other labels."""
    text = label.replace(" ", "")
    pair = _PAIR.match(text)
    if pair is not None:
        left, right = _shape(pair.group(1)), _shape(pair.group(2))
        return None if left is None or right is None else [left, right]
    single = _shape(text)
    return None if single is None else [single]


def draw_boxes(shape: Shape, cell: int = 1) -> list[str]:
    """The diagram in English notation (rows top to bottom), each box ``cell`` characters wide inside."""
    rows, cols = len(shape), (shape[0] if shape else 0)

    def box(i: int, j: int) -> bool:
        return 0 <= i < rows and 0 <= j < shape[i]

    lines: list[str] = []
    for r in range(rows + 1):
        edge: list[str] = []
        for c in range(cols + 1):
            up = box(r - 1, c - 1) or box(r - 1, c)
            down = box(r, c - 1) or box(r, c)
            left = box(r - 1, c - 1) or box(r, c - 1)
            right = box(r - 1, c) or box(r, c)
            edge.append(_JOINS.get((int(up), int(down), int(left), int(right)), " "))
            if c < cols:
                edge.append(("─" if right else " ") * cell)
        lines.append("".join(edge).rstrip())
        if r < rows:
            inner: list[str] = []
            for c in range(cols + 1):
                inner.append("│" if box(r, c - 1) or box(r, c) else " ")
                if c < cols:
                    inner.append(" " * cell)
            lines.append("".join(inner).rstrip())
    return lines


def draw_bars(shape: Shape, max_width: int, max_height: int) -> list[str]:
    """A diagram too large for boxes, compactly: one bar per row, scaled so the first row fits,
    each followed by its length; runs of equal rows share one line (``×3``), and when there are
    still too many lines the shortest rows are summed up on the last one."""
    total, cols = sum(shape), shape[0]
    runs: list[tuple[int, int]] = []
    for part in shape:
        if runs and runs[-1][0] == part:
            runs[-1] = (part, runs[-1][1] + 1)
        else:
            runs.append((part, 1))
    room = max(max_width - 8, 1)
    lines = [f"{total} boxes, {len(shape)} rows" + (", bars to scale" if cols > room else "")]
    limit = max(max_height - 1, 2)
    shown = runs if len(runs) <= limit else runs[: limit - 1]
    for part, times in shown:
        bar = "█" * max(1, part * room // cols) if cols > room else "█" * part
        lines.append(f"{bar} {part}" + (f"×{times}" if times > 1 else ""))
    if len(shown) < len(runs):
        rest = runs[len(shown):]
        lines.append(f"… {sum(t for _, t in rest)} more rows, {sum(p * t for p, t in rest)} boxes")
    return lines


def draw_shape(shape: Shape, max_width: int, max_height: int) -> list[str]:
    """The best drawing that fits: boxes 3 wide, boxes 1 wide, one mark per box, or row bars."""
    if not shape:
        return ["∅ (the empty partition)"]
    rows, cols = len(shape), shape[0]
    for cell in (3, 1):
        if cols * (cell + 1) + 1 <= max_width and 2 * rows + 1 <= max_height:
            return draw_boxes(shape, cell)
    if cols <= max_width and rows <= max_height:
        return ["▪" * part for part in shape]
    return draw_bars(shape, max_width, max_height)


def draw_label(label: str, max_width: int, max_height: int) -> list[str]:
    """Lines drawing the Young diagram(s) of a label, or [] when the label is not a partition."""
    shapes = shapes_of_label(label)
    if shapes is None:
        return []
    if len(shapes) == 1:
        return draw_shape(shapes[0], max_width, max_height)
    half = max(1, (max_height - 2) // 2)
    lines: list[str] = []
    for name, shape in zip(("first", "second"), shapes):
        lines.append(f"{name}:")
        lines.extend(draw_shape(shape, max_width, half))
    return lines
