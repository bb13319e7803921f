"""Readable rich tables for the CLI (no mathematics: everything comes from the engine)."""

from __future__ import annotations

from typing import Any, Sequence

from engine.diagram import Diagram
from engine.levels import format_level
from tui.cli.support import console


def _level_text(value: int | float) -> str:
    return str(value) if isinstance(value, int) else f"{value:g}"


def print_levels(diagram: Diagram, upto: int, nodes: bool = True, start: int = 0) -> None:
    from rich.table import Table

    out = console()
    tower = diagram.tower
    levels = list(diagram.levels_between(start, upto))
    if nodes:
        for index, level in levels:
            kind = tower.level_kind(index)
            title = f"level {format_level(tower.level_of(index))}" + (f"  ({kind})" if kind else "")
            table = Table(title=title, title_justify="left", show_edge=False, pad_edge=False)
            table.add_column("node")
            table.add_column("multiplicity", justify="right", overflow="fold")
            table.add_column("dimension", justify="right", overflow="fold")
            for node in tower.sort_nodes(level, index) if index > diagram.built else diagram.nodes(index):
                table.add_row(tower.format(node), str(level[node]), str(tower.dimension(index, node)))
            out.print(table)
            out.print()
    table = Table(title=f"{tower.spec}: level sums", title_justify="left", show_edge=False, pad_edge=False)
    table.add_column("level", justify="right", overflow="fold")
    table.add_column("nodes", justify="right", overflow="fold")
    table.add_column("Σm", justify="right", overflow="fold")
    table.add_column("Σm² (centralizer)", justify="right", overflow="fold")
    table.add_column("Σm·dim", justify="right", overflow="fold")
    table.add_column("= dim V^⊗k")
    generic = diagram.algebra(0) is not None
    if generic:
        table.add_column("diagram algebra")
        table.add_column("its dimension", justify="right", overflow="fold")
        table.add_column("faithful")
    for index, level in levels:
        sums = diagram.sums_of(index, level)
        row = [
            format_level(tower.level_of(index)),
            str(len(level)),
            str(sums.multiplicities),
            str(sums.squares),
            str(sums.weighted),
            "yes" if sums.consistent else f"NO ({sums.tensor_dimension})",
        ]
        if generic:
            row.append(diagram.algebra(index).name)
            row.append(str(sums.generic_dimension))
            row.append("yes" if sums.faithful else "no")
        table.add_row(*row)
    out.print(table)
    if generic:
        first_bad = diagram.first_unfaithful_of_tower()
        if first_bad is None:
            out.print("The diagram algebra acts faithfully on every level of the tower.")
        else:
            out.print(
                f"The diagram algebra stops acting faithfully at level {format_level(tower.level_of(first_bad))} "
                "(Σm² falls below its dimension there and at every level after)."
            )


def print_node(spec: str, kind: str, doc: dict[str, Any]) -> None:
    from rich.table import Table

    out = console()
    out.print(f"{spec}, level {_level_text(doc['level'])}" + (f" ({kind})" if kind else "") + f": node {doc['label']}")
    out.print(f"  multiplicity (paths from the root): {doc['multiplicity']}")
    out.print(f"  dimension of the irreducible module: {doc['dimension']}")
    for word in ("parents", "children"):
        entries: Sequence[dict[str, Any]] = doc[word]
        if not entries:
            out.print(f"  {word}: none")
            continue
        table = Table(title=f"{word} (level {_level_text(entries[0]['level'])})", title_justify="left",
                      show_edge=False, pad_edge=False)
        table.add_column("node")
        table.add_column("edges", justify="right", overflow="fold")
        for e in entries:
            table.add_row(e["label"], str(e["edges"]))
        out.print(table)


def print_families(found: Sequence[Any]) -> None:
    from rich.table import Table

    table = Table(show_edge=False, pad_edge=False)
    table.add_column("family")
    table.add_column("keys")
    table.add_column("what it is")
    for f in found:
        keys = ", ".join(f"{k}{'' if k in f.required else '?'}" for k in f.keys)
        table.add_row(f.name, keys, f.summary)
    out = console()
    out.print(table)
    out.print("Keys marked ? are optional. `towerscope families --json` gives each key's meaning.")
