"""The size guard's estimates against the real counts of a build, over the range of every family's
keys (tests/engine/test_estimates.py holds the families' examples at every level to 60).

Small and large N (1 .. 1000), long words of the mixed tower with N = 1 and 2 (where counting each
of ℓ(α), ℓ(β) ≤ N on its own overcounts without bound), deep levels of the finite towers.  The real
counts are those of the build itself (edges: the children of every node of the levels below the
top; nodes: the level sizes; digits: of the largest multiplicity), self-consistency of the engine;
the estimates must stay within a factor 10 of them (the issue's bar), so that nothing small is
refused and nothing huge is started.  No timing here.
"""

from __future__ import annotations

import sys

import pytest

from engine.capabilities import SizeGuard
from engine.costs import digits_of
from engine.diagram import Diagram
from engine.specs import families, parse_spec

FACTOR = 10
#: stop a sweep past this many real edges (keeps the file to a few seconds)
EDGE_BUDGET = 30_000

#: spec → deepest level index compared
CASES = {
    "symmetric:n=1": 160, "symmetric:n=2": 160, "symmetric:n=5": 24, "symmetric:n=12": 16,
    "symmetric:n=60": 10, "symmetric:n=400": 8, "symmetric:n=7,halves=no": 10,
    "alternating:n=3": 160, "alternating:n=7": 20, "alternating:n=400": 8,
    "general-linear:n=1": 200, "general-linear:n=2": 200, "general-linear:n=5": 18,
    "general-linear:n=30": 12, "general-linear:n=1000": 11,
    "orthogonal:n=1": 200, "orthogonal:n=2": 200, "orthogonal:n=3": 300, "orthogonal:n=5": 16,
    "orthogonal:n=30": 11, "orthogonal:n=1000": 10,
    "symplectic:n=2": 250, "symplectic:n=6": 14, "symplectic:n=30": 11, "symplectic:n=1000": 10,
    "mixed:n=1,word=" + "vd" * 150: 300, "mixed:n=1,word=" + "v" * 40 + "d" * 40: 80,
    "mixed:n=2,word=" + "vvd" * 30: 90, "mixed:n=2,word=" + "v" * 20 + "d" * 20: 40,
    "mixed:n=5,word=" + "vd" * 15: 30, "mixed:n=10,word=" + "v" * 12 + "d" * 12: 24,
    "mixed:n=30,word=" + "vd" * 8: 16, "mixed:n=1000,word=vdvdvdvdvdv": 11,
    "su2:kind=cyclic,m=1": 250, "su2:kind=cyclic,m=11": 250, "su2:kind=binary-dihedral,m=2": 250,
    "su2:kind=binary-dihedral,m=9": 250, "su2:kind=tetrahedral": 250, "su2:kind=octahedral": 250,
    "su2:kind=icosahedral": 300,
    "characters:group=symmetric(5),module=(4,1)": 60, "characters:group=cyclic(7),module=x1+x3": 200,
    "characters:group=dihedral(6),module=r1": 200, "symmetric:n=5,module=(3,2)": 30,
}


def _within(estimate: float, real: float) -> bool:
    return real / FACTOR <= estimate <= real * FACTOR


def test_every_family_is_covered():
    assert {spec.split(":")[0] for spec in CASES} >= set(families()) - {"graph"}  # graph: its files, in test_estimates


@pytest.mark.parametrize("spec", sorted(CASES), ids=lambda s: s[:48])
def test_estimates_are_within_a_factor_ten(spec):
    sys.set_int_max_str_digits(0)
    tower = parse_spec(spec)
    guard = tower.capability(SizeGuard)
    assert guard is not None and guard.nodes is not None
    diagram = Diagram(tower)
    top = CASES[spec] if tower.max_index is None else min(CASES[spec], tower.max_index)
    edges = nodes = 0
    for index in range(top + 1):
        level = diagram.level(index)
        nodes += len(level)
        if index > 0 and (index <= 40 or index % 20 == 0 or index == top):  # every level, then every 20th
            assert _within(guard.edges(index), edges), ("edges", index, guard.edges(index), edges)
            assert _within(guard.nodes(index), nodes), ("nodes", index, guard.nodes(index), nodes)
            digits = diagram.cost(index).digits
            assert _within(digits, digits_of(max(level.values()))), ("digits", index, digits)
        if index < top:
            edges += sum(len(diagram.children(index, node)) for node in level)
        if edges > EDGE_BUDGET:
            break


def test_a_long_word_with_one_row_is_not_refused():
    # mixed:n=1 on (vd)^20000: every level holds ((1),()) or ((),(1)) and ((),()) at most
    # (hand computation: ℓ(α) + ℓ(β) ≤ 1), under 10^5 edges in all
    diagram = Diagram(parse_spec("mixed:n=1,word=" + "vd" * 20_000))
    cost = diagram.cost(40_000)
    assert cost.edges < 10 * 2 * 40_000 and not cost.too_large()
    diagram.check_size(40_000)
