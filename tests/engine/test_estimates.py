"""The size guard's estimates against the real counts of a build, on every family.

The real counts are those of the build itself (edges: Σ over levels of the children of every
node; nodes: Σ of the level sizes; digits: of the largest multiplicity) — self-consistency of the
engine, no outside source; the estimates must stay within a factor 10 of them, so that nothing
small is refused and nothing huge is started.  Expected refusals and answers are the cases of
the hardening issue (common practice: a minute and 2 GB).
"""

from __future__ import annotations

import sys

import pytest

from engine.capabilities import SizeGuard
from engine.costs import digits_of
from engine.diagram import Diagram
from engine.errors import TooLarge
from engine.specs import families, parse_spec

FACTOR = 10

SPECS = sorted({spec for f in families().values() for spec in (f.example, *f.examples)} | {
    "symmetric:n=30", "symmetric:n=9,halves=no", "alternating:n=8", "orthogonal:n=3", "orthogonal:n=12",
    "general-linear:n=8", "general-linear:n=2", "symplectic:n=10", "su2:kind=tetrahedral",
    "mixed:n=4,word=vdvdvdvdvdvd",
})


def _within(estimate: float, real: float) -> bool:
    return real / FACTOR <= estimate <= real * FACTOR


@pytest.mark.parametrize("spec", SPECS)
def test_estimates_are_within_a_factor_ten_at_every_level(spec):
    sys.set_int_max_str_digits(0)
    tower = parse_spec(spec)
    guard = tower.capability(SizeGuard)
    assert guard is not None and guard.nodes is not None
    diagram = Diagram(tower)
    # the classical towers with large N grow fast: 40 levels keep the suite quick and still pass the
    # stable range (level ≥ N) where the estimates change form
    deep = 40 if spec.split(":")[0] in ("orthogonal", "general-linear", "symplectic") and tower.n > 4 else 60
    top = deep if tower.max_index is None else tower.max_index
    edges = nodes = 0
    for index in range(top + 1):
        level = diagram.level(index)
        nodes += len(level)
        if index > 0:
            assert _within(guard.edges(index), edges), (index, guard.edges(index), edges)
            assert _within(guard.nodes(index), nodes), (index, guard.nodes(index), nodes)
            digits = diagram.cost(index).digits
            assert _within(digits, digits_of(max(level.values()))), (index, digits)
        if index < top:
            edges += sum(len(diagram.children(index, node)) for node in level)


def test_the_orthogonal_count_agrees_with_the_admissible_partitions():
    # self-consistency: the prefix-sum count against a direct count of λ'_1 + λ'_2 ≤ N
    from engine.families.orthogonal import OrthogonalTower
    from engine.partition_tower import orthogonal_counts
    from engine.partitions import partitions_of

    for n in (1, 2, 3, 4, 7, 10):
        tower = OrthogonalTower(f"orthogonal:n={n}", n)
        direct = [sum(1 for lam in (partitions_of(j) if j else [()]) if tower.admissible(lam)) for j in range(18)]
        assert orthogonal_counts(n, 17) == direct


def test_small_deep_builds_are_not_refused():
    # the real sweep of orthogonal:n=3 to level 500 walks 374,749 edges (measured)
    diagram = Diagram(parse_spec("orthogonal:n=3"))
    diagram.check_size(500)
    assert not diagram.cost(500).too_large()


@pytest.mark.parametrize("spec, index", [
    ("symmetric:n=3", 2 * 121212),  # multiplicities of ~58,000 digits on 242,000 levels kept: > 2 GB
    ("symmetric:n=80", 2 * 400),
    ("general-linear:n=30", 400),
])
def test_huge_builds_are_refused_up_front_in_one_line(spec, index):
    diagram = Diagram(parse_spec(spec))
    with pytest.raises(TooLarge) as caught:
        diagram.check_size(index)
    assert "\n" not in str(caught.value) and "GB" in str(caught.value)
    assert diagram.built == 0


def test_a_matrix_with_a_huge_entry_is_refused_by_its_digits(tmp_path):
    # matrix [[10^18]]: multiplicity 10^(18k) at level k; to level 40,000 the kept levels hold
    # about 40,000 · 360,000 digits (hand computation: ~6 GB)
    path = tmp_path / "huge.toml"
    path.write_text('format = "towerscope-tensor-graph"\nversion = 1\nroot = "a"\npattern = ["t"]\n'
                    '[sets.S]\nlabels = ["a"]\ndimensions = [1]\n'
                    '[steps.t]\nfrom = "S"\nto = "S"\nmatrix = [[1000000000000000000]]\n', encoding="utf-8")
    diagram = Diagram(parse_spec(f"graph:file={path}"))
    with pytest.raises(TooLarge):
        diagram.check_size(40_000)
    diagram.check_size(40)  # small: answered
    assert diagram.level(3) == {"a": 10**54}
