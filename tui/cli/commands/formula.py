"""``towerscope formula symmetric:n=N --label X``: the multiplicity of a node as a closed form in k."""

from __future__ import annotations

import argparse
import sys

from tui.cli.support import print_json


def add_commands(sub: argparse._SubParsersAction) -> None:
    p = sub.add_parser(
        "formula",
        help="the multiplicity of an S_N node as a closed form in k (Stirling numbers and powers j^k)",
        description="Print m_λ(k) = Σ_t f^{λ/(N−t)}·S(k,t) and the same as an exponential sum Σ_j b_j·j^k, "
        "for a partition λ of N (integer levels k) or of N−1 (half levels k+1/2).",
    )
    p.add_argument("spec", help="a symmetric tower spec, e.g. symmetric:n=5")
    p.add_argument("--label", required=True, metavar="X", help="a partition of N, or of N−1 for half levels")
    p.add_argument("--check", type=int, default=8, metavar="K", help="also print the values at k = 0..K (default 8)")
    p.add_argument("--json", action="store_true", help="one JSON object (coefficients as exact fractions)")
    p.add_argument("--exact", action="store_true", help="every digit of every number (by default a "
                   "number too wide for the screen is shortened, with its digit count)")
    p.set_defaults(handler=run)


def run(args: argparse.Namespace) -> int:
    from engine.errors import UserError
    from engine.export.formula_document import closed_form_of, formula_document
    from engine.specs import parse_spec

    tower = parse_spec(args.spec)
    if args.check < 0:
        raise UserError(f"--check must be 0 or more, got {args.check}")
    form = closed_form_of(tower, args.label)
    document = formula_document(tower, form, args.check)
    if args.json:
        print_json(document)
        return 0
    values = document["values"]
    from tui.cli.folding import FittedOutput

    out = FittedOutput(exact=args.exact)  # lines fitted to the width, broken only at spaces (never inside a number)

    out.write(f"{form.name()} on {tower.spec}, for every k ≥ 0 (S = Stirling numbers of the second kind):\n")
    out.write(f"  = {form.stirling_text()}\n")
    out.write(f"  = {form.powers_text()}" + ("   (0^k is 1 at k\u00a0=\u00a00, else\u00a00)" if 0 in form.powers else "") + "\n")
    where = "k+1/2" if form.half else "k"
    out.write(f"  at {where} = " + ", ".join(f"{k}{'.5' if form.half else ''}:\u00a0{v}" for k, v in enumerate(values)) + "\n")
    return 0
