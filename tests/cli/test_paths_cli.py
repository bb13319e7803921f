"""`towerscope paths` and `towerscope rank` through main(argv), against the CLI contract."""

from __future__ import annotations

import json
import subprocess
import sys

import pytest

from tui.cli.main import main


def run_json(capsys, *argv):
    assert main(list(argv)) == 0
    return json.loads(capsys.readouterr().out)


def test_contract_example(capsys):
    # the contract's example (shared guide cli-contract.md): 3 paths to (3,1) at level 2 of S_4, the
    # first (4) (3) (4) (3) (3,1); 3 = S(2,1)·f^{(3,1)/(3)} + S(2,2)·f^{(3,1)/(2)} (common practice)
    doc = run_json(capsys, "paths", "symmetric:n=4", "--level", "2", "--label", "(3,1)", "--json")
    assert doc["level"] == 2 and doc["label"] == "(3,1)" and doc["total"] == 3 and doc["start"] == 0
    assert doc["paths"][0] == {"rank": 0, "labels": ["(4)", "(3)", "(4)", "(3)", "(3,1)"]}
    assert [p["rank"] for p in doc["paths"]] == [0, 1, 2]
    assert all(len(p["labels"]) == 5 for p in doc["paths"])  # every level 0, 1/2, ..., 2


def test_count_default_start_and_a_huge_total(capsys):
    # (5,1) at level 12 of S_6: far more than 20 paths; Σ_t S(12,t)·f^{(5,1)/(6−t)} (Stirling numbers)
    doc = run_json(capsys, "paths", "symmetric:n=6", "--level", "12", "--label", "5 1", "--json")
    assert len(doc["paths"]) == 20 and doc["total"] > 10**6
    tail = run_json(capsys, "paths", "symmetric:n=6", "--level", "12", "--label", "5 1", "--start", "-1", "--json")
    assert [p["rank"] for p in tail["paths"]] == [doc["total"] - 1]
    deep = run_json(
        capsys, "paths", "symmetric:n=6", "--level", "12", "--label", "(5,1)", "--start", "10^5", "--count", "2", "--json"
    )
    assert [p["rank"] for p in deep["paths"]] == [10**5, 10**5 + 1]


@pytest.mark.parametrize("encoding", ["vacillating", "updown", "labels"])
def test_rank_inverts_paths_for_every_path_of_a_node(capsys, encoding):
    doc = run_json(
        capsys, "paths", "symmetric:n=4", "--level", "3", "--label", "(2,1,1)", "--encoding", encoding, "--count", "50", "--json"
    )
    assert doc["encoding"] == encoding and len(doc["paths"]) == doc["total"] == 6  # S(3,2)·1 + S(3,3)·3
    for entry in doc["paths"]:
        back = run_json(
            capsys, "rank", "symmetric:n=4", "--level", "3", "--label", "(2,1,1)", "--encoding", encoding, entry["text"], "--json"
        )
        assert back["rank"] == entry["rank"] and back["labels"] == entry["labels"]


def test_multiple_edges_are_numbered(capsys):
    # without half levels (3,1) → (3,1) has two edges: remove a box from row 1 or row 2 and put it back
    doc = run_json(capsys, "paths", "symmetric:n=4,halves=no", "--level", "2", "--label", "(3,1)", "--json")
    assert doc["total"] == 3
    assert [p.get("edges") for p in doc["paths"]] == [None, [1, 1], [1, 2]]
    assert main(["rank", "symmetric:n=4,halves=no", "--level", "2", "--label", "(3,1)", "(4) (3,1) (3,1)#2"]) == 0
    assert capsys.readouterr().out == "2\n"


def test_text_output_lists_ranks(capsys):
    assert main(["paths", "symmetric:n=3", "--level", "1", "--label", "(2,1)", "--encoding", "updown", "--draw"]) == 0
    out = capsys.readouterr().out
    assert out.splitlines()[0].startswith("1 paths to (2,1)")
    assert "0  -1 +2" in out and "┌" in out


def test_count_zero_lists_nothing_and_says_so(capsys):
    # (3,1) at level 3 of S_4 has 10 paths (the contract's example)
    assert main(["paths", "symmetric:n=4", "--level", "3", "--label", "(3,1)", "--count", "0"]) == 0
    out = capsys.readouterr().out
    assert out.splitlines() == ["10 paths to (3,1) at level 3 of symmetric:n=4; none listed (--count 0)"]


@pytest.mark.parametrize(
    "argv, message",
    [
        (["paths", "symmetric:n=4", "--level", "2", "--label", "(3,1)", "--start", "3"], "ranks 0..2"),
        (["paths", "symmetric:n=4", "--level", "2", "--label", "(3,1)", "--encoding", "tableau"], "accepted: vacillating"),
        (["paths", "symmetric:n=4", "--level", "0", "--label", "(3,1)"], "not reached"),
        (["rank", "symmetric:n=4", "--level", "1", "--label", "(3,1)", "(4) (3) (4)"], "ends at (4)"),
        (["rank", "symmetric:n=4", "--level", "1", "--label", "(3,1)", "(4) (2,1) (3,1)"], "no edge"),
        (["paths", "symmetric:n=4", "--level", "1", "--label", "(3,1)", "--start", "x"], "not a rank"),
    ],
)
def test_bad_input_is_one_line_and_exit_2(capsys, argv, message):
    assert main(argv) == 2
    err = capsys.readouterr().err
    assert message in err and err.count("\n") == 1


def test_a_path_starting_with_a_minus_sign_is_a_positional_argument():
    # common practice for argparse: an argument holding a space is never taken for an option
    result = subprocess.run(
        [sys.executable, "-m", "tui.cli.main", "rank", "symmetric:n=3", "--level", "1", "--label", "(2,1)",
         "--encoding", "updown", "-1 +2"],
        capture_output=True, text=True,
    )
    assert result.returncode == 0, result.stderr
    assert result.stdout == "0\n"
