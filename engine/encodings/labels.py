"""The encoding every tower has: the sequence of node labels from level 0 to the node.

For S_n with half levels this is the vacillating tableau (partitions at levels 0, 1/2, 1, ...:
the usual name of the object for partition algebras); for mixed towers the sequence of pairs of partitions; for
McKay-graph towers (finite subgroups of SU(2), tensor graphs, character tables) a walk on the
graph, written as the sequence of node names (McKay 1980).

Text form: the labels separated by spaces (commas and arrows ``->``/``→`` between labels are
accepted too), e.g. ``(4) (3) (4) (3) (3,1)``.  Where two nodes are joined by several edges, the
label of the node reached is followed by ``#j`` when the path takes edge j > 1 (edge 1 needs no
mark), e.g. ``(4) (3,1) (3,1)#2``.
"""

from __future__ import annotations

import re

from engine.encodings.base import Encoding
from engine.errors import UserError
from engine.levels import format_level
from engine.paths import Path, PathError
from engine.text import split_outside_parentheses
from engine.tower import Tower

_EDGE = re.compile(r"^(.*)#([0-9]{1,18})$", re.ASCII | re.DOTALL)


def split_labels(text: str) -> list[str]:
    """Tokens separated by spaces, commas or arrows outside parentheses."""
    body = text.replace("→", " ").replace("->", " ")
    try:
        return split_outside_parentheses(body, lambda ch: ch.isspace() or ch == ",")
    except UserError as exc:
        raise PathError(str(exc)) from None


class LabelSequence(Encoding):
    """The labels of the nodes of a path, one per level (a value is the Path itself)."""

    syntax = "labels of levels 0..L separated by spaces, e.g. '(4) (3) (4) (3) (3,1)'; '#j' after a label: edge j"

    def __init__(self, name: str = "labels", title: str = "sequence of labels") -> None:
        self.name = name
        self.title = title

    def encode(self, tower: Tower, path: Path) -> Path:
        return path

    def decode(self, tower: Tower, value: Path) -> Path:
        return value

    def text(self, tower: Tower, value: Path) -> str:
        words = [tower.format(value.nodes[0])] if value.nodes else []
        for node, edge in zip(value.nodes[1:], value.edges):
            words.append(tower.format(node) + (f"#{edge}" if edge > 1 else ""))
        return " ".join(words)

    def read(self, tower: Tower, text: str) -> Path:
        tokens = split_labels(text)
        if not tokens:
            raise PathError(f"empty path (write {self.syntax})")
        nodes = []
        edges = []
        for i, token in enumerate(tokens):
            edge = 1
            found = _EDGE.match(token)
            if found and i > 0:
                token, edge = found.group(1), int(found.group(2))
                if edge < 1:
                    raise PathError(f"edge numbers start at 1, not {edge} (in {text!r})")
            if i > 0:
                edges.append(edge)
            if tower.max_index is not None and i > tower.max_index:
                raise PathError(f"{text!r} has more levels than {tower.spec}")
            try:
                nodes.append(tower.parse(token, i))
            except UserError as exc:
                where = format_level(tower.level_of(i))
                raise PathError(f"label {i + 1} of the path (level {where}): {exc}") from exc
        return Path(tuple(nodes), tuple(edges))

    def draw(self, tower: Tower, value: Path) -> list[str]:
        levels = [format_level(tower.level_of(i)) for i in range(len(value.nodes))]
        width = max(len(level) for level in levels)
        lines = []
        for i, node in enumerate(value.nodes):
            mark = f"  (edge {value.edges[i - 1]})" if i > 0 and value.edges[i - 1] > 1 else ""
            lines.append(f"{levels[i]:>{width}}  {tower.format(node)}{mark}")
        return lines
