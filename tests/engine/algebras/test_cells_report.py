"""The two sides agree: at x = N the rank of each cell module's Gram matrix equals the multiplicity
of the tower's node it belongs to, on every node of every family with a diagram algebra, k ≤ 5.

The multiplicities come from the Bratteli diagram (path counting, ``engine.diagram``); the ranks
from exact linear algebra on the cell modules: independent computations.  That the simple
modules of the centralizer are the heads of the cell modules is the double centralizer theorem
with the cellular structure (the 1996 definition of cellular algebras; common practice)."""

from __future__ import annotations

import pytest

from engine.algebras.cells.report import level_report
from engine.capabilities import DiagramAlgebra
from engine.diagram import Diagram
from engine.specs import parse_spec

CASES = [
    ("symmetric:n=2", 8), ("symmetric:n=3", 8), ("symmetric:n=4", 7),    # P_k(2), P_k(3) to P_4, half levels
    ("orthogonal:n=2", 5), ("orthogonal:n=3", 5), ("orthogonal:n=4", 5),  # B_4(2), B_4(3), B_5(N)
    ("symplectic:n=4", 5), ("symplectic:n=6", 5),                          # B_k(-4), B_k(-6)
    ("symplectic:n=2", 5),                                                  # TL_k at -2
    ("general-linear:n=1", 5), ("general-linear:n=2", 5), ("general-linear:n=3", 5),  # CS_k
    ("mixed:n=1,word=vdvd", 4), ("mixed:n=2,word=vvdd", 4), ("mixed:n=2,word=vdvdv", 5),
    ("mixed:n=3,word=vvddd", 5),
]


@pytest.mark.parametrize("spec,upto", CASES)
def test_rank_at_n_is_the_multiplicity_on_every_node(spec, upto):
    tower = parse_spec(spec)
    diagram = Diagram(tower)
    algebra = tower.capability(DiagramAlgebra)
    for index in range(upto + 1):
        level = algebra.at(index)
        nodes = diagram.level(index)
        report = level_report(level, nodes, tower.format)
        assert report.unmatched == [], (spec, index)
        for row in report.rows:
            assert row.agree != "no", (spec, index, row.cell.label.text, row.cell.rank, row.multiplicity)
        assert report.agree
        # every node's multiplicity is seen once: Σ over matched rows of rank² = Σm² of the level
        assert sum(row.cell.rank**2 for row in report.rows if row.agree == "yes") == \
            sum(m * m for m in nodes.values())


def test_non_semisimple_below_n_and_cells_outside_the_tower():
    # P_3(2) (hand computation: the nodes of S_2 are (2) and (1,1)): not semisimple at x = 2 (2k > N), and
    # only λ̄ = () and (1) name a node; (3), (2,1), (1,1,1), (2), (1,1) have N − |λ̄| < λ̄₁
    tower = parse_spec("symmetric:n=2")
    report = level_report(tower.capability(DiagramAlgebra).at(6), Diagram(tower).level(6), tower.format)
    assert report.semisimple_at_parameter is False
    assert [str(x) for x in report.rational_parameters] == ["0", "1", "2", "3", "4"]
    assert {row.cell.label.text for row in report.rows if row.agree == "yes"} == {"()", "(1)"}
