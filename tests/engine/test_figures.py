"""Figures for papers and talks: TikZ (structure always; pdflatex where installed) and SVG (parsed as
XML, rendered to PNG by cairosvg), the crossing-reducing node order, the width option, Young
diagrams, highlighted paths, readable names."""

from __future__ import annotations

import re
import shutil
import struct
import subprocess
import xml.etree.ElementTree as ET

import networkx as nx
import pytest

from engine.diagram import Diagram
from engine.errors import UserError
from engine.export.figure import FigureOptions, build_figure, name_parts, parse_width
from engine.export.layout import crossings_between, lay_out
from engine.export.svg import to_svg
from engine.export.tikz import to_tikz
from engine.specs import parse_spec

S6 = "symmetric:n=6"
S6_TO_4 = 8  # level 4 is index 8 (half levels between)
SVG_NS = "{http://www.w3.org/2000/svg}"


def _diagram(spec: str) -> Diagram:
    return Diagram(parse_spec(spec))


def _segments_cross(p1, p2, q1, q2) -> bool:
    """Proper crossing of two segments by orientation signs (common practice in computational
    geometry); segments sharing an end do not cross."""
    def orient(a, b, c):
        v = (b[0] - a[0]) * (c[1] - a[1]) - (b[1] - a[1]) * (c[0] - a[0])
        return (v > 1e-12) - (v < -1e-12)
    if {p1, p2} & {q1, q2}:
        return False
    return orient(p1, p2, q1) * orient(p1, p2, q2) < 0 and orient(q1, q2, p1) * orient(q1, q2, p2) < 0


def _geometric_crossings(figure) -> int:
    by_row: dict[float, list] = {}
    for e in figure.edges:
        by_row.setdefault(e.start.y, []).append(((e.start.x, e.start.y), (e.end.x, e.end.y)))
    count = 0
    for segments in by_row.values():
        for i, (a, b) in enumerate(segments):
            count += sum(_segments_cross(a, b, c, d) for c, d in segments[i + 1:])
    return count


def test_crossings_of_s6_to_level_4_no_more_than_the_plain_order():
    d = _diagram(S6)
    plain, better = lay_out(d, S6_TO_4, "plain"), lay_out(d, S6_TO_4, "barycentre")
    # the plain order of S_6 to level 4 has 14 crossings, and 14 is the fewest possible: the sum over
    # consecutive rows of each pair's own exact minimum (bench/bench_figures.py, an exhaustive
    # search; a lower bound for any order of the whole figure) is 14
    assert (plain.crossings, better.crossings) == (14, 14)
    # the count agrees with segments crossing in the drawn figure (orientation test, common practice)
    for order in ("plain", "barycentre"):
        figure = build_figure(d, S6_TO_4, FigureOptions(order=order))
        assert _geometric_crossings(figure) == figure.layout.crossings


@pytest.mark.parametrize("spec, upto, plain, better", [
    ("orthogonal:n=3", 5, 24, 17),  # Brauer B_k(3) tower to level 5 (counts of this layout, hand-checked)
    ("su2:kind=icosahedral", 8, 2, 0),  # affine E_8 unrolled: a tree-like strip, drawable without crossings
])
def test_barycentre_order_removes_crossings(spec, upto, plain, better):
    d = _diagram(spec)
    figure = build_figure(d, upto, FigureOptions())
    assert (figure.layout.plain_crossings, figure.layout.crossings) == (plain, better)
    assert _geometric_crossings(figure) == better


def test_crossings_between_two_rows():
    # two rows a b / x y with a-y and b-x cross once; a-x and b-y do not (hand computation)
    assert crossings_between(["a", "b"], ["x", "y"], [("a", "y", 1), ("b", "x", 1)]) == 1
    assert crossings_between(["a", "b"], ["x", "y"], [("a", "x", 1), ("b", "y", 1)]) == 0


def test_tikz_structure():
    d = _diagram(S6)
    text = to_tikz(d, S6_TO_4)
    assert text.count("\\begin{tikzpicture}") == text.count("\\end{tikzpicture}") == 1
    assert text.count("{") == text.count("}")
    nodes = re.findall(r"\\node\[[^]]*\] \((n\d+x\d+)\) at \(([-\d.]+),([-\d.]+)\) \{\$([^$]*)\$", text)
    assert len(nodes) == sum(len(d.level(i)) for i in range(S6_TO_4 + 1))
    assert all(label.startswith("(") for *_, label in nodes)  # partitions in math mode
    assert "$k = 3\\frac{1}{2}$" in text
    assert "% node order: barycentre; 14 edge crossings (plain order: 14)" in text
    assert "multiplicity below it" in text  # the caption says what the numbers are
    colours = set(re.findall(r"(?<![A-Za-z])(black|gray|white|red|blue|green|orange|cyan|magenta|yellow|violet)"
                             r"(?![A-Za-z])", text.split("\\begin{tikzpicture}")[1]))
    assert colours <= {"black", "gray", "white"}  # grayscale-safe: thickness marks the highlight


def test_tikz_names_of_su2_and_character_towers_are_not_internal():
    text = to_tikz(_diagram("su2:kind=octahedral"), 4)
    assert ":" not in "".join(re.findall(r"\{\$([^$]*)\$\\\\", text))
    assert "$\\mathbf{1}$" in text  # the trivial module as a bold 1 (common practice)
    assert "a_{2}" in text
    # the built-in dihedral table's irreducibles r1, r2 as r with a subscript
    text = to_tikz(_diagram("characters:group=dihedral(5),module=r1"), 3)
    names = "".join(re.findall(r"\{\$([^$]*)\$\\\\", text))
    assert "r_{1}" in names and "r1" not in names


def test_name_parts():
    assert name_parts("()") == [("∅", "text")]
    assert name_parts("(2,2)+") == [("(2,2)", "text"), ("+", "sup")]
    assert name_parts("a4:2") == [("a", "text"), ("4", "sub")]
    assert name_parts("trivial") == [("1", "bold")]


def test_young_diagrams_have_one_box_per_cell():
    d = _diagram("symmetric:n=4")
    text = to_tikz(d, 4, FigureOptions(young=True))
    boxes = len(re.findall(r"\\draw\[line width=[\d.]+pt\] \([^)]*\) rectangle", text))
    assert boxes == sum(sum(node) for i in range(5) for node in d.level(i))


def test_width_option_fits():
    d = _diagram(S6)
    natural = build_figure(d, S6_TO_4, FigureOptions())
    assert natural.width > 12  # about 17 cm at full size
    for young in (False, True):
        figure = build_figure(d, S6_TO_4, FigureOptions(width_cm=parse_width("12cm"), young=young))
        assert figure.width <= 12.0 + 1e-9
        text = to_tikz(d, S6_TO_4, FigureOptions(width_cm=12.0, young=young))
        xs = [float(x) for x in re.findall(r"at \(([-\d.]+),", text)]
        assert min(xs) >= figure.left - 1e-3 and max(xs) <= figure.right + 1e-3
        svg = ET.fromstring(to_svg(d, S6_TO_4, FigureOptions(width_cm=12.0, young=young)).split("\n", 1)[1])
        assert float(svg.get("width").removesuffix("cm")) <= 12.2 + 1e-9  # 1 mm margins


def test_width_option_errors():
    assert parse_width("120mm") == pytest.approx(12.0)
    for bad in ("12", "wide", "0.5cm"):
        with pytest.raises(UserError):
            parse_width(bad)


def test_highlight_lights_exactly_the_paths_to_the_node():
    d = _diagram("symmetric:n=4")
    figure = build_figure(d, 6, FigureOptions(highlight="(2,1,1)@3"))
    graph = nx.DiGraph()
    for i in range(6):
        for a in d.level(i):
            for b, _ in d.children(i, a):
                graph.add_edge((i, a), (i + 1, b))
    ancestors = nx.ancestors(graph, (6, (2, 1, 1))) | {(6, (2, 1, 1))}  # networkx
    lit = {(e.start.name, e.end.name) for e in figure.edges if e.lit}
    names = {(i, n): f"n{i}x{figure.layout.slots[(i, n)]}" for i, row in enumerate(figure.layout.rows) for n in row}
    expected = {(names[a], names[b]) for a, b in graph.edges if a in ancestors and b in ancestors}
    assert lit == expected
    with pytest.raises(UserError):
        build_figure(d, 6, FigureOptions(highlight="(2,1,1)"))
    with pytest.raises(UserError):
        build_figure(d, 2, FigureOptions(highlight="(2,1,1)@3"))


def test_svg_parses_and_renders_to_png(tmp_path):
    import cairosvg

    d = _diagram(S6)
    for options in (FigureOptions(), FigureOptions(young=True, width_cm=12.0, highlight="(3,2,1)@4")):
        text = to_svg(d, S6_TO_4, options)
        root = ET.fromstring(text.split("\n", 1)[1])  # XML (the standard library's parser)
        assert root.tag == SVG_NS + "svg"
        texts = ["".join(t.itertext()) for t in root.iter(SVG_NS + "text")]
        assert "(3,2,1)" in texts or options.young
        png = cairosvg.svg2png(bytestring=text.encode(), output_width=900)
        assert png[:8] == b"\x89PNG\r\n\x1a\n"  # the PNG signature (PNG specification)
        width, height = struct.unpack(">II", png[16:24])  # IHDR width and height
        ratio = float(root.get("height").removesuffix("cm")) / float(root.get("width").removesuffix("cm"))
        assert width == 900 and abs(height - 900 * ratio) <= 1  # the picture's own proportions


def test_export_command_writes_svg_and_reports_crossings(tmp_path, capsys):
    from tui.cli.main import main

    target = tmp_path / "s6.svg"
    assert main(["export", S6, "--to", "4", "-o", str(target), "--young", "--width", "12cm"]) == 0
    assert target.read_text().startswith("<?xml")
    assert "14 edge crossings (the plain order has 14)" in capsys.readouterr().err
    assert main(["export", S6, "--to", "4", "-o", str(tmp_path / "s6.csv"), "--young"]) == 2


#: every picture in one article (the classes every TeX installation has), each measured in a box whose
#: width pdflatex writes to its log (TeX's \wd, in pt: 72.27 pt = 1 in, the TeXbook)
DOCUMENT = ("\\documentclass{article}\n\\usepackage{tikz}\n"
            "\\usepackage[margin=1cm,paperwidth=40cm,paperheight=80cm]{geometry}\n"
            "\\newsavebox\\towerfig\n\\begin{document}\n%s\\end{document}\n")
MEASURED = "\\savebox\\towerfig{%s}\n\\typeout{FIGURE %d WIDTH=\\the\\wd\\towerfig}\n\\usebox\\towerfig\n\\newpage\n"

COMPILED = [  # (spec, last level, options): names of every kind, Young diagrams, highlight, widths, legends
    (S6, "4", FigureOptions(width_cm=12.0)),
    (S6, "4", FigureOptions(width_cm=12.0, young=True, highlight="(3,2,1)@4")),
    (S6, "4", FigureOptions(width_cm=8.0, order="plain", legend=False)),
    ("su2:kind=icosahedral", "8", FigureOptions(young=True, highlight="o:6@5")),  # a_4, the bold 1
    ("su2:kind=binary-dihedral,m=3", "5", FigureOptions(width_cm=5.0)),
    ("characters:group=dihedral(5),module=r1", "5", FigureOptions()),  # r_1, e
    ("characters:file=sessions/examples/a4-points.toml", "3", FigureOptions(young=True)),
    ("alternating:n=4", "3", FigureOptions(young=True)),  # (2,1,1)^+ and its sign
    ("mixed:n=3,word=vdvd", "4", FigureOptions(young=True)),  # pairs of partitions
    ("symmetric:n=4,halves=no", "4", FigureOptions(young=True, width_cm=5.0)),
    ("symmetric:n=5", "12", FigureOptions(width_cm=12.0)),  # multiplicities m·10^e
]


@pytest.mark.skipif(shutil.which("pdflatex") is None, reason="pdflatex is not installed: the TikZ pictures "
                    "are checked for structure only")
def test_tikz_compiles_and_fits_the_width_asked_for(tmp_path):
    from engine.levels import parse_level

    pictures = []
    for spec, last, options in COMPILED:
        d = _diagram(spec)
        upto = d.tower.index_of(parse_level(last))
        pictures.append(MEASURED % (to_tikz(d, upto, options), len(pictures)))
    (tmp_path / "f.tex").write_text(DOCUMENT % "".join(pictures))
    run = subprocess.run(["pdflatex", "-interaction=nonstopmode", "-halt-on-error", "f.tex"], cwd=tmp_path,
                         capture_output=True, text=True, timeout=300)
    assert run.returncode == 0, run.stdout[-3000:]
    widths = {int(i): float(w) * 2.54 / 72.27 for i, w in re.findall(r"FIGURE (\d+) WIDTH=([\d.]+)pt", run.stdout)}
    assert sorted(widths) == list(range(len(COMPILED)))
    for i, (spec, last, options) in enumerate(COMPILED):
        if options.width_cm is not None:
            assert widths[i] <= options.width_cm, (spec, options, widths[i])
    assert widths[0] > 11.0  # the width is used, not only respected


@pytest.mark.skipif(shutil.which("pdflatex") is None, reason="pdflatex is not installed: the TikZ pictures "
                    "are checked for structure only")
def test_exported_tikz_file_inputs_into_a_document_at_12cm(tmp_path, capsys):
    # the README's use: export to a .tikz file, \input it in a document that loads tikz
    from tui.cli.main import main

    assert main(["export", S6, "--to", "4", "-o", str(tmp_path / "s6.tikz"), "--width", "12cm"]) == 0
    (tmp_path / "f.tex").write_text(DOCUMENT % (MEASURED % ("\\input{s6.tikz}", 0)))
    run = subprocess.run(["pdflatex", "-interaction=nonstopmode", "-halt-on-error", "f.tex"], cwd=tmp_path,
                         capture_output=True, text=True, timeout=120)
    assert run.returncode == 0, run.stdout[-3000:]
    width = float(re.search(r"FIGURE 0 WIDTH=([\d.]+)pt", run.stdout).group(1)) * 2.54 / 72.27
    assert 11.0 < width <= 12.0


def test_crossings_between_agrees_with_counting_every_pair():
    import random

    rng = random.Random(7)
    for _ in range(50):
        top, bottom = list(range(rng.randint(1, 8))), [f"b{j}" for j in range(rng.randint(1, 8))]
        edges = list({(rng.choice(top), rng.choice(bottom), 1) for _ in range(rng.randint(0, 20))})
        # the definition, pair by pair (common practice): ends in opposite orders on both rows
        where = {b: j for j, b in enumerate(bottom)}
        brute = sum(1 for i, (a1, b1, _) in enumerate(edges) for a2, b2, _ in edges[i + 1:]
                    if (a1 - a2) * (where[b1] - where[b2]) < 0)
        assert crossings_between(top, bottom, edges) == brute


@pytest.mark.skipif(shutil.which("pdflatex") is None, reason="pdflatex is not installed")
def test_latex_table_fits_a_12cm_line_with_nothing_overfull(tmp_path):
    # LaTeX itself says when a line or a cell is too wide: "Overfull \hbox" in its log (common
    # practice); each table set as \input would set it, in a 12 cm text block
    from engine.export.latex_table import to_latex_table
    from engine.levels import parse_level

    tables = [to_latex_table(_diagram(spec), _diagram(spec).tower.index_of(parse_level(last)))
              for spec, last in ((S6, "4"), ("symmetric:n=4", "3"), ("su2:kind=icosahedral", "8"))]
    (tmp_path / "t.tex").write_text(
        "\\documentclass{article}\n\\usepackage{booktabs,tabularx}\n"
        "\\usepackage[textwidth=12cm,paperwidth=20cm,paperheight=40cm]{geometry}\n\\begin{document}\n"
        + "\n\\bigskip\n".join(tables) + "\\end{document}\n")
    run = subprocess.run(["pdflatex", "-interaction=nonstopmode", "-halt-on-error", "t.tex"], cwd=tmp_path,
                         capture_output=True, text=True, timeout=120)
    assert run.returncode == 0, run.stdout[-3000:]
    log = (tmp_path / "t.log").read_text(errors="replace")
    assert "Overfull \\hbox" not in log, re.findall(r"Overfull[^\n]*", log)
