"""The explorer's dialogs with Pilot: nothing lost (the unsaved prompt on q, t and o; the autosave
offered back; a failed save keeps its dialog), the open dialog's file list and completion, the jump
and find dialogs' wording, the tower form, and the diagram view against the engine's edges.

Outside values: S_4 on C^4 at level 3 has 5 nodes (the partitions (4), (3,1), (2,2), (2,1,1),
(1,1,1,1) of 4 with first part ≥ 1; common practice)."""

from __future__ import annotations

import json
from pathlib import Path

from textual.widgets import Input

from tui.explorer.bratteli_view import diagram_model
from tui.explorer.screens.bratteli import BratteliScreen
from tui.explorer.screens.choice import Choice
from tui.explorer.screens.open_session import OpenSession
from tui.explorer.screens.prompt import Prompt
from tui.explorer.session_files import autosave_path, read_autosave

from .conftest import app_on, settle


async def test_q_t_and_o_ask_before_unsaved_marks_are_lost(in_tmp: Path) -> None:
    for key in ("q", "t", "o"):
        app = app_on("symmetric:n=4", search_faithful=False)
        async with app.run_test() as pilot:
            await settle(pilot)
            await pilot.press("b")
            await pilot.press(key)
            await settle(pilot)
            assert isinstance(app.screen, Choice)
            await pilot.press("escape")  # stay
            await settle(pilot)
            assert app.screen is app.main and app.is_running and app.state.bookmarks
            await pilot.press(key, "s")  # save first: the save dialog opens
            await settle(pilot)
            assert isinstance(app.screen, Prompt)
            await pilot.press("escape")
    app = app_on("symmetric:n=4", search_faithful=False)
    async with app.run_test() as pilot:
        await settle(pilot)
        await pilot.press("b", "q", "d")  # discard
        await settle(pilot)
    assert not app.is_running and not autosave_path().exists()


async def test_an_autosave_is_offered_back_after_a_crash(in_tmp: Path) -> None:
    app = app_on("symmetric:n=4", search_faithful=False)
    async with app.run_test() as pilot:
        await settle(pilot)
        await pilot.press("l", "l")
        await settle(pilot)
        await pilot.press("b", "n", *"kept", "enter")
        await settle(pilot)
        assert json.loads(autosave_path().read_text())["session"]["notes"][0]["text"] == "kept"
    # the run ended without quitting (as a crash would): the autosave is still there
    restored = read_autosave()
    assert restored is not None
    again = app_on("symmetric:n=5", search_faithful=False, restore=restored)
    async with again.run_test() as pilot:
        await settle(pilot)
        assert isinstance(again.screen, Choice)
        await pilot.press("r")
        await settle(pilot)
        assert again.state.spec == "symmetric:n=4" and again.state.bookmarks == [(2, (4,))]
        assert again.state.notes == {(2, (4,)): "kept"} and again.state.modified


async def test_a_failed_save_keeps_the_dialog_open(in_tmp: Path) -> None:
    blocker = in_tmp / "sessions" / "afile"
    blocker.write_text("not a folder")
    app = app_on("symmetric:n=4", search_faithful=False)
    async with app.run_test() as pilot:
        await settle(pilot)
        await pilot.press("b", "s")
        await settle(pilot)
        app.screen.query_one(Input).value = str(blocker / "x.json")
        await pilot.press("enter")
        await settle(pilot)
        assert isinstance(app.screen, Prompt)
        assert "not saved" in str(app.screen.query_one("#prompt-error").render())
        assert app.state.modified


async def test_the_open_dialog_lists_the_folder_and_completes_paths(in_tmp: Path) -> None:
    source = Path(__file__).parent / "data" / "small.json"
    (in_tmp / "sessions" / "seminar-s4.json").write_text(source.read_text())
    app = app_on("symmetric:n=5", search_faithful=False)
    async with app.run_test() as pilot:
        await settle(pilot)
        await pilot.press("o")
        await settle(pilot)
        assert isinstance(app.screen, OpenSession)
        assert [p.name for p in app.screen.files] == ["seminar-s4.json"]
        await pilot.press(*"sem", "tab")
        assert app.screen.query_one("#open-input").value == "seminar-s4.json"
        await pilot.press("enter")
        await settle(pilot)
        assert app.state.spec == "symmetric:n=4"


async def test_the_jump_dialog_speaks_in_levels_and_waits_for_input() -> None:
    app = app_on("symmetric:n=4", search_faithful=False)
    async with app.run_test() as pilot:
        await settle(pilot)
        await pilot.press("g")
        assert str(app.screen.query_one("#prompt-error").render()).strip() == ""
        await pilot.press(*"7/2")
        hint = str(app.screen.query_one("#prompt-hint").render())
        assert "level 3.5" in hint and "index" not in hint
        await pilot.press("escape")


async def test_find_says_how_many_nodes_match() -> None:
    app = app_on("symmetric:n=4", search_faithful=False)
    async with app.run_test() as pilot:
        await settle(pilot)
        app.go(6)
        await settle(pilot)
        await pilot.press("slash", *"1,1")
        # (2,1,1) and (1,1,1,1) contain "1,1" (level 3 of S_4, listed above)
        assert "2 nodes match of 5" in str(app.screen.query_one("#find-status").render())


async def test_the_tower_form_needs_a_change_and_tab_stays_in_the_keys() -> None:
    app = app_on("symmetric:n=4", search_faithful=False)
    async with app.run_test(size=(80, 24)) as pilot:
        await settle(pilot)
        await pilot.press("t")
        await settle(pilot)
        assert "the tower open now" in str(app.screen.query_one("#spec-error").render())
        await pilot.press("enter")  # the first Enter does not reopen the same tower
        await settle(pilot)
        assert type(app.screen).__name__ == "TowerForm"
        for _ in range(5):
            await pilot.press("tab")
        assert app.focused is not None and "key-input" in app.focused.classes


async def test_the_theme_is_kept_in_the_users_settings(user_data: Path) -> None:
    app = app_on("symmetric:n=4", search_faithful=False)
    async with app.run_test() as pilot:
        await settle(pilot)
        app.theme = "textual-light"
        await settle(pilot)
    assert json.loads((user_data / "settings.json").read_text())["theme"] == "textual-light"
    again = app_on("symmetric:n=4", search_faithful=False)
    async with again.run_test() as pilot:
        await settle(pilot)
        assert again.theme == "textual-light"


async def test_the_diagram_view_draws_the_engines_edges() -> None:
    app = app_on("symmetric:n=4", search_faithful=False)
    async with app.run_test(size=(160, 48)) as pilot:
        await settle(pilot)
        app.go(6)  # level 3
        await settle(pilot)
        await pilot.press("v")
        await settle(pilot)
        assert isinstance(app.screen, BratteliScreen)
        model = app.screen.model
        diagram = app.state.diagram
        indices = [i for i, _ in model.levels]
        assert 6 in indices and indices == list(range(indices[0], indices[-1] + 1))
        expected = {(i, p, c, e) for i in indices[:-1] for p in diagram.nodes(i) for c, e in diagram.children(i, p)}
        assert set(model.edges) == expected
        assert dict(model.levels)[6] == [(4,), (3, 1), (2, 2), (2, 1, 1), (1, 1, 1, 1)]
        drawn = str(app.screen.query_one("#diagram-text").render())
        assert all(label in drawn for label in ("(3,1)", "(2,1,1)", "(1,1,1,1)"))
        assert (5, (3,)) in model.on_paths  # a parent of the selection (4) at 3 is on its paths
        await pilot.press("escape")
        assert app.screen is app.main
    big = app_on("symmetric:n=40", search_faithful=False)
    async with big.run_test() as pilot:
        await settle(pilot)
        big.go(40)
        await settle(pilot)
        model = diagram_model(big.state.diagram, 40, 5, None)
        assert not model.levels and "at most 20 nodes" in model.notes[0]
