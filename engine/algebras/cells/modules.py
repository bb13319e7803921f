"""Cell modules: the basis (half diagram ⊗ Specht basis vector), the action of a diagram, and the
bilinear form (the 1996 paper that defined cellular algebras, §1 and §4;
Martin 1994 and a 2005 survey for partition algebras).

The cell module W(λ) of a label λ with t propagating blocks has the basis h ⊗ v_T: h a half
diagram with t propagating blocks (``half_diagrams``), T a standard tableau of λ (per colour; the
Specht module in Young's seminormal form, ``specht``), listed h first, then T.

**Action.** A diagram d acts on h by gluing d's bottom row to h's vertices: if two propagating
blocks of h meet, or one of them meets no top vertex of d, the result is 0 (fewer propagating
blocks); otherwise it is x^c·h' ⊗ σ·v, where h' is the top row's half diagram (its propagating
blocks those joined to h's), c the number of closed components in the middle (no top vertex, no
propagating block), and σ the permutation taking the i-th propagating block of h (per colour, in
block order) to the position of its block in h'.

**Form.** ⟨h1 ⊗ v, h2 ⊗ w⟩ glues h1 and h2 along their vertices: zero unless every component that
holds a propagating block holds exactly one of h1 and one of h2; then x^c·⟨v, σ·w⟩_λ, c the
components without propagating blocks, σ taking the i-th propagating block of h2 to the position
of its partner in h1, ⟨,⟩_λ the S_t-invariant form of the Specht module.  The form is invariant:
⟨d·a, b⟩ = ⟨a, d*·b⟩, d* the diagram turned upside down (tested).
"""

from __future__ import annotations

from fractions import Fraction
from functools import cached_property
from itertools import product
from typing import TYPE_CHECKING

from engine.algebras.cells import specht
from engine.algebras.cells.half_diagrams import FIXED, UNMARKED, HalfDiagram, half_diagrams
from engine.algebras.cells.labels import CellLabel

if TYPE_CHECKING:
    from engine.capabilities import AlgebraLevel

Blocks = tuple[tuple[int, ...], ...]
Perms = tuple[tuple[int, ...], ...]


def _kron(matrices: list[specht.Matrix]) -> specht.Matrix:
    out: specht.Matrix = ((Fraction(1),),)
    for m in matrices:
        out = tuple(tuple(a * b for a in row_a for b in row_b) for row_a in out for row_b in m)
    return out


class CellModule:
    """The cell module of ``label`` for the algebra of ``level``."""

    def __init__(self, level: "AlgebraLevel", label: CellLabel) -> None:
        self.level = level
        self.label = label
        self.r = level.vertices
        self.colours = len(label.shapes)

    @cached_property
    def halves(self) -> list[HalfDiagram]:
        return list(half_diagrams(self.level, self.label.counts))

    @cached_property
    def half_index(self) -> dict[HalfDiagram, int]:
        return {h: i for i, h in enumerate(self.halves)}

    @cached_property
    def specht_size(self) -> int:
        size = 1
        for shape in self.label.shapes:
            size *= len(specht.standard_tableaux(shape))
        return size

    @property
    def dimension(self) -> int:
        return len(self.halves) * self.specht_size

    @cached_property
    def specht_form(self) -> tuple[Fraction, ...]:
        """The diagonal of the Specht module's invariant form (product over colours)."""
        out = [Fraction(1)]
        for shape in self.label.shapes:
            out = [a * b for a in out for b in specht.form(shape)]
        return tuple(out)

    def specht_matrix(self, perms: Perms) -> specht.Matrix:
        """σ (one permutation per colour) on the Specht basis (Kronecker product over colours)."""
        cache = self.__dict__.setdefault("_specht_matrices", {})
        found = cache.get(perms)
        if found is None:
            found = _kron([specht.matrix(shape, perm) for shape, perm in zip(self.label.shapes, perms)])
            if len(cache) < 4096:  # bounded: S_t has t! permutations
                cache[perms] = found
        return found

    # ----- the form ------------------------------------------------------------------------------
    def pair(self, h1: HalfDiagram, h2: HalfDiagram) -> tuple[int, Perms] | None:
        """(c, σ) of the form's block ⟨h1 ⊗ ·, h2 ⊗ ·⟩ = x^c·Γ·σ, or None when it is zero."""
        blocks1, marks1 = h1
        blocks2, marks2 = h2
        m1 = len(blocks1)
        parent = list(range(m1 + len(blocks2)))

        def find(a: int) -> int:
            while parent[a] != a:
                parent[a] = parent[parent[a]]
                a = parent[a]
            return a

        owner = [0] * self.r
        for b, block in enumerate(blocks1):
            for v in block:
                owner[v] = b
        for b, block in enumerate(blocks2, m1):
            for v in block:
                ra, rb = find(owner[v]), find(b)
                if ra != rb:
                    parent[ra] = rb
        first: dict[int, int] = {}
        second: dict[int, int] = {}
        for b in range(m1 + len(blocks2)):
            mark = marks1[b] if b < m1 else marks2[b - m1]
            if mark == UNMARKED:
                continue
            side = first if b < m1 else second
            root = find(b)
            if root in side:
                return None
            side[root] = b
        if first.keys() != second.keys():
            return None
        position1 = self._positions(marks1)
        position2 = self._positions(marks2)
        perms = [[0] * sum(self.label.shapes[c]) for c in range(self.colours)]
        for root, b1 in first.items():
            b2 = second[root] - m1
            c1, c2 = marks1[b1], marks2[b2]
            if c1 != c2:
                return None
            if c1 == FIXED:
                continue
            perms[c1][position2[b2]] = position1[b1]
        roots = {find(b) for b in range(m1 + len(blocks2))}
        return len(roots) - len(first), tuple(tuple(p) for p in perms)

    @staticmethod
    def _positions(marks: tuple[int, ...]) -> dict[int, int]:
        """Block number → its position among the propagating blocks of its colour."""
        seen: dict[int, int] = {}
        out = {}
        for b, mark in enumerate(marks):
            if mark >= 0:
                out[b] = seen.get(mark, 0)
                seen[mark] = out[b] + 1
        return out

    def form_block(self, i: int, j: int) -> tuple[int, specht.Matrix] | None:
        """The block of the Gram matrix at half diagrams i, j: (c, σ's matrix) with
        ⟨h_i ⊗ v_T, h_j ⊗ v_U⟩ = x^c·γ_T·matrix[T][U]; None when zero."""
        found = self.pair(self.halves[i], self.halves[j])
        if found is None:
            return None
        c, perms = found
        return c, self.specht_matrix(perms)

    # ----- the action ----------------------------------------------------------------------------
    def glue(self, d: Blocks, h: HalfDiagram) -> tuple[HalfDiagram, int, Perms] | None:
        """d·h: (h', c, σ) or None when the propagating number drops."""
        r = self.r
        blocks, marks = h
        md = len(d)
        parent = list(range(md + len(blocks)))

        def find(a: int) -> int:
            while parent[a] != a:
                parent[a] = parent[parent[a]]
                a = parent[a]
            return a

        bottom_owner = [0] * r
        for b, block in enumerate(d):
            for v in block:
                if v >= r:
                    bottom_owner[v - r] = b
        for b, block in enumerate(blocks, md):
            for v in block:
                ra, rb = find(bottom_owner[v]), find(b)
                if ra != rb:
                    parent[ra] = rb
        marked: dict[int, int] = {}
        for b, mark in enumerate(marks):
            if mark != UNMARKED:
                root = find(md + b)
                if root in marked:
                    return None
                marked[root] = b
        tops: dict[int, list[int]] = {}
        for b, block in enumerate(d):
            top = [v for v in block if v < r]
            if top:
                tops.setdefault(find(b), []).extend(top)
        if any(root not in tops for root in marked):
            return None
        new_blocks = sorted((tuple(sorted(vs)), root) for root, vs in tops.items())
        new_marks = tuple(marks[marked[root]] if root in marked else UNMARKED for _, root in new_blocks)
        roots = {find(b) for b in range(md + len(blocks))}
        loops = len(roots) - len(tops) - sum(1 for root in marked if root not in tops)
        new_half = (tuple(b for b, _ in new_blocks), new_marks)
        old_position = self._positions(marks)
        new_position = self._positions(new_marks)
        perms = [[0] * sum(self.label.shapes[c]) for c in range(self.colours)]
        for n, (_, root) in enumerate(new_blocks):
            if root in marked:
                b = marked[root]
                if marks[b] >= 0:
                    perms[marks[b]][old_position[b]] = new_position[n]
        return new_half, loops, tuple(tuple(p) for p in perms)

    def act(self, d: Blocks, vector: dict[tuple[int, int], Fraction], x: Fraction | int
            ) -> dict[tuple[int, int], Fraction]:
        """d acting on a vector {(half index, Specht index): coefficient} at the parameter x."""
        out: dict[tuple[int, int], Fraction] = {}
        for (i, u), coefficient in vector.items():
            found = self.glue(d, self.halves[i])
            if found is None:
                continue
            h, loops, perms = found
            j = self.half_index[h]
            m = self.specht_matrix(perms)
            scale = coefficient * Fraction(x) ** loops
            for w in range(self.specht_size):
                if m[w][u]:
                    key = (j, w)
                    out[key] = out.get(key, Fraction(0)) + scale * m[w][u]
        return {key: c for key, c in out.items() if c}

    def form(self, a: dict[tuple[int, int], Fraction], b: dict[tuple[int, int], Fraction],
             x: Fraction | int) -> Fraction:
        """⟨a, b⟩ at the parameter x (both vectors as in ``act``)."""
        gamma = self.specht_form
        total = Fraction(0)
        for (i, u), ca in a.items():
            for (j, w), cb in b.items():
                block = self.form_block(i, j)
                if block is not None:
                    c, m = block
                    total += ca * cb * Fraction(x) ** c * gamma[u] * m[u][w]
        return total

    def basis_names(self) -> list[tuple[HalfDiagram, tuple[specht.Tableau, ...]]]:
        """Each basis vector as (half diagram, tableau per colour), in basis order."""
        tableaux = list(product(*[specht.standard_tableaux(s) for s in self.label.shapes]))
        return [(h, t) for h in self.halves for t in tableaux]
