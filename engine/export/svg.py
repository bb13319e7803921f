"""An SVG picture of a Bratteli diagram, for slides and web pages, without LaTeX (SVG 1.1, W3C
Recommendation): the same geometry as the TikZ picture (``figure.py``), in centimetres, with names
as text and ``tspan`` sub- and superscripts, Young diagrams as boxes, black and gray only.
"""

from __future__ import annotations

from xml.sax.saxutils import escape

from engine.diagram import Diagram
from engine.export.figure import CM_PER_PT, Figure, FigureNode, FigureOptions, Part, build_figure

FONT = "Latin Modern Roman, CMU Serif, Times New Roman, serif"


def _n(value: float) -> str:
    text = f"{value:.3f}".rstrip("0").rstrip(".")
    return "0" if text in ("-0", "") else text


_SUB = str.maketrans("0123456789+-", "₀₁₂₃₄₅₆₇₈₉₊₋")
_SUP = str.maketrans("0123456789+-k⊗", "⁰¹²³⁴⁵⁶⁷⁸⁹⁺⁻ᵏ⊗")


def _plain(parts: list[Part]) -> tuple[str, bool] | None:
    """The parts as one string with Unicode sub- and superscript characters (rendered alike by
    every SVG viewer), and whether it is bold; None when a script has no such characters."""
    out, bold = [], False
    for text, kind in parts:
        if kind == "sub":
            mapped = text.translate(_SUB)
        elif kind == "sup":
            mapped = text.translate(_SUP)
        else:
            mapped = text
            bold = bold or kind == "bold"
        if kind in ("sub", "sup") and mapped == text and not text.startswith("⊗"):
            return None
        out.append(mapped)
    return "".join(out), bold


def _text(parts: list[Part], x: float, y: float, size: float, bold: bool = False, anchor: str = "middle") -> str:
    flat = _plain(parts)
    if flat is not None:
        body, heavy = flat
        weight = ' font-weight="bold"' if bold or heavy else ""
        return (f'<text x="{_n(x)}" y="{_n(y)}" font-size="{_n(size)}" text-anchor="{anchor}"{weight}>'
                f"{escape(body)}</text>")
    spans = []
    for text, kind in parts:
        body = escape(text)
        if kind == "sub":
            spans.append(f'<tspan baseline-shift="sub" font-size="{_n(size * 0.7)}">{body}</tspan>')
        elif kind == "sup":
            spans.append(f'<tspan baseline-shift="super" font-size="{_n(size * 0.7)}">{body}</tspan>')
        elif kind == "bold":
            spans.append(f'<tspan font-weight="bold">{body}</tspan>')
        else:
            spans.append(f"<tspan>{body}</tspan>")
    weight = ' font-weight="bold"' if bold else ""
    return (f'<text x="{_n(x)}" y="{_n(y)}" font-size="{_n(size)}" text-anchor="{anchor}"{weight}>'
            + "".join(spans) + "</text>")


def _node(node: FigureNode, size: float, out: list[str]) -> None:
    small = size * 0.8
    if node.young is not None:
        s = node.box
        shape = node.young
        x0 = node.x - (shape[0] * s / 2 if shape else 0)
        y0 = node.y - len(shape) * s / 2
        stroke = _n(0.9 * CM_PER_PT if node.lit else 0.3 * CM_PER_PT)
        for r, length in enumerate(shape):
            for c in range(length):
                out.append(f'<rect x="{_n(x0 + c * s)}" y="{_n(y0 + r * s)}" width="{_n(s)}" height="{_n(s)}" '
                           f'fill="white" stroke="black" stroke-width="{stroke}"/>')
        if not shape:
            out.append(_text([("∅", "text")], node.x, node.y + size * 0.35, size))
        bottom = node.y + max(len(shape) * s, 0.3) / 2
        out.append(_text(node.multiplicity, node.x, bottom + small * 1.05, small, bold=node.lit))
        return
    if node.lit:
        out.append(f'<rect x="{_n(node.x - node.width / 2 - 0.06)}" y="{_n(node.y - size * 0.95)}" '
                   f'width="{_n(node.width + 0.12)}" height="{_n(size * 2.3)}" rx="0.04" fill="white" '
                   f'stroke="black" stroke-width="{_n(CM_PER_PT)}"/>')
    out.append(_text(node.parts, node.x, node.y, size))
    out.append(_text(node.multiplicity, node.x, node.y + small * 1.15, small, bold=node.lit))


def _ends(node: FigureNode, size: float) -> tuple[float, float]:
    """Where edges leave a node (below it) and arrive (above it)."""
    if node.young is not None:
        half = max(len(node.young) * node.box, 0.3) / 2
        return node.y + half + size * 1.1, node.y - half - 0.03
    return node.y + size * 1.45, node.y - size * 0.95


def _legend_lines(text: str, width: float, size: float) -> list[str]:
    per_line = max(20, int(width / (size * 0.6)))
    lines, current = [], ""
    for word in text.split(" "):
        if current and len(current) + 1 + len(word) > per_line:
            lines.append(current)
            current = word
        else:
            current = f"{current} {word}".strip()
    return lines + [current]


def figure_to_svg(figure: Figure, legend: bool = True) -> str:
    size = figure.size * CM_PER_PT
    out: list[str] = []
    gray = "#8c8c8c"
    for edge in figure.edges:
        y1 = _ends(edge.start, size)[0]
        y2 = _ends(edge.end, size)[1]
        colour, stroke = ("black", 1.4) if edge.lit else ((gray, 0.3) if figure.highlighted else ("black", 0.4))
        out.append(f'<line x1="{_n(edge.start.x)}" y1="{_n(y1)}" x2="{_n(edge.end.x)}" y2="{_n(y2)}" '
                   f'stroke="{colour}" stroke-width="{_n(stroke * CM_PER_PT)}"/>')
        if edge.count > 1:
            mx, my = (edge.start.x + edge.end.x) / 2, (y1 + y2) / 2
            tiny = 5.0 * CM_PER_PT
            out.append(f'<rect x="{_n(mx - tiny * 0.4 * len(str(edge.count)))}" y="{_n(my - tiny * 0.6)}" '
                       f'width="{_n(tiny * 0.8 * len(str(edge.count)))}" height="{_n(tiny * 1.1)}" fill="white"/>')
            out.append(_text([(str(edge.count), "text")], mx, my + tiny * 0.35, tiny))
    for y, parts in figure.levels:
        out.append(_text(parts, figure.level_x, y + size * 0.35, size, anchor="end"))
    for node in figure.nodes:
        _node(node, size, out)
    bottom = figure.bottom + 0.2
    if legend:
        small = 7.0 * CM_PER_PT
        for line in _legend_lines(figure.legend, figure.width, small):
            bottom += small * 1.25
            head, mark, tail = line.partition("V^{⊗k}")
            parts: list[Part] = [(head, "text")] + ([("V", "text"), ("⊗k", "sup"), (tail, "text")] if mark else [])
            out.append(_text(parts, figure.left, bottom, small, anchor="start"))
    top = -1.0
    width, height = figure.width + 0.2, bottom - top + 0.2
    head = (f'<svg xmlns="http://www.w3.org/2000/svg" version="1.1" width="{_n(width)}cm" height="{_n(height)}cm" '
            f'viewBox="{_n(figure.left - 0.1)} {_n(top)} {_n(width)} {_n(height)}" font-family="{FONT}">')
    lay = figure.layout
    title = escape(f"Bratteli diagram of {figure.spec}")
    desc = escape(f"{figure.legend} Node order: {lay.order}; {lay.crossings} edge crossings "
                  f"(plain order: {lay.plain_crossings}).")
    return "\n".join(['<?xml version="1.0" encoding="UTF-8"?>', head, f"<title>{title}</title>",
                      f"<desc>{desc}</desc>",
                      f'<rect x="{_n(figure.left - 0.1)}" y="{_n(top)}" width="{_n(width)}" height="{_n(height)}" fill="white"/>',
                      *out, "</svg>"]) + "\n"


def to_svg(diagram: Diagram, upto: int, options: FigureOptions | None = None) -> str:
    options = options or FigureOptions()
    return figure_to_svg(build_figure(diagram, upto, options), legend=options.legend)
