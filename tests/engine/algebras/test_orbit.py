"""The orbit basis of the partition algebra: Möbius inversion, roundtrips, and the action it is
defined by."""

import random
from fractions import Fraction
from itertools import product

import pytest

from engine.algebras.bases import count, iter_basis, unrank
from engine.algebras.diagrams import parse_diagram
from engine.algebras.orbit import coarsenings, from_orbit, mobius, multiply_orbit, to_orbit
from engine.algebras.products import multiply
from engine.capabilities import AlgebraLevel
from engine.errors import TooLarge, UserError

# OEIS A000110
BELL = [1, 1, 2, 5, 15, 52, 203, 877, 4140]


def level(r: int, half: bool = False, kind: str = "partition") -> AlgebraLevel:
    return AlgebraLevel(kind=kind, name=f"P_{r}", vertices=r, half=half, n=3, parameter=3, word="",
                        group="symmetric", dimension=0, level=Fraction(r), index=2 * r)


@pytest.mark.parametrize("k", range(1, 4))
def test_coarsenings_of_singletons_are_all_diagrams(k):
    # OEIS A000110: the diagram of 2k singletons has Bell(2k) coarsenings, all the basis
    singletons = tuple((v,) for v in range(2 * k))
    found = {rho for rho, _ in coarsenings(singletons)}
    assert len(found) == BELL[2 * k] == count(level(k))
    assert found == set(iter_basis(level(k)))


def test_mobius_values():
    # Stanley, Enumerative Combinatorics 1, Example 3.10.4: μ(0̂, 1̂) = (-1)^{n-1} (n-1)! on n points
    for n in range(1, 7):
        assert mobius((tuple(range(n)),)) == (-1) ** (n - 1) * [1, 1, 2, 6, 24, 120][n - 1]
    # Möbius function property (Stanley EC1 §3.7): Σ_{ρ ≥ π} μ(π, ρ) = 0 unless π is the top
    d = parse_diagram("{1},{2,1'},{2'}", 2)
    assert sum(mobius(groups) for _, groups in coarsenings(d)) == 0


@pytest.mark.parametrize("lev", [level(2), level(3), level(2, half=True), level(3, half=True)],
                         ids=lambda lv: f"{lv.vertices}{'h' if lv.half else ''}")
def test_roundtrip(lev):
    # common practice (Möbius inversion): the two changes of basis are inverse
    rng = random.Random(10)
    total = count(lev)
    for _ in range(20):
        e = {unrank(lev, rng.randrange(total)): rng.randint(-5, 5) for _ in range(4)}
        e = {d: c for d, c in e.items() if c}
        assert from_orbit(to_orbit(e, lev), lev) == e
        assert to_orbit(from_orbit(e, lev), lev) == e


def _action(d, r: int, n: int, exact: bool) -> dict:
    """The matrix of a diagram on (C^n)^{⊗r} written directly from the definitions (a 2005
    survey of partition algebras, §3–4): entry (i, j) is 1 when the indices i_1..i_r, j_1..j_r are equal within every block
    of d (the diagram basis) or, for the orbit basis, equal exactly within the blocks."""
    out = {}
    for indices in product(range(n), repeat=2 * r):
        inside = all(len({indices[v] for v in block}) == 1 for block in d)
        if exact:
            distinct = len({indices[block[0]] for block in d}) == len(d)
            inside = inside and distinct
        if inside:
            out[indices] = 1
    return out


def _element_action(e, r, n):
    total = {}
    for d, c in e.items():
        for key, v in _action(d, r, n, exact=False).items():
            total[key] = total.get(key, 0) + c * v
    return {k: v for k, v in total.items() if v}


@pytest.mark.parametrize("r,n", [(2, 2), (2, 3), (3, 2)])
def test_orbit_elements_act_by_exact_patterns(r, n):
    # the definition of the orbit basis (a 2005 survey of partition algebras): x_π acts by the index patterns equal
    # exactly on π's blocks; here its diagram-basis expansion is checked against that matrix
    lev = level(r)
    for d in list(iter_basis(lev))[::7]:
        assert _element_action(from_orbit({d: 1}, lev), r, n) == _action(d, r, n, exact=True)


def test_orbit_product_agrees_with_diagram_product():
    # common practice: the product does not depend on the basis it is computed in
    lev = level(2)
    a = {parse_diagram("{1},{2,1'},{2'}", 2): 2}
    b = {parse_diagram("{1,2},{1'},{2'}", 2): -1}
    assert from_orbit(multiply_orbit(a, b, lev), lev) == multiply(from_orbit(a, lev), from_orbit(b, lev), lev)


def test_refusals():
    # common practice: no orbit basis outside the partition algebras; costly conversions refused
    with pytest.raises(UserError):
        to_orbit({((0, 1),): 1}, level(1, kind="brauer"))
    singletons = tuple((v,) for v in range(16))
    with pytest.raises(TooLarge):
        to_orbit({singletons: 1}, level(8))


def test_orbit_square_in_p1_symbolic():
    # hand computation: x_{1|1'} acts as J − I, and (J − I)^2 = (N − 1)·I + (N − 2)·(J − I), i.e.
    # x_{1|1'}^2 = (x − 1)·x_{11'} + (x − 2)·x_{1|1'}
    from engine.algebras.elements import Poly

    lev = level(1)
    apart = parse_diagram("{1},{1'}", 1)
    square = multiply_orbit({apart: 1}, {apart: 1}, lev, symbolic=True)
    assert square == {parse_diagram("{1,1'}", 1): Poly((-1, 1)), apart: Poly((-2, 1))}
