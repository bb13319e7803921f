"""Plain data for the ``algebra``, ``kernel`` and ``act`` commands (shared guide cli-contract.md,
"Centralizer algebras").

``algebra``: ``{"tower", "level", "algebra", "parameter", "basis", "rank", "kernel", "rank_method"}``
(the contract's fields) plus ``"squares"`` (Σm² of the level, the proven upper bound) and
``"note"`` (why the rank is Σm² when ``rank_method`` is ``"bratteli"``, else "").

``kernel``: ``{"tower", "level", "algebra", "dimension", "elements"}`` (with ``basis="orbit"``, partition
algebras: the elements are orbit-basis elements x_π with more than n blocks, and ``"basis": "orbit"``) and, where the level's algebra
has a known generator (``engine.algebras.generators``), ``"generator"`` (an element in the diagram
basis), ``"generator_orbit"`` (the same in the orbit basis, partition algebras; else null),
``"generator_acts_as_zero"``, ``"ideal_dimension"`` (computed; null when the computation is refused
as too large, then ``"ideal_note"`` says why) and ``"ideal_proved"``.  With an element to test:
``"test": {"element", "in_kernel", "ideal_dimension", "ideal_proved"}``.

``act``: ``{"tower", "level", "algebra", "space", "element", "matrix"}`` (the matrix as rows of
integers, small spaces) or, for a basis tensor, ``"tensor"`` (labels 1..n) and ``"image"``: a list
of ``{"coefficient", "tensor"}``.
"""

from __future__ import annotations

from typing import TYPE_CHECKING, Any

from engine.algebras.bases import count
from engine.algebras.elements import element_json, parse_element
from engine.errors import TooLarge, UserError
from engine.export.algebra_documents import algebra_at
from engine.levels import level_to_json

if TYPE_CHECKING:
    from engine.tower import Tower

#: the largest space whose whole matrix ``act`` prints
MATRIX_SIDE_LIMIT = 81


def squares_at(tower: "Tower", index: int, progress=None) -> int:
    """Σm² of the level (the dimension of the centralizer), from the Bratteli diagram."""
    from engine.diagram import Diagram

    return Diagram(tower).sums(index, progress=progress).squares


def algebra_document(tower: "Tower", index: int, progress=None) -> dict[str, Any]:
    from engine.algebras.kernel import image_rank

    level = algebra_at(tower, index)
    upper = squares_at(tower, index)
    report = image_rank(level, upper, progress)
    basis = count(level)
    return {
        "tower": tower.spec,
        "level": level_to_json(tower.level_of(index)),
        "algebra": level.name,
        "parameter": level.parameter,
        "basis": basis,
        "rank": report.rank,
        "kernel": basis - report.rank,
        "rank_method": report.method,
        "squares": upper,
        "note": report.note if report.method == "bratteli" else "",
    }


def _ideal(element, level, upper) -> tuple[int | None, bool, str]:
    from engine.algebras.ideal import ideal_dimension

    try:
        found = ideal_dimension(element, level, upper)
    except TooLarge as exc:
        return None, False, str(exc)
    return found.dimension, found.proved, ""


def _acts_as_zero(element, level) -> bool | None:
    from engine.algebras.action import acts_as_zero

    try:
        return acts_as_zero(element, level)
    except TooLarge:
        return None


def kernel_document(tower: "Tower", index: int, how_many: int = 20, test: str | None = None,
                    progress=None, basis: str = "diagram") -> dict[str, Any]:
    from engine.algebras.generators import known_generator
    from engine.algebras.kernel import kernel_elements, orbit_kernel_elements

    if basis not in ("diagram", "orbit"):
        raise UserError(f"unknown basis {basis!r}: use diagram or orbit")
    level = algebra_at(tower, index)
    upper = squares_at(tower, index)
    orbit = basis == "orbit"
    if orbit and level.kind != "partition":
        raise UserError(f"{level.name} has no orbit basis (the orbit basis belongs to the partition algebras)")
    found = kernel_elements(level, upper, 0 if orbit else how_many, progress)
    elements = orbit_kernel_elements(level, min(how_many, found.dimension)) if orbit else found.elements
    document: dict[str, Any] = {
        "tower": tower.spec,
        "level": level_to_json(tower.level_of(index)),
        "algebra": level.name,
        "dimension": found.dimension,
        "elements": [element_json(e, level) for e in elements],
    }
    if orbit:
        document["basis"] = "orbit"
    generator = known_generator(level) if found.dimension else None
    if generator is not None:
        ideal, proved, note = _ideal(generator.element, level, found.dimension)
        document.update({
            "generator": element_json(generator.element, level),
            "generator_orbit": element_json(generator.orbit, level) if generator.orbit is not None else None,
            "generator_description": generator.description,
            "generator_acts_as_zero": _acts_as_zero(generator.element, level),
            "ideal_dimension": ideal,
            "ideal_proved": proved,
            "ideal_note": note,
        })
    if test is not None:
        element = parse_element(test, level)
        zero = _acts_as_zero(element, level)
        bound = found.dimension if zero else None
        ideal, proved, note = _ideal(element, level, bound)
        document["test"] = {"element": element_json(element, level), "in_kernel": zero,
                            "ideal_dimension": ideal, "ideal_proved": proved, "ideal_note": note}
    return document


def parse_tensor(text: str, n: int) -> tuple[int, ...]:
    """``1,2,1`` (or ``1 2 1``) → 0-based labels; UserError past 1..n."""
    parts = text.replace(",", " ").split()
    try:
        labels = tuple(int(p) - 1 for p in parts)
    except ValueError:
        raise UserError(f"cannot read the tensor {text[:60]!r}: write its labels 1..{n}, e.g. 1,2,1") from None
    if any(not 0 <= a < n for a in labels):
        raise UserError(f"tensor labels run from 1 to {n}, got {text[:60]}")
    return labels


def act_document(tower: "Tower", index: int, element_text: str, tensor: str | None = None) -> dict[str, Any]:
    from engine.algebras.action import element_matrix, image_of_tensor, space_dimension

    level = algebra_at(tower, index)
    element = parse_element(element_text, level)
    side = space_dimension(level)
    document: dict[str, Any] = {
        "tower": tower.spec,
        "level": level_to_json(tower.level_of(index)),
        "algebra": level.name,
        "space": side,
        "element": element_json(element, level),
    }
    if tensor is not None:
        labels = parse_tensor(tensor, level.n)
        image = image_of_tensor(element, level, labels)
        document["tensor"] = [a + 1 for a in labels]
        document["image"] = [{"coefficient": c, "tensor": [a + 1 for a in t]} for t, c in image.items()]
        return document
    if side > MATRIX_SIDE_LIMIT:
        raise TooLarge(f"the matrix of {level.name} on V^⊗k is {side:,} × {side:,} (whole matrices are printed up to "
                       f"{MATRIX_SIDE_LIMIT} × {MATRIX_SIDE_LIMIT}); ask for the image of one tensor with --tensor")
    matrix = element_matrix(element, level)
    document["matrix"] = [[matrix.get(i, {}).get(j, 0) for j in range(side)] for i in range(side)]
    return document
