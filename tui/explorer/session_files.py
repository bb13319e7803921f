"""Where session files live: the default folder, the demo session, checking a path as it is typed."""

from __future__ import annotations

from pathlib import Path

from engine.errors import UserError
from engine.files.session import load_session

APP_NAME = "towerscope"
DEMO_NAME = "demo.json"


def default_folder() -> Path:
    """./sessions when it exists, else the user's data folder (platformdirs), ``sessions`` inside."""
    here = Path.cwd() / "sessions"
    if here.is_dir():
        return here
    from platformdirs import user_data_dir

    return Path(user_data_dir(APP_NAME)) / "sessions"


def demo_session_path() -> Path:
    """sessions/demo.json of the source tree, or the copy installed with the package."""
    source = Path(__file__).resolve().parents[2] / "sessions" / DEMO_NAME
    if source.is_file():
        return source
    from importlib.resources import files

    return Path(str(files("tui") / "data" / DEMO_NAME))


def resolve(text: str) -> Path:
    """A typed path: ~ expanded, relative to the default folder when it has no folder part."""
    raw = Path(text.strip()).expanduser()
    if not raw.is_absolute() and raw.parent == Path("."):
        raw = default_folder() / raw
    return raw.resolve()


def check_save_path(text: str) -> tuple[str | None, str]:
    """For the save prompt: (error or None, the full path that will be written)."""
    if not text.strip():
        return "type a file name, e.g. my-session.json", ""
    path = resolve(text)
    hint = f"writes {path}"
    if path.is_dir():
        return "that is a folder; add a file name", hint
    if path.suffix.lower() != ".json":
        return "a session file name ends in .json", hint
    if path.exists():
        hint += " (replaces the file there)"
    return None, hint


def check_open_path(text: str) -> tuple[str | None, str]:
    """For the open prompt: (error or None, the full path that will be read)."""
    if not text.strip():
        return "type the path of a session file", f"folder: {default_folder()}"
    path = resolve(text)
    if not path.is_file():
        return "no such file", f"reads {path}"
    return None, f"reads {path}"


def read_session(path: Path):  # noqa: ANN201 - an ExplorerState
    """Load a session file and check it against its tower; UserError on any problem."""
    from tui.explorer.state import state_from_session

    session = load_session(path)
    try:
        return state_from_session(session, path)
    except UserError as exc:
        raise UserError(f"{path}: {exc}") from None
