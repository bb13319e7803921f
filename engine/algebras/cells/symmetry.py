"""Splitting a Gram matrix by a symmetry of the half diagrams, to make its determinant cheaper.

A vertex permutation w that maps the level's half diagrams to half diagrams acts on a cell module
whose Specht module is one-dimensional as a signed permutation R of the basis (h ↦ ε·w(h), ε = ±1
the Specht character of the induced permutation of propagating blocks).  The pairing of two half
diagrams only sees how their blocks meet, so R keeps the form: ⟨R a, R b⟩ = ⟨a, b⟩ (for a
permutation diagram w of the algebra this is the invariance of the form).  With R^m = 1, the space
is the direct sum of V_d = ker Φ_d(R), d | m (Φ_d the cyclotomic polynomials: x^m − 1 = ∏ Φ_d has
no repeated factor), and the V_d are orthogonal for the form, since Φ_d is self-reciprocal and
Φ_d(R) is invertible on V_e for e ≠ d (common practice; e.g. Serre, *Linear Representations of
Finite Groups*, 1977, §12 for the rational decomposition).  In the basis C of the V_d's

    det G = ∏_d det G_d / det(C)²,

and several determinants of smaller size and degree replace one (the work of evaluation and
interpolation falls with the fifth power of the size).  Which symmetry:

- the rotation i ↦ i+1 (mod r) where it keeps the half diagrams: Temperley–Lieb with no through
  line (non-crossing perfect matchings of points on a circle), and any vertex permutation for the
  partition and Brauer algebras (not at half levels);
- otherwise the reflection i ↦ r+1−i (Temperley–Lieb with through lines; walled Brauer for a word
  that reads the same backwards).
"""

from __future__ import annotations

from fractions import Fraction
from typing import TYPE_CHECKING

from engine.algebras.cells.modules import CellModule

if TYPE_CHECKING:
    from engine.algebras.cells.gram import GramMatrix


def _vertex_map(module: CellModule) -> tuple[int, ...] | None:
    """The vertex permutation to split by (image of each vertex 0..r−1), or None."""
    level = module.level
    r = module.r
    if module.specht_size != 1 or level.half or len(module.halves) < 4:
        return None
    rotation = tuple((i + 1) % r for i in range(r))
    reflection = tuple(r - 1 - i for i in range(r))
    if level.kind in ("partition", "brauer"):
        return rotation
    if level.kind == "temperley-lieb":
        return rotation if sum(module.label.counts) == 0 else reflection
    if level.kind == "walled-brauer" and level.word == level.word[::-1]:
        return reflection
    return None


def applies(module: CellModule) -> bool:
    return _vertex_map(module) is not None


def _signed_images(module: CellModule, w: tuple[int, ...]) -> list[tuple[int, int]]:
    r = module.r
    diagram = tuple(sorted((w[i], r + i) for i in range(r)))
    out = []
    for h in module.halves:
        blocks, marks = h
        if sum(module.label.counts) == 0:
            moved = sorted((tuple(sorted(w[v] for v in block)), mark) for block, mark in zip(blocks, marks))
            image = (tuple(b for b, _ in moved), tuple(m for _, m in moved))
            out.append((module.half_index[image], 1))
            continue
        found = module.glue(diagram, h)
        assert found is not None
        image, _, perms = found
        out.append((module.half_index[image], int(module.specht_matrix(perms)[0][0])))
    return out


def _cycles(images: list[tuple[int, int]]) -> list[tuple[list[int], list[int], int]]:
    """The cycles of a signed permutation: (positions i_k, signs σ_k with R^k e_{i_0} = σ_k e_{i_k},
    the sign s with R^L e_{i_0} = s e_{i_0})."""
    seen = [False] * len(images)
    out = []
    for start in range(len(images)):
        if seen[start]:
            continue
        positions, signs = [start], [1]
        seen[start] = True
        j, sign = images[start]
        while j != start:
            seen[j] = True
            positions.append(j)
            signs.append(sign)
            j, step = images[j]
            sign *= step
        out.append((positions, signs, sign))
    return out


def split(module: CellModule, gram: "GramMatrix") -> tuple[list["GramMatrix"], int]:
    """(the blocks G_d, det(C)²) for a module where ``applies``.

    On a cycle e, Re, ..., R^(L−1)e of R with R^L e = s·e the cycle's span is Q[x]/(x^L − s), and
    ker Φ_d(R) there has the basis x^j·(x^L − s)/Φ_d(x), j < φ(d), for the Φ_d dividing x^L − s."""
    import flint

    from engine.algebras.cells.gram import GramMatrix

    w = _vertex_map(module)
    assert w is not None
    vectors: dict[int, list[list[tuple[int, int]]]] = {}
    change_squared = 1
    for positions, signs, s in _cycles(_signed_images(module, w)):
        length = len(positions)
        target = flint.fmpz_poly([-s] + [0] * (length - 1) + [1])
        columns = []
        for d in range(1, 2 * length + 1):
            if (2 * length) % d or (s == 1) != (length % d == 0):
                continue
            phi = flint.fmpz_poly.cyclotomic(d)
            quotient = target // phi
            for j in range(phi.degree()):
                coefficients = [int(c) for c in (quotient * flint.fmpz_poly([0] * j + [1])).coeffs()]
                vector = [(positions[k], c * signs[k]) for k, c in enumerate(coefficients) if c]
                vectors.setdefault(d, []).append(vector)
                columns.append(coefficients + [0] * (length - len(coefficients)))
        assert len(columns) == length
        change_squared *= int(flint.fmpz_mat(columns).det()) ** 2
    # B_dᵀ·G_c·B_d for every power x^c of the entries, as python-flint integer matrix products
    by_power: dict[int, list[list[int]]] = {}
    for i, row in enumerate(gram.rows):
        for j, c, q in row:
            assert q.denominator == 1
            dense = by_power.get(c)
            if dense is None:
                dense = by_power[c] = [[0] * gram.size for _ in range(gram.size)]
            dense[i][j] += int(q)
    powers = {c: flint.fmpz_mat(m) for c, m in by_power.items()}
    out = []
    for d in sorted(vectors):
        basis = vectors[d]
        change = [[0] * len(basis) for _ in range(gram.size)]
        for column, vector in enumerate(basis):
            for i, value in vector:
                change[i][column] = value
        b_matrix = flint.fmpz_mat(change)
        b_transposed = b_matrix.transpose()
        rows_d: list[list[tuple[int, int, Fraction]]] = [[] for _ in basis]
        for c in sorted(powers):
            block = (b_transposed * powers[c] * b_matrix).tolist()
            for a_index, values in enumerate(block):
                row = rows_d[a_index]
                row.extend((b_index, c, Fraction(int(v))) for b_index, v in enumerate(values) if v)
        for row in rows_d:
            row.sort(key=lambda entry: entry[0])
        out.append(GramMatrix(len(basis), rows_d, [Fraction(1)] * len(basis)))
    return out, change_squared
