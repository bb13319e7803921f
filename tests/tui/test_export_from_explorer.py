"""Export from the explorer: the file holds the engine's levels 0..current in the format its
extension names (the same writers as `towerscope export`)."""

from __future__ import annotations

from pathlib import Path

from engine.diagram import Diagram
from engine.export.latex_table import to_latex_table
from engine.specs import parse_spec
from tui.explorer.screens.prompt import Prompt

from .conftest import app_on, settle


async def _export(app, pilot, name: str) -> None:  # noqa: ANN001
    await pilot.press("e")
    await settle(pilot)
    assert isinstance(app.screen, Prompt)
    field = app.screen.query_one("#prompt-input")
    field.value = name
    await pilot.press("enter")
    await settle(pilot)


async def test_export_writes_the_levels_shown(tmp_path: Path, monkeypatch) -> None:  # noqa: ANN001
    monkeypatch.chdir(tmp_path)
    app = app_on("symmetric:n=4", search_faithful=False)
    async with app.run_test(size=(100, 30)) as pilot:
        await settle(pilot)
        for _ in range(4):  # to level 2
            await pilot.press("l")
            await settle(pilot)
        await _export(app, pilot, "s4-table.tex")
    # the table of levels 0..2 as the engine writes it (S_4: V⊗V = 2(4) + 3(3,1) + (2,2) + (2,1,1))
    written = (tmp_path / "s4-table.tex").read_text()
    assert written == to_latex_table(Diagram(parse_spec("symmetric:n=4")), 4)
    assert "2\\,(4) + 3\\,(3,1) + (2,2) + (2,1,1)" in written


async def test_an_unknown_extension_is_refused_inline(tmp_path: Path, monkeypatch) -> None:  # noqa: ANN001
    monkeypatch.chdir(tmp_path)
    app = app_on("symmetric:n=3", search_faithful=False)
    async with app.run_test(size=(100, 30)) as pilot:
        await settle(pilot)
        await pilot.press("e")
        await settle(pilot)
        app.screen.query_one("#prompt-input").value = "figure.pdf"
        await pilot.press("enter")
        await settle(pilot)
        assert isinstance(app.screen, Prompt)
        assert "cannot tell the format" in str(app.screen.query_one("#prompt-error").render())
    assert list(tmp_path.iterdir()) == []
