"""The tower protocol (engine/tower.py) and every capability a family declares
(engine/capabilities.py), held over every registered family on each of its example specs.

Checks that hold for any tower, whatever the group: Σ m·dim equals (dim V)^k (the tensor space
decomposes into isotypic parts; common practice), m(node) = Σ_parents m(parent)·edges (the
definition of a Bratteli diagram: Bratteli 1972), labels round-trip.  Per capability:
- ClosedForm: equals path counting and says which nodes are reached;
- LevelJump: a jumped level equals the swept one;
- FiniteSteps: the matrices hold the same edges as ``children``, and Σ_j M_ij·d_j = c·d_i
  (McKay 1980: the McKay matrix of tensoring with V, c = dim V);
- DiagramAlgebra: Σ m² equals the algebra's dimension while it acts faithfully and falls below it
  from the first unfaithful level on (double centralizer theorem; Goodman, de la Harpe, Jones 1989,
  ch. 2), and that first level, the family's theorem, equals a search of the level sums;
- Encodings: every declared encoding writes every path to a node and reads it back;
- SizeGuard: the estimate is never below the edges really walked.
"""

from __future__ import annotations

from pathlib import Path

import pytest

from engine.capabilities import ClosedForm, DiagramAlgebra, Encodings, FiniteSteps, LevelJump, SizeGuard
from engine.diagram import Diagram
from engine.encodings import encodings_for
from engine.paths import PathIndex
from engine.specs import families, parse_spec

DEPTH = 8
ROOT = Path(__file__).resolve().parents[2]


def all_specs() -> list[str]:
    return [spec for f in families().values() for spec in (f.example, *f.examples)]


def _params():
    return [pytest.param(spec, id=spec) for spec in all_specs()]


@pytest.fixture(autouse=True)
def _from_the_project_folder(monkeypatch):
    monkeypatch.chdir(ROOT)  # example specs name files relative to the project folder


def test_every_family_has_an_example():
    assert all(f.example for f in families().values())


def test_declared_capabilities_are_listed_on_the_family():
    for f in families().values():
        for spec in (f.example, *f.examples):
            import os

            os.chdir(ROOT)
            tower = parse_spec(spec)
            for cap in tower.capabilities():
                assert any(isinstance(cap, kind) for kind in f.capabilities), (spec, type(cap).__name__)


def top_of(tower) -> int:
    return DEPTH if tower.max_index is None else min(DEPTH, tower.max_index)


@pytest.mark.parametrize("spec", _params())
def test_protocol(spec):
    tower = parse_spec(spec)
    d = Diagram(tower)
    top = top_of(tower)
    dim_v = d.sums(tower.steps_per_unit).weighted if top >= tower.steps_per_unit else None
    for index in range(top + 1):
        level = d.level(index)
        assert level and all(isinstance(m, int) and m > 0 for m in level.values())
        sums = d.sums(index)
        assert sums.consistent, (spec, index)
        if dim_v is not None and tower.max_index is None:  # a finite (mixed) word is not one repeated V
            assert sums.weighted == dim_v ** (index // tower.steps_per_unit)
        # a family's fast display order is its sort_key's order (common practice: one order)
        assert tower.sort_nodes(list(level), index) == sorted(level, key=lambda v: tower.sort_key(v, index))
        for node, m in level.items():
            assert tower.parse(tower.format(node), index) == node
            assert tower.dimension(index, node) > 0
            if index > 0:
                parents = d.parents(index, node)
                assert sum(d.level(index - 1)[p] * e for p, e in parents) == m
        if index < top:
            reached = set()
            for node in level:
                kids = d.children(index, node)
                assert all(e > 0 for _, e in kids)
                assert len({c for c, _ in kids}) == len(kids)
                reached.update(c for c, _ in kids)
            assert reached == set(d.level(index + 1))


@pytest.mark.parametrize("spec", _params())
def test_closed_form_and_jump(spec):
    tower = parse_spec(spec)
    closed, jump = tower.capability(ClosedForm), tower.capability(LevelJump)
    if closed is None and jump is None:
        pytest.skip(f"{spec} declares neither a closed form nor a jump")
    swept = Diagram(tower)
    for index in range(top_of(tower) + 1):
        level = swept.level(index)
        if closed is not None:
            for node, m in level.items():
                assert closed.multiplicity(index, node) == m
                assert closed.reachable(index, node)
            assert closed.digits(index) >= 1
        if jump is not None:
            assert jump.level(index) == level, (spec, index)
    if jump is not None:  # a fresh diagram answers at depth without building the levels below
        fresh = Diagram(tower)
        deep = 40 * tower.steps_per_unit if tower.max_index is None else tower.max_index
        assert fresh.level_at(deep) == Diagram(tower).level(deep)


@pytest.mark.parametrize("spec", _params())
def test_finite_steps(spec):
    tower = parse_spec(spec)
    steps = tower.capability(FiniteSteps)
    if steps is None:
        pytest.skip(f"{spec} has no finite steps")
    assert steps.period == tower.steps_per_unit and steps.root == tower.root()
    for r, step in enumerate(steps.steps):
        for i, node in enumerate(step.rows):
            edges = {step.columns[j]: m for j, m in enumerate(step.matrix[i]) if m}
            assert edges == dict(tower.children(r, node))
            assert sum(m * dj for m, dj in zip(step.matrix[i], step.column_dimensions)) == \
                step.constant * step.row_dimensions[i]
            assert step.row_labels[i] == tower.format(node)


@pytest.mark.parametrize("spec", _params())
def test_diagram_algebra(spec):
    tower = parse_spec(spec)
    algebra = tower.capability(DiagramAlgebra)
    if algebra is None:
        pytest.skip(f"{spec} has no diagram algebra")
    d = Diagram(tower)
    top = top_of(tower)
    first = algebra.first_unfaithful
    for index in range(top + 1):
        at = algebra.at(index)
        assert at.index == index and at.level == tower.level_of(index) and at.name
        squares = d.sums(index).squares
        if first is None or index < first:
            assert squares == at.dimension, (spec, index)
        else:
            assert squares < at.dimension, (spec, index)
    searched = d.first_unfaithful(top)
    assert searched == (first if first is not None and first <= top else None)


@pytest.mark.parametrize("spec", _params())
def test_encodings_round_trip(spec):
    tower = parse_spec(spec)
    declared = tower.capability(Encodings)
    if declared is None:
        pytest.skip(f"{spec} declares no encodings")
    names = [e.name for e in encodings_for(tower)]
    assert names == list(declared.names)
    index = PathIndex(Diagram(tower))
    level = min(4, top_of(tower))
    for node in index.diagram.nodes(level):
        for encoding in encodings_for(tower):
            for rank in range(min(index.total(level, node), 5)):
                path = index.unrank(level, node, rank)
                text = encoding.text(tower, encoding.encode(tower, path))
                assert encoding.path_from_text(tower, text) == path


@pytest.mark.parametrize("spec", _params())
def test_size_guard_bounds_the_edges(spec):
    tower = parse_spec(spec)
    guard = tower.capability(SizeGuard)
    if guard is None:
        pytest.skip(f"{spec} has no size guard")
    d = Diagram(tower)
    top = top_of(tower)
    d.ensure(top)
    walked = sum(len(d.children(i, node)) for i in range(top) for node in d.level(i))
    estimate = guard.edges(top)
    assert estimate is None or estimate >= walked
