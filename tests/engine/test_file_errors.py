"""Files that cannot be read or written give a UserError with one line, never a traceback."""

import pytest

from engine.errors import UserError
from engine.files import atomic
from engine.files.atomic import write_text_atomic
from engine.files.toml_checks import load_toml
from engine.specs import parse_spec


def test_a_toml_path_that_is_not_utf8_is_a_user_error(tmp_path):
    # TOML files are UTF-8 (TOML 1.0 specification); 0xff never starts a UTF-8 sequence
    bad = tmp_path / "table.toml"
    bad.write_bytes(b"\xff\xfe format = 1\n")
    with pytest.raises(UserError, match="not UTF-8") as info:
        load_toml(bad)
    assert "\n" not in str(info.value)
    for family in ("graph", "characters"):
        with pytest.raises(UserError, match="not UTF-8"):
            parse_spec(f"{family}:file={bad}")


def test_a_folder_that_refuses_the_temporary_file_is_a_user_error(tmp_path, monkeypatch):
    # a read-only or virtual folder refuses the temporary file (we run as root here, so simulate it)
    def refuse(*args, **kwargs):
        raise PermissionError(13, "Permission denied")

    monkeypatch.setattr(atomic, "_create_temporary", refuse)
    with pytest.raises(UserError, match="cannot write .*Permission denied"):
        write_text_atomic(tmp_path / "out.dot", "digraph {}\n")
    assert list(tmp_path.iterdir()) == []
