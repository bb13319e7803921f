"""The one protocol every family implements.

A tower is a graded graph: level 0 holds the root (the trivial module); the edges from
level i to level i+1 say how each irreducible module at level i decomposes after one step
(tensoring with V, or restricting to / inducing from a subgroup at half levels).

Levels are addressed by a step *index* 0, 1, 2, ...; ``level_of(index)`` gives the level
value (``index / steps_per_unit``: 0, 1/2, 1, ... for towers with half levels).

Contract for implementers (held by tests/engine/test_tower_contract.py):
- ``children(index, node)`` lists each child once with its positive edge count, and depends
  only on ``(step_key(index), node)``, so the diagram may cache it;
- every child of a node with a path has a path (the diagram keeps exactly the reached nodes);
- Σ over children of edges·dim(child) = (dim of the step) · dim(node), so that
  Σ_level m·dim = tensor_dimension(index);
- nodes are hashable and ``parse(format(node), index) == node``.
"""

from __future__ import annotations

from abc import ABC, abstractmethod
from fractions import Fraction
from typing import Callable, Hashable, Iterable, Sequence, TypeVar

from engine.capabilities import C, Capability
from engine.errors import LabelError, UserError

Node = Hashable
Edge = tuple[Node, int]
T = TypeVar("T")


class Tower(ABC):
    """Base class of all towers; subclasses fill in the abstract methods."""

    #: the family name, as in specs (``symmetric``)
    family: str = ""
    #: 2 for towers with half levels (index 1 is level 1/2), else 1
    steps_per_unit: int = 1
    #: index of the last level, or None for an infinite tower
    max_index: int | None = None

    def __init__(self, spec: str) -> None:
        self.spec = spec

    # ----- levels -------------------------------------------------------------------------
    def level_of(self, index: int) -> Fraction:
        return Fraction(index, self.steps_per_unit)

    def index_of(self, level: Fraction) -> int:
        """The step index of a level value; a UserError when the tower has no such level."""
        from engine.errors import UserError
        from engine.levels import format_level

        if level < 0:
            raise UserError(f"{self.spec} has no level {format_level(level)} (levels start at 0)")
        scaled = level * self.steps_per_unit
        if scaled.denominator != 1:
            kind = "integer and half levels" if self.steps_per_unit == 2 else "integer levels only"
            raise UserError(f"{self.spec} has no level {format_level(level)} (it has {kind})")
        index = int(scaled)
        if self.max_index is not None and index > self.max_index:
            raise UserError(
                f"level {format_level(level)} is past the end of {self.spec} "
                f"(its last level is {format_level(self.level_of(self.max_index))})"
            )
        return index

    def check_index(self, index: int) -> None:
        if index < 0 or (self.max_index is not None and index > self.max_index):
            self.index_of(self.level_of(index))

    def step_key(self, index: int) -> Hashable:
        """children(index, node) depends only on (step_key(index), node)."""
        return index

    def space_key(self, index: int) -> Hashable:
        """Levels with the same space key share one numbering of their nodes in the diagram's
        sweep (``engine.path_counts``), and ``dimension(index, node)`` must depend only on
        (space_key(index), node).  By default every level is its own space; towers whose levels
        repeat a node set (finite towers, the two kinds of level of S_N) say so to be swept faster."""
        return index

    def level_kind(self, index: int) -> str:
        """A short word for the group acting at this level (e.g. ``S_4`` or ``S_3``)."""
        return ""

    # ----- graph ----------------------------------------------------------------------------
    @abstractmethod
    def root(self) -> Node:
        """The node at level 0: the trivial module."""

    @abstractmethod
    def children(self, index: int, node: Node) -> Sequence[Edge]:
        """Nodes of level index+1 joined to ``node`` (at level ``index``), with edge counts."""

    def parents(self, index: int, node: Node) -> Sequence[Edge] | None:
        """Candidates at level index−1 joined to ``node``, with edge counts, or None when the
        family cannot say without the previous level (the diagram then inverts ``children``).
        Candidates may include nodes without a path; the diagram filters them."""
        return None

    # ----- numbers --------------------------------------------------------------------------
    @abstractmethod
    def dimension(self, index: int, node: Node) -> int:
        """Dimension of the group's (or subgroup's, at half levels) irreducible module."""

    @abstractmethod
    def tensor_dimension(self, index: int) -> int:
        """Dimension of the tensor space at this level ((dim V)^k)."""

    # ----- capabilities ---------------------------------------------------------------------
    def capabilities(self) -> Sequence[Capability]:
        """What the family knows beyond the graph (``engine.capabilities``); none by default."""
        return ()

    def capability(self, kind: type[C]) -> C | None:
        """The capability of that kind the family declares, or None."""
        cache = self.__dict__.get("_capabilities")
        if cache is None:
            cache = self.__dict__["_capabilities"] = tuple(self.capabilities())
        for found in cache:
            if isinstance(found, kind):
                return found
        return None

    # ----- labels ---------------------------------------------------------------------------
    @abstractmethod
    def format(self, node: Node) -> str:
        """The label of a node, as in the CLI contract."""

    @abstractmethod
    def parse(self, text: str, index: int) -> Node:
        """The node at level ``index`` whose label is ``text``; LabelError when there is none."""

    def sort_key(self, node: Node, index: int = 0) -> object:
        """Order of nodes within level ``index``."""
        return node

    def sort_nodes(self, nodes: Iterable[Node], index: int) -> list[Node]:
        """The nodes of level ``index`` in display order (by ``sort_key``; a family may do it faster)."""
        key = self.sort_key
        return sorted(nodes, key=lambda node: key(node, index))

    def label_error(self, text: str, index: int, expected: str, listed: bool = False) -> LabelError:
        """The one-line error for a label that names no node at the level; unless ``expected``
        already lists the level's nodes (``listed``), it says how to list them."""
        from engine.levels import format_level
        from engine.numbers_in import quote

        level = format_level(self.level_of(index))
        hint = "" if listed else f"; `towerscope levels {self.spec} --at {level}` lists the nodes there"
        return LabelError(f"{quote(text, 60)} is not a node of {self.spec} at level {level} (expected {expected}){hint}")

    def read_label(
        self, text: str, index: int, expected: str, read: Callable[[str], T], fits: Callable[[T], bool]
    ) -> T:
        """``read(text)`` when it reads (no UserError) and ``fits`` the level; otherwise the
        ``label_error`` that names what was ``expected``."""
        try:
            value = read(text)
        except UserError as exc:
            raise self.label_error(text, index, expected) from exc
        if not fits(value):
            raise self.label_error(text, index, expected)
        return value
