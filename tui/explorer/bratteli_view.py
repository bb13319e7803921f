"""The Bratteli diagram drawn in the terminal: a window of levels as columns (level 0 at the left),
each node a label, the edges between neighbouring levels as braille lines with their counts, the
selected node's paths (its ancestors and descendants within the window) highlighted.

Presentation only: nodes, multiplicities and edges are the Diagram's.  Levels of more than
MOST_NODES nodes are not drawn; the view says so.
"""

from __future__ import annotations

from dataclasses import dataclass, field
from typing import Any, Callable

from rich.cells import cell_len
from rich.text import Text

from engine.diagram import Diagram
from engine.levels import format_level

#: the most nodes a level may have to be drawn
MOST_NODES = 20
#: cells between two columns, where the edges run
GAP = 9
#: the most levels drawn at once
MOST_LEVELS = 9

# braille dot bits by (column 0-1, row 0-3) in a cell
_DOTS = ((0x01, 0x02, 0x04, 0x40), (0x08, 0x10, 0x20, 0x80))


@dataclass
class DiagramModel:
    """What is drawn: levels (index, nodes in display order), edges, the selection's paths."""

    levels: list[tuple[int, list[Any]]]
    edges: list[tuple[int, Any, Any, int]]  # (index of the upper level, parent, child, count)
    selected: tuple[int, Any] | None
    on_paths: set[tuple[int, Any]] = field(default_factory=set)
    #: why levels of the window were left out (too many nodes, not built)
    notes: list[str] = field(default_factory=list)


def _level(diagram: Diagram, index: int) -> dict[Any, int] | None:
    if index <= diagram.built:
        return diagram.level(index)
    from tui.explorer.view_model import by_jump

    if by_jump(diagram, index):
        return diagram.level_at(index)
    return None


def diagram_model(diagram: Diagram, centre: int, count: int, selected: tuple[int, Any] | None) -> DiagramModel:
    """The window of at most ``count`` levels around ``centre`` that can be drawn: contiguous levels
    of at most MOST_NODES nodes, built (or reached by a jump) already."""
    tower = diagram.tower
    notes: list[str] = []

    def drawable(index: int) -> list[Any] | None:
        if index < 0 or (tower.max_index is not None and index > tower.max_index):
            return None
        level = _level(diagram, index)
        if level is None:
            return None
        if len(level) > MOST_NODES:
            return None
        return diagram.nodes(index) if index <= diagram.built else diagram.nodes_at(index)

    here = drawable(centre)
    if here is None:
        level = _level(diagram, centre)
        size = "not built yet" if level is None else f"{len(level):,} nodes"
        notes.append(f"level {format_level(tower.level_of(centre))} has {size}; the diagram is drawn for levels "
                     f"of at most {MOST_NODES} nodes (step back to a smaller level)")
        return DiagramModel([], [], selected, set(), notes)
    levels = {centre: here}
    low = high = centre
    while len(levels) < count:
        grew = False
        for side in (high + 1, low - 1):
            if len(levels) >= count:
                break
            nodes = drawable(side)
            if nodes is not None:
                levels[side] = nodes
                low, high = min(low, side), max(high, side)
                grew = True
        if not grew:
            break
    if high + 1 <= (tower.max_index if tower.max_index is not None else high + 1) and len(levels) < count:
        level = _level(diagram, high + 1)
        if level is not None and len(level) > MOST_NODES:
            notes.append(f"level {format_level(tower.level_of(high + 1))} has {len(level):,} nodes: not drawn")
    ordered = [(i, levels[i]) for i in range(low, high + 1)]
    edges: list[tuple[int, Any, Any, int]] = []
    for (i, nodes), (_, below) in zip(ordered, ordered[1:]):
        present = set(below)
        for node in nodes:
            for child, e in diagram.children(i, node):
                if child in present:
                    edges.append((i, node, child, e))
    model = DiagramModel(ordered, edges, selected, set(), notes)
    if selected is not None and selected[0] in levels:
        model.on_paths = _paths_through(model, selected)
    return model


def _paths_through(model: DiagramModel, selected: tuple[int, Any]) -> set[tuple[int, Any]]:
    """The nodes on some path through ``selected`` inside the window."""
    up: dict[tuple[int, Any], list[tuple[int, Any]]] = {}
    down: dict[tuple[int, Any], list[tuple[int, Any]]] = {}
    for i, parent, child, _ in model.edges:
        down.setdefault((i, parent), []).append((i + 1, child))
        up.setdefault((i + 1, child), []).append((i, parent))
    found = {selected}
    for links in (up, down):
        todo = [selected]
        while todo:
            for nxt in links.get(todo.pop(), []):
                if nxt not in found:
                    found.add(nxt)
                    todo.append(nxt)
    return found


def render(model: DiagramModel, label: Callable[[Any], str], level_name: Callable[[int], str], height: int) -> Text:
    """The drawing as Text (``label`` formats a node, ``level_name`` a level index); rows are spread
    over ``height`` lines at most."""
    text = Text()
    if not model.levels:
        text.append("\n".join(model.notes), style="italic")
        return text
    tallest = max(len(nodes) for _, nodes in model.levels)
    rows = max(tallest, min(height - 2, 2 * tallest - 1))
    widths = [max(cell_len(label(n)) for n in nodes) for _, nodes in model.levels]
    lefts = []
    x = 0
    for w in widths:
        lefts.append(x)
        x += w + GAP
    total = x - GAP
    place: dict[tuple[int, Any], int] = {}
    for (i, nodes) in model.levels:
        n = len(nodes)
        for k, node in enumerate(nodes):
            place[(i, node)] = (k * (rows - 1) // (n - 1)) if n > 1 else (rows - 1) // 2
    grid = [[" "] * total for _ in range(rows)]
    style = [[0] * total for _ in range(rows)]  # 0 plain, 1 on a path, 2 the selection
    dots: dict[tuple[int, int], int] = {}
    lit: set[tuple[int, int]] = set()
    counts: list[tuple[int, int, int, bool]] = []
    position = {i: k for k, (i, _) in enumerate(model.levels)}
    for i, parent, child, e in model.edges:
        k = position[i]
        x0, x1 = (lefts[k] + widths[k]) * 2 + 1, lefts[k + 1] * 2 - 2
        y0, y1 = place[(i, parent)] * 4 + 1, place[(i + 1, child)] * 4 + 1
        on = (i, parent) in model.on_paths and (i + 1, child) in model.on_paths
        steps = max(abs(x1 - x0), abs(y1 - y0), 1)
        for s in range(steps + 1):
            px, py = x0 + (x1 - x0) * s // steps, y0 + (y1 - y0) * s // steps
            cell = (py // 4, px // 2)
            dots[cell] = dots.get(cell, 0) | _DOTS[px % 2][py % 4]
            if on:
                lit.add(cell)
        if e > 1:
            counts.append((((y0 + y1) // 2) // 4, ((x0 + x1) // 2) // 2, e, on))
    for (r, c), bits in dots.items():
        if 0 <= r < rows and 0 <= c < total:
            grid[r][c] = chr(0x2800 + bits)
            style[r][c] = 1 if (r, c) in lit else 0
    for r, c, e, on in counts:
        if 0 <= r < rows and 0 <= c < total:
            grid[r][c] = str(e) if e < 10 else "+"
            style[r][c] = 1 if on else 0
    for k, (i, nodes) in enumerate(model.levels):
        for node in nodes:
            r = place[(i, node)]
            name = label(node).ljust(widths[k])
            mark = 2 if model.selected == (i, node) else 1 if (i, node) in model.on_paths else 0
            for j, ch in enumerate(name):
                grid[r][lefts[k] + j] = ch
                style[r][lefts[k] + j] = mark
    heads = "".join(f"{level_name(i):<{widths[k] + GAP}}" for k, (i, _) in enumerate(model.levels))
    text.append(heads.rstrip() + "\n", style="bold underline")
    looks = {0: "", 1: "bold", 2: "reverse bold"}
    for r in range(rows):
        line = Text()
        for c in range(total):
            line.append(grid[r][c], style=looks[style[r][c]])
        line.rstrip()
        text.append_text(line)
        text.append("\n")
    if model.notes:
        text.append("\n".join(model.notes) + "\n", style="italic")
    return text
