"""``towerscope gram SPEC --level L --label LAMBDA``: a cell module's Gram matrix, its determinant
as a polynomial in the parameter x, and its rank at the spec's parameter (CLI contract)."""

from __future__ import annotations

import argparse
import sys

from tui.cli.support import level_index, open_diagram, print_json


def add_commands(sub: argparse._SubParsersAction) -> None:
    p = sub.add_parser(
        "gram",
        help="a cell module of the level's diagram algebra: dimension, Gram rank at N, Gram determinant in x",
        description="The cell (standard) module LAMBDA of the diagram algebra at level L: its dimension, the "
        "rank of its Gram matrix at the spec's parameter (the dimension of its simple quotient) and the Gram "
        "determinant as a polynomial in x. Labels: partitions (|LAMBDA| <= k for partition algebras, where a "
        "partition of N names the node (N-|l|, l); |LAMBDA| = k, k-2, ... for Brauer), through-line counts (t) "
        "for Temperley-Lieb, pairs ((a),(b)) for walled Brauer, partitions of k for CS_k.",
    )
    p.add_argument("spec", help="a tower spec with a diagram algebra, e.g. orthogonal:n=3")
    p.add_argument("--level", required=True, metavar="L", help="the level (4, 2.5, 5/2, 2+1/2)")
    p.add_argument("--label", required=True, metavar="LAMBDA", help="the cell label, e.g. (2)")
    p.add_argument("--matrix", action="store_true", help="also print the Gram matrix")
    p.add_argument("--json", action="store_true", help="one JSON object (see the CLI contract)")
    p.add_argument("--exact", action="store_true", help="every digit of every number (by default a "
                   "number too wide for the screen is shortened, with its digit count)")
    p.set_defaults(handler=run)


def run(args: argparse.Namespace) -> int:
    from engine.algebras.cells.labels import matching_note
    from engine.algebras.cells.report import cell_answer
    from engine.capabilities import DiagramAlgebra, require
    from engine.export.cell_documents import gram_document, polynomial_text, roots_text

    diagram = open_diagram(args.spec)
    tower = diagram.tower
    index = level_index(tower, args.level)
    level = require(tower, DiagramAlgebra).at(index)
    answer = cell_answer(level, args.label, keep_matrix=args.matrix)
    document = gram_document(tower.spec, answer, tower.format)
    if args.json:
        print_json(document)
        return 0
    from tui.cli.fit import KEEP, output_width
    from tui.cli.folding import wrap_words

    blocks = "block" if answer.through == 1 else "blocks"
    lines = [f"cell module {answer.label.text} of {level.name}: {answer.through} propagating {blocks}, "
             f"dimension {answer.dimension}"]
    if level.parameter is None:
        lines.append(f"rank of the Gram matrix: {answer.rank} (CS_k has no parameter)")
    else:
        lines.append(f"rank of the Gram matrix at x = {level.parameter}: {answer.rank}")
    lines.append(f"Gram determinant: {polynomial_text(answer.determinant)}")
    if answer.roots:
        lines.append(f"  vanishes at x = {roots_text(answer.roots)}".replace(" (", KEEP + "("))  # "2 (twice)" whole
    for factor, m in answer.others:
        lines.append(f"  and at the roots of {polynomial_text(factor)}" + ("" if m == 1 else f" (power {m})"))
    if any(len(s) > 1 and s[0] > 1 for s in answer.label.shapes):
        lines.append("  (the Specht module's form is scaled to determinant 1, so the determinant does not "
                     "depend on the Specht basis)")
    note = matching_note(level)
    if answer.node is None:
        lines.append(f"no node of the tower belongs to this cell at this N ({note})")
    else:
        multiplicity = diagram.multiplicity(index, answer.node)
        verdict = "agrees" if multiplicity == answer.rank else "differs"
        lines.append(f"its simple quotient belongs to the node {tower.format(answer.node)} of multiplicity "
                     f"{multiplicity}: {verdict} ({note})")
    if args.matrix:
        from engine.export.cell_documents import gram_matrix_rows

        lines.append("Gram matrix (rows and columns: half diagrams, then tableaux, in basis order):")
        for row in gram_matrix_rows(answer):
            lines.append("  " + "  ".join(f"[{polynomial_text(entry)}]".replace(" ", KEEP) for entry in row))
    width = output_width()
    sys.stdout.write("".join(wrap_words(line, width, "  ", args.exact) for line in lines))  # broken only at spaces
    return 0
