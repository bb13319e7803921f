"""Shared helpers for the explorer's tests: apps on fixed sessions, waiting for workers."""

from __future__ import annotations

import contextlib
from pathlib import Path

import pytest
from textual.worker import WorkerCancelled

from tui.explorer.app import ExplorerApp
from tui.explorer.session_files import read_session
from tui.explorer.state import state_for_spec

DATA = Path(__file__).parent / "data"
SMALL = DATA / "small.json"


def app_on(spec: str | None = None, session: Path | None = None, **kwargs: object) -> ExplorerApp:
    state = state_for_spec(spec) if spec is not None else read_session(session or SMALL)
    return ExplorerApp(state, **kwargs)  # type: ignore[arg-type]


async def settle(pilot) -> None:  # noqa: ANN001 - a textual Pilot
    """Wait until every worker has finished and the messages they posted are handled."""
    for _ in range(3):
        with contextlib.suppress(WorkerCancelled):
            await pilot.app.workers.wait_for_complete()
        await pilot.pause()


@pytest.fixture(autouse=True)
def user_data(tmp_path_factory: pytest.TempPathFactory, monkeypatch: pytest.MonkeyPatch) -> Path:
    """A user data folder of the test's own (autosave, settings), the legend already seen."""
    folder = tmp_path_factory.mktemp("user-data")
    (folder / "settings.json").write_text('{"legend_seen": true}')
    monkeypatch.setenv("TOWERSCOPE_DATA", str(folder))
    return folder


@pytest.fixture
def in_tmp(tmp_path: Path, monkeypatch: pytest.MonkeyPatch) -> Path:
    """Run in an empty folder with a ./sessions folder (the explorer's default save folder)."""
    monkeypatch.chdir(tmp_path)
    (tmp_path / "sessions").mkdir()
    return tmp_path
