"""Plain data (dicts and lists of exact ints) describing levels and nodes, as fixed by the CLI
contract (shared guide cli-contract.md); the JSON and CSV writers and the CLI print these."""

from __future__ import annotations

from typing import Any, Iterator

from engine.diagram import CancelToken, Diagram, Progress
from engine.errors import LabelError
from engine.levels import format_level, level_to_json
from engine.tower import Node


def node_values(diagram: Diagram, index: int, cancel: CancelToken | None = None) -> Iterator[tuple[str, int, int]]:
    """(label, multiplicity, dimension) of every node of a level, in display order."""
    tower = diagram.tower
    level = diagram.level(index, cancel=cancel)
    for node in diagram.nodes(index):
        yield tower.format(node), level[node], tower.dimension(index, node)


def level_entry(diagram: Diagram, index: int, cancel: CancelToken | None = None) -> dict[str, Any]:
    nodes = [{"label": label, "multiplicity": m, "dimension": dim} for label, m, dim in node_values(diagram, index, cancel)]
    sums = diagram.sums(index, cancel=cancel)
    return {
        "level": level_to_json(diagram.tower.level_of(index)),
        "nodes": nodes,
        "sums": {"multiplicities": sums.multiplicities, "squares": sums.squares, "weighted": sums.weighted},
    }


def levels_document(
    diagram: Diagram, upto: int, progress: Progress | None = None, cancel: CancelToken | None = None
) -> dict[str, Any]:
    """``{"tower": spec, "levels": [...]}`` for levels 0..upto (indices), per the contract."""
    diagram.ensure(upto, progress, cancel)
    return {"tower": diagram.tower.spec, "levels": [level_entry(diagram, i, cancel) for i in range(upto + 1)]}


def level_rows(diagram: Diagram, upto: int) -> Iterator[tuple[str, str, int, int]]:
    """(level, label, multiplicity, dimension) for every node of levels 0..upto."""
    for index in range(upto + 1):
        shown = format_level(diagram.tower.level_of(index))
        for label, m, dim in node_values(diagram, index):
            yield shown, label, m, dim


def require_node(diagram: Diagram, index: int, node: Node, text: str) -> int:
    """The multiplicity of a node, or a LabelError when it has no path from the root."""
    m = diagram.multiplicity(index, node)
    if m == 0:
        tower = diagram.tower
        raise LabelError(
            f"{text!r} is not reached at level {format_level(tower.level_of(index))} of {tower.spec} "
            "(no path from the root; `towerscope levels` lists the nodes of a level)"
        )
    return m


def node_document(diagram: Diagram, index: int, node: Node, text: str | None = None) -> dict[str, Any]:
    """Label, level, multiplicity, dimension, parents and children with edge counts (contract)."""
    tower = diagram.tower
    m = require_node(diagram, index, node, text or tower.format(node))
    previous = tower.level_of(index - 1) if index > 0 else None
    following = tower.level_of(index + 1)
    return {
        "level": level_to_json(tower.level_of(index)),
        "label": tower.format(node),
        "multiplicity": m,
        "dimension": tower.dimension(index, node),
        "parents": [
            {"label": tower.format(p), "level": level_to_json(previous), "edges": e}
            for p, e in diagram.parents(index, node)
        ]
        if previous is not None
        else [],
        "children": [
            {"label": tower.format(c), "level": level_to_json(following), "edges": e}
            for c, e in diagram.children(index, node)
        ],
    }
