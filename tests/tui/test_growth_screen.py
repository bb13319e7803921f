"""The finite-tower view (key w) at 80×24, and the deep jump of g on an su2 tower.

Outside values: the binary icosahedral group has order 120 and its McKay graph on C^2 is affine E8,
bipartite (from memory; McKay 1980), so o:6 grows like 2·6·2^k/120 = (1/10)·2^k on odd k; the
octahedral walk is periodic (period 2, common practice)."""

from __future__ import annotations

from textual_plotext import PlotextPlot

from tui.explorer.screens.growth import GrowthScreen

from .conftest import app_on, settle


def text(app, widget_id: str) -> str:  # noqa: ANN001
    return str(app.screen.query_one(widget_id).render())


async def test_growth_walk_and_graph_at_80x24() -> None:
    app = app_on("su2:kind=icosahedral")
    async with app.run_test(size=(80, 24)) as pilot:
        await settle(pilot)
        await pilot.press("w")
        await settle(pilot)
        screen = app.screen
        assert isinstance(screen, GrowthScreen)
        assert screen.growth is not None and screen.growth["period"] == 2
        assert screen.query_one("#growth-plot", PlotextPlot).display
        assert "m/leading term" in text(app, "#growth-title")
        await pilot.press("2")
        assert "periodic (period 2)" in text(app, "#growth-title")
        await pilot.press("3")
        graph = text(app, "#growth-graph-text")
        assert "o:6 d6" in graph and "┴" in graph and "9 nodes" in text(app, "#growth-title")
        assert screen.picture_drawn
        await pilot.press("escape")
        assert not isinstance(app.screen, GrowthScreen)


async def test_growth_of_a_selected_node_and_a_family_without_steps() -> None:
    app = app_on("characters:group=symmetric(4),module=(3,1)")
    async with app.run_test(size=(80, 24)) as pilot:
        await settle(pilot)
        await pilot.press("w")
        await settle(pilot)
        assert app.screen.growth["label"] == "(4)" and app.screen.growth["period"] == 1
        await pilot.press("2")
        assert "Plancherel" in text(app, "#growth-title") and "mixing time" in text(app, "#growth-title")
    app = app_on("general-linear:n=3")
    async with app.run_test(size=(80, 24)) as pilot:
        await settle(pilot)
        await pilot.press("w")
        await settle(pilot)
        assert "no finite step matrix" in text(app, "#growth-title")


async def test_g_jumps_to_level_one_million_on_su2() -> None:
    app = app_on("su2:kind=icosahedral")
    async with app.run_test(size=(80, 24)) as pilot:
        await settle(pilot)
        await pilot.press("g")
        await pilot.press(*"1000000", "enter")
        await settle(pilot)
        assert app.state.index == 1000000
        level = app.state.diagram.level_at(1000000)
        assert len(level) == 5  # even levels of the bipartite graph: the 5 nodes of one side
        assert app.state.diagram.built < 1000


async def test_the_plots_come_before_the_closed_form(monkeypatch) -> None:
    # the closed form's text may load sympy (seconds): the plots must not wait for it.  The closed
    # form is held back here until the plot is on the screen.  D_5 on r_1 (dimension 2): the
    # trivial module's count grows like 2·1·2^k/10 = (1/10)·2^k (the growth rule above, from memory)
    import threading

    from tui.explorer.screens import growth

    release, real = threading.Event(), growth._closed_form

    def held(tower, label):  # noqa: ANN001
        assert release.wait(30)
        return real(tower, label)

    monkeypatch.setattr(growth, "_closed_form", held)
    app = app_on("characters:group=dihedral(5),module=r1")
    async with app.run_test(size=(80, 24)) as pilot:
        await settle(pilot)
        await pilot.press("w")
        for _ in range(50):
            await pilot.pause(0.05)
            if isinstance(app.screen, GrowthScreen) and app.screen.growth is not None:
                break
        screen = app.screen
        assert screen.growth is not None and screen.query_one("#growth-plot", PlotextPlot).display
        assert "closed form: working it out…" in text(app, "#growth-title")
        release.set()
        await settle(pilot)
        assert screen.closed_form is not None and "(1/10)·2^k" in screen.closed_form
        assert screen.closed_form in text(app, "#growth-title")
