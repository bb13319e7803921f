"""Critical groups of McKay graphs and chip-firing on them."""

from __future__ import annotations

from itertools import product

import pytest
import sympy
from sympy.matrices.normalforms import smith_normal_form

from engine.series.finite import finite_view
from engine.specs import parse_spec
from engine.walks.chips import sandpile
from engine.walks.critical import critical_group, reduced_cartan

TOWERS = ["su2:kind=tetrahedral", "su2:kind=octahedral", "su2:kind=icosahedral", "su2:kind=dihedral,m=5",
          "su2:kind=cyclic,m=7", "symmetric:n=4", "symmetric:n=5", "alternating:n=5",
          "characters:group=symmetric(5),module=(4,1)", "characters:group=dihedral(6),module=r1",
          "characters:group=cyclic(6),module=x1+x2"]


@pytest.mark.parametrize("spec", TOWERS)
def test_order_is_the_determinant_and_factors_are_sympys(spec):
    # sympy: det and smith_normal_form of C̃, computed independently of flint
    view = finite_view(parse_spec(spec), "test")
    c = sympy.Matrix(reduced_cartan(view))
    g = critical_group(view)
    assert g.order == abs(c.det())
    diagonal = smith_normal_form(c, domain=sympy.ZZ).diagonal()
    assert sorted(abs(int(x)) for x in diagonal if abs(int(x)) > 1) == list(g.invariant_factors)
    assert all(b % a == 0 for a, b in zip(g.invariant_factors, g.invariant_factors[1:]))


@pytest.mark.parametrize("spec,factors", [
    # reduced affine Cartan matrix = finite Cartan matrix; its cokernel (weight lattice / root lattice)
    # by hand: E6 → Z/3, E7 → Z/2, E8 → 0, D_n → Z/2×Z/2 (n even) or Z/4 (n odd), A_{m−1} → Z/m
    ("su2:kind=tetrahedral", [3]), ("su2:kind=octahedral", [2]), ("su2:kind=icosahedral", []),
    ("su2:kind=dihedral,m=2", [2, 2]), ("su2:kind=dihedral,m=3", [4]), ("su2:kind=dihedral,m=4", [2, 2]),
    ("su2:kind=cyclic,m=5", [5]), ("su2:kind=cyclic,m=8", [8]),
])
def test_affine_ade_by_hand(spec, factors):
    assert list(critical_group(finite_view(parse_spec(spec), "test")).invariant_factors) == factors


def _arborescences(view) -> int:
    """Spanning trees oriented towards the root, by brute force: every other node picks one out-edge
    (loops excluded, with their multiplicities) and all paths must end at the root."""
    others = [i for i in range(view.size) if i != view.root]
    choices = [[(j, view.matrix[i][j]) for j in range(view.size) if j != i and view.matrix[i][j]] for i in others]
    total = 0
    for pick in product(*choices):
        nxt = {i: j for i, (j, _) in zip(others, pick)}
        ok = True
        for start in others:
            seen, x = set(), start
            while x != view.root:
                if x in seen:
                    ok = False
                    break
                seen.add(x)
                x = nxt[x]
            if not ok:
                break
        if ok:
            weight = 1
            for _, m in pick:
                weight *= m
            total += weight
    return total


@pytest.mark.parametrize("m,module", [(3, "x1+x2"), (5, "x1+x2"), (6, "x1+x2"), (5, "x1+x4"), (7, "x1+x3"),
                                      (6, "x1+x1+x3"), (4, "x1")])
def test_cyclic_groups_by_the_matrix_tree_theorem(m, module):
    # For C_m on a sum of one-dimensional modules x_a, M is a sum of permutation matrices with row sums
    # dim V, so C = (dim V)·I − M is the out-degree Laplacian of the circulant digraph a ↦ a + b; by
    # Tutte's directed matrix-tree theorem (1948) det C̃ counts the spanning arborescences towards the
    # root, counted here by brute force.  On x1 + x_{m−1} the graph is the m-cycle: m trees, Z/m.
    view = finite_view(parse_spec(f"characters:group=cyclic({m}),module={module}"), "test")
    g = critical_group(view)
    assert g.order == _arborescences(view)
    if module == f"x1+x{m - 1}":
        assert list(g.invariant_factors) == [m]


@pytest.mark.parametrize("spec", TOWERS)
def test_recurrent_configurations_count_the_group(spec):
    # Dhar 1990 / Biggs 1999: one recurrent configuration per class; their number is |det C̃|
    view = finite_view(parse_spec(spec), "test")
    g = critical_group(view)
    pile = sandpile(view)
    every = pile.all_recurrent(g.determinant)
    assert len(every) == g.order
    c = sympy.Matrix(reduced_cartan(view))
    start = [5 * (i + 1) for i in range(len(pile.labels))]
    stable, topplings = pile.stabilise(start)
    assert all(0 <= x < pile.cartan[i][i] for i, x in enumerate(stable))
    # the same class: (start − stable) = x·C̃ with x the topplings, integral and ≥ 0 (sympy solve)
    x = (sympy.Matrix([start]) - sympy.Matrix([stable])) * c.inv()
    assert all(v.is_integer and v >= 0 for v in x) and sum(x) == topplings
    rec = pile.recurrent(start, g.determinant)
    assert tuple(rec) in set(every)
    y = (sympy.Matrix([start]) - sympy.Matrix([rec])) * c.inv()
    assert all(v.is_integer for v in y)


@pytest.mark.parametrize("spec", TOWERS)
def test_stabilising_with_a_jump_is_stabilising_toppling_by_toppling(spec, monkeypatch):
    # the jump (topple at once a vector below the odometer) must end where plain toppling ends
    # (the abelian property, Dhar 1990): compared on configurations of 10^2..10^5 chips a node
    import random

    from engine.walks import chips

    pile = sandpile(finite_view(parse_spec(spec), "test"))
    rng = random.Random(len(spec))
    for _ in range(3):
        start = [rng.randint(0, 10 ** rng.randint(2, 5)) for _ in pile.labels]
        start[rng.randrange(len(start))] += 10 ** 5  # enough chips for the jump on every tower
        assert sum(start) > chips.JUMP_ABOVE * len(start) * max(pile.cartan[i][i] for i in range(len(start)))
        jumped = pile.stabilise(start)
        monkeypatch.setattr(chips, "JUMP_ABOVE", 10 ** 30)
        assert pile.stabilise(start) == jumped
        monkeypatch.undo()


def test_recurrent_configuration_of_a_large_critical_group():
    # S_8 on its standard module (7,1): |det C̃| is far too large to list; the recurrent
    # configuration of 10 chips on (7,1) is found (toppling by toppling it took over 2·10^6
    # rounds) and is stable and in the class of the start (sympy solve, independent of flint)
    view = finite_view(parse_spec("symmetric:n=8,module=(7,1)"), "test")
    pile = sandpile(view)
    g = critical_group(view)
    start = [10 if label == "(7,1)" else 0 for label in pile.labels]
    rec = pile.recurrent(start, g.determinant)
    assert all(0 <= x < pile.cartan[i][i] for i, x in enumerate(rec))
    y = (sympy.Matrix([start]) - sympy.Matrix([rec])) * sympy.Matrix(reduced_cartan(view)).inv()
    assert all(v.is_integer for v in y)
