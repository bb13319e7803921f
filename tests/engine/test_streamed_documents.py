"""Streamed documents: the JSON written level by level is byte for byte the text json.dumps makes
of the whole document (json module of the standard library: the reference), and the CSV is the
csv module's text of the same rows."""

from __future__ import annotations

import csv
import io
import json
from fractions import Fraction

import pytest
from hypothesis import given
from hypothesis import strategies as st

from engine.diagram import Diagram
from engine.export import documents, render, write
from engine.export import csv_levels
from engine.export.csv_levels import csv_field, write_csv
from engine.export.documents import levels_document, write_levels_json
from engine.levels import format_level
from engine.specs import parse_spec

CASES = [("symmetric:n=4", 0, 6), ("su2:kind=icosahedral", 25, 30), ("mixed:n=2,word=vdvd", 0, 4),
         ("general-linear:n=3", 2, 5), ("orthogonal:n=3", 4, 4), ("characters:group=dihedral(5),module=r1", 0, 5),
         ("su2:kind=icosahedral", 3600, 3601)]  # multiplicities past json_text.BIG_BITS: written by flint


def _diagram(spec: str, start: int, upto: int) -> Diagram:
    diagram = Diagram(parse_spec(spec))
    if start <= diagram.built or not diagram.can_jump:
        diagram.ensure(upto)
    return diagram


@pytest.mark.parametrize("spec, start, upto", CASES)
@pytest.mark.parametrize("indent", [None, 1])
@pytest.mark.parametrize("batch", [3, documents.NODES_AT_ONCE])
def test_streamed_json_is_the_bytes_of_json_dumps(spec, start, upto, indent, batch, monkeypatch):
    monkeypatch.setattr(documents, "NODES_AT_ONCE", batch)  # 3: every level written in several batches
    whole = json.dumps(levels_document(_diagram(spec, start, upto), upto, start=start), ensure_ascii=False, indent=indent)
    out = io.StringIO()
    write_levels_json(_diagram(spec, start, upto), upto, out, start, indent)
    assert out.getvalue() == whole


@pytest.mark.parametrize("fmt", ["json", "csv"])
def test_export_write_is_render(fmt):
    out = io.StringIO()
    write(_diagram("symmetric:n=3", 0, 5), 5, fmt, out)
    assert out.getvalue() == render(_diagram("symmetric:n=3", 0, 5), 5, fmt)


@pytest.mark.parametrize("spec, start, upto", CASES + [("symplectic:n=4", 1, 6)])
@pytest.mark.parametrize("batch", [3, csv_levels.ROWS_AT_ONCE])
def test_streamed_csv_is_the_csv_modules_text_of_the_document(spec, start, upto, batch, monkeypatch):
    monkeypatch.setattr(csv_levels, "ROWS_AT_ONCE", batch)
    document = levels_document(_diagram(spec, start, upto), upto, start=start)
    reference = io.StringIO()
    writer = csv.writer(reference, lineterminator="\n")
    writer.writerow(["level", "label", "multiplicity", "dimension"])
    for entry in document["levels"]:
        shown = format_level(Fraction(entry["level"]))
        writer.writerows((shown, n["label"], n["multiplicity"], n["dimension"]) for n in entry["nodes"])
    out = io.StringIO()
    write_csv(_diagram(spec, start, upto), upto, out, start)
    assert out.getvalue() == reference.getvalue()
    assert out.getvalue().splitlines()[0] == "level,label,multiplicity,dimension"


@given(st.text(min_size=1))
def test_a_csv_field_is_quoted_as_the_csv_module_quotes_it(text):
    out = io.StringIO()
    csv.writer(out, lineterminator="\n").writerow([text, "x"])
    assert csv_field(text) + ",x\n" == out.getvalue()
