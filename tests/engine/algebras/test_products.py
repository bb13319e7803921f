"""Products of diagrams and elements; element notation."""

from fractions import Fraction

import pytest
from hypothesis import given, settings
from hypothesis import strategies as st

from engine.algebras.bases import count, iter_basis, unrank
from engine.algebras.diagrams import identity, in_basis, parse_diagram
from engine.algebras.elements import Poly, element_json, format_element, parse_element
from engine.algebras.products import multiply, multiply_diagrams, specialize
from engine.capabilities import AlgebraLevel
from engine.errors import UserError


def level(kind: str, r: int, *, half: bool = False, word: str = "", parameter: int | None = 5) -> AlgebraLevel:
    return AlgebraLevel(kind=kind, name=f"{kind} {r}", vertices=r, half=half, n=5, parameter=parameter,
                        word=word, group="symmetric", dimension=0, level=Fraction(r), index=2 * r)


def e(text: str, lev: AlgebraLevel) -> dict:
    return parse_element(text, lev)


def test_temperley_lieb_relations():
    # Temperley–Lieb relations (Kauffman's diagrams; e.g. Goodman–de la Harpe–Jones, "Coxeter graphs
    # and towers of algebras", 1989, §2.8): e1^2 = x e1, e1 e2 e1 = e1, e2 e1 e2 = e2
    lev = level("temperley-lieb", 3, parameter=-2)
    e1 = e("{1,2},{3,3'},{1',2'}", lev)
    e2 = e("{1,1'},{2,3},{2',3'}", lev)
    assert multiply(e1, e1, lev) == {next(iter(e1)): -2}
    assert multiply(multiply(e1, e2, lev), e1, lev) == e1
    assert multiply(multiply(e2, e1, lev), e2, lev) == e2


def test_brauer_relations():
    # Brauer algebra relations (from memory; Brauer, Ann. of Math. 1937):
    # e^2 = x e, s e = e s = e, s^2 = 1
    lev = level("brauer", 2, parameter=3)
    ee = e("{1,2},{1',2'}", lev)
    s = e("{1,2'},{2,1'}", lev)
    assert multiply(ee, ee, lev) == {next(iter(ee)): 3}
    assert multiply(s, ee, lev) == ee == multiply(ee, s, lev)
    assert multiply(s, s, lev) == {identity(2): 1}


def test_partition_relations():
    # the presentation of the partition algebra by generators (from memory; stated as a theorem in a
    # 2005 survey of partition algebras, European J. Combin.):
    # p_i^2 = x p_i, p_{i+1/2}^2 = p_{i+1/2}, p_i p_{i+1/2} p_i = p_i, p_{i+1/2} p_i p_{i+1/2} = p_{i+1/2}
    lev = level("partition", 2, parameter=4)
    p1 = e("{1},{1'},{2,2'}", lev)
    p2 = e("{1,1'},{2},{2'}", lev)
    p_half = e("{1,2,1',2'}", lev)
    for p in (p1, p2):
        assert multiply(p, p, lev) == {next(iter(p)): 4}
        assert multiply(multiply(p, p_half, lev), p, lev) == p
        assert multiply(multiply(p_half, p, lev), p_half, lev) == p_half
    assert multiply(p_half, p_half, lev) == p_half


def test_element_product_hand_computation():
    # hand computation in CS_2: (1 - s)^2 = 2(1 - s)
    lev = level("symmetric-group", 2, parameter=None)
    a = e("{1,1'},{2,2'} - {1,2'},{2,1'}", lev)
    assert multiply(a, a, lev) == {d: 2 * c for d, c in a.items()}


def test_symbolic_loops():
    # hand computation: {1},{2},{1'},{2'} squared closes two loops: x^2 times itself
    lev = level("partition", 2)
    d = parse_diagram("{1},{2},{1'},{2'}", 2)
    product, c = multiply_diagrams(d, d, lev, symbolic=True)
    assert product == d and c == Poly((0, 0, 1))
    doc = element_json(multiply({d: 1}, {d: 1}, lev, symbolic=True), lev)
    assert doc == {"terms": [{"coefficient": [0, 0, 1], "diagram": "{1},{2},{1'},{2'}"}]}


CLOSED = [level("partition", 2), level("partition", 3, half=True), level("brauer", 3), level("temperley-lieb", 4),
          level("symmetric-group", 3), level("walled-brauer", 4, word="vdvd"), level("walled-brauer", 3, word="vvd")]


@pytest.mark.parametrize("lev", CLOSED, ids=lambda lv: lv.name + lv.word + ("h" if lv.half else ""))
def test_products_stay_in_basis(lev):
    # common practice: each diagram basis is closed under gluing (a product is a basis diagram times x^loops)
    basis = list(iter_basis(lev))
    step = max(1, len(basis) // 40)
    for d1 in basis[::step]:
        for d2 in basis:
            product, loops = multiply_diagrams(d1, d2, lev, symbolic=True)
            assert in_basis(product, lev)
        assert multiply_diagrams(identity(lev.vertices), d1, lev) == (d1, 1) == multiply_diagrams(d1, identity(lev.vertices), lev)


KINDS = [level("partition", 3), level("partition", 3, half=True), level("brauer", 4), level("temperley-lieb", 5),
         level("symmetric-group", 4, parameter=None), level("walled-brauer", 4, word="vvdd")]


@settings(max_examples=60, deadline=None)
@given(st.sampled_from(KINDS), st.lists(st.integers(min_value=0, max_value=10**6), min_size=3, max_size=3),
       st.lists(st.integers(min_value=-3, max_value=3), min_size=6, max_size=6), st.booleans())
def test_associative(lev, ranks, coefficients, symbolic):
    # common practice: the diagram algebras are associative, at a number and with a symbolic parameter
    total = count(lev)
    a = {unrank(lev, ranks[0] % total): coefficients[0], unrank(lev, (ranks[0] * 7 + 1) % total): coefficients[1]}
    b = {unrank(lev, ranks[1] % total): coefficients[2], unrank(lev, (ranks[1] * 3 + 2) % total): coefficients[3]}
    c = {unrank(lev, ranks[2] % total): coefficients[4] or 1, unrank(lev, (ranks[2] + 5) % total): coefficients[5]}
    a, b, c = ({d: v for d, v in x.items() if v} for x in (a, b, c))
    left = multiply(multiply(a, b, lev, symbolic), c, lev, symbolic)
    right = multiply(a, multiply(b, c, lev, symbolic), lev, symbolic)
    assert left == right
    if symbolic:
        assert specialize(left, 5) == multiply(multiply(a, b, lev), c, lev)


def test_parse_and_format_elements():
    # the contract's example element (cli-contract.md, "Elements")
    lev = level("brauer", 2)
    a = parse_element("{1,1'},{2,2'} - 2*{1,2},{1',2'}", lev)
    # basis order: the Brauer rank 0 is {1,2},{1',2'}
    assert format_element(a, lev) == "-2*{1,2},{1',2'} + {1,1'},{2,2'}"
    assert parse_element("- 2*{1,2},{1',2'} + 1*{2',2},{1,1'} + {1,2},{1',2'}", lev) == \
        {parse_diagram("{1,2},{1',2'}", 2): -1, identity(2): 1}
    assert format_element(parse_element("{1,2},{1',2'} - {1',2'},{1,2}", lev), lev) == "0"
    assert element_json(a, lev)["terms"][0] == {"coefficient": -2, "diagram": "{1,2},{1',2'}"}


@pytest.mark.parametrize("text", ["", "2*", "{1,1'},{2,2'} +", "{1,1'},{2,2'} + - {1,2},{1',2'}", "x*{1,1'},{2,2'}",
                                  "{1,2,1'},{2'}"])
def test_bad_elements(text):
    # common practice: integer coefficients times basis diagrams only
    with pytest.raises(UserError) as info:
        parse_element(text, level("brauer", 2))
    assert "\n" not in str(info.value)


def test_poly_arithmetic():
    # hand computation: (x + 1)(x - 1) = x^2 - 1, value at 3 is 8
    p = (Poly((1, 1)) * Poly((-1, 1)))
    assert p == Poly((-1, 0, 1)) and p(3) == 8 and p.text() == "x^2 - 1"
    assert (p - p) == 0 and not (p - p)
