"""The CLI against the contract (shared guide cli-contract.md) and outside values."""

import json
import re

import pytest
from sympy.functions.combinatorial.numbers import stirling

from tests.cli.conftest import run_process


def test_levels_json_shape_and_values(run_json):
    doc = run_json("levels", "symmetric:n=4", "--to", "3")
    assert doc["tower"] == "symmetric:n=4"
    assert [lv["level"] for lv in doc["levels"]] == [0, 0.5, 1, 1.5, 2, 2.5, 3]
    assert isinstance(doc["levels"][0]["level"], int) and isinstance(doc["levels"][1]["level"], float)
    assert doc["levels"][0]["nodes"] == [{"label": "(4)", "multiplicity": 1, "dimension": 1}]
    # common practice: S_4 sums of squares 1, 1, 2, 5, 15, 51, 187
    assert [lv["sums"]["squares"] for lv in doc["levels"]] == [1, 1, 2, 5, 15, 51, 187]
    for lv in doc["levels"]:
        k = int(lv["level"])
        assert lv["sums"]["weighted"] == 4**k
        assert lv["sums"]["multiplicities"] == sum(n["multiplicity"] for n in lv["nodes"])
        assert lv["sums"]["squares"] == sum(n["multiplicity"] ** 2 for n in lv["nodes"])
        labels = [n["label"] for n in lv["nodes"]]
        assert len(labels) == len(set(labels)) and all(n["multiplicity"] >= 1 for n in lv["nodes"])
    level3 = {n["label"]: n["multiplicity"] for n in doc["levels"][6]["nodes"]}
    assert level3["(3,1)"] == 10


def test_level_forms_are_the_same(run_json):
    a = run_json("levels", "symmetric:n=3", "--to", "2.5")
    assert a == run_json("levels", "symmetric:n=3", "--to", "5/2") == run_json("levels", "symmetric:n=3", "--to", "2+1/2")
    assert a["levels"][-1]["level"] == 2.5


def test_node_json_matches_contract_example(run_json):
    # the contract's example: (3,1) at level 3 of S_4
    doc = run_json("node", "symmetric:n=4", "--level", "3", "--label", "(3,1)")
    assert doc == {
        "level": 3, "label": "(3,1)", "multiplicity": 10, "dimension": 3,
        "parents": [{"label": "(3)", "level": 2.5, "edges": 1}, {"label": "(2,1)", "level": 2.5, "edges": 1}],
        "children": [{"label": "(3)", "level": 3.5, "edges": 1}, {"label": "(2,1)", "level": 3.5, "edges": 1}],
    }
    assert run_json("node", "symmetric:n=4", "--level", "3", "--label", "3 1") == doc


def test_deep_node_uses_the_closed_form(run_json):
    # symmetric:n=3, level 40: m_(3)(k) = sum_{t<=3} S(k,t) f^{(3)/(3-t)} = S(k,1)+S(k,2)+S(k,3) (sympy)
    doc = run_json("node", "symmetric:n=3", "--level", "40", "--label", "(3)")
    assert doc["multiplicity"] == sum(stirling(40, t) for t in range(1, 4))
    assert [p["label"] for p in doc["parents"]] == ["(2)"]


def test_ten_thousand_digit_multiplicity_prints_exactly(run_cli):
    # S_2 on C^2: the trivial module (2) occurs 2^(k-1) times at level k >= 1 (common practice)
    status, out, err = run_cli("node", "symmetric:n=2", "--level", "33300", "--label", "(2)", "--json")
    assert status == 0, err
    value = json.loads(out)["multiplicity"]
    assert value == 2**33299 and len(str(value)) > 10_000
    status, out, _ = run_cli("node", "symmetric:n=2", "--level", "33300", "--label", "(2)", "--exact")
    assert str(2**33299) in out.split()  # every digit, on one line
    status, out, _ = run_cli("node", "symmetric:n=2", "--level", "33300", "--label", "(2)")
    assert "9.95005" in out and "(10,024 digits)" in out  # shortened by default, with its digit count


def test_csv_rows(run_cli):
    status, out, _ = run_cli("levels", "symmetric:n=3", "--to", "1", "--csv")
    assert status == 0
    import csv
    import io

    rows = list(csv.reader(io.StringIO(out)))
    assert rows == [["level", "label", "multiplicity", "dimension"], ["0", "(3)", "1", "1"], ["0.5", "(2)", "1", "1"],
                    ["1", "(3)", "1", "1"], ["1", "(2,1)", "1", "2"]]


def test_readable_tables_and_families(run_cli):
    status, out, _ = run_cli("levels", "symmetric:n=4", "--to", "3")
    assert status == 0 and "(3,1)" in out and "187" in out and "stops acting faithfully at level 2.5" in out
    status, out, _ = run_cli("families")
    assert status == 0 and "symmetric" in out


def test_export_dot(run_cli, tmp_path):
    target = tmp_path / "s4.dot"
    status, _, _ = run_cli("export", "symmetric:n=4", "--to", "2", "--format", "dot", "-o", str(target))
    assert status == 0
    text = target.read_text()
    nodes = re.findall(r'(n\d+_\d+) \[label="([^"]*)", level="([^"]*)"', text)
    assert ("n4_0", "(4)", "2") in nodes and len(nodes) == 1 + 1 + 2 + 2 + 4
    assert "edges=" not in text  # all edges are single in the S_n tower
    status, _, _ = run_cli("export", "symmetric:n=3,halves=no", "--to", "2", "--format", "dot", "-o", str(target))
    # (2,1) -> (2,1) through (2) and (1,1): two edges
    assert status == 0 and "edges=2" in target.read_text()


@pytest.mark.parametrize(
    "args, words",
    [
        (["levels", "nosuch:n=3", "--to", "2"], "unknown tower family"),
        (["levels", "symmetric:n=3,q=2", "--to", "2"], "unknown key 'q'"),
        (["levels", "symmetric:n=x", "--to", "2"], "key 'n'"),
        (["levels", "symmetric:n=3", "--to", "two"], "not a level"),
        (["levels", "symmetric:n=3,halves=no", "--to", "1.5"], "no level 1.5"),
        (["node", "symmetric:n=4", "--level", "3", "--label", "(3,2)"], "partition of 4"),
        (["node", "symmetric:n=4", "--level", "1", "--label", "(2,2)"], "not reached"),
        (["node", "symmetric:n=4", "--level", "3", "--label", "(1,3)"], "partition of 4"),
        (["levels", "symmetric:n=80", "--to", "200"], "edges"),
        (["levels", "symmetric:n=3"], "--to"),
        (["export", "symmetric:n=3", "--to", "1", "--format", "dot", "-o", "/nonexistent/dir/x.dot"], "does not exist"),
    ],
)
def test_errors_are_one_line_with_exit_2(args, words):
    done = run_process(*args)
    assert done.returncode == 2
    assert done.stdout == ""
    lines = done.stderr.strip().splitlines()
    assert len(lines) == 1, done.stderr
    assert words in lines[0] and "Traceback" not in done.stderr


def test_tables_never_cut_numbers(run_cli):
    # exact numbers: wide values fold onto further lines rather than being cut with an ellipsis
    status, out, _ = run_cli("levels", "symmetric:n=40", "--to", "20", "--sums-only")
    assert status == 0 and "…" not in out
