"""Export from the explorer: levels 0..current of the tower on screen to a file whose extension
names the format (the engine's writers; the file is written atomically, in a worker)."""

from __future__ import annotations

from pathlib import Path
from typing import TYPE_CHECKING

from engine.errors import UserError
from engine.export import FORMATS, format_for_path, render
from engine.files.atomic import write_text_atomic
from engine.levels import format_level

if TYPE_CHECKING:
    from tui.explorer.app import ExplorerApp


def export_path(text: str) -> Path:
    """A typed path: ~ expanded, relative to the folder the explorer was started in."""
    return Path(text.strip()).expanduser().resolve()


def check_export_path(text: str) -> tuple[str | None, str]:
    """For the export prompt: (error or None, what will be written where)."""
    try:
        return _check_export_path(text)
    except (OSError, ValueError) as exc:  # a name too long, a NUL byte
        return f"not a usable file name ({exc.strerror if isinstance(exc, OSError) and exc.strerror else str(exc)[:80]})", ""


def _check_export_path(text: str) -> tuple[str | None, str]:
    if not text.strip():
        return "type a file name, e.g. figure.tikz", ""
    path = export_path(text)
    try:
        fmt = format_for_path(str(path))
    except UserError as exc:
        return str(exc), f"writes {path}"
    hint = f"writes {FORMATS[fmt][1]} to {path}"
    if path.is_dir():
        return "that is a folder; add a file name", hint
    if not path.parent.is_dir():
        return f"folder {path.parent} does not exist", hint
    if path.exists():
        hint += " (replaces the file there)"
    return None, hint


def default_name(app: ExplorerApp) -> str:
    state = app.state
    family = state.tower.family or "tower"
    level = format_level(state.tower.level_of(state.index)).replace("/", "-")
    return f"{family}-to-{level}.tikz"


def ask_export(app: ExplorerApp) -> None:
    from tui.explorer.screens.prompt import Prompt

    state = app.state
    diagram, upto = state.diagram, state.index
    if upto > diagram.built:
        app.notify("this level is still being built; export when it is shown", severity="warning")
        return
    level = format_level(state.tower.level_of(upto))

    def done(text: str | None) -> None:
        if text is None:
            return
        try:
            path = export_path(text)
        except (OSError, ValueError) as exc:
            app.notify(f"not a usable file name: {str(exc)[:80]}", title="not exported", severity="error", markup=False)
            return

        def work() -> None:
            try:
                written = write_text_atomic(path, render(diagram, upto, format_for_path(str(path))))
            except (UserError, OSError, ValueError) as exc:
                app.notify(str(exc), title="not exported", severity="error", markup=False)
                return
            app.notify(f"exported levels 0..{level} to {written}", markup=False)

        app.run_worker(work, thread=True, group="export", exit_on_error=False)

    app.push_screen(
        Prompt(f"Export levels 0 to {level}", "File name or path; its extension picks the format\n(.tikz picture, .tex table, .dot, .csv, .json):", default_name(app),
               check=check_export_path),
        done,
    )
