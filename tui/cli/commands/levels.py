"""``towerscope levels SPEC --to K [--from A] | --at L``: every node of the levels asked for, with
multiplicity and dimension, and the level sums."""

from __future__ import annotations

import argparse
import sys

from tui.cli.support import build_levels, level_index, open_diagram


def add_commands(sub: argparse._SubParsersAction) -> None:
    p = sub.add_parser(
        "levels",
        help="the nodes of levels 0..K with multiplicities, dimensions and level sums",
        description="Print levels 0..K of a tower (half levels too where it has them): each node with its "
        "multiplicity (number of paths; dimension of the centralizer's irreducible module) and the "
        "dimension of the group's irreducible module, and the level sums Σm, Σm², Σm·dim.",
    )
    p.add_argument("spec", help="a tower spec, e.g. symmetric:n=4 (see `towerscope families`)")
    p.add_argument("--to", metavar="K", help="the last level (3, 2.5, 5/2, 2+1/2)")
    p.add_argument("--from", dest="start", metavar="A", help="the first level (default 0); where the family "
                   "can jump (closed forms, matrix powers) the levels before it are not built")
    p.add_argument("--at", metavar="L", help="print the single level L (instead of --from/--to)")
    out = p.add_mutually_exclusive_group()
    out.add_argument("--json", action="store_true", help="one JSON object (see the CLI contract)")
    out.add_argument("--csv", action="store_true", help="CSV: level,label,multiplicity,dimension")
    p.add_argument("--sums-only", action="store_true", help="print only the table of level sums")
    p.add_argument("--exact", action="store_true", help="every digit of every number (by default a number "
                   "too wide for the screen is shortened, with its digit count)")
    p.set_defaults(handler=run)


def run(args: argparse.Namespace) -> int:
    from engine.errors import UserError

    diagram = open_diagram(args.spec)
    tower = diagram.tower
    if args.at is not None:
        if args.to is not None or args.start is not None:
            raise UserError("--at prints one level; give it without --from and --to")
        start = upto = level_index(tower, args.at)
    elif args.to is None:
        raise UserError("give --to K (the last level), or --at L for a single level")
    else:
        upto = level_index(tower, args.to)
        start = 0 if args.start is None else level_index(tower, args.start)
        if start > upto:
            raise UserError(f"--from {args.start} is after --to {args.to}")
    if start <= diagram.built or not diagram.can_jump:
        diagram.check_size(upto, printed=not args.sums_only)
        build_levels(diagram, upto)
    else:
        diagram.check_stream(start, upto, printed=not args.sums_only)
    if args.json:  # streamed: one level's text at a time, the bytes of json.dumps(levels_document)
        from engine.export.documents import write_levels_json

        write_levels_json(diagram, upto, sys.stdout, start)
        sys.stdout.write("\n")
    elif args.csv:
        from engine.export.csv_levels import write_csv

        write_csv(diagram, upto, sys.stdout, start)
    else:
        from tui.cli.tables import print_levels

        print_levels(diagram, upto, nodes=not args.sums_only, start=start, exact=args.exact)
    return 0
