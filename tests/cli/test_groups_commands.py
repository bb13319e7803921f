"""The check and mckay commands through their handlers (argparse as the main CLI registers them)."""

import argparse
import csv
import io
import json
from pathlib import Path

import pytest

from engine.errors import UserError
from tui.cli.commands.groups import add_commands

EXAMPLES = Path(__file__).resolve().parents[2] / "sessions" / "examples"


def run(argv):
    parser = argparse.ArgumentParser(prog="towerscope")
    add_commands(parser.add_subparsers())
    args = parser.parse_args(argv)
    return args.handler(args)


def test_check_character_table_json(capsys):
    assert run(["check", str(EXAMPLES / "a4-on-3.toml"), "--json"]) == 0
    report = json.loads(capsys.readouterr().out)
    # A_4: order 12, four irreducibles, 3 ⊗ 3 = 1 + w + w2 + 2·3 (James and Liebeck, 18.3; from memory)
    assert report["group"] == "A_4" and report["order"] == 12 and len(report["irreducibles"]) == 4
    assert report["module_dimension"] == 3
    assert report["mckay"][3] == [1, 1, 1, 2]


def test_check_prints_a_summary(capsys):
    run(["check", str(EXAMPLES / "a4-points.toml")])
    out = capsys.readouterr().out
    assert "A_4" in out and "order 12" in out and "C_3" in out and "dimension 4" in out
    run(["check", str(EXAMPLES / "dihedral10.toml")])
    out = capsys.readouterr().out
    assert "valid tensor graph" in out and "= 2·dim_i" in out


def test_check_refuses_broken_files(tmp_path):
    bad = tmp_path / "t.toml"
    bad.write_text((EXAMPLES / "a4-on-3.toml").read_text().replace("sizes = [1, 3, 4, 4]", "sizes = [1, 3, 4, 5]"))
    with pytest.raises(UserError, match="sum to 13"):
        run(["check", str(bad)])
    other = tmp_path / "o.toml"
    other.write_text('format = "something"\n')
    with pytest.raises(UserError, match="key 'format'"):
        run(["check", str(other)])


def test_mckay_json_of_e6(capsys):
    run(["mckay", "su2:kind=tetrahedral", "--json"])
    step = json.loads(capsys.readouterr().out)["steps"][0]
    # affine E6: a symmetric 0/1 matrix with 6 edges; the centre o:3 has three neighbours (McKay 1980)
    m = step["matrix"]
    assert all(m[i][j] == m[j][i] for i in range(7) for j in range(7))
    assert sum(map(sum, m)) == 12
    assert sum(m[step["rows"].index("o:3")]) == 3


def test_mckay_csv_and_half_levels(capsys):
    run(["mckay", "symmetric:n=4", "--csv"])
    blocks = capsys.readouterr().out.strip().split("\n\n")
    assert len(blocks) == 2  # restrict to S_3, induce back
    rows = list(csv.reader(io.StringIO(blocks[0])))
    assert rows[0] == ["restrict", "(3)", "(2,1)", "(1,1,1)"]
    assert rows[1] == ["(4)", "1", "0", "0"]  # (4) restricts to (3) (branching rule, Sagan 2.8)


def test_mckay_whole_step_for_half_levels(capsys):
    # the two half steps of symmetric:n=4 compose to the permutation module's McKay matrix
    run(["mckay", "symmetric:n=4", "--json"])
    whole = json.loads(capsys.readouterr().out)["whole_step"]
    run(["mckay", "symmetric:n=4,module=(4)+(3,1)", "--json"])
    assert json.loads(capsys.readouterr().out)["steps"][0]["matrix"] == whole


def test_mckay_refuses_infinite_node_sets():
    # GL_N on C^N has infinitely many irreducibles in its tensor powers: no finite step matrix
    with pytest.raises(UserError, match="has no finite step matrix"):
        run(["mckay", "general-linear:n=2"])
