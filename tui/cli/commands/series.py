"""``towerscope series SPEC --label X``: the generating function Σ_k m_X(k) t^k of a finite tower's node."""

from __future__ import annotations

import argparse
import sys

from tui.cli.support import print_json


def add_commands(sub: argparse._SubParsersAction) -> None:
    p = sub.add_parser(
        "series",
        help="the generating function N(t)/D(t) of a node's multiplicities (finite towers)",
        description="Print Σ_k m_X(k) t^k = N(t)/D(t) in lowest terms with D(0) = 1 (k over the levels where X "
        "occurs: k, or k+1/2 for a half-level node), and for character towers m_X(k) as a sum over the "
        "character values of V.",
    )
    p.add_argument("spec", help="a finite tower: su2, characters, graph, symmetric, alternating")
    which = p.add_mutually_exclusive_group(required=True)
    which.add_argument("--label", metavar="X", help="the node")
    which.add_argument("--all", action="store_true", help="every node of the repeating step")
    p.add_argument("--json", action="store_true", help="one JSON object (integer coefficients, constant term first)")
    p.set_defaults(handler=run)


def run(args: argparse.Namespace) -> int:
    from engine.export.finite_documents import all_series_document, series_document
    from engine.series.rational import polynomial_text
    from engine.specs import parse_spec

    from tui.cli.folding import FittedOutput

    tower = parse_spec(args.spec)
    out = FittedOutput()  # long polynomials fold before a sign, never inside a number
    if args.all:
        document = all_series_document(tower)
        if args.json:
            print_json(document)
            return 0
        for s in document["series"]:
            _line(out, s, polynomial_text)
        out.flush()
        return 0
    document = series_document(tower, args.label)
    if args.json:
        print_json({k: document[k] for k in ("label", "numerator", "denominator")})
        return 0
    _line(out, document, polynomial_text)
    if "closed_form" in document:
        out.write(f"  {document.get('closed_form_of', 'm(k)')} = {document['closed_form']}   (0^k is 1 at k\u00a0=\u00a00, else\u00a00)\n")
    out.flush()
    return 0


def _line(out, s: dict, text) -> None:
    n, d = text(tuple(s["numerator"])), text(tuple(s["denominator"]))
    out.write(f"{s['label']}: Σ m({s['levels']}) t^k = ({n}) / ({d})\n")
