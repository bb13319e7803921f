"""Start the explorer (imports textual only here)."""

from __future__ import annotations

from engine.errors import UserError


def launch(session_file: str | None = None, spec: str | None = None) -> int:
    raise UserError("the explorer is not available yet")
