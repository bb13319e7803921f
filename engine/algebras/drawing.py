"""Drawing a diagram: box characters for the terminal (no colour needed), TikZ for papers.

Terminal layout (``draw``): the top row of vertices ``●`` numbered 1..k above, the bottom row
numbered 1'..k' below, and between them one horizontal *lane* per block that needs one.  A block's
lane runs from its leftmost to its rightmost vertex column; each of its vertices drops (or rises)
to the lane in its own column, and the lane shows a junction there (┴ from above, ┬ from below,
┼ both, corners at the ends).  A vertical line of another block crossing a lane is drawn as │
through the lane, so a crossing (──│──) never looks like a junction (──┼──).  A block {i, i'} is
one straight line and needs no lane.

Top vertex i and bottom vertex i' share a column when the lanes can be stacked so that every top
vertical ends above every bottom vertical of the same column (an order of the lanes, found by a
topological sort); when no such order exists (e.g. a transposition) the bottom row is drawn half
the spacing to the right, so no two verticals ever share a column.  Lanes with disjoint spans share a
row.  Vertices are SPACING columns apart; a diagram too wide for ``width`` columns so is drawn
closer (COMPACT spacings, then only vertices 1, 5, 10, ... labelled), and past that it is listed
block by block instead.
"""

from __future__ import annotations

from engine.algebras.diagrams import Blocks, format_diagram, vertex_name

SPACING = 4
#: closer spacings tried, in order, when SPACING is too wide (3 and 2 columns leave room for the
#: junctions and for one blank column between lanes sharing a row)
COMPACT = (3, 2)
#: at a compact spacing only vertex 1 and every LABEL_EVERY-th vertex are labelled
LABEL_EVERY = 5
VERTEX = "●"


def _layout(d: Blocks, r: int, shift: int, spacing: int) -> tuple[list[int], dict[int, int], int] | None:
    """Column of every vertex, the lane row of every block that needs one, the number of rows;
    None when the aligned layout (shift 0) has no valid order of lanes."""
    column = [spacing * (v % r) + 1 + (shift if v >= r else 0) for v in range(2 * r)]
    laned = [b for b, block in enumerate(d) if len(block) > 1 and not (len(block) == 2 and column[block[0]] == column[block[1]])]
    owner = {v: b for b, block in enumerate(d) for v in block}
    before: dict[int, set[int]] = {b: set() for b in laned}
    if shift == 0:
        for i in range(r):
            above, below = owner[i], owner[r + i]
            if above != below and above in before and below in before:
                before[below].add(above)
    # topological order, top-only blocks first and bottom-only last where free to choose
    def preference(b: int) -> tuple[int, int]:
        block = d[b]
        return (0 if block[-1] < r else 2 if block[0] >= r else 1, b)

    order: list[int] = []
    placed: set[int] = set()
    waiting = sorted(laned, key=preference)
    while waiting:
        ready = next((b for b in waiting if before[b] <= placed), None)
        if ready is None:
            return None
        waiting.remove(ready)
        order.append(ready)
        placed.add(ready)
    rows: list[list[tuple[int, int]]] = []
    lane: dict[int, int] = {}
    for b in order:
        span = (min(column[v] for v in d[b]), max(column[v] for v in d[b]))
        lowest = max((lane[p] + 1 for p in before[b]), default=0)
        for row in range(lowest, len(rows) + 1):
            if row == len(rows):
                rows.append([])
            if all(span[1] < a - 1 or span[0] > c + 1 for a, c in rows[row]):
                rows[row].append(span)
                lane[b] = row
                break
    return column, lane, len(rows)


_JUNCTION = {  # (up, down, left, right) → character
    (True, False, True, True): "┴", (False, True, True, True): "┬", (True, True, True, True): "┼",
    (True, False, False, True): "└", (True, False, True, False): "┘", (False, True, False, True): "┌",
    (False, True, True, False): "┐", (True, True, False, True): "├", (True, True, True, False): "┤",
    (True, True, False, False): "│",
}


def draw(d: Blocks, r: int, width: int = 80) -> list[str]:
    """The diagram as lines of text (box characters); a list of blocks when wider than ``width``."""
    if r == 0:
        return ["{} (the empty diagram)"]
    found = _layout(d, r, 0, SPACING)  # None: no aligned layout at any spacing
    aligned = found is not None
    for spacing in (SPACING,) + COMPACT:
        shift = 0 if aligned else spacing // 2
        total_width = spacing * (r - 1) + 2 + shift + 2
        if total_width <= width:
            break
    else:
        return _listed(d, r, width)
    if not aligned or spacing != SPACING:
        found = _layout(d, r, shift, spacing)
    assert found is not None
    column, lane, lanes = found
    height = lanes + 6  # labels, vertices, spacer, lanes, spacer, vertices, labels
    grid = [[" "] * total_width for _ in range(height)]
    top_row, bottom_row = 1, lanes + 4
    for v in range(2 * r):
        row = top_row if v < r else bottom_row
        grid[row][column[v]] = VERTEX
        if spacing < SPACING and v % r and (v % r + 1) % LABEL_EVERY:
            continue
        label = vertex_name(v, r)
        label_row = 0 if v < r else height - 1
        for j, ch in enumerate(label):
            if column[v] + j < total_width:
                grid[label_row][column[v] + j] = ch
    # horizontal lanes first, then the verticals over them
    for b, row in lane.items():
        y = row + 3
        cols = [column[v] for v in d[b]]
        for x in range(min(cols), max(cols) + 1):
            grid[y][x] = "─"
    for b, block in enumerate(d):
        if len(block) == 1:
            continue
        if b not in lane:  # a straight block {i, i'}
            for y in range(top_row + 1, bottom_row):
                grid[y][column[block[0]]] = "│"
            continue
        y_lane = lane[b] + 3
        cols = [column[v] for v in block]
        left, right = min(cols), max(cols)
        for v in block:
            x = column[v]
            span = range(top_row + 1, y_lane) if v < r else range(y_lane + 1, bottom_row)
            for y in span:
                grid[y][x] = "│"
        for x in sorted(set(cols)):
            up = any(column[v] == x and v < r for v in block)
            down = any(column[v] == x and v >= r for v in block)
            grid[y_lane][x] = _JUNCTION[(up, down, x > left, x < right)]
    return ["".join(row).rstrip() for row in grid]


def _listed(d: Blocks, r: int, width: int) -> list[str]:
    lines, current = [f"{r} vertices per row; blocks:"], ""
    for block in format_diagram(d, r).replace("},{", "} {").split(" "):
        if current and len(current) + 1 + len(block) > width:
            lines.append(current)
            current = ""
        current = f"{current} {block}" if current else "  " + block
    lines.append(current)
    return lines


def tikz(d: Blocks, r: int) -> str:
    """A ``tikzpicture`` of the diagram: top vertices at height 1, bottom at 0, labelled; in each
    block consecutive top vertices joined by arcs bending down, consecutive bottom vertices by arcs
    bending up, and the leftmost top joined to the leftmost bottom vertex when the block meets both
    rows (the usual drawing of set-partition diagrams)."""
    lines = [r"\begin{tikzpicture}[scale=0.8, every node/.style={circle, fill, inner sep=1.2pt}]"]
    for i in range(r):
        lines.append(rf"  \node[label=above:{{${i + 1}$}}] (t{i + 1}) at ({i}, 1) {{}};")
    for i in range(r):
        lines.append(rf"  \node[label=below:{{${i + 1}'$}}] (b{i + 1}) at ({i}, 0) {{}};")
    for block in d:
        top = [f"t{v + 1}" for v in block if v < r]
        bottom = [f"b{v - r + 1}" for v in block if v >= r]
        for a, b in zip(top, top[1:]):
            lines.append(rf"  \draw ({a}) to[bend right=50] ({b});")
        for a, b in zip(bottom, bottom[1:]):
            lines.append(rf"  \draw ({a}) to[bend left=50] ({b});")
        if top and bottom:
            lines.append(rf"  \draw ({top[0]}) -- ({bottom[0]});")
    lines.append(r"\end{tikzpicture}")
    return "\n".join(lines)
