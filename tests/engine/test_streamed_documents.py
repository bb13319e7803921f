"""Streamed documents: the JSON written level by level is byte for byte the text json.dumps makes
of the whole document (json module of the standard library: the reference), and the CSV is the
csv module's text of the same rows."""

from __future__ import annotations

import io
import json

import pytest

from engine.diagram import Diagram
from engine.export import render, write
from engine.export.csv_levels import to_csv, write_csv
from engine.export.documents import levels_document, write_levels_json
from engine.specs import parse_spec

CASES = [("symmetric:n=4", 0, 6), ("su2:kind=icosahedral", 25, 30), ("mixed:n=2,word=vdvd", 0, 4),
         ("general-linear:n=3", 2, 5), ("orthogonal:n=3", 4, 4), ("characters:group=dihedral(5),module=r1", 0, 5)]


def _diagram(spec: str, start: int, upto: int) -> Diagram:
    diagram = Diagram(parse_spec(spec))
    if start <= diagram.built or not diagram.can_jump:
        diagram.ensure(upto)
    return diagram


@pytest.mark.parametrize("spec, start, upto", CASES)
@pytest.mark.parametrize("indent", [None, 1])
def test_streamed_json_is_the_bytes_of_json_dumps(spec, start, upto, indent):
    whole = json.dumps(levels_document(_diagram(spec, start, upto), upto, start=start), ensure_ascii=False, indent=indent)
    out = io.StringIO()
    write_levels_json(_diagram(spec, start, upto), upto, out, start, indent)
    assert out.getvalue() == whole


@pytest.mark.parametrize("fmt", ["json", "csv"])
def test_export_write_is_render(fmt):
    out = io.StringIO()
    write(_diagram("symmetric:n=3", 0, 5), 5, fmt, out)
    assert out.getvalue() == render(_diagram("symmetric:n=3", 0, 5), 5, fmt)


def test_streamed_csv_rows():
    out = io.StringIO()
    write_csv(_diagram("symplectic:n=4", 1, 6), 6, out, 1)
    assert out.getvalue() == to_csv(_diagram("symplectic:n=4", 1, 6), 6, 1)
    assert out.getvalue().splitlines()[0] == "level,label,multiplicity,dimension"
