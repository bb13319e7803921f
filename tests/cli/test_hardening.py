"""Hostile input: every failure found by fuzzing is one line on stderr, exit status 2, no traceback,
and refused before the work starts.  The one-line rule and exit status are the project's CLI
contract (cli-contract.md); the inputs are the issue's list of failures."""

from __future__ import annotations

import json

import pytest

from tests.cli.conftest import main_output

TABLE = """format = "towerscope-character-table"
version = 1
group = "C_3"
order = 3
classes = ["1", "g", "g2"]
sizes = [1, 1, 1]

[[irreducible]]
name = "1"
values = [1, 1, 1]

[[irreducible]]
name = "w"
values = [1, ENTRY, "unity(3)^2"]

[[irreducible]]
name = "w2"
values = [1, "unity(3)^2", "unity(3)"]

[module]
sum = ["w"]
"""

GRAPH = """format = "towerscope-tensor-graph"
version = 1
root = "a"
pattern = ["t"]
[sets.S]
labels = ["a"]
dimensions = [1]
[steps.t]
from = "S"
to = "S"
matrix = MATRIX
"""


def one_line_refusal(capsys, *args: str) -> str:
    status, out, err = main_output(capsys, *args)
    assert status == 2, (status, err[:300])
    assert "Traceback" not in err
    assert err.count("\n") == 1 and err.endswith("\n"), err[:500]
    assert len(err) <= 520, len(err)  # the contract: at most 500 characters (plus the program name)
    return err


# ----- digits that str.isdigit accepts and int rejects (or takes): superscripts, subscripts, circled
ODD_DIGITS = ["²", "₃", "①", "٣"]


@pytest.mark.parametrize("digit", ODD_DIGITS)
def test_odd_digits_in_spec_keys_levels_labels_and_ranks(capsys, digit):
    one_line_refusal(capsys, "levels", f"symmetric:n={digit}", "--to", "2")
    one_line_refusal(capsys, "levels", "symmetric:n=3", "--to", digit)
    one_line_refusal(capsys, "levels", "symmetric:n=3", "--at", f"1+{digit}/2")
    one_line_refusal(capsys, "node", "symmetric:n=4", "--level", "2", "--label", f"({digit},1)")
    one_line_refusal(capsys, "node", "mixed:n=3,word=vd", "--level", "2", "--label", f"(({digit}),(1))")
    one_line_refusal(capsys, "paths", "symmetric:n=4", "--level", "2", "--label", "(3,1)", "--start", digit)
    one_line_refusal(capsys, "formula", f"symmetric:n=4,module=({digit},1)", "--label", "(3,1)")
    one_line_refusal(capsys, "levels", f"characters:group=cyclic({digit})", "--to", "2")
    one_line_refusal(capsys, "levels", f"characters:group=symmetric(4),module={digit}*(3,1)", "--to", "2")
    one_line_refusal(capsys, "paths", "symmetric:n=4", "--level", "1", "--label", "(3,1)", "--encoding", "tableau",
                     "--start", f"1{digit}")


@pytest.mark.parametrize("entry", [f'"{d}"' for d in ODD_DIGITS] + ['"unity(₃)"', '"2^²"'])
def test_odd_digits_in_table_entries(capsys, tmp_path, entry):
    path = tmp_path / "t.toml"
    path.write_text(TABLE.replace("ENTRY", entry), encoding="utf-8")
    one_line_refusal(capsys, "check", str(path))


# ----- huge numbers: refused before they are computed, quoted by their length
def test_a_start_of_a_huge_power_is_refused_before_it_is_computed(capsys):
    err = one_line_refusal(capsys, "paths", "symmetric:n=4", "--level", "2", "--label", "(3,1)", "--start", "10^999999999")
    assert "1,000,000,000 digits" in err


def test_an_out_of_range_start_is_quoted_by_its_length(capsys):
    err = one_line_refusal(capsys, "paths", "symmetric:n=4", "--level", "2", "--label", "(3,1)", "--start", "10^200000")
    assert "200,001 digits" in err
    err = one_line_refusal(capsys, "paths", "symmetric:n=4", "--level", "2", "--label", "(3,1)", "--start", "9" * 5000)
    assert "9" * 100 not in err and "5,000-digit" in err


def test_a_huge_count_of_paths_is_refused_with_the_estimate(capsys):
    err = one_line_refusal(
        capsys, "paths", "symmetric:n=4", "--level", "20", "--label", "(3,1)", "--count", "100000000", "--json"
    )
    assert "labels" in err and "limit" in err


def test_a_huge_formula_check_is_refused_with_the_estimate(capsys):
    err = one_line_refusal(capsys, "formula", "symmetric:n=5", "--label", "(3,1)", "--check", "1000000000")
    assert "digits" in err


@pytest.mark.parametrize("level", ["1" + "0" * 309, "1" + "0" * 29, "1e309", "9" * 400 + "/2"])
def test_levels_of_about_10_to_the_309_are_refused_without_overflow(capsys, level):
    for option in ("--to", "--at"):
        for spec in ("symmetric:n=3", "su2:kind=tetrahedral", "orthogonal:n=3", "general-linear:n=3"):
            one_line_refusal(capsys, "levels", spec, option, level)


def test_a_step_matrix_entry_of_10_to_the_18_at_level_40000_is_refused_by_the_digit_guard(capsys, tmp_path):
    path = tmp_path / "g.toml"
    path.write_text(GRAPH.replace("MATRIX", "[[1000000000000000000]]"))
    err = one_line_refusal(capsys, "levels", f"graph:file={path}", "--at", "40000")
    assert "digits" in err
    one_line_refusal(capsys, "node", f"graph:file={path}", "--level", "40000", "--label", "a")


def test_mckay_of_a_tower_without_finite_steps_is_refused_at_once(capsys):
    err = one_line_refusal(capsys, "mckay", "symplectic:n=2")
    assert "finite" in err


# ----- character-table entries that took seconds to minutes or gigabytes
HOSTILE_ENTRIES = [
    "sqrt(2003)",
    "unity(997)*unity(991)",
    "unity(9973)*unity(9967)",
    "(1+unity(10000))^10000",
    "(2^10000)^10000",
    "(" * 200 + "1" + ")" * 200,
    "-" * 1000 + "1",
    "sqrt(" * 60 + "2" + ")" * 60,
    "2^" * 500 + "2",
    "9" * 5000,
    "unity(" + "9" * 300 + ")",
]


@pytest.mark.parametrize("entry", HOSTILE_ENTRIES, ids=lambda e: e[:24])
def test_hostile_table_entries_are_one_line(capsys, tmp_path, entry):
    path = tmp_path / "t.toml"
    path.write_text(TABLE.replace("ENTRY", json.dumps(entry)), encoding="utf-8")
    one_line_refusal(capsys, "check", str(path))
    one_line_refusal(capsys, "levels", f"characters:file={path}", "--to", "2")


# ----- files: nesting, formats, graph sizes, GraphML keys
def test_two_thousand_nested_toml_arrays(capsys, tmp_path):
    path = tmp_path / "deep.toml"
    path.write_text('format = "towerscope-tensor-graph"\nversion = 1\nx = ' + "[" * 2000 + "]" * 2000 + "\n")
    err = one_line_refusal(capsys, "check", str(path))
    assert "deep" in err


def test_a_format_that_is_a_list(capsys, tmp_path):
    path = tmp_path / "f.toml"
    path.write_text("format = []\nversion = 1\n")
    one_line_refusal(capsys, "check", str(path))


def test_a_run_of_many_digits_in_a_toml_file(capsys, tmp_path):
    path = tmp_path / "g.toml"
    path.write_text(GRAPH.replace("MATRIX", "[[" + "7" * 100_000 + "]]"))
    err = one_line_refusal(capsys, "check", str(path))
    assert "100,000 digits" in err


def test_a_gml_of_5000_nodes_without_edges_is_refused_before_a_dense_matrix(capsys, tmp_path):
    path = tmp_path / "big.gml"
    path.write_text("graph [\n" + "".join(f'  node [ id {i} label "n{i}" dimension 1 ]\n' for i in range(5000)) + "]\n")
    err = one_line_refusal(capsys, "check", str(path))
    assert "5,000 nodes" in err


def test_a_graphml_key_without_a_type_is_one_clear_line(capsys, tmp_path):
    path = tmp_path / "k.graphml"
    path.write_text(
        '<?xml version="1.0" encoding="UTF-8"?>\n<graphml xmlns="http://graphml.graphdrawing.org/xmlns">\n'
        '<key id="d0" for="node" attr.name="dimension"/>\n<graph edgedefault="undirected">\n'
        '<node id="a"><data key="d0">1</data></node>\n<node id="b"><data key="d0">1</data></node>\n'
        '<edge source="a" target="b"/>\n</graph>\n</graphml>\n'
    )
    err = one_line_refusal(capsys, "check", str(path))
    assert "attr.type" in err


def test_a_spec_with_200_nested_parentheses(capsys):
    one_line_refusal(capsys, "levels", "symmetric:n=4,module=" + "(" * 200 + "1" + ")" * 200, "--to", "2")
    one_line_refusal(capsys, "levels", "symmetric:n=4,module=" + "(" * 200, "--to", "2")


def test_export_onto_a_fifo_is_refused(capsys, tmp_path):
    import os

    fifo = tmp_path / "pipe.dot"
    os.mkfifo(fifo)
    err = one_line_refusal(capsys, "export", "symmetric:n=3", "--to", "2", "--format", "dot", "-o", str(fifo))
    assert "pipe" in err


def test_memory_and_recursion_errors_are_one_line(capsys, monkeypatch):
    import tui.cli.commands.levels as levels_command
    from tui.cli import main as cli_main

    parser = cli_main.build_parser()
    for error in (MemoryError, RecursionError):
        def boom(args, error=error):
            raise error()

        args = parser.parse_args(["levels", "symmetric:n=3", "--to", "2"])
        monkeypatch.setattr(cli_main, "build_parser", lambda *_, args=args, boom=boom: _Fixed(args, boom))
        one_line_refusal(capsys, "levels", "symmetric:n=3", "--to", "2")
    assert levels_command  # the real command module is importable


class _Fixed:
    """A parser that returns one namespace whose handler raises (for the except chain of main)."""

    def __init__(self, args, handler) -> None:
        self.args = args
        self.args.handler = handler

    def parse_args(self, argv):
        return self.args


def test_a_deep_level_of_gl3_at_once_is_refused_with_the_estimate(capsys):
    # level 2000 of GL_3: 334,334 partitions with at most 3 rows (OEIS A001399, the nearest
    # integer to (k+3)²/12: from memory), each f^λ worked from numbers of about 5,700 digits
    # (k!): minutes, so refused before starting; level 300 answers at once
    err = one_line_refusal(capsys, "levels", "general-linear:n=3", "--at", "2000", "--json")
    assert "at once would take about" in err and "min" in err
    status, out, _ = main_output(capsys, "levels", "general-linear:n=3", "--at", "300", "--json")
    assert status == 0 and len(json.loads(out)["levels"][0]["nodes"]) == round((300 + 3) ** 2 / 12)
