"""``towerscope paths`` (list paths to a node by rank) and ``towerscope rank`` (the rank of a path)."""

from __future__ import annotations

import argparse
import sys

from tui.cli.support import build_levels, level_index, node_at, open_diagram, print_json

_ORDER = (
    "Paths are ranked 0..total-1 by their last step first: the parent in the level's display order, "
    "then the edge number (several edges between two nodes are numbered 1..e), then the path to that "
    "parent, back to the root."
)


def _node_arguments(p: argparse.ArgumentParser) -> None:
    p.add_argument("spec", help="a tower spec, e.g. symmetric:n=4")
    p.add_argument("--level", required=True, metavar="L", help="the level (3, 2.5, 5/2, 2+1/2)")
    p.add_argument("--label", required=True, metavar="X", help="the node, e.g. (3,1)")
    p.add_argument(
        "--encoding", metavar="E", help="how paths are written: labels (any tower), vacillating, updown, tableau, "
        "pairs, walk; the default is the family's first (see the README)"
    )
    p.add_argument("--json", action="store_true", help="one JSON object")


def add_commands(sub: argparse._SubParsersAction) -> None:
    p = sub.add_parser(
        "paths",
        help="list the paths from the root to a node, by rank",
        description="List paths to a node (a basis of the centralizer's irreducible module). " + _ORDER,
    )
    _node_arguments(p)
    p.add_argument("--start", default="0", metavar="R", help="the first rank (42, 10^12, 3*10^12, 1e12; -1 is the last)")
    p.add_argument("--count", type=int, default=20, metavar="C", help="how many paths (default 20)")
    p.add_argument("--draw", action="store_true", help="draw each path's encoding (tableaux with box characters)")
    p.add_argument("--exact", action="store_true", help="every digit of every rank and count (by default a "
                   "number too wide for the screen is shortened, with its digit count)")
    p.set_defaults(handler=run_paths)

    r = sub.add_parser(
        "rank",
        help="the rank of a path (the inverse of `paths`)",
        description="Print the rank of a path to a node, written in the encoding's text form. " + _ORDER,
    )
    _node_arguments(r)
    r.add_argument("path", metavar="PATH", help="the path, e.g. '(4) (3) (4) (3) (3,1)' or a tableau '1,2,4/3'")
    r.set_defaults(handler=run_rank)


def _prepare(args: argparse.Namespace):
    from engine.encodings import get_encoding
    from engine.export.documents import require_node
    from engine.paths import PathIndex

    diagram = open_diagram(args.spec)
    tower = diagram.tower
    index = level_index(tower, args.level)
    node = node_at(tower, index, args.label)
    encoding = get_encoding(tower, args.encoding)
    build_levels(diagram, index)
    require_node(diagram, index, node, args.label)
    return PathIndex(diagram), index, node, encoding


def run_paths(args: argparse.Namespace) -> int:
    from engine.errors import UserError
    from engine.export.path_documents import paths_document
    from engine.paths import parse_rank

    paths, index, node, encoding = _prepare(args)
    if args.count < 0:
        raise UserError(f"--count must be 0 or more, got {args.count}")
    total = paths.total(index, node)
    start = parse_rank(args.start, total)
    document = paths_document(paths, index, node, start, args.count, encoding if args.encoding else None)
    if args.json:
        print_json(document)
        return 0
    tower = paths.diagram.tower
    shown = document["paths"]
    last = start + len(shown) - 1
    from tui.cli.fit import output_width
    from tui.cli.folding import wrap_words

    out = sys.stdout
    fit = output_width()
    from tui.cli.folding import rank_range

    listed = f"ranks {rank_range(start, last)} as {encoding.title} ({encoding.name})" if shown else "none listed (--count 0)"
    out.write(wrap_words(f"{total} paths to {tower.format(node)} at level {document['level']} of {tower.spec}; {listed}",
                         fit, "  ", args.exact))
    width = len(str(last))
    for rank, path in zip(range(start, last + 1), paths.iterate(index, node, start)):
        text = encoding.path_text(tower, path)
        out.write(wrap_words(f"{rank:>{width}}  {text}", fit, " " * min(width + 2, 12), args.exact))
        if args.draw:
            for line in encoding.draw(tower, encoding.encode(tower, path)):
                if line == text:
                    continue
                pad = " " * min(width + 2, 12)
                if any("\u2500" <= ch <= "\u257f" for ch in line):  # box drawing: as it is
                    out.write(pad + line + "\n")
                else:  # a tableau written in a line: folded after a comma or a row's slash
                    out.write(wrap_words(pad + line, fit, pad + "  ", args.exact))
    return 0


def run_rank(args: argparse.Namespace) -> int:
    from engine.export.path_documents import rank_document

    paths, index, node, encoding = _prepare(args)
    tower = paths.diagram.tower
    path = encoding.path_from_text(tower, args.path)
    paths.check(path, index, node)
    rank = paths.rank(path)
    if args.json:
        print_json(rank_document(paths, index, node, path, rank))
    else:
        sys.stdout.write(f"{rank}\n")
    return 0
