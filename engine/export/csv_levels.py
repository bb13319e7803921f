"""CSV of the nodes of levels 0..K: one row per node, as the csv module writes them (RFC 4180,
QUOTE_MINIMAL), level by level and a batch of rows per write."""

from __future__ import annotations

import csv
import io
from typing import TextIO

from engine.diagram import Diagram
from engine.export.documents import LevelLabels, column_batches, node_columns
from engine.levels import format_level

#: rows formatted and written at a time
ROWS_AT_ONCE = 4096
HEADER = "level,label,multiplicity,dimension\n"


def csv_field(text: str) -> str:
    """A text field as ``csv.writer`` writes it with the default dialect (QUOTE_MINIMAL): as it is
    unless it holds the delimiter, the quote or a line break, and then quoted.  A field with a
    quote or a line break is left to the csv module itself (its rule for a lone carriage return
    differs between Python versions)."""
    if '"' in text or "\n" in text or "\r" in text:
        out = io.StringIO()
        csv.writer(out, lineterminator="\n").writerow([text, ""])
        return out.getvalue()[:-2]
    return '"' + text + '"' if "," in text else text


def write_csv(diagram: Diagram, upto: int, stream: TextIO, start: int = 0) -> None:
    """Write the rows level by level (one batch of rows held at a time)."""
    stream.write(HEADER)
    labels = LevelLabels(diagram.tower, wrap=csv_field)  # each label quoted once
    for index, level in diagram.levels_between(start, upto):
        shown = csv_field(format_level(diagram.tower.level_of(index)))
        for rows in column_batches(node_columns(diagram, index, level, labels), ROWS_AT_ONCE):
            stream.write("".join([f"{shown},{a},{m},{d}\n" for a, m, d in rows]))


def to_csv(diagram: Diagram, upto: int, start: int = 0) -> str:
    out = io.StringIO()
    write_csv(diagram, upto, out, start)
    return out.getvalue()
