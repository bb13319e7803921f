"""Plain data for the ``paths`` and ``rank`` commands (shared guide cli-contract.md).

``paths``: ``{"level", "label", "total", "start", "paths": [{"rank", "labels"}, ...]}``; a path that
crosses a multiple edge also carries ``"edges"`` (the 1-based number of the edge taken at each
step, 1 across single edges); with an encoding asked for, the document names it (``"encoding"``)
and each path carries its ``"text"`` form.
"""

from __future__ import annotations

from typing import Any

from engine.encodings import Encoding
from engine.errors import TooLarge
from engine.levels import level_to_json
from engine.numbers_in import describe
from engine.paths import Path, PathIndex, check_rank
from engine.tower import Node, Tower


def crosses_multiple_edge(index: PathIndex, path: Path) -> bool:
    """Whether some step of the path goes between two nodes joined by more than one edge."""
    nodes = path.nodes
    return any(
        count > 1 for i in range(1, len(nodes)) for p, count, _ in index.incoming(i, nodes[i]) if p == nodes[i - 1]
    )


def path_entry(index: PathIndex, rank: int, path: Path, encoding: Encoding | None = None) -> dict[str, Any]:
    tower = index.diagram.tower
    entry: dict[str, Any] = {"rank": rank, "labels": [tower.format(n) for n in path.nodes]}
    if crosses_multiple_edge(index, path):
        entry["edges"] = list(path.edges)
    if encoding is not None:
        entry["text"] = encoding.path_text(tower, path)
    return entry


#: labels a listing of paths may hold (about 100 MB of document)
MAX_LISTED_LABELS = 2_000_000


def paths_document(
    index: PathIndex, level: int, node: Node, start: int, count: int, encoding: Encoding | None = None
) -> dict[str, Any]:
    """Paths ``start .. start+count−1`` to ``node`` at level index ``level`` (fewer at the end)."""
    tower = index.diagram.tower
    total = index.total(level, node)
    check_rank(start, total, tower.format(node))
    shown = max(0, min(count, total - start))
    if shown * (level + 1) > MAX_LISTED_LABELS:
        raise TooLarge(
            f"listing {describe(shown)} paths of {level + 1:,} nodes each would write about "
            f"{describe(shown * (level + 1))} labels (the limit is {MAX_LISTED_LABELS:,}); ask for a smaller --count"
        )
    listed = []
    for rank, path in zip(range(start, start + count), index.iterate(level, node, start)):
        listed.append(path_entry(index, rank, path, encoding))
    document: dict[str, Any] = {
        "level": level_to_json(tower.level_of(level)),
        "label": tower.format(node),
        "total": total,
        "start": start,
    }
    if encoding is not None:
        document["encoding"] = encoding.name
    document["paths"] = listed
    return document


def rank_document(index: PathIndex, level: int, node: Node, path: Path, rank: int) -> dict[str, Any]:
    """``rank``: the path's rank among the paths to ``node`` and its labels."""
    tower = index.diagram.tower
    return {
        "level": level_to_json(tower.level_of(level)),
        "label": tower.format(node),
        "total": index.total(level, node),
        "rank": rank,
        "labels": [tower.format(n) for n in path.nodes],
    }


def tableaux_document(tower: Tower, level: int, node: Node, total: int, start: int, items: list) -> dict[str, Any]:
    """``tableaux``: set-partition tableaux by rank, each with its blocks, inner shape and cells."""
    return {
        "level": level_to_json(tower.level_of(level)),
        "label": tower.format(node),
        "total": total,
        "start": start,
        "tableaux": [
            {"rank": r, "blocks": [list(b) for b in t.blocks], "inner": list(t.inner),
             "cells": [list(row) for row in t.cells], "aside": None if t.aside is None else list(t.aside)}
            for r, t in items
        ],
    }
