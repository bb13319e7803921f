"""``towerscope multiply``: the product of two elements of a level's diagram algebra."""

from __future__ import annotations

import argparse
import sys

from tui.cli.support import level_index, print_json


def add_commands(sub: argparse._SubParsersAction) -> None:
    p = sub.add_parser(
        "multiply",
        help="multiply two elements of a level's centralizer algebra (D1 above D2)",
        description="Multiply two elements of the diagram algebra at a level: D1 is put above D2 and each "
        "closed loop in the middle multiplies by the parameter (N; -N for symplectic). Elements are sums "
        "of terms c*D, e.g. \"{1,1'},{2,2'} - 2*{1,2},{1',2'}\"; pass an element starting with - after --.",
    )
    p.add_argument("spec", help="a tower spec with a diagram algebra, e.g. orthogonal:n=3")
    p.add_argument("--level", required=True, metavar="L", help="the level (3, 2.5, 5/2, 2+1/2)")
    p.add_argument("first", metavar="D1", help="the upper factor: a diagram or an element")
    p.add_argument("second", metavar="D2", help="the lower factor")
    p.add_argument("--symbolic", action="store_true",
                   help="keep the parameter as a symbol x: coefficients become polynomials in x")
    p.add_argument("--basis", choices=("diagram", "orbit"), default="diagram",
                   help="read the factors and write the product in this basis (orbit: partition algebras)")
    p.add_argument("--draw", action="store_true", help="draw each diagram of the product")
    p.add_argument("--json", action="store_true", help="one JSON object")
    p.add_argument("--exact", action="store_true", help="every digit of every number (by default a "
                   "number too wide for the screen is shortened, with its digit count)")
    p.set_defaults(handler=run_multiply)


def run_multiply(args: argparse.Namespace) -> int:
    from engine.algebras.drawing import draw
    from engine.algebras.elements import format_element, ordered
    from engine.export.algebra_documents import algebra_at, product, product_document
    from engine.specs import parse_spec

    tower = parse_spec(args.spec)
    index = level_index(tower, args.level)
    if args.json:
        print_json(product_document(tower, index, args.first, args.second, args.symbolic, args.basis))
        return 0
    level = algebra_at(tower, index)
    result = product(level, args.first, args.second, args.symbolic, args.basis)
    from tui.cli.folding import FittedOutput

    out = FittedOutput(exact=args.exact)  # folded before a sign or between blocks, never inside a number
    where = "x (symbolic)" if args.symbolic else ("none" if level.parameter is None else str(level.parameter))
    basis = ", orbit basis" if args.basis == "orbit" else ""
    out.write(f"{level.name} (parameter {where}{basis}): {len(result)} term{'s' if len(result) != 1 else ''}\n")
    out.write(format_element(result, level) + "\n")
    if args.draw:
        from tui.cli.fit import output_width

        fit = output_width()
        for d, _ in ordered(result, level):
            out.raw("\n" + "\n".join(draw(d, level.vertices, fit)) + "\n")
    out.flush()
    return 0
