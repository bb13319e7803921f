"""``gram`` exactly as the CLI contract, and the ``semisimple`` report, through main(argv)."""

from __future__ import annotations

from tests.cli.conftest import run_process


def test_gram_contract_example(run_json):
    # the contract's example: B_4(3), label (2), dimension 6 (C(4,2) half diagrams, hand computation),
    # rank 6; the determinant x^6 − 12x^4 + 16x^3 is also sympy's (tests/engine/algebras/test_cells_gram.py)
    doc = run_json("gram", "orthogonal:n=3", "--level", "4", "--label", "(2)")
    assert {k: doc[k] for k in ("algebra", "label", "dimension", "rank")} == \
        {"algebra": "B_4(3)", "label": "(2)", "dimension": 6, "rank": 6}
    assert doc["determinant"] == [0, 0, 0, 16, -12, 0, 1]
    assert doc["node"] == "(2)"


def test_gram_partition_labels_read_as_nodes_or_as_lambda_bar(run_json):
    # contract: a partition of N is the node's label, any other is λ̄; (2,1) ⊢ 3 at P_2(3) is λ̄ = (1)
    as_node = run_json("gram", "symmetric:n=3", "--level", "2", "--label", "(2,1)")
    as_bar = run_json("gram", "symmetric:n=3", "--level", "2", "--label", "(1)")
    assert as_node["label"] == as_bar["label"] == "(1)"
    # hand computation: 3 half diagrams, Gram matrix [[1,1,1],[1,x,0],[1,0,x]]: det x² − 2x
    assert as_node["determinant"] == [0, -2, 1] and as_node["dimension"] == 3
    half = run_json("gram", "symmetric:n=3", "--level", "1.5", "--label", "(2)")   # (2) ⊢ N−1: λ̄ = ()
    assert half["algebra"] == "P_{1+1/2}(3)" and half["label"] == "()" and half["determinant"] == [-1, 1]


def test_gram_temperley_lieb_and_cs_and_walled(run_json):
    # TL_4 with no through line: x⁴ − x² (hand computation); the label may be (t) or (a,b), a+b = k
    tl = run_json("gram", "symplectic:n=2", "--level", "4", "--label", "()")
    assert tl["algebra"] == "TL_4" and tl["determinant"] == [0, 0, -1, 0, 1] and tl["rank"] == 2
    assert run_json("gram", "symplectic:n=2", "--level", "4", "--label", "(3,1)")["label"] == "(2)"
    cs = run_json("gram", "general-linear:n=2", "--level", "4", "--label", "(2,2)")
    assert cs["algebra"] == "CS_4" and cs["determinant"] == [1] and cs["parameter"] is None
    assert cs["dimension"] == 2 and cs["rank"] == 2          # f^(2,2) = 2 (hook length formula)
    walled = run_json("gram", "mixed:n=2,word=vdvd", "--level", "2", "--label", "((),())")
    assert walled["determinant"] == [0, 1] and walled["dimension"] == 1   # one cup–cap pair: x


def test_gram_symplectic_says_it_matches_the_conjugate(run_cli):
    status, out, _ = run_cli("gram", "symplectic:n=4", "--level", "2", "--label", "(1,1)")
    assert status == 0
    assert "node (2)" in out and "conjugate" in out


def test_gram_matrix_on_request(run_json, run_cli):
    doc = run_json("gram", "symmetric:n=3", "--level", "2", "--label", "(1)", "--matrix")
    assert doc["matrix"] == [[[1], [1], [1]], [[1], [0, 1], [0]], [[1], [0], [0, 1]]]
    status, out, _ = run_cli("gram", "symmetric:n=3", "--level", "2", "--label", "(1)", "--matrix")
    assert status == 0 and "[x]" in out


def test_gram_errors_are_one_line_exit_2(run_cli):
    status, _, err = run_cli("gram", "su2:kind=icosahedral", "--level", "2", "--label", "(1)")
    assert status == 2 and "has no diagram algebra (families with one:" in err and err.count("\n") == 1
    status, _, err = run_cli("gram", "orthogonal:n=3", "--level", "4", "--label", "(3)")
    assert status == 2 and "not a cell label of B_4(3)" in err
    status, _, err = run_cli("gram", "symplectic:n=2", "--level", "20", "--label", "()")
    assert status == 2 and "would take about" in err


def test_gram_process_exit_status():
    done = run_process("gram", "orthogonal:n=3", "--level", "4", "--label", "(5)")
    assert done.returncode == 2 and "Traceback" not in done.stderr


def test_semisimple_report(run_json, run_cli):
    doc = run_json("semisimple", "symmetric:n=3", "--level", "3")
    # from memory (Martin 1996): P_3(x) is not semisimple exactly at x = 0..4; the ranks agree with the tower
    assert doc["algebra"] == "P_3(3)" and doc["not_semisimple_at"] == [0, 1, 2, 3, 4]
    assert doc["semisimple_at_parameter"] is False and doc["agree"] is True
    rows = {row["label"]: row for row in doc["cells"]}
    # the tower (levels symmetric:n=3 --to 3): (3) 5, (2,1) 9, (1,1,1) 4
    assert (rows["()"]["node"], rows["()"]["rank"]) == ("(3)", 5)
    assert (rows["(1)"]["node"], rows["(1)"]["rank"]) == ("(2,1)", 9)
    assert (rows["(1,1)"]["node"], rows["(1,1)"]["rank"]) == ("(1,1,1)", 4)
    status, out, _ = run_cli("semisimple", "symplectic:n=2", "--level", "4")
    assert status == 0 and "x^2 - 2" in out and "at x = -2: semisimple" in out
