"""``towerscope chips SPEC --put LABEL=COUNT ...``: chip-firing on the McKay graph, the root a sink."""

from __future__ import annotations

import argparse
import sys

from tui.cli.support import print_json


def add_commands(sub: argparse._SubParsersAction) -> None:
    p = sub.add_parser(
        "chips",
        help="chip-firing on the McKay graph: stabilise a configuration, its recurrent representative (finite towers)",
        description="Put chips on nodes (the root is the sink), topple every node holding at least dim V − M_ii "
        "chips until none does, and give the recurrent configuration of the same class; --list lists every "
        "recurrent configuration and checks their count against det C̃.",
    )
    p.add_argument("spec", help="a finite tower: su2, characters, graph, symmetric, alternating")
    p.add_argument("--put", action="append", default=[], metavar="LABEL=COUNT", help="chips on a node (repeat)")
    p.add_argument("--list", action="store_true", help="list every recurrent configuration")
    p.add_argument("--json", action="store_true", help="one JSON object")
    p.set_defaults(handler=run)


def run(args: argparse.Namespace) -> int:
    from engine.export.finite_documents import chips_document
    from engine.specs import parse_spec

    tower = parse_spec(args.spec)
    document = chips_document(tower, args.put, args.list)
    if args.json:
        print_json(document)
        return 0
    from tui.cli.folding import FittedOutput

    out = FittedOutput()  # lines fitted to the width, broken only at spaces (never inside a number)

    def shown(config: list[int]) -> str:
        return ", ".join(f"{label}={c}" for label, c in zip(document["nodes"], config) if c) or "empty"

    out.write(f"chip-firing on {tower.spec}, sink {document['sink']}; a node topples with at least "
              + ", ".join(f"{t} on {label}" for label, t in zip(document["nodes"], document["thresholds"])) + "\n")
    out.write(f"configuration: {shown(document['configuration'])}\n")
    out.write(f"stable after {document['topplings']} topplings: {shown(document['stable'])}\n")
    out.write(f"recurrent in its class: {shown(document['recurrent'])}\n")
    if args.list:
        every = document["all_recurrent"]
        check = "= |det C̃| ✓" if document["count_matches_determinant"] else "≠ |det C̃| ✗"
        out.write(f"{len(every)} recurrent configurations {check}\n")
        for config in every:
            out.write(f"  {shown(config)}\n")
    out.flush()
    return 0
