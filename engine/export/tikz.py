"""A TikZ picture of a Bratteli diagram, for papers and slides (the TikZ/PGF manual, parts "Nodes
and Edges" and "Paths").  Levels run down the page; each node shows its name in math mode (or its
Young diagram) and, below it, its multiplicity; edges with a count above 1 carry that count.  The
geometry comes from ``figure.py`` (node order by the barycentre heuristic unless the plain order is
asked for).  The output is a ``tikzpicture`` to ``\\input`` into a document that loads ``tikz``;
it uses black and gray only, with thickness (not colour) marking a highlight, so it prints in
grayscale.
"""

from __future__ import annotations

from fractions import Fraction

from engine.diagram import Diagram
from engine.export.figure import Figure, FigureNode, FigureOptions, Part, build_figure

_ESCAPES = {"\\": r"\textbackslash{}", "{": r"\{", "}": r"\}", "_": r"\_", "^": r"\^{}", "&": r"\&",
            "%": r"\%", "$": r"\$", "#": r"\#", "~": r"\~{}"}
_FONTS = {9.0: r"\small", 7.0: r"\scriptsize", 5.0: r"\tiny"}
_SMALLER = {9.0: r"\scriptsize", 7.0: r"\tiny", 5.0: r"\tiny"}
_MATH = {"∅": r"\emptyset", "·": r"\cdot ", "⊗": r"\otimes ", "½": r"\frac{1}{2}"}


def _c(value: float) -> str:
    """A coordinate in cm, three decimals, never ``-0.000``."""
    text = f"{value:.3f}"
    return "0.000" if text == "-0.000" else text


def tex_escape(text: str) -> str:
    """Text set verbatim in LaTeX: its special characters escaped."""
    return "".join(_ESCAPES.get(ch, ch) for ch in text)


def level_tex(level: Fraction) -> str:
    """``2`` or ``2\\frac{1}{2}`` (math mode; plain LaTeX)."""
    whole, rest = divmod(level, 1)
    if rest == 0:
        return str(int(whole))
    return f"{int(whole) or ''}\\frac{{{rest.numerator}}}{{{rest.denominator}}}"


def math_of(parts: list[Part]) -> str:
    """Parts of a name as math-mode TeX (without the dollars)."""
    out = []
    for text, kind in parts:
        body = "".join(_MATH.get(ch, _ESCAPES.get(ch, ch)) for ch in text)
        if text.isalpha() and len(text) > 1:
            body = f"\\mathrm{{{body}}}"
        out.append({"sub": f"_{{{body}}}", "sup": f"^{{{body}}}", "bold": f"\\mathbf{{{body}}}"}.get(kind, body))
    return "".join(out)


def _young(node: FigureNode, lines: list[str]) -> None:
    """The boxes of the node's Young diagram, rows from the top, centred on the node."""
    shape = node.young or ()
    s = node.box
    x0 = node.x - shape[0] * s / 2 if shape else node.x
    y0 = -node.y + len(shape) * s / 2
    style = "line width=0.9pt" if node.lit else "line width=0.3pt"
    for r, length in enumerate(shape):
        for c in range(length):
            lines.append(f"  \\draw[{style}] ({_c(x0 + c * s)},{_c(y0 - r * s)}) rectangle "
                         f"({_c(x0 + (c + 1) * s)},{_c(y0 - (r + 1) * s)});")
    if not shape:
        lines.append(f"  \\node[inner sep=0pt] at ({_c(node.x)},{_c(-node.y)}) {{$\\emptyset$}};")


def figure_to_tikz(figure: Figure, legend: bool = True) -> str:
    font, small = _FONTS[figure.size], _SMALLER[figure.size]
    lay = figure.layout
    last = figure.levels[-1][1][0][0].removeprefix("k = ").replace("½", "+1/2")
    lines = [
        f"% Bratteli diagram of {tex_escape(figure.spec)}, levels 0 to {last}",
        f"% node order: {lay.order}; {lay.crossings} edge crossings (plain order: {lay.plain_crossings})",
        f"% width about {figure.width:.1f}cm; caption: {figure.legend}",
        f"\\begin{{tikzpicture}}[every node/.style={{font={font}, align=center}},",
        "  edge/.style={line width=0.4pt, black}, dim/.style={line width=0.3pt, gray!55},",
        "  lit/.style={line width=1.4pt, black}, count/.style={fill=white, inner sep=0.8pt, font=\\tiny}]",
    ]
    for y, parts in figure.levels:
        lines.append(f"  \\node[anchor=east, inner sep=1.5pt] at ({_c(figure.level_x)},{_c(-y)}) {{${math_of(parts)}$}};")
    for node in figure.nodes:
        weight = "\\boldmath" if node.lit else ""
        count = f"{{{small}{weight}${math_of(node.multiplicity)}$}}"  # grouped: \boldmath must not leak past the line
        if node.young is not None:
            _young(node, lines)
            tall = max(len(node.young) * node.box, 0.3)
            lines.append(f"  \\node[inner sep=1pt, minimum width={_c(node.width)}cm, minimum height={_c(tall)}cm] "
                         f"({node.name}) at ({_c(node.x)},{_c(-node.y)}) {{}};")
            lines.append(f"  \\node[anchor=north, inner sep=1pt] at ({node.name}.south) {{{count}}};")
        else:
            frame = ", draw, line width=1pt, rounded corners=1pt" if node.lit else ""
            lines.append(f"  \\node[inner sep=1.5pt{frame}] ({node.name}) at ({_c(node.x)},{_c(-node.y)}) "
                         f"{{${math_of(node.parts)}$\\\\[-2pt]{count}}};")
    for edge in figure.edges:
        style = "lit" if edge.lit else ("dim" if figure.highlighted else "edge")
        label = f" node[midway, count] {{{edge.count}}}" if edge.count > 1 else ""
        lines.append(f"  \\draw[{style}] ({edge.start.name}) --{label} ({edge.end.name});")
    if legend:
        lines.append(f"  \\node[anchor=north west, inner sep=0pt, text width={max(figure.width, 2):.2f}cm, align=left, "
                     f"font=\\scriptsize] at ({_c(figure.left)},{_c(-figure.bottom - 0.2)}) {{{tex_escape_math(figure.legend)}}};")
    lines.append("\\end{tikzpicture}")
    return "\n".join(lines) + "\n"


def tex_escape_math(text: str) -> str:
    """Legend text: escaped, with ``V^{⊗k}`` set in math mode."""
    return tex_escape(text.replace("V^{⊗k}", "\0")).replace("\0", "$V^{\\otimes k}$")


def to_tikz(diagram: Diagram, upto: int, options: FigureOptions | None = None) -> str:
    options = options or FigureOptions()
    return figure_to_tikz(build_figure(diagram, upto, options), legend=options.legend)
