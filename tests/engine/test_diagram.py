"""The diagram's machinery: laziness, cancel, progress, size guard, parents/children."""

import threading

import pytest
from hypothesis import given, settings
from hypothesis import strategies as st

from engine.diagram import Diagram
from engine.errors import Cancelled, TooLarge, UserError
from engine.specs import parse_spec


def test_cancel_stops_a_build_and_leaves_the_diagram_usable():
    d = Diagram(parse_spec("symmetric:n=40"))
    token = threading.Event()
    seen = []

    def progress(done, total):
        seen.append((done, total))
        if done >= 31:
            token.set()

    with pytest.raises(Cancelled):
        d.ensure(60, progress=progress, cancel=token)
    assert 30 < d.built < 60 and seen
    # self-consistency (engine against itself): resuming without the token agrees with a fresh build
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


def test_closed_form_guard_refuses_huge_numbers_before_computing():
    # S_12 at level 10^10: the multiplicities are near 12^(10^10), about 1.08·10^10 digits
    # (common practice: Σ m·dim = N^k); refused at once instead of running for hours
    d = Diagram(parse_spec("symmetric:n=12"))
    with pytest.raises(TooLarge, match=r"1\.08e\+10 digits"):
        d.multiplicity(2 * 10**10, (6, 3, 3))
    with pytest.raises(TooLarge, match="digits"):
        Diagram(parse_spec("alternating:n=6")).multiplicity(2 * 10**10, ((3, 3), ""))
    # under the limit the closed form still answers: S_2, m_(2)(k) = 2^(k−1) (common practice)
    assert Diagram(parse_spec("symmetric:n=2")).multiplicity(2 * 300_000, (2,)) == 2 ** 299_999


def test_negative_levels_are_refused_not_read_from_the_end():
    # levels start at 0 (cli-contract.md); Python's negative indices must not leak through
    d = Diagram(parse_spec("symmetric:n=4"))
    d.ensure(4)
    with pytest.raises(UserError, match="levels start at 0"):
        d.level(-1)
    with pytest.raises(UserError, match="levels start at 0"):
        d.multiplicity(-2, (3, 1))
    with pytest.raises(UserError, match="levels start at 0"):
        Diagram(parse_spec("mixed:n=3,word=vd")).level(-1)


def test_reading_while_a_worker_builds_gives_the_same_numbers():
    # the explorer reads built levels (children, parents, sums) on the UI thread while a worker
    # builds deeper ones; the result must equal a build on one thread (self-consistency, engine
    # against itself: the numbers do not depend on who asks first)
    spec = "symmetric:n=12"
    shared = Diagram(parse_spec(spec))
    shared.ensure(6)
    errors = []

    def build():
        try:
            shared.ensure(22)
        except Exception as exc:  # noqa: BLE001 - reported below
            errors.append(exc)

    worker = threading.Thread(target=build)
    worker.start()
    while worker.is_alive():
        top = shared.built
        for index in range(max(1, top - 2), top + 1):
            for node in shared.nodes(index)[:40]:
                shared.children(index, node)
                shared.parents(index, node)
                shared.multiplicity(index, node)
            shared.sums(index)
    worker.join()
    assert not errors
    alone = Diagram(parse_spec(spec))
    for index in range(23):
        assert shared.level(index) == alone.level(index)
        assert shared.sums(index) == alone.sums(index)
        for node in alone.nodes(index)[:20]:
            assert shared.children(index, node) == alone.children(index, node)


@pytest.mark.parametrize("spec", ["symmetric:n=7", "orthogonal:n=5", "general-linear:n=3"])
def test_passages_drop_their_parents_after_one_pull_and_rebuild_them(spec):
    # a passage pulled once forgets its parents side (rebuilt from its children side if it is
    # pulled again: the repeating steps of S_N and O(N)); edges learned ahead of the build, while
    # the parents side is gone, must count as well (self-consistency, engine against itself:
    # the same numbers as a build that never asks ahead)
    ahead = Diagram(parse_spec(spec))
    ahead.ensure(3)
    for index in range(4):
        for node in ahead.nodes(index):
            ahead.children(index, node)
    ahead.ensure(5)
    for node in ahead.nodes(5):
        ahead.children(5, node)
    ahead.ensure(12)
    alone = Diagram(parse_spec(spec))
    alone.ensure(12)
    for index in range(13):
        assert ahead.level(index) == alone.level(index)


def test_gl3_square_sums_count_permutations_without_a_long_decreasing_run():
    # Σ_λ m_λ² at level k of GL_3 counts permutations of k without a decreasing subsequence of
    # length 4 (Schur–Weyl duality with the RSK correspondence): OEIS A005802 (values from
    # memory), 1, 1, 2, 6, 23, 103, 513, 2761, 15767, 94359
    d = Diagram(parse_spec("general-linear:n=3"))
    assert [d.sums(k).squares for k in range(10)] == [1, 1, 2, 6, 23, 103, 513, 2761, 15767, 94359]


def _matrix_tower(rows):
    """A one-step tower on the matrix ``rows`` plus a sink node z that makes every row sum the same
    (so that the step is a tensor step with all dimensions 1)."""
    from engine.matrix_tower import MatrixTower, NodeSet, Step

    width = max(sum(row) for row in rows)
    matrix = [list(row) + [width - sum(row)] for row in rows] + [[0] * len(rows) + [width]]
    labels = tuple(f"x{i}" for i in range(len(rows))) + ("z",)
    nodes = NodeSet("nodes", labels, (1,) * len(labels))
    return MatrixTower("test", "graph", [Step("tensor", nodes, nodes, tuple(map(tuple, matrix)))], "x0")


@settings(max_examples=60, deadline=None)
@given(st.integers(1, 6).flatmap(lambda n: st.lists(
    st.lists(st.sampled_from([0, 0, 1, 1, 2, 3, 16, 17, 10**18]), min_size=n, max_size=n), min_size=n, max_size=n)))
def test_multiplicities_are_the_rows_of_matrix_powers(rows):
    # the multiplicities at level k are the root's row of M^k (Goodman, de la Harpe, Jones,
    # *Coxeter Graphs and Towers of Algebras*, 1989, 2.1), checked against python-flint's exact
    # matrix powers; the counts mix 1 with small repeated counts and counts kept with their value
    # (past REPEAT_UP_TO), and the one passage is pulled again and again (its parents dropped
    # after the first pull and rebuilt at the second); between the two, the edges of every node,
    # on the level or not, are asked for (learned while the parents side is gone) and must be the
    # matrix's rows
    from flint import fmpz_mat

    tower = _matrix_tower(rows)
    d = Diagram(tower)
    m = fmpz_mat([list(row) for row in tower.pattern[0].matrix])
    size = len(rows) + 1
    power = fmpz_mat(size, size, [int(i == j) for i in range(size) for j in range(size)])
    labels = tower.pattern[0].source.labels
    for k in range(7):
        expected = {labels[j]: int(power[0, j]) for j in range(len(labels)) if power[0, j] != 0}
        assert d.level(k) == expected
        if k == 1:
            for i, label in enumerate(labels):
                row = tower.pattern[0].matrix[i]
                assert dict(d.children(k, label)) == {labels[j]: e for j, e in enumerate(row) if e}
        power = power * m
