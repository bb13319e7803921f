"""The tensor-product random walk: transition matrix, stationary law, eigenvalues, exact distances."""

from __future__ import annotations

from fractions import Fraction

import pytest
import sympy

from engine.errors import TooLarge, UserError
from engine.series.finite import finite_view
from engine.specs import parse_spec
from engine.walks.chain import eigenvalues, stationary, transition, walk

TOWERS = ["su2:kind=tetrahedral", "su2:kind=icosahedral", "symmetric:n=4", "alternating:n=5",
          "characters:group=symmetric(5),module=(4,1)", "characters:group=dihedral(5),module=r1"]


@pytest.mark.parametrize("spec", TOWERS)
def test_rows_of_p_sum_to_one(spec):
    # common practice: Σ_j M_ij d_j = dim V·d_i makes P stochastic
    p = transition(finite_view(parse_spec(spec), "test"))
    assert all(sum(row) == 1 for row in p)


@pytest.mark.parametrize("kind,order,dimensions", [
    ("tetrahedral", 24, [1, 1, 1, 2, 2, 2, 3]),            # affine E6 (McKay 1980; from memory)
    ("octahedral", 48, [1, 1, 2, 2, 2, 3, 3, 4]),          # affine E7
    ("icosahedral", 120, [1, 2, 2, 3, 3, 4, 4, 5, 6]),     # affine E8
])
def test_stationary_law_is_plancherel_for_binary_polyhedral_groups(kind, order, dimensions):
    view = finite_view(parse_spec(f"su2:kind={kind}"), "test")
    assert sorted(view.dimensions) == dimensions
    pi, plancherel = stationary(view)
    assert plancherel
    assert list(pi) == [Fraction(d * d, order) for d in view.dimensions]
    p = transition(view)
    assert all(sum(pi[i] * p[i][j] for i in range(view.size)) == pi[j] for j in range(view.size))


@pytest.mark.parametrize("spec", ["characters:group=symmetric(4),module=(3,1)", "characters:group=symmetric(5),module=(4,1)",
                                  "symmetric:n=5,module=(4,1)+(3,2)"])
def test_eigenvalues_are_the_character_values_over_dim_v(spec):
    # column orthogonality (Serre §2.5): u_i = χ_i(C)/d_i satisfies P·u = (χ_V(C)/dim V)·u;
    # and the spectrum of P as sympy finds it (sympy eigenvals)
    tower = parse_spec(spec)
    view = finite_view(tower, "test")
    values = eigenvalues(tower, view)
    p = sympy.Matrix(transition(view))
    spectrum: dict = {}
    for _, value in values:
        spectrum[sympy.Rational(value.numerator, value.denominator)] = spectrum.get(
            sympy.Rational(value.numerator, value.denominator), 0) + 1
    assert p.eigenvals() == spectrum


def _direct(view, steps, lazy=False):
    """μ_k = μ_{k−1}·P with Fractions (the definition; hand computation route)."""
    p = transition(view)
    if lazy:
        p = [[(Fraction(1) if i == j else Fraction(0)) / 2 + x / 2 for j, x in enumerate(row)] for i, row in enumerate(p)]
    mu = [Fraction(1 if i == view.root else 0) for i in range(view.size)]
    pi, _ = stationary(view)
    out = []
    for _ in range(steps + 1):
        out.append(sum(abs(a - b) for a, b in zip(mu, pi)) / 2)
        mu = [sum(mu[i] * p[i][j] for i in range(view.size)) for j in range(view.size)]
    return out


@pytest.mark.parametrize("spec", TOWERS)
@pytest.mark.parametrize("lazy", [False, True])
def test_total_variation_matches_the_definition(spec, lazy):
    view = finite_view(parse_spec(spec), "test")
    w = walk(view, 12, lazy)
    assert list(w.total_variation) == _direct(view, 12, lazy)
    assert w.total_variation[0] == 1 - w.stationary[view.root]
    assert all(0 <= s <= 1 for s in w.separation)
    # separation bounds total variation (Aldous–Diaconis 1987)
    assert all(d <= s for d, s in zip(w.total_variation, w.separation))


def test_symmetric_walk_hand_values():
    # hand computation: S_3 on C^3, restriction then induction; after one step from (3):
    # μ_1 = (1/3, 2/3, 0) against π = (1/6, 2/3, 1/6): distance 1/6
    w = walk(finite_view(parse_spec("symmetric:n=3"), "test"), 2)
    assert w.total_variation[:2] == (Fraction(5, 6), Fraction(1, 6))


def test_periodic_walk_and_its_lazy_version():
    # the McKay graph of a binary polyhedral group on C^2 is bipartite (common practice)
    view = finite_view(parse_spec("su2:kind=octahedral"), "test")
    w = walk(view, 60)
    assert w.period == 2 and w.total_variation[-1] >= Fraction(1, 3)
    lazy = walk(view, 60, lazy=True)
    assert lazy.period == 1 and lazy.total_variation[-1] < Fraction(1, 100)
    assert lazy.mixing_time(Fraction(1, 4)) is not None


def test_costly_walk_refused_up_front():
    view = finite_view(parse_spec("su2:kind=icosahedral"), "test")
    with pytest.raises(TooLarge, match="products"):
        walk(view, 10 ** 6)
    with pytest.raises(UserError):
        walk(view, -1)
