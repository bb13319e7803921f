"""Generating functions, closed forms over characters, growth and deep jumps of finite towers."""

from __future__ import annotations

import sympy
import pytest

from engine.capabilities import ClosedForm, FiniteSteps
from engine.diagram import Diagram
from engine.jumps import level_vector, matrix_level_vector
from engine.series.eigen_sums import eigen_sum
from engine.series.finite import finite_view
from engine.series.growth import growth
from engine.series.rational import all_series, berlekamp_massey, expand, rational_function, terms
from engine.specs import parse_spec

TOWERS = ["su2:kind=icosahedral", "su2:kind=dihedral,m=4", "symmetric:n=4", "alternating:n=5",
          "characters:group=symmetric(4),module=(3,1)", "characters:group=dihedral(5),module=r1",
          "characters:group=cyclic(5),module=x1+x2"]


def _sympy_levels(view, count):
    """e_root·W^k (and ·R at half levels) by sympy matrices: the reference for the series (sympy)."""
    w = sympy.Matrix(view.matrix)
    v = sympy.zeros(1, view.size)
    v[view.root] = 1
    r = sympy.Matrix(view.half_matrix) if view.period == 2 else None
    whole, half = [], []
    for _ in range(count):
        whole.append(list(v))
        if r is not None:
            half.append(list(v * r))
        v = v * w
    return whole, half


@pytest.mark.parametrize("spec", TOWERS)
def test_series_coefficients_are_the_path_counts_for_40_levels(spec):
    # sympy: the powers of the step matrix; the diagram's sweep counts paths level by level
    tower = parse_spec(spec)
    view = finite_view(tower, "test")
    whole, half = _sympy_levels(view, 40)
    diagram = Diagram(tower)
    for s in all_series(view):
        rows = half if s.half else whole
        position = (view.half_labels if s.half else view.labels).index(s.label)
        assert expand(s.numerator, s.denominator, 40) == [row[position] for row in rows]
        assert s.denominator[0] == 1
        assert s.numerator[-1] != 0 or s.numerator == (0,)
        # lowest terms: gcd(N, D) = 1 (sympy)
        t = sympy.Symbol("t")
        n = sympy.Poly(list(reversed(s.numerator)), t)
        d = sympy.Poly(list(reversed(s.denominator)), t)
        assert s.numerator == (0,) or sympy.gcd(n, d).degree() == 0
    for k in range(12):
        level = diagram.level(k * view.period)
        for i, node in enumerate(view.nodes):
            assert level.get(node, 0) == whole[k][i]


def _stirling_gf(n: int):
    """Σ_{j ≤ N} t^j / Π_{i ≤ j}(1 − i·t): the generating function of Σ_{j ≤ N} S(k, j)
    (Stanley, Enumerative Combinatorics vol. 1, 1.9 / Stirling numbers' generating function)."""
    t = sympy.Symbol("t")
    total = sum(t ** j / sympy.prod([1 - i * t for i in range(1, j + 1)]) for j in range(n + 1))
    return t, sympy.cancel(sympy.together(total))


def _as_lists(t, expr):
    num, den = sympy.fraction(sympy.cancel(expr))
    num, den = sympy.Poly(num, t), sympy.Poly(den, t)
    c = den.eval(0)
    num, den = num * (1 / c), den * (1 / c)  # D(0) = 1
    n = [int(x) for x in reversed(num.all_coeffs())]
    d = [int(x) for x in reversed(den.all_coeffs())]
    return tuple(n), tuple(d)


@pytest.mark.parametrize("n", [3, 4, 5, 6])
def test_symmetric_trivial_node_is_the_stirling_generating_function(n):
    # Stanley EC1 (the Stirling numbers' generating function); the half level k+1/2 holds the trivial
    # S_{N-1}-module Σ_j S(k+1, j) times (hand computation: S_{N-1}-orbits on [N]^k), so (F − 1)/t
    tower = parse_spec(f"symmetric:n={n}")
    view = finite_view(tower, "test")
    series = {(s.half, s.label): s for s in all_series(view)}
    t, f = _stirling_gf(n)
    whole = series[(False, f"({n})")]
    assert (whole.numerator, whole.denominator) == _as_lists(t, f)
    half = series[(True, f"({n - 1})")]
    assert (half.numerator, half.denominator) == _as_lists(t, (f - 1) / t)


def test_berlekamp_massey_on_fibonacci():
    # common practice: F(k) has generating function t/(1 − t − t²)
    fib = [0, 1]
    for _ in range(20):
        fib.append(fib[-1] + fib[-2])
    assert rational_function(fib) == ((0, 1), (1, -1, -1))
    assert [int(x) for x in berlekamp_massey([0] * 8)] == [1]
    assert rational_function([0] * 8) == ((0,), (1,))


@pytest.mark.parametrize("spec", TOWERS)
def test_deep_jumps_equal_the_matrix_powers(spec):
    # the plain route: repeated squaring of the whole step (Knuth TAOCP 4.6.3)
    steps = parse_spec(spec).capability(FiniteSteps)
    for index in (0, 1, 2, 7, 61, 500, 1001):
        assert level_vector(steps, index) == matrix_level_vector(steps, index)


@pytest.mark.parametrize("n", [4, 5, 6])
def test_deep_jumps_equal_the_symmetric_closed_form(n):
    # the S_N closed form m_λ(k) = Σ_t S(k,t) f^{λ/(N−t)} (the S_N closed form, engine.closed_forms)
    tower = parse_spec(f"symmetric:n={n}")
    steps = tower.capability(FiniteSteps)
    closed = tower.capability(ClosedForm)
    for index in (0, 3, 40, 401, 1200):
        nodes = steps.steps[index % 2].rows
        for node, m in zip(nodes, level_vector(steps, index)):
            assert m == closed.multiplicity(index, node)


@pytest.mark.parametrize("spec,label", [("characters:group=symmetric(4),module=(3,1)", "(2,2)"),
                                        ("characters:group=symmetric(5),module=(4,1)", "(3,1,1)"),
                                        ("characters:group=dihedral(5),module=r1", "r2"),
                                        ("symmetric:n=5,module=(5)+(4,1)", "(3,2)")])
def test_sum_over_characters_equals_the_path_counts(spec, label):
    # Serre §2.3: m_i(k) = (1/|G|) Σ_C |C| χ_V(C)^k conj χ_i(C); reference: sympy matrix powers
    form, expected = _sum_over_characters(spec, label)
    from engine.class_functions import exact

    assert [exact(form.value(k)) for k in range(14)] == expected


def _sum_over_characters(spec, label):
    """The node's sum over characters and its multiplicities at k = 0..13 by sympy's matrix powers."""
    tower = parse_spec(spec)
    view = finite_view(tower, "test")
    whole, _ = _sympy_levels(view, 14)
    i = view.labels.index(label)
    return eigen_sum(tower, label, view.period), [int(row[i]) for row in whole]


@pytest.mark.parametrize("spec,label", [("characters:group=dihedral(5),module=r1", "r2"),
                                        ("characters:group=dihedral(5),module=r1", "e"),
                                        ("characters:group=symmetric(5),module=(4,1)", "(3,1,1)")])
def test_the_printed_sum_over_characters_is_the_path_counts(spec, label):
    # the text as printed, read by sympy (· for *, − for -, ^ for **), gives the multiplicities
    # of sympy's matrix powers at k = 0..13 (D_5's bases are (−1 ± √5)/2: signs in front of
    # sums of square roots)
    import sympy

    form, expected = _sum_over_characters(spec, label)
    expression = sympy.parse_expr(form.text().replace("·", "*").replace("−", "-").replace("^", "**"),
                                  local_dict={"i": sympy.I, "k": sympy.Symbol("k")})
    for k in range(14):
        assert sympy.simplify(sympy.expand(expression.subs("k", k)) - expected[k]) == 0  # exactly


def test_s4_sum_over_characters_text():
    # hand computation from the S_4 character table: (2,2) on (3,1): χ_V = 3, 1, −1, 0, −1
    tower = parse_spec("characters:group=symmetric(4),module=(3,1)")
    assert eigen_sum(tower, "(2,2)", 1).text() == "(1/12)·3^k − (1/3)·0^k + (1/4)·(-1)^k"


@pytest.mark.parametrize("spec,period,order", [("su2:kind=icosahedral", 2, 120), ("su2:kind=octahedral", 2, 48),
                                               ("characters:group=symmetric(5),module=(4,1)", 1, 120)])
def test_growth_is_d_times_dim_v_to_the_k_over_the_order(spec, period, order):
    # Perron–Frobenius (Gantmacher XIII §5): m_i(k) ~ p·d_i·n^k/|G|; orders from memory (McKay 1980)
    view = finite_view(parse_spec(spec), "test")
    whole, _ = terms(view, 301)
    for i in range(view.size):
        g = growth(view, False, i, [row[i] for row in whole])
        assert g.period == period and g.order == order
        k, ratio = g.ratios[-1]
        assert abs(float(ratio) - 1) < 1e-6
        assert all(whole[j][i] == 0 for j in range(250, 301) if j % period != g.residue)
