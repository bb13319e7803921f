"""The explorer driven with Pilot: panes, details and sums show the engine's numbers; marks,
notes and sessions survive a save and a reopen; broken files change nothing; Escape stops a build."""

from __future__ import annotations

import importlib.util
from pathlib import Path

from sympy.functions.combinatorial.numbers import stirling

from tui.explorer.actions import ALL
from tui.explorer.messages import PathShown
from tui.explorer.screens.prompt import Prompt
from tui.explorer.widgets.details import DetailsPane
from tui.explorer.widgets.level_pane import LevelPane
from tui.explorer.widgets.sums_bar import SumsBar

from .conftest import app_on, settle


def current_pane(app) -> LevelPane:  # noqa: ANN001
    return next(p for p in app.screen.query(LevelPane) if p.has_class("-current"))


def pane_text(pane: LevelPane) -> list[str]:
    return [pane.render_line(y).text.rstrip() for y in range(pane.size.height)]


def details_text(app) -> str:  # noqa: ANN001
    return str(app.screen.query_one("#details-text").render())


async def test_stepping_through_symmetric_4_shows_the_engines_numbers() -> None:
    app = app_on("symmetric:n=4", search_faithful=False)
    async with app.run_test(size=(100, 30)) as pilot:
        await settle(pilot)
        assert app.state.index == 0 and app.state.node == (4,)
        for _ in range(6):  # levels 0.5, 1, ..., 3
            await pilot.press("l")
            await settle(pilot)
        assert app.state.index == 6
        await pilot.press("j")  # (4) → (3,1)
        assert app.state.node == (3, 1)
        row = next(line for line in pane_text(current_pane(app)) if "(3,1)" in line)
        # m_(3,1)(3) = Σ_t S(3,t)·f^{(3,1)/(4−t)} = 1·1 + 3·2 + 1·3 = 10 (the orbit
        # decomposition of V⊗3, common practice; Stirling numbers from sympy); dim S^(3,1) = 3 (hook lengths)
        assert row.startswith("▶") and row.split()[-2:] == ["10", "3"]
        text = details_text(app)
        assert "10" in text and "dimension 3" in text
        # parents (3), (2,1) at 2.5 and children (3), (2,1) at 3.5, one edge each (cli-contract.md,
        # `node` example; the branching rule removes or adds one box)
        assert "parents at 2.5: 2" in text and "(3)×1 (2,1)×1" in text
        assert "children at 3.5: 2" in text
        previous = next(p for p in app.screen.query(LevelPane) if p.rows and p.rows.index == 5)
        linked = [line for line in pane_text(previous) if line.startswith("1")]
        assert [line.split()[1] for line in linked] == ["(3)", "(2,1)"]
        sums = str(app.screen.query_one("#sums", SumsBar).render())
        squares = sum(stirling(6, j) for j in range(5))  # Σm² = Σ_{j≤4} S(6,j) = 187 (sympy)
        assert f"Σm² {squares}" in sums
        assert "Σm·dim 64 ✓" in sums  # 4^3, the dimension of V⊗3 (common practice)
        assert "P_3(4)" in sums


async def test_keys_jump_find_and_move() -> None:
    app = app_on("symmetric:n=4", search_faithful=False)
    async with app.run_test() as pilot:
        await settle(pilot)
        await pilot.press("g", *"5/2", "enter")
        await settle(pilot)
        assert app.state.index == 5  # level 2.5
        await pilot.press("slash", *"1 1 1", "enter")
        await settle(pilot)
        assert app.state.node == (1, 1, 1)
        await pilot.press("home")
        assert app.state.node == (3,)
        await pilot.press("end", "h")
        await settle(pilot)
        assert app.state.index == 4 and app.state.node in {(2, 1, 1), (1, 1, 1, 1)}


async def test_jump_prompt_shows_errors_inline() -> None:
    app = app_on("symmetric:n=4", search_faithful=False)
    async with app.run_test() as pilot:
        await settle(pilot)
        await pilot.press("g", *"1/3", "enter")
        assert isinstance(app.screen, Prompt)
        assert "no level 1/3" in str(app.screen.query_one("#prompt-error").render())
        await pilot.press("escape")
        assert app.state.index == 0


async def test_bookmark_note_save_and_reopen(in_tmp: Path) -> None:
    app = app_on("symmetric:n=4", search_faithful=False)
    async with app.run_test() as pilot:
        await settle(pilot)
        await pilot.press("l", "l")
        await settle(pilot)
        await pilot.press("j", "b", "n", *"two paths", "enter")
        await pilot.press("s")
        await pilot.press(*"mine.json", "enter")
        await settle(pilot)
        saved = app.state
    path = in_tmp / "sessions" / "mine.json"
    assert path.is_file()
    reopened = app_on(session=path, search_faithful=False)
    async with reopened.run_test() as pilot:
        await settle(pilot)
        state = reopened.state
        assert state.spec == saved.spec == "symmetric:n=4"
        assert (state.index, state.node) == (saved.index, saved.node) == (2, (3, 1))
        assert state.bookmarks == saved.bookmarks == [(2, (3, 1))]
        assert state.notes == saved.notes == {(2, (3, 1)): "two paths"}
        assert state.view == saved.view
        row = next(line for line in pane_text(current_pane(reopened)) if "(3,1)" in line)
        assert "(3,1)*✎" in row


async def test_broken_session_changes_nothing(in_tmp: Path) -> None:
    broken = in_tmp / "sessions" / "broken.json"
    broken.write_text('{"format": "towerscope-session", "version": 1, "tower": "symm')
    before = broken.read_bytes()
    app = app_on("symmetric:n=4", search_faithful=False)
    async with app.run_test() as pilot:
        await settle(pilot)
        state = app.state
        await pilot.press("o", *"broken.json", "enter")
        await settle(pilot)
        messages = [n.message for n in app._notifications]
        assert any("not valid JSON" in m and "broken.json" in m for m in messages)
        assert app.state is state and app.state.spec == "symmetric:n=4"
    assert broken.read_bytes() == before


async def test_escape_stops_a_long_build() -> None:
    app = app_on("symmetric:n=80", search_faithful=False)
    async with app.run_test() as pilot:
        await settle(pilot)
        app.go(80)  # level 40: about 200,000 nodes, seconds of work
        await pilot.pause(0.3)
        await pilot.press("escape")
        await settle(pilot)
        assert app.state.index == 0
        assert app.state.diagram.built < 80
        assert any("stopped" in n.message for n in app._notifications)
        assert not app.screen.query_one("#progress").display


async def test_tower_form_validates_as_typed() -> None:
    app = app_on("symmetric:n=4", search_faithful=False)
    async with app.run_test(size=(80, 30)) as pilot:
        await settle(pilot)
        await pilot.press("t", "backspace", "0")
        error = str(app.screen.query_one("#spec-error").render())
        assert "at least 1" in error
        await pilot.press("enter")  # refused: the form stays
        assert app.screen.query("#spec-error")
        await pilot.press("backspace", "6", "enter")
        await settle(pilot)
        assert app.state.spec == "symmetric:n=6" and app.state.index == 0


async def test_a_shown_path_is_highlighted() -> None:
    app = app_on("symmetric:n=4", search_faithful=False)
    async with app.run_test() as pilot:
        await settle(pilot)
        app.post_message(PathShown([(4,), (3,), (3, 1)]))
        await settle(pilot)
        pane = next(p for p in app.screen.query(LevelPane) if p.rows and p.rows.index == 1)
        assert any(line.startswith(" •(3)") or line.startswith("1•(3)") for line in pane_text(pane))
        await pilot.press("x")
        assert not any("•" in line for line in pane_text(pane))


async def test_path_key_opens_the_browser_or_says_why_not() -> None:
    app = app_on("symmetric:n=4", search_faithful=False)
    async with app.run_test() as pilot:
        await settle(pilot)
        await pilot.press("p")
        await pilot.pause()
        if importlib.util.find_spec("tui.explorer.screens.path_browser") is None:
            assert any(n.message == "path browser not available" for n in app._notifications)
        else:
            assert type(app.screen).__name__ == "PathBrowser"


async def test_every_action_is_in_the_palette_and_the_help() -> None:
    from tui.explorer.screens.help import help_text

    app = app_on("symmetric:n=4", search_faithful=False)
    async with app.run_test() as pilot:
        await settle(pilot)
        titles = {c.title.lower() for c in app.get_system_commands(app.screen)}
        text = help_text().plain
        for act in ALL:
            if act.palette:
                assert act.help.lower() in titles
            assert act.help in text
        await pilot.press("question_mark")
        assert type(app.screen).__name__ == "HelpScreen"
        await pilot.press("escape")
        assert app.screen is app.main


async def test_details_toggle_and_narrow_terminal() -> None:
    app = app_on(session=None, search_faithful=False)
    async with app.run_test(size=(80, 24)) as pilot:
        await settle(pilot)
        shown = [p for p in app.screen.query(LevelPane) if p.display]
        assert len(shown) == 3 and app.screen.query_one(DetailsPane).display
        before = sum(p.size.width for p in shown)
        await pilot.press("d")
        await settle(pilot)
        assert not app.screen.query_one(DetailsPane).display
        # fewer, wider panes before more: the panes take the details pane's room
        now = [p for p in app.screen.query(LevelPane) if p.display]
        assert len(now) == 3 and sum(p.size.width for p in now) > before


async def test_details_show_the_closed_form_where_the_family_has_one() -> None:
    # S_4, (4) at level 1: m = S(k,0) + S(k,1) + S(k,2) + S(k,3) + S(k,4) (orbit decomposition,
    # f^{(4)/(4−t)} = 1 for every t); su2 towers have no formula in k
    app = app_on("symmetric:n=4", search_faithful=False)
    async with app.run_test(size=(120, 40)) as pilot:
        await settle(pilot)
        assert "m_(4)(k) = S(k,0) + S(k,1) + S(k,2) + S(k,3) + S(k,4)" in details_text(app).replace("\n", " ")
    app = app_on("su2:kind=tetrahedral", search_faithful=False)
    async with app.run_test(size=(120, 40)) as pilot:
        await settle(pilot)
        assert "in k" not in details_text(app)
