"""Tensor-graph files: TOML validation messages, GraphML/GML through networkx, the examples."""

from pathlib import Path

import networkx as nx
import pytest

from engine.diagram import Diagram
from engine.errors import UserError
from engine.files.tensor_graph import read_tensor_graph, write_networkx_graph
from engine.specs import parse_spec

EXAMPLES = Path(__file__).resolve().parents[2] / "sessions" / "examples"
D5 = (EXAMPLES / "dihedral10.toml").read_text()


def test_every_example_loads():
    # each example under sessions/examples is a valid tower: Σ m·dim = (dim V)^k (McKay 1980)
    for path in sorted(EXAMPLES.glob("*.toml")):
        family = "graph" if "tensor-graph" in path.read_text() else "characters"
        d = Diagram(parse_spec(f"{family}:file={path}"))
        for k in range(8):
            assert d.sums(k).consistent, path.name


def test_dihedral_example_against_its_characters():
    # D_5 on r1: r1 ⊗ r1 = 1 + e + r2, r2 ⊗ r1 = r1 + r2 (Serre, Linear Representations, 5.3)
    d = Diagram(parse_spec(f"graph:file={EXAMPLES / 'dihedral10.toml'}"))
    assert d.level(2) == {"1": 1, "e": 1, "r2": 1}
    assert d.level(3) == {"r1": 3, "r2": 1}
    assert [d.sums(k).weighted for k in range(6)] == [2**k for k in range(6)]


@pytest.mark.parametrize("old, new, words", [
    ('format = "towerscope-tensor-graph"', 'format = "other"', "key 'format'"),
    ("dimensions = [1, 1, 2, 2]", "dimensions = [1, 0, 2, 2]", "node 'e' has dimension 0"),
    ("dimensions = [1, 1, 2, 2]", "dimensions = [1, 1, 2]", "3 dimensions for 4 labels"),
    ("  [0, 0, 1, 1],\n]", "  [0, 0, 1, -1],\n]", "row 'r2': entry 4 is -1"),
    ("  [0, 0, 1, 1],\n]", "  [0, 0, 1],\n]", "row 'r2' has 3 entries"),
    ("  [0, 0, 1, 1],\n]", "]", "3 rows but set 'D5' has 4"),
    ("  [0, 0, 1, 1],\n]", "  [0, 0, 1, 0],\n]", "row 'r2' gives"),
    ('root = "1"', 'root = "x"', "key 'root': 'x' is not a node"),
    ('pattern = ["tensor"]', 'pattern = ["tenser"]', "'tenser' is not a step"),
    ('to = "D5"', 'to = "D6"', "key 'to': 'D6' is not a node set"),
    ('labels = ["1", "e", "r1", "r2"]', 'labels = ["1", "e", "r1", "r1"]', "'r1' appears twice"),
    ("  [0, 0, 1, 0],\n  [0, 0, 1, 0],", "  [0, 0, 1.5, 0],\n  [0, 0, 1, 0],", "row '1': entry 3 is 1.5"),
    ('title = "', 'colour = 3\ntitle = "', "unknown key 'colour'"),
])
def test_broken_files_name_the_problem(tmp_path, old, new, words):
    assert old in D5
    path = tmp_path / "g.toml"
    path.write_text(D5.replace(old, new, 1))
    with pytest.raises(UserError, match=words):
        read_tensor_graph(path)


def test_half_level_pattern_must_chain(tmp_path):
    text = (EXAMPLES / "a4-points-graph.toml").read_text().replace('from = "C3"', 'from = "A4"', 1)
    path = tmp_path / "g.toml"
    path.write_text(text)
    with pytest.raises(UserError, match="induce"):
        read_tensor_graph(path)


@pytest.mark.parametrize("suffix", [".graphml", ".gml"])
def test_networkx_round_trip(tmp_path, suffix):
    tower = parse_spec("su2:kind=icosahedral")
    path = tmp_path / f"e8{suffix}"
    write_networkx_graph(tower.mckay_matrix(), tower.root(), path)
    read_back = Diagram(parse_spec(f"graph:file={path}"))
    original = Diagram(tower)
    for k in range(10):
        assert read_back.level(k) == original.level(k)


def test_undirected_graph_made_by_networkx(tmp_path):
    # the affine A_3 cycle as a plain undirected networkx graph: C_4 on C^2 (McKay 1980)
    g = nx.cycle_graph(4)
    nx.set_node_attributes(g, 1, "dimension")
    g.graph["root"] = "0"
    path = tmp_path / "cycle.graphml"
    nx.write_graphml(g, path)
    ours = Diagram(parse_spec(f"graph:file={path}"))
    ref = Diagram(parse_spec("su2:kind=cyclic,m=4"))
    for k in range(9):
        assert sorted(ours.level(k).values()) == sorted(ref.level(k).values())


def test_networkx_file_errors(tmp_path):
    g = nx.path_graph(3)
    nx.set_node_attributes(g, {0: 1, 1: 2, 2: 0}, "dimension")
    path = tmp_path / "bad.gml"
    nx.write_gml(g, path)
    with pytest.raises(UserError, match="node '2' has dimension 0"):
        read_tensor_graph(path)
    nx.set_node_attributes(g, {0: 1, 1: 2, 2: 1}, "dimension")
    nx.write_gml(g, path)
    with pytest.raises(UserError, match="row"):  # 1 - 2 - 1 is no tensor graph: Σ M d ≠ c d
        read_tensor_graph(path)
    (tmp_path / "x.txt").write_text("")
    with pytest.raises(UserError, match="accepted: .toml, .graphml, .gml"):
        read_tensor_graph(tmp_path / "x.txt")
