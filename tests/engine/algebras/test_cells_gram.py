"""Gram determinants of cell modules against the classical formulas and sympy."""

from __future__ import annotations

from fractions import Fraction
from math import comb

import pytest

from engine.algebras.cells.gram import GramMatrix, other_factors, rational_roots
from engine.algebras.cells.labels import cell_labels, read_cell_label
from engine.algebras.cells.modules import CellModule
from engine.algebras.cells.report import cell_answer
from tests.engine.algebras.cells_helpers import level_of


def _determinant(level, label: str) -> list[int]:
    return GramMatrix.of(CellModule(level, read_cell_label(level, label))).determinant()


def _tl_formula(n: int, p: int):
    """det G_{n,p} = ∏_{j=1}^{(n-p)/2} ([p+j+1]/[j])^{dim W_{n,p+2j}}, [m] = U_{m-1}(x/2) ([1] = 1,
    [2] = x, [m+1] = x[m] - [m-1]) and dim W_{n,q} = C(n,(n-q)/2) - C(n,(n-q)/2-1): the classical
    Gram determinant of the Temperley–Lieb standard modules (Goodman, de la Harpe and Jones,
    *Coxeter Graphs and Towers of Algebras*, 1989; here as recalled from memory)."""
    import flint

    x = flint.fmpq_poly([0, 1])
    q = [flint.fmpq_poly([0]), flint.fmpq_poly([1])]
    while len(q) < n + 3:
        q.append(x * q[-1] - q[-2])

    def dim(q_: int) -> int:
        j = (n - q_) // 2
        return comb(n, j) - (comb(n, j - 1) if j else 0)

    numerator, denominator = flint.fmpq_poly([1]), flint.fmpq_poly([1])
    for j in range(1, (n - p) // 2 + 1):
        e = dim(p + 2 * j)
        numerator *= q[p + j + 1] ** e
        denominator *= q[j] ** e
    quotient, remainder = divmod(numerator, denominator)
    assert remainder == 0
    return [int(c) for c in quotient.coeffs()]


@pytest.mark.parametrize("n", range(0, 11))
def test_temperley_lieb_gram_determinants_are_the_chebyshev_product(n):
    level = level_of("temperley-lieb", n)
    for p in range(n % 2, n + 1, 2):
        assert _determinant(level, f"({p})" if p else "()") == _tl_formula(n, p), (n, p)


def test_small_determinants_by_hand():
    # hand computation: TL_4 with no through line has the Gram matrix [[x², x], [x, x²]]: x⁴ − x²;
    # B_2(x) with no free vertex: the one cup–cap pairing gives x; P_1 with λ̄ = (): x
    assert _determinant(level_of("temperley-lieb", 4), "()") == [0, 0, -1, 0, 1]
    assert _determinant(level_of("brauer", 2), "()") == [0, 1]
    assert _determinant(level_of("partition", 1), "()") == [0, 1]


@pytest.mark.parametrize("kind,r,label,word", [
    ("brauer", 4, "(2)", ""), ("brauer", 4, "(1,1)", ""), ("brauer", 3, "(1)", ""), ("partition", 3, "(1)", ""),
    ("partition", 3, "(1,1)", ""), ("walled-brauer", 4, "((1),(1))", "vvdd"), ("walled-brauer", 4, "((),())", "vdvd"),
])
def test_determinants_against_sympy(kind, r, label, word):
    # sympy's determinant of the same Gram matrix G′ (blocks x^c·σ) is the reference
    import sympy

    level = level_of(kind, r, word=word)
    gram = GramMatrix.of(CellModule(level, read_cell_label(level, label)))
    x = sympy.Symbol("x")
    entries = [[sympy.Integer(0)] * gram.size for _ in range(gram.size)]
    for i, row in enumerate(gram.rows):
        for j, c, q in row:
            entries[i][j] += sympy.Rational(q.numerator, q.denominator) * x**c
    from sympy.polys.matrices import DomainMatrix

    matrix = DomainMatrix.from_Matrix(sympy.Matrix(entries)).convert_to(sympy.QQ[x])
    expected = sympy.Poly(matrix.det().as_expr(), x).all_coeffs()[::-1]
    assert gram.determinant() == [int(c) for c in expected]


@pytest.mark.parametrize("kind,r,label", [("brauer", 5, "(2,1)"), ("partition", 4, "(2,1)"), ("brauer", 6, "(2,2)")])
def test_determinants_with_nontrivial_specht_modules_against_sympy_at_points(kind, r, label):
    # sympy's exact rational determinant of G′ at integer points is the reference there
    import sympy

    level = level_of(kind, r)
    gram = GramMatrix.of(CellModule(level, read_cell_label(level, label)))
    determinant = gram.determinant()
    for a in (-3, 2, 7):
        value = sympy.Matrix([[sympy.Rational(q.numerator, q.denominator) for q in row] for row in gram.at(a)]).det()
        assert value == sum(c * a**e for e, c in enumerate(determinant))


def _non_semisimple(level) -> list[Fraction]:
    found = set()
    for label in cell_labels(level):
        module = CellModule(level, label)
        if module.dimension:
            found.update(root for root, _ in rational_roots(GramMatrix.of(module).determinant()))
    return sorted(found)


@pytest.mark.parametrize("k", [1, 2, 3, 4])
def test_partition_algebra_fails_to_be_semisimple_exactly_at_0_to_2k_minus_2(k):
    # from memory (Martin and Saleur 1993; Martin, "The structure of the partition algebras",
    # J. Algebra 1996): P_k(x) is semisimple unless x ∈ {0, 1, ..., 2k−2}; our Gram determinants
    # have no other roots, rational or not
    level = level_of("partition", k)
    assert _non_semisimple(level) == list(range(0, 2 * k - 1))
    for label in cell_labels(level):
        assert other_factors(GramMatrix.of(CellModule(level, label)).determinant()) == []


@pytest.mark.parametrize("k", [0, 1, 2, 3])
def test_half_partition_algebras_fail_at_1_to_2k_minus_1(k):
    # computed, and compared with the statement recalled from memory that P_{k+1/2}(x) is semisimple
    # for x outside {0, ..., 2k−1}: the Gram determinants vanish at 1, ..., 2k−1 only, so at x = 0
    # the cell forms are non-degenerate (hand computation for k = 1: the cell λ̄ = () has the Gram
    # matrix [[1, 1], [1, x]], determinant x − 1)
    level = level_of("partition", k + 1, half=True)
    assert _non_semisimple(level) == list(range(1, 2 * k))
    assert _determinant(level_of("partition", 2, half=True), "()") == [-1, 1]


def test_brauer_zero_is_semisimple_only_for_odd_small_k():
    # from memory (a 2005 criterion for the semisimplicity of Brauer algebras):
    # B_k(0) is semisimple exactly for k ∈ {1, 3, 5}
    for k in range(1, 7):
        assert (0 not in _non_semisimple(level_of("brauer", k))) == (k in (1, 3, 5)), k


def test_symmetric_group_determinant_is_a_constant_and_rank_is_full():
    # common practice (Maschke): CS_k is semisimple; the normalised determinant of a Specht module is 1
    level = level_of("symmetric-group", 5)
    for label in cell_labels(level):
        answer = cell_answer(level, label)
        assert answer.determinant == [1]
        assert answer.rank == answer.dimension


@pytest.mark.parametrize("kind,r,label", [("brauer", 6, "()"), ("brauer", 5, "(1)"), ("partition", 4, "()"),
                                          ("partition", 3, "(1)"), ("temperley-lieb", 8, "()"),
                                          ("temperley-lieb", 7, "(1)")])
def test_symmetry_split_gives_the_same_determinant(kind, r, label):
    # the split by rotation or reflection (engine/algebras/cells/symmetry.py) against the plain route
    from engine.algebras.cells import symmetry

    level = level_of(kind, r)
    module = CellModule(level, read_cell_label(level, label))
    gram = GramMatrix.of(module)
    assert symmetry.applies(module)
    plain = GramMatrix(gram.size, gram.rows, gram.gamma, None)
    assert gram.determinant() == plain.determinant()
