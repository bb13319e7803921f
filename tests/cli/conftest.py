import json
import subprocess
import sys

import pytest

from tui.cli.main import main


def main_output(capsys, *args: str) -> tuple[int, str, str]:
    """Run ``towerscope ARGS`` in-process; returns (exit status, stdout, stderr)."""
    try:
        status = main(list(args))
    except SystemExit as exc:  # argparse's own errors
        status = exc.code
    out, err = capsys.readouterr()
    return status, out, err


def main_json(capsys, *args: str):
    """``towerscope ARGS --json`` in-process: the document, after checking the exit status is 0."""
    status, out, err = main_output(capsys, *args, "--json")
    assert status == 0, err
    return json.loads(out, parse_int=_exact_int)


def _exact_int(text: str) -> int:
    """An int of the JSON text; long ones through flint (CPython's decimal reading is quadratic:
    seconds for the 300,000-digit multiplicities of a deep jump)."""
    if len(text) < 4000:
        return int(text)
    from flint import fmpz

    return int(fmpz(text))


@pytest.fixture
def run_cli(capsys):
    return lambda *args: main_output(capsys, *args)


@pytest.fixture
def run_json(capsys):
    return lambda *args: main_json(capsys, *args)


def run_process(*args: str) -> subprocess.CompletedProcess:
    """The real command in a subprocess (for exit statuses and stderr as a user sees them)."""
    return subprocess.run([sys.executable, "-m", "tui.cli.main", *args], capture_output=True, text=True, timeout=120)
