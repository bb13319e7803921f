"""Tableau encodings of paths in towers whose nodes are partitions and whose steps add or remove
one box.

- ``tableau``: a path in Young's lattice from ∅ is a standard Young tableau, entry i in the box
  added at step i (Young's lattice and standard tableaux: Sagan, *The Symmetric Group*, 2nd ed.,
  2001, §2.8 and §5.1; Stanley, *Enumerative Combinatorics* vol. 2, §7.10).  Used for
  general-linear towers (Schur–Weyl duality: the paths index the Young seminormal basis).
- ``updown``: a path that adds or removes one box per step is an up–down tableau, the sequence of
  boxes added and removed (for Brauer algebras: Goodman and Wallach, *Symmetry, Representations,
  and Invariants*, 2009, ch. 10; for partition algebras each whole step removes then
  adds a box).

Text forms (rows numbered from 1, the first row on top):
- tableau: rows separated by ``/``, entries by commas: ``1,2,4/3``; the empty tableau ``∅`` (``-``
  and an empty string are read as it too).
- updown: one signed row number per step, ``+r`` adds a box at the end of row r, ``-r`` removes the
  last box of row r: ``+1 +1 -1 +2``; the empty sequence ``∅``.
"""

from __future__ import annotations

import re
from typing import Sequence

from engine.encodings.base import Encoding
from engine.encodings.drawing import draw_grid
from engine.numbers_in import is_digits
from engine.partitions import Partition
from engine.paths import Path, PathError
from engine.tower import Tower

_EMPTY = ("", "-", "∅", "()")


def box_step(before: Partition, after: Partition) -> int:
    """+r when ``after`` is ``before`` with a box added in row r (1-based), −r when removed."""
    if abs(sum(after) - sum(before)) != 1:
        raise PathError(f"the step {before} → {after} does not add or remove one box")
    longer = max(len(before), len(after))
    a = list(before) + [0] * (longer - len(before))
    b = list(after) + [0] * (longer - len(after))
    diffs = [(r, y - x) for r, (x, y) in enumerate(zip(a, b)) if x != y]
    if len(diffs) != 1:
        raise PathError(f"the step {before} → {after} does not add or remove one box")
    row, change = diffs[0]
    return (row + 1) * change


def apply_step(shape: Partition, step: int) -> Partition:
    """The partition after adding (+r) or removing (−r) a box in row r; PathError when it is none."""
    row = abs(step) - 1
    parts = list(shape)
    if step > 0:
        if row > len(parts) or (row > 0 and (parts[row] if row < len(parts) else 0) >= parts[row - 1]):
            raise PathError(f"no box can be added in row {row + 1} of {_show(shape)}")
        if row == len(parts):
            parts.append(1)
        else:
            parts[row] += 1
    else:
        if row >= len(parts) or (row + 1 < len(parts) and parts[row + 1] == parts[row]):
            raise PathError(f"no box can be removed from row {row + 1} of {_show(shape)}")
        parts[row] -= 1
        if parts[row] == 0:
            parts.pop()
    return tuple(parts)


def _show(shape: Partition) -> str:
    return "(" + ",".join(map(str, shape)) + ")"


def _single_edges(path: Path, name: str) -> None:
    if any(e != 1 for e in path.edges):
        raise PathError(f"the {name} encoding cannot say which of several edges a path takes")


class StandardTableau(Encoding):
    """Paths in Young's lattice from the root as standard Young tableaux (a value: tuple of rows)."""

    name = "tableau"
    title = "standard Young tableau"
    syntax = "rows separated by '/', entries by commas, e.g. '1,2,4/3'; the empty tableau '∅'"

    def encode(self, tower: Tower, path: Path) -> tuple[tuple[int, ...], ...]:
        _single_edges(path, self.name)
        rows: list[list[int]] = []
        for i, (before, after) in enumerate(zip(path.nodes, path.nodes[1:]), 1):
            step = box_step(before, after)
            if step < 0:
                raise PathError(f"step {i} removes a box: not a path in Young's lattice")
            while len(rows) < step:
                rows.append([])
            rows[step - 1].append(i)
        return tuple(tuple(r) for r in rows)

    def decode(self, tower: Tower, value: Sequence[Sequence[int]]) -> Path:
        place: dict[int, tuple[int, int]] = {}
        for r, row in enumerate(value):
            for c, entry in enumerate(row):
                if entry in place:
                    raise PathError(f"entry {entry} appears twice in the tableau")
                place[entry] = (r, c)
        k = len(place)
        if sorted(place) != list(range(1, k + 1)):
            raise PathError(f"a standard tableau with {k} boxes holds each of 1..{k} once")
        shape = tower.root()
        nodes = [shape]
        for entry in range(1, k + 1):
            r, c = place[entry]
            if c != (shape[r] if r < len(shape) else 0):
                raise PathError(f"not standard: entry {entry} (row {r + 1}) is not at the end of its row when placed")
            shape = apply_step(shape, r + 1)
            nodes.append(shape)
        return Path.simple(nodes)

    def text(self, tower: Tower, value: Sequence[Sequence[int]]) -> str:
        if not value:
            return "∅"
        return "/".join(",".join(map(str, row)) for row in value)

    def read(self, tower: Tower, text: str) -> tuple[tuple[int, ...], ...]:
        body = text.strip()
        if body in _EMPTY:
            return ()
        rows = []
        for piece in body.split("/"):
            entries = [e for e in re.split(r"[\s,]+", piece.strip()) if e]
            if not entries or not all(is_digits(e) and len(e) <= 18 for e in entries):
                raise PathError(f"{text!r} is not a tableau (write {self.syntax})")
            rows.append(tuple(int(e) for e in entries))
        return tuple(rows)

    def draw(self, tower: Tower, value: Sequence[Sequence[int]]) -> list[str]:
        return draw_grid([[str(e) for e in row] for row in value])


class UpDownTableau(Encoding):
    """Paths that add or remove one box per step as the sequence of signed row numbers."""

    name = "updown"
    title = "up–down tableau"
    syntax = "one step per level, '+r' adds a box in row r, '-r' removes one, e.g. '+1 +1 -1 +2'; empty '∅'"

    def encode(self, tower: Tower, path: Path) -> tuple[int, ...]:
        _single_edges(path, self.name)
        return tuple(box_step(a, b) for a, b in zip(path.nodes, path.nodes[1:]))

    def decode(self, tower: Tower, value: Sequence[int]) -> Path:
        shape = tower.root()
        nodes = [shape]
        for step in value:
            shape = apply_step(shape, step)
            nodes.append(shape)
        return Path.simple(nodes)

    def text(self, tower: Tower, value: Sequence[int]) -> str:
        return " ".join(f"{s:+d}" for s in value) if value else "∅"

    def read(self, tower: Tower, text: str) -> tuple[int, ...]:
        body = text.replace("−", "-").strip()
        if body in _EMPTY:
            return ()
        tokens = re.findall(r"\S+", body.replace(",", " "))
        if not all(re.fullmatch(r"[+-][1-9][0-9]{0,17}", t, re.ASCII) for t in tokens):
            raise PathError(f"{text!r} is not an up–down sequence (write {self.syntax})")
        return tuple(int(t) for t in tokens)

    def draw(self, tower: Tower, value: Sequence[int]) -> list[str]:
        """The steps, then the final shape with each box holding the step that last added it."""
        shape = tower.root()
        filling: list[list[str]] = [["·"] * part for part in shape]
        for i, step in enumerate(value, 1):
            shape = apply_step(shape, step)
            row = abs(step) - 1
            if step > 0:
                if row == len(filling):
                    filling.append([])
                filling[row].append(str(i))
            else:
                filling[row].pop()
                if not filling[row]:
                    filling.pop()
        return [self.text(tower, value), *draw_grid(filling)]
