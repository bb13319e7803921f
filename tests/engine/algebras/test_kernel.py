"""Rank of the image and kernel of the action, by linear algebra on V^{⊗k}, against outside values.

Sources named per check: OEIS sequences, sympy (Stirling numbers, Catalan numbers, permutation
groups for Burnside's lemma), and Σm² of the tower (self-consistency: the upper bound the proof
uses is held against the outside value too).
"""

from __future__ import annotations

import pytest
from sympy import catalan
from sympy.functions.combinatorial.numbers import stirling

from engine.algebras.action import acts_as_zero
from engine.algebras.bases import count, iter_basis
from engine.algebras.kernel import image_rank, kernel_elements, stack_entries
from engine.algebras.linalg import PRIMES, primitive, rational
from engine.capabilities import DiagramAlgebra
from engine.diagram import Diagram
from engine.specs import parse_spec


def setup(spec: str, index: int):
    tower = parse_spec(spec)
    return tower.capability(DiagramAlgebra).at(index), Diagram(tower).sums(index).squares


def stirling_sum(m: int, n: int) -> int:
    # sympy: set partitions of an m-set into at most n blocks
    return sum(int(stirling(m, j)) for j in range(1, n + 1))


def a005700(k: int) -> int:
    # OEIS A005700 (from memory): C(k)·C(k+2) − C(k+1)², the dimension of End_{Sp(4)}(V^{⊗k})
    return int(catalan(k) * catalan(k + 2) - catalan(k + 1) ** 2)


# (spec, level index, outside value of the rank, its source)
DONE_WHEN = [
    ("symmetric:n=3", 8, stirling_sum(8, 3)),      # P_4(3): Σ_{j≤3} S(8, j) = 1094 (sympy)
    ("orthogonal:n=3", 5, 603),                    # B_5(3): Riordan number R(10), OEIS A005043 (from memory)
    ("symplectic:n=2", 8, int(catalan(8))),        # TL_8 at −2: Catalan(8) = 1430, OEIS A000108 (sympy)
    ("general-linear:n=2", 6, int(catalan(6))),    # CS_6, n = 2: 321-avoiding permutations, Catalan(6), OEIS A000108
    ("general-linear:n=3", 6, 513),                # CS_6, n = 3: 1234-avoiding permutations, OEIS A005802 (from memory)
    ("mixed:n=2,word=vvvddd", 6, int(catalan(6))),  # flipping the d strands: End_GL2(V^{⊗6}), Catalan(6) (common practice)
]


@pytest.mark.parametrize("spec,index,outside", DONE_WHEN)
def test_rank_is_computed_at_the_done_when_levels(spec, index, outside):
    level, squares = setup(spec, index)
    report = image_rank(level, squares)
    assert report.method == "computed"
    assert report.rank == squares == outside


@pytest.mark.parametrize("n,index", [(2, 4), (3, 6), (2, 6), (4, 6), (3, 5), (2, 7), (3, 7)])
def test_partition_ranks_against_stirling_sums(n, index):
    # sympy Stirling numbers: P_k(n) has rank Σ_{j≤n} S(2k, j), P_{k+1/2}(n) rank Σ_{j≤n} S(2k+1, j)
    # (set partitions with at most n blocks: the orbit-basis elements acting as nonzero; the 2005
    # survey of partition algebras, §4) — here also held against the orbit-basis count itself
    level, squares = setup(f"symmetric:n={n}", index)
    report = image_rank(level, squares)
    m = 2 * level.vertices - (1 if level.half else 0)
    assert report.method == "computed" and report.rank == stirling_sum(m, n)
    assert report.rank == sum(1 for d in iter_basis(level) if len(d) <= n)


@pytest.mark.parametrize("n,k", [(2, 2), (3, 2), (3, 3), (2, 3)])
def test_partition_rank_by_burnside_with_sympy_groups(n, k):
    # sympy permutation groups: the number of S_n-orbits on [n]^{2k} (Burnside's lemma) is the
    # dimension of the centralizer, so of the image of P_k(n)
    from itertools import product

    from sympy.combinatorics import Permutation, PermutationGroup

    points = list(product(range(n), repeat=2 * k))
    where = {p: i for i, p in enumerate(points)}
    gens = []
    for cycle in ([1, 0] + list(range(2, n)), list(range(1, n)) + [0]):
        gens.append(Permutation([where[tuple(cycle[a] for a in p)] for p in points]))
    orbits = len(PermutationGroup(gens).orbits())
    level, squares = setup(f"symmetric:n={n}", 2 * k)
    assert image_rank(level, squares).rank == orbits == squares


def test_symplectic_rank_against_a005700():
    # OEIS A005700 (from memory): End_{Sp(4)}(V^{⊗k}) has dimension C(k)C(k+2) − C(k+1)²: 594 at k = 5
    for index in (3, 4, 5):
        level, squares = setup("symplectic:n=4", index)
        report = image_rank(level, squares)
        assert report.method == "computed" and report.rank == squares == a005700(index)


def test_bratteli_when_too_large():
    # the size guard: P_6(3) has Bell(12) diagrams; the rank is then Σm² and says so
    level, squares = setup("symmetric:n=3", 12)
    report = image_rank(level, squares)
    assert report.method == "bratteli" and report.rank == squares and "entries" in report.note
    assert stack_entries(level) > 10 ** 7


def test_stack_entries_formula():
    # common practice: Σ_d n^(blocks of d) counted one by one on a small level
    for spec, index in [("symmetric:n=3", 4), ("symmetric:n=2", 5), ("orthogonal:n=3", 3), ("mixed:n=2,word=vdv", 3)]:
        level, _ = setup(spec, index)
        free = (lambda d: len(d) - 1) if level.half else len
        assert stack_entries(level) == sum(level.n ** free(d) for d in iter_basis(level))


@pytest.mark.parametrize("spec,index", [
    ("symmetric:n=2", 4), ("symmetric:n=3", 6), ("symmetric:n=2", 5), ("orthogonal:n=2", 3),
    ("orthogonal:n=3", 4), ("symplectic:n=2", 3), ("symplectic:n=4", 4), ("general-linear:n=2", 4),
    ("mixed:n=2,word=vvdd", 4), ("mixed:n=1,word=vd", 2),
])
def test_kernel_elements_act_as_zero_and_are_independent(spec, index):
    # the kernel's dimension is basis − rank; each listed element acts as zero (computed exactly)
    # and the listed elements are linearly independent (sympy rank of their coefficient vectors)
    from sympy import Matrix

    level, squares = setup(spec, index)
    found = kernel_elements(level, squares, 12)
    assert found.dimension == count(level) - squares
    assert len(found.elements) == min(12, found.dimension)
    for element in found.elements:
        assert element and acts_as_zero(element, level)
        assert all(isinstance(c, int) for c in element.values())
    if found.elements:
        diagrams = list(iter_basis(level))
        rows = [[e.get(d, 0) for d in diagrams] for e in found.elements]
        assert Matrix(rows).rank() == len(found.elements)


def test_kernel_of_p2_1_by_hand():
    # hand computation: at n = 1 every diagram acts as the 1×1 matrix (1), so the kernel of P_1(1)
    # is spanned by the difference of its two diagrams
    level, squares = setup("symmetric:n=1", 2)
    found = kernel_elements(level, squares)
    assert found.dimension == 1
    assert sorted(found.elements[0].values()) == [-1, 1]


def test_rational_reconstruction():
    # von zur Gathen–Gerhard, Modern Computer Algebra §5.10: −3/7 is recovered from its residue
    p = PRIMES[0]
    assert rational(-3 * pow(7, -1, p) % p, p) == (-3, 7)
    assert primitive([(1, 2), (-1, 3), (0, 1)]) == [3, -2, 0]


@pytest.mark.parametrize("n,index", [(2, 4), (3, 6), (2, 5), (1, 4)])
def test_orbit_basis_kernel_count_and_zero_action(n, index):
    # the 2005 survey of partition algebras, §4: x_π acts as zero exactly when π has more than n blocks,
    # so the kernel's dimension (computed from the rank) is the number of such π
    from engine.algebras.kernel import orbit_kernel_elements
    from engine.algebras.orbit import from_orbit

    level, squares = setup(f"symmetric:n={n}", index)
    dim = kernel_elements(level, squares, 0).dimension
    assert dim == sum(1 for d in iter_basis(level) if len(d) > n)
    listed = orbit_kernel_elements(level, 5)
    assert len(listed) == min(5, dim)
    for element in listed:
        (d, c), = element.items()
        assert c == 1 and len(d) > n and acts_as_zero(from_orbit(element, level), level)
