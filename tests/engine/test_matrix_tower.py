"""The finite-matrix tower on small groups whose tensor graphs are known."""

import pytest

from engine.diagram import Diagram
from engine.errors import UserError
from engine.matrix_tower import MatrixTower, NodeSet, Step


def test_cyclic_group_on_a_faithful_character_walks_around_the_cycle():
    # C_5 on a faithful 1-dimensional module: chi_j ⊗ chi_1 = chi_{j+1} (common practice)
    nodes = NodeSet("C5", tuple(f"x{j}" for j in range(5)), (1,) * 5)
    matrix = tuple(tuple(1 if j == (i + 1) % 5 else 0 for j in range(5)) for i in range(5))
    tower = MatrixTower("test", "graph", [Step("tensor", nodes, nodes, matrix)], "x0")
    d = Diagram(tower)
    for k in range(12):
        assert d.level(k) == {f"x{k % 5}": 1}
        assert d.sums(k).consistent


def test_s3_with_subgroup_s2_gives_half_levels():
    # S_3 ⊃ S_2 branching (Sagan, The Symmetric Group, 2.8): the symmetric tower for n = 3
    from engine.specs import parse_spec

    g = NodeSet("S3", ("3", "21", "111"), (1, 2, 1))
    h = NodeSet("S2", ("2", "11"), (1, 1))
    restrict = Step("restrict", g, h, ((1, 0), (1, 1), (0, 1)))
    induce = Step("induce", h, g, ((1, 1, 0), (0, 1, 1)))
    tower = MatrixTower("test", "graph", [restrict, induce], "3")
    assert tower.steps_per_unit == 2
    ours = Diagram(tower)
    reference = Diagram(parse_spec("symmetric:n=3"))
    names = {(3,): "3", (2, 1): "21", (1, 1, 1): "111", (2,): "2", (1, 1): "11"}
    for index in range(10):
        assert ours.level(index) == {names[p]: m for p, m in reference.level(index).items()}
        assert ours.sums(index).weighted == 3 ** (index // 2)


def test_inconsistent_row_is_named():
    nodes = NodeSet("G", ("a", "b"), (1, 2))
    with pytest.raises(UserError, match="row 'b'"):
        MatrixTower("test", "graph", [Step("tensor", nodes, nodes, ((0, 1), (1, 1)))], "a")
