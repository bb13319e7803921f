"""The path browser in a tiny test app, driven by Pilot."""

from __future__ import annotations

from textual.app import App
from textual.widgets import Input, Static

from engine.diagram import Diagram
from engine.specs import parse_spec
from tests.engine.path_towers import YoungLatticeTower
from tui.explorer.messages import PathShown
from tui.explorer.screens.path_browser import PathBrowser, show_int


class BrowserApp(App):
    def __init__(self, diagram, index, node):
        super().__init__()
        self.args = (diagram, index, node)
        self.shown: list[list] = []

    def on_mount(self) -> None:
        self.push_screen(PathBrowser(*self.args))

    def on_path_shown(self, message: PathShown) -> None:
        self.shown.append(message.path)


def drawing(app) -> str:
    return str(app.screen.query_one("#path-encoding", Static).content)


async def test_steps_jumps_and_posts_paths():
    # 3 paths to (3,1) at level 2 of S_4 (the CLI contract's example), rank 0 first
    app = BrowserApp(Diagram(parse_spec("symmetric:n=4")), 4, (3, 1))
    async with app.run_test() as pilot:
        await pilot.pause()
        assert app.shown[-1] == [(4,), (3,), (4,), (3,), (3, 1)]
        assert "(4) (3) (4) (3) (3,1)" in drawing(app)
        await pilot.press("down")
        await pilot.pause()
        assert app.screen.rank == 1 and app.shown[-1] == [(4,), (3,), (3, 1), (3,), (3, 1)]
        await pilot.press("down", "down")  # clamped at the last path
        await pilot.pause()
        assert app.screen.rank == 2
        await pilot.press("up")
        await pilot.pause()
        assert app.screen.rank == 1
        app.screen.query_one("#path-rank", Input).focus()
        await pilot.press("-", "1", "enter")
        await pilot.pause()
        assert app.screen.rank == 2
        await pilot.press("ctrl+t")  # up–down tableau
        await pilot.pause()
        assert "-1 +2 -1 +1" in drawing(app) and "┌" in drawing(app)
        await pilot.press("escape")
        await pilot.pause()
        assert not isinstance(app.screen, PathBrowser)


async def test_jump_to_a_tableau_and_a_huge_rank():
    tower = parse_spec("symmetric:n=7")
    app = BrowserApp(Diagram(tower), 60, (3, 2, 1, 1))
    async with app.run_test() as pilot:
        await pilot.pause()
        screen = app.screen
        # Σ_t S(30,t)·f^{(3,2,1,1)/(7−t)} (Stirling numbers and skew tableaux), held against path
        # counting in tests/engine/test_paths.py
        assert screen.total == tower.multiplicity(60, (3, 2, 1, 1)) > 10**20
        box = screen.query_one("#path-rank", Input)
        box.value = "10^20"
        await box.action_submit()
        await pilot.pause()
        assert screen.rank == 10**20 and len(app.shown[-1]) == 61
        await pilot.press("ctrl+t")  # the up–down tableau, drawn with box characters
        await pilot.pause()
        assert "┌" in drawing(app)
        small = BrowserApp(Diagram(YoungLatticeTower(3)), 4, (3, 1))
    async with small.run_test() as pilot:
        await pilot.pause()
        box = small.screen.query_one("#path-rank", Input)
        box.value = "1,3,4/2"
        await box.action_submit()
        await pilot.pause()
        assert small.shown[-1] == [(), (1,), (1, 1), (2, 1), (3, 1)]
        assert "│ 1 │ 3 │ 4 │" in drawing(small)  # the standard Young tableau, drawn
        box.value = "7"
        await box.action_submit()
        await pilot.pause()
        assert small.screen.rank == small.screen.find("1,3,4/2")  # a bad rank leaves the path shown
        assert any("past the last path" in n.message for n in small._notifications)


def test_show_int_never_prints_thousands_of_digits():
    assert show_int(12345) == "12345"
    assert show_int(10**5000 * 3) == "3.000000×10^5000"
    assert show_int(2**200) == "1.606938×10^60"  # 2^200 = 1.6069380442...×10^60 (common practice)
