"""CSV of the nodes of levels 0..K: one row per node (RFC 4180 via the csv module)."""

from __future__ import annotations

import csv
import io

from engine.diagram import Diagram
from engine.export.documents import level_rows


def to_csv(diagram: Diagram, upto: int, start: int = 0) -> str:
    out = io.StringIO()
    writer = csv.writer(out, lineterminator="\n")
    writer.writerow(["level", "label", "multiplicity", "dimension"])
    for row in level_rows(diagram, upto, start):
        writer.writerow(row)
    return out.getvalue()
