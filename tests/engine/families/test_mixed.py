"""The mixed tensor tower of GL_N against walled Brauer dimensions, Koike's rule and Weyl's
character formula."""

from fractions import Fraction
from math import factorial

import pytest

from engine.diagram import Diagram
from engine.errors import LabelError, SpecError, UserError
from engine.partition_pairs import format_pair, parse_pair
from engine.partitions import PartitionError
from engine.specs import parse_spec
from tests.engine.families.tower_checks import (
    assert_labels_round_trip,
    assert_parents_invert_children,
    edges_walked,
    partitions_by_sympy,
)
from tests.engine.families.weyl_reference import generic_point, weyl_character, weyl_dimension

WORDS = ["vdvdvdvdvd", "vvvvvddddd", "dvvdvddvvd", "ddvvvdvvdd"]


def _weight(n: int, alpha, beta) -> tuple[int, ...]:
    # (α_1, …, α_p, 0, …, 0, −β_q, …, −β_1) (Koike 1989, §1)
    return tuple(alpha) + (0,) * (n - len(alpha) - len(beta)) + tuple(-b for b in reversed(beta))


def _letters(word: str, i: int) -> tuple[int, int]:
    return word[:i].count("v"), word[:i].count("d")


@pytest.mark.parametrize("n", [1, 2, 3, 4])
@pytest.mark.parametrize("word", WORDS)
def test_weighted_sum_is_the_tensor_dimension(n, word):
    # common practice: Σ m·dim = N^{r+s} on every level
    d = Diagram(parse_spec(f"mixed:n={n},word={word}"))
    for i in range(len(word) + 1):
        assert d.sums(i).weighted == n**i == d.sums(i).tensor_dimension


@pytest.mark.parametrize("word", WORDS)
def test_stable_range_squares_are_factorials(word):
    # OEIS A000142: the walled Brauer algebra B_{r,s}(N) has dimension (r+s)! and acts
    # faithfully for r + s ≤ N
    d = Diagram(parse_spec(f"mixed:n=10,word={word}"))
    assert [d.sums(i).squares for i in range(11)] == [factorial(i) for i in range(11)]


@pytest.mark.parametrize("n", [1, 2, 3, 4])
def test_faithful_exactly_while_r_plus_s_at_most_n(n):
    # common practice (walled Brauer algebras; J. Algebra 166, 1994): the kernel appears at r+s = N+1
    d = Diagram(parse_spec(f"mixed:n={n},word=vdvvdvdd"))
    assert d.first_unfaithful(8) == n + 1


@pytest.mark.parametrize("n", [1, 2, 3, 5])
@pytest.mark.parametrize("word", WORDS)
def test_levels_hold_exactly_the_pairs_of_koikes_rule(n, word):
    # Koike 1989: V^{⊗r} ⊗ V*^{⊗s} holds the (α, β) with |α| = r−t, |β| = s−t, ℓ(α)+ℓ(β) ≤ N
    d = Diagram(parse_spec(f"mixed:n={n},word={word}"))
    for i in range(len(word) + 1):
        r, s = _letters(word, i)
        expected = {
            (a, b)
            for t in range(min(r, s) + 1)
            for a in partitions_by_sympy(r - t)
            for b in partitions_by_sympy(s - t)
            if len(a) + len(b) <= n
        }
        assert set(d.level(i)) == expected


def test_the_order_of_the_letters_does_not_change_the_module():
    # common practice: V ⊗ W ≅ W ⊗ V, so the last level's multiplicities do not depend on the order
    levels = [Diagram(parse_spec(f"mixed:n=3,word={w}")).level(8) for w in ("vvvvdddd", "dvdvdvvd", "ddddvvvv")]
    assert levels[0] == levels[1] == levels[2]


@pytest.mark.parametrize("n", [1, 2, 3, 4, 7, 9])
def test_dimensions_against_weyl_dimension_formula(n):
    # Weyl's dimension formula of type A from the root system (weyl_reference)
    d = Diagram(parse_spec(f"mixed:n={n},word=vdvdvvdd"))
    for i in range(9):
        for (alpha, beta) in d.level(i):
            assert d.tower.dimension(i, (alpha, beta)) == weyl_dimension("A", n, _weight(n, alpha, beta))


@pytest.mark.parametrize("n", [1, 2, 3, 4])
def test_characters_at_a_generic_torus_point(n):
    # Weyl's character formula (ratio of alternants) at a rational torus point:
    # Σ m χ_(α,β)(x) = (Σ x_j)^r (Σ 1/x_j)^s
    word = "vdvvddv"
    d = Diagram(parse_spec(f"mixed:n={n},word={word}"))
    t = generic_point(n)
    xs = [s * s for s in t]
    trace, dual = sum(xs, Fraction(0)), sum((1 / x for x in xs), Fraction(0))
    for i in range(len(word) + 1):
        r, s = _letters(word, i)
        total = sum(m * weyl_character("A", n, _weight(n, a, b), t) for (a, b), m in d.level(i).items())
        assert total == trace**r * dual**s


def test_textbook_values():
    # common practice: V ⊗ V* = trivial ⊕ adjoint (N²−1) for GL_N; ((1),(1)) of GL_3 is 8-dimensional
    d = Diagram(parse_spec("mixed:n=3,word=vd"))
    assert d.level(2) == {((), ()): 1, ((1,), (1,)): 1}
    assert d.tower.dimension(2, ((1,), (1,))) == 8
    assert d.tower.dimension(1, ((), (1,))) == 3


def test_levels_past_the_end_of_the_word_are_an_error():
    tower = parse_spec("mixed:n=3,word=vvd")
    d = Diagram(tower)
    d.ensure(3)
    with pytest.raises(UserError, match="past the end"):
        d.ensure(4)
    with pytest.raises(UserError, match="past the end"):
        tower.index_of(Fraction(4))
    assert d.children(3, ((1,), ())) == []
    assert tower.algebra_name(3) == "B_{2,1}(3)"


def test_pairs_are_read_in_several_forms_and_written_in_one():
    for text in ["((2,1),(1))", "( (2, 1) , (1) )", "(2,1),(1)", "((2 1) (1))"]:
        assert parse_pair(text) == ((2, 1), (1,))
    assert parse_pair("((),())") == ((), ())
    assert format_pair(((2, 1), (1,))) == "((2,1),(1))"
    assert format_pair(((), ())) == "((),())"
    for bad in ["(2,1)", "((2,1),(1),(1))", "((1,2),(1))", "((a),())", ""]:
        with pytest.raises(PartitionError):
            parse_pair(bad)


def test_labels_parents_estimate_and_spec_errors():
    d = Diagram(parse_spec("mixed:n=2,word=vvdvd"))
    assert_parents_invert_children(d, 5)
    assert_labels_round_trip(d, 5)
    assert d.tower.estimate_edges(5) >= edges_walked(d, 5)
    assert d.tower.parse("((1),())", 3) == ((1,), ())
    assert d.tower.format(((1,), ())) == "((1),())"
    with pytest.raises(LabelError, match="ℓ\\(α\\) \\+ ℓ\\(β\\) ≤ 2"):
        d.tower.parse("((1,1),(1))", 3)  # right sizes, but three rows for GL_2
    with pytest.raises(LabelError):
        d.tower.parse("((2),(1))", 2)
    for spec in ["mixed:n=3", "mixed:n=3,word=", "mixed:n=3,word=vxd", "mixed:n=0,word=vd"]:
        with pytest.raises(SpecError):
            parse_spec(spec)


def test_level_30_in_the_stable_range_is_within_the_size_guard():
    d = Diagram(parse_spec("mixed:n=30,word=" + "vd" * 15))
    d.check_size(30)  # must not raise TooLarge
