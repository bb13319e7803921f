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


async def _field_of_dialog(pilot, key: str) -> Input | None:
    """The text field of the dialog behind ``key``, opening the dialog if it is not open."""
    focused = pilot.app.focused
    if pilot.app.screen is not pilot.app.main and isinstance(focused, Input):
        return focused  # still open after the last (refused) text: its inline error is shown
    if pilot.app.screen is pilot.app.main:
        await pilot.press(key)
        await settle(pilot)
    for _ in range(3):  # a dialog may have a field inside a browser (paths: the rank to go to)
        focused = pilot.app.focused
        if isinstance(focused, Input):
            return focused
        await pilot.press("tab")
        await settle(pilot)
    return None


async def _back_to_main(pilot) -> None:
    for _ in range(2):  # a browser holding a field takes two
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
        for text in HOSTILE:  # each text submitted in turn, the dialog reopened if one closed it
            field = await _field_of_dialog(pilot, key)
            assert field is not None, f"no text field behind {key!r}"
            field.value = text
            await pilot.press("enter")
            await settle(pilot)
            assert app.is_running
        await _back_to_main(pilot)
        await pilot.press("l")  # still answers keys
        await settle(pilot)
        assert app.is_running


async def test_hostile_tower_specs_in_the_tower_form_never_crash_the_app(in_tmp) -> None:
    app = app_on("symmetric:n=4")
    async with app.run_test(size=(120, 36)) as pilot:
        await settle(pilot)
        for text in HOSTILE:  # every field of the form filled with the text, then submitted
            if app.screen is app.main:
                await pilot.press("t")
                await settle(pilot)
            fields = list(app.screen.query(Input))
            assert fields, "the tower form shows no text field"
            for field in fields:
                field.value = text
            await pilot.press("enter")
            await settle(pilot)
            assert app.is_running
        for _ in range(3):
            if app.screen is app.main:
                break
            await pilot.press("escape")
            await settle(pilot)
        assert app.is_running and app.screen is app.main
