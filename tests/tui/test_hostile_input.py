"""Hostile text typed into every dialog of the explorer: the app never crashes (a crash would lose
unsaved work); bad input is an inline error or a notification.  The inputs are the ones that broke
the parsers when fuzzed: digits Python reads oddly, deep nesting, huge numbers, NUL (common
practice of fuzzing: the same list as tests/cli/test_hardening.py)."""

from __future__ import annotations

import pytest
from textual.widgets import Input

from tests.tui.conftest import app_on, settle

HOSTILE = [
    "²",
    "(₃,①)",
    "(" * 200 + "1" + ")" * 200,
    "-" * 1000 + "1",
    "1" + "0" * 309,
    "10^999999999",
    "a\x00b",
]

#: the keys that open a dialog with a text field (tui/explorer/actions.py)
DIALOG_KEYS = ["g", "slash", "n", "s", "o", "e", "p"]


async def _type_into_dialog(pilot, key: str, text: str) -> None:
    await pilot.press(key)
    await settle(pilot)
    for _ in range(3):  # a dialog may have a field inside a browser (paths: the rank to go to)
        focused = pilot.app.focused
        if isinstance(focused, Input):
            focused.value = text
            await pilot.press("enter")
            await settle(pilot)
            break
        await pilot.press("tab")
        await settle(pilot)
    for _ in range(2):  # back to the main screen (a browser holding a field takes two)
        if pilot.app.screen is pilot.app.main:
            break
        await pilot.press("escape")
        await settle(pilot)


@pytest.mark.parametrize("key", DIALOG_KEYS)
async def test_hostile_text_in_a_dialog_never_crashes_the_app(key: str, in_tmp) -> None:
    app = app_on("symmetric:n=4")
    async with app.run_test(size=(120, 36)) as pilot:
        await settle(pilot)
        await pilot.press("l", "l")
        await settle(pilot)
        for text in HOSTILE:
            await _type_into_dialog(pilot, key, text)
            assert app.is_running
        await pilot.press("l")  # still answers keys
        await settle(pilot)
        assert app.is_running


async def test_hostile_tower_specs_in_the_tower_form_never_crash_the_app(in_tmp) -> None:
    app = app_on("symmetric:n=4")
    async with app.run_test(size=(120, 36)) as pilot:
        await settle(pilot)
        for text in HOSTILE:
            await pilot.press("t")
            await settle(pilot)
            for _ in range(6):  # fill every field the form shows
                focused = pilot.app.focused
                if isinstance(focused, Input):
                    focused.value = text
                await pilot.press("tab")
            await pilot.press("enter")
            await settle(pilot)
            for _ in range(3):
                await pilot.press("escape")
                await settle(pilot)
            assert app.is_running
