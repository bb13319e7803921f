"""``towerscope diagrams``: the basis diagrams of a level's algebra, by rank, drawn on request."""

from __future__ import annotations

import argparse
import sys

from tui.cli.support import level_index, print_json

_ORDER = ("Ranks follow the order documented in engine/algebras/bases.py (restricted growth strings for "
          "set partitions, partner choices for Brauer diagrams, Dyck words for Temperley-Lieb, Lehmer codes "
          "for permutations; walled Brauer diagrams as permutations after flipping the d strands).")


def add_commands(sub: argparse._SubParsersAction) -> None:
    p = sub.add_parser(
        "diagrams",
        help="list the basis diagrams of a level's centralizer algebra, by rank",
        description="List basis diagrams of the diagram algebra at a level. " + _ORDER,
    )
    p.add_argument("spec", help="a tower spec with a diagram algebra, e.g. symmetric:n=4")
    p.add_argument("--level", required=True, metavar="L", help="the level (3, 2.5, 5/2, 2+1/2)")
    p.add_argument("--start", default="0", metavar="R", help="the first rank (42, 10^12, 1e12; -1 is the last)")
    p.add_argument("--count", type=int, default=20, metavar="C", help="how many diagrams (default 20)")
    p.add_argument("--draw", action="store_true", help="draw each diagram with box characters")
    p.add_argument("--tikz", action="store_true", help="print each diagram as a TikZ picture")
    p.add_argument("--json", action="store_true", help="one JSON object")
    p.add_argument("--exact", action="store_true", help="every digit of every number (by default a "
                   "number too wide for the screen is shortened, with its digit count)")
    p.set_defaults(handler=run_diagrams)


def run_diagrams(args: argparse.Namespace) -> int:
    from engine.algebras.bases import count
    from engine.algebras.diagrams import parse_diagram
    from engine.algebras.drawing import draw, tikz
    from engine.export.algebra_documents import algebra_at, diagrams_document
    from engine.paths import parse_rank
    from engine.specs import parse_spec

    tower = parse_spec(args.spec)
    index = level_index(tower, args.level)
    level = algebra_at(tower, index)
    start = parse_rank(args.start, count(level))
    document = diagrams_document(tower, index, start, args.count)
    if args.json:
        print_json(document)
        return 0
    from tui.cli.fit import output_width
    from tui.cli.folding import wrap_words

    out = sys.stdout  # lines fitted to the width: broken at spaces and between blocks, never in a number
    fit = output_width()
    shown = document["diagrams"]
    from tui.cli.folding import rank_range

    listed = f"ranks {rank_range(start, start + len(shown) - 1)}" if shown else "none listed (--count 0)"
    out.write(wrap_words(f"{document['algebra']} at level {document['level']} of {tower.spec}: "
                         f"{document['total']} diagrams; {listed}", fit, "    ", args.exact))
    width = len(str(start + len(shown) - 1)) if shown else 1
    for entry in shown:
        out.write(wrap_words(f"{entry['rank']:>{width}}  {entry['diagram']}", fit, " " * min(width + 2, 12),
                             args.exact))
        if args.draw or args.tikz:
            d = parse_diagram(entry["diagram"], level.vertices)
            lines = draw(d, level.vertices, max(fit - width - 2, 30)) if args.draw else []
            if args.tikz:
                lines += tikz(d, level.vertices).splitlines()
            for line in lines:
                out.write(" " * (width + 2) + line + "\n")
    return 0
