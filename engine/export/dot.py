"""Graphviz DOT of a Bratteli diagram (the DOT language, graphviz.org/doc/info/lang.html).

Nodes carry ``label`` and ``level`` attributes; edges carry ``edges`` where the count exceeds 1
(cli-contract.md).  Nodes of one level share a rank, levels run top to bottom.
"""

from __future__ import annotations

from typing import Iterator

from engine.diagram import Diagram
from engine.levels import format_level


def _quote(text: str) -> str:
    return '"' + text.replace("\\", "\\\\").replace('"', '\\"') + '"'


def dot_lines(diagram: Diagram, upto: int) -> Iterator[str]:
    tower = diagram.tower
    diagram.ensure(upto)
    yield f"digraph {_quote(tower.spec)} {{"
    yield "  rankdir=TB;"
    yield "  node [shape=box];"
    ids: dict[tuple[int, object], str] = {}
    for index in range(upto + 1):
        level = diagram.level(index)
        shown = format_level(tower.level_of(index))
        names = []
        for k, node in enumerate(diagram.nodes(index)):
            name = f"n{index}_{k}"
            ids[(index, node)] = name
            names.append(name)
            yield (
                f"  {name} [label={_quote(tower.format(node))}, level={_quote(shown)}, "
                f"multiplicity={_quote(str(level[node]))}, dimension={_quote(str(tower.dimension(index, node)))}];"
            )
        yield "  { rank=same; " + " ".join(names) + " }"
    for index in range(upto):
        for node in diagram.nodes(index):
            for child, e in diagram.children(index, node):
                extra = f" [edges={e}, label={e}]" if e > 1 else ""
                yield f"  {ids[(index, node)]} -> {ids[(index + 1, child)]}{extra};"
    yield "}"


def to_dot(diagram: Diagram, upto: int) -> str:
    return "\n".join(dot_lines(diagram, upto)) + "\n"
