"""``towerscope growth SPEC --label X``: m_X(k) against its leading term p·d·(dim V)^k/|G|."""

from __future__ import annotations

import argparse
import sys

from tui.cli.support import print_json


def add_commands(sub: argparse._SubParsersAction) -> None:
    p = sub.add_parser(
        "growth",
        help="the growth m(k) ~ p·d·(dim V)^k/|G| of a node, with the period, checked at level K (finite towers)",
        description="The leading term of a node's multiplicities (p the period of the McKay graph, |G| = Σ d² over "
        "the nodes reached) and the exact ratio m(k)/leading term at the last levels up to K.",
    )
    p.add_argument("spec", help="a finite tower: su2, characters, graph, symmetric, alternating")
    p.add_argument("--label", required=True, metavar="X", help="the node")
    p.add_argument("--to", type=int, default=60, metavar="K", help="the last level checked (default 60)")
    p.add_argument("--json", action="store_true", help="one JSON object")
    p.set_defaults(handler=run)


def run(args: argparse.Namespace) -> int:
    from engine.export.finite_documents import growth_document
    from engine.specs import parse_spec

    tower = parse_spec(args.spec)
    document = growth_document(tower, args.label, args.to)
    if args.json:
        print_json(document)
        return 0
    from tui.cli.folding import FittedOutput

    out = FittedOutput()  # lines fitted to the width, broken only at spaces (never inside a number)
    out.write(f"{document['label']} on {tower.spec}: {document['text']}   (|G| = Σd² = {document['order']}, "
              f"d = {document['dimension']}, period {document['period']})\n")
    for r in document["ratios"]:
        out.write(f"  k = {r['k']}: m(k) / leading term ≈ {r['approximately']}\n")
    out.flush()
    return 0
