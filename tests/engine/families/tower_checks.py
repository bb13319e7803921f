"""Checks shared by the classical towers' tests: the size estimate is an upper bound, the
tower's own parents agree with inverting its children (the diagram's fallback), and partitions
listed by sympy (an outside enumeration) for the level rules."""

from __future__ import annotations

from sympy.utilities.iterables import partitions as sympy_partitions

from engine.diagram import Diagram


def partitions_by_sympy(size: int, rows: int | None = None) -> list[tuple[int, ...]]:
    """The partitions of ``size`` with at most ``rows`` parts, as tuples, listed by sympy."""
    if size == 0:
        return [()]
    found = sympy_partitions(size) if rows is None else sympy_partitions(size, m=rows)
    return [tuple(sorted((a for a, m in p.items() for _ in range(m)), reverse=True)) for p in found]


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


def assert_labels_round_trip(diagram: Diagram, upto: int) -> None:
    """parse(format(node), level) == node for every node with a path (the tower contract)."""
    tower = diagram.tower
    for index in range(upto + 1):
        for node in diagram.nodes(index):
            assert tower.parse(tower.format(node), index) == node
