"""Session files: round trip, atomic save, and clear refusals of broken or foreign files."""

from __future__ import annotations

import json
from fractions import Fraction
from pathlib import Path

import pytest

from engine.errors import UserError
from engine.files.session import (
    FORMAT,
    Mark,
    Session,
    SessionError,
    load_session,
    parse_session,
    save_session,
    session_to_json,
)
from tui.explorer.session_files import read_session
from tui.explorer.view_settings import ViewSettings

SESSIONS = Path(__file__).resolve().parents[2] / "sessions"


def sample() -> Session:
    return Session(
        tower="symmetric:n=4",
        level=Fraction(5, 2),
        node="(2,1)",
        bookmarks=[Mark(Fraction(3), "(3,1)")],
        notes={Mark(Fraction(3), "(3,1)"): "a note with [brackets] and ⊗"},
        view=ViewSettings(details=False, panes=3).to_dict(),
    )


def test_round_trip_keeps_every_field(tmp_path: Path) -> None:
    path = save_session(tmp_path / "s.json", sample())
    assert load_session(path) == sample()
    # halves are exact JSON numbers, as in the CLI contract
    assert json.loads(path.read_text())["level"] == 2.5


def test_save_leaves_no_temporary_file(tmp_path: Path) -> None:
    target = tmp_path / "s.json"
    target.write_text("old")
    save_session(target, sample())
    assert sorted(p.name for p in tmp_path.iterdir()) == ["s.json"]


def test_save_into_missing_folder_is_a_user_error(tmp_path: Path) -> None:
    with pytest.raises(UserError, match="does not exist"):
        save_session(tmp_path / "nowhere" / "s.json", sample())


@pytest.mark.parametrize(
    ("text", "message"),
    [
        ("", "empty"),
        (session_to_json(sample())[:40], "not valid JSON at line"),
        ("[1, 2]", "expected a JSON object"),
        ('{"format": "something-else", "version": 1}', "not a towerscope session"),
        ('{"version": 1}', "no format field"),
        (f'{{"format": "{FORMAT}", "version": 99, "tower": "symmetric:n=4"}}', "newer"),
        (f'{{"format": "{FORMAT}", "version": 1}}', "'tower'"),
        (f'{{"format": "{FORMAT}", "version": 1, "tower": "symmetric:n=4", "level": -1}}', "'level'"),
        (f'{{"format": "{FORMAT}", "version": 1, "tower": "t", "bookmarks": [{{"level": 1}}]}}', "bookmarks[0].label"),
        (f'{{"format": "{FORMAT}", "version": 1, "tower": "t", "view": {{"panes": [0]}}}}', "view.panes"),
        (f'{{"format": "{FORMAT}", "version": 1, "tower": "t", "colour": "red"}}', "unknown field 'colour'"),
    ],
)
def test_broken_text_is_refused_with_a_message(text: str, message: str) -> None:
    with pytest.raises(SessionError, match=message.replace("[", r"\[").replace("]", r"\]")):
        parse_session(text)


def test_missing_and_binary_files(tmp_path: Path) -> None:
    with pytest.raises(SessionError, match="no such session file"):
        load_session(tmp_path / "absent.json")
    (tmp_path / "bin.json").write_bytes(b"\xff\xfe\x00")
    with pytest.raises(SessionError, match="not UTF-8"):
        load_session(tmp_path / "bin.json")


def test_a_stale_bookmark_is_dropped_with_a_notice(tmp_path: Path) -> None:
    bad = sample()
    bad.bookmarks = [Mark(Fraction(3), "(5)"), Mark(Fraction(3), "(3,1)")]  # (5) is not a partition of 4
    path = save_session(tmp_path / "bad.json", bad)
    state = read_session(path)
    assert state.bookmarks == [(6, (3, 1))]
    assert any("dropped a bookmark on (5) at level 3" in n for n in state.notices)
    assert state.modified  # the file still has the stale mark until saved again


def test_a_level_deeper_than_the_guard_opens_at_the_deepest_allowed(tmp_path: Path) -> None:
    deep = Session(tower="symmetric:n=40", level=Fraction(10**6), node="(40)")
    state = read_session(save_session(tmp_path / "deep.json", deep))
    state.diagram.check_size(state.index)  # allowed (the guard's estimate, no building)
    with pytest.raises(UserError):
        state.diagram.check_size(state.index + 1)
    assert state.node is None and any("deeper than the explorer builds" in n for n in state.notices)


def test_older_view_settings_still_open(tmp_path: Path) -> None:
    # files written before the view left the engine: {"details": ..., "panes": 7} (a maximum then)
    old = f'{{"format": "{FORMAT}", "version": 1, "tower": "symmetric:n=4", "view": {{"details": false, "panes": 7}}}}'
    (tmp_path / "old.json").write_text(old)
    state = read_session(tmp_path / "old.json")
    assert state.view == ViewSettings(details=False, panes=None)
    assert ViewSettings.from_dict({"pane_count": 5, "later": "kept by the engine"}).panes == 5


@pytest.mark.parametrize("path", sorted(SESSIONS.glob("*.json")), ids=lambda p: p.name)
def test_every_shipped_session_loads(path: Path) -> None:
    state = read_session(path)
    assert state.node is not None
    assert state.diagram.multiplicity(state.index, state.node) > 0


def test_the_demo_session_is_shipped() -> None:
    assert (SESSIONS / "demo.json").is_file()
