"""Session files: where a reader of a tower was, what they marked and what they wrote.

Our own JSON schema, one object::

    {"format": "towerscope-session", "version": 1,
     "tower": "symmetric:n=4",
     "level": 3, "node": "(3,1)",
     "bookmarks": [{"level": 2.5, "label": "(2,1)"}],
     "notes": [{"level": 3, "label": "(3,1)", "text": "..."}],
     "view": {"details": true, "panes": 3}}

``view`` belongs to the program showing the session (the explorer's view settings): the engine
keeps it as a JSON object of plain values and neither reads nor checks its keys, so files written
by older and newer explorers stay readable.

Levels are JSON numbers as in the CLI contract (halves are exact in binary).  Reading is pure and
strict: every problem is a ``SessionError`` (a ``UserError``) whose one-line message names the
field and says what would be accepted.  Saving writes a temporary file and renames it over the old
one (``engine.files.atomic``), so a crash never leaves a half-written session.
"""

from __future__ import annotations

import json
import os
from dataclasses import dataclass, field
from fractions import Fraction
from pathlib import Path
from typing import Any

from engine.errors import UserError
from engine.files.atomic import write_text_atomic
from engine.files.toml_checks import nesting_depth
from engine.levels import LevelError, level_to_json, parse_level
from engine.numbers_in import read_whole

FORMAT = "towerscope-session"
VERSION = 1
#: refuse to read files larger than this (a session is a few kilobytes)
MAX_BYTES = 8 * 1024 * 1024


class SessionError(UserError):
    """A session file that cannot be read."""


@dataclass(frozen=True)
class Mark:
    """A node on a level: what bookmarks and notes point at."""

    level: Fraction
    label: str


@dataclass
class Session:
    tower: str
    level: Fraction = Fraction(0)
    node: str | None = None
    bookmarks: list[Mark] = field(default_factory=list)
    notes: dict[Mark, str] = field(default_factory=dict)
    #: the viewer's settings, opaque here: a JSON object of plain values (text, numbers, true/false)
    view: dict[str, Any] = field(default_factory=dict)


# ----- writing ------------------------------------------------------------------------------------
def session_to_document(session: Session) -> dict[str, Any]:
    return {
        "format": FORMAT,
        "version": VERSION,
        "tower": session.tower,
        "level": level_to_json(session.level),
        "node": session.node,
        "bookmarks": [{"level": level_to_json(m.level), "label": m.label} for m in session.bookmarks],
        "notes": [
            {"level": level_to_json(m.level), "label": m.label, "text": text}
            for m, text in session.notes.items()
            if text
        ],
        "view": dict(session.view),
    }


def session_to_json(session: Session) -> str:
    return json.dumps(session_to_document(session), ensure_ascii=False, indent=2) + "\n"


def save_session(path: str | os.PathLike[str], session: Session) -> Path:
    """Write ``session`` to ``path`` atomically; a UserError when the folder is missing or unwritable."""
    return write_text_atomic(path, session_to_json(session))


# ----- reading ------------------------------------------------------------------------------------
def load_session(path: str | os.PathLike[str]) -> Session:
    """Read and validate a session file; SessionError with a one-line message otherwise."""
    target = Path(path)
    name = str(target)
    try:
        if target.is_dir():
            raise SessionError(f"{name!r} is a folder, not a session file")
        if target.stat().st_size > MAX_BYTES:
            raise SessionError(f"{name!r} is too large for a session file (over {MAX_BYTES // 1024 // 1024} MB)")
        raw = target.read_bytes()
    except FileNotFoundError:
        raise SessionError(f"no such session file: {name!r}") from None
    except OSError as exc:
        raise SessionError(f"cannot read {name!r}: {exc.strerror or exc}") from None
    try:
        text = raw.decode("utf-8")
    except UnicodeDecodeError:
        raise SessionError(f"{name!r} is not a session file (not UTF-8 text)") from None
    try:
        return parse_session(text)
    except SessionError as exc:
        raise SessionError(f"{name}: {exc}") from None


def parse_session(text: str) -> Session:
    """A Session from the text of a session file."""
    try:
        document = json.loads(text, parse_int=_json_int)
    except RecursionError:
        raise SessionError(f"nests lists or objects too deeply (a session is at most {MAX_DEPTH} deep)") from None
    except json.JSONDecodeError as exc:
        if not text.strip():
            raise SessionError("the file is empty (expected a JSON session object)") from None
        raise SessionError(
            f"not valid JSON at line {exc.lineno}, column {exc.colno}: {exc.msg} (the file may be truncated)"
        ) from None
    if not isinstance(document, dict):
        raise SessionError(f"expected a JSON object with \"format\": \"{FORMAT}\", found {_kind(document)}")
    found_format = document.get("format")
    if found_format != FORMAT:
        shown = "no format field" if found_format is None else f"format {found_format!r}"
        raise SessionError(f"not a towerscope session ({shown}; expected \"format\": \"{FORMAT}\")")
    version = document.get("version")
    if not isinstance(version, int) or isinstance(version, bool) or version < 1:
        raise SessionError(f"field 'version' must be a whole number ≥ 1, found {version!r}")
    if version > VERSION:
        raise SessionError(f"session version {version} is newer than this program reads (up to {VERSION})")
    known = {"format", "version", "tower", "level", "node", "bookmarks", "notes", "view"}
    unknown = sorted(set(document) - known)
    if unknown:
        raise SessionError(f"unknown field {unknown[0]!r} (fields: {', '.join(sorted(known))})")
    tower = document.get("tower")
    if not isinstance(tower, str) or not tower.strip():
        raise SessionError("field 'tower' must be a tower spec such as \"symmetric:n=4\"")
    if any(ch < " " or ch == "\x7f" for ch in tower):
        raise SessionError("field 'tower' holds a control character (a NUL byte or similar); a tower spec is one line of text")
    if nesting_depth(document) > MAX_DEPTH:
        raise SessionError(f"nests lists or objects more than {MAX_DEPTH} deep")
    node = document.get("node")
    if node is not None and not isinstance(node, str):
        raise SessionError(f"field 'node' must be a node label such as \"(3,1)\" or null, found {_kind(node)}")
    session = Session(tower=tower.strip(), level=_level(document.get("level", 0), "level"), node=node)
    session.bookmarks = [_mark(item, f"bookmarks[{i}]") for i, item in enumerate(_list(document, "bookmarks"))]
    for i, item in enumerate(_list(document, "notes")):
        where = f"notes[{i}]"
        mark = _mark(item, where, extra={"text"})
        note = item.get("text")
        if not isinstance(note, str):
            raise SessionError(f"field '{where}.text' must be text")
        session.notes[mark] = note
    session.view = _view(document.get("view", {}))
    return session


#: nesting of a session document (it is 3 deep)
MAX_DEPTH = 32


def _json_int(text: str) -> int:
    """A JSON integer, its digits counted before conversion (``engine.numbers_in``)."""
    sign = -1 if text.startswith("-") else 1
    try:
        return sign * read_whole(text.lstrip("-"), "a number in the session", max_digits=40)
    except UserError as exc:
        raise SessionError(str(exc)) from None


def _kind(value: object) -> str:
    return {dict: "an object", list: "a list", str: "text", bool: "true/false", type(None): "null"}.get(
        type(value), "a number"
    )


def _level(value: object, where: str) -> Fraction:
    if isinstance(value, bool) or not isinstance(value, (int, float, str)):
        raise SessionError(f"field {where!r} must be a level such as 3 or 2.5, found {_kind(value)}")
    try:
        return parse_level(value)
    except (LevelError, ValueError, OverflowError):
        raise SessionError(f"field {where!r} must be a non-negative level such as 3 or 2.5, found {value!r}") from None


def _list(document: dict[str, Any], key: str) -> list[Any]:
    value = document.get(key, [])
    if not isinstance(value, list):
        raise SessionError(f"field {key!r} must be a list, found {_kind(value)}")
    return value


def _mark(item: object, where: str, extra: set[str] = frozenset()) -> Mark:  # type: ignore[assignment]
    if not isinstance(item, dict):
        raise SessionError(f"field {where!r} must be an object with 'level' and 'label', found {_kind(item)}")
    unknown = sorted(set(item) - {"level", "label"} - set(extra))
    if unknown:
        raise SessionError(f"field '{where}' has an unknown key {unknown[0]!r}")
    label = item.get("label")
    if not isinstance(label, str) or not label:
        raise SessionError(f"field '{where}.label' must be a node label such as \"(3,1)\"")
    if "level" not in item:
        raise SessionError(f"field '{where}.level' is missing")
    return Mark(_level(item["level"], f"{where}.level"), label)


def _view(value: object) -> dict[str, Any]:
    if not isinstance(value, dict):
        raise SessionError(f"field 'view' must be an object, found {_kind(value)}")
    for key, item in value.items():
        if item is not None and not isinstance(item, (bool, int, float, str)):
            raise SessionError(f"field 'view.{key}' must be text, a number or true/false, found {_kind(item)}")
    return dict(value)
