"""Specht modules in Young's seminormal form: a representation, an invariant form, the right size."""

from __future__ import annotations

import itertools
import random
from fractions import Fraction

import pytest

from engine.algebras.cells import specht
from engine.partitions import partitions_of, standard_tableaux_count

SHAPES = [tuple(p) for t in range(1, 7) for p in partitions_of(t)]


def _mul(a, b):
    return tuple(tuple(sum((x * y for x, y in zip(row, col)), Fraction(0)) for col in zip(*b)) for row in a)


def _trace(m):
    return sum(m[i][i] for i in range(len(m)))


@pytest.mark.parametrize("shape", SHAPES)
def test_dimension_is_the_hook_length_formula(shape):
    # common practice: the standard tableaux of λ count f^λ (hook length formula, Frame–Robinson–Thrall 1954)
    assert len(specht.standard_tableaux(shape)) == standard_tableaux_count(shape)


@pytest.mark.parametrize("shape", SHAPES)
def test_coxeter_relations_and_invariant_form(shape):
    # common practice: the Coxeter presentation of S_t (s_i² = 1, braid and commutation relations)
    t = sum(shape)
    size = len(specht.standard_tableaux(shape))
    one = specht.identity(size)
    s = [specht.generator(shape, i) for i in range(t - 1)]
    gamma = specht.form(shape)
    assert all(g > 0 for g in gamma)
    for i in range(t - 1):
        assert _mul(s[i], s[i]) == one
        if i + 2 < t:
            assert _mul(_mul(s[i], s[i + 1]), s[i]) == _mul(_mul(s[i + 1], s[i]), s[i + 1])
        for j in range(i + 2, t - 1):
            assert _mul(s[i], s[j]) == _mul(s[j], s[i])
        # invariance of the diagonal form: s^T Γ s = Γ
        for a in range(size):
            for b in range(size):
                value = sum(s[i][c][a] * gamma[c] * s[i][c][b] for c in range(size))
                assert value == (gamma[a] if a == b else 0)


@pytest.mark.parametrize("shape", [(3, 1), (2, 2), (3, 2), (2, 2, 1), (3, 2, 1)])
def test_permutation_matrices_form_a_homomorphism(shape):
    t = sum(shape)
    perms = list(itertools.permutations(range(t)))
    pick = random.Random(t).choice  # pairs drawn over the whole group (seeded: reproducible)
    for sigma, tau in [(pick(perms), pick(perms)) for _ in range(60)]:
        composite = tuple(sigma[tau[i]] for i in range(t))
        assert specht.matrix(shape, composite) == _mul(specht.matrix(shape, sigma), specht.matrix(shape, tau))


def test_characters_of_s4():
    # from memory (the character table of S_4, e.g. James and Kerber 1981, appendix): χ^(2,2) is
    # 2, 0, 2, -1, 0 and χ^(3,1) is 3, 1, -1, 0, -1 on 1, (12), (12)(34), (123), (1234)
    classes = [(0, 1, 2, 3), (1, 0, 2, 3), (1, 0, 3, 2), (1, 2, 0, 3), (1, 2, 3, 0)]
    assert [_trace(specht.matrix((2, 2), c)) for c in classes] == [2, 0, 2, -1, 0]
    assert [_trace(specht.matrix((3, 1), c)) for c in classes] == [3, 1, -1, 0, -1]
    assert [_trace(specht.matrix((1, 1, 1, 1), c)) for c in classes] == [1, -1, 1, 1, -1]
