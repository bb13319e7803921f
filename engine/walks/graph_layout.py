"""Where the nodes and lines of a McKay graph go on a grid of text cells (pure; drawn by
``graph_picture.py``).

Layered drawing in the manner of Sugiyama, Tagawa and Toda (*Methods for visual understanding of
hierarchical system structures*, IEEE Trans. SMC 11, 1981): the layers are the breadth-first
distances from the root in the undirected graph (so every edge joins one layer to itself or to the
next), each layer is a row of labels ordered by the barycentre heuristic, and the edges between a
layer and the next run in the band of rows below it, orthogonally: a vertical *stub* below (above)
each node's *port* and one horizontal *track* per edge.  Rules that make the picture read without
ambiguity (the tests trace it back):

- in a band the ports of the layer above and of the layer below are distinct columns, except a
  pair joined by a *straight* line (the two have no other edge in the band);
- every track is joined at its ends to stubs (a T or a corner); a ┼ is always a crossing;
- a *fan* (one node to several that have no other edge in the band) shares one track, the owner's
  stub ending on it; a track joins the nodes above it to those below it, or, all its stubs coming
  from above, the two nodes of an edge within a layer.

The placement of a layer is the one of least total distance between each port and the mean of
its neighbours' ports in the layer above, found exactly by dynamic programming; the order of the
tracks in a band is improved by swaps that lower the number of crossings (common practice)."""

from __future__ import annotations

from collections import deque
from dataclasses import dataclass, field
from fractions import Fraction


@dataclass(frozen=True)
class Edge:
    """``count`` edges a—b (a → b only, when ``directed``); a ≠ b."""

    a: int
    b: int
    count: int
    directed: bool = False


@dataclass
class Track:
    """One horizontal line of a band, joining the stubs at ``ups`` (from the layer above) and
    ``downs`` (from the layer below); the edges it carries."""

    ups: list[int]
    downs: list[int]
    edges: list[Edge]
    row: int = 0


@dataclass
class Band:
    tracks: list[Track] = field(default_factory=list)
    straight: list[Edge] = field(default_factory=list)  # a above, b below (or reversed), same port
    edges: list[Edge] = field(default_factory=list)  # every edge in the band, before routing

    @property
    def height(self) -> int:
        return max((t.row + 1 for t in self.tracks), default=1)


@dataclass
class Layout:
    """One connected component: its layers (node indices left to right), every node's text,
    start column and port column, and the bands below the layers."""

    layers: list[list[int]]
    texts: dict[int, str]
    start: dict[int, int]
    port: dict[int, int]
    bands: list[Band]

    @property
    def width(self) -> int:
        return max(self.start[i] + len(self.texts[i]) for i in self.texts)

    @property
    def height(self) -> int:
        return len(self.layers) + sum(b.height for b in self.bands)


def graph_edges(matrix: tuple[tuple[int, ...], ...]) -> tuple[list[Edge], dict[int, int]]:
    """The edges between distinct nodes (once per unordered pair when M is symmetric there) and
    the loops, node → count."""
    n = len(matrix)
    edges: list[Edge] = []
    for i in range(n):
        for j in range(i + 1, n):
            there, back = matrix[i][j], matrix[j][i]
            if there and there == back:
                edges.append(Edge(i, j, there))
                continue
            if there:
                edges.append(Edge(i, j, there, True))
            if back:
                edges.append(Edge(j, i, back, True))
    return edges, {i: matrix[i][i] for i in range(n) if matrix[i][i]}


def components(n: int, edges: list[Edge], root: int) -> list[list[int]]:
    """Connected components (undirected), the root's first, each as breadth-first layers."""
    around: dict[int, list[int]] = {i: [] for i in range(n)}
    for e in edges:
        around[e.a].append(e.b)
        around[e.b].append(e.a)
    seen: set[int] = set()
    out = []
    for start in [root] + [i for i in range(n) if i != root]:
        if start in seen:
            continue
        layers = [[start]]
        seen.add(start)
        while True:
            following: list[int] = []
            for i in layers[-1]:
                for j in sorted(around[i]):
                    if j not in seen:
                        seen.add(j)
                        following.append(j)
            if not following:
                break
            layers.append(following)
        out.append(layers)
    return out


def _order(layers: list[list[int]], edges: list[Edge], sweeps: str) -> None:
    """Barycentre sweeps (in place): ``both`` down and up three times, ``down`` once down, ``none``
    (the display order kept)."""
    if sweeps == "none":
        return
    around: dict[int, set[int]] = {}
    for e in edges:
        around.setdefault(e.a, set()).add(e.b)
        around.setdefault(e.b, set()).add(e.a)
    rounds = [(range(1, len(layers)), range(len(layers) - 2, -1, -1))] * 3 if sweeps == "both" else [(range(1, len(layers)),)]
    for directions in rounds:
        for sweep in directions:
            for li in sweep:
                ref = layers[li - 1] if sweep.step == 1 else layers[li + 1]
                where = {node: k for k, node in enumerate(ref)}
                def centre(node: int, k: int) -> Fraction:
                    near = [where[m] for m in around.get(node, ()) if m in where]
                    return Fraction(sum(near), len(near)) if near else Fraction(k)
                layers[li] = [node for _, _, node in sorted((centre(node, k), k, node) for k, node in enumerate(layers[li]))]


def _place(layer: list[int], widths: dict[int, int], desired: dict[int, Fraction | None],
           blocked: set[int], allowed: dict[int, int], gap: int) -> dict[int, int]:
    """Start columns for ``layer`` (left to right, ``gap`` apart) of least Σ|port − desired|,
    no port in ``blocked`` except a node's own ``allowed`` one (a node wanting nothing: leftmost).
    Dynamic programming over the start columns: best[k][s] is the least cost of the first k + 1
    nodes with node k starting at s, with the start of node k − 1 that gives it."""
    wanted = [d for d in desired.values() if d is not None]
    margin = sum(widths[i] + gap for i in layer) + 3 * len(layer) + 4  # room for every node beside the blocked
    lo = int(min(wanted, default=0)) - margin
    positions = range(lo, int(max(wanted, default=0)) + margin + 1)
    best: list[dict[int, tuple[Fraction, int | None]]] = []
    for k, node in enumerate(layer):
        half = (widths[node] - 1) // 2
        previous = best[-1] if k else None
        need = widths[layer[k - 1]] + gap if k else 0
        cheapest: tuple[Fraction, int] | None = None  # over the previous starts ≤ s − need
        row: dict[int, tuple[Fraction, int | None]] = {}
        for s in positions:
            if previous is not None:
                candidate = previous.get(s - need)
                if candidate is not None and (cheapest is None or candidate[0] < cheapest[0]):
                    cheapest = (candidate[0], s - need)
                if cheapest is None:
                    continue
            port = s + half
            if port in blocked and allowed.get(node) != port:
                continue
            want = desired[node]
            cost = Fraction(s - lo) if want is None else abs(port - want)
            row[s] = (cost, None) if cheapest is None else (cost + cheapest[0], cheapest[1])
        best.append(row)
    s = min(best[-1], key=lambda x: (best[-1][x][0], x))
    out: dict[int, int] = {}
    for k in range(len(layer) - 1, -1, -1):
        out[layer[k]] = s
        s = best[k][s][1]  # type: ignore[assignment]
    return out


def _pack(port: dict[int, int], order: list[Track]) -> int:
    """Rows for the tracks in ``order``: each on the first row below every earlier track whose
    columns it meets (tracks apart share a row: the left-edge packing of channel routing,
    Hashimoto and Stevens 1971; no vertical constraints, since the ports of a band differ);
    returns the band's height."""
    spans: list[tuple[int, int, int]] = []
    for t in order:
        xs = [port[i] for i in t.ups + t.downs]
        lo, hi = min(xs), max(xs)
        t.row = max((r + 1 for a, b, r in spans if a <= hi + 1 and lo <= b + 1), default=0)
        spans.append((lo, hi, t.row))
    return max((r + 1 for _, _, r in spans), default=1)


def _crossings(band: Band, port: dict[int, int], order: list[Track]) -> int:
    """Crossings of stubs and straight lines with tracks, plus twice the band's height (the score the
    order of the tracks lowers)."""
    height = _pack(port, order)
    deepest: dict[int, int] = {}
    highest: dict[int, int] = {}
    for t in order:
        for u in t.ups:
            deepest[u] = max(deepest.get(u, -1), t.row)
        for v in t.downs:
            highest[v] = min(highest.get(v, len(order)), t.row)
    count = 2 * height
    for t in order:
        xs = [port[i] for i in t.ups + t.downs]
        lo, hi = min(xs), max(xs)
        for u, r in deepest.items():
            if lo < port[u] < hi and t.row < r and u not in t.ups:
                count += 1
        for v, r in highest.items():
            if lo < port[v] < hi and t.row > r and v not in t.downs:
                count += 1
        count += sum(1 for e in band.straight if lo < port[e.a] < hi)
    return count


def _route(band: Band, upper: set[int], port: dict[int, int], labelled: set[Edge]) -> None:
    """Fans, single tracks and straight lines for ``band.edges``, the tracks in their order."""
    edges = band.edges
    ups: dict[int, list[Edge]] = {}
    downs: dict[int, list[Edge]] = {}
    for e in edges:
        for end in (e.a, e.b):
            (ups if end in upper else downs).setdefault(end, []).append(e)
    used: set[Edge] = set()
    for owner, side, other in [(u, ups, downs) for u in ups] + [(v, downs, ups) for v in downs]:
        mine = side[owner]
        if len(mine) < 2 or any(e in used or e in labelled for e in mine):
            continue
        ends = [e.b if e.a == owner else e.a for e in mine]
        if all(end in other and len(other[end]) == 1 for end in ends):
            on_top = owner in upper
            band.tracks.append(Track([owner] if on_top else ends, ends if on_top else [owner], list(mine)))
            used.update(mine)
    for e in edges:
        if e in used:
            continue
        a_up, b_up = e.a in upper, e.b in upper
        if a_up != b_up and port[e.a] == port[e.b]:
            band.straight.append(e)
            continue
        band.tracks.append(Track([x for x in (e.a, e.b) if x in upper], [x for x in (e.a, e.b) if x not in upper], [e]))
    order = sorted(band.tracks, key=lambda t: (min(port[i] for i in t.ups + t.downs), len(t.ups)))
    score = _crossings(band, port, order)
    improved = True
    while improved and len(order) < 80:
        improved = False
        for k in range(len(order) - 1):
            order[k], order[k + 1] = order[k + 1], order[k]
            trial = _crossings(band, port, order)
            if trial < score:
                score, improved = trial, True
            else:
                order[k], order[k + 1] = order[k + 1], order[k]
    _crossings(band, port, order)  # sets the rows
    band.tracks = order


def lay_out(layers: list[list[int]], edges: list[Edge], texts: dict[int, str], labelled: set[Edge],
            gap: int = 2, sweeps: str = "both") -> Layout:
    """The layout of one component (``edges``: those among its nodes)."""
    _order(layers, edges, sweeps)
    layer_of = {i: k for k, layer in enumerate(layers) for i in layer}
    bands = [Band() for _ in range(len(layers))]
    up_count: dict[tuple[int, int], int] = {}
    for e in edges:
        band = min(layer_of[e.a], layer_of[e.b])
        bands[band].edges.append(e)
        for end in (e.a, e.b):
            up_count[(band, end)] = up_count.get((band, end), 0) + 1
    widths = {i: len(t) for i, t in texts.items()}
    start: dict[int, int] = {}
    port: dict[int, int] = {}
    for k, layer in enumerate(layers):
        desired: dict[int, Fraction | None] = {i: None for i in layer}
        allowed: dict[int, int] = {}
        if k:
            for i in layer:
                near = [port[e.a if e.b == i else e.b] for e in edges if i in (e.a, e.b)
                        and layer_of[e.a if e.b == i else e.b] == k - 1]
                desired[i] = Fraction(sum(near), len(near)) if near else None
                if len(near) == 1 and up_count[(k - 1, i)] == 1:
                    partner = next(e.a if e.b == i else e.b for e in edges if i in (e.a, e.b)
                                   and layer_of[e.a if e.b == i else e.b] == k - 1)
                    if up_count[(k - 1, partner)] == 1:
                        allowed[i] = port[partner]
        blocked = {port[i] + d for i in layers[k - 1] for d in (-1, 0, 1)} if k else set()  # no ┌┤ huddles
        placed = _place(layer, widths, desired, blocked, allowed, gap)
        for i, s in placed.items():
            start[i], port[i] = s, s + (widths[i] - 1) // 2
    shift = min(start.values())
    start = {i: s - shift for i, s in start.items()}
    port = {i: p - shift for i, p in port.items()}
    for k, band in enumerate(bands):
        _route(band, set(layers[k]), port, labelled)
    while bands and not bands[-1].tracks and not bands[-1].straight:
        bands.pop()
    return Layout(layers, texts, start, port, bands)
