"""``towerscope levels SPEC --to K``: every node of levels 0..K with multiplicity and dimension."""

from __future__ import annotations

import argparse
import sys

from tui.cli_support import build_levels, level_index, open_diagram, print_json


def add_commands(sub: argparse._SubParsersAction) -> None:
    p = sub.add_parser(
        "levels",
        help="the nodes of levels 0..K with multiplicities, dimensions and level sums",
        description="Print levels 0..K of a tower (half levels too where it has them): each node with its "
        "multiplicity (number of paths; dimension of the centralizer's irreducible module) and the "
        "dimension of the group's irreducible module, and the level sums Σm, Σm², Σm·dim.",
    )
    p.add_argument("spec", help="a tower spec, e.g. symmetric:n=4 (see `towerscope families`)")
    p.add_argument("--to", required=True, metavar="K", help="the last level (3, 2.5, 5/2, 2+1/2)")
    out = p.add_mutually_exclusive_group()
    out.add_argument("--json", action="store_true", help="one JSON object (see the CLI contract)")
    out.add_argument("--csv", action="store_true", help="CSV: level,label,multiplicity,dimension")
    p.add_argument("--sums-only", action="store_true", help="print only the table of level sums")
    p.set_defaults(handler=run)


def run(args: argparse.Namespace) -> int:
    diagram = open_diagram(args.spec)
    upto = level_index(diagram.tower, args.to)
    build_levels(diagram, upto)
    if args.json:
        from engine.export.documents import levels_document

        print_json(levels_document(diagram, upto))
    elif args.csv:
        from engine.export.csv_levels import to_csv

        sys.stdout.write(to_csv(diagram, upto))
    else:
        from tui.tables import print_levels

        print_levels(diagram, upto, nodes=not args.sums_only)
    return 0
