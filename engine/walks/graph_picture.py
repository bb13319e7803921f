"""The McKay graph of a finite tower's repeating step as a picture in text cells (pure: the explorer
draws the rows it returns).

Every node is written ``name d<dimension>`` (the root marked ◆, a loop ↺ with its count when more
than one), lines in box-drawing characters as ``graph_layout.py`` places them; a count of edges
above 1 is written ×m on the edge's line, a direction (V not self-dual: M not symmetric) as an
arrow towards the target (► ◄ ▲ ▼).  Where a count or an arrow finds no free cells on its line it
is listed in ``notes`` instead.  Components (V not faithful) are packed in shelves.  A graph that
does not fit the cells given is refused with the size it would need (``NoRoom``), and the caller
falls back to a list."""

from __future__ import annotations

from dataclasses import dataclass
from functools import lru_cache

from engine.walks.graph_layout import Edge, Layout, components, graph_edges, lay_out

N, E, S, W = 1, 2, 4, 8
GLYPHS = {N | S: "│", E | W: "─", N | E: "└", N | W: "┘", S | E: "┌", S | W: "┐", N | S | E: "├",
          N | S | W: "┤", E | W | S: "┬", E | W | N: "┴", N | E | S | W: "┼", N: "│", S: "│", E: "─", W: "─"}
#: past this many nodes the picture is not attempted
MAX_NODES = 60


@dataclass(frozen=True)
class PlacedNode:
    index: int
    label: str
    text: str
    row: int
    start: int
    port: int


@dataclass(frozen=True)
class Note:
    edge: Edge
    text: str


@dataclass(frozen=True)
class Picture:
    rows: tuple[str, ...]
    nodes: tuple[PlacedNode, ...]
    edges: tuple[Edge, ...]
    loops: tuple[tuple[int, int], ...]
    notes: tuple[Note, ...]

    @property
    def width(self) -> int:
        return max((len(r) for r in self.rows), default=0)

    @property
    def height(self) -> int:
        return len(self.rows)


@dataclass(frozen=True)
class NoRoom:
    width: int  # cells the picture would need (0: not attempted)
    height: int
    reason: str


def node_text(label: str, dimension: int, loop: int, root: bool) -> str:
    mark = "" if not loop else (" ↺" if loop == 1 else f" ↺{loop}")
    return f"{'◆' if root else ''}{label} d{dimension}{mark}"


def _edge_label(e: Edge) -> str:
    return f"×{e.count}" if e.count > 1 else ""


class _Canvas:
    def __init__(self) -> None:
        self.mask: dict[tuple[int, int], int] = {}
        self.text: dict[tuple[int, int], str] = {}

    def line(self, y0: int, x0: int, y1: int, x1: int) -> None:
        if y0 == y1:
            a, b = sorted((x0, x1))
            for x in range(a, b + 1):
                self.mask[(y0, x)] = self.mask.get((y0, x), 0) | (E if x < b else 0) | (W if x > a else 0)
        else:
            a, b = sorted((y0, y1))
            for y in range(a, b + 1):
                self.mask[(y, x0)] = self.mask.get((y, x0), 0) | (S if y < b else 0) | (N if y > a else 0)

    def free(self, y: int, x: int) -> bool:
        return (y, x) not in self.text and (y, x) not in self.mask

    def rows(self, height: int) -> tuple[str, ...]:
        width = 1 + max((x for _, x in list(self.mask) + list(self.text)), default=-1)
        grid = [[" "] * width for _ in range(height)]
        for (y, x), m in self.mask.items():
            grid[y][x] = GLYPHS.get(m, "?")
        for (y, x), c in self.text.items():
            grid[y][x] = c
        return tuple("".join(r).rstrip() for r in grid)


def _draw(layout: Layout, canvas: _Canvas, top: int, left: int, notes: list[Note]) -> list[tuple[int, int, int]]:
    """Draw one component at (top, left); returns (node, row, start) of its nodes."""
    placed = []
    y = top
    port = {i: p + left for i, p in layout.port.items()}
    for k, layer in enumerate(layout.layers):
        for i in layer:
            for d, c in enumerate(layout.texts[i]):
                canvas.text[(y, layout.start[i] + left + d)] = c
            placed.append((i, y, layout.start[i] + left))
        if k >= len(layout.bands):
            y += 1
            continue
        band = layout.bands[k]
        first, last = y + 1, y + band.height
        deepest: dict[int, int] = {}
        highest: dict[int, int] = {}
        for t in band.tracks:
            for u in t.ups:
                deepest[u] = max(deepest.get(u, first), first + t.row)
            for v in t.downs:
                highest[v] = min(highest.get(v, last), first + t.row)
        for u, r in deepest.items():
            canvas.line(y, port[u], r, port[u])
        for v, r in highest.items():
            canvas.line(r, port[v], last + 1, port[v])
        for t in band.tracks:
            xs = [port[i] for i in t.ups + t.downs]
            canvas.line(first + t.row, min(xs), first + t.row, max(xs))
        for e in band.straight:
            canvas.line(y, port[e.a], last + 1, port[e.a])
        # the ends touch the node rows: only the stubs' own cells there, no junction drawn on the text
        for (yy, xx) in [key for key in canvas.mask if key[0] in (y, last + 1) and key in canvas.text]:
            del canvas.mask[(yy, xx)]
        for t in band.tracks:
            if len(t.edges) == 1 and (_edge_label(t.edges[0]) or t.edges[0].directed):
                e = t.edges[0]
                text = _edge_label(e)
                if e.directed:
                    text = ("►" if port[e.b] > port[e.a] else "◄") + text
                row = first + t.row
                a, b = sorted((port[e.a], port[e.b]))
                spots = [x for x in range(a + 1, b - len(text) + 1)
                         if all(canvas.mask.get((row, x + d)) == E | W for d in range(len(text)))]
                if spots:
                    x0 = spots[len(spots) // 2]
                    for d, c in enumerate(text):
                        canvas.text[(row, x0 + d)] = c
                else:
                    notes.append(Note(e, text))
        for e in band.straight:
            text = _edge_label(e)
            row = first + (band.height - 1) // 2
            x = port[e.a]
            if e.directed:
                down = e.a in layout.layers[k]
                canvas.text[(row, x)] = "▼" if down else "▲"
            if text and all(canvas.free(row, x + 1 + d) for d in range(len(text))):
                for d, c in enumerate(text):
                    canvas.text[(row, x + 1 + d)] = c
            elif text:
                notes.append(Note(e, text))
        y = last + 1
    return placed


@lru_cache(maxsize=32)
def draw_graph(labels: tuple[str, ...], dimensions: tuple[int, ...], matrix: tuple[tuple[int, ...], ...],
               root: int, width: int, height: int) -> Picture | NoRoom:
    """The picture of the graph of ``matrix`` (rows and columns in the order of ``labels``) in at
    most ``width`` × ``height`` cells, or why not."""
    n = len(labels)
    if n > MAX_NODES:
        return NoRoom(0, 0, f"{n} nodes: a picture is drawn up to {MAX_NODES}")
    edges, loops = graph_edges(matrix)
    texts = {i: node_text(labels[i], dimensions[i], loops.get(i, 0), i == root) for i in range(n)}
    labelled = {e for e in edges if e.count > 1 or e.directed}
    split = components(n, edges, root)
    # lower bounds before any layout: a node row and a band row per layer; a layer's labels in a row
    low_height = max(2 * len(layers) - 1 for layers in split)
    low_width = max(sum(len(texts[i]) + 1 for i in layer) - 1 for layers in split for layer in layers)
    if low_height > height or low_width > width:
        return NoRoom(low_width, low_height, f"the picture needs at least {low_width}×{low_height} cells, "
                      f"{width}×{height} are free")
    best: NoRoom | None = None
    for gap in (2, 1):
        fitting: list[tuple[int, int, list[Layout]]] = []
        for sweeps in ("both", "down", "none"):  # the tightest of three orders of the layers
            parts = []
            for layers in [[list(layer) for layer in layers] for layers in split]:
                members = {i for layer in layers for i in layer}
                mine = [e for e in edges if e.a in members]
                parts.append(lay_out(layers, mine, {i: texts[i] for i in members}, labelled, gap, sweeps))
            fitting.append((max(p.height for p in parts), max(p.width for p in parts), parts))
        parts = min(fitting, key=lambda f: (f[0] > height or f[1] > width, f[0] * f[1], f[0]))[2]
        canvas, notes = _Canvas(), []
        placed: list[tuple[int, int, int]] = []
        top = left = shelf = used_width = 0
        for part in parts:
            if left and left + part.width > width:
                top, left, shelf = top + shelf + 1, 0, 0
            placed += _draw(part, canvas, top, left, notes)
            used_width = max(used_width, left + part.width)
            left += part.width + 3
            shelf = max(shelf, part.height)
        total = top + shelf
        if used_width <= width and total <= height:
            nodes = tuple(PlacedNode(i, labels[i], texts[i], row, start, start + (len(texts[i]) - 1) // 2)
                          for i, row, start in sorted(placed))
            return Picture(canvas.rows(total), nodes, tuple(edges), tuple(sorted(loops.items())), tuple(notes))
        if best is None or used_width * total < best.width * best.height:
            best = NoRoom(used_width, total, f"the picture needs {used_width}×{total} cells, {width}×{height} are free")
    assert best is not None
    return best
