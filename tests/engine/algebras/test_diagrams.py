"""Diagram notation, gluing and basis membership."""

from fractions import Fraction

import pytest

from engine.algebras.diagrams import (
    canonical, compose, format_diagram, identity, in_basis, is_planar, parse_diagram, propagating_count,
)
from engine.capabilities import AlgebraLevel
from engine.errors import UserError


def level(kind: str, r: int, *, half: bool = False, word: str = "", parameter: int | None = 3) -> AlgebraLevel:
    return AlgebraLevel(kind=kind, name="test", vertices=r, half=half, n=3, parameter=parameter, word=word,
                        group="symmetric", dimension=0, level=Fraction(r), index=2 * r)


def test_parse_and_format_contract_example():
    # the contract's example {1,2'},{2,3,1'},{3'} (cli-contract.md, "Diagrams")
    d = parse_diagram("{1,2'},{2,3,1'},{3'}", 3)
    assert d == ((0, 4), (1, 2, 3), (5,))
    assert format_diagram(d, 3) == "{1,2'},{2,3,1'},{3'}"


def test_parse_any_order_and_spaces():
    # the contract: blocks and vertices in any order, spaces allowed (cli-contract.md)
    assert parse_diagram(" { 3' } , {1', 3, 2}, {2', 1}", 3) == parse_diagram("{1,2'},{2,3,1'},{3'}", 3)


def test_empty_diagram():
    # the contract: level 0 is written {}
    assert parse_diagram("{}", 0) == ()
    assert format_diagram((), 0) == "{}"


@pytest.mark.parametrize("text", ["{1,1'},{2,2'},{1}", "{1,1'}", "{1,4'},{2,2'}", "{1,1'},{2,x}", "1,1'",
                                  "{1,1'},{},{2,2'}", "{1,1'}{2,2'}"])
def test_bad_diagrams_one_line(text):
    # common practice: every vertex once, known vertices only
    with pytest.raises(UserError) as info:
        parse_diagram(text, 2)
    assert "\n" not in str(info.value)


def test_canonical_order():
    # the contract's canonical output order: blocks by their first vertex 1 < ... < k < 1' < ...
    assert canonical([(5, 1), (4,), (0, 3, 2)]) == ((0, 2, 3), (1, 5), (4,))


def test_compose_identity_and_loops():
    # hand computation: the identity is neutral; e = {1,2},{1',2'} squares to x·e (one loop)
    e = parse_diagram("{1,2},{1',2'}", 2)
    assert compose(identity(2), e, 2) == (e, 0)
    assert compose(e, identity(2), 2) == (e, 0)
    assert compose(e, e, 2) == (e, 1)


def test_compose_partition_example():
    # hand computation: {1},{2,1'},{2'} above {1,2},{1'},{2'}: middle 1,2 form one block
    # touching top 2 → product {1},{2},{1'},{2'} with no loop
    d1 = parse_diagram("{1},{2,1'},{2'}", 2)
    d2 = parse_diagram("{1,2},{1'},{2'}", 2)
    product, loops = compose(d1, d2, 2)
    assert format_diagram(product, 2) == "{1},{2},{1'},{2'}"
    assert loops == 0
    # hand computation: two isolated middle points make two loops: {1},{2},{1'},{2'} squared
    single = parse_diagram("{1},{2},{1'},{2'}", 2)
    assert compose(single, single, 2) == (single, 2)


def test_compose_permutations():
    # hand computation: the transposition s = (1 2) squares to the identity
    s = parse_diagram("{1,2'},{2,1'}", 2)
    assert compose(s, s, 2) == (identity(2), 0)


def test_propagating_and_planar():
    # hand computation
    d = parse_diagram("{1,2'},{2,3,1'},{3'}", 3)
    assert propagating_count(d, 3) == 2
    assert not is_planar(parse_diagram("{1,2'},{2,1'}", 2), 2)
    assert is_planar(parse_diagram("{1,2},{1',2'}", 2), 2)
    assert is_planar(parse_diagram("{1,1'},{2,3},{2',3'}", 3), 3)
    assert not is_planar(parse_diagram("{1,3},{2,2'},{1',3'}", 3), 3)


def test_in_basis_kinds():
    # common practice: the definitions of the Brauer, Temperley–Lieb, symmetric group and walled
    # Brauer bases
    cross = parse_diagram("{1,2'},{2,1'}", 2)
    cup = parse_diagram("{1,2},{1',2'}", 2)
    mixed = parse_diagram("{1,2,1'},{2'}", 2)
    assert in_basis(mixed, level("partition", 2))
    assert not in_basis(mixed, level("brauer", 2))
    assert in_basis(cross, level("brauer", 2)) and in_basis(cup, level("brauer", 2))
    assert not in_basis(cross, level("temperley-lieb", 2)) and in_basis(cup, level("temperley-lieb", 2))
    assert in_basis(cross, level("symmetric-group", 2)) and not in_basis(cup, level("symmetric-group", 2))
    vd = level("walled-brauer", 2, word="vd")
    assert in_basis(cup, vd) and in_basis(identity(2), vd) and not in_basis(cross, vd)
    vv = level("walled-brauer", 2, word="vv")
    assert not in_basis(cup, vv) and in_basis(cross, vv)


def test_in_basis_half():
    # the contract: at a half level k+1/2 the vertices k+1 and (k+1)' lie in one block
    half = level("partition", 2, half=True)
    assert in_basis(parse_diagram("{1},{2,2'},{1'}", 2), half)
    assert in_basis(parse_diagram("{1,2,1',2'}", 2), half)
    assert not in_basis(parse_diagram("{1,2'},{2,1'}", 2), half)
