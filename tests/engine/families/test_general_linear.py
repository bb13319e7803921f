"""The GL_N tower against Schur–Weyl duality, RSK counts, OEIS and Weyl's character formula."""

from itertools import permutations
from math import factorial

import pytest

from engine.diagram import Diagram
from engine.errors import LabelError, SpecError, TooLarge
from engine.specs import parse_spec
from tests.engine.families.tower_checks import (
    assert_labels_round_trip,
    assert_parents_invert_children,
    edges_walked,
    partitions_by_sympy,
)
from tests.engine.families.weyl_reference import generic_point, vector_trace, weyl_character, weyl_dimension

# OEIS A000142, factorials
FACTORIALS = [1, 1, 2, 6, 24, 120, 720, 5040, 40320, 362880, 3628800]
# OEIS A000108, Catalan numbers
CATALAN = [1, 1, 2, 5, 14, 42, 132, 429, 1430, 4862, 16796]


@pytest.mark.parametrize("n", [1, 2, 3, 4, 6])
def test_weighted_sum_is_the_tensor_dimension(n):
    # common practice: V^{⊗k} = ⊕ V_λ ⊗ S^λ, so Σ m·dim = N^k
    d = Diagram(parse_spec(f"general-linear:n={n}"))
    for k in range(11):
        sums = d.sums(k)
        assert sums.weighted == n**k == sums.tensor_dimension


def test_stable_range_squares_are_factorials():
    # OEIS A000142: for N ≥ k the centralizer is all of CS_k
    d = Diagram(parse_spec("general-linear:n=12"))
    assert [d.sums(k).squares for k in range(11)] == FACTORIALS
    assert [d.sums(k).generic_dimension for k in range(11)] == FACTORIALS


def _longest_decreasing(perm) -> int:
    # patience sorting on the negated sequence (Schensted 1961; Stanley EC2 7.23)
    piles: list[int] = []
    for x in perm:
        x = -x
        lo, hi = 0, len(piles)
        while lo < hi:
            mid = (lo + hi) // 2
            if piles[mid] < x:
                lo = mid + 1
            else:
                hi = mid
        if lo == len(piles):
            piles.append(x)
        else:
            piles[lo] = x
    return len(piles)


def test_squares_count_permutations_without_long_decreasing_subsequences():
    # RSK and Schensted's theorem (Stanley EC2 ch. 7): Σ_{ℓ(λ)≤N} (f^λ)² = #{π ∈ S_k : no decreasing
    # subsequence longer than N}, counted here by brute force
    diagrams = {n: Diagram(parse_spec(f"general-linear:n={n}")) for n in (1, 2, 3, 4)}
    for k in range(9):
        lengths = [_longest_decreasing(p) for p in permutations(range(k))]
        for n, d in diagrams.items():
            assert d.sums(k).squares == sum(1 for x in lengths if x <= n)


def test_gl2_squares_are_catalan_numbers():
    # OEIS A000108: for N = 2, the permutations with no decreasing subsequence of length 3
    d = Diagram(parse_spec("general-linear:n=2"))
    assert [d.sums(k).squares for k in range(11)] == CATALAN


@pytest.mark.parametrize("n", [1, 2, 3, 5])
def test_levels_hold_exactly_the_partitions_with_at_most_n_rows(n):
    # Schur–Weyl duality (Fulton and Harris 6.1); the partitions listed by sympy
    d = Diagram(parse_spec(f"general-linear:n={n}"))
    for k in range(11):
        assert set(d.level(k)) == set(partitions_by_sympy(k, n))


@pytest.mark.parametrize("n", [2, 3, 4])
def test_dimensions_against_weyl_dimension_formula(n):
    # Weyl's dimension formula for type A, written independently in tests/…/weyl_reference.py
    tower = parse_spec(f"general-linear:n={n}")
    for k in range(9):
        for lam in partitions_by_sympy(k, n):
            assert tower.dimension(k, lam) == weyl_dimension("A", n, lam)


@pytest.mark.parametrize("n", [1, 2, 3, 4])
def test_characters_at_a_generic_torus_point(n):
    # Weyl's character formula (ratio of alternants) at a rational torus point:
    # Σ_λ m_λ s_λ(x) = (x_1 + … + x_N)^k
    d = Diagram(parse_spec(f"general-linear:n={n}"))
    t = generic_point(n)
    trace = vector_trace("A", t)
    for k in range(8):
        assert sum(m * weyl_character("A", n, lam, t) for lam, m in d.level(k).items()) == trace**k


def test_faithful_exactly_while_k_at_most_n():
    # CS_k acts faithfully on V^{⊗k} iff k ≤ N (common practice: the antisymmetriser of N+1 letters)
    for n in range(1, 6):
        d = Diagram(parse_spec(f"general-linear:n={n}"))
        assert d.first_unfaithful(n + 3) == n + 1


def test_closed_form_agrees_with_path_counting():
    # the closed form f^λ (Schur–Weyl duality) against the diagram's path counts
    tower = parse_spec("general-linear:n=3")
    d = Diagram(tower)
    for k in range(10):
        for lam in partitions_by_sympy(k, k):
            assert tower.multiplicity(k, lam) == d.level(k).get(lam, 0)
    # f^(3,2,1) = 16 (hook length formula; Sagan 3.10, from memory)
    assert Diagram(parse_spec("general-linear:n=3")).multiplicity(6, (3, 2, 1)) == 16


def test_textbook_dimensions():
    # common practice: Sym^2 C^3 = 6, Λ^2 C^3 = 3, the adjoint-like (2,1) of GL_3 = 8, Λ^3 C^3 = 1
    tower = parse_spec("general-linear:n=3")
    assert [tower.dimension(3, lam) for lam in [(2,), (1, 1), (2, 1), (1, 1, 1)]] == [6, 3, 8, 1]


def test_parents_estimate_and_labels():
    d = Diagram(parse_spec("general-linear:n=3"))
    assert_parents_invert_children(d, 8)
    assert_labels_round_trip(d, 8)
    assert d.tower.estimate_edges(9) >= edges_walked(d, 9)
    assert d.tower.parse("2 1 1", 4) == (2, 1, 1)
    assert d.tower.format((2, 1, 1)) == "(2,1,1)"
    assert d.tower.algebra_name(4) == "CS_4"
    with pytest.raises(LabelError, match="at most 3 rows"):
        d.tower.parse("(1,1,1,1)", 4)
    with pytest.raises(LabelError):
        d.tower.parse("(2,1)", 4)
    with pytest.raises(SpecError, match="'n'"):
        parse_spec("general-linear:n=0")


def test_level_30_in_the_stable_range_is_within_the_size_guard():
    d = Diagram(parse_spec("general-linear:n=30"))
    d.check_size(30)  # must not raise TooLarge
    d.ensure(20)
    # OEIS A000041: p(20) = 627 nodes
    assert len(d.level(20)) == 627
    assert d.sums(20).squares == factorial(20)


def test_dimensions_of_partitions_with_many_cells_against_weyl():
    # Weyl's dimension formula (tests/…/weyl_reference.py) on partitions with more cells than N²,
    # where the engine switches from hook-content to a product over pairs of rows
    tower = parse_spec("general-linear:n=3")
    for lam in [(10,), (7, 3), (5, 4, 2), (9, 1, 1), (4, 4, 4)]:
        assert tower.dimension(sum(lam), lam) == weyl_dimension("A", 3, lam)
    # GL_2: V_(a,b) has dimension a − b + 1 (common practice: Sym^(a−b) ⊗ det^b)
    assert parse_spec("general-linear:n=2").dimension(200_000, (100_001, 99_999)) == 3


def test_deep_closed_form_is_refused_with_its_digit_estimate():
    # log10(10^6 !) ≈ 5,565,709 (Stirling's formula, common practice): over the digit limit
    d = Diagram(parse_spec("general-linear:n=2"))
    with pytest.raises(TooLarge, match=r"5\.57e\+06 digits"):
        d.multiplicity(10**6, (500_000, 500_000))


@pytest.mark.parametrize("n", [2, 3, 5, 30])
def test_dimensions_of_a_built_level_against_weyl_dimension_formula(n):
    # the sweep's dimensions by level (f^λ·Π(n + c)/k!) against Weyl's dimension formula for type A
    # (tests/…/weyl_reference.py, written independently), and Σ m·dim = n^k (common practice)
    d = Diagram(parse_spec(f"general-linear:n={n}"))
    for k in range(10):
        level = d.level(k)
        lookup = d._counts.dimension_lookup(k)
        for lam in level:
            assert lookup(lam) == weyl_dimension("A", n, lam)
        assert d.sums(k).weighted == n**k
