"""The ``check FILE`` and ``mckay SPEC`` commands (registered on the main parser by ``add_commands``).

``check`` validates a tensor-graph or character-table file and prints what it found; ``mckay``
prints the step matrices of any tower whose node sets are finite.  Rich tables by default,
``--json`` (and ``--csv`` for mckay) for scripts.  Bad input raises ``engine.errors.UserError``;
the caller prints its message and exits 2.  Neither sympy nor rich is imported at start-up.
"""

from __future__ import annotations

import argparse
import sys
from typing import Any


def add_commands(subparsers: argparse._SubParsersAction) -> None:
    """Register ``check`` and ``mckay``; each sets ``handler`` to its handler (called with the args)."""
    check = subparsers.add_parser("check", help="validate a tensor-graph or character-table file and summarise it")
    check.add_argument("file", help="a .toml tensor graph or character table, or a .graphml / .gml tensor graph")
    check.add_argument("--json", action="store_true", help="print one JSON object")
    check.set_defaults(handler=run_check)
    mckay = subparsers.add_parser("mckay", help="print the McKay (step) matrices of a tower with finite node sets")
    mckay.add_argument("spec", help="a tower spec, e.g. su2:kind=tetrahedral")
    out = mckay.add_mutually_exclusive_group()
    out.add_argument("--json", action="store_true", help="print one JSON object")
    out.add_argument("--csv", action="store_true", help="print CSV: per step a header row (step name, column labels), then one row per node")
    mckay.set_defaults(handler=run_mckay)


# ----- mckay ------------------------------------------------------------------------------------
def run_mckay(args: argparse.Namespace) -> int:
    import csv
    import json

    from engine.export.group_documents import mckay_document
    from engine.specs import parse_spec

    tower = parse_spec(args.spec)
    out = mckay_document(tower)
    steps = out["steps"]
    if args.json:
        print(json.dumps(out))
    elif args.csv:
        writer = csv.writer(sys.stdout, lineterminator="\n")
        for k, step in enumerate(steps):
            if k:
                writer.writerow([])
            writer.writerow([step["step"]] + step["columns"])
            for label, row in zip(step["rows"], step["matrix"]):
                writer.writerow([label] + row)
    else:
        for step in steps:
            _print_matrix(step, f"{tower.spec}: step {step['step']} ({step['from']} → {step['to']}, Σ_j M_ij·dim_j = {step['constant']}·dim_i)")
    return 0


def _print_matrix(step: dict[str, Any], title: str) -> None:
    from tui.cli.fit import Column, Table
    from tui.cli.folding import wrap_words

    # fitted to the width: a wide matrix is split into column blocks that repeat the row names
    columns = [Column("node (dim)", key=True)]
    columns += [Column(f"{label} ({d})", "right") for label, d in zip(step["columns"], step["column_dimensions"])]
    table = Table(columns)
    for label, d, row in zip(step["rows"], step["row_dimensions"], step["matrix"]):
        table.add_row(f"{label} ({d})", *[m if m else "·" for m in row])
    sys.stdout.write(wrap_words(title) + table.render())


# ----- check ------------------------------------------------------------------------------------
def run_check(args: argparse.Namespace) -> int:
    import json

    from engine.export.group_documents import check_report

    report = check_report(args.file)
    if args.json:
        print(json.dumps(report))
        return 0
    from tui.cli.folding import wrap_words

    def say(text: str) -> None:
        sys.stdout.write(wrap_words(text))  # broken only at spaces

    if report["kind"] == "tensor graph":
        say(f"{report['file']}: a valid tensor graph, {report['title']!r}; root {report['root']!r}; "
                      f"{'half levels' if report['half_levels'] else 'whole levels'}")
    else:
        irr = ", ".join(f"{x['name']}\u00a0({x['dimension']})" for x in report["irreducibles"])  # name and dimension together
        say(f"{report['file']}: a valid character table of {report['group']}, order {report['order']}, "
                      f"{report['classes']}\u00a0classes")  # the count stays with its word
        say(f"irreducibles: {irr}")
        parts = " + ".join(f"{m}·{n}" if m > 1 else n for n, m in report["module"].items())
        say(f"module V: dimension {report['module_dimension']} = {parts}")
        if "subgroup" in report:
            s = report["subgroup"]
            say(f"subgroup {s['group']}, order {s['order']}, index {s['index']}: half levels")
    for step in report["steps"]:
        _print_matrix(step, f"step {step['step']} ({step['from']} → {step['to']}, Σ_j M_ij·dim_j = {step['constant']}·dim_i)")
    return 0
