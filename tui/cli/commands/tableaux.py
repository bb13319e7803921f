"""``towerscope tableaux symmetric:n=N --level L --label X``: set-partition tableaux, the second
basis listing of the S_N tower (order documented in engine/set_partition_tableaux.py)."""

from __future__ import annotations

import argparse
import sys

from tui.cli.support import level_index, node_at, print_json


def add_commands(sub: argparse._SubParsersAction) -> None:
    p = sub.add_parser(
        "tableaux",
        help="set-partition tableaux of a node of symmetric:n=N (a second basis, counted by Stirling numbers)",
        description="List the set-partition tableaux of a node of the S_N tower: a set partition of {1..k} "
        "into t blocks placed, in the order of their least elements, as a standard skew tableau of shape "
        "λ/(N−t). Their number is the multiplicity Σ_t S(k,t)·f^{λ/(N−t)}. Ordered by t, then the set "
        "partition (restricted growth string), then the skew tableau.",
    )
    p.add_argument("spec", help="a symmetric tower spec, e.g. symmetric:n=4")
    p.add_argument("--level", required=True, metavar="L", help="the level (3, 2.5, 5/2, 2+1/2)")
    p.add_argument("--label", required=True, metavar="X", help="the node, e.g. (3,1)")
    p.add_argument("--start", default="0", metavar="R", help="the first rank (42, 10^12; -1 is the last)")
    p.add_argument("--count", type=int, default=20, metavar="C", help="how many (default 20)")
    p.add_argument("--json", action="store_true", help="one JSON object")
    p.add_argument("--exact", action="store_true", help="every digit of every number (by default a "
                   "number too wide for the screen is shortened, with its digit count)")
    p.set_defaults(handler=run)


def run(args: argparse.Namespace) -> int:
    from engine.diagram import Diagram
    from engine.errors import UserError
    from engine.export.path_documents import tableaux_document
    from engine.paths import parse_rank
    from engine.capabilities import Encodings
    from engine.specs import parse_spec

    tower = parse_spec(args.spec)
    encodings = tower.capability(Encodings)
    if encodings is None or encodings.set_partition_tableaux is None:
        raise UserError(f"set-partition tableaux are for symmetric:n=N towers with half levels, not {tower.spec}")
    index = level_index(tower, args.level)
    node = node_at(tower, index, args.label)
    Diagram(tower).check_digits(index)  # the count is the closed form: refuse what it cannot finish
    basis = encodings.set_partition_tableaux(index, node)
    total = basis.total
    if total == 0:
        raise UserError(f"{args.label!r} is not reached at level {args.level} of {tower.spec} (no tableaux)")
    if args.count < 0:
        raise UserError(f"--count must be 0 or more, got {args.count}")
    start = parse_rank(args.start, total)
    ranks = range(start, min(total, start + args.count))
    items = [(r, basis.unrank(r)) for r in ranks]
    if args.json:
        print_json(tableaux_document(tower, index, node, total, start, items))
        return 0
    from engine.encodings.drawing import draw_grid
    from tui.cli.fit import KEEP
    from tui.cli.folding import FittedOutput

    out = FittedOutput(exact=args.exact)  # lines fitted to the width, never broken inside a number
    out.write(f"{total} set-partition tableaux of {tower.format(node)} at level {args.level} of {tower.spec}\n")
    for r, t in items:
        lines = t.draw()
        named = max(map(len, lines), default=0) + 3 > out.width  # too wide: boxes hold block numbers b1, b2, ...
        if named:
            lines = draw_grid([["·" if j == 0 else f"b{j}" for j in row] for row in t.cells])
            lines += [line for line in t.draw() if line.startswith("set aside")]
        blocks = " | ".join((f"b{j}{KEEP}=" + KEEP if named else "") + ",".join(map(str, b))
                            for j, b in enumerate(t.blocks, 1)) or "no blocks"
        out.write(f"{r}  blocks {blocks}\n")
        for line in lines:
            out.write("   " + line + "\n")
    out.flush()
    return 0
