"""``towerscope kernel``: a basis of the kernel of a level's algebra on the tensor space."""

from __future__ import annotations

import argparse
import sys

from tui.cli.support import DelayedProgress, level_index, print_json


def add_commands(sub: argparse._SubParsersAction) -> None:
    p = sub.add_parser(
        "kernel",
        help="elements of the algebra acting as zero on the tensor space: a basis, a known generator",
        description="List the first elements of a basis of the kernel of the action of a level's diagram "
        "algebra on V^(⊗k): primitive integer combinations of diagrams, each checked to act as zero. Where a "
        "generator of the kernel as a two-sided ideal is known, it is shown (in the orbit basis too, for "
        "partition algebras) with the dimension of the ideal it generates, computed. --element E tests E.",
    )
    p.add_argument("spec", help="a tower spec with a diagram algebra, e.g. symmetric:n=2")
    p.add_argument("--level", required=True, metavar="L", help="the level (3, 2.5, 5/2, 2+1/2)")
    p.add_argument("--count", type=int, default=20, metavar="C", help="how many kernel elements (default 20)")
    p.add_argument("--element", metavar="E", help="an element to test: does it act as zero, what ideal does it generate")
    p.add_argument("--basis", choices=("diagram", "orbit"), default="diagram",
                   help="write the kernel elements in this basis (orbit: partition algebras, the x_π with more than N blocks)")
    p.add_argument("--json", action="store_true", help="one JSON object")
    p.add_argument("--exact", action="store_true", help="every digit of every number (by default a "
                   "number too wide for the screen is shortened, with its digit count)")
    p.set_defaults(handler=run_kernel)


def _ideal_text(dimension, proved, note) -> str:
    if dimension is None:
        return f"not computed ({note})"
    return str(dimension) + ("" if proved else " at least (random products stalled)")


def run_kernel(args: argparse.Namespace) -> int:
    from engine.algebras.diagrams import parse_diagram
    from engine.algebras.elements import format_element
    from engine.export.algebra_documents import algebra_at
    from engine.export.kernel_documents import kernel_document
    from engine.specs import parse_spec

    tower = parse_spec(args.spec)
    index = level_index(tower, args.level)
    document = DelayedProgress(f"computing the kernel at level {args.level} of {tower.spec}").run(
        lambda bar: kernel_document(tower, index, args.count, args.element, bar, args.basis))
    if args.json:
        print_json(document)
        return 0
    level = algebra_at(tower, index)

    def text(element_json) -> str:
        element = {parse_diagram(t["diagram"], level.vertices): t["coefficient"] for t in element_json["terms"]}
        return format_element(element, level)

    from tui.cli.folding import FittedOutput

    out = FittedOutput(exact=args.exact)  # lines fitted to the width, broken only at spaces (never inside a number)
    shown = document["elements"]
    out.write(f"kernel of {document['algebra']} on the tensor space ({tower.spec}, level {document['level']}): "
              f"dimension {document['dimension']}")
    where = " (orbit basis)" if document.get("basis") == "orbit" else ""
    out.write(f"; the first {len(shown)} basis elements{where}\n" if shown else "\n")
    for i, element in enumerate(shown, 1):
        out.write(f"{i:>3}. {text(element)}\n")
    if "generator" in document:
        zero = {True: "acts as zero", False: "does NOT act as zero", None: "too large to check"}
        out.write(f"generator: {document['generator_description']} ({zero[document['generator_acts_as_zero']]})\n")
        if document["generator_orbit"] is not None:
            out.write(f"  orbit basis:   {text(document['generator_orbit'])}\n")
        out.write(f"  diagram basis: {text(document['generator'])}\n")
        out.write(f"  ideal it generates: dimension "
                  f"{_ideal_text(document['ideal_dimension'], document['ideal_proved'], document['ideal_note'])}"
                  f" (kernel {document['dimension']})\n")
    elif document["dimension"]:
        out.write("no generator of this kernel is known here\n")
    if "test" in document:
        test = document["test"]
        verdict = {True: "acts as zero (in the kernel)", False: "does not act as zero", None: "too large to check"}
        out.write(f"element {text(test['element'])}: {verdict[test['in_kernel']]}; the ideal it generates has "
                  f"dimension {_ideal_text(test['ideal_dimension'], test['ideal_proved'], test['ideal_note'])}\n")
    return 0
