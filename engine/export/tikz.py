"""A TikZ picture of a Bratteli diagram, for papers and slides (TikZ/PGF manual, ch. "Nodes and
Edges").  Levels run down the page; each node shows its label and, below it, its multiplicity;
edges with a count above 1 carry that count.  The output is a ``tikzpicture`` environment to
``\\input`` into a document that loads ``tikz``.
"""

from __future__ import annotations

from fractions import Fraction

from engine.diagram import Diagram
from engine.levels import format_level

_ESCAPES = {"\\": r"\textbackslash{}", "{": r"\{", "}": r"\}", "_": r"\_", "^": r"\^{}", "&": r"\&",
            "%": r"\%", "$": r"\$", "#": r"\#", "~": r"\~{}"}


def tex_escape(text: str) -> str:
    """Text set verbatim in LaTeX: its special characters escaped."""
    return "".join(_ESCAPES.get(ch, ch) for ch in text)


def level_tex(level: Fraction) -> str:
    """``2`` or ``2\\frac{1}{2}`` (math mode; plain LaTeX)."""
    whole, rest = divmod(level, 1)
    if rest == 0:
        return str(int(whole))
    return f"{int(whole) or ''}\\frac{{{rest.numerator}}}{{{rest.denominator}}}"


def to_tikz(diagram: Diagram, upto: int, x_step: float = 1.6, y_step: float = 1.5) -> str:
    tower = diagram.tower
    diagram.ensure(upto)
    lines = [
        f"% Bratteli diagram of {tex_escape(tower.spec)}, levels 0 to {format_level(tower.level_of(upto))}",
        "\\begin{tikzpicture}[every node/.style={font=\\small, align=center}]",
    ]
    names: dict[tuple[int, object], str] = {}
    widest = max(len(diagram.level(i)) for i in range(upto + 1))
    label_x = -((widest - 1) / 2 + 0.8) * x_step  # left of the widest level
    for index in range(upto + 1):
        level = diagram.level(index)
        nodes = diagram.nodes(index)
        y = -index * y_step
        lines.append(f"  \\node[anchor=east] at ({label_x:.2f},{y:.2f}) {{$k={level_tex(tower.level_of(index))}$}};")
        offset = (len(nodes) - 1) / 2
        for k, node in enumerate(nodes):
            name = f"n{index}x{k}"
            names[(index, node)] = name
            x = (k - offset) * x_step
            lines.append(
                f"  \\node ({name}) at ({x:.2f},{y:.2f}) "
                f"{{{tex_escape(tower.format(node))}\\\\[-2pt]\\scriptsize {level[node]}}};"
            )
    for index in range(upto):
        for node in diagram.nodes(index):
            for child, e in diagram.children(index, node):
                label = f" node[midway, fill=white, inner sep=1pt] {{\\scriptsize {e}}}" if e > 1 else ""
                lines.append(f"  \\draw ({names[(index, node)]}) --{label} ({names[(index + 1, child)]});")
    lines.append("\\end{tikzpicture}")
    return "\n".join(lines) + "\n"
