"""The explorer on every family at 80×24: open, step right three levels, move down, open the
path browser and close it; no crash, and the details pane shows the engine's multiplicity.

The multiplicity is checked against a fresh engine diagram (the number of paths from the root),
and against the number of paths the browser says it holds."""

from __future__ import annotations

from pathlib import Path

import pytest

from engine.diagram import Diagram
from engine.specs import families, parse_spec
from tui.explorer.screens.path_browser import PathBrowser

from .conftest import app_on, settle

ROOT = Path(__file__).resolve().parents[2]

SPECS = [f.example for f in families().values()] + [
    "alternating:n=4",  # self-conjugate (2,2)+ and (2,2)−
    "symmetric:n=3,halves=no",  # several edges between two nodes
    "mixed:n=2,word=vd",  # a word shorter than three steps: the explorer stops at its end
    "characters:file=sessions/examples/a4-points.toml",  # half levels from a file
]


@pytest.fixture(autouse=True)
def _from_the_project_folder(monkeypatch):
    monkeypatch.chdir(ROOT)  # the example specs name files relative to the project folder


def details_text(app) -> str:  # noqa: ANN001
    return str(app.screen.query_one("#details-text").render())


@pytest.mark.parametrize("spec", SPECS)
async def test_step_move_and_browse_paths(spec: str) -> None:
    tower = parse_spec(spec)
    last = 3 if tower.max_index is None else min(3, tower.max_index)
    app = app_on(spec)
    async with app.run_test(size=(80, 24)) as pilot:
        await settle(pilot)
        assert app.state.index == 0
        for _ in range(3):
            await pilot.press("right")
            await settle(pilot)
        assert app.state.index == last
        await pilot.press("down")
        await settle(pilot)
        index, node = app.state.index, app.state.node
        engine = Diagram(parse_spec(spec)).level(index)
        order = sorted(engine, key=lambda n: tower.sort_key(n, index))
        assert node == order[min(1, len(order) - 1)]  # the second node in display order, if any
        m = engine[node]
        text = details_text(app)
        assert tower.format(node) in text
        assert str(m) in text.split("multiplicity", 1)[1].split()[0]
        await pilot.press("p")
        await settle(pilot)
        browser = app.screen
        assert isinstance(browser, PathBrowser)
        assert browser.total == m
        await pilot.press("escape")
        await settle(pilot)
        assert not isinstance(app.screen, PathBrowser)
        assert (app.state.index, app.state.node) == (index, node)


@pytest.mark.parametrize("spec", [f.example for f in families().values()])
async def test_tower_form_shows_every_key_in_full_at_80x24(spec: str) -> None:
    # each key's help is the family's own text (engine/specs.py): wrapped, never cut at the border
    app = app_on(spec, search_faithful=False)
    async with app.run_test(size=(80, 24)) as pilot:
        await settle(pilot)
        await pilot.press("t")
        await settle(pilot)
        dialog = app.screen.query_one(".tower-dialog")
        inner = dialog.content_region
        labels = list(dialog.query(".key-label"))
        assert len(labels) == len(parse_spec_family(spec).keys)
        for label in labels:
            assert label.region.right <= inner.right, str(label.render())


def parse_spec_family(spec: str):  # noqa: ANN201 - a Family
    return families()[spec.split(":")[0]]
