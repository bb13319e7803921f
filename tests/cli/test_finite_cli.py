"""The finite-tower commands as the contract fixes them: series, walk, critical-group; chips, growth."""

from __future__ import annotations

from fractions import Fraction

import pytest

from tests.cli.conftest import run_process

FINITE = ["su2:kind=icosahedral", "su2:kind=dihedral,m=3", "symmetric:n=4", "alternating:n=4",
          "characters:group=symmetric(4),module=(3,1)", "graph:file=sessions/examples/dihedral10.toml"]


@pytest.mark.parametrize("spec", FINITE)
def test_every_command_answers_on_every_finite_family(run_json, spec):
    walk = run_json("walk", spec, "--steps", "6")
    assert set(walk) >= {"nodes", "stationary", "distance"}
    assert len(walk["distance"]) == 7 and sum(Fraction(p) for p in walk["stationary"]) == 1
    group = run_json("critical-group", spec)
    order = 1
    for d in group["invariant_factors"]:
        order *= d
    assert group["order"] == order or group["order"] is None
    for label in walk["nodes"][:3]:
        s = run_json("series", spec, "--label", label)
        assert set(s) == {"label", "numerator", "denominator"} and s["denominator"][0] == 1
        assert run_json("growth", spec, "--label", label, "--to", "20")["period"] >= 1
    assert "recurrent" in run_json("chips", spec)


def test_series_contract_values(run_json):
    # hand computation: the S_3 tower, (2,1) occurs 3^{k−1} times at level k ≥ 1: t/(1 − 3t)
    assert run_json("series", "symmetric:n=3", "--label", "(2,1)") == {"label": "(2,1)", "numerator": [0, 1], "denominator": [1, -3]}
    # a node without paths has the zero numerator [0] (common practice of the contract)
    s = run_json("series", "characters:group=symmetric(3),module=(3)", "--label", "(2,1)")
    assert s["numerator"] == [0] and s["denominator"] == [1]


def test_walk_contract_values(run_json):
    # hand computation (S_3 on C^3): π = Plancherel (1/6, 2/3, 1/6), distances 5/6, 1/6, 1/18
    w = run_json("walk", "symmetric:n=3", "--steps", "2")
    assert w["nodes"] == ["(3)", "(2,1)", "(1,1,1)"]
    assert w["stationary"] == ["1/6", "2/3", "1/6"] and w["distance"] == ["5/6", "1/6", "1/18"]
    assert w["plancherel"] is True


def test_critical_group_contract_values(run_json):
    # by hand: affine D_6 reduced is D_6, Z/2 × Z/2 (binary dihedral of order 16)
    assert run_json("critical-group", "su2:kind=dihedral,m=4")["invariant_factors"] == [2, 2]
    assert run_json("critical-group", "su2:kind=dihedral,m=4")["order"] == 4


def test_text_output(run_cli):
    status, out, _ = run_cli("walk", "su2:kind=octahedral", "--steps", "3")
    assert status == 0 and "periodic with period 2" in out and "Plancherel" in out
    status, out, _ = run_cli("series", "characters:group=symmetric(4),module=(3,1)", "--label", "(2,2)")
    assert status == 0 and "3^k" in out
    status, out, _ = run_cli("chips", "su2:kind=tetrahedral", "--put", "o:3=5", "--list")
    assert status == 0 and "3 recurrent configurations = |det C̃| ✓" in out


def test_irrational_eigenvalues_are_printed_by_square_roots(run_json):
    # D_5 on its 2-dimensional r1: χ(r^j)/2 = cos(2πj/5) = (−1 ± √5)/4 (the regular pentagon, from
    # memory); C_7 on x1+x2+x4: the Gauss sum (−1 + i√7)/2 over 3 (Ireland and Rosen, Prop. 6.3.2)
    values = [e["value"] for e in run_json("walk", "characters:group=dihedral(5),module=r1", "--steps", "1")["eigenvalues"]]
    assert sorted(values) == sorted(["1", "-1/4 + sqrt(5)/4", "-1/4 - sqrt(5)/4", "0"])
    values = [e["value"] for e in run_json("walk", "characters:group=cyclic(7),module=x1+x2+x4", "--steps", "1")["eigenvalues"]]
    assert values.count("-1/6 + i*sqrt(7)/6") == 3 and values.count("-1/6 - i*sqrt(7)/6") == 3


@pytest.mark.parametrize("args,words", [
    (["series", "general-linear:n=3", "--label", "(1)"], "no finite step matrix"),
    (["series", "su2:kind=icosahedral", "--label", "nope"], "is not a node"),
    (["walk", "su2:kind=icosahedral", "--steps", "200000"], "products"),
    (["walk", "su2:kind=icosahedral", "--epsilon", "2"], "between 0 and 1"),
    (["chips", "su2:kind=tetrahedral", "--put", "o:3=x"], "LABEL=COUNT"),
    (["growth", "su2:kind=tetrahedral", "--label", "o:3", "--to", "0"], "--to"),
])
def test_bad_input_is_one_line_exit_2(args, words):
    result = run_process(*args)
    assert result.returncode == 2 and words in result.stderr
    assert len(result.stderr.strip().splitlines()) == 1 and "Traceback" not in result.stderr
