"""``towerscope export SPEC --to K [--format F] -o FILE``: TikZ or SVG picture, LaTeX table, DOT, CSV
or JSON; the pictures take ``--young``, ``--width``, ``--order``, ``--highlight``, ``--no-legend``."""

from __future__ import annotations

import argparse
import sys

from tui.cli.support import build_levels, level_index, open_diagram

FORMATS = ("tikz", "svg", "latex", "dot", "csv", "json")  # engine.export.FORMATS, kept literal for a quick --help


def add_commands(sub: argparse._SubParsersAction) -> None:
    p = sub.add_parser("export", help="write levels 0..K as a TikZ or SVG picture, a LaTeX table, Graphviz DOT, CSV or JSON")
    p.add_argument("spec", help="a tower spec, e.g. symmetric:n=4")
    p.add_argument("--to", required=True, metavar="K", help="the last level")
    p.add_argument("--format", choices=FORMATS, help="the file format (default: from the extension of FILE: "
                   ".tikz, .svg, .tex for the LaTeX table, .dot, .csv, .json)")
    p.add_argument("-o", "--output", required=True, metavar="FILE", help="the file to write ('-' for stdout)")
    fig = p.add_argument_group("pictures (.tikz and .svg)")
    fig.add_argument("--young", action="store_true", help="draw partitions as Young diagrams")
    fig.add_argument("--width", metavar="LENGTH", help="fit the picture to this width, e.g. 12cm, 120mm, 4.5in")
    fig.add_argument("--order", choices=("barycentre", "plain"), default="barycentre",
                     help="node order in each level: reduce edge crossings by the barycentre heuristic "
                     "(default), or the tower's own order; the crossings are reported either way")
    fig.add_argument("--highlight", metavar="LABEL@LEVEL", help="draw the paths from the root to one node "
                     "thick, e.g. '(3,1)@3'")
    fig.add_argument("--no-legend", action="store_true", help="leave out the caption text under the picture")
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
    diagram.check_size(upto, printed=True)
    build_levels(diagram, upto)
    options = None
    if fmt in ("tikz", "svg"):
        from engine.export.figure import FigureOptions, parse_width

        options = FigureOptions(young=args.young, width_cm=None if args.width is None else parse_width(args.width),
                                order=args.order, highlight=args.highlight, legend=not args.no_legend)
        from engine.export.layout import lay_out

        layout = lay_out(diagram, upto, args.order)
        print(f"node order {args.order}: {layout.crossings} edge crossings "
              f"(the plain order has {layout.plain_crossings})", file=sys.stderr)
    elif args.young or args.width or args.highlight or args.no_legend:
        raise UserError("--young, --width, --highlight and --no-legend are for pictures (.tikz, .svg)")
    if fmt in ("json", "csv"):  # streamed level by level (engine.export.write), never held whole
        from engine.export import write
        from engine.files.atomic import open_atomic

        if args.output == "-":
            write(diagram, upto, fmt, sys.stdout)
        else:
            with open_atomic(args.output) as (handle, path):
                write(diagram, upto, fmt, handle)
            print(f"wrote {path} ({fmt}, levels 0..{args.to})", file=sys.stderr)
        return 0
    text = render(diagram, upto, fmt, options)
    if args.output == "-":
        sys.stdout.write(text)
    else:
        path = write_text_atomic(args.output, text)
        print(f"wrote {path} ({fmt}, levels 0..{args.to})", file=sys.stderr)
    return 0
