"""Labels of cell modules, and which node of the tower each one's simple quotient belongs to.

A cell module is labelled by one partition per colour of propagating blocks (two for walled
Brauer: α for the letter v, β for d), so that the Specht module of S_t (S_a × S_b) it carries is
the one of those partitions (the 1996 definition of cellular algebras; Martin 1994 for the partition algebras;
a 2008 study of the walled Brauer algebras for those).

| kind | cell labels at level k | read on input as | matched to the tower's node at x = N |
|---|---|---|---|
| partition P_k | λ̄ with |λ̄| ≤ k | a partition of N is the node's label, any other λ̄ | (N − |λ̄|, λ̄) |
| partition P_{k+1/2} | λ̄ with |λ̄| ≤ k | a partition of N−1 is the node's label | (N − 1 − |λ̄|, λ̄) |
| brauer, O(N) | λ with |λ| = k, k−2, ... | λ | λ |
| brauer, Sp(N) at −N | λ with |λ| = k, k−2, ... | λ | the conjugate λ′ |
| temperley-lieb | t through lines, t ≡ k mod 2 | (t) (one row), t, or (a,b) with a+b = k, t = a−b | (t) |
| symmetric-group CS_k | λ ⊢ k | λ | λ (when it has at most N rows) |
| walled-brauer | ((α),(β)), |α| = r−j, |β| = s−j | the pair | the same pair |

The symplectic twist: B_k(−N) acts on V^{⊗k} through a sign on every crossing (a transposition
acts as minus the flip), so the Specht factor of the cell module of λ is tensored with the sign
and the simple module of cell λ belongs to the node λ′ (Brauer 1937; Wenzl 1988; common practice).
"""

from __future__ import annotations

from dataclasses import dataclass
from typing import TYPE_CHECKING, Hashable

from engine.errors import UserError
from engine.partition_pairs import format_pair, parse_pair
from engine.partitions import Partition, conjugate, format_partition, parse_partition, partitions_of

if TYPE_CHECKING:
    from engine.capabilities import AlgebraLevel


@dataclass(frozen=True)
class CellLabel:
    """One cell module's label: a partition per colour of propagating blocks."""

    shapes: tuple[Partition, ...]
    text: str

    @property
    def counts(self) -> tuple[int, ...]:
        return tuple(sum(s) for s in self.shapes)


def _rank_k(level: "AlgebraLevel") -> int:
    """The k of the level: vertices per row, less one at a half level."""
    return level.vertices - 1 if level.half else level.vertices


def _make(level: "AlgebraLevel", shapes: tuple[Partition, ...]) -> CellLabel:
    if level.kind == "walled-brauer":
        return CellLabel(shapes, format_pair((shapes[0], shapes[1])))
    return CellLabel(shapes, format_partition(shapes[0]))


def cell_labels(level: "AlgebraLevel") -> list[CellLabel]:
    """Every cell label of the level: the largest propagating number first, partitions in the
    order of ``engine.partitions.partitions_of``."""
    k, kind = _rank_k(level), level.kind
    if kind == "partition":
        return [_make(level, (p,)) for t in range(k, -1, -1) for p in partitions_of(t)]
    if kind == "brauer":
        return [_make(level, (p,)) for t in range(k, -1, -2) for p in partitions_of(t)]
    if kind == "temperley-lieb":
        return [_make(level, ((t,) if t else (),)) for t in range(k, -1, -2)]
    if kind == "symmetric-group":
        return [_make(level, (p,)) for p in partitions_of(k)]
    if kind == "walled-brauer":
        v, d = level.word.count("v"), level.word.count("d")
        return [_make(level, (a, b)) for j in range(min(v, d) + 1)
                for a in partitions_of(v - j) for b in partitions_of(d - j)]
    raise UserError(f"unknown kind of diagram algebra {kind!r}")


def read_cell_label(level: "AlgebraLevel", text: str) -> CellLabel:
    """A cell label typed by the user, read as the table in the module docstring says."""
    k, kind = _rank_k(level), level.kind
    accepted = ", ".join(label.text for label in cell_labels(level)[:8])
    more = " ..." if len(cell_labels(level)) > 8 else ""
    if kind == "walled-brauer":
        pair = parse_pair(text)
        label = _make(level, (pair[0], pair[1]))
    else:
        p = parse_partition(text)
        if kind == "partition":
            whole = level.n - 1 if level.half else level.n
            if sum(p) == whole and p:
                p = p[1:]
        elif kind == "temperley-lieb":
            if len(p) == 2 and sum(p) == k:
                p = (p[0] - p[1],)
            elif len(p) > 1:
                raise UserError(f"{text.strip()} is not a cell label of {level.name}: write the number of "
                                f"through lines t as (t), or (a,b) with a+b = {k} (t = a−b)")
            p = (p[0],) if p and p[0] else ()
        label = _make(level, (p,))
    if label not in cell_labels(level):
        raise UserError(f"{text.strip()} is not a cell label of {level.name} (labels: {accepted}{more})")
    return label


def node_of(level: "AlgebraLevel", label: CellLabel) -> Hashable | None:
    """The tower node whose simple module is the head of this cell module at x = N (the table in
    the module docstring), or None when the label names no node of that shape."""
    kind = level.kind
    shape = label.shapes[0]
    if kind == "partition":
        first = (level.n - 1 if level.half else level.n) - sum(shape)
        if first < (shape[0] if shape else 0):
            return None
        return ((first,) if first else ()) + shape
    if kind == "brauer":
        return conjugate(shape) if level.group == "symplectic" else shape
    if kind == "temperley-lieb":
        return shape
    if kind == "symmetric-group":
        return shape if len(shape) <= level.n else None
    if kind == "walled-brauer":
        a, b = label.shapes
        return (a, b) if len(a) + len(b) <= level.n else None
    return None


def matching_note(level: "AlgebraLevel") -> str:
    """One line: how the level's cell labels are matched to the tower's nodes."""
    kind = level.kind
    if kind == "partition":
        first = "N−1−|λ̄|" if level.half else "N−|λ̄|"
        return f"cell λ̄ ↔ node ({first}, λ̄)"
    if kind == "brauer" and level.group == "symplectic":
        return "cell λ ↔ node λ′ (the conjugate: the sign twist of the symplectic action)"
    if kind == "temperley-lieb":
        return "cell with t through lines ↔ node (t)"
    if kind == "walled-brauer":
        return "cell ((α),(β)) ↔ node ((α),(β))"
    return "cell λ ↔ node λ"
