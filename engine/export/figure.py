"""The figure of a Bratteli diagram as plain geometry in centimetres, drawn by ``tikz.py`` and
``svg.py`` alike: the same layout, labels, Young diagrams, highlight and legend in both.

Node names are split into parts (plain text, subscripts, superscripts, a bold trivial ``1``) so
that each writer sets them in its own way: math mode in TikZ, ``tspan`` in SVG.  Young diagrams
follow the English convention (rows from the top, Macdonald, *Symmetric Functions and Hall
Polynomials*, I.1).  Text widths are estimated at about half an em per character (common practice
for proportional fonts); a figure asked to fit a width shrinks its spacing, then its type.
"""

from __future__ import annotations

import re
from dataclasses import dataclass
from typing import Hashable

from engine.diagram import Diagram
from engine.errors import UserError
from engine.export.layout import Layout, lay_out, paths_through
from engine.levels import parse_level
from engine.numbers_in import digit_count

CM_PER_PT = 2.54 / 72.27
#: type sizes (pt) a figure may use for node names, largest first; TikZ names them
SIZES = (9.0, 7.0, 5.0)
X_STEP, Y_STEP = 1.6, 1.5  # cm between nodes and between rows, at full size
LEVEL_GAP = 0.2  # cm between the "k = ..." column and the leftmost node
#: Computer Modern is wider per point at small sizes (optical sizes): the em estimate is scaled by
#: these factors, measured once with pdflatex on names such as (4,1,1) and k = 3 1/2 (\small, \scriptsize, \tiny)
WIDER = {9.0: 1.0, 7.0: 1.06, 5.0: 1.32}
#: inner padding of a name in TikZ and SVG (1.5pt on each side), cm
PAD = 3.0 * 2.54 / 72.27
#: the part of a width asked for that the estimate may fill (what it misses stays inside)
SAFETY = 0.97
BOX = 0.18  # cm: the side of a Young diagram's box at full size
MULTIPLICITY_DIGITS = 9  # longer multiplicities are written m·10^e in a figure

Part = tuple[str, str]  # (text, "text" | "sub" | "sup" | "bold")


@dataclass
class FigureOptions:
    young: bool = False
    width_cm: float | None = None
    order: str = "barycentre"
    highlight: str | None = None  # "LABEL@LEVEL"
    legend: bool = True


@dataclass
class FigureNode:
    name: str
    x: float
    y: float  # cm, downwards
    parts: list[Part]
    multiplicity: list[Part]
    young: tuple[int, ...] | None
    box: float
    lit: bool
    width: float  # estimated, cm
    height: float


@dataclass
class FigureEdge:
    start: FigureNode
    end: FigureNode
    count: int
    lit: bool


@dataclass
class Figure:
    spec: str
    nodes: list[FigureNode]
    edges: list[FigureEdge]
    levels: list[tuple[float, list[Part]]]  # (y, "k = ...")
    size: float  # pt, node names
    layout: Layout
    legend: str
    highlighted: bool
    left: float = 0.0
    right: float = 0.0
    bottom: float = 0.0
    level_x: float = 0.0  # the right end of the "k = ..." labels

    @property
    def width(self) -> float:
        return self.right - self.left


_UNITS = {"cm": 1.0, "mm": 0.1, "in": 2.54, "pt": CM_PER_PT}


def parse_width(text: str) -> float:
    """``12cm``, ``120mm``, ``4.5in``, ``340pt`` → centimetres."""
    m = re.fullmatch(r"\s*(\d+(?:\.\d+)?)\s*(cm|mm|in|pt)\s*", text)
    if not m:
        raise UserError(f"--width {text!r}: give a length such as 12cm, 120mm, 4.5in or 340pt")
    value = float(m.group(1)) * _UNITS[m.group(2)]
    if not 2.0 <= value <= 200.0:
        raise UserError(f"--width {text!r}: choose between 2cm and 200cm")
    return value


def partition_of(node: Hashable) -> tuple[int, ...] | None:
    """The partition a node is, when it is one (a tuple of positive integers, or ``()``)."""
    if isinstance(node, tuple) and all(isinstance(p, int) and not isinstance(p, bool) and p > 0 for p in node):
        return node
    return None


def name_parts(label: str, root: bool = False) -> list[Part]:
    """A node name as the trade would set it: ``(3,1)``; ∅ for the empty partition;
    ``(2,2)^+``; ``a4:2`` → a with subscript 4 (the dimension after the colon is dropped: the
    figure's legend says so); ``trivial`` or a root named ``1`` → a bold 1; ``r1`` → r₁."""
    if label == "()":
        return [("∅", "text")]
    m = re.fullmatch(r"(\(.*\))([+-])", label)
    if m:
        return [(m.group(1), "text"), (m.group(2), "sup")]
    if label.startswith("("):
        return [(label, "text")]
    base = label.split(":", 1)[0] if re.fullmatch(r"[^:]+:\d+", label) else label
    if base == "trivial" or (root and base == "1"):
        return [("1", "bold")]
    m = re.fullmatch(r"([A-Za-z]+)(\d+)", base)
    if m:
        return [(m.group(1), "text"), (m.group(2), "sub")]
    return [(base, "text")]


def number_parts(n: int) -> list[Part]:
    """A multiplicity in a figure: exact up to 9 digits, else mantissa·10^exponent."""
    digits = digit_count(n)
    if digits <= MULTIPLICITY_DIGITS:
        return [(str(n), "text")]
    head = str(n // 10 ** (digits - 4))
    return [(f"{head[0]}.{head[1:]}·10", "text"), (str(digits - 1), "sup")]


def parts_length(parts: list[Part]) -> float:
    """Width in ems (sub- and superscripts at 0.7)."""
    return sum(len(t) * (0.7 if k in ("sub", "sup") else 1.0) for t, k in parts) * 0.52


def text_cm(parts: list[Part], size: float) -> float:
    """Estimated width of set text at ``size`` pt, in cm (with ``WIDER``; a ½ counts as two characters,
    TeX sets it as a fraction)."""
    halves = sum(t.count("½") for t, _ in parts) * 0.52 * 0.9
    return (parts_length(parts) + halves) * size * CM_PER_PT * WIDER.get(size, 1.0)


def level_parts(value) -> list[Part]:
    """``k = 2½`` (a half written with the vulgar fraction, as printed tables do)."""
    whole, rest = divmod(value, 1)
    if rest == 0:
        return [(f"k = {int(whole)}", "text")]
    return [(f"k = {int(whole) or ''}½", "text")]


def build_figure(diagram: Diagram, upto: int, options: FigureOptions) -> Figure:
    tower = diagram.tower
    layout = lay_out(diagram, upto, options.order)
    lit_nodes: set = set()
    lit_edges: set = set()
    if options.highlight:
        index, node = _highlight_target(diagram, upto, options.highlight)
        lit_nodes, lit_edges = paths_through(diagram, upto, index, node)
    widest = layout.widest
    names = {(i, n): name_parts(tower.format(n), root=(i == 0)) for i, row in enumerate(layout.rows) for n in row}
    youngs = {key: partition_of(key[1]) if options.young else None for key in names}
    counts = {key: number_parts(diagram.level(key[0])[key[1]]) for key in names}
    deepest = max((len(y) for y in youngs.values() if y), default=0)
    broadest = max((y[0] for y in youngs.values() if y), default=0)
    level_names = [level_parts(tower.level_of(i)) for i in range(upto + 1)]

    def widths_at(size: float) -> tuple[float, float]:
        """The widest node text (a name unless Young diagrams stand for it, its multiplicity) and the
        level column, in cm, at ``size``."""
        small = size - 2 if size > 5 else size
        named = [text_cm(p, size) for key, p in names.items() if not youngs[key]]
        text = max(named + [text_cm(c, small) for c in counts.values()]) + PAD
        column = max(text_cm(p, size) for p in level_names) + PAD + LEVEL_GAP
        return text, column

    x_step, size, box = X_STEP, SIZES[0], BOX
    if options.width_cm is not None:
        for size in SIZES:
            text, column = widths_at(size)
            room = options.width_cm * SAFETY - column
            node_w = max(text, broadest * box)
            x_step = min((room - node_w) / (widest - 1) if widest > 1 else X_STEP, X_STEP)
            if text <= 0.92 * x_step or widest == 1:
                break
        if broadest:
            box = min(BOX, 0.85 * x_step / broadest, max(room - 0.2, 0.05) / broadest)
        if x_step <= 0.05 or room < max(text, broadest * box):
            raise UserError(f"--width {options.width_cm:g}cm is too narrow for {widest} nodes side by side")
    text, column = widths_at(size)
    y_step = Y_STEP + (max(deepest * box - 0.35, 0) if options.young else 0)
    nodes: dict[tuple[int, Hashable], FigureNode] = {}
    for i, row in enumerate(layout.rows):
        level = diagram.level(i)
        for n in row:
            young = youngs[(i, n)]
            small = size - 2 if size > 5 else size
            text_w = max(text_cm(counts[(i, n)], small), 0 if young else text_cm(names[(i, n)], size)) + PAD
            width = max(young[0] * box if young else 0, text_w, 0.3)
            height = (len(young) * box if young else size * CM_PER_PT * 1.2) + size * CM_PER_PT
            nodes[(i, n)] = FigureNode(f"n{i}x{layout.slots[(i, n)]}", layout.position(i, n) * x_step,
                                       i * y_step, names[(i, n)], number_parts(level[n]), young, box,
                                       (i, n) in lit_nodes, width, height)
    edges = [FigureEdge(nodes[(i, a)], nodes[(i + 1, b)], e, (i, a, b) in lit_edges)
             for i, row_edges in enumerate(layout.edges) for a, b, e in row_edges]
    half = max(node.width for node in nodes.values()) / 2
    level_x = -(widest - 1) / 2 * x_step - half - LEVEL_GAP
    left = level_x - (column - LEVEL_GAP)
    right = (widest - 1) / 2 * x_step + half
    levels = [(i * y_step, level_names[i]) for i in range(upto + 1)]
    return Figure(tower.spec, list(nodes.values()), edges, levels, size, layout,
                  _legend(diagram, options, bool(lit_nodes)), bool(lit_nodes), left, right,
                  upto * y_step + max(n.height for n in nodes.values()), level_x)


def _highlight_target(diagram: Diagram, upto: int, text: str) -> tuple[int, Hashable]:
    label, at, level = text.rpartition("@")
    if not at or not label:
        raise UserError(f"--highlight {text!r}: write LABEL@LEVEL, e.g. (3,1)@3")
    tower = diagram.tower
    index = tower.index_of(parse_level(level))
    if index > upto:
        raise UserError(f"--highlight {text!r}: level {level} is beyond the last level exported")
    node = tower.parse(label, index)
    if node not in diagram.level(index):
        raise UserError(f"--highlight {text!r}: {label} has no path from the root at level {level}")
    return index, node


def _legend(diagram: Diagram, options: FigureOptions, lit: bool) -> str:
    tower = diagram.tower
    what = "Young diagram" if options.young else "name"
    text = (f"Bratteli diagram of {tower.spec}: row k holds the irreducible modules in V^{{⊗k}} "
            f"(by {what}), each with its multiplicity below it (the number of paths from the top); "
            "a number on an edge counts the edges joining two nodes.")
    if any(":" in tower.format(n) for n in diagram.nodes(0)) or _has_dims(diagram):
        text += " Names drop the dimension written after the colon in labels (a4:2 is a with subscript 4)."
    if lit:
        label, _, level = (options.highlight or "").rpartition("@")
        text += f" Thick lines: the paths from the top to {label} at level {level}."
    return text


def _has_dims(diagram: Diagram) -> bool:
    return any(re.fullmatch(r"[^:]+:\d+", diagram.tower.format(n)) for n in diagram.nodes(min(1, diagram.built)))
