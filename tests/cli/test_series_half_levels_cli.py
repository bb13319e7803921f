"""``series`` text for towers with half levels: the closed form over the whole step's eigenvalues
with the half level's shift written out.  Values by hand from the S_4 character table (restricting
C^5 to S_4: bases fix + 1 = 5, 3, 1, 2, 1 on the classes 1^4, 21^2, 2^2, 31, 4 of sizes 1, 6, 3, 8, 6;
χ_(3,1) = 3, 1, −1, 0, −1)."""

from __future__ import annotations


def test_half_level_node_closed_form(run_cli):
    status, out, _ = run_cli("series", "symmetric:n=5", "--label", "(3,1)")
    assert status == 0
    assert "Σ m(k+1/2) t^k" in out
    assert "m(k+1/2) = (1/8)·5^k + (1/4)·3^k − (3/8)·1^k" in out


def test_whole_level_node_of_a_half_level_tower(run_cli):
    # hand computation (S_3 table: fixed points 3, 1, 0 on classes of size 1, 3, 2; χ_(2,1) = 2, 0, −1)
    status, out, _ = run_cli("series", "symmetric:n=3", "--label", "(2,1)")
    assert status == 0 and "m(k) = (1/3)·3^k − (1/3)·0^k" in out


def test_json_keeps_the_contract(run_json):
    # cli-contract.md: series --json is exactly label, numerator, denominator
    assert set(run_json("series", "alternating:n=5", "--label", "(3,1)")) == {"label", "numerator", "denominator"}
