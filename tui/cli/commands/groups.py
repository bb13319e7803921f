"""The ``check FILE`` and ``mckay SPEC`` commands (registered on the main parser by ``add_commands``).

``check`` validates a tensor-graph or character-table file and prints what it found; ``mckay``
prints the step matrices of any tower whose node sets are finite.  Rich tables by default,
``--json`` (and ``--csv`` for mckay) for scripts.  Bad input raises ``engine.errors.UserError``;
the caller prints its message and exits 2.  Neither sympy nor rich is imported at start-up.
"""

from __future__ import annotations

import argparse
import csv
import json
import sys
from pathlib import Path
from typing import TYPE_CHECKING, Any

from engine.errors import UserError

if TYPE_CHECKING:
    from engine.class_functions import CharacterTable


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
    from engine.mckay import step_matrices
    from engine.specs import parse_spec

    tower = parse_spec(args.spec)
    steps = step_matrices(tower)
    if args.json:
        out: dict[str, Any] = {"tower": tower.spec, "steps": steps}
        if len(steps) == 2:  # the two half steps compose to one whole step: ⊗ V
            a, b = steps[0]["matrix"], steps[1]["matrix"]
            out["whole_step"] = [[sum(a[i][t] * b[t][j] for t in range(len(b))) for j in range(len(b[0]))] for i in range(len(a))]
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
            _print_matrix(step, f"{tower.spec}: step {step['step']} ({step['from']} → {step['to']}, constant {step['constant']})")
    return 0


def _print_matrix(step: dict[str, Any], title: str) -> None:
    from tui.cli.support import console
    from rich.table import Table

    table = Table(title=title, title_justify="left")
    table.add_column("node (dim)")
    for label, d in zip(step["columns"], step["column_dimensions"]):
        table.add_column(f"{label} ({d})", justify="right")
    for label, d, row in zip(step["rows"], step["row_dimensions"], step["matrix"]):
        table.add_row(f"{label} ({d})", *[str(m) if m else "·" for m in row])
    console().print(table)


# ----- check ------------------------------------------------------------------------------------
def file_kind(path: str) -> str:
    """``graph`` or ``characters``, by suffix and by the ``format`` key of a TOML file."""
    from engine.files.character_table import FORMAT as TABLE_FORMAT
    from engine.files.tensor_graph import FORMAT as GRAPH_FORMAT, NETWORKX_SUFFIXES
    from engine.files.toml_checks import load_toml

    suffix = Path(path).suffix.lower()
    if suffix in NETWORKX_SUFFIXES:
        return "graph"
    if suffix != ".toml":
        raise UserError(f"{Path(path).name}: unknown file type {suffix!r} (accepted: .toml, .graphml, .gml)")
    fmt = load_toml(path).get("format")
    kinds = {GRAPH_FORMAT: "graph", TABLE_FORMAT: "characters"}
    if fmt not in kinds:
        raise UserError(f"{Path(path).name}: key 'format' is {fmt!r} (accepted: {GRAPH_FORMAT!r}, {TABLE_FORMAT!r})")
    return kinds[fmt]


def check_report(path: str) -> dict[str, Any]:
    """What a valid file holds, as plain data; UserError naming the first problem otherwise."""
    from engine.mckay import step_matrices

    if file_kind(path) == "graph":
        from engine.files.tensor_graph import read_tensor_graph
        from engine.matrix_tower import MatrixTower

        pattern, root, title = read_tensor_graph(path)
        tower = MatrixTower(f"graph:file={path}", "graph", pattern, root)
        return {"file": path, "kind": "tensor graph", "title": title, "root": root,
                "half_levels": len(pattern) == 2, "steps": step_matrices(tower)}
    from engine.class_functions import decompose, mckay_matrix
    from engine.families.characters import character_tower
    from engine.files.character_table import read_character_file

    data = read_character_file(path)
    t = data.table
    tower = character_tower(f"characters:file={path}", "characters", t, data.module, subgroup=data.subgroup)
    module = decompose(t, data.module, "V")
    report: dict[str, Any] = {
        "file": path, "kind": "character table", "group": t.name, "order": t.order,
        "classes": len(t.classes), "irreducibles": _irreducibles(t),
        "module_dimension": int(sum(m * d for m, d in zip(module, t.degrees()))),
        "module": {n: m for n, m in zip(t.names, module) if m},
        "mckay": [list(row) for row in mckay_matrix(t, data.module)],  # the whole step ⊗ V
        "steps": step_matrices(tower),
    }
    if data.subgroup is not None:
        s = data.subgroup.table
        report["subgroup"] = {"group": s.name, "order": s.order, "index": t.order // s.order,
                              "irreducibles": _irreducibles(s)}
    return report


def _irreducibles(table: CharacterTable) -> list[dict[str, Any]]:
    """Name and dimension of each irreducible character of a table."""
    return [{"name": n, "dimension": d} for n, d in zip(table.names, table.degrees())]


def run_check(args: argparse.Namespace) -> int:
    report = check_report(args.file)
    if args.json:
        print(json.dumps(report))
        return 0
    from tui.cli.support import console as make_console

    out = make_console()

    def say(text: str) -> None:
        out.print(text, markup=False)

    if report["kind"] == "tensor graph":
        say(f"{report['file']}: a valid tensor graph, {report['title']!r}; root {report['root']!r}; "
                      f"{'half levels' if report['half_levels'] else 'whole levels'}")
    else:
        irr = ", ".join(f"{x['name']} ({x['dimension']})" for x in report["irreducibles"])
        say(f"{report['file']}: a valid character table of {report['group']}, order {report['order']}, "
                      f"{report['classes']} classes")
        say(f"irreducibles: {irr}")
        parts = " + ".join(f"{m}·{n}" if m > 1 else n for n, m in report["module"].items())
        say(f"module V: dimension {report['module_dimension']} = {parts}")
        if "subgroup" in report:
            s = report["subgroup"]
            say(f"subgroup {s['group']}, order {s['order']}, index {s['index']}: half levels")
    for step in report["steps"]:
        _print_matrix(step, f"step {step['step']} ({step['from']} → {step['to']}, constant {step['constant']})")
    return 0
