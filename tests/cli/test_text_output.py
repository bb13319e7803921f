"""Text output at COLUMNS=80 for the README's tour: every line fits, no number is split across
lines, and every number shown is complete or carries its digit count."""

from __future__ import annotations

import re

import pytest

from tests.cli.conftest import main_output

WIDTH = 80

TOUR = [
    ("levels", "symmetric:n=4", "--to", "3"),
    ("node", "symmetric:n=4", "--level", "3", "--label", "(3,1)"),
    ("node", "symmetric:n=12", "--level", "100000", "--label", "(6,3,3)"),
    ("formula", "symmetric:n=5", "--label", "(3,2)"),
    ("levels", "general-linear:n=3", "--to", "5", "--sums-only"),
    ("levels", "orthogonal:n=3", "--to", "6", "--sums-only"),
    ("levels", "symplectic:n=2", "--to", "8", "--sums-only"),
    ("levels", "mixed:n=3,word=vdvd", "--to", "4"),
    ("paths", "symmetric:n=4", "--level", "3", "--label", "(3,1)", "--count", "5"),
    ("paths", "general-linear:n=4", "--level", "4", "--label", "(2,1,1)", "--encoding", "tableau", "--draw"),
    ("paths", "symmetric:n=12", "--level", "40", "--label", "(6,3,2,1)", "--start", "10^30", "--count", "2"),
    ("rank", "general-linear:n=4", "--level", "4", "--label", "(2,1,1)", "1,3/2/4"),
    ("tableaux", "symmetric:n=4", "--level", "3", "--label", "(3,1)"),
    ("levels", "symmetric:n=4,halves=no", "--to", "4"),
    ("levels", "symmetric:n=6", "--to", "14", "--sums-only"),  # the wide table of the issue
    ("levels", "symmetric:n=12", "--at", "60"),  # multiplicities of about 60 digits
    ("families",),
]

SHORT = re.compile(r"(-?)(\d)(?:\.(\d+))?e(\d+) \(([\d,]+) digits?\)")


@pytest.fixture
def run80(capsys, monkeypatch):
    monkeypatch.setenv("COLUMNS", str(WIDTH))
    return lambda *args: main_output(capsys, *args)


def _known_numbers(run, args) -> set[int]:
    """The exact numbers the JSON of the same request holds (multiplicities, dimensions, sums)."""
    if args[0] not in ("levels", "node"):
        return set()
    status, out, err = run(*args, "--json") if "--sums-only" not in args else run(
        *[a for a in args if a != "--sums-only"], "--json")
    assert status == 0, err
    import json

    found: set[int] = set()

    def walk(value):
        if isinstance(value, bool):
            return
        if isinstance(value, int):
            found.add(value)
        elif isinstance(value, dict):
            for v in value.values():
                walk(v)
        elif isinstance(value, list):
            for v in value:
                walk(v)

    walk(json.loads(out))
    return found


@pytest.mark.parametrize("args", TOUR, ids=[" ".join(a) for a in TOUR])
def test_tour_fits_80_columns_and_breaks_no_number(run80, args):
    status, out, err = run80(*args)
    assert status == 0, err
    lines = out.splitlines()
    assert all(len(line) <= WIDTH for line in lines), max(lines, key=len)
    known = _known_numbers(run80, args)
    if not known:
        return
    # every shortened number: its leading digits and digit count are those of a number of the JSON
    by_digits: dict[int, set[str]] = {}
    for n in known:
        by_digits.setdefault(len(str(abs(n))), set()).add(str(abs(n)))
    for m in SHORT.finditer(out):
        digits = int(m.group(5).replace(",", ""))
        assert int(m.group(4)) == digits - 1
        head = m.group(2) + (m.group(3) or "")
        assert any(s.startswith(head) for s in by_digits.get(digits, ())), m.group(0)
    # every other run of 4 or more digits is a whole number of the JSON (a split one would not be)
    rest = SHORT.sub(" ", out)
    rest = re.sub(r"\([\d,]+ digits?\)", " ", rest)
    for run in re.findall(r"(?<![\d.])\d{4,}(?![\d.])", rest):
        assert int(run) in known, run


def test_exact_prints_every_digit(run80):
    # S_2 on C^2: the trivial module (2) occurs 2^(k-1) times at level k >= 1 (common practice)
    status, out, _ = run80("node", "symmetric:n=2", "--level", "400", "--label", "(2)", "--exact")
    assert status == 0 and str(2**399) in out.split()
    status, out, _ = run80("levels", "symmetric:n=2", "--at", "400", "--exact")
    assert status == 0 and str(2**399) in out.split()
    status, out, _ = run80("levels", "symmetric:n=2", "--at", "400")
    assert str(2**399) not in out and "(121 digits)" in out  # 2^399 has 121 digits (common practice)


def test_node_shows_digit_counts(run80):
    status, out, _ = run80("node", "symmetric:n=4", "--level", "3", "--label", "(3,1)")
    # (3,1) occurs 10 times at level 3 of S_4 (README tour; hand computation)
    assert "multiplicity (paths from the root): 10 (2 digits)" in out


def test_headers_break_only_between_words(run80):
    status, out, _ = run80("levels", "symmetric:n=4", "--to", "3", "--sums-only")
    words = set(out.split())
    assert "centralizer" in words and "(central" not in out and "izer)" not in out
