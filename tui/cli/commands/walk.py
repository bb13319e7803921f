"""``towerscope walk SPEC --steps K``: the random walk "tensor with V" on the irreducibles, exactly."""

from __future__ import annotations

import argparse
import sys

from tui.cli.support import print_json


def add_commands(sub: argparse._SubParsersAction) -> None:
    p = sub.add_parser(
        "walk",
        help="the random walk P(i→j) = M_ij·d_j/(d_i·dim V): stationary law and exact distances (finite towers)",
        description="Start at the root (the trivial module) and print the stationary law, the total-variation and "
        "separation distances after k = 0..K steps as exact rationals, the mixing time to ε and the eigenvalues.",
    )
    p.add_argument("spec", help="a finite tower: su2, characters, graph, symmetric, alternating")
    p.add_argument("--steps", type=int, default=20, metavar="K", help="steps (default 20)")
    p.add_argument("--lazy", action="store_true", help="the lazy walk ½(I + P)")
    p.add_argument("--epsilon", default="1/4", metavar="ε", help="the mixing time's distance (default 1/4)")
    p.add_argument("--json", action="store_true", help="one JSON object, rationals as strings \"p/q\"")
    p.add_argument("--exact", action="store_true", help="every distance as an exact fraction (by default a "
                   "fraction too long for its column is shown to 6 digits, with its length)")
    p.set_defaults(handler=run)


def run(args: argparse.Namespace) -> int:
    from engine.export.finite_documents import read_fraction, walk_document
    from engine.specs import parse_spec

    tower = parse_spec(args.spec)
    epsilon = read_fraction(args.epsilon, "--epsilon")
    document = walk_document(tower, args.steps, args.lazy, epsilon)
    if args.json:
        print_json(document)
        return 0
    from tui.cli.fit import Column, Table
    from tui.cli.folding import FittedOutput

    out = FittedOutput(exact=args.exact)  # lines fitted to the width, broken only at spaces
    kind = "lazy walk ½(I + P)" if args.lazy else "walk"
    out.write(f"{kind} on {tower.spec}: {len(document['nodes'])} nodes, P(i→j) = M_ij·d_j/(d_i·{document['step_constant']})\n")
    law = "the Plancherel measure d_i²/|G| (every node reached: V is faithful)" if document["plancherel"] else \
        f"on the {document['reached']} nodes reached from the root"
    out.write(f"stationary law: {law}\n")
    for label, p in zip(document["nodes"], document["stationary"]):
        out.write(f"  {label}: {_short(p, args.exact)}\n")
    if document["period"] > 1:
        out.write(f"periodic with period {document['period']}: the distance does not tend to 0 (try --lazy)\n")
    if "eigenvalues" in document:
        shown = ", ".join(f"{e['value']}" for e in document["eigenvalues"])
        out.write(f"eigenvalues χ_V(C)/dim V{' (lazy: (1+λ)/2)' if args.lazy else ''}: {shown}\n")
    else:
        shown = " · ".join(f"({f['factor']})" + (f"^{f['multiplicity']}" if f["multiplicity"] > 1 else "")
                           for f in document["characteristic_factors"])
        out.write(f"eigenvalues: the roots of {shown}, divided by {document['step_constant']}\n")
    table = Table([Column("k", "right", key=True), Column("total variation"), Column("separation")])
    for k, (d, s) in enumerate(zip(document["distance"], document["separation"])):
        table.add_row(k, _short(d, args.exact), _short(s, args.exact))
    out.raw(table.render(out.width))
    t = document["mixing_time"]
    out.write(f"mixing time to {document['epsilon']}: " + (f"{t}\n" if t is not None else f"not within {args.steps} steps\n"))
    out.flush()
    return 0


#: the longest fraction shown whole in the text (two such columns beside k fit 80 columns)
SHORT_FRACTION = 34


def _short(text: str, exact: bool = False) -> str:
    """A fraction ``p/q`` as it is, or when longer than ``SHORT_FRACTION`` its value to 6 significant
    digits computed exactly from p and q (never through a float), with the length of the exact text."""
    if exact or len(text) <= SHORT_FRACTION:
        return text
    from fractions import Fraction

    from tui.cli.fit import approximate

    return f"≈ {approximate(Fraction(text))} ({len(text)} characters)"
