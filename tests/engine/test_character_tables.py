"""Built-in character tables and the McKay matrices computed from them."""


import pytest

from engine.character_tables import dihedral_table, cyclic_table, symmetric_table
from engine.class_functions import mckay_matrix, validate
from engine.diagram import Diagram
from engine.partitions import contains, parse_partition, partitions_of
from engine.specs import parse_spec
from engine.capabilities import FiniteSteps


def test_s4_table_from_a_textbook():
    # S_4 (James and Liebeck, Representations and Characters of Groups, 18.1; from memory)
    t = symmetric_table(4)
    assert t.classes == ("(1,1,1,1)", "(2,1,1)", "(2,2)", "(3,1)", "(4)")
    assert t.sizes == (1, 6, 3, 8, 6)
    assert dict(zip(t.names, t.values)) == {
        "(4)": (1, 1, 1, 1, 1),
        "(3,1)": (3, 1, -1, 0, -1),
        "(2,2)": (2, 0, 2, -1, 0),
        "(2,1,1)": (3, -1, -1, 0, 1),
        "(1,1,1,1)": (1, -1, 1, 1, -1),
    }


def test_s5_table_from_a_textbook():
    # S_5 (James and Liebeck, 19.17; from memory); classes 1, (12), (12)(34), (123), (123)(45), (1234), (12345)
    t = symmetric_table(5)
    order = ["(1,1,1,1,1)", "(2,1,1,1)", "(2,2,1)", "(3,1,1)", "(3,2)", "(4,1)", "(5)"]
    pick = [t.classes.index(c) for c in order]
    assert [t.sizes[c] for c in pick] == [1, 10, 15, 20, 20, 30, 24]
    expected = {
        "(5)": [1, 1, 1, 1, 1, 1, 1],
        "(4,1)": [4, 2, 0, 1, -1, 0, -1],
        "(3,2)": [5, 1, 1, -1, 1, -1, 0],
        "(3,1,1)": [6, 0, -2, 0, 0, 0, 1],
        "(2,2,1)": [5, -1, 1, -1, -1, 1, 0],
        "(2,1,1,1)": [4, -2, 0, 1, 1, 0, -1],
        "(1,1,1,1,1)": [1, -1, 1, 1, -1, -1, 1],
    }
    for name, row in expected.items():
        assert [t.row(name)[c] for c in pick] == row


@pytest.mark.parametrize("n", range(1, 9))
def test_symmetric_tables_pass_every_check(n):
    validate(symmetric_table(n))  # orthogonality of rows and columns (Isaacs, ch. 2)


@pytest.mark.parametrize("n", range(1, 9))
def test_cyclic_and_dihedral_tables_pass_every_check(n):
    validate(cyclic_table(n))
    if n >= 3:
        validate(dihedral_table(n))


@pytest.mark.parametrize("n", range(2, 8))
def test_permutation_module_mckay_equals_restrict_then_induce(n):
    # entry λ,μ: the number of partitions of n−1 below both (branching rule, Sagan 2.8)
    t = symmetric_table(n)
    perm = [a + b for a, b in zip(t.row(f"({n})"), t.row(f"({n - 1},1)"))]
    ours = mckay_matrix(t, perm)
    lams = [parse_partition(x) for x in t.names]
    for i, lam in enumerate(lams):
        for j, mu in enumerate(lams):
            below = sum(1 for nu in partitions_of(n - 1) if contains(lam, nu) and contains(mu, nu))
            assert ours[i][j] == below
    # and the symmetric family's own whole step (halves=no) agrees
    step = parse_spec(f"symmetric:n={n},halves=no").capability(FiniteSteps).whole_step()
    for i, row in enumerate(step.matrix):
        for j, m in enumerate(row):
            a, b = t.names.index(step.row_labels[i]), t.names.index(step.column_labels[j])
            assert ours[a][b] == m


def test_symmetric_module_tower_sums():
    # S_6 on the reflection module (5,1): Σ m·dim = 5^k; Σ m² = dim End = (1/|G|) Σ_g χ_V(g)^{2k}
    # (Serre 2.3), computed here from sympy's permutation group S_6
    from sympy.combinatorics.named_groups import SymmetricGroup

    elements = list(SymmetricGroup(6).elements)
    chi = [sum(1 for x in range(6) if g(x) == x) - 1 for g in elements]
    d = Diagram(parse_spec("symmetric:n=6,module=(5,1)"))
    for k in range(6):
        assert d.sums(k).weighted == 5**k
        assert d.sums(k).squares * len(elements) == sum(c ** (2 * k) for c in chi)


def test_dihedral_on_r1_matches_the_example_graph():
    # D_5 on its 2-dimensional module: the graph of sessions/examples/dihedral10.toml (Serre 5.3)
    built = Diagram(parse_spec("characters:group=dihedral(5),module=r1"))
    from_file = Diagram(parse_spec("graph:file=sessions/examples/dihedral10.toml"))
    for k in range(10):
        assert built.level(k) == from_file.level(k)


def test_cyclic_module_sum_with_multiplicity():
    # C_4 on x1 + x3 is su2:kind=cyclic,m=4 (common practice)
    ours = Diagram(parse_spec("characters:group=cyclic(4),module=x1+x3"))
    ref = Diagram(parse_spec("su2:kind=cyclic,m=4"))
    for k in range(9):
        assert sorted(ours.level(k).values()) == sorted(ref.level(k).values())
    assert Diagram(parse_spec("characters:group=cyclic(3),module=2*x0")).sums(3).weighted == 8


def test_huge_built_in_tables_are_refused_at_once():
    # C_N has N classes and D_N about N/2 (common practice); the exact checks grow like their cube
    from engine.errors import UserError

    with pytest.raises(UserError, match="up to order 40"):
        cyclic_table(10**8)
    with pytest.raises(UserError, match="up to D_64"):
        dihedral_table(10**8)
    assert len(cyclic_table(40).classes) == 40 and len(dihedral_table(64).classes) == 64 // 2 + 3
