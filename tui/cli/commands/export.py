"""``towerscope export SPEC --to K [--format F] -o FILE``: TikZ, LaTeX table, DOT, CSV or JSON."""

from __future__ import annotations

import argparse
import sys

from tui.cli.support import build_levels, level_index, open_diagram

FORMATS = ("tikz", "latex", "dot", "csv", "json")  # engine.export.FORMATS, kept literal for a quick --help


def add_commands(sub: argparse._SubParsersAction) -> None:
    p = sub.add_parser("export", help="write levels 0..K as Graphviz DOT, CSV, JSON, a TikZ picture or a LaTeX table")
    p.add_argument("spec", help="a tower spec, e.g. symmetric:n=4")
    p.add_argument("--to", required=True, metavar="K", help="the last level")
    p.add_argument("--format", choices=FORMATS, help="the file format (default: from the extension of FILE: "
                   ".tikz, .tex for the LaTeX table, .dot, .csv, .json)")
    p.add_argument("-o", "--output", required=True, metavar="FILE", help="the file to write ('-' for stdout)")
    p.set_defaults(handler=run)


def run(args: argparse.Namespace) -> int:
    from engine.errors import UserError
    from engine.export import format_for_path, render
    from engine.files.atomic import write_text_atomic

    fmt = args.format
    if fmt is None:
        if args.output == "-":
            raise UserError("--format is needed when writing to stdout (-o -)")
        fmt = format_for_path(args.output)
    diagram = open_diagram(args.spec)
    upto = level_index(diagram.tower, args.to)
    build_levels(diagram, upto)
    text = render(diagram, upto, fmt)
    if args.output == "-":
        sys.stdout.write(text)
    else:
        path = write_text_atomic(args.output, text)
        print(f"wrote {path} ({fmt}, levels 0..{args.to})", file=sys.stderr)
    return 0
