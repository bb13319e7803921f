"""Set-partition tableaux of the S_N tower: counted against path counts and sympy's Stirling
numbers, each filling checked to be a set partition placed as a standard skew tableau."""

from __future__ import annotations

import pytest
from sympy.functions.combinatorial.numbers import stirling

from engine.diagram import Diagram
from engine.errors import UserError
from engine.paths import PathIndex
from engine.set_partition_tableaux import SetPartitionTableaux
from engine.specs import parse_spec


def standard_skew(tab) -> bool:
    """Entries of the placed boxes increase along rows and down columns (common practice)."""
    cells = tab.cells
    for r, row in enumerate(cells):
        for c, value in enumerate(row):
            if value == 0:
                continue
            if c > 0 and cells[r][c - 1] > value:
                return False
            if r > 0 and c < len(cells[r - 1]) and cells[r - 1][c] > value:
                return False
    return True


@pytest.mark.parametrize("n", [1, 2, 3, 4, 5])
def test_counts_against_paths_and_stirling_numbers(n):
    diagram = Diagram(parse_spec(f"symmetric:n={n}"))
    paths = PathIndex(diagram)
    for index in range(11):
        k, half = divmod(index, 2)
        elements = k + half
        for shape in diagram.nodes(index):
            listing = SetPartitionTableaux(n, index, shape)
            items = list(listing.iterate())
            # the second basis has as many elements as there are paths (the multiplicity)
            assert len(items) == len(set(items)) == listing.total == paths.total(index, shape)
            by_blocks: dict[int, dict] = {}
            for item in items:
                every = item.blocks + ((item.aside,) if item.aside else ())
                assert sorted(x for b in every for x in b) == list(range(1, elements + 1))
                assert list(item.blocks) == sorted(item.blocks, key=min)
                assert (item.aside is not None) == bool(half) and (not half or elements in item.aside)
                assert standard_skew(item)
                t = len(item.blocks)
                assert item.inner == ((n - half - t,) if n - half - t else ())
                counts = by_blocks.setdefault(t, {})
                counts[item.blocks] = counts.get(item.blocks, 0) + 1
            for t, counts in by_blocks.items():
                # every set partition of [k] into t blocks (k+1 into t+1 at half levels) occurs, each
                # with the same number of skew tableaux: S(k,t) from sympy
                assert len(counts) == stirling(elements, t + half)
                assert len(set(counts.values())) == 1


def test_order_is_blocks_then_growth_string_then_tableau():
    listing = SetPartitionTableaux(4, 6, (2, 1, 1))  # level 3 of S_4
    items = list(listing.iterate())

    def growth(item):
        where = {x: j for j, b in enumerate(item.blocks) for x in b}
        return tuple(where[x] for x in sorted(where))

    keys = [(len(i.blocks), growth(i)) for i in items]
    assert keys == sorted(keys)
    assert listing.unrank(len(items) - 1) == items[-1]
    assert list(listing.iterate(2)) == items[2:]


def test_drawing_shows_blocks_and_inner_boxes():
    first = SetPartitionTableaux(4, 6, (2, 1, 1)).unrank(0)
    assert first.blocks == ((1, 2), (3,))
    assert first.draw()[1] == "│   · │   · │"
    half = SetPartitionTableaux(3, 3, (1, 1)).unrank(0)  # level 1+1/2 of S_3
    assert half.draw()[-1].startswith("set aside: ")


def test_wrong_size_shape_is_refused():
    with pytest.raises(UserError, match="not a partition of 4"):
        SetPartitionTableaux(4, 2, (2, 1))
