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
    rank_title = "rank" if x is None else f"rank at {x}"
    table = [("cell", "dimension", rank_title, "node", "multiplicity", "agree")]
    for row in document["cells"]:
        table.append((row["label"], str(row["dimension"]), str(row["rank"]), row["node"] or "-",
                      str(row["multiplicity"]) if row["node"] else "-", row["agree"]))
    for node in document["unmatched_nodes"]:
        table.append(("-", "-", "-", node["label"], str(node["multiplicity"]), "no cell"))
    widths = [max(len(r[c]) for r in table) for c in range(6)]
    for n, row in enumerate(table):
        lines.append("  ".join(cell.ljust(widths[c]) if c in (0, 3, 5) else cell.rjust(widths[c])
                               for c, cell in enumerate(row)).rstrip())
        if n == 0:
            lines.append("  ".join("-" * w for w in widths))
    killed = [row["label"] for row in document["cells"] if row["agree"] == "not a node" and row["rank"]]
    if killed:
        lines.append(f"cells with a simple module that V^⊗k does not see (no node here): {', '.join(killed)}")
    lines.append("the ranks agree with the tower's multiplicities on every node" if report.agree
                 else "the ranks DISAGREE with the tower somewhere (see the rows marked no)")
    from tui.cli.fit import wrap_words

    sys.stdout.write("".join(wrap_words(line) for line in lines))  # broken only at spaces
    return 0
