"""``towerscope export SPEC --to K --format F -o FILE``: DOT, CSV, JSON (and TikZ) files."""

from __future__ import annotations

import argparse
import sys

from tui.cli_support import DelayedProgress, level_index, open_diagram

FORMATS = ("dot", "csv", "json", "tikz", "latex")


def add_commands(sub: argparse._SubParsersAction) -> None:
    p = sub.add_parser("export", help="write levels 0..K as Graphviz DOT, CSV, JSON, a TikZ picture or a LaTeX table")
    p.add_argument("spec", help="a tower spec, e.g. symmetric:n=4")
    p.add_argument("--to", required=True, metavar="K", help="the last level")
    p.add_argument("--format", required=True, choices=FORMATS, help="the file format")
    p.add_argument("-o", "--output", required=True, metavar="FILE", help="the file to write ('-' for stdout)")
    p.set_defaults(handler=run)


def render(diagram, upto: int, fmt: str) -> str:
    if fmt == "dot":
        from engine.export.dot import to_dot

        return to_dot(diagram, upto)
    if fmt == "csv":
        from engine.export.csv_levels import to_csv

        return to_csv(diagram, upto)
    if fmt == "latex":
        from engine.export.latex_table import to_latex_table

        return to_latex_table(diagram, upto)
    if fmt == "tikz":
        from engine.export.tikz import to_tikz

        return to_tikz(diagram, upto)
    import json

    from engine.export.documents import levels_document

    return json.dumps(levels_document(diagram, upto), ensure_ascii=False, indent=1) + "\n"


def run(args: argparse.Namespace) -> int:
    from engine.files.atomic import write_text_atomic

    diagram = open_diagram(args.spec)
    upto = level_index(diagram.tower, args.to)
    diagram.check_size(upto)
    DelayedProgress(f"building {diagram.tower.spec}").run(lambda bar: diagram.ensure(upto, progress=bar))
    text = render(diagram, upto, args.format)
    if args.output == "-":
        sys.stdout.write(text)
    else:
        path = write_text_atomic(args.output, text)
        print(f"wrote {path} ({args.format}, levels 0..{args.to})", file=sys.stderr)
    return 0
