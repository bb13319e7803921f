"""Drawings: every block's vertices are joined in the picture and no others (read back from the
box characters), the width stays within 80 columns, TikZ is well formed."""

from fractions import Fraction

import pytest

from engine.algebras.bases import iter_basis
from engine.algebras.diagrams import parse_diagram
from engine.algebras.drawing import VERTEX, draw, tikz
from engine.capabilities import AlgebraLevel

# the arms of each box character (common practice: their Unicode names, e.g. "light down and right")
ARMS = {"─": "LR", "│": "UD", "┌": "RD", "┐": "LD", "└": "UR", "┘": "UL", "├": "UDR", "┤": "UDL",
        "┬": "LRD", "┴": "LRU", "┼": "LRUD", VERTEX: "UD"}
STEP = {"U": (-1, 0, "D"), "D": (1, 0, "U"), "L": (0, -1, "R"), "R": (0, 1, "L")}


def level(kind: str, r: int, *, half: bool = False, word: str = "") -> AlgebraLevel:
    return AlgebraLevel(kind=kind, name=kind, vertices=r, half=half, n=3, parameter=3, word=word,
                        group="symmetric", dimension=0, level=Fraction(r), index=2 * r)


def components_in_picture(lines: list[str], r: int) -> set[frozenset[int]]:
    """Read the drawing back: flood-fill along matching arms from every vertex glyph (a lane meeting
    a │, or two side by side when vertices are drawn close, continues on their other side: the
    drawing's crossing)."""
    grid = [list(line) for line in lines]
    at = lambda y, x: grid[y][x] if 0 <= y < len(grid) and 0 <= x < len(grid[y]) else " "
    vertex_rows = [y for y, row in enumerate(grid) if VERTEX in row]
    top, bottom = vertex_rows[0], vertex_rows[-1]
    names = {}
    for row, offset in ((top, 0), (bottom, r)):
        xs = [x for x, ch in enumerate(grid[row]) if ch == VERTEX]
        assert len(xs) == r
        for i, x in enumerate(xs):
            names[(row, x)] = offset + i
    seen, found = set(), set()
    for start in names:
        if start in seen:
            continue
        stack, component = [start], set()
        while stack:
            y, x = stack.pop()
            if (y, x) in seen:
                continue
            seen.add((y, x))
            if (y, x) in names:
                component.add(names[(y, x)])
            for arm in ARMS.get(at(y, x), ""):
                dy, dx, back = STEP[arm]
                while dx and at(y, x + dx) == "│":  # a crossing: the lane passes under vertical lines
                    dx += 1 if dx > 0 else -1
                if back in ARMS.get(at(y + dy, x + dx), ""):
                    stack.append((y + dy, x + dx))
        found.add(frozenset(component))
    return found


CASES = [level("partition", 3), level("partition", 3, half=True), level("brauer", 4), level("temperley-lieb", 5),
         level("symmetric-group", 4), level("walled-brauer", 4, word="vdvd")]


@pytest.mark.parametrize("lev", CASES, ids=lambda lv: lv.kind + lv.word + ("h" if lv.half else ""))
def test_drawing_shows_the_blocks(lev):
    # common practice (a diagram is its set partition): the connected pieces of the picture are the blocks
    r = lev.vertices
    for d in iter_basis(lev):
        lines = draw(d, r)
        assert all(len(line) <= 80 for line in lines)
        assert sum(line.count(VERTEX) for line in lines) == 2 * r
        assert components_in_picture(lines, r) == {frozenset(block) for block in d}


def test_labels_and_wide_fallback():
    # the contract's notation: top vertices 1..k, bottom 1'..k'
    d = parse_diagram("{1,2'},{2,3,1'},{3'}", 3)
    lines = draw(d, 3)
    assert lines[0].split() == ["1", "2", "3"] and lines[-1].split() == ["1'", "2'", "3'"]
    wide = tuple((i, 45 + i) for i in range(45))
    listed = draw(wide, 45)
    assert VERTEX not in "".join(listed) and "{1,1'}" in " ".join(listed)
    assert all(len(line) <= 80 for line in listed)
    assert draw((), 0) == ["{} (the empty diagram)"]


def test_tikz_structure():
    # common practice (TeX syntax): balanced braces, one node per vertex, one environment
    d = parse_diagram("{1,2'},{2,3,1'},{3'}", 3)
    text = tikz(d, 3)
    assert text.count("{") == text.count("}")
    assert text.startswith(r"\begin{tikzpicture}") and text.endswith(r"\end{tikzpicture}")
    assert text.count(r"\node") == 6
    # edges: block {1,2'} one line; block {2,3,1'} one arc and one line
    assert text.count(r"\draw") == 3


@pytest.mark.parametrize("lev", [level("partition", 6), level("partition", 7, half=True), level("brauer", 9),
                                 level("walled-brauer", 8, word="vdvvddvd"), level("temperley-lieb", 10)],
                         ids=lambda lv: lv.kind + lv.word + ("h" if lv.half else ""))
def test_drawing_random_larger(lev):
    # common practice (a diagram is its set partition), on random ranks of larger levels
    import random

    from engine.algebras.bases import count, unrank

    rng = random.Random(lev.vertices)
    for _ in range(150):
        d = unrank(lev, rng.randrange(count(lev)))
        lines = draw(d, lev.vertices)
        assert all(len(line) <= 80 for line in lines)
        assert components_in_picture(lines, lev.vertices) == {frozenset(block) for block in d}


@pytest.mark.parametrize("lev", [level("partition", 21), level("brauer", 26), level("symmetric-group", 30),
                                 level("brauer", 38)], ids=lambda lv: f"{lv.kind}{lv.vertices}")
def test_wide_diagrams_are_drawn_closer(lev):
    # common practice (a diagram is its set partition): past 20 vertices a row no longer fits 80
    # columns 4 apart; the picture is drawn 3 or 2 columns apart, labelled at 1, 5, 10, ...
    import random

    from engine.algebras.bases import count, unrank

    r, rng = lev.vertices, random.Random(lev.vertices)
    for _ in range(40):
        d = unrank(lev, rng.randrange(count(lev)))
        lines = draw(d, r)
        assert all(len(line) <= 80 for line in lines)
        assert components_in_picture(lines, r) == {frozenset(block) for block in d}
        assert lines[0].split() == ["1"] + [str(i) for i in range(5, r + 1, 5)]
        assert lines[-1].split() == ["1'"] + [f"{i}'" for i in range(5, r + 1, 5)]
    assert VERTEX in "".join(draw(d, r, width=4 * r + 4))  # wide enough: 4 apart, every vertex labelled
    assert draw(d, r, width=4 * r + 4)[0].split() == [str(i) for i in range(1, r + 1)]
