"""Atomic writes: leftovers of killed writes cleaned, symlinks written through, special files
refused, modes kept or taken from the umask.  Expected behaviour: POSIX rename and open(2)
semantics (common practice)."""

from __future__ import annotations

import os
import stat
import subprocess
import sys

import pytest

from engine.errors import UserError
from engine.files import atomic
from engine.files.atomic import SUFFIX, write_text_atomic


def _dead_pid() -> int:
    # a process that has ended: its pid is free (common practice: a reaped child's pid)
    child = subprocess.Popen([sys.executable, "-c", "pass"])
    child.wait()
    return child.pid


def test_a_killed_writes_temporary_file_is_removed_by_the_next_write(tmp_path):
    leftover = tmp_path / f".out.dot.{_dead_pid()}.0badc0de{SUFFIX}"
    leftover.write_text("half a file")
    ours = tmp_path / f".other.dot.{os.getpid()}.12345678{SUFFIX}"  # a write in progress: kept
    ours.write_text("in progress")
    unrelated = tmp_path / ".notes.txt.tmp"  # not ours: kept
    unrelated.write_text("x")
    write_text_atomic(tmp_path / "elsewhere.dot", "digraph {}\n")
    assert not leftover.exists()
    assert ours.exists() and unrelated.exists()


def test_a_write_leaves_no_temporary_file(tmp_path):
    write_text_atomic(tmp_path / "a.txt", "one\n")
    write_text_atomic(tmp_path / "a.txt", "two\n")
    assert sorted(p.name for p in tmp_path.iterdir()) == ["a.txt"]
    assert (tmp_path / "a.txt").read_text() == "two\n"


def test_a_symlink_is_written_through_and_stays_a_link(tmp_path):
    real = tmp_path / "real.dot"
    real.write_text("old\n")
    link = tmp_path / "link.dot"
    link.symlink_to(real)
    written = write_text_atomic(link, "new\n")
    assert link.is_symlink()
    assert real.read_text() == "new\n"
    assert written == real


def test_a_dangling_symlink_creates_its_target(tmp_path):
    link = tmp_path / "link.dot"
    link.symlink_to(tmp_path / "made.dot")
    write_text_atomic(link, "x\n")
    assert link.is_symlink() and (tmp_path / "made.dot").read_text() == "x\n"


def test_a_fifo_or_a_device_is_refused_in_one_line(tmp_path):
    fifo = tmp_path / "pipe"
    os.mkfifo(fifo)
    with pytest.raises(UserError, match="named pipe") as info:
        write_text_atomic(fifo, "x")
    assert "\n" not in str(info.value)
    assert stat.S_ISFIFO(os.lstat(fifo).st_mode)
    with pytest.raises(UserError, match="device"):
        write_text_atomic("/dev/null", "x")
    assert stat.S_ISCHR(os.stat("/dev/null").st_mode)
    with pytest.raises(UserError, match="folder"):
        write_text_atomic(tmp_path, "x")


def test_a_new_file_follows_the_umask_and_a_replaced_file_keeps_its_mode(tmp_path):
    # open(2) creates files with 0666 & ~umask (POSIX; common practice)
    old = os.umask(0o027)
    try:
        write_text_atomic(tmp_path / "new.txt", "x")
    finally:
        os.umask(old)
    assert stat.S_IMODE(os.stat(tmp_path / "new.txt").st_mode) == 0o640
    kept = tmp_path / "kept.txt"
    kept.write_text("x")
    os.chmod(kept, 0o604)
    write_text_atomic(kept, "y")
    assert stat.S_IMODE(os.stat(kept).st_mode) == 0o604


def test_the_umask_is_unchanged_after_reading_it():
    old = os.umask(0o077)
    try:
        assert atomic.current_umask() == 0o077
        assert atomic.current_umask() == 0o077
    finally:
        os.umask(old)
