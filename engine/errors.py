"""The engine's exceptions.  Every error a user can cause derives from ``UserError`` and carries a
one-line message saying what was wrong and what would be accepted; the CLI prints it and exits 2,
the TUI shows it as a notification."""

from __future__ import annotations


class UserError(ValueError):
    """Bad input: a spec, level, label, file or a request that is too large."""


class SpecError(UserError):
    """A tower spec that cannot be read."""


class LabelError(UserError):
    """A node label that is not a node of the level asked for."""


class TooLarge(UserError):
    """A request refused before starting, because its estimated size exceeds a limit."""


class Cancelled(Exception):
    """Raised inside long work when the caller's cancel token is set."""
