"""Names a newcomer can guess: the trivial node of finite towers, label errors that list the
level's nodes, one name per group (binary-dihedral in su2, dihedral(N) in characters)."""

from __future__ import annotations

import pytest


@pytest.mark.parametrize("kind, old", [("tetrahedral", "a2:1"), ("octahedral", "a3:1"), ("icosahedral", "a5:1")])
def test_su2_trivial_node(run_json, kind, old):
    # the trivial module is the root: multiplicity 1 at level 0 (common practice); it recurs at level 2
    # (V ⊗ V contains the trivial module once, V being self-dual and irreducible: common practice)
    for label in ("trivial", "trivial:1", old):
        doc = run_json("node", f"su2:kind={kind}", "--level", "2", "--label", label)
        assert doc["label"] == "trivial:1" and doc["multiplicity"] == 1 and doc["dimension"] == 1


@pytest.mark.parametrize("spec, root", [
    ("su2:kind=cyclic,m=3", "c0:1"),
    ("su2:kind=binary-dihedral,m=3", "e0:1"),
    ("characters:group=dihedral(5),module=r1", "1"),
    ("graph:file=sessions/examples/dihedral10.toml", None),
])
def test_trivial_names_the_root(run_json, spec, root):
    doc = run_json("node", spec, "--level", "0", "--label", "trivial")
    levels = run_json("levels", spec, "--to", "0")
    assert doc["label"] == levels["levels"][0]["nodes"][0]["label"] == (root or doc["label"])


def test_label_error_lists_the_nodes_of_the_level(run_cli):
    status, _, err = run_cli("node", "su2:kind=icosahedral", "--level", "3", "--label", "zz")
    assert status == 2 and len(err.strip().splitlines()) == 1
    # level 3 of affine E_8 from the trivial end: a3:3 ... only the odd-distance nodes a4:2 and a2:4
    # (the McKay graph is bipartite, common practice)
    assert "one of a4:2, a2:4" in err and "o:6" not in err
    status, _, err = run_cli("node", "symmetric:n=4", "--level", "3", "--label", "(9)")
    assert status == 2 and "levels symmetric:n=4 --at 3" in err  # says how to list them


def test_binary_dihedral_and_its_old_name(run_json):
    a = run_json("levels", "su2:kind=binary-dihedral,m=3", "--to", "6")
    b = run_json("levels", "su2:kind=dihedral,m=3", "--to", "6")
    assert [lv["sums"] for lv in a["levels"]] == [lv["sums"] for lv in b["levels"]]
    # Σ m·dim = 2^k on C^2 (common practice)
    assert [lv["sums"]["weighted"] for lv in a["levels"]] == [2**k for k in range(7)]
