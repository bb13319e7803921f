"""Snapshots of the main screen, the tower form and the help screen at 80×24 and 160×48.

Deterministic: a fixed session (tests/tui/data/small.json), every worker finished before the
picture, no blinking cursor, no clock on screen.
"""

from __future__ import annotations

import pytest

from .conftest import app_on, settle

SIZES = [(80, 24), (160, 48)]


async def _ready(pilot) -> None:  # noqa: ANN001
    await settle(pilot)


@pytest.mark.parametrize("size", SIZES, ids=lambda s: f"{s[0]}x{s[1]}")
def test_main_screen(snap_compare, size: tuple[int, int]) -> None:
    assert snap_compare(app_on(), terminal_size=size, run_before=_ready)


@pytest.mark.parametrize("size", SIZES, ids=lambda s: f"{s[0]}x{s[1]}")
def test_tower_form(snap_compare, size: tuple[int, int]) -> None:
    assert snap_compare(app_on(), press=["t"], terminal_size=size, run_before=_ready)


@pytest.mark.parametrize("size", SIZES, ids=lambda s: f"{s[0]}x{s[1]}")
def test_help(snap_compare, size: tuple[int, int]) -> None:
    assert snap_compare(app_on(), press=["question_mark"], terminal_size=size, run_before=_ready)


@pytest.mark.parametrize("size", SIZES, ids=lambda s: f"{s[0]}x{s[1]}")
def test_diagram_view(snap_compare, size: tuple[int, int]) -> None:
    assert snap_compare(app_on(), press=["v"], terminal_size=size, run_before=_ready)
