"""The Sp(2M) tower (and SL_2) against Brauer and Temperley–Lieb dimensions, ballot numbers and
Weyl's formulas of type C."""

from math import comb

import pytest

from engine.diagram import Diagram
from engine.errors import LabelError, SpecError
from engine.specs import parse_spec
from tests.engine.families.tower_checks import (
    assert_labels_round_trip,
    assert_parents_invert_children,
    edges_walked,
    partitions_by_sympy,
)
from tests.engine.families.weyl_reference import generic_point, vector_trace, weyl_character, weyl_dimension

# OEIS A001147, double factorials (2k−1)!!
DOUBLE_FACTORIALS = [1, 1, 3, 15, 105, 945, 10395, 135135, 2027025, 34459425, 654729075]
# OEIS A000108, Catalan numbers
CATALAN = [1, 1, 2, 5, 14, 42, 132, 429, 1430, 4862, 16796, 58786, 208012]


def _rule(m: int, k: int) -> set:
    # at most M rows, |λ| ≤ k, |λ| ≡ k (mod 2)
    return {lam for j in range(k % 2, k + 1, 2) for lam in partitions_by_sympy(j, m)}


@pytest.mark.parametrize("n", [2, 4, 6, 8])
def test_weighted_sum_is_the_tensor_dimension(n):
    # common practice: Σ m·dim = N^k on every level
    d = Diagram(parse_spec(f"symplectic:n={n}"))
    for k in range(11):
        assert d.sums(k).weighted == n**k == d.sums(k).tensor_dimension


def test_stable_range_squares_are_double_factorials():
    # OEIS A001147: B_k(−2M) acts faithfully for k ≤ M
    d = Diagram(parse_spec("symplectic:n=20"))
    assert [d.sums(k).squares for k in range(11)] == DOUBLE_FACTORIALS


def test_faithful_exactly_while_k_at_most_m():
    # Brauer's centralizer theorem for Sp(2M); the kernel appears at k = M+1 (common practice)
    for m in range(2, 6):
        d = Diagram(parse_spec(f"symplectic:n={2 * m}"))
        assert d.first_unfaithful(m + 3) == m + 1


@pytest.mark.parametrize("m", [1, 2, 3])
def test_levels_hold_exactly_the_rule(m):
    d = Diagram(parse_spec(f"symplectic:n={2 * m}"))
    for k in range(11):
        assert set(d.level(k)) == _rule(m, k)


def test_sl2_is_the_path_graph_with_catalan_and_ballot_numbers():
    d = Diagram(parse_spec("symplectic:n=2"))
    # OEIS A000108: Σ m² = dim TL_k = Catalan(k), and the trivial node at level 2j has Catalan(j)
    assert [d.sums(k).squares for k in range(13)] == CATALAN
    assert [d.sums(k).generic_dimension for k in range(13)] == CATALAN
    assert d.first_unfaithful(12) is None
    assert [d.multiplicity(2 * j, ()) for j in range(7)] == CATALAN[:7]
    # ballot numbers (reflection principle, OEIS A008315): paths to height a at step k
    for k in range(13):
        for a in range(k % 2, k + 1, 2):
            lam = (a,) if a else ()
            down = (k - a) // 2
            assert d.multiplicity(k, lam) == comb(k, down) - (comb(k, down - 1) if down else 0)
            assert d.tower.dimension(k, lam) == a + 1  # common practice: Sym^a C^2
    assert d.tower.level_kind(3) == "SL_2" and d.tower.algebra_name(5) == "TL_5"


@pytest.mark.parametrize("m", [1, 2, 3, 4])
def test_dimensions_against_weyl_dimension_formula(m):
    # Weyl's dimension formula of type C_M from the root system (weyl_reference)
    tower = parse_spec(f"symplectic:n={2 * m}")
    for size in range(8):
        for lam in partitions_by_sympy(size, m):
            assert tower.dimension(size, lam) == weyl_dimension("C", m, lam), lam


def test_textbook_dimensions():
    # common practice: Sp(4) modules (1):4, (1,1):5, (2):10 (adjoint), (2,1):16; Sp(6): (1,1):14, (1,1,1):14
    sp4, sp6 = parse_spec("symplectic:n=4"), parse_spec("symplectic:n=6")
    assert [sp4.dimension(0, lam) for lam in [(1,), (1, 1), (2,), (2, 1)]] == [4, 5, 10, 16]
    assert [sp6.dimension(0, lam) for lam in [(1, 1), (1, 1, 1)]] == [14, 14]


@pytest.mark.parametrize("m", [1, 2, 3, 4])
def test_characters_at_a_generic_torus_point(m):
    # Weyl's character formula of type C (ratio of alternating sums) at a rational torus point:
    # Σ_λ m_λ χ_λ(x) = (Σ_j x_j + 1/x_j)^k
    d = Diagram(parse_spec(f"symplectic:n={2 * m}"))
    t = generic_point(m)
    trace = vector_trace("C", t)
    for k in range(7 if m < 4 else 5):
        assert sum(mult * weyl_character("C", m, lam, t) for lam, mult in d.level(k).items()) == trace**k


def test_parents_estimate_labels_and_spec_errors():
    d = Diagram(parse_spec("symplectic:n=4"))
    assert_parents_invert_children(d, 8)
    assert_labels_round_trip(d, 8)
    assert d.tower.estimate_edges(10) >= edges_walked(d, 10)
    assert d.tower.parse("(1,1)", 4) == (1, 1)
    assert d.tower.algebra_name(3) == "B_3(-4)"
    with pytest.raises(LabelError, match="at most 2 rows"):
        d.tower.parse("(1,1,1)", 3)
    with pytest.raises(SpecError, match="even"):
        parse_spec("symplectic:n=5")
    with pytest.raises(SpecError):
        parse_spec("symplectic:n=0")


def test_level_30_in_the_stable_range_is_within_the_size_guard():
    d = Diagram(parse_spec("symplectic:n=60"))
    d.check_size(30)  # must not raise TooLarge
    small = Diagram(parse_spec("symplectic:n=2"))
    small.ensure(30)
    assert small.sums(30).squares == 3814986502092304  # Catalan(30), OEIS A000108
