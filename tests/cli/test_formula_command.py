"""``towerscope formula``: closed forms in k, checked against `node` (path counting) and by hand."""

from fractions import Fraction

from tests.cli.conftest import run_process


def test_values_are_the_multiplicities(run_json):
    doc = run_json("formula", "symmetric:n=5", "--label", "(3,2)", "--check", "7")
    for k, value in enumerate(doc["values"]):
        if value:
            node = run_json("node", "symmetric:n=5", "--level", str(k), "--label", "(3,2)")
            assert node["multiplicity"] == value
    # the exponential sum gives the same numbers
    for k, value in enumerate(doc["values"]):
        total = sum(Fraction(p["numerator"], p["denominator"]) * p["base"] ** k for p in doc["powers"])
        assert total == value


def test_half_levels_and_the_trivial_node(run_json):
    # S_2 on C^2 at half levels: restricted to S_1 everything is trivial, m((1))(k+1/2) = 2^k (common practice)
    doc = run_json("formula", "symmetric:n=2", "--label", "(1)")
    assert doc["levels"] == "half"
    assert doc["values"] == [2**k for k in range(9)]


def test_other_towers_and_bad_labels_are_refused():
    for args in (["formula", "orthogonal:n=3", "--label", "(1)"], ["formula", "symmetric:n=4", "--label", "(2,1,1,1)"],
                 ["formula", "symmetric:n=4,halves=no", "--label", "(2,1)"]):
        done = run_process(*args)
        assert done.returncode == 2 and len(done.stderr.strip().splitlines()) == 1, args
