"""The action on V^{⊗k}: a representation (homomorphism) that commutes with the group.

Sources: that the matrix of a product is the product of the matrices is the definition of a
representation (common practice); that the image commutes with the group is the easy half of
Schur–Weyl–Brauer duality (Brauer, Ann. of Math. 1937; Weyl, *The Classical Groups*; Goodman–Wallach,
*Symmetry, Representations, and Invariants*, 2009, ch. 10), checked here against explicit group
matrices written out below (permutation matrices, rational reflections, block symplectic matrices,
integer matrices of determinant ±1).
"""

from __future__ import annotations

import random
from fractions import Fraction

import pytest

from engine.algebras.action import (
    acts_as_zero, diagram_matrix, element_matrix, image_of_tensor, multiply_sparse, space_dimension,
    symplectic_sign,
)
from engine.algebras.bases import count, iter_basis, unrank
from engine.algebras.diagrams import parse_diagram
from engine.algebras.products import multiply, multiply_diagrams
from engine.capabilities import DiagramAlgebra
from engine.errors import TooLarge, UserError
from engine.specs import parse_spec

CASES = [
    ("symmetric:n=3", 6), ("symmetric:n=2", 8), ("symmetric:n=3", 5), ("symmetric:n=2", 7),
    ("orthogonal:n=3", 3), ("orthogonal:n=2", 4), ("symplectic:n=4", 3), ("symplectic:n=4", 4),
    ("symplectic:n=2", 4), ("symplectic:n=2", 5), ("general-linear:n=2", 3), ("general-linear:n=3", 3),
    ("mixed:n=2,word=vdvd", 4), ("mixed:n=3,word=vvd", 3), ("mixed:n=2,word=dvvd", 4),
]


def level_of(spec: str, index: int):
    return parse_spec(spec).capability(DiagramAlgebra).at(index)


def scaled(m, c):
    return {i: {j: c * v for j, v in row.items()} for i, row in m.items()}


@pytest.mark.parametrize("spec,index", CASES)
def test_homomorphism_on_random_pairs(spec, index):
    # common practice: action(d1·d2) = action(d1)·action(d2) defines a representation
    level = level_of(spec, index)
    rng = random.Random(index * 101 + len(spec))
    for _ in range(25):
        d1 = unrank(level, rng.randrange(count(level)))
        d2 = unrank(level, rng.randrange(count(level)))
        prod, c = multiply_diagrams(d1, d2, level)
        assert multiply_sparse(diagram_matrix(d1, level), diagram_matrix(d2, level)) == \
            scaled(diagram_matrix(prod, level), c)


def test_homomorphism_on_elements():
    # common practice: the action is linear and multiplicative on combinations too
    level = level_of("symplectic:n=4", 3)
    rng = random.Random(7)
    e1 = {unrank(level, rng.randrange(15)): rng.randint(-3, 3) or 1 for _ in range(4)}
    e2 = {unrank(level, rng.randrange(15)): rng.randint(-3, 3) or 1 for _ in range(4)}
    assert multiply_sparse(element_matrix(e1, level), element_matrix(e2, level)) == \
        element_matrix(multiply(e1, e2, level), level)


# ----- explicit group matrices ---------------------------------------------------------------
def matmul(a, b):
    n = len(a)
    return [[sum(a[i][k] * b[k][j] for k in range(n)) for j in range(n)] for i in range(n)]


def transpose(a):
    return [list(r) for r in zip(*a)]


def inverse(a):
    """Gauss–Jordan over the rationals (exact)."""
    n = len(a)
    m = [[Fraction(x) for x in row] + [Fraction(int(i == j)) for j in range(n)] for i, row in enumerate(a)]
    for c in range(n):
        p = next(r for r in range(c, n) if m[r][c])
        m[c], m[p] = m[p], m[c]
        pivot = m[c][c]
        m[c] = [x / pivot for x in m[c]]
        for r in range(n):
            if r != c and m[r][c]:
                f = m[r][c]
                m[r] = [x - f * y for x, y in zip(m[r], m[c])]
    return [row[n:] for row in m]


def kron(factors):
    """The Kronecker product as a sparse {row: {col: value}} (first factor most significant)."""
    out = {0: {0: 1}}
    for g in factors:
        n = len(g)
        new = {}
        for i, row in out.items():
            for j, v in row.items():
                for a in range(n):
                    for b in range(n):
                        if g[a][b]:
                            new.setdefault(i * n + a, {})[j * n + b] = v * g[a][b]
        out = new
    return out


def permutation_matrix(perm):
    n = len(perm)
    return [[1 if perm[j] == i else 0 for j in range(n)] for i in range(n)]


def reflection(v):
    # hand computation: I − 2vvᵀ/(vᵀv) is orthogonal for any rational v ≠ 0
    s = sum(x * x for x in v)
    n = len(v)
    return [[Fraction(int(i == j)) - Fraction(2 * v[i] * v[j], s) for j in range(n)] for i in range(n)]


def symplectic_matrix(m):
    # hand computation: [[I,B],[0,I]] with B symmetric, [[I,0],[C,I]] with C symmetric and
    # [[A,0],[0,A^-T]] preserve J = [[0,I],[-I,0]]; their product is a generic-looking element
    n = 2 * m
    B = [[(i + j) % 3 + 1 for j in range(m)] for i in range(m)]
    C = [[(i * j) % 2 - (i == j) for j in range(m)] for i in range(m)]
    A = [[1 if i == j else (2 if j == i + 1 else 0) for j in range(m)] for i in range(m)]
    upper = [[int(i == j) for j in range(n)] for i in range(n)]
    lower = [[int(i == j) for j in range(n)] for i in range(n)]
    diag = [[0] * n for _ in range(n)]
    ait = transpose(inverse(A))
    for i in range(m):
        for j in range(m):
            upper[i][m + j] = B[i][j]
            lower[m + i][j] = C[i][j]
            diag[i][j] = A[i][j]
            diag[m + i][m + j] = ait[i][j]
    return matmul(matmul(upper, diag), lower)


def unimodular(n, rng):
    # hand computation: a product of elementary matrices has determinant 1 and an integer inverse
    g = [[int(i == j) for j in range(n)] for i in range(n)]
    for _ in range(3 * n):
        i, j = rng.sample(range(n), 2)
        e = [[int(a == b) for b in range(n)] for a in range(n)]
        e[i][j] = rng.choice([-2, -1, 1, 2])
        g = matmul(g, e)
    return g


def group_elements(level):
    n = level.n
    rng = random.Random(n)
    if level.group == "symmetric":
        movable = n - 1 if level.half else n
        out = []
        for _ in range(3):
            perm = list(range(movable))
            rng.shuffle(perm)
            out.append(permutation_matrix(perm + list(range(movable, n))))
        return out
    if level.group == "orthogonal":
        q = matmul(reflection([1, 2, 2, 3][:n]), reflection([2, -1, 1, 1][:n]))
        return [q, reflection([3, 1, -1, 2][:n])]
    if level.group == "symplectic":
        return [symplectic_matrix(n // 2)]
    return [unimodular(n, rng), unimodular(n, rng)]


def tensor_of(level, g):
    factors = level.vertices - 1 if level.half else level.vertices
    if level.kind == "walled-brauer":
        dual = transpose(inverse(g))
        return kron([g if letter == "v" else dual for letter in level.word[:factors]])
    return kron([g] * factors)


def test_the_group_matrices_are_in_their_groups():
    # hand computation: gᵀg = I for the orthogonal ones, gᵀJg = J for the symplectic ones
    level = level_of("orthogonal:n=3", 1)
    for q in group_elements(level):
        assert matmul(transpose(q), q) == [[int(i == j) for j in range(3)] for i in range(3)]
    for m in (1, 2):
        n = 2 * m
        J = [[(1 if j == i + m else -1 if i == j + m else 0) for j in range(n)] for i in range(n)]
        g = symplectic_matrix(m)
        assert matmul(matmul(transpose(g), J), g) == J


@pytest.mark.parametrize("spec,index", CASES)
def test_every_diagram_commutes_with_the_group(spec, index):
    # Schur–Weyl–Brauer duality, easy half (Brauer 1937; Goodman–Wallach 2009, ch. 10)
    level = level_of(spec, index)
    if space_dimension(level) > 81:
        pytest.skip("kept small")
    rng = random.Random(index)
    diagrams = list(iter_basis(level))
    rng.shuffle(diagrams)
    for g in group_elements(level):
        G = tensor_of(level, g)
        for d in diagrams[:12]:
            M = diagram_matrix(d, level)
            assert multiply_sparse(M, G) == multiply_sparse(G, M), (spec, index, d)


def test_a_permutation_acts_by_its_sign_for_sp():
    # Goodman–Wallach 2009, §10.1: in the Brauer action of B_k(−n) on Sp(n)'s tensors a
    # transposition acts as minus the flip of two factors
    level = level_of("symplectic:n=2", 2)
    swap = parse_diagram("{1,2'},{2,1'}", 2)
    assert symplectic_sign(swap, 2) == -1
    M = diagram_matrix(swap, level)
    assert M[0 * 2 + 1] == {1 * 2 + 0: -1}
    e = parse_diagram("{1,2},{1',2'}", 2)
    loop = multiply_sparse(diagram_matrix(e, level), diagram_matrix(e, level))
    assert loop == scaled(diagram_matrix(e, level), -2)  # the loop value −n (common practice)


def test_small_matrices_by_hand():
    # hand computation: on V⊗V with n = 2 the join {1,2,1',2'} is the projection onto e1⊗e1, e2⊗e2
    level = level_of("symmetric:n=2", 4)
    M = diagram_matrix(parse_diagram("{1,2,1',2'}", 2), level)
    assert M == {0: {0: 1}, 3: {3: 1}}
    # the singleton diagram {1},{1'} is the all-ones 2×2 matrix on V
    assert diagram_matrix(parse_diagram("{1},{1'}", 1), level_of("symmetric:n=2", 2)) == \
        {0: {0: 1, 1: 1}, 1: {0: 1, 1: 1}}
    # half level 1+1/2 at n = 3: {1,2,1',2'} on V ⊗ e3 keeps only e3 ⊗ e3 (index 2)
    half = level_of("symmetric:n=3", 3)
    assert diagram_matrix(parse_diagram("{1,2,1',2'}", 2), half) == {2: {2: 1}}


def test_image_of_a_tensor_and_zero():
    # hand computation: the flip sends e1⊗e2 to e2⊗e1; the antisymmetrizer on 3 strands kills V^{⊗3}
    # for n = 2 (Λ³C² = 0, Weyl, The Classical Groups)
    level = level_of("general-linear:n=2", 2)
    assert image_of_tensor({parse_diagram("{1,2'},{2,1'}", 2): 1}, level, (0, 1)) == {(1, 0): 1}
    level3 = level_of("general-linear:n=2", 3)
    from engine.algebras.bases import _perm_blocks  # noqa: F401 (the basis is the permutations)
    antisym = {}
    from engine.algebras.action import _permutation_sign
    for d in iter_basis(level3):
        sigma = [b[1] - 3 for b in d]
        antisym[d] = _permutation_sign(sigma)
    assert acts_as_zero(antisym, level3)
    with pytest.raises(UserError):
        image_of_tensor(antisym, level3, (0, 1))


def test_size_guard():
    level = level_of("symmetric:n=40", 20)
    d = unrank(level, count(level) - 1)
    assert len(d) == 20
    with pytest.raises(TooLarge):
        diagram_matrix(d, level)
