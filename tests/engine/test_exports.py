"""Figures and tables for papers: the LaTeX table and the TikZ picture carry the diagram's numbers."""

import re

from engine.diagram import Diagram
from engine.export.latex_table import to_latex_table
from engine.export.tikz import to_tikz
from engine.specs import parse_spec


def test_latex_table_rows_are_the_decompositions():
    # S_3 on C^3, V⊗V = 2·(3) + 3·(2,1) + (1,1,1) (common practice); Σm² = 14 = B(4) − 1 = 15 − 1
    text = to_latex_table(Diagram(parse_spec("symmetric:n=3")), 4)
    assert "$2$ & $2\\,(3) + 3\\,(2,1) + (1,1,1)$ & 14 & $P_2(3)$ & 15 \\\\" in text
    assert "$1\\frac{1}{2}$ & $2\\,(2) + (1,1)$ & 5 & $P_{1\\frac{1}{2}}(3)$ & 5 \\\\" in text
    assert "$\\frac{1}{2}$ & $(2)$ & 1 & $P_{\\frac{1}{2}}(3)$ & 1 \\\\" in text
    assert text.count("\\\\") == 1 + 5  # header and one row per level


def test_latex_table_without_a_diagram_algebra():
    text = to_latex_table(Diagram(parse_spec("su2:kind=cyclic,m=3")), 3)
    assert "algebra" not in text and text.count("&") == 2 * (1 + 4)


def test_tikz_has_every_node_and_edge():
    d = Diagram(parse_spec("symmetric:n=4,halves=no"))
    text = to_tikz(d, 3)
    nodes = re.findall(r"\\node\[[^]]*\] \((n\d+x\d+)\)", text)
    assert len(nodes) == sum(len(d.level(i)) for i in range(4))
    edges = re.findall(r"\\draw\[\w+\] \((n\d+x\d+)\) --(?: node\[[^]]*\] \{(\d+)\})? \((n\d+x\d+)\);", text)
    assert len(edges) == sum(len(d.children(i, n)) for i in range(3) for n in d.level(i))
    # (3,1) -> (3,1) through (3) and (2,1): two edges, labelled 2
    assert any(count == "2" for _, count, _ in edges)


def test_format_from_the_file_name():
    import pytest

    from engine.errors import UserError
    from engine.export import FORMATS, format_for_path

    assert [format_for_path(f"x{ext}") for ext, _ in FORMATS.values()] == list(FORMATS)
    with pytest.raises(UserError, match=r"\.tikz"):
        format_for_path("figure.pdf")
