"""The tower protocol (engine/tower.py) held over every registered family, on its example spec.

Checks that hold for any tower, whatever the group: Σ m·dim equals the tensor dimension
(the tensor space decomposes into isotypic parts), Σ m² matches the generic dimension while
the family says it is faithful, labels round-trip, and parents invert children.
"""

import pytest

from engine.diagram import Diagram
from engine.specs import families, parse_spec

DEPTH = 8


def _examples():
    return [pytest.param(f.example, id=f.name) for f in families().values()]


def test_every_family_has_an_example():
    assert all(f.example for f in families().values())


@pytest.mark.parametrize("spec", _examples())
def test_protocol(spec):
    tower = parse_spec(spec)
    d = Diagram(tower)
    top = DEPTH if tower.max_index is None else min(DEPTH, tower.max_index)
    for index in range(top + 1):
        level = d.level(index)
        assert level and all(isinstance(m, int) and m > 0 for m in level.values())
        sums = d.sums(index)
        assert sums.consistent, (spec, index)
        for node, m in level.items():
            assert tower.parse(tower.format(node), index) == node
            assert tower.dimension(index, node) > 0
            closed = tower.multiplicity(index, node)
            assert closed is None or closed == m
            if index > 0:
                parents = d.parents(index, node)
                assert sum(level_m * e for level_m, e in ((d.level(index - 1)[p], e) for p, e in parents)) == m
        if index < top:
            reached = set()
            for node in level:
                kids = d.children(index, node)
                assert all(e > 0 for _, e in kids)
                assert len({c for c, _ in kids}) == len(kids)
                reached.update(c for c, _ in kids)
            assert reached == set(d.level(index + 1))
