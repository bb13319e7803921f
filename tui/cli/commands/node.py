"""``towerscope node SPEC --level L --label X``: one node, its parents and children."""

from __future__ import annotations

import argparse

from tui.cli.support import build_levels, level_index, node_at, open_diagram, print_json


def add_commands(sub: argparse._SubParsersAction) -> None:
    p = sub.add_parser(
        "node",
        help="one node: multiplicity, dimension, parents and children with edge counts",
        description="Describe one node of a tower. Families with a closed form (symmetric) answer at "
        "deep levels without building the diagram.",
    )
    p.add_argument("spec", help="a tower spec, e.g. symmetric:n=4")
    p.add_argument("--level", required=True, metavar="L", help="the level (3, 2.5, 5/2, 2+1/2)")
    p.add_argument("--label", required=True, metavar="X", help="the node, e.g. (3,1)")
    p.add_argument("--json", action="store_true", help="one JSON object (see the CLI contract)")
    p.add_argument("--exact", action="store_true", help="every digit of the multiplicity (by default a number "
                   "too wide for the screen is shortened, with its digit count)")
    p.set_defaults(handler=run)


def run(args: argparse.Namespace) -> int:
    from engine.export.documents import node_document

    diagram = open_diagram(args.spec)
    tower = diagram.tower
    index = level_index(tower, args.level)
    node = node_at(tower, index, args.label)
    diagram.check_digits(index)
    if not diagram.has_closed_form:
        build_levels(diagram, index)
    document = node_document(diagram, index, node, args.label)
    if args.json:
        print_json(document)
    else:
        from tui.cli.tables import print_node

        print_node(tower.spec, tower.level_kind(index), document, exact=args.exact)
    return 0
