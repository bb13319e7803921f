"""The S_n tower against Bell and Stirling numbers, characters, and textbook values."""

from fractions import Fraction
from math import factorial

import pytest
from sympy.functions.combinatorial.numbers import stirling
from sympy.utilities.iterables import partitions as sympy_partitions

from engine.diagram import Diagram
from engine.partitions import partitions_of
from engine.specs import parse_spec

# OEIS A000110, Bell numbers
BELL = [1, 1, 2, 5, 15, 52, 203, 877, 4140, 21147, 115975, 678570, 4213597, 27644437]


def test_s4_sums_of_squares_and_the_node_31():
    # common practice: sums of squares over levels 0, 1/2, ..., 3 for S_4; (3,1) at level 3 has 10
    d = Diagram(parse_spec("symmetric:n=4"))
    assert [d.sums(i).squares for i in range(7)] == [1, 1, 2, 5, 15, 51, 187]
    assert d.multiplicity(6, (3, 1)) == 10


@pytest.mark.parametrize("n", range(1, 9))
def test_sums_against_stirling_numbers(n):
    # sympy's Stirling numbers of the second kind: sum m^2 = sum_{j<=N} S(2k, j), S(2k+1, j) at k+1/2
    tower = parse_spec(f"symmetric:n={n}")
    d = Diagram(tower)
    for index in range(14):
        k, half = divmod(index, 2)
        sums = d.sums(index)
        assert sums.squares == sum(stirling(2 * k + half, j) for j in range(n + 1))
        assert sums.weighted == n**k == sums.tensor_dimension
        assert sums.generic_dimension == BELL[index]
        assert sums.faithful == (sums.squares == BELL[index])


def test_first_unfaithful_level():
    # P_k(n) acts faithfully on V^{⊗k} iff 2k <= n (Bell(2k) = sum_{j<=n} S(2k,j) exactly then)
    for n in range(1, 8):
        d = Diagram(parse_spec(f"symmetric:n={n}"))
        first = d.first_unfaithful(2 * n + 4)
        assert first is not None
        assert d.tower.level_of(first) == Fraction(n + 1, 2)


def _mn_character(lam, mu):
    """Murnaghan-Nakayama rule (Sagan, The Symmetric Group, 4.10): chi^lam at cycle type mu,
    removing border strips of lengths mu_1, mu_2, ... recursively (beta-set form)."""
    if not mu:
        return 1 if sum(lam) == 0 else 0
    r, rest = mu[0], mu[1:]
    ell = len(lam)
    beta = [lam[i] + ell - 1 - i for i in range(ell)]
    total = 0
    bset = set(beta)
    for b in beta:
        if b - r >= 0 and (b - r) not in bset:
            sign = (-1) ** sum(1 for c in beta if b - r < c < b)
            new = sorted([c for c in beta if c != b] + [b - r], reverse=True)
            new_lam = tuple(x for x in (new[i] - (ell - 1 - i) for i in range(ell)) if x > 0)
            total += sign * _mn_character(new_lam, rest)
    return total


def _z(mu):
    z = 1
    for part, mult in {p: mu.count(p) for p in set(mu)}.items():
        z *= part**mult * factorial(mult)
    return z


def test_mn_characters_against_textbook_tables():
    # character tables of S_3 and S_4 (e.g. Sagan, The Symmetric Group, 1.9, Example; from memory)
    classes3 = [(1, 1, 1), (2, 1), (3,)]
    assert [[_mn_character(l, c) for c in classes3] for l in [(3,), (2, 1), (1, 1, 1)]] == [
        [1, 1, 1], [2, 0, -1], [1, -1, 1]]
    classes4 = [(1, 1, 1, 1), (2, 1, 1), (2, 2), (3, 1), (4,)]
    assert [[_mn_character(l, c) for c in classes4] for l in [(4,), (3, 1), (2, 2), (2, 1, 1), (1, 1, 1, 1)]] == [
        [1, 1, 1, 1, 1], [3, 1, -1, 0, -1], [2, 0, 2, -1, 0], [3, -1, -1, 0, 1], [1, -1, 1, 1, -1]]


@pytest.mark.parametrize("n", range(1, 9))
def test_multiplicities_against_character_formula(n):
    # m_lambda(k) = sum_mu chi^lambda(mu) fix(mu)^k / z_mu (Sagan 1.10; fix = number of 1-cycles)
    d = Diagram(parse_spec(f"symmetric:n={n}"))
    classes = [tuple(sorted([k for k, m in p.items() for _ in range(m)], reverse=True)) for p in sympy_partitions(n)]
    for k in range(7):
        level = d.level(2 * k)
        for lam in partitions_of(n):
            expected = sum(Fraction(_mn_character(lam, mu) * mu.count(1) ** k, _z(mu)) for mu in classes)
            assert level.get(lam, 0) == expected


@pytest.mark.parametrize("n", [1, 2, 3, 5, 7])
def test_closed_form_against_path_counting(n):
    tower = parse_spec(f"symmetric:n={n}")
    d = Diagram(tower)
    for index in range(16):
        level = d.level(index)
        top = n - (index % 2)
        for p in partitions_of(top):
            assert tower.multiplicity(index, p) == level.get(p, 0)


def test_halves_no_counts_edges_through_the_hidden_level():
    full = Diagram(parse_spec("symmetric:n=5"))
    whole = Diagram(parse_spec("symmetric:n=5,halves=no"))
    for k in range(7):
        assert whole.level(k) == full.level(2 * k)
    # (5) -> (5) through (4): one edge; (4,1) -> (4,1) through (4) and (3,1): two edges
    assert dict(whole.children(1, (4, 1)))[(4, 1)] == 2


def test_closed_form_at_deep_levels_obeys_the_branching_recursion():
    # one step of path counting (m at k+1 is the sum over parents at k+1/2, which sum over k)
    # holds for the closed form at level 2000, where no level is built
    tower = parse_spec("symmetric:n=12")
    d = Diagram(tower)
    index = 2 * 2000
    nu = (6, 3, 3)
    via_parents = sum(e * tower.multiplicity(index - 1, mu) for mu, e in tower.parents(index, nu))
    assert via_parents == tower.multiplicity(index, nu) == d.multiplicity(index, nu)
    value = tower.multiplicity(2 * 100_000, (6, 3, 3))
    assert value.bit_length() > 300_000


def test_fast_node_order_is_the_sort_key_order():
    tower = parse_spec("symmetric:n=7")
    d = Diagram(tower)
    for index in range(12):
        level = list(d.level(index))
        assert d.nodes(index) == sorted(level, key=lambda p: tower.sort_key(p, index))
