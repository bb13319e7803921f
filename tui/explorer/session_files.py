"""Where the explorer's files live: session files (the default folder, the demo, checking and
completing a typed path, listing a folder's sessions), the autosave and the user's settings.

The user data folder is platformdirs' ``user_data_dir("towerscope")``, or ``$TOWERSCOPE_DATA``
when set (tests and trials use a folder of their own).
"""

from __future__ import annotations

import json
import os
from pathlib import Path
from typing import Any

from engine.errors import UserError
from engine.files.atomic import write_text_atomic
from engine.files.session import load_session, parse_session, session_to_json

APP_NAME = "towerscope"
DEMO_NAME = "demo.json"
AUTOSAVE_NAME = "autosave.json"
SETTINGS_NAME = "settings.json"
#: most session files the open dialog lists
MOST_LISTED = 200


def user_folder() -> Path:
    """The user's data folder for towerscope (not created here)."""
    override = os.environ.get("TOWERSCOPE_DATA")
    if override:
        return Path(override).expanduser()
    from platformdirs import user_data_dir

    return Path(user_data_dir(APP_NAME))


def default_folder() -> Path:
    """./sessions when it exists, else ``sessions`` in the user's data folder."""
    here = Path.cwd() / "sessions"
    if here.is_dir():
        return here
    return user_folder() / "sessions"


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
    try:
        return _check_save_path(text)
    except (OSError, ValueError) as exc:  # a name too long, a NUL byte, a folder we may not read
        return f"not a usable file name ({_why(exc)})", ""


def check_open_path(text: str) -> tuple[str | None, str]:
    """For the open prompt: (error or None, the full path that will be read)."""
    try:
        return _check_open_path(text)
    except (OSError, ValueError) as exc:
        return f"not a usable file name ({_why(exc)})", ""


def _why(exc: Exception) -> str:
    return exc.strerror if isinstance(exc, OSError) and exc.strerror else str(exc)[:80]


def _check_save_path(text: str) -> tuple[str | None, str]:
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


def _check_open_path(text: str) -> tuple[str | None, str]:
    if not text.strip():
        return "", f"folder: {default_folder()}"
    path = resolve(text)
    if not path.is_file():
        return "no such file", f"reads {path}"
    return None, f"reads {path}"


def session_files(folder: Path) -> list[Path]:
    """The ``.json`` files of a folder, newest first (at most MOST_LISTED); [] if it cannot be read."""
    try:
        found = [p for p in folder.iterdir() if p.suffix.lower() == ".json" and p.is_file()]
    except OSError:
        return []
    found.sort(key=lambda p: (-p.stat().st_mtime, p.name))
    return found[:MOST_LISTED]


def complete_path(text: str) -> str:
    """``text`` extended by the longest common start of the names it can begin (folders end in /),
    relative to the default folder when it has no folder part; unchanged when nothing matches."""
    raw = text.strip()
    typed = Path(raw).expanduser()
    if raw.endswith("/"):
        folder, start = typed, ""
    else:
        folder, start = typed.parent, typed.name
    if folder.is_absolute():
        base = folder
    elif str(folder) == ".":
        base = default_folder()
    else:
        base = Path.cwd() / folder
    try:
        names = sorted(p.name + ("/" if p.is_dir() else "") for p in base.iterdir() if p.name.startswith(start))
    except (OSError, ValueError):
        return text
    names = [n for n in names if not n.startswith(".") or start.startswith(".")]
    if not names:
        return text
    common = os.path.commonprefix(names)
    return raw + common[len(start):]


def read_session(path: Path):  # noqa: ANN201 - an ExplorerState
    """Load a session file and make the state; UserError when it cannot be read or names no tower."""
    from tui.explorer.state import state_from_session

    session = load_session(path)
    try:
        return state_from_session(session, path)
    except UserError as exc:
        raise UserError(f"{path}: {exc}") from None


# ----- the autosave ---------------------------------------------------------------------------------
def autosave_path() -> Path:
    return user_folder() / AUTOSAVE_NAME


def write_autosave(session_text: str, saved_to: Path | None) -> Path:
    """Write the autosave atomically: the session and the file it belongs to (if any)."""
    folder = user_folder()
    folder.mkdir(parents=True, exist_ok=True)
    document = {"file": None if saved_to is None else str(saved_to), "session": json.loads(session_text)}
    return write_text_atomic(folder / AUTOSAVE_NAME, json.dumps(document, ensure_ascii=False, indent=1) + "\n")


def drop_autosave() -> None:
    try:
        autosave_path().unlink()
    except OSError:
        pass


def read_autosave():  # noqa: ANN201 - (ExplorerState, the file it belongs to) or None
    """The session left by a run that did not end cleanly, or None (a broken autosave is removed)."""
    path = autosave_path()
    if not path.is_file():
        return None
    try:
        document = json.loads(path.read_text(encoding="utf-8"))
        from tui.explorer.state import state_from_session

        state = state_from_session(parse_session(json.dumps(document["session"])))
        file = document.get("file")
        state.path = Path(file) if isinstance(file, str) else None
        state.modified = True
        return state
    except (OSError, ValueError, KeyError, TypeError, UserError):
        drop_autosave()
        return None


# ----- the user's settings (the theme) ----------------------------------------------------------------
def read_settings() -> dict[str, Any]:
    try:
        found = json.loads((user_folder() / SETTINGS_NAME).read_text(encoding="utf-8"))
    except (OSError, ValueError):
        return {}
    return found if isinstance(found, dict) else {}


def write_settings(settings: dict[str, Any]) -> None:
    """Keep the settings; a folder that cannot be written is not worth a message."""
    try:
        folder = user_folder()
        folder.mkdir(parents=True, exist_ok=True)
        write_text_atomic(folder / SETTINGS_NAME, json.dumps(settings, indent=1) + "\n")
    except (OSError, UserError):
        pass


def session_text(state) -> str:  # noqa: ANN001 - an ExplorerState
    return session_to_json(state.to_session())
