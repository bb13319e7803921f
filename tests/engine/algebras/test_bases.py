"""Basis counts against OEIS, rank/unrank roundtrips, membership of every listed diagram."""

from fractions import Fraction
from itertools import islice
from math import factorial

import pytest

from engine.algebras.bases import count, iter_basis, rank, unrank
from engine.algebras.diagrams import in_basis, parse_diagram
from engine.capabilities import AlgebraLevel
from engine.errors import UserError

# OEIS A000110 (Bell numbers), A001147 (double factorials (2k-1)!!), A000108 (Catalan)
BELL = [1, 1, 2, 5, 15, 52, 203, 877, 4140, 21147, 115975, 678570, 4213597, 27644437]
DOUBLE_FACTORIAL = [1, 1, 3, 15, 105, 945, 10395, 135135]
CATALAN = [1, 1, 2, 5, 14, 42, 132, 429, 1430, 4862]


def level(kind: str, r: int, *, half: bool = False, word: str = "") -> AlgebraLevel:
    return AlgebraLevel(kind=kind, name=f"{kind} {r}", vertices=r, half=half, n=3, parameter=3, word=word,
                        group="symmetric", dimension=0, level=Fraction(r), index=2 * r)


@pytest.mark.parametrize("k", range(7))
def test_partition_counts_bell(k):
    # OEIS A000110: dim P_k = Bell(2k), dim P_{k+1/2} = Bell(2k+1)
    assert count(level("partition", k)) == BELL[2 * k]
    assert count(level("partition", k + 1, half=True)) == BELL[2 * k + 1]


@pytest.mark.parametrize("k", range(8))
def test_brauer_counts(k):
    # OEIS A001147: dim B_k = (2k-1)!!
    assert count(level("brauer", k)) == DOUBLE_FACTORIAL[k]


@pytest.mark.parametrize("k", range(10))
def test_temperley_lieb_counts(k):
    # OEIS A000108: dim TL_k = Catalan(k)
    assert count(level("temperley-lieb", k)) == CATALAN[k]


@pytest.mark.parametrize("word", ["", "v", "d", "vd", "vvd", "vdvd", "vvvddd"])
def test_walled_counts(word):
    # common practice: the walled Brauer algebra of r v's and s d's has dimension (r+s)!
    assert count(level("walled-brauer", len(word), word=word)) == factorial(len(word))


CASES = ([level("partition", k) for k in range(4)] + [level("partition", k, half=True) for k in range(1, 4)]
         + [level("brauer", k) for k in range(5)] + [level("temperley-lieb", k) for k in range(7)]
         + [level("symmetric-group", k) for k in range(6)]
         + [level("walled-brauer", len(w), word=w) for w in ["", "v", "d", "vd", "dv", "vvd", "vdvd", "ddvvd"]])


@pytest.mark.parametrize("lev", CASES, ids=lambda lv: lv.name + lv.word + ("h" if lv.half else ""))
def test_listing_is_the_basis(lev):
    # OEIS counts above: the listing has count() distinct diagrams, each in the basis, in rank order;
    # unrank/rank are inverse; the listing from a middle rank agrees
    listed = list(iter_basis(lev))
    assert len(listed) == count(lev) == len(set(listed))
    for i, d in enumerate(listed):
        assert in_basis(d, lev)
        assert unrank(lev, i) == d
        assert rank(lev, d) == i
    middle = len(listed) // 2
    assert list(islice(iter_basis(lev, middle), 5)) == listed[middle:middle + 5]


def test_brute_force_partition_count():
    # common practice: the diagrams of P_2 are all set partitions of 4 points (Bell(4) = 15), and of
    # P_{1+1/2} those of 4 points with 2 and 2' together (Bell(3) = 5)
    from sympy.utilities.iterables import multiset_partitions

    everything = {tuple(sorted(tuple(sorted(b)) for b in p)) for p in multiset_partitions(list(range(4)))}
    assert set(iter_basis(level("partition", 2))) == everything
    half = level("partition", 2, half=True)
    assert set(iter_basis(half)) == {d for d in everything if in_basis(d, half)}


def test_first_ranks_documented():
    # the documented order (bases.py): rank 0 of P_k is the single block; of B_k the matching
    # {1,2},{3,4},...; of CS_k the identity
    assert unrank(level("partition", 2), 0) == ((0, 1, 2, 3),)
    assert unrank(level("brauer", 2), 0) == parse_diagram("{1,2},{1',2'}", 2)
    assert unrank(level("symmetric-group", 3), 0) == parse_diagram("{1,1'},{2,2'},{3,3'}", 3)


def test_large_ranks_without_listing():
    # OEIS A000110: Bell(20) = 51724158235372; the last rank of P_10 unranks and ranks back
    lev = level("partition", 10)
    assert count(lev) == 51724158235372
    last = unrank(lev, count(lev) - 1)
    assert len(last) == 20 and rank(lev, last) == count(lev) - 1


def test_bad_rank_and_foreign_diagram():
    # common practice: ranks run 0..count-1; a non-basis diagram has no rank
    with pytest.raises(UserError):
        unrank(level("brauer", 2), 3)
    with pytest.raises(UserError):
        rank(level("temperley-lieb", 2), parse_diagram("{1,2'},{2,1'}", 2))
