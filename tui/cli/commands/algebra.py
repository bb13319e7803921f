"""``towerscope algebra``: the level's diagram algebra, its basis size and the rank of its image."""

from __future__ import annotations

import argparse
import sys

from tui.cli.support import DelayedProgress, level_index, print_json


def add_commands(sub: argparse._SubParsersAction) -> None:
    p = sub.add_parser(
        "algebra",
        help="a level's diagram algebra: basis size, rank of its image on the tensor space, kernel size",
        description="Name the diagram algebra of a level, count its basis diagrams and compute the dimension "
        "of its image in End(V^(⊗k)) by exact linear algebra on the tensor space (ranks modulo large primes, "
        "proved equal to the sum of squared multiplicities of the level). Where the matrices would be too "
        "large, the rank is taken from the Bratteli diagram and the output says so.",
    )
    p.add_argument("spec", help="a tower spec with a diagram algebra, e.g. symmetric:n=3")
    p.add_argument("--level", required=True, metavar="L", help="the level (3, 2.5, 5/2, 2+1/2)")
    p.add_argument("--json", action="store_true", help="one JSON object")
    p.add_argument("--exact", action="store_true", help="every digit of every number (by default a "
                   "number too wide for the screen is shortened, with its digit count)")
    p.set_defaults(handler=run_algebra)


def run_algebra(args: argparse.Namespace) -> int:
    from engine.export.kernel_documents import algebra_document
    from engine.specs import parse_spec

    tower = parse_spec(args.spec)
    index = level_index(tower, args.level)
    document = DelayedProgress(f"acting on the tensor space of {tower.spec}").run(
        lambda bar: algebra_document(tower, index, bar))
    if args.json:
        print_json(document)
        return 0
    from tui.cli.folding import FittedOutput

    out = FittedOutput(exact=args.exact)  # a number too wide is shortened with its digit count
    parameter = "none" if document["parameter"] is None else str(document["parameter"])
    out.write(f"{document['algebra']} at level {document['level']} of {tower.spec} (parameter {parameter})\n")
    out.number("  basis diagrams        ", document["basis"])
    if document["rank_method"] == "computed":
        out.number("  rank of the image     ", document["rank"], "   computed on the tensor space (equals Σm² = "
                   f"{document['squares']})")
    else:
        out.number("  rank of the image     ", document["rank"], "   from the Bratteli diagram (Σm²), not "
                   f"computed: {document['note']}")
    out.number("  kernel                ", document["kernel"])
    out.flush()
    return 0
