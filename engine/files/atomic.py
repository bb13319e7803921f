"""Writing a file so that a crash never leaves it half-written: write a temporary file beside it,
flush and fsync it, then rename it over the target (rename is atomic on POSIX, os.replace)."""

from __future__ import annotations

import contextlib
import os
import tempfile
from pathlib import Path

from engine.errors import UserError


def _cannot_write(target: Path, exc: OSError) -> UserError:
    return UserError(f"cannot write {str(target)!r}: {exc.strerror or exc}")


def write_text_atomic(path: str | os.PathLike[str], text: str) -> Path:
    target = Path(path)
    folder = target.parent if str(target.parent) else Path(".")
    if not folder.is_dir():
        raise UserError(f"cannot write {str(target)!r}: folder {str(folder)!r} does not exist")
    if target.is_dir():
        raise UserError(f"cannot write {str(target)!r}: it is a folder")
    try:
        fd, temp = tempfile.mkstemp(prefix=f".{target.name}.", suffix=".tmp", dir=folder)
    except OSError as exc:  # a folder we may not write in (permissions, read-only or virtual file system)
        raise _cannot_write(target, exc) from exc
    try:
        with os.fdopen(fd, "w", encoding="utf-8", newline="") as handle:
            handle.write(text)
            handle.flush()
            os.fsync(handle.fileno())
        os.replace(temp, target)
    except BaseException as exc:  # leave no temporary file behind, whatever stopped the write
        with contextlib.suppress(OSError):
            os.unlink(temp)
        if isinstance(exc, OSError):
            raise _cannot_write(target, exc) from exc
        raise
    return target
