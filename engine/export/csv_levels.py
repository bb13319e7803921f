"""CSV of the nodes of levels 0..K: one row per node (RFC 4180 via the csv module)."""

from __future__ import annotations

import csv
import io
from typing import TextIO

from engine.diagram import Diagram
from engine.export.documents import level_rows


def write_csv(diagram: Diagram, upto: int, stream: TextIO, start: int = 0) -> None:
    """Write the rows level by level (one level's rows held at a time)."""
    writer = csv.writer(stream, lineterminator="\n")
    writer.writerow(["level", "label", "multiplicity", "dimension"])
    writer.writerows(level_rows(diagram, upto, start))


def to_csv(diagram: Diagram, upto: int, start: int = 0) -> str:
    out = io.StringIO()
    write_csv(diagram, upto, out, start)
    return out.getvalue()
