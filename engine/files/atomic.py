"""Writing a file so that a crash never leaves it half-written: write a temporary file beside it,
flush and fsync it, then rename it over the target (rename is atomic on POSIX, os.replace).

- The temporary file is ``.NAME.PID.RANDOM.towerscope-tmp`` in the target's folder.  A write that
  was killed (kill -9, power loss) leaves one behind; the next write to the same folder removes
  every such file whose writing process no longer runs.
- A symlink is written through: the file it points to is replaced, the link stays.
- Only regular files are replaced: a FIFO, a device, a socket or a folder is refused in one line.
- A new file gets the mode ``0o666`` less the umask (like ``open``); a replaced file keeps its mode.
"""

from __future__ import annotations

import contextlib
import os
import re
import secrets
import stat
import threading
from pathlib import Path
from typing import IO, Iterator

from engine.errors import UserError

SUFFIX = ".towerscope-tmp"
_LEFTOVER = re.compile(r"^\..*\.(\d+)\.[0-9a-f]+" + re.escape(SUFFIX) + r"$")
_UMASK_LOCK = threading.Lock()


def _cannot_write(target: Path, exc: OSError) -> UserError:
    shown = str(target) if len(str(target)) <= 200 else f"{str(target)[:100]}… ({len(str(target)):,} characters)"
    return UserError(f"cannot write {shown!r}: {exc.strerror or exc}")


def _kind(mode: int) -> str:
    if stat.S_ISFIFO(mode):
        return "a named pipe (FIFO)"
    if stat.S_ISCHR(mode) or stat.S_ISBLK(mode):
        return "a device"
    if stat.S_ISSOCK(mode):
        return "a socket"
    if stat.S_ISDIR(mode):
        return "a folder"
    return "not a regular file"


def current_umask() -> int:
    """The process's umask (read by setting and restoring it, under a lock)."""
    with _UMASK_LOCK:
        mask = os.umask(0o022)
        os.umask(mask)
    return mask


def _process_runs(pid: int) -> bool:
    if pid == os.getpid():
        return True
    try:
        os.kill(pid, 0)
    except ProcessLookupError:
        return False
    except PermissionError:  # it runs, under another user
        return True
    except (OSError, OverflowError):
        return False
    return True


def clean_leftovers(folder: Path) -> list[Path]:
    """Remove the temporary files of killed writes in ``folder`` (their process is gone)."""
    removed: list[Path] = []
    try:
        names = os.listdir(folder)
    except OSError:
        return removed
    for name in names:
        found = _LEFTOVER.match(name)
        if found is None or _process_runs(int(found.group(1))):
            continue
        path = folder / name
        with contextlib.suppress(OSError):
            if stat.S_ISREG(os.lstat(path).st_mode):
                os.unlink(path)
                removed.append(path)
    return removed


def resolve_target(path: str | os.PathLike[str]) -> Path:
    """The regular file a write to ``path`` replaces: symlinks followed; a UserError for a missing
    folder, a folder, a FIFO, a device or a socket, a name too long or holding a NUL byte."""
    given = Path(path)
    if "\x00" in str(given):
        raise UserError("cannot write a file whose name holds a NUL byte")
    try:
        return _resolve(given)
    except OSError as exc:  # a name too long, a folder we may not search
        raise _cannot_write(given, exc) from None


def _resolve(given: Path) -> Path:
    try:
        mode: int | None = os.stat(given).st_mode  # through symlinks: /dev/stdout may be a pipe
    except FileNotFoundError:
        mode = None
    if mode is not None and not stat.S_ISREG(mode):
        raise UserError(f"cannot write {str(given)!r}: it is {_kind(mode)}; write to a regular file")
    target = Path(os.path.realpath(given)) if given.is_symlink() else given
    folder = target.parent if str(target.parent) else Path(".")
    if not folder.is_dir():
        raise UserError(f"cannot write {str(given)!r}: folder {str(folder)!r} does not exist")
    return target


def _create_temporary(temp: Path) -> int:
    """A new file only we can open (0600 until it is complete), never through a link."""
    return os.open(temp, os.O_WRONLY | os.O_CREAT | os.O_EXCL | getattr(os, "O_NOFOLLOW", 0), 0o600)


def write_text_atomic(path: str | os.PathLike[str], text: str) -> Path:
    """Write ``text`` (UTF-8) to ``path`` atomically; returns the path written (a symlink's target)."""
    return write_bytes_atomic(path, text.encode("utf-8"))


def write_bytes_atomic(path: str | os.PathLike[str], data: bytes) -> Path:
    with open_atomic(path, binary=True) as (handle, target):
        handle.write(data)
    return target


@contextlib.contextmanager
def open_atomic(path: str | os.PathLike[str], binary: bool = False) -> Iterator[tuple[IO, Path]]:
    """``with open_atomic(path) as (handle, target):`` write to ``handle`` (UTF-8 text, or bytes);
    the file appears at ``target`` (a symlink's target) only when the block ends without error.
    For writers that stream a large document instead of holding it."""
    target = resolve_target(path)
    folder = target.parent if str(target.parent) else Path(".")
    clean_leftovers(folder)
    try:
        old_mode = stat.S_IMODE(os.stat(target).st_mode)
    except OSError:
        old_mode = None
    mode = old_mode if old_mode is not None else 0o666 & ~current_umask()
    temp = folder / f".{target.name}.{os.getpid()}.{secrets.token_hex(4)}{SUFFIX}"
    try:
        fd = _create_temporary(temp)
    except OSError as exc:  # a folder we may not write in (permissions, read-only or virtual file system)
        raise _cannot_write(target, exc) from None
    try:
        opened = os.fdopen(fd, "wb") if binary else os.fdopen(fd, "w", encoding="utf-8", newline="")
        with opened as handle:
            yield handle, target
            handle.flush()
            os.fchmod(handle.fileno(), mode)
            os.fsync(handle.fileno())
        os.replace(temp, target)
    except BaseException as exc:  # leave no temporary file behind, whatever stopped the write
        with contextlib.suppress(OSError):
            os.unlink(temp)
        if isinstance(exc, OSError):
            raise _cannot_write(target, exc) from None
        raise
