"""Plain data (dicts and lists of exact ints) describing levels and nodes, as fixed by the CLI
contract (shared guide cli-contract.md); the JSON and CSV writers and the CLI print these."""

from __future__ import annotations

import os
from itertools import islice
from json.encoder import encode_basestring  # the quoting json.dumps uses with ensure_ascii=False
from typing import Any, Callable, Iterator, TextIO

from engine.diagram import CancelToken, Diagram, Progress
from engine.export import json_text
from engine.errors import LabelError
from engine.levels import format_level, level_to_json
from engine.tower import Node


class LevelLabels:
    """The labels of a streamed document's nodes, kept for the last level of each node space only:
    S_N's levels share their nodes, so a label is formatted once rather than once per level."""

    def __init__(self, tower: Any, wrap: Callable[[str], str] | None = None) -> None:
        """``wrap``: applied to each label once, as it is first formatted (e.g. CSV quoting)."""
        tower_format = tower.format
        self._format = tower_format if wrap is None else (lambda node: wrap(tower_format(node)))
        self._space_key = tower.space_key
        self._by_space: dict[Any, dict[Node, str]] = {}

    def names(self, index: int, nodes: list[Node]) -> list[str]:
        key = self._space_key(index)
        before, format_node = self._by_space.get(key, {}), self._format
        names = [found if (found := before.get(node)) is not None else format_node(node) for node in nodes]
        self._by_space[key] = dict(zip(nodes, names))
        return names


def node_columns(diagram: Diagram, index: int, level: dict[Node, int], labels: LevelLabels | None = None,
                 ) -> tuple[Iterator[str], Iterator[int], Iterator[int]]:
    """The labels, multiplicities and dimensions of the nodes of a level, in display order, as
    three iterators (nothing is kept: a streamed document holds one level at a time; ``labels``:
    the labels met on earlier levels, for a writer of many levels)."""
    nodes = diagram.sorted_nodes(index, level)
    names = map(diagram.tower.format, nodes) if labels is None else iter(labels.names(index, nodes))
    return names, map(level.__getitem__, nodes), iter(diagram.dimensions_of(index, nodes))


def node_values(diagram: Diagram, index: int, level: dict[Node, int],
                labels: LevelLabels | None = None) -> Iterator[tuple[str, int, int]]:
    """(label, multiplicity, dimension) of every node of a level, in display order (``node_columns``)."""
    return zip(*node_columns(diagram, index, level, labels))


def level_entry(diagram: Diagram, index: int, level: dict[Node, int], nodes: Any = None) -> dict[str, Any]:
    """One level of ``levels --json``: its nodes, sums and (where the family knows it) its algebra
    (``nodes``: put in place of the list of nodes, for the streamed writer)."""
    if nodes is None:
        nodes = [{"label": label, "multiplicity": m, "dimension": dim}
                 for label, m, dim in node_values(diagram, index, level)]
    sums = diagram.sums_of(index, level)
    entry: dict[str, Any] = {
        "level": level_to_json(diagram.tower.level_of(index)),
        "nodes": nodes,
        "sums": {"multiplicities": sums.multiplicities, "squares": sums.squares, "weighted": sums.weighted},
    }
    algebra = diagram.algebra(index)
    if algebra is not None:
        entry["algebra"] = {"name": algebra.name, "dimension": algebra.dimension, "faithful": sums.faithful}
    return entry


def first_unfaithful_json(diagram: Diagram) -> int | float | None:
    """The first level of the whole tower whose algebra does not act faithfully, or None."""
    first = diagram.first_unfaithful_of_tower()
    return None if first is None else level_to_json(diagram.tower.level_of(first))


def level_entries(
    diagram: Diagram, start: int, upto: int, progress: Progress | None = None, cancel: CancelToken | None = None
) -> Iterator[dict[str, Any]]:
    """The level objects of ``levels --json`` for start..upto, one at a time."""
    for index, level in diagram.levels_between(start, upto, progress, cancel):
        yield level_entry(diagram, index, level)


def levels_document(
    diagram: Diagram, upto: int, progress: Progress | None = None, cancel: CancelToken | None = None,
    start: int = 0,
) -> dict[str, Any]:
    """``{"tower", "levels": [...], "first_unfaithful"}`` for levels start..upto (indices), per the
    contract; levels past the built ones come by a jump where the family has one."""
    return {
        "tower": diagram.tower.spec,
        "levels": list(level_entries(diagram, start, upto, progress, cancel)),
        "first_unfaithful": first_unfaithful_json(diagram),
    }


def write_levels_json(
    diagram: Diagram, upto: int, stream: TextIO, start: int = 0, indent: int | None = None,
    progress: Progress | None = None, cancel: CancelToken | None = None,
) -> None:
    """Write ``levels_document`` as JSON level by level: the same text as ``json.dumps(document,
    ensure_ascii=False, indent=indent)``, holding the text of one batch of nodes at a time."""
    def dumps(value: Any) -> str:
        return json_text.dumps(value, indent=indent)

    if indent is None:
        head, between, tail, shift = "{" + '"tower": ' + dumps(diagram.tower.spec) + ', "levels": [', ", ", "], ", ""
        last = '"first_unfaithful": '
    else:
        pad = " " * indent
        shift = "\n" + pad * 2
        head = "{\n" + pad + '"tower": ' + dumps(diagram.tower.spec) + ",\n" + pad + '"levels": [' + shift
        between, tail = "," + shift, "\n" + pad + "],\n" + pad
        last = '"first_unfaithful": '
    stream.write(head)
    first = True
    token = os.urandom(8).hex()
    labels = LevelLabels(diagram.tower, wrap=encode_basestring)  # each label quoted once
    deeper = 2 if indent is not None else 0  # a level entry sits two levels deep in the document
    for index, level in diagram.levels_between(start, upto, progress, cancel):
        # the nodes, the bulk of the text, written by a template in batches; the rest by json_text
        before, after = dumps(level_entry(diagram, index, level, token)).split(f'"{token}"', 1)
        if shift:
            before, after = before.replace("\n", shift), after.replace("\n", shift)
        stream.write(before if first else between + before)
        write_nodes(stream, node_columns(diagram, index, level, labels), indent, deeper)
        stream.write(after)
        first = False
    if first:  # no level (never for start ≤ upto): json.dumps writes an empty list as []
        raise ValueError("no levels to write")
    stream.write(tail + last + dumps(first_unfaithful_json(diagram)) + ("}" if indent is None else "\n}"))


#: nodes formatted and written at a time (a level's text is never held whole)
NODES_AT_ONCE = 4096


def column_batches(columns: tuple[Iterator[str], Iterator[int], Iterator[int]], size: int,
                   ) -> Iterator[Iterator[tuple[str, int | str, int | str]]]:
    """``node_columns`` in batches of ``size`` rows (label, multiplicity, dimension), for the
    streamed writers' templates; in a batch holding a long int the numbers come as their text,
    written by flint (``json_text.number_text``: the same digits as ``str``, faster)."""
    names, multiplicities, dimensions = columns
    small = 1 << json_text.BIG_BITS
    while part := list(islice(names, size)):
        ms, ds = list(islice(multiplicities, size)), list(islice(dimensions, size))
        if max(ms) >= small or max(ds) >= small:
            ms, ds = list(map(json_text.number_text, ms)), list(map(json_text.number_text, ds))
        yield zip(part, ms, ds)


def write_nodes(stream: TextIO, columns: tuple[Iterator[str], Iterator[int], Iterator[int]], indent: int | None,
                deeper: int = 0) -> None:
    """Write the list of nodes of a level entry as ``json.dumps(..., ensure_ascii=False,
    indent=indent)`` writes it for an entry ``deeper`` levels into a document: one template per
    node instead of the generic encoder, NODES_AT_ONCE nodes per write.  ``columns``: the labels
    already quoted as JSON strings, the multiplicities and the dimensions (``node_columns``)."""
    if indent is None:
        opening, between, closing = "[", ", ", "]"
    else:
        pad = " " * indent
        p2, p3 = pad * (2 + deeper), pad * (3 + deeper)
        opening, between, closing = "[\n", ",\n", "\n" + pad * (1 + deeper) + "]"
    empty = True
    for rows in column_batches(columns, NODES_AT_ONCE):
        if indent is None:
            items = [f'{{"label": {a}, "multiplicity": {m}, "dimension": {d}}}' for a, m, d in rows]
        else:
            items = [f'{p2}{{\n{p3}"label": {a},\n{p3}"multiplicity": {m},\n{p3}"dimension": {d}\n{p2}}}'
                     for a, m, d in rows]
        stream.write((opening if empty else between) + between.join(items))
        empty = False
    stream.write("[]" if empty else closing)


def require_node(diagram: Diagram, index: int, node: Node, text: str) -> int:
    """The multiplicity of a node, or a LabelError when it has no path from the root."""
    m = diagram.multiplicity(index, node)
    if m == 0:
        tower = diagram.tower
        raise LabelError(
            f"{text!r} is not reached at level {format_level(tower.level_of(index))} of {tower.spec} "
            "(no path from the root reaches it there)"
        )
    return m


def node_document(diagram: Diagram, index: int, node: Node, text: str | None = None) -> dict[str, Any]:
    """Label, level, multiplicity, dimension, parents and children with edge counts (contract)."""
    tower = diagram.tower
    m = require_node(diagram, index, node, text or tower.format(node))
    previous = tower.level_of(index - 1) if index > 0 else None
    following = tower.level_of(index + 1)
    return {
        "level": level_to_json(tower.level_of(index)),
        "label": tower.format(node),
        "multiplicity": m,
        "dimension": tower.dimension(index, node),
        "parents": [
            {"label": tower.format(p), "level": level_to_json(previous), "edges": e}
            for p, e in diagram.parents(index, node)
        ]
        if previous is not None
        else [],
        "children": [
            {"label": tower.format(c), "level": level_to_json(following), "edges": e}
            for c, e in diagram.children(index, node)
        ],
    }
