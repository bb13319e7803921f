"""The O(N) tower against Brauer algebra dimensions, OEIS, textbook values and Weyl's formulas."""

from math import comb

import pytest

from engine.diagram import Diagram
from engine.errors import LabelError
from engine.specs import parse_spec
from tests.engine.families.tower_checks import (
    assert_labels_round_trip,
    assert_parents_invert_children,
    edges_walked,
    partitions_by_sympy,
)
from tests.engine.families.weyl_reference import generic_point, orthogonal_on_torus, vector_trace

# OEIS A001147, double factorials (2k−1)!!
DOUBLE_FACTORIALS = [1, 1, 3, 15, 105, 945, 10395, 135135, 2027025, 34459425, 654729075]


def _admissible(n: int, lam) -> bool:
    # λ'_1 + λ'_2 ≤ N (Weyl, The Classical Groups, V.7)
    return len(lam) + sum(1 for part in lam if part >= 2) <= n


def _rule(n: int, k: int) -> set:
    return {lam for j in range(k % 2, k + 1, 2) for lam in partitions_by_sympy(j) if _admissible(n, lam)}


@pytest.mark.parametrize("n", [1, 2, 3, 4, 5, 7])
def test_weighted_sum_is_the_tensor_dimension(n):
    # common practice: Σ m·dim = N^k on every level
    d = Diagram(parse_spec(f"orthogonal:n={n}"))
    for k in range(11):
        assert d.sums(k).consistent
        assert d.sums(k).weighted == n**k


def test_stable_range_squares_are_double_factorials():
    # OEIS A001147: B_k(N) acts faithfully for k ≤ N
    d = Diagram(parse_spec("orthogonal:n=10"))
    assert [d.sums(k).squares for k in range(11)] == DOUBLE_FACTORIALS


def test_faithful_exactly_while_k_at_most_n():
    # Brauer's centralizer theorem; the kernel appears at k = N+1 (common practice)
    for n in range(1, 6):
        d = Diagram(parse_spec(f"orthogonal:n={n}"))
        assert d.first_unfaithful(n + 3) == n + 1


@pytest.mark.parametrize("n", [1, 2, 3, 4, 6])
def test_levels_hold_exactly_the_admissible_partitions(n):
    # the rule of the issue: |λ| ≤ k, |λ| ≡ k (mod 2), λ'_1 + λ'_2 ≤ N
    d = Diagram(parse_spec(f"orthogonal:n={n}"))
    for k in range(11):
        assert set(d.level(k)) == _rule(n, k)


def test_o3_invariants_are_riordan_numbers():
    # OEIS A005043 (Riordan numbers, from memory): 1, 1, 3, 15, 91 at k = 0, 2, 4, 6, 8 for the
    # trivial module; the determinant [1,1,1] at k = 3, 5, 7: 1, 6, 36
    d = Diagram(parse_spec("orthogonal:n=3"))
    assert [d.multiplicity(k, ()) for k in (0, 2, 4, 6, 8)] == [1, 1, 3, 15, 91]
    assert [d.multiplicity(k, (1, 1, 1)) for k in (3, 5, 7)] == [1, 6, 36]
    assert d.tower.dimension(3, (1, 1, 1)) == 1


def test_o4_dimensions():
    # the table (from memory): (1,1):6, (2):9, (2,1):16, (1,1,1):4, (2,2):10, (3,1):30
    tower = parse_spec("orthogonal:n=4")
    expected = {(1, 1): 6, (2,): 9, (2, 1): 16, (1, 1, 1): 4, (2, 2): 10, (3, 1): 30}
    assert {lam: tower.dimension(0, lam) for lam in expected} == expected


def test_o2_trivial_and_determinant():
    # common practice: O(2)-invariants in V^{⊗2j} and the det-isotypic part both number C(2j, j)/2
    d = Diagram(parse_spec("orthogonal:n=2"))
    for j in range(1, 7):
        assert d.multiplicity(2 * j, ()) == comb(2 * j, j) // 2
        assert d.multiplicity(2 * j, (1, 1)) == comb(2 * j, j) // 2


@pytest.mark.parametrize("n", range(1, 9))
def test_dimensions_against_weyl_dimension_formula(n):
    # SO(N) Weyl dimension at λ*, doubled when N is even and ℓ(λ*) = N/2, from the root system
    tower = parse_spec(f"orthogonal:n={n}")
    for size in range(7):
        for lam in partitions_by_sympy(size):
            if _admissible(n, lam):
                assert tower.dimension(size, lam) == orthogonal_on_torus(n, lam, None), lam


@pytest.mark.parametrize("n", [2, 3, 4, 5, 6, 7])
def test_characters_at_a_generic_torus_point(n):
    # Weyl's character formula of type B/D (ratio of alternating sums) at a rational torus point
    # of SO(N): Σ_λ m_λ χ_[λ](x) = (trace of x on V)^k
    d = Diagram(parse_spec(f"orthogonal:n={n}"))
    t = generic_point(n // 2)
    trace = vector_trace("B" if n % 2 else "D", t)
    for k in range(7 if n < 6 else 5):
        total = sum(m * orthogonal_on_torus(n, lam, t) for lam, m in d.level(k).items())
        assert total == trace**k


def test_parents_estimate_labels():
    d = Diagram(parse_spec("orthogonal:n=3"))
    assert_parents_invert_children(d, 8)
    assert_labels_round_trip(d, 8)
    assert d.tower.estimate_edges(10) >= edges_walked(d, 10)
    assert d.tower.parse("(1,1,1)", 5) == (1, 1, 1)
    assert d.tower.algebra_name(3) == "B_3(3)"
    with pytest.raises(LabelError, match="first two columns"):
        d.tower.parse("(2,1,1)", 4)  # λ'_1 + λ'_2 = 4 > 3
    with pytest.raises(LabelError):
        d.tower.parse("(2)", 3)  # wrong parity
    with pytest.raises(LabelError):
        d.tower.parse("(2,x)", 4)


def test_level_30_in_the_stable_range_is_within_the_size_guard():
    d = Diagram(parse_spec("orthogonal:n=30"))
    d.check_size(30)  # must not raise TooLarge
    d.ensure(14)
    assert d.sums(14).squares == 213458046676875  # (27)!!, OEIS A001147
