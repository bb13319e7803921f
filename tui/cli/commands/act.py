"""``towerscope act``: what an element of a level's algebra does on the tensor space."""

from __future__ import annotations

import argparse
import sys

from tui.cli.support import level_index, print_json


def add_commands(sub: argparse._SubParsersAction) -> None:
    p = sub.add_parser(
        "act",
        help="the matrix of an element on the tensor space, or its image of one basis tensor",
        description="Apply an element of a level's diagram algebra to V^(⊗k): without --tensor print its "
        "matrix (rows: labels of the top vertices, columns: labels of the bottom vertices, basis tensors in "
        "lexicographic order of their labels); with --tensor 1,2,1 print the image of e1⊗e2⊗e1. At a half "
        "level k+1/2 the space is V^(⊗k) ⊗ e_n. Pass an element starting with - after --.",
    )
    p.add_argument("spec", help="a tower spec with a diagram algebra, e.g. general-linear:n=2")
    p.add_argument("--level", required=True, metavar="L", help="the level (3, 2.5, 5/2, 2+1/2)")
    p.add_argument("element", metavar="E", help="a diagram or an element, e.g. \"{1,2'},{2,1'}\"")
    p.add_argument("--tensor", metavar="I", help="labels of a basis tensor, 1..n, e.g. 1,2,1")
    p.add_argument("--json", action="store_true", help="one JSON object")
    p.set_defaults(handler=run_act)


def _tensor_text(labels) -> str:
    return "⊗".join(f"e{a}" for a in labels) if labels else "1"


def run_act(args: argparse.Namespace) -> int:
    from engine.export.kernel_documents import act_document
    from engine.specs import parse_spec

    tower = parse_spec(args.spec)
    index = level_index(tower, args.level)
    document = act_document(tower, index, args.element, args.tensor)
    if args.json:
        print_json(document)
        return 0
    out = sys.stdout
    if "image" in document:
        parts = []
        for term in document["image"]:
            c = term["coefficient"]
            body = _tensor_text(term["tensor"])
            parts.append(("-" if c < 0 else "+", body if abs(c) == 1 else f"{abs(c)}*{body}"))
        image = "0" if not parts else " ".join([("-" if parts[0][0] == "-" else "") + parts[0][1]]
                                               + [f"{s} {b}" for s, b in parts[1:]])
        out.write(f"{document['algebra']}: {_tensor_text(document['tensor'])} ↦ {image}\n")
        return 0
    matrix = document["matrix"]
    out.write(f"{document['algebra']} on a space of dimension {document['space']} "
              "(rows: top labels, columns: bottom labels)\n")
    from tui.cli.fit import Column, Table, output_width

    width = max((len(str(v)) for row in matrix for v in row), default=1)
    if len(matrix) * (width + 1) - 1 <= output_width():
        for row in matrix:
            out.write(" ".join(f"{v:>{width}}" if v else " " * (width - 1) + "." for v in row) + "\n")
        return 0
    # too wide for the screen: numbered rows and columns, in parts that repeat the row number
    table = Table([Column("row", "right", key=True)] + [Column(str(j), "right") for j in range(1, len(matrix) + 1)])
    for i, row in enumerate(matrix, 1):
        table.add_row(i, *[v if v else "." for v in row])
    out.write(table.render(output_width()))
    return 0
