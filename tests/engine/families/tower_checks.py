"""Checks shared by the classical towers' tests: the size estimate is an upper bound, and the
tower's own parents agree with inverting its children (the diagram's fallback)."""

from __future__ import annotations

from engine.diagram import Diagram


def edges_walked(diagram: Diagram, upto: int) -> int:
    """The edges the diagram walks to build levels 0..upto (one per child of every node)."""
    return sum(len(diagram.children(i, node)) for i in range(upto) for node in diagram.level(i))


def assert_parents_invert_children(diagram: Diagram, upto: int) -> None:
    tower = diagram.tower
    for index in range(1, upto + 1):
        inverted: dict = {}
        for parent in diagram.level(index - 1):
            for child, e in tower.children(index - 1, parent):
                inverted.setdefault(child, {})[parent] = e
        for node in diagram.level(index):
            assert dict(diagram.parents(index, node)) == inverted[node]
