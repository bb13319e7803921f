"""The CLI's text tables (no mathematics: everything comes from the engine).  Laid out by
``tui.cli.fit``: they fit the output width and never break a number."""

from __future__ import annotations

import sys
from typing import Any, Sequence

from engine.diagram import Diagram
from engine.levels import format_level
from tui.cli.fit import Column, Table, output_width, short_number
from tui.cli.folding import number_line


def _level_text(value: int | float) -> str:
    return str(value) if isinstance(value, int) else f"{value:g}"


def _out(text: str) -> None:
    sys.stdout.write(text)


def print_levels(diagram: Diagram, upto: int, nodes: bool = True, start: int = 0, exact: bool = False) -> None:
    tower = diagram.tower
    width = output_width()
    levels = list(diagram.levels_between(start, upto))
    if nodes:
        for index, level in levels:
            kind = tower.level_kind(index)
            title = f"level {format_level(tower.level_of(index))}" + (f"  ({kind})" if kind else "")
            table = Table([Column("node", key=True), Column("multiplicity", "right"), Column("dimension", "right")],
                          title=title)
            for node in tower.sort_nodes(level, index) if index > diagram.built else diagram.nodes(index):
                table.add_row(tower.format(node), level[node], tower.dimension(index, node))
            _out(table.render(width, exact) + "\n")
    generic = diagram.algebra(0) is not None
    columns = [Column("level", "right", key=True), Column("nodes", "right"), Column("Σm", "right"),
               Column("Σm² = dim centralizer", "right"), Column("Σm·dim", "right"), Column("=\u00a0dim V^⊗k")]
    if generic:
        columns += [Column("diagram algebra"), Column("its dimension", "right"), Column("faithful")]
    table = Table(columns, title=f"{tower.spec}: level sums")
    for index, level in levels:
        sums = diagram.sums_of(index, level)
        row: list[Any] = [
            format_level(tower.level_of(index)),
            len(level),
            sums.multiplicities,
            sums.squares,
            sums.weighted,
            "yes" if sums.consistent else f"NO ({short_number(sums.tensor_dimension, 24)})",
        ]
        if generic:
            row += [diagram.algebra(index).name, sums.generic_dimension, "yes" if sums.faithful else "no"]
        table.add_row(*row)
    _out(table.render(width, exact))
    if generic:
        first_bad = diagram.first_unfaithful_of_tower()
        if first_bad is None:
            _out("The diagram algebra acts faithfully on every level of the tower.\n")
        else:
            _out(
                f"The diagram algebra stops acting faithfully at level {format_level(tower.level_of(first_bad))}\n"
                "(Σm² falls below its dimension there and at every level after).\n"
            )


def print_node(spec: str, kind: str, doc: dict[str, Any], exact: bool = False) -> None:
    width = output_width()
    lines = [f"{spec}, level {_level_text(doc['level'])}" + (f" ({kind})" if kind else "") + f": node {doc['label']}",
             number_line("  multiplicity (paths from the root): ", doc["multiplicity"], width, exact, note=True),
             number_line("  dimension of the irreducible module: ", doc["dimension"], width, exact, note=True)]
    _out("\n".join(lines) + "\n")
    for word in ("parents", "children"):
        entries: Sequence[dict[str, Any]] = doc[word]
        if not entries:
            _out(f"  {word}: none\n")
            continue
        table = Table([Column("node", key=True), Column("edges", "right")],
                      title=f"{word} (level {_level_text(entries[0]['level'])})")
        for e in entries:
            table.add_row(e["label"], e["edges"])
        _out(table.render(width, exact))


def print_families(found: Sequence[Any]) -> None:
    table = Table([Column("family", key=True), Column("keys", wrap=True), Column("what it is", wrap=True)])
    for f in found:
        keys = ", ".join(f"{k}{'' if k in f.required else '?'}" for k in f.keys)
        table.add_row(f.name, keys, f.summary)
    _out(table.render(output_width()))
    _out("Keys marked ? are optional. Each key's meaning: `towerscope families --json`.\n")
