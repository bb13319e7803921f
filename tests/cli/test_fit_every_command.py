"""Every subcommand's default text output at COLUMNS=80: no line over 80 columns, no number split
across a line break, every shortened number with its digit count.

Each command runs once at 80 columns and once at 1,000,000 (where nothing is folded or shortened);
the wide output holds every number whole, so a piece of a split number is a digit run the wide
output does not have.  The examples are the families' own (``Family.example``/``examples``) with
large requests beside them (deep levels, long polynomials, many steps).  The fitting itself is
presentation, not mathematics: the outside check of the numbers is the wide output of the same
command (whose values the other CLI tests hold against OEIS, sympy and hand computations).
"""

from __future__ import annotations

import re

import pytest

from tests.cli.conftest import main_output
from tui.cli.main import build_parser

WIDTH = 80

CASES: list[tuple[str, ...]] = [
    ("levels", "symmetric:n=6", "--to", "14", "--sums-only"),
    ("levels", "su2:kind=icosahedral", "--at", "1000"),
    ("levels", "characters:group=dihedral(5),module=r1", "--to", "6"),
    ("node", "symmetric:n=12", "--level", "100000", "--label", "(6,3,3)"),
    ("node", "su2:kind=icosahedral", "--level", "100001", "--label", "o:6"),
    ("formula", "symmetric:n=12", "--label", "(6,3,2)", "--check", "60"),
    ("paths", "symmetric:n=12", "--level", "40", "--label", "(6,3,2,1)", "--start", "-1", "--count", "2"),
    ("rank", "general-linear:n=4", "--level", "4", "--label", "(2,1,1)", "1,3/2/4"),
    ("tableaux", "symmetric:n=12", "--level", "40", "--label", "(6,3,2,1)", "--start", "10^30", "--count", "2"),
    ("families",),
    ("check", "sessions/examples/a4-on-3.toml"),
    ("check", "sessions/examples/dihedral10.toml"),
    ("mckay", "characters:group=symmetric(8),module=(7,1)"),
    ("diagrams", "symmetric:n=12", "--level", "40", "--start", "-1", "--count", "2"),
    ("multiply", "symmetric:n=3", "--level", "2", "{1,2'},{2},{1'}", "{1},{2,1',2'} - 2*{1,1'},{2,2'}"),
    ("multiply", "orthogonal:n=3", "--level", "3", "{1,2},{3,1'},{2',3'}", "{1,2},{3,1'},{2',3'}", "--symbolic"),
    ("algebra", "symmetric:n=12", "--level", "30"),
    ("algebra", "symmetric:n=3", "--level", "4"),
    ("kernel", "symmetric:n=2", "--level", "4", "--count", "3"),
    ("act", "symmetric:n=3", "--level", "4", "{1,2'},{2,1'},{3,3'},{4,4'}"),
    ("gram", "symmetric:n=3", "--level", "4", "--label", "(1)"),  # a determinant of degree 62, folded over 20 lines
    ("gram", "orthogonal:n=3", "--level", "4", "--label", "(2)", "--matrix"),
    ("semisimple", "symmetric:n=3", "--level", "3"),
    ("series", "characters:group=symmetric(8),module=(7,1)", "--all"),
    ("series", "su2:kind=icosahedral", "--all"),
    ("walk", "characters:group=symmetric(10),module=(9,1)", "--steps", "1000"),
    ("critical-group", "characters:group=symmetric(10),module=(9,1)"),
    ("chips", "su2:kind=icosahedral", "--put", "o:6=50", "--list"),
    ("growth", "su2:kind=icosahedral", "--label", "o:6", "--to", "400"),
]

#: subcommands without text output of their own: the explorer, and files written by export
NOT_TEXT = {"open": "the explorer", "explore": "the explorer", "export": "writes a file (stderr says where)"}

SHORT = re.compile(r"(?<![\d.])(-?)(\d)(?:\.(\d+))?e(\d+) \(([\d,]+) digits?\)")
MANTISSA = re.compile(r"(?<![\d.])\d(?:\.\d+)?e\d+")
NUMBER = re.compile(r"\d{1,3}(?:,\d{3})+(?!\d)|\d+")


def _numbers(text: str) -> set[str]:
    """Every number of the text, thousands separators removed."""
    return {m.group().replace(",", "") for m in NUMBER.finditer(text)}


def _runs(text: str) -> set[str]:
    return set(re.findall(r"\d+", text))


def _run(capsys, monkeypatch, width: int, args: tuple[str, ...]) -> str:
    monkeypatch.setenv("COLUMNS", str(width))
    status, out, err = main_output(capsys, *args)
    assert status == 0, err
    return out


def test_every_subcommand_is_covered():
    parser = build_parser()
    commands = next(a for a in parser._actions if a.dest == "command").choices
    covered = {case[0] for case in CASES}
    assert set(commands) - covered - set(NOT_TEXT) == set()


@pytest.mark.parametrize("args", CASES, ids=[" ".join(a)[:60] for a in CASES])
def test_fits_80_columns_and_breaks_no_number(capsys, monkeypatch, args):
    out = _run(capsys, monkeypatch, WIDTH, args)
    wide = _run(capsys, monkeypatch, 1_000_000, args)
    lines = out.splitlines()
    assert all(len(line) <= WIDTH for line in lines), max(lines, key=len)
    whole, runs = _numbers(wide), _runs(wide)
    # every shortened number: its digit count, and the leading digits of a number the wide output has
    for m in SHORT.finditer(out):
        digits = int(m.group(5).replace(",", ""))
        assert int(m.group(4)) == digits - 1, m.group(0)
        head = m.group(2) + (m.group(3) or "")
        assert any(len(n) == digits and n.startswith(head) for n in whole), m.group(0)
    assert len(MANTISSA.findall(out)) == len(SHORT.findall(out)), "a shortened number without its digit count"
    # no line ends inside a number that goes on at the start of the next line
    for a, b in zip(lines, lines[1:]):
        end, start = re.search(r"(\d+)$", a), re.match(r"\s*(\d+)", b)
        if end and start:
            joined = end.group(1) + start.group(1)
            assert not (joined in runs and not {end.group(1), start.group(1)} <= runs), (a, b)
    # every other run of 4 or more digits is one of the wide output's (a piece of a split one is not)
    rest = SHORT.sub(" ", out)
    for piece in re.findall(r"\d{4,}", rest):
        assert piece in runs, piece


def test_exact_keeps_every_digit_where_the_default_shortens(capsys, monkeypatch):
    # the basis of P_30(12): the Bell number B(60) (OEIS A000110), 60 digits; the value compared is the
    # JSON of the same request (exact integers, the CLI contract)
    import json

    monkeypatch.setenv("COLUMNS", str(WIDTH))
    status, out, _ = main_output(capsys, "algebra", "symmetric:n=12", "--level", "30", "--json")
    basis = json.loads(out)["basis"]
    short = _run(capsys, monkeypatch, WIDTH, ("algebra", "symmetric:n=12", "--level", "30"))
    exact = _run(capsys, monkeypatch, WIDTH, ("algebra", "symmetric:n=12", "--level", "30", "--exact"))
    assert str(basis) not in short and f"({len(str(basis))} digits)" in short
    assert str(basis) in exact.split()


def test_piped_output_without_columns_is_80_wide(tmp_path):
    # not a terminal and no COLUMNS: 80 columns (common practice for text meant for a file or pager)
    import os
    import subprocess
    import sys

    env = {k: v for k, v in os.environ.items() if k not in ("COLUMNS", "LINES")}
    done = subprocess.run([sys.executable, "-m", "tui.cli.main", "levels", "symmetric:n=6", "--to", "14",
                           "--sums-only"], capture_output=True, text=True, env=env, timeout=120)
    assert done.returncode == 0, done.stderr
    assert max(len(line) for line in done.stdout.splitlines()) <= WIDTH
    env["COLUMNS"] = "200"
    wide = subprocess.run([sys.executable, "-m", "tui.cli.main", "levels", "symmetric:n=6", "--to", "14",
                           "--sums-only"], capture_output=True, text=True, env=env, timeout=120)
    assert max(len(line) for line in wide.stdout.splitlines()) > WIDTH  # asked for more, given more
