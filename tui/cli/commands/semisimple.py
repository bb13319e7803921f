"""``towerscope semisimple SPEC --level L``: where the level's diagram algebra is not semisimple, and
at x = N every cell module's Gram rank beside the multiplicity of the tower's node it belongs to."""

from __future__ import annotations

import argparse
import sys

from tui.cli.support import DelayedProgress, level_index, open_diagram, print_json


def add_commands(sub: argparse._SubParsersAction) -> None:
    p = sub.add_parser(
        "semisimple",
        help="the parameters where the level's diagram algebra is not semisimple; cell ranks at N against the tower",
        description="For the diagram algebra at level L: the parameters x where some cell module's Gram "
        "determinant vanishes (there the algebra is not semisimple), and at the spec's parameter a table of "
        "the cell modules with their dimension, the rank of the Gram matrix (the simple module's dimension), "
        "the tower's node it belongs to and that node's multiplicity, which must agree.",
    )
    p.add_argument("spec", help="a tower spec with a diagram algebra, e.g. symmetric:n=3")
    p.add_argument("--level", required=True, metavar="L", help="the level (4, 2.5, 5/2, 2+1/2)")
    p.add_argument("--json", action="store_true", help="one JSON object")
    p.set_defaults(handler=run)


def run(args: argparse.Namespace) -> int:
    from engine.algebras.cells.report import level_report
    from engine.capabilities import DiagramAlgebra, require
    from engine.export.cell_documents import polynomial_text, report_document

    diagram = open_diagram(args.spec)
    tower = diagram.tower
    index = level_index(tower, args.level)
    level = require(tower, DiagramAlgebra).at(index)
    nodes = diagram.level_at(index)
    bar = DelayedProgress(f"Gram determinants of {level.name}")
    try:
        report = level_report(level, nodes, tower.format, progress=bar)
    finally:
        bar.close()
    if args.json:
        print_json(report_document(tower.spec, report))
        return 0
    document = report_document(tower.spec, report)
    x = level.parameter
    lines = [f"{level.name} at level {args.level} of {tower.spec}"]
    where = ", ".join(str(v) for v in document["not_semisimple_at"]) or "no rational x"
    lines.append(f"not semisimple at x = {where}")
    for factor in document["other_factors"]:
        lines.append(f"  and at the roots of {polynomial_text(factor)}")
    if x is None:
        lines.append("semisimple (CS_k has no parameter; Maschke's theorem)")
    else:
        lines.append(f"at x = {x}: {'semisimple' if report.semisimple_at_parameter else 'not semisimple'}")
    lines.append(f"labels: {report.note}")
    from tui.cli.fit import Column, Table, output_width
    from tui.cli.folding import wrap_words

    rank_title = "rank" if x is None else f"rank at {x}"
    table = Table([Column("cell", key=True), Column("dimension", "right"), Column(rank_title, "right"),
                   Column("node"), Column("multiplicity", "right"), Column("agree")])
    for row in document["cells"]:
        table.add_row(row["label"], row["dimension"], row["rank"], row["node"] or "-",
                      row["multiplicity"] if row["node"] else "-", row["agree"])
    for node in document["unmatched_nodes"]:
        table.add_row("-", "-", "-", node["label"], node["multiplicity"], "no cell")
    width = output_width()
    head = "".join(wrap_words(line, width) for line in lines)  # broken only at spaces
    lines = []
    killed = [row["label"] for row in document["cells"] if row["agree"] == "not a node" and row["rank"]]
    if killed:
        lines.append(f"cells with a simple module that V^⊗k does not see (no node here): {', '.join(killed)}")
    lines.append("the ranks agree with the tower's multiplicities on every node" if report.agree
                 else "the ranks DISAGREE with the tower somewhere (see the rows marked no)")
    sys.stdout.write(head + table.render(width) + "".join(wrap_words(line, width) for line in lines))
    return 0
