"""The orbit basis of the partition algebra and the change of basis both ways.

For set-partition diagrams π, ρ of the same vertices write ρ ≥ π when ρ is coarser (every block of
ρ is a union of blocks of π).  The orbit basis {x_π} is defined by d_π = Σ_{ρ ≥ π} x_ρ
(a 2005 survey of partition algebras, European J. Combin., §4: x_π acts on V^{⊗k} by the
indices whose pattern of equalities is exactly π), so by Möbius inversion on the lattice of set
partitions x_π = Σ_{ρ ≥ π} μ(π, ρ) d_ρ with

    μ(π, ρ) = Π_i (−1)^{b_i − 1} (b_i − 1)!,

b_i the number of blocks of π merged into the i-th block of ρ (Stanley, *Enumerative
Combinatorics* vol. 1, Example 3.10.4; Rota, "On the foundations of combinatorial theory I", 1964).
Coarsenings of a half diagram are half diagrams, so the same holds in P_{k+1/2}.

The coarsenings of π are the set partitions of its b blocks: Bell(b) of them, up to Bell(2k) for
the diagram of singletons; ``conversion_size`` estimates the work and conversions refuse past
``LIMIT`` terms (TooLarge).
"""

from __future__ import annotations

from math import factorial
from typing import Iterator

from engine.algebras.bases import set_partitions
from engine.algebras.diagrams import Blocks
from engine.algebras.elements import Coefficient, Element, add_term
from engine.capabilities import AlgebraLevel
from engine.combinatorics import bell
from engine.errors import TooLarge, UserError

#: the most coarsenings one conversion may visit (about a second of work)
LIMIT = 2_000_000


def _merge(d: Blocks, groups: Blocks) -> Blocks:
    merged = [sorted(v for b in group for v in d[b]) for group in groups]
    merged.sort()
    return tuple(map(tuple, merged))


def coarsenings(d: Blocks) -> Iterator[tuple[Blocks, Blocks]]:
    """Every ρ ≥ d with the grouping of d's blocks that makes it: (ρ, groups of block numbers)."""
    for groups in set_partitions(len(d)):
        yield _merge(d, groups), groups


def mobius(groups: Blocks) -> int:
    """μ(π, ρ) for ρ made by merging π's blocks in ``groups`` (Stanley EC1, Example 3.10.4)."""
    value = 1
    for group in groups:
        b = len(group)
        value *= (-1) ** (b - 1) * factorial(b - 1)
    return value


def conversion_size(element: Element) -> int:
    """The number of coarsenings a conversion visits: Σ Bell(blocks of each diagram)."""
    return sum(bell(len(d)) for d in element)


def _check(element: Element, level: AlgebraLevel) -> None:
    if level.kind != "partition":
        raise UserError(f"{level.name} has no orbit basis (the orbit basis belongs to the partition algebras)")
    size = conversion_size(element)
    if size > LIMIT:
        raise TooLarge(f"changing basis would visit {size:,} coarser diagrams (the limit is {LIMIT:,}); "
                       "diagrams with fewer blocks are cheaper")


def to_orbit(element: Element, level: AlgebraLevel) -> Element:
    """Σ c_π d_π written in the orbit basis: Σ_ρ (Σ_{π ≤ ρ} c_π) x_ρ."""
    _check(element, level)
    out: Element = {}
    for d, c in element.items():
        for rho, _ in coarsenings(d):
            add_term(out, rho, c)
    return out


def from_orbit(element: Element, level: AlgebraLevel) -> Element:
    """Σ c_π x_π written in the diagram basis: Σ_π c_π Σ_{ρ ≥ π} μ(π, ρ) d_ρ."""
    _check(element, level)
    out: Element = {}
    for d, c in element.items():
        for rho, groups in coarsenings(d):
            m: Coefficient = mobius(groups)
            add_term(out, rho, c * m)
    return out


def multiply_orbit(e1: Element, e2: Element, level: AlgebraLevel, symbolic: bool = False) -> Element:
    """The product of two elements given in the orbit basis, in the orbit basis (through the
    diagram basis)."""
    from engine.algebras.products import multiply

    return to_orbit(multiply(from_orbit(e1, level), from_orbit(e2, level), level, symbolic), level)
