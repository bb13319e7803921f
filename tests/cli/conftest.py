import json
import subprocess
import sys

import pytest

from tui.cli import main


@pytest.fixture
def run_cli(capsys):
    """Run ``towerscope ARGS`` in-process; returns (exit status, stdout, stderr)."""

    def run(*args: str):
        status = main(list(args))
        out, err = capsys.readouterr()
        return status, out, err

    return run


@pytest.fixture
def run_json(run_cli):
    def run(*args: str):
        status, out, err = run_cli(*args, "--json")
        assert status == 0, err
        return json.loads(out)

    return run


def run_process(*args: str) -> subprocess.CompletedProcess:
    """The real command in a subprocess (for exit statuses and stderr as a user sees them)."""
    return subprocess.run([sys.executable, "-m", "tui.cli", *args], capture_output=True, text=True, timeout=120)
