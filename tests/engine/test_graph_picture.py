"""The McKay graph drawn in text cells: the picture is read back cell by cell (stubs below and above
the nodes, tracks, crossings ┼, counts ×m, arrows) and its edges compared with networkx's graph of
the step matrix."""

from __future__ import annotations

import networkx as nx
import pytest

from engine.series.finite import finite_view
from engine.specs import parse_spec
from engine.walks.graph_picture import NoRoom, Picture, draw_graph

N, E, S, W = 1, 2, 4, 8
CONNECT = {"│": N | S, "─": E | W, "└": N | E, "┘": N | W, "┌": S | E, "┐": S | W, "├": N | S | E,
           "┤": N | S | W, "┬": E | W | S, "┴": E | W | N}
STEP = {N: (-1, 0), S: (1, 0), E: (0, 1), W: (0, -1)}
BACK = {N: S, S: N, E: W, W: E}
ON_TRACK = set("×0123456789►◄")

TOWERS = ["su2:kind=cyclic,m=1", "su2:kind=cyclic,m=2", "su2:kind=cyclic,m=3", "su2:kind=cyclic,m=6",
          "su2:kind=cyclic,m=7", "su2:kind=dihedral,m=2", "su2:kind=dihedral,m=3", "su2:kind=dihedral,m=5",
          "su2:kind=tetrahedral", "su2:kind=octahedral", "su2:kind=icosahedral",
          "characters:group=symmetric(4),module=(3,1)", "characters:group=symmetric(5),module=(4,1)",
          "characters:group=symmetric(5),module=(3,2)", "characters:group=symmetric(6),module=(5,1)",
          "characters:group=symmetric(4),module=(2,2)", "characters:group=symmetric(5),module=(4,1)+(3,2)",
          "characters:group=cyclic(5),module=x1+x2", "characters:group=cyclic(6),module=x1",
          "characters:group=dihedral(6),module=r1", "symmetric:n=4", "alternating:n=5"]


class Reader:
    """Reads a picture as a person would, knowing only the rules of its docstring."""

    def __init__(self, picture: Picture) -> None:
        width = picture.width + 2
        self.grid = [row.ljust(width) for row in picture.rows] + [" " * width]
        self.at = {(n.row, n.start + d): n.index for n in picture.nodes for d in range(len(n.text))}

    def cell(self, y: int, x: int) -> str:
        return self.grid[y][x] if 0 <= y < len(self.grid) and 0 <= x < len(self.grid[y]) else " "

    def stub_node(self, y: int, x: int) -> tuple[int, int]:
        """The node at the end of the stub through (y, x), and -1 / +1 for above / below."""
        for d in (N, S):
            yy = y
            if not CONNECT.get(self.cell(y, x), 0) & d:
                continue
            while True:
                yy += STEP[d][0]
                if (yy, x) in self.at:
                    return self.at[(yy, x)], (-1 if d == N else 1)
                c = self.cell(yy, x)
                if not (c == "┼" or c in "▲▼" or (CONNECT.get(c, 0) & BACK[d])):
                    break
                if c not in "┼▲▼" and not CONNECT[c] & d:
                    break
        raise AssertionError(f"a stub at {(y, x)} reaches no node")

    def track(self, y: int, x: int) -> tuple[frozenset, list[tuple[int, int]], str]:
        """From a junction (y, x): the cells of its track, its stubs (node, side), the text on it."""
        cells, stubs = {(y, x)}, [self.stub_node(y, x)]
        marks: list[tuple[int, str]] = []
        for d in (E, W):
            if not CONNECT[self.cell(y, x)] & d:
                continue
            xx = x
            while True:
                xx += STEP[d][1]
                c = self.cell(y, xx)
                if c in ON_TRACK or c == "┼":
                    cells.add((y, xx))
                    if c in ON_TRACK:
                        marks.append((xx, c))
                    continue
                m = CONNECT.get(c, 0)
                if not m & BACK[d]:
                    raise AssertionError(f"a track breaks at {(y, xx)}: {c!r}")
                cells.add((y, xx))
                if m & (N | S):
                    stubs.append(self.stub_node(y, xx))
                if not m & d:
                    break
        return frozenset(cells), stubs, "".join(c for _, c in sorted(marks))

    def edges(self, picture: Picture) -> dict[tuple, int]:
        """(a, b) (directed) or frozenset{a, b} → count, for every line drawn."""
        found: dict[frozenset, list] = {}
        for node in picture.nodes:
            for d in (N, S):
                y, x = node.row, node.port
                line: list[tuple[int, int]] = []
                while True:
                    y += STEP[d][0]
                    if (y, x) in self.at:  # a straight line
                        beside = "".join(self.cell(yy, x + 1 + k) for yy, _ in line for k in range(4)).split(" ")[0]
                        arrows = "".join(self.cell(yy, x) for yy, _ in line if self.cell(yy, x) in "▲▼")
                        found[frozenset(line)] = [{node.index, self.at[(y, x)]}, beside, arrows, node.index, d]
                        break
                    c = self.cell(y, x)
                    m = CONNECT.get(c, 0)
                    if not (c == "┼" or c in "▲▼" or m & BACK[d]):
                        break
                    line.append((y, x))
                    if m & (E | W) and c != "┼":
                        cells, stubs, text = self.track(y, x)
                        found.setdefault(cells, [stubs, text])
                    if c not in "┼▲▼" and not m & d:
                        break
        out: dict[tuple, int] = {}
        for key, value in found.items():
            if isinstance(value[0], set):  # straight
                ends, beside, arrows, top, d = value
                count = int(beside[1:]) if beside.startswith("×") else 1
                a, b = sorted(ends)
                if arrows:
                    other = (ends - {top}).pop()
                    src, dst = (top, other) if (arrows == "▼") == (d == S) else (other, top)
                    out[(src, dst)] = out.get((src, dst), 0) + count
                else:
                    out[frozenset(ends)] = out.get(frozenset(ends), 0) + count
                continue
            stubs, text = value
            ups = {n for n, side in stubs if side < 0}
            downs = {n for n, side in stubs if side > 0}
            pairs = [(u, v) for u in ups for v in downs] if ups and downs else [tuple(sorted(ups | downs))]
            assert all(len(p) == 2 for p in pairs), (stubs, key)
            count = int("".join(c for c in text if c.isdigit()) or 1)
            for a, b in pairs:
                if "►" in text or "◄" in text:
                    assert len(pairs) == 1
                    xs = {n.index: n.port for n in picture.nodes}
                    right = "►" in text
                    src, dst = (a, b) if (xs[b] > xs[a]) == right else (b, a)
                    out[(src, dst)] = out.get((src, dst), 0) + count
                else:
                    out[frozenset((a, b))] = out.get(frozenset((a, b)), 0) + count
        return out


def _expected(view) -> tuple[dict[tuple, int], dict[int, int]]:
    """networkx: the multigraph of the step matrix, M_ij edges i → j."""
    g = nx.MultiDiGraph()
    g.add_nodes_from(range(view.size))
    for i, row in enumerate(view.matrix):
        for j, m in enumerate(row):
            g.add_edges_from([(i, j)] * m)
    out: dict[tuple, int] = {}
    for i in range(view.size):
        for j in range(i + 1, view.size):
            there, back = g.number_of_edges(i, j), g.number_of_edges(j, i)
            if there and there == back:
                out[frozenset((i, j))] = there
            else:
                if there:
                    out[(i, j)] = there
                if back:
                    out[(j, i)] = back
    return out, {i: g.number_of_edges(i, i) for i in range(view.size) if g.number_of_edges(i, i)}


@pytest.mark.parametrize("spec", TOWERS)
def test_the_picture_reads_back_as_the_step_matrix(spec):
    view = finite_view(parse_spec(spec), "test")
    picture = draw_graph(view.labels, view.dimensions, view.matrix, view.root, 160, 44)
    assert isinstance(picture, Picture), picture
    assert picture.width <= 160 and picture.height <= 44
    # a drawn node for every irreducible, with its name and dimension, each once
    assert sorted(n.index for n in picture.nodes) == list(range(view.size))
    for n in picture.nodes:
        assert picture.rows[n.row][n.start:n.start + len(n.text)] == n.text
        assert n.text.lstrip("◆").startswith(f"{view.labels[n.index]} d{view.dimensions[n.index]}")
    expected, loops = _expected(view)
    drawn = Reader(picture).edges(picture)
    for note in picture.notes:  # counts and arrows that found no room on their line
        e = note.edge
        key = (e.a, e.b) if e.directed else frozenset((e.a, e.b))
        plain = frozenset((e.a, e.b))
        if e.directed and plain in drawn:
            drawn[key] = drawn.pop(plain)
        drawn[key] = e.count
        assert note.text.endswith(f"×{e.count}") or e.count == 1
    assert drawn == expected
    for n in picture.nodes:
        m = loops.get(n.index, 0)
        mark = "" if not m else (" ↺" if m == 1 else f" ↺{m}")
        assert n.text.endswith(f"d{view.dimensions[n.index]}{mark}")
    # layers: the breadth-first distance from the root (networkx) orders the rows
    g = nx.Graph([(i, j) for i, row in enumerate(view.matrix) for j, m in enumerate(row) if m and i != j])
    g.add_nodes_from(range(view.size))
    distance = nx.single_source_shortest_path_length(g, view.root)
    row_of = {n.index: n.row for n in picture.nodes}
    for i in distance:
        for j in distance:
            if distance[i] < distance[j]:
                assert row_of[i] < row_of[j]
            if distance[i] == distance[j]:
                assert row_of[i] == row_of[j]


def test_sizes_at_80x24_and_refusal():
    # common practice: the explorer has about 20 rows for the picture at 80×24
    for spec in ("su2:kind=icosahedral", "su2:kind=octahedral", "su2:kind=dihedral,m=6",
                 "characters:group=symmetric(5),module=(4,1)"):
        view = finite_view(parse_spec(spec), "test")
        assert isinstance(draw_graph(view.labels, view.dimensions, view.matrix, view.root, 78, 19), Picture), spec
    view = finite_view(parse_spec("characters:group=symmetric(8),module=(7,1)"), "test")
    refused = draw_graph(view.labels, view.dimensions, view.matrix, view.root, 78, 19)
    assert isinstance(refused, NoRoom) and "78×19 are free" in refused.reason
    assert refused.width > 78 or refused.height > 19


def test_affine_e8_is_a_path_with_one_branch():
    # from memory (McKay 1980): the binary icosahedral group's graph on C^2 is affine E8: a path
    # trivial—a4—a3—a2—a1—o—b1—b2 with c1 on o; drawn as straight lines down to o, then a fan
    view = finite_view(parse_spec("su2:kind=icosahedral"), "test")
    picture = draw_graph(view.labels, view.dimensions, view.matrix, view.root, 78, 19)
    assert isinstance(picture, Picture) and picture.height == 15 and not picture.notes
    assert sum(r.strip() == "│" for r in picture.rows) == 6


@pytest.mark.parametrize("seed", range(40))
def test_random_graphs_read_back(seed):
    # networkx's G(n, p) random graphs (and random directions and counts), as step matrices
    import random

    rng = random.Random(seed)
    n = rng.randint(1, 14)
    g = nx.gnp_random_graph(n, rng.choice([0.15, 0.3, 0.6]), seed=seed, directed=seed % 3 == 0)
    matrix = [[0] * n for _ in range(n)]
    for i, j in g.edges():
        count = rng.choice([1, 1, 1, 2, 3])
        matrix[i][j] = count
        if not g.is_directed():
            matrix[j][i] = count
    for i in rng.sample(range(n), k=n // 3):
        matrix[i][i] = rng.randint(1, 2)
    labels = tuple(f"v{i}" for i in range(n))
    dims = tuple(rng.randint(1, 30) for _ in range(n))

    class View:  # the fields _expected reads
        size = n
    View.matrix = tuple(tuple(r) for r in matrix)
    small = draw_graph(labels, dims, View.matrix, 0, 78, 19)
    assert isinstance(small, NoRoom) or (small.width <= 78 and small.height <= 19)
    picture = draw_graph(labels, dims, View.matrix, 0, 400, 400)
    assert isinstance(picture, Picture), picture
    expected, _ = _expected(View)
    drawn = Reader(picture).edges(picture)
    for note in picture.notes:
        e = note.edge
        plain = frozenset((e.a, e.b))
        key = (e.a, e.b) if e.directed else plain
        drawn.pop(plain, None)
        drawn[key] = e.count
    assert drawn == expected
