"""Plain data for the ``diagrams`` and ``multiply`` commands (shared guide cli-contract.md,
"Centralizer algebras").

``diagrams``: ``{"tower", "level", "algebra", "total", "start", "diagrams": [{"rank", "diagram"}]}``.
``multiply``: ``{"tower", "level", "algebra", "parameter", "basis", "product": ELEMENT}``;
``parameter`` is the loop value the product used (an int, ``null`` for CS_k) or ``"x"`` when it was
kept as a symbol, and then every coefficient in ``product`` is a list of integers, the polynomial's
coefficients constant term first; ``basis`` is ``"diagram"`` or ``"orbit"`` (the orbit basis of the
partition algebra: the factors were read and the product is written in it).
"""

from __future__ import annotations

from itertools import islice
from math import ceil
from typing import TYPE_CHECKING, Any

from engine.algebras.bases import MAX_VERTICES, check_size, iter_basis
from engine.algebras.bases import count as basis_count
from engine.algebras.diagrams import Blocks, format_diagram
from engine.algebras.elements import Element, element_json, parse_element
from engine.capabilities import AlgebraLevel, DiagramAlgebra, require
from engine.errors import UserError
from engine.levels import level_to_json

if TYPE_CHECKING:
    from engine.tower import Tower

BASES = ("diagram", "orbit")


def algebra_at(tower: "Tower", index: int) -> AlgebraLevel:
    """The diagram algebra of the level; the one-line UserError of ``missing`` without one, and
    TooLarge (before the algebra is named) past ``MAX_VERTICES`` vertices per row."""
    found = require(tower, DiagramAlgebra)
    level_value = tower.level_of(index)
    if level_value > MAX_VERTICES:
        check_size(ceil(level_value), f"level {level_value}")
    return found.at(index)


def diagram_page(level: AlgebraLevel, start: int, count: int) -> list[tuple[int, Blocks]]:
    """(rank, diagram) for ranks start .. start+count−1 (fewer at the end)."""
    total = basis_count(level)
    if count < 0:
        raise UserError(f"--count must be 0 or more, got {count}")
    if not 0 <= start < total:
        raise UserError(f"no diagram of rank {start} in {level.name}: ranks run from 0 to {total - 1}")
    return list(enumerate(islice(iter_basis(level, start), count), start))


def diagrams_document(tower: "Tower", index: int, start: int, count: int) -> dict[str, Any]:
    level = algebra_at(tower, index)
    return {
        "tower": tower.spec,
        "level": level_to_json(tower.level_of(index)),
        "algebra": level.name,
        "total": basis_count(level),
        "start": start,
        "diagrams": [{"rank": rank, "diagram": format_diagram(d, level.vertices)}
                     for rank, d in diagram_page(level, start, count)],
    }


def product(level: AlgebraLevel, first: str, second: str, symbolic: bool = False, basis: str = "diagram") -> Element:
    """The product of two elements written in the contract's text form, in ``basis``."""
    if basis not in BASES:
        raise UserError(f"unknown basis {basis!r}: use one of {', '.join(BASES)}")
    a, b = parse_element(first, level), parse_element(second, level)
    if basis == "orbit":
        from engine.algebras.orbit import multiply_orbit

        return multiply_orbit(a, b, level, symbolic)
    from engine.algebras.products import multiply

    return multiply(a, b, level, symbolic)


def product_document(tower: "Tower", index: int, first: str, second: str, symbolic: bool = False,
                     basis: str = "diagram") -> dict[str, Any]:
    level = algebra_at(tower, index)
    result = product(level, first, second, symbolic, basis)
    return {
        "tower": tower.spec,
        "level": level_to_json(tower.level_of(index)),
        "algebra": level.name,
        "parameter": "x" if symbolic else level.parameter,
        "basis": basis,
        "product": element_json(result, level),
    }
