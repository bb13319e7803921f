"""Where each node of a Bratteli diagram goes in a figure (TikZ and SVG share it).

Levels run down the page, one row each.  Within a row the nodes are ordered either in the tower's
display order (``plain``) or by the barycentre heuristic of layered graph drawing (Sugiyama,
Tagawa and Toda, "Methods for visual understanding of hierarchical system structures", IEEE Trans.
SMC 11, 1981): sweeping down, each node takes the mean position of its parents; sweeping up, of its
children; the sweeps repeat and the ordering with the fewest crossings found is kept, the plain
order included, so the heuristic never does worse than the plain order; a greedy switch of
neighbours (below) then removes what the sweeps leave.

Crossings are counted between consecutive rows: two edges (drawn as straight segments, one per
pair of joined nodes whatever the edge count) cross when their ends are in opposite orders.
"""

from __future__ import annotations

from dataclasses import dataclass, field
from typing import Hashable

from engine.diagram import Diagram
from engine.errors import UserError

ORDERS = ("barycentre", "plain")
#: the sweeps of the barycentre heuristic (each a pass down and a pass up)
SWEEPS = 8
#: a figure of more nodes than this is refused (it could not be read on a page)
MAX_NODES = 600


@dataclass
class Layout:
    """Rows of nodes in drawing order, the edges between consecutive rows, the crossings."""

    rows: list[list[Hashable]]
    edges: list[list[tuple[Hashable, Hashable, int]]]  # edges[i]: row i to row i+1 (parent, child, count)
    order: str
    crossings: int
    plain_crossings: int
    slots: dict[tuple[int, Hashable], int] = field(default_factory=dict)

    @property
    def widest(self) -> int:
        return max(len(r) for r in self.rows)

    def position(self, index: int, node: Hashable) -> float:
        """Horizontal position in slots, rows centred: the middle of the widest row is 0."""
        row = self.rows[index]
        return self.slots[(index, node)] - (len(row) - 1) / 2


def crossings_between(top: list[Hashable], bottom: list[Hashable],
                      edges: list[tuple[Hashable, Hashable, int]]) -> int:
    """The pairs of segments between two rows whose ends come in opposite orders."""
    where_top = {n: k for k, n in enumerate(top)}
    where_bottom = {n: k for k, n in enumerate(bottom)}
    ends = sorted((where_top[a], where_bottom[b]) for a, b, _ in edges)
    # strict inversions of the bottom ends in this order (equal tops sort by bottom, so add none),
    # counted with a Fenwick tree (Fenwick, Software: Practice and Experience 24, 1994)
    size = len(bottom)
    tree = [0] * (size + 1)
    count = seen = 0
    for _, b in ends:
        i, below = b + 1, 0  # entries so far with bottom end <= b
        while i > 0:
            below += tree[i]
            i -= i & -i
        count += seen - below
        seen += 1
        i = b + 1
        while i <= size:
            tree[i] += 1
            i += i & -i
    return count


def total_crossings(rows: list[list[Hashable]], edges: list[list[tuple[Hashable, Hashable, int]]]) -> int:
    return sum(crossings_between(rows[i], rows[i + 1], edges[i]) for i in range(len(edges)))


def _reorder(row: list[Hashable], fixed: list[Hashable], links: dict[Hashable, list[Hashable]]) -> list[Hashable]:
    """``row`` sorted by the mean position of each node's neighbours in ``fixed`` (a node with none
    keeps its place); ties keep the current order."""
    where = {n: k for k, n in enumerate(fixed)}
    keys = {}
    for k, node in enumerate(row):
        near = [where[m] for m in links.get(node, ()) if m in where]
        keys[node] = sum(near) / len(near) if near else float(k)
    return sorted(row, key=lambda n: keys[n])


def _row_crossings(rows: list[list[Hashable]], edges: list[list[tuple[Hashable, Hashable, int]]], i: int) -> int:
    """Crossings of the segments that meet row ``i`` (above and below it)."""
    count = crossings_between(rows[i - 1], rows[i], edges[i - 1]) if i > 0 else 0
    return count + (crossings_between(rows[i], rows[i + 1], edges[i]) if i < len(edges) else 0)


def _switch(rows: list[list[Hashable]], edges: list[list[tuple[Hashable, Hashable, int]]]) -> None:
    """The greedy switch of layered drawing (Eades and Kelly, "Heuristics for reducing crossings in
    2-layered networks", Ars Combinatoria 21-A, 1986): exchange neighbours in a row while that
    lowers the crossings at the row, until no exchange helps (bounded number of rounds)."""
    for _ in range(20):
        improved = False
        for i, row in enumerate(rows):
            here = _row_crossings(rows, edges, i)
            for k in range(len(row) - 1):
                row[k], row[k + 1] = row[k + 1], row[k]
                there = _row_crossings(rows, edges, i)
                if there < here:
                    here, improved = there, True
                else:
                    row[k], row[k + 1] = row[k + 1], row[k]
        if not improved:
            return


def lay_out(diagram: Diagram, upto: int, order: str = "barycentre") -> Layout:
    """Rows 0..upto (indices) of ``diagram`` in the order asked for (``ORDERS``)."""
    if order not in ORDERS:
        raise UserError(f"unknown order {order!r} (use {' or '.join(ORDERS)})")
    diagram.ensure(upto)
    plain = [list(diagram.nodes(i)) for i in range(upto + 1)]
    size = sum(len(r) for r in plain)
    if size > MAX_NODES:
        raise UserError(f"a figure of {size:,} nodes is too large to read (at most {MAX_NODES}); "
                        "export fewer levels (--to)")
    edges = [[(a, b, e) for a in plain[i] for b, e in diagram.children(i, a)] for i in range(upto)]
    plain_count = total_crossings(plain, edges)
    best, best_count = plain, plain_count
    if order == "barycentre" and plain_count:
        down: list[dict[Hashable, list[Hashable]]] = []  # per row: node -> parents
        up: list[dict[Hashable, list[Hashable]]] = []  # per row: node -> children
        for i in range(upto + 1):
            down.append({})
            up.append({})
        for i, row_edges in enumerate(edges):
            for a, b, _ in row_edges:
                down[i + 1].setdefault(b, []).append(a)
                up[i].setdefault(a, []).append(b)
        rows = [list(r) for r in plain]
        for _ in range(SWEEPS):
            for i in range(1, upto + 1):
                rows[i] = _reorder(rows[i], rows[i - 1], down[i])
            count = total_crossings(rows, edges)
            if count < best_count:
                best, best_count = [list(r) for r in rows], count
            for i in range(upto - 1, -1, -1):
                rows[i] = _reorder(rows[i], rows[i + 1], up[i])
            count = total_crossings(rows, edges)
            if count < best_count:
                best, best_count = [list(r) for r in rows], count
            if best_count == 0:
                break
        rows = [list(r) for r in best]
        _switch(rows, edges)
        count = total_crossings(rows, edges)
        if count < best_count:
            best, best_count = rows, count
    slots = {(i, n): k for i, row in enumerate(best) for k, n in enumerate(row)}
    return Layout(best, edges, order, best_count, plain_count, slots)


def paths_through(diagram: Diagram, upto: int, index: int, node: Hashable) -> tuple[set, set]:
    """The nodes and edges ((i, parent, child)) on some path from the root to ``node`` at row
    ``index``: what a highlighted node lights up (its paths from the root)."""
    nodes = {(index, node)}
    edges = set()
    frontier = {node}
    for i in range(index, 0, -1):
        above = set()
        for child in frontier:
            for parent, _ in diagram.parents(i, child):
                above.add(parent)
                edges.add((i - 1, parent, child))
        nodes |= {(i - 1, p) for p in above}
        frontier = above
    return nodes, edges
