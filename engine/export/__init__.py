"""Writers of the diagram for papers, talks and scripts: one entry point, ``render``."""

from __future__ import annotations

from typing import TYPE_CHECKING, TextIO

from engine.diagram import Diagram
from engine.errors import UserError

if TYPE_CHECKING:
    from engine.export.figure import FigureOptions

#: format name → (file extension, what it is)
FORMATS: dict[str, tuple[str, str]] = {
    "tikz": (".tikz", "a TikZ picture of the diagram"),
    "svg": (".svg", "an SVG picture of the diagram (no LaTeX needed)"),
    "latex": (".tex", "a LaTeX table of the decompositions"),
    "dot": (".dot", "a Graphviz DOT graph"),
    "csv": (".csv", "CSV: level, label, multiplicity, dimension"),
    "json": (".json", "JSON as `towerscope levels --json`"),
}


def format_for_path(path: str) -> str:
    """The format a file name's extension asks for; a UserError when it names none."""
    from pathlib import PurePath  # not at start-up: only exports to a file need it

    suffix = PurePath(path).suffix.lower()
    for name, (extension, _) in FORMATS.items():
        if suffix == extension:
            return name
    known = ", ".join(f"{ext} ({name})" for name, (ext, _) in FORMATS.items())
    raise UserError(f"cannot tell the format from {PurePath(path).name!r} (use one of {known})")


def render(diagram: Diagram, upto: int, fmt: str, figure: "FigureOptions | None" = None) -> str:
    """Levels 0..upto (indices) of a built or buildable diagram in the format ``fmt``; ``figure``
    holds the options of the pictures (TikZ, SVG)."""
    if fmt == "dot":
        from engine.export.dot import to_dot

        return to_dot(diagram, upto)
    if fmt == "csv":
        from engine.export.csv_levels import to_csv

        return to_csv(diagram, upto)
    if fmt == "latex":
        from engine.export.latex_table import to_latex_table

        return to_latex_table(diagram, upto)
    if fmt == "tikz":
        from engine.export.tikz import to_tikz

        return to_tikz(diagram, upto, figure)
    if fmt == "svg":
        from engine.export.svg import to_svg

        return to_svg(diagram, upto, figure)
    if fmt == "json":
        import json

        from engine.export.documents import levels_document

        return json.dumps(levels_document(diagram, upto), ensure_ascii=False, indent=1) + "\n"
    raise UserError(f"unknown format {fmt!r} (known: {', '.join(FORMATS)})")


def write(diagram: Diagram, upto: int, fmt: str, stream: TextIO) -> None:
    """``render`` written to a stream; JSON and CSV level by level, never holding the document
    (the same text as ``render``)."""
    if fmt == "json":
        from engine.export.documents import write_levels_json

        write_levels_json(diagram, upto, stream, indent=1)
        stream.write("\n")
    elif fmt == "csv":
        from engine.export.csv_levels import write_csv

        write_csv(diagram, upto, stream)
    else:
        stream.write(render(diagram, upto, fmt))
