"""``towerscope critical-group SPEC``: the critical group of the McKay graph."""

from __future__ import annotations

import argparse
import sys

from tui.cli.support import print_json


def add_commands(sub: argparse._SubParsersAction) -> None:
    p = sub.add_parser(
        "critical-group",
        help="the critical group Z^{r−1}/(rows of C̃) of the McKay graph (finite towers)",
        description="C = (dim V)·I − M, the McKay–Cartan matrix of the repeating step, C̃ it without the root's row "
        "and column: the invariant factors of its Smith normal form and the order.",
    )
    p.add_argument("spec", help="a finite tower: su2, characters, graph, symmetric, alternating")
    p.add_argument("--json", action="store_true", help="one JSON object")
    p.set_defaults(handler=run)


def run(args: argparse.Namespace) -> int:
    from engine.export.finite_documents import critical_document
    from engine.specs import parse_spec

    tower = parse_spec(args.spec)
    document = critical_document(tower)
    if args.json:
        print_json(document)
        return 0
    order = document["order"] if document["order"] is not None else "infinite (C̃ is singular: V is not faithful)"
    from tui.cli.folding import FittedOutput

    out = FittedOutput()  # lines fitted to the width, broken only at spaces (never inside a number)
    out.write(f"critical group of {tower.spec} (sink {document['root']}): {document['group']}\n"
                     f"invariant factors: {document['invariant_factors'] or 'none'}; order {order}; "
                     f"det C̃ = {document['determinant']}\n")
    out.flush()
    return 0
