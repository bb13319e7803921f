"""``towerscope tableaux``: set-partition tableaux, counted against the path counts and Stirling numbers."""

import pytest
from sympy.functions.combinatorial.numbers import stirling

from tests.cli.conftest import run_process


@pytest.mark.parametrize("level, label", [("3", "(3,1)"), ("2.5", "(2,1)"), ("4", "(2,2)")])
def test_total_is_the_multiplicity(run_json, level, label):
    tableaux = run_json("tableaux", "symmetric:n=4", "--level", level, "--label", label, "--count", "1000")
    node = run_json("node", "symmetric:n=4", "--level", level, "--label", label)
    assert tableaux["total"] == node["multiplicity"] == len(tableaux["tableaux"])
    assert [t["rank"] for t in tableaux["tableaux"]] == list(range(tableaux["total"]))


def test_trivial_node_counts_set_partitions(run_json):
    # for n >= k the trivial module (n) occurs Bell(k) = sum_t S(k,t) times (sympy's Stirling numbers)
    doc = run_json("tableaux", "symmetric:n=6", "--level", "5", "--label", "(6)", "--count", "0")
    assert doc["total"] == sum(stirling(5, t) for t in range(6))


def test_other_towers_are_refused():
    done = run_process("tableaux", "general-linear:n=3", "--level", "2", "--label", "(2)")
    assert done.returncode == 2 and "symmetric" in done.stderr and len(done.stderr.strip().splitlines()) == 1
