"""``towerscope diagrams`` and ``towerscope multiply`` through main(argv) (cli-contract.md,
"Centralizer algebras")."""

import json

import pytest

from tests.cli.conftest import run_process


def test_diagrams_json_shape(run_json):
    # OEIS A000110: P_3(4) has Bell(6) = 203 diagrams; the contract's document shape
    doc = run_json("diagrams", "symmetric:n=4", "--level", "3", "--count", "3")
    assert doc["algebra"] == "P_3(4)" and doc["total"] == 203 and doc["start"] == 0
    assert [e["rank"] for e in doc["diagrams"]] == [0, 1, 2]
    assert doc["diagrams"][0]["diagram"] == "{1,2,3,1',2',3'}"


@pytest.mark.parametrize("spec,level,total,name", [
    ("symmetric:n=3", "2.5", 52, "P_{2+1/2}(3)"),    # OEIS A000110: Bell(5)
    ("orthogonal:n=3", "4", 105, "B_4(3)"),          # OEIS A001147: 7!!
    ("symplectic:n=4", "3", 15, "B_3(-4)"),          # OEIS A001147: 5!!
    ("symplectic:n=2", "5", 42, "TL_5"),             # OEIS A000108: Catalan(5)
    ("general-linear:n=2", "4", 24, "CS_4"),         # 4!
    ("mixed:n=2,word=vvdd", "4", 24, "B_{2,2}(2)"),  # common practice: (2+2)!
])
def test_diagrams_every_family(run_json, spec, level, total, name):
    doc = run_json("diagrams", spec, "--level", level, "--count", "1000")
    assert doc["total"] == total == len(doc["diagrams"]) and doc["algebra"] == name
    assert len({e["diagram"] for e in doc["diagrams"]}) == total


def test_diagrams_start_and_last(run_json):
    # the documented order: the last permutation of CS_3 in Lehmer order is 3 2 1 (hand computation)
    doc = run_json("diagrams", "general-linear:n=3", "--level", "3", "--start", "-1")
    assert doc["start"] == 5 and doc["diagrams"] == [{"rank": 5, "diagram": "{1,3'},{2,2'},{3,1'}"}]


def test_diagrams_text_and_drawing(run_cli):
    status, out, err = run_cli("diagrams", "orthogonal:n=3", "--level", "2", "--draw")
    assert status == 0, err
    assert "B_2(3)" in out and "3 diagrams" in out and "●" in out and "1'" in out
    status, out, err = run_cli("diagrams", "orthogonal:n=3", "--level", "2", "--tikz", "--count", "1")
    assert status == 0 and r"\begin{tikzpicture}" in out


@pytest.mark.parametrize("columns", ["80", "160"])
def test_wide_diagrams_drawn_within_the_width(run_cli, monkeypatch, columns):
    # 25 strands (a Brauer diagram of B_25(40)) and the product of two 22-strand diagrams are
    # pictures, not lists of blocks, in 80 columns as in 160, and no line is wider (common practice:
    # the product of two diagrams of cups and caps {2i-1,2i} is N^(number of closed loops) times
    # the same diagram, here 40^11)
    monkeypatch.setenv("COLUMNS", columns)
    status, out, err = run_cli("diagrams", "orthogonal:n=40", "--level", "25", "--start", "123456789",
                               "--count", "2", "--draw")
    assert status == 0, err
    assert out.count("●") == 2 * 2 * 25 and max(map(len, out.splitlines())) <= int(columns)
    cups = ",".join(f"{{{2 * i - 1},{2 * i}}}" for i in range(1, 12))
    cups += "," + ",".join(f"{{{2 * i - 1}',{2 * i}'}}" for i in range(1, 12))
    status, out, err = run_cli("multiply", "orthogonal:n=40", "--level", "22", cups, cups, "--draw", "--exact")
    assert status == 0, err
    assert str(40**11) in out and out.count("●") == 44 and max(map(len, out.splitlines())) <= int(columns)


def test_multiply_json(run_json):
    # hand computation: in B_2(3), e·(e − 2·1) = 3e − 2e = e
    doc = run_json("multiply", "orthogonal:n=3", "--level", "2", "{1,2},{1',2'}", "{1,2},{1',2'} - 2*{1,1'},{2,2'}")
    assert doc["algebra"] == "B_2(3)" and doc["parameter"] == 3
    assert doc["product"] == {"terms": [{"coefficient": 1, "diagram": "{1,2},{1',2'}"}]}


def test_multiply_symplectic_sign(run_json):
    # the contract: the loop value of B_k(-N) is -N; e^2 = -4 e in B_2(-4)
    doc = run_json("multiply", "symplectic:n=4", "--level", "2", "{1,2},{1',2'}", "{1,2},{1',2'}")
    assert doc["product"]["terms"] == [{"coefficient": -4, "diagram": "{1,2},{1',2'}"}]


def test_multiply_symbolic(run_json):
    # hand computation: two closed loops: {1},{2},{1'},{2'} squared is x^2 times itself
    doc = run_json("multiply", "symmetric:n=3", "--level", "2", "--symbolic", "{1},{2},{1'},{2'}", "{2'},{1'},{2},{1}")
    assert doc["parameter"] == "x"
    assert doc["product"]["terms"] == [{"coefficient": [0, 0, 1], "diagram": "{1},{2},{1'},{2'}"}]


def test_multiply_orbit(run_json):
    # hand computation: x_π·x_π for the four singletons π of P_2(N) has coefficient (N−4)(N−5) at x_π
    # (the two middle points take values distinct from each other and the four outer ones): 2 at N = 3
    doc = run_json("multiply", "symmetric:n=3", "--level", "2", "--basis", "orbit", "{1},{2},{1'},{2'}", "{1},{2},{1'},{2'}")
    assert doc["basis"] == "orbit"
    assert doc["product"]["terms"] == [{"coefficient": 2, "diagram": "{1},{2},{1'},{2'}"}]


def test_multiply_leading_minus_after_double_dash(run_cli):
    # the contract: an element starting with - is passed after --; hand computation: (-s)·s = -1
    status, out, err = run_cli("multiply", "general-linear:n=2", "--level", "2", "--json", "--", "-{1,2'},{2,1'}",
                               "{1,2'},{2,1'}")
    assert status == 0, err
    doc = json.loads(out)
    assert doc["product"]["terms"] == [{"coefficient": -1, "diagram": "{1,1'},{2,2'}"}]


def test_multiply_text(run_cli):
    status, out, err = run_cli("multiply", "symplectic:n=2", "--level", "3", "{1,2},{3,3'},{1',2'}",
                               "{1,1'},{2,3},{2',3'}", "--draw")
    assert status == 0, err
    assert "TL_3" in out and "{1,2},{3,1'},{2',3'}" in out and "●" in out


@pytest.mark.parametrize("args", [
    ("diagrams", "su2:kind=icosahedral", "--level", "2"),
    ("multiply", "su2:kind=cyclic,m=3", "--level", "1", "{1,1'}", "{1,1'}"),
    ("diagrams", "symmetric:n=3", "--level", "2", "--start", "15"),
    ("diagrams", "symmetric:n=3", "--level", "2", "--count", "-1"),
    ("multiply", "orthogonal:n=3", "--level", "2", "{1,2,1'},{2'}", "{1,1'},{2,2'}"),
    ("multiply", "orthogonal:n=3", "--level", "2", "{1,1'},{2,2'}", "{1,1'},{3,2'}"),
    ("multiply", "orthogonal:n=3", "--level", "2", "--basis", "orbit", "{1,1'},{2,2'}", "{1,1'},{2,2'}"),
    ("multiply", "symplectic:n=2", "--level", "2", "{1,2'},{2,1'}", "{1,1'},{2,2'}"),
    ("multiply", "symmetric:n=3", "--level", "1.5", "{1,2'},{2,1'}", "{1,1'},{2,2'}"),
])
def test_bad_input_one_line(run_cli, args):
    # the contract: one line on stderr, exit 2, no traceback
    status, out, err = run_cli(*args)
    assert status == 2 and out == "" and err.count("\n") == 1 and "Traceback" not in err


def test_exit_status_in_a_process():
    result = run_process("diagrams", "graph:file=/nonexistent", "--level", "1")
    assert result.returncode == 2 and "Traceback" not in result.stderr
    result = run_process("diagrams", "symmetric:n=2", "--level", "1", "--json")
    assert result.returncode == 0 and '"total": 2' in result.stdout


def test_deep_level_refused_up_front(run_cli):
    # common practice: a refusal names the size that made it refuse
    status, out, err = run_cli("diagrams", "orthogonal:n=3", "--level", "100000")
    assert status == 2 and "100000 vertices per row" in err


def test_large_rank_at_a_deep_level(run_json):
    # OEIS A001147: B_60 has 119!! diagrams; the last rank (hand computation: 1 with 60', 2 with 59', ...) unranks without listing
    doc = run_json("diagrams", "orthogonal:n=2", "--level", "60", "--start", "-1")
    assert doc["diagrams"][0]["rank"] == doc["total"] - 1
    assert doc["diagrams"][0]["diagram"].startswith("{1,60'},{2,59'}")
