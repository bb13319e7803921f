"""A LaTeX table of levels 0..K for papers: one row per level listing its nodes with their
multiplicities (the dimensions of the centralizer's irreducible modules), then Σm² (the dimension
of the centralizer) and, where the tower knows it, its diagram algebra and that algebra's dimension.
A ``tabularx`` as wide as the line (the tabularx package documentation), the decompositions in
its one stretching column, set ragged right and broken after a ``+``, with ``booktabs`` rules (the
booktabs package documentation); every head is a single short word or symbol so that no head is
hyphenated, and a comment above the table holds a caption saying what the columns are.
"""

from __future__ import annotations

from engine.diagram import Diagram
from engine.export.figure import name_parts
from engine.export.tikz import level_tex, math_of, tex_escape
from engine.levels import format_level


def _algebra_tex(name: str) -> str:
    """``P_{3+1/2}(4)`` as TeX: ``P_{3\\frac{1}{2}}(4)``; names are already in TeX's sub/superscript syntax."""
    return name.replace("{0+1/2}", "{\\frac{1}{2}}").replace("+1/2", "\\frac{1}{2}")


def to_latex_table(diagram: Diagram, upto: int) -> str:
    tower = diagram.tower
    diagram.ensure(upto)
    generic = diagram.algebra(0) is not None
    columns = "r >{\\raggedright\\arraybackslash}X r" + (" l r" if generic else "")
    head = "$k$ & $V^{\\otimes k}$ & $\\sum m^2$" + (" & algebra & $\\dim$" if generic else "")
    caption = ("Row k: the decomposition of V^{⊗k} into irreducible modules (multiplicity before each, "
               "the number of paths to the node), the sum of the squared multiplicities (the dimension "
               "of the centralizer)")
    caption += ", the diagram algebra and its dimension (equal to the sum while it acts faithfully)." if generic else "."
    lines = [
        f"% levels 0 to {format_level(tower.level_of(upto))} of {tex_escape(tower.spec)}; needs \\usepackage{{booktabs,tabularx}}",
        f"% caption: {caption}",
        "\\noindent",  # as wide as the line, so no paragraph indent before it (in a float or not)
        f"\\begin{{tabularx}}{{\\linewidth}}{{{columns}}}",
        "\\toprule",
        head + " \\\\",
        "\\midrule",
    ]
    for index in range(upto + 1):
        level = diagram.level(index)
        sums = diagram.sums(index)
        cells = " + ".join(
            (f"{level[node]}\\," if level[node] > 1 else "") + math_of(name_parts(tower.format(node), root=index == 0))
            for node in diagram.nodes(index)
        )
        row = f"${level_tex(tower.level_of(index))}$ & ${cells}$ & {sums.squares}"
        if generic:
            row += f" & ${_algebra_tex(diagram.algebra(index).name)}$ & {sums.generic_dimension}"
        lines.append(row + " \\\\")
    lines += ["\\bottomrule", "\\end{tabularx}"]
    return "\n".join(lines) + "\n"
