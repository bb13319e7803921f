"""Encodings of paths: each family declares the ones it offers (the ``Encodings`` capability).

| family | encodings (the first is the default) |
|---|---|
| symmetric | vacillating (labels at levels 0, 1/2, 1, ...), updown (with half levels) |
| general-linear | tableau (standard Young tableaux), updown, labels |
| orthogonal, symplectic | updown (up–down tableaux), labels |
| mixed | pairs (the sequence of pairs of partitions) |
| su2, graph, characters | walk (the sequence of node names) |
| any other | labels |

``labels`` (the sequence of node labels) is accepted for every tower.
"""

from __future__ import annotations

from engine.capabilities import Encodings
from engine.encodings.base import Encoding
from engine.encodings.labels import LabelSequence
from engine.encodings.tableaux import StandardTableau, UpDownTableau
from engine.errors import UserError
from engine.tower import Tower

_ALL: dict[str, Encoding] = {
    e.name: e
    for e in (
        LabelSequence(),
        LabelSequence("vacillating", "vacillating tableau"),
        LabelSequence("pairs", "sequence of pairs of partitions"),
        LabelSequence("walk", "walk on the graph"),
        StandardTableau(),
        UpDownTableau(),
    )
}

def encodings_for(tower: Tower) -> list[Encoding]:
    """The encodings of a tower's paths, its default first (``labels`` when it declares none)."""
    declared = tower.capability(Encodings)
    names = declared.names if declared is not None else ("labels",)
    return [_ALL[n] for n in names]


def default_encoding(tower: Tower) -> Encoding:
    found = encodings_for(tower)
    return found[0] if found else _ALL["labels"]


def get_encoding(tower: Tower, name: str | None) -> Encoding:
    """The encoding called ``name`` for this tower (its default for None); a UserError naming the
    accepted ones otherwise."""
    if name is None:
        return default_encoding(tower)
    offered = encodings_for(tower)
    for encoding in offered:
        if encoding.name == name:
            return encoding
    if name == "labels":
        return _ALL["labels"]
    accepted = ", ".join(dict.fromkeys([e.name for e in offered] + ["labels"]))
    raise UserError(f"{tower.spec} has no path encoding {name!r} (accepted: {accepted})")


__all__ = ["Encoding", "default_encoding", "encodings_for", "get_encoding"]
