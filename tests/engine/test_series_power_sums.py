"""Closed forms over the eigenvalues of the whole step, for towers with half levels (S_N, A_N) and
others whose step has rational eigenvalues (engine.series.power_sums)."""

from __future__ import annotations

from fractions import Fraction

import pytest
import sympy
from sympy.functions.combinatorial.numbers import stirling

from engine.character_tables import symmetric_table
from engine.closed_forms import symmetric_closed_form
from engine.diagram import Diagram
from engine.export.finite_documents import series_document
from engine.partitions import parse_partition
from engine.series.finite import finite_view
from engine.series.power_sums import PowerSum, integer_roots, power_sum
from engine.series.rational import Series, all_series
from engine.specs import parse_spec

HALF_LEVEL_TOWERS = ["symmetric:n=3", "symmetric:n=4", "symmetric:n=5", "symmetric:n=6",
                     "alternating:n=4", "alternating:n=5", "alternating:n=6"]


def _sums(spec: str) -> tuple[object, list[PowerSum]]:
    view = finite_view(parse_spec(spec), "test")
    found = [power_sum(s) for s in all_series(view)]
    assert all(f is not None for f in found), spec
    return view, found  # type: ignore[return-value]


@pytest.mark.parametrize("spec", HALF_LEVEL_TOWERS + ["symmetric:n=5,halves=no", "su2:kind=cyclic,m=4"])
def test_power_sums_equal_the_path_counts_for_40_levels(spec):
    # the diagram's sweep counts paths level by level (independent of the step matrices' powers)
    tower = parse_spec(spec)
    view, found = _sums(spec)
    diagram = Diagram(tower)
    for form in found:
        for k in range(40):
            index = k * view.period + (1 if form.half else 0)
            node = tower.parse(form.label, index)
            assert form.value(k) == diagram.level(index).get(node, 0), (form.label, k)


@pytest.mark.parametrize("n", [3, 4, 5, 6, 7])
def test_symmetric_power_sums_are_the_closed_form(n):
    # engine.closed_forms (m_λ(k) = Σ_t f^{λ/(N−t)} S(k,t) as an exponential sum; Graham, Knuth,
    # Patashnik (6.19)): at whole levels the same Σ_j b_j j^k; at half levels it writes
    # Σ_j b_j j^(k+1), so our coefficient of j^k is j·b_j
    view, found = _sums(f"symmetric:n={n}")
    for form in found:
        closed = symmetric_closed_form(n, parse_partition(form.label), form.half)
        ours = {base: c for base, p, c in form.terms if p == 0}
        assert all(p == 0 for _, p, _ in form.terms)  # W is diagonalisable (a group's McKay matrix)
        ours.update({0: c for k0, c in form.corrections if k0 == 0})
        assert all(k0 == 0 for k0, _ in form.corrections)
        expected = {j: (j * b if form.half else b) for j, b in closed.powers.items()}
        assert ours == {j: b for j, b in expected.items() if b}


def _fixed_points(cycle_type: str) -> int:
    return parse_partition(cycle_type).count(1)


@pytest.mark.parametrize("n", [4, 5, 6])
def test_symmetric_power_sums_from_the_characters(n):
    # Serre §2.3: m_λ(k) = (1/N!) Σ_C |C| fix(C)^k χ_λ(C) (the permutation character counts fixed
    # points, Serre ex. 2.6); at k+1/2, restricted to S_{N−1}: (1/(N−1)!) Σ_C' |C'| (fix(C')+1)^k χ_μ(C')
    view, found = _sums(f"symmetric:n={n}")
    for form in found:
        table = symmetric_table(n - 1 if form.half else n)
        row = table.values[table.names.index(form.label)]
        expected: dict[int, Fraction] = {}
        for cls, size, chi in zip(table.classes, table.sizes, row):
            base = _fixed_points(cls) + (1 if form.half else 0)
            expected[base] = expected.get(base, Fraction(0)) + Fraction(size * chi, table.order)
        ours = {base: c for base, _, c in form.terms} | {0: c for _, c in form.corrections}
        assert ours == {b: c for b, c in expected.items() if c}


@pytest.mark.parametrize("n", [3, 4, 5, 6])
def test_trivial_nodes_are_sums_of_stirling_numbers(n):
    # OEIS A008277 (Stirling numbers of the second kind, by sympy): m_(N)(k) = Σ_{t ≤ N} S(k,t);
    # the half level's trivial S_{N−1}-module Σ_{t ≤ N} S(k+1,t) (hand computation: the S_{N−1}-orbits
    # on [N]^k are the set partitions of [k+1] into at most N blocks, k+1 marking the fixed point)
    view, found = _sums(f"symmetric:n={n}")
    forms = {(f.half, f.label): f for f in found}
    whole, half = forms[(False, f"({n})")], forms[(True, f"({n - 1})")]
    for k in range(40):
        assert whole.value(k) == sum(stirling(k, t) for t in range(n + 1))
        assert half.value(k) == sum(stirling(k + 1, t) for t in range(n + 1))
    # OEIS A000110: Bell numbers 1, 1, 2, 5, 15, 52, 203 while k ≤ N
    assert [whole.value(k) for k in range(n + 1)] == [1, 1, 2, 5, 15, 52, 203][: n + 1]


def test_texts_and_shift_convention():
    # hand computation from the S_3 character table (fixed points 3, 1, 0 on classes of size 1, 3, 2;
    # χ_(2,1) = 2, 0, −1) and of S_2 at the half level (bases fix + 1 = 3, 1)
    tower = parse_spec("symmetric:n=3")
    whole = series_document(tower, "(2,1)")
    assert whole["closed_form"] == "(1/3)·3^k − (1/3)·0^k" and whole["closed_form_of"] == "m(k)"
    half = series_document(tower, "(1,1)")
    assert half["closed_form"] == "(1/2)·3^k − (1/2)·1^k" and half["closed_form_of"] == "m(k+1/2)"


def test_no_form_where_the_eigenvalues_are_irrational():
    # sympy: the denominator of o:6 on affine E8 has an irreducible factor of degree > 1 over Q
    # (the eigenvalues are the character values of C^2, 2cos of angles such as π/5: irrational)
    doc = series_document(parse_spec("su2:kind=icosahedral"), "o:6")
    assert "closed_form" not in doc
    t = sympy.Symbol("t")
    factors = sympy.factor_list(sum(c * t ** i for i, c in enumerate(doc["denominator"])))[1]
    assert any(sympy.degree(f, t) > 1 for f, _ in factors)


def test_repeated_roots_and_polynomial_part():
    # hand computation: 1/(1 − 2t)^2 = Σ (k+1) 2^k t^k; (1 + t + t^2)/(1 − t) = 1, 2, 3, 3, 3, ...
    form = power_sum(Series("x", False, (1,), (1, -4, 4)))
    assert form is not None and form.text() == "k·2^k + 2^k"
    assert [form.value(k) for k in range(6)] == [(k + 1) * 2 ** k for k in range(6)]
    form = power_sum(Series("y", False, (1, 1, 1), (1, -1)))
    assert form is not None and form.text() == "3·1^k − 2·0^k − [k = 1]"
    assert [form.value(k) for k in range(5)] == [1, 2, 3, 3, 3]
    assert integer_roots((1, 0, -2)) is None  # 1 − 2t²: roots ±√2 (hand computation)
    assert power_sum(Series("z", False, (0,), (1,))).text() == "0"
