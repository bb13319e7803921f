"""Splitting a Gram matrix by the left–right reflection, to make its determinant cheaper.

The reflection w0 of the vertices (i ↦ r+1−i) acts on a cell module whose Specht module is
one-dimensional as a signed permutation A of the half diagrams (h ↦ ε·w0(h), ε = ±1 the Specht
character of the induced permutation).  The pairing of half diagrams only sees how their blocks
meet, so ⟨A a, A b⟩ = ⟨a, b⟩: for the permutation diagram w0 of the algebra this is the form's
invariance, and for Temperley–Lieb (where w0 is not a diagram of the algebra) the reflection of a
planar picture is planar and keeps every loop.  As A is an involution, its ±1 eigenspaces are
orthogonal for the form, so in the basis e_h ± ε·e_{w0 h} (e_h for half diagrams fixed by A)

    det G = det G₊ · det G₋ / 4^(pairs),

and two determinants of half the size and half the degree replace one (about 16 times less work
by evaluation and interpolation).  Used where it applies: one-dimensional Specht modules, and the
reflection must keep the algebra (not at half levels of the partition tower; walled Brauer only
for a word that reads the same backwards).
"""

from __future__ import annotations

from fractions import Fraction
from typing import TYPE_CHECKING

from engine.algebras.cells.modules import CellModule

if TYPE_CHECKING:
    from engine.algebras.cells.gram import GramMatrix


def reflection_applies(module: CellModule) -> bool:
    level = module.level
    if module.specht_size != 1 or level.half or len(module.halves) < 4:
        return False
    return level.kind != "walled-brauer" or level.word == level.word[::-1]


def split(module: CellModule, gram: "GramMatrix") -> tuple["GramMatrix", "GramMatrix", int]:
    """(G₊, G₋, number of swapped pairs) for a module where ``reflection_applies``."""
    from engine.algebras.cells.gram import GramMatrix

    r = module.r
    w0 = tuple(sorted((i, r + r - 1 - i) for i in range(r)))
    image: list[tuple[int, int]] = []
    for h in module.halves:
        found = module.glue(w0, h)
        assert found is not None
        half, _, perms = found
        sign = int(module.specht_matrix(perms)[0][0])
        image.append((module.half_index[half], sign))
    plus: list[list[tuple[int, int]]] = []   # each vector as [(half index, coefficient)]
    minus: list[list[tuple[int, int]]] = []
    pairs = 0
    for i, (j, sign) in enumerate(image):
        if j == i:
            (plus if sign == 1 else minus).append([(i, 1)])
        elif i < j:
            pairs += 1
            plus.append([(i, 1), (j, sign)])
            minus.append([(i, 1), (j, -sign)])
    dense_rows = [{} for _ in range(gram.size)]
    for i, row in enumerate(gram.rows):
        for j, c, q in row:
            dense_rows[i][j] = (c, q)

    def restricted(vectors: list[list[tuple[int, int]]]) -> GramMatrix:
        rows = []
        for a in vectors:
            row = []
            for b_index, b in enumerate(vectors):
                terms: dict[int, Fraction] = {}
                for i, ca in a:
                    for j, cb in b:
                        entry = dense_rows[i].get(j)
                        if entry is not None:
                            c, q = entry
                            terms[c] = terms.get(c, Fraction(0)) + ca * cb * q
                row.extend((b_index, c, q) for c, q in terms.items() if q)
            rows.append(row)
        return GramMatrix(len(vectors), rows, [Fraction(1)] * len(vectors))

    return restricted(plus), restricted(minus), pairs
