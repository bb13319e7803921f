"""The McKay graph drawn in the growth view (w, then 3) at 80×24 and 160×48, and the list where the
picture does not fit.  Outside values: affine E8 for the binary icosahedral group on C^2 (from
memory; McKay 1980); S_7 has 15 irreducibles (OEIS A000041: p(7) = 15)."""

from __future__ import annotations

from textual.widgets import Static

from tui.explorer.screens.growth import GrowthScreen

from .conftest import app_on, settle


def graph_text(app) -> str:  # noqa: ANN001
    return str(app.screen.query_one("#growth-graph-text", Static).render())


async def _open_graph(pilot) -> None:  # noqa: ANN001
    await settle(pilot)
    await pilot.press("w")
    await settle(pilot)
    await pilot.press("3")
    await settle(pilot)


async def test_affine_e8_drawn_at_80x24() -> None:
    app = app_on("su2:kind=icosahedral")
    async with app.run_test(size=(80, 24)) as pilot:
        await _open_graph(pilot)
        assert isinstance(app.screen, GrowthScreen) and app.screen.picture_drawn
        drawn = graph_text(app)
        lines = drawn.splitlines()
        assert max(len(line) for line in lines) <= 80
        for name in ("trivial:1 d1", "a4:2 d2", "a3:3 d3", "a2:4 d4", "a1:5 d5", "o:6 d6", "b1:4 d4",
                     "b2:2 d2", "c1:3 d3"):
            assert name in drawn
        assert "┴" in drawn and "◆ root" in drawn


async def test_s7_list_at_80x24_picture_at_160x48() -> None:
    app = app_on("characters:group=symmetric(7),module=(6,1)")
    async with app.run_test(size=(80, 24)) as pilot:
        await _open_graph(pilot)
        assert not app.screen.picture_drawn
        assert "no picture here" in graph_text(app) and "(3,2,1,1)" in graph_text(app)
        await pilot.resize_terminal(160, 48)
        await settle(pilot)
        assert app.screen.picture_drawn
        drawn = graph_text(app)
        assert sum(f" d{d}" in drawn for d in (1, 6, 14, 15, 35, 20, 21)) == 7
        assert "(4,2,1) d35 ↺2" in drawn  # two loops: (4,2,1) has three corners (hand computation)
        await pilot.resize_terminal(80, 24)
        await settle(pilot)
        assert not app.screen.picture_drawn


async def test_half_level_tower_draws_its_whole_step() -> None:
    # symmetric:n=4: restrict then induce is tensoring with C^4 (common practice); 5 partitions of 4
    app = app_on("symmetric:n=4")
    async with app.run_test(size=(80, 24)) as pilot:
        await _open_graph(pilot)
        assert app.screen.picture_drawn
        drawn = graph_text(app)
        assert all(p in drawn for p in ("(4) d1", "(3,1) d3 ↺2", "(2,2) d2", "(2,1,1) d3", "(1,1,1,1) d1"))


async def test_s8_picture_at_160x48() -> None:
    # S_8 has 22 irreducibles (OEIS A000041: p(8) = 22); each drawn once with its dimension
    app = app_on("characters:group=symmetric(8),module=(7,1)")
    async with app.run_test(size=(160, 48)) as pilot:
        await _open_graph(pilot)
        assert app.screen.picture_drawn
        drawn = graph_text(app)
        assert "(4,2,1,1) d90" in drawn and "(1,1,1,1,1,1,1,1) d1" in drawn
        assert max(len(line) for line in drawn.splitlines()) <= 160


async def test_growth_view_shows_the_half_level_closed_form() -> None:
    # hand computation (S_3 at level k+1/2: bases fix + 1 = 4, 2, 1; χ_(2,1) = 2, 0, −1 on 1, 3, 2 elements)
    app = app_on("symmetric:n=4")
    async with app.run_test(size=(80, 24)) as pilot:
        await settle(pilot)
        app.state.node = app.state.tower.parse("(2,1)", 3)  # the selection: (2,1) at level 3/2
        await pilot.press("w")
        await settle(pilot)
        title = str(app.screen.query_one("#growth-title", Static).render())
        assert "m(k+1/2) = (1/3)·4^k − (1/3)·1^k" in title


async def test_graph_key_before_the_documents_and_without_steps() -> None:
    # the graph needs no walk: asked for at once it is drawn; a family without finite steps says so
    app = app_on("su2:kind=tetrahedral")
    async with app.run_test(size=(80, 24)) as pilot:
        await settle(pilot)
        await pilot.press("w", "3")
        await settle(pilot)
        assert app.screen.picture_drawn and "o:3 d3" in graph_text(app)
    app = app_on("general-linear:n=3")
    async with app.run_test(size=(80, 24)) as pilot:
        await settle(pilot)
        await pilot.press("w", "3")
        await settle(pilot)
        assert "no finite step matrix" in str(app.screen.query_one("#growth-title", Static).render())
