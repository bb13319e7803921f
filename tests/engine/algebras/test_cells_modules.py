"""Cell modules: sizes by formula, Σ dim² = the algebra's dimension, the action is a module and the
form is invariant."""

from __future__ import annotations

import random
from fractions import Fraction
from math import factorial

import pytest

from itertools import combinations

from engine.algebras.cells.half_diagrams import count_half_diagrams, half_diagrams, matchings_with_singles
from engine.algebras.cells.labels import cell_labels, read_cell_label
from engine.algebras.cells.gram import GramMatrix
from engine.algebras.cells.modules import CellModule
from engine.algebras.cells.report import cell_dimension
from engine.algebras.diagrams import compose
from engine.combinatorics import bell, catalan, double_factorial_odd
from tests.engine.algebras.cells_helpers import level_of, random_diagram, upside_down

LEVELS = (
    [level_of("partition", k) for k in range(0, 5)]
    + [level_of("partition", k + 1, half=True) for k in range(0, 4)]
    + [level_of("brauer", k) for k in range(0, 7)]
    + [level_of("temperley-lieb", k) for k in range(0, 9)]
    + [level_of("symmetric-group", k) for k in range(0, 6)]
    + [level_of("walled-brauer", len(w), word=w) for w in ("", "v", "vd", "vvd", "vdvd", "vvddd", "dvvdv")]
)


def _algebra_dimension(level) -> int:
    k = level.vertices
    # OEIS A000110 (Bell(2k), Bell(2k+1) at half levels), A001147 ((2k-1)!!), A000108 (Catalan),
    # k! for CS_k and (r+s)! for the walled Brauer algebra (common practice)
    if level.kind == "partition":
        return bell(2 * k - 1) if level.half else bell(2 * k)
    if level.kind == "brauer":
        return double_factorial_odd(k)
    if level.kind == "temperley-lieb":
        return catalan(k)
    return factorial(k)


@pytest.mark.parametrize("level", LEVELS, ids=lambda lv: lv.name + (lv.word or ""))
def test_sum_of_squares_of_cell_dimensions_is_the_dimension(level):
    # common practice (cellular algebras, the 1996 definition of cellular algebras): Σ_λ (dim W(λ))² = dim A
    total = 0
    for label in cell_labels(level):
        module = CellModule(level, label)
        assert module.dimension == cell_dimension(level, label)
        assert len(module.halves) == count_half_diagrams(level, label.counts)
        total += module.dimension**2
    assert total == _algebra_dimension(level)


def test_half_diagram_counts_by_hand():
    # hand computation: Brauer on 4 vertices with 2 free ones: C(4,2)·1 = 6; TL_4 with none: 2 (Catalan);
    # partition P_2 with one marked block: {1,2}*, {1}*{2}, {1}{2}* → 3
    assert count_half_diagrams(level_of("brauer", 4), (2,)) == 6
    assert len(list(half_diagrams(level_of("temperley-lieb", 4), (0,)))) == 2
    assert len(list(half_diagrams(level_of("partition", 2), (1,)))) == 3


def _brute_matchings(r, t, planar):
    # by definition: every partial matching of r points (all pairings of every choice of singles),
    # kept when it has t singles and, for planar ones, no two arcs cross and no arc covers a single
    out = set()

    def pairings(points):
        if not points:
            yield ()
            return
        a = points[0]
        for i in range(1, len(points)):
            rest = points[1:i] + points[i + 1:]
            for p in pairings(rest):
                yield ((a, points[i]),) + p

    for singles in combinations(range(r), t):
        others = [v for v in range(r) if v not in singles]
        for arcs in pairings(others):
            if planar:
                if any(a < s < b for a, b in arcs for s in singles):
                    continue
                if any(a < c < b < d for a, b in arcs for c, d in arcs):
                    continue
            out.add(tuple(sorted([(s,) for s in singles] + list(arcs))))
    return out


@pytest.mark.parametrize("r", range(0, 9))
def test_pruned_matchings_are_exactly_the_filtered_ones(r):
    for t in range(r + 1):
        for planar in (False, True):
            got = list(matchings_with_singles(r, t, planar))
            assert len(got) == len(set(got))
            assert set(got) == _brute_matchings(r, t, planar)


def _matrix_of(module, d, x):
    basis = [(i, u) for i in range(len(module.halves)) for u in range(module.specht_size)]
    position = {b: n for n, b in enumerate(basis)}
    columns = []
    for b in basis:
        image = module.act(d, {b: Fraction(1)}, x)
        column = [Fraction(0)] * len(basis)
        for key, c in image.items():
            column[position[key]] = c
        columns.append(column)
    return [list(row) for row in zip(*columns)], basis


CASES = [("brauer", 6, "(3,1)", ""), ("brauer", 5, "(2,1)", ""), ("partition", 4, "(2,1)", ""),
         ("partition", 4, "(1,1)", ""), ("temperley-lieb", 6, "(2)", ""), ("symmetric-group", 4, "(2,1,1)", ""),
         ("walled-brauer", 5, "((2),(1))", "vvdvd"), ("walled-brauer", 5, "((1),())", "vdvvd"), ("walled-brauer", 6, "((2),(1,1))", "vdvvdd")]


@pytest.mark.parametrize("kind,r,label,word", CASES)
def test_action_is_a_module_and_the_form_is_invariant(kind, r, label, word):
    # common practice (the 1996 definition of cellular algebras, §1–2): (d1·d2)·v = d1·(d2·v) with the loop factor, and
    # ⟨d·a, b⟩ = ⟨a, d*·b⟩ for the diagram d* turned upside down; checked on whole matrices
    level = level_of(kind, r, word=word)
    module = CellModule(level, read_cell_label(level, label))
    x = Fraction(5)
    rng = random.Random(11)
    size = module.dimension
    basis = [(i, u) for i in range(len(module.halves)) for u in range(module.specht_size)]
    matrix = GramMatrix.of(module)
    gram = [[matrix.gamma[i] * q for q in row] for i, row in enumerate(matrix.at(x))]
    a, b = rng.randrange(size), rng.randrange(size)
    assert gram[a][b] == module.form({basis[a]: Fraction(1)}, {basis[b]: Fraction(1)}, x)
    assert all(gram[i][j] == gram[j][i] for i in range(size) for j in range(size))
    for _ in range(3):
        d1, d2 = random_diagram(level, rng), random_diagram(level, rng)
        product, loops = compose(d1, d2, r)
        m1, _ = _matrix_of(module, d1, x)
        m2, _ = _matrix_of(module, d2, x)
        m12, _ = _matrix_of(module, product, x)
        expected = [[sum(m1[i][t] * m2[t][j] for t in range(size)) for j in range(size)] for i in range(size)]
        assert [[c * x**loops for c in row] for row in m12] == expected
        star, _ = _matrix_of(module, upside_down(d1, r), x)
        left = [[sum(m1[t][i] * gram[t][j] for t in range(size)) for j in range(size)] for i in range(size)]
        right = [[sum(gram[i][t] * star[t][j] for t in range(size)) for j in range(size)] for i in range(size)]
        assert left == right
