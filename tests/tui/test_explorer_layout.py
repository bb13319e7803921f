"""The explorer's layout with Pilot: panes sized by their labels (whole labels in the current pane
at 80×24 and 160×48), side panes keeping the selection's neighbours in view, PgUp/PgDn by a page,
the pane count key, a click selecting a row, the header and the column headers, a jump at depth.

Outside values: partitions λ of 40 with λ_1 ≥ 20 label level 20 of the S_40 tower (a node of the
partition algebra tower at level k is a partition of N whose first part is at least N − k:
common practice); the branching rule removes then adds one box (common
practice), so a node's parents are the partitions one box smaller."""

from __future__ import annotations

import pytest

from tui.explorer.widgets.level_pane import LevelPane

from .conftest import app_on, settle


def current_pane(app) -> LevelPane:  # noqa: ANN001
    return next(p for p in app.screen.query(LevelPane) if p.display and p.has_class("-current"))


def visible_rows(pane: LevelPane) -> list[str]:
    return [pane.render_line(y).text for y in range(1, pane.size.height)]


def shown_nodes(pane: LevelPane) -> list:
    top = pane.scroll_offset.y
    rows = pane.rows
    return rows.nodes[top: top + pane.size.height - 1]


@pytest.mark.parametrize("size", [(80, 24), (160, 48)], ids=["80x24", "160x48"])
async def test_the_current_pane_shows_every_label_whole(size: tuple[int, int]) -> None:
    app = app_on("symmetric:n=40", search_faithful=False)
    async with app.run_test(size=size) as pilot:
        await settle(pilot)
        app.go(40)  # level 20: partitions of 40 with a first part of at least 20
        await settle(pilot)
        pane = current_pane(app)
        tower = app.state.tower
        for key in ("home", "pagedown", "pagedown", "end"):
            await pilot.press(key)
            for node, line in zip(shown_nodes(pane), visible_rows(pane)):
                assert tower.format(node) in line and "…" not in line
                assert node[0] >= 20 and sum(node) == 40
        header = pane.render_line(0).text
        assert "node" in header and " m" in header
        if size[0] >= 160:  # room for the dimension column and for side panes
            assert "dim" in header
            assert len([p for p in app.screen.query(LevelPane) if p.display]) >= 3


async def test_side_panes_scroll_to_the_neighbours_after_a_jump_to_the_end() -> None:
    app = app_on("symmetric:n=40", search_faithful=False)
    async with app.run_test(size=(160, 48)) as pilot:
        await settle(pilot)
        app.go(40)
        await settle(pilot)
        await pilot.press("end")
        await settle(pilot)
        state = app.state
        parents = dict(state.diagram.parents(state.index, state.node))
        children = dict(state.diagram.children(state.index, state.node))
        assert parents and children
        for index, wanted in ((state.index - 1, parents), (state.index + 1, children)):
            pane = next(p for p in app.screen.query(LevelPane) if p.display and p.rows and p.rows.index == index)
            in_view = set(shown_nodes(pane))
            assert set(wanted) <= in_view or len(in_view) == pane.size.height - 1 and set(wanted) & in_view
            lines = dict(zip(shown_nodes(pane), visible_rows(pane)))
            for node, edges in wanted.items():
                if node in lines:  # the edge count digit is the row's first cell
                    assert lines[node][0] == str(edges)


async def test_page_keys_move_a_page_and_a_click_selects_a_row() -> None:
    app = app_on("symmetric:n=40", search_faithful=False)
    async with app.run_test(size=(80, 24)) as pilot:
        await settle(pilot)
        app.go(40)
        await settle(pilot)
        pane = current_pane(app)
        page = pane.page()
        assert page > 10  # a page is what the pane shows, not ten rows
        await pilot.press("pagedown")
        assert app.cursor == page
        await pilot.press("pageup")
        assert app.cursor == 0
        await pilot.click(pane, offset=(3, 4))  # the header, then rows 0, 1, 2 of the level
        await settle(pilot)
        assert app.cursor == 2 and app.state.node == pane.rows.nodes[2]


async def test_more_and_fewer_panes_are_kept_in_the_session() -> None:
    app = app_on("symmetric:n=4", search_faithful=False)
    async with app.run_test(size=(160, 48)) as pilot:
        await settle(pilot)
        count = len([p for p in app.screen.query(LevelPane) if p.display])
        await pilot.press("minus")
        await settle(pilot)
        assert len([p for p in app.screen.query(LevelPane) if p.display]) == count - 2
        assert app.state.to_session().view["pane_count"] == count - 2
        assert app.state.modified


async def test_the_header_names_the_tower_and_the_file() -> None:
    # symmetric:n=6 and symmetric:n=6,module=(5,1) both title their panes "S_6": the header tells them apart
    app = app_on("symmetric:n=6,module=(5,1)", search_faithful=False)
    async with app.run_test(size=(80, 24)) as pilot:
        await settle(pilot)
        header = str(app.screen.query_one("#header").render())
        assert "symmetric:n=6,module=(5,1)" in header and "not saved yet" in header
        assert "modified" not in header
        await pilot.press("b")
        assert "● modified" in str(app.screen.query_one("#header").render())


async def test_a_deep_jump_on_an_su2_tower_builds_nothing_below() -> None:
    # level 10^6 of the binary icosahedral group on C^2: by matrix powers (engine/jumps.py); the
    # multiplicity of the trivial module is about 2^10^6/120 (the Plancherel share d²/|G| of
    # the walk's paths, from memory), so it has about 301,000 digits
    app = app_on("su2:kind=icosahedral", search_faithful=False)
    async with app.run_test(size=(80, 24)) as pilot:
        await settle(pilot)
        await pilot.press("g", *"1000000", "enter")
        await settle(pilot)
        state = app.state
        assert state.index == 1_000_000 and state.diagram.built < 10
        text = "".join(visible_rows(current_pane(app)))
        assert "e30" in text  # shortened, e.g. 1.65e301028
        m = app.shown[state.index].multiplicity[state.node]
        assert 300_000 < len(str(m)) < 302_000
        side = [p for p in app.screen.query(LevelPane) if p.display and p.rows and p.rows.index != state.index]
        assert {p.rows.index for p in side} <= {999_999, 1_000_001}
        # one pane at 80x24, so no side pane wants level 999,999; the details still name the
        # parents. On C^2 the binary icosahedral group's McKay graph is the affine E8 diagram,
        # where the trivial module is joined to the natural two-dimensional module alone (McKay
        # correspondence, common practice); level 10^6 is even, so the trivial node is on it
        await settle(pilot)
        details = str(app.screen.query_one("#details-text").render())
        assert "parents at 999999: 1" in details
        assert "a4:2×1" in details.split("parents at 999999")[1]

