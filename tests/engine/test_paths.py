"""Ranking, unranking and listing paths, checked against brute-force enumeration by depth-first
search over the towers' own edges (independent of the diagram and of the ranking code)."""

from __future__ import annotations

import pytest
from hypothesis import given, settings
from hypothesis import strategies as st

from engine.diagram import Diagram
from engine.paths import Path, PathError, PathIndex, parse_rank
from engine.specs import parse_spec
from tests.engine.path_towers import BrauerLatticeTower, WalledTower, YoungLatticeTower, cyclic_tower

DEPTH = 6


def towers():
    return [
        parse_spec("symmetric:n=3"),
        parse_spec("symmetric:n=4"),
        parse_spec("symmetric:n=5"),
        parse_spec("symmetric:n=4,halves=no"),  # multiple edges: one per box removed and added back
        YoungLatticeTower(3),
        BrauerLatticeTower(),
        WalledTower("vdvdvd"),
        cyclic_tower(2, 1, 1),  # C_2 on two copies of the sign character: every edge is double
        cyclic_tower(4, 2, 1),
    ]


def brute_force(tower, depth):
    """index → node → every path to it, found by depth-first search over tower.children."""
    found = {i: {} for i in range(depth + 1)}

    def walk(nodes, edges):
        i = len(nodes) - 1
        found[i].setdefault(nodes[-1], []).append(Path(tuple(nodes), tuple(edges)))
        if i == depth:
            return
        for child, count in tower.children(i, nodes[-1]):
            for number in range(1, count + 1):
                walk(nodes + [child], edges + [number])

    walk([tower.root()], [])
    return found


def documented_key(tower, path):
    """The order documented in engine/paths.py: last step first (parent's display order, then
    edge number), then back towards the root."""
    return tuple(
        (tower.sort_key(path.nodes[i - 1], i - 1), path.edges[i - 1]) for i in range(len(path.nodes) - 1, 0, -1)
    )


@pytest.mark.parametrize("tower", towers(), ids=lambda t: t.spec)
def test_every_node_to_level_six_ranks_and_unranks_all_its_paths(tower):
    depth = DEPTH if tower.max_index is None else min(DEPTH, tower.max_index)
    diagram = Diagram(tower)
    index = PathIndex(diagram)
    for i, nodes in brute_force(tower, depth).items():
        assert set(nodes) == set(diagram.level(i))
        for node, paths in nodes.items():
            # the number of paths is the multiplicity (Bratteli 1972: m = number of paths)
            assert index.total(i, node) == len(paths) == diagram.multiplicity(i, node)
            expected = sorted(paths, key=lambda p: documented_key(tower, p))
            assert list(index.iterate(i, node)) == expected
            for r, path in enumerate(expected):
                assert index.unrank(i, node, r) == path
                assert index.rank(path) == r
            middle = len(expected) // 2
            assert list(index.iterate(i, node, middle)) == expected[middle:]


def test_contract_example_is_rank_zero():
    # the CLI contract's example: the first path to (3,1) at level 2 of symmetric:n=4, 3 paths in all
    # (m = S(2,1)·f^{(3,1)/(3)} + S(2,2)·f^{(3,1)/(2)} = 1 + 2, Stirling numbers, common practice)
    tower = parse_spec("symmetric:n=4")
    index = PathIndex(Diagram(tower))
    assert index.total(4, (3, 1)) == 3
    assert index.unrank(4, (3, 1), 0).nodes == ((4,), (3,), (4,), (3,), (3, 1))


DEEP = PathIndex(Diagram(parse_spec("symmetric:n=7")))
DEEP_INDEX, DEEP_NODE = 60, (3, 2, 1, 1)


@settings(max_examples=60, deadline=None)
@given(st.data())
def test_random_ranks_on_a_deep_level(data):
    total = DEEP.total(DEEP_INDEX, DEEP_NODE)
    # path counting agrees with the closed form m_λ(k) = Σ_t S(k,t)·f^{λ/(N−t)} (orbits on [N]^k and the
    # Pieri rule, Macdonald I.5)
    assert total == DEEP.diagram.tower.multiplicity(DEEP_INDEX, DEEP_NODE) > 10**20
    r = data.draw(st.integers(min_value=0, max_value=total - 2))
    path = DEEP.unrank(DEEP_INDEX, DEEP_NODE, r)
    DEEP.check(path, DEEP_INDEX, DEEP_NODE)
    assert DEEP.rank(path) == r
    following = DEEP.unrank(DEEP_INDEX, DEEP_NODE, r + 1)
    tower = DEEP.diagram.tower
    assert documented_key(tower, path) < documented_key(tower, following)
    assert next(DEEP.iterate(DEEP_INDEX, DEEP_NODE, r + 1)) == following


def test_iterating_across_a_carry_on_a_deep_level():
    # successive paths from the iterator agree with unranking each rank (both from this module, but
    # the first is a successor walk and the second a counting descent)
    r = DEEP.total(DEEP_INDEX, DEEP_NODE) // 3
    listed = [p for p, _ in zip(DEEP.iterate(DEEP_INDEX, DEEP_NODE, r), range(300))]
    assert listed == [DEEP.unrank(DEEP_INDEX, DEEP_NODE, r + j) for j in range(300)]


def test_bad_paths_and_ranks_are_refused_with_a_message():
    tower = parse_spec("symmetric:n=4,halves=no")
    index = PathIndex(Diagram(tower))
    with pytest.raises(PathError, match="ranks 0..2"):
        index.unrank(2, (3, 1), 3)
    with pytest.raises(PathError, match="numbered 1..2"):
        index.rank(Path(((4,), (3, 1), (3, 1)), (1, 3)))
    with pytest.raises(PathError, match="no edge"):
        index.rank(Path.simple([(4,), (2, 2)]))
    with pytest.raises(PathError, match="starts at the root"):
        index.rank(Path.simple([(3, 1), (4,)]))
    with pytest.raises(PathError, match="has no path"):
        index.unrank(1, (1, 1, 1, 1), 0)


def test_parse_rank():
    assert parse_rank("1_000") == 1000
    assert parse_rank("10^12") == 10**12
    assert parse_rank("3*10^30") == 3 * 10**30
    assert parse_rank("2**10") == 1024
    assert parse_rank("1e20") == 10**20
    assert parse_rank("-1", total=7) == 6
    for bad in ("1.5", "ten", "-1"):
        with pytest.raises(PathError):
            parse_rank(bad)
