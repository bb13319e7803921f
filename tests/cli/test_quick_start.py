"""A lookup imports only what it needs (common practice for command-line tools: start-up is most of
a quick command's time; bench/bench_startup.py measures it, no test here is timed).

The import graph is read from ``python -X importtime -m tui.cli.main ...`` in a subprocess."""

from __future__ import annotations

import subprocess
import sys
from pathlib import Path

import pytest

from engine.specs import families, family, module_name
from tui.cli import commands
from tui.cli.main import build_parser

ROOT = Path(__file__).resolve().parents[2]
NODE = ["node", "symmetric:n=4", "--level", "2", "--label", "(3,1)", "--json"]
LEVELS = ["levels", "general-linear:n=3", "--to", "5", "--json"]
#: never needed by a small lookup: the terminal libraries, computer algebra, graphs, flint (only for
#: huge ints), and secrets/hashlib (OpenSSL, for a random token)
HEAVY = ("textual", "rich", "sympy", "networkx", "numpy", "flint", "secrets", "hashlib")


def _imported(argv: list[str]) -> tuple[set[str], str]:
    done = subprocess.run([sys.executable, "-X", "importtime", "-m", "tui.cli.main", *argv],
                          capture_output=True, text=True, cwd=ROOT)
    assert done.returncode == 0, done.stderr[-2000:]
    names = set()
    for line in done.stderr.splitlines():
        if line.startswith("import time:") and line.count("|") == 2:
            names.add(line.rsplit("|", 1)[1].strip())
    return names, done.stdout


@pytest.mark.parametrize("argv", [NODE, LEVELS], ids=["node", "levels"])
def test_a_lookup_imports_one_command_and_one_family(argv):
    names, out = _imported(argv)
    assert out.startswith("{")  # it did the lookup
    assert "engine.diagram" in names
    heavy = {m for m in names if m.split(".")[0] in HEAVY}
    assert not heavy, heavy
    assert "rich.table" not in names and "textual" not in names and "sympy" not in names
    loaded_commands = {m for m in names if m.startswith("tui.cli.commands.")}
    assert loaded_commands == {f"tui.cli.commands.{argv[0]}"}
    loaded_families = {m for m in names if m.startswith("engine.families.")}
    assert loaded_families == {f"engine.families.{module_name(argv[1].split(':')[0])}"}


def test_help_imports_no_mathematics_and_no_terminal_library():
    names, out = _imported(["--help"])
    assert "node" in out and "levels" in out
    assert not {m for m in names if m.split(".")[0] in HEAVY}
    assert not {"engine.diagram", "engine.specs", "engine.capabilities", "engine.tower"} & names
    assert not {m for m in names if m.startswith("engine.families")}


def test_every_command_is_found_by_its_own_module_or_by_the_whole_parser():
    whole = build_parser()
    sub = next(a for a in whole._actions if a.dest == "command")
    assert len(sub.choices) > 20
    for name in sub.choices:
        quick = build_parser(name)
        quick_sub = next(a for a in quick._actions if a.dest == "command")
        assert name in quick_sub.choices
        # the command's own options are the same in both
        assert [a.dest for a in quick_sub.choices[name]._actions] == [a.dest for a in sub.choices[name]._actions]
    # a command module per name where the names agree (lookups take the quick path)
    for name in ("node", "levels", "formula", "paths", "critical-group", "series", "walk"):
        assert commands.module_for(name) is not None
        quick_sub = next(a for a in build_parser(name)._actions if a.dest == "command")
        assert len(quick_sub.choices) < 5


def test_unknown_command_is_refused_with_the_whole_list(capsys):
    from tui.cli.main import main

    with pytest.raises(SystemExit) as stop:
        main(["no-such-command"])
    assert stop.value.code == 2
    err = capsys.readouterr().err
    assert "invalid choice" in err and "levels" in err and "critical-group" in err and err.count("\n") == 1


def test_every_family_lives_in_the_module_named_like_it():
    # so that a spec imports only its family's module (engine.specs.family)
    for name, one in families().items():
        assert module_name(name) is not None
        assert family(name) is one
        module = sys.modules[f"engine.families.{module_name(name)}"]
        assert module.FAMILY is one


def test_names_no_module_can_carry_are_unknown_families():
    from engine.errors import SpecError
    from engine.specs import parse_spec

    for bad in ("__init__", "..symmetric", "Symmetric", "sym metric", "families", "os", "_private"):
        assert family(bad) is None
        with pytest.raises(SpecError, match="unknown tower family"):
            parse_spec(bad + ":n=3")
