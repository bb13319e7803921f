"""The diagram's machinery: laziness, cancel, progress, size guard, parents/children."""

import threading

import pytest

from engine.diagram import Diagram
from engine.errors import Cancelled, TooLarge
from engine.specs import parse_spec


def test_cancel_stops_a_build_and_leaves_the_diagram_usable():
    d = Diagram(parse_spec("symmetric:n=40"))
    token = threading.Event()
    seen = []

    def progress(done, total):
        seen.append((done, total))
        if done > 30:
            token.set()

    with pytest.raises(Cancelled):
        d.ensure(60, progress=progress, cancel=token)
    assert 30 < d.built < 60 and seen
    # resuming without the token finishes and agrees with a fresh build (common practice: same numbers)
    d.ensure(44)
    assert d.level(44) == Diagram(parse_spec("symmetric:n=40")).level(44)


def test_progress_reaches_the_total():
    d = Diagram(parse_spec("symmetric:n=6"))
    seen = []
    d.ensure(10, progress=lambda done, total: seen.append((done, total)))
    assert seen[-1] == (10, 10)
    assert all(0 <= a <= b for a, b in seen)


def test_size_guard_refuses_before_starting():
    d = Diagram(parse_spec("symmetric:n=80"), edge_limit=1_000_000)
    with pytest.raises(TooLarge, match="edges"):
        d.ensure(80)
    assert d.built == 0


def test_levels_are_built_once():
    tower = parse_spec("symmetric:n=5")
    calls = []
    original = tower.children

    def counting(index, node):
        calls.append((tower.step_key(index), node))
        return original(index, node)

    tower.children = counting  # type: ignore[method-assign]
    d = Diagram(tower)
    d.level(12)
    d.level(12)
    d.level(7)
    assert len(calls) == len(set(calls))


def test_parents_without_a_family_rule_invert_children():
    tower = parse_spec("symmetric:n=5")
    tower.parents = lambda index, node: None  # type: ignore[method-assign]
    d = Diagram(tower)
    reference = Diagram(parse_spec("symmetric:n=5"))
    for index in range(1, 9):
        for node in d.nodes(index):
            assert d.parents(index, node) == reference.parents(index, node)


def test_first_unfaithful_level_agrees_with_a_scan():
    # the binary search against a level-by-level scan of Σm² against the generic dimension
    for spec in ["symmetric:n=5", "general-linear:n=3", "orthogonal:n=2", "symplectic:n=4", "mixed:n=2,word=vdvdvd"]:
        d = Diagram(parse_spec(spec))
        top = min(10, d.tower.max_index or 10)
        scan = next((i for i in range(top + 1) if not d.sums(i).faithful), None)
        assert d.first_unfaithful(top) == scan
        for upto in range(top + 1):
            assert d.first_unfaithful(upto) == (scan if scan is not None and scan <= upto else None)
