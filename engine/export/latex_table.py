"""A LaTeX table of levels 0..K for papers: one row per level listing its nodes with their
multiplicities (the dimensions of the centralizer's irreducible modules), then Σm² (the dimension
of the centralizer) and, where the tower knows it, the dimension of the diagram algebra.
Plain ``tabular`` with ``booktabs`` rules (the booktabs package documentation)."""

from __future__ import annotations

from engine.diagram import Diagram
from engine.export.tikz import level_tex, tex_escape
from engine.levels import format_level


def to_latex_table(diagram: Diagram, upto: int) -> str:
    tower = diagram.tower
    diagram.ensure(upto)
    generic = diagram.algebra(0) is not None
    columns = "r p{0.62\\linewidth} r" + (" r" if generic else "")
    head = "$k$ & decomposition (multiplicity $\\times$ irreducible module) & $\\sum m^2$" + (" & algebra" if generic else "")
    lines = [
        f"% levels 0 to {format_level(tower.level_of(upto))} of {tex_escape(tower.spec)}; needs \\usepackage{{booktabs}}",
        f"\\begin{{tabular}}{{{columns}}}",
        "\\toprule",
        head + " \\\\",
        "\\midrule",
    ]
    for index in range(upto + 1):
        level = diagram.level(index)
        sums = diagram.sums(index)
        cells = " + ".join(
            (f"{level[node]}\\," if level[node] > 1 else "") + tex_escape(tower.format(node)) for node in diagram.nodes(index)
        )
        row = f"${level_tex(tower.level_of(index))}$ & {cells} & {sums.squares}"
        if generic:
            row += f" & {sums.generic_dimension}"
        lines.append(row + " \\\\")
    lines += ["\\bottomrule", "\\end{tabular}"]
    return "\n".join(lines) + "\n"
