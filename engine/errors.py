"""The engine's exceptions.  Every error a user can cause derives from ``UserError`` and carries a
one-line message saying what was wrong and what would be accepted; the CLI prints it and exits 2,
the TUI shows it as a notification."""

from __future__ import annotations


#: the longest message a user sees (cli-contract.md: one line of at most 500 characters)
MAX_MESSAGE = 500


class UserError(ValueError):
    """Bad input: a spec, level, label, file or a request that is too large.

    Its text is always one line of at most MAX_MESSAGE characters: line breaks become spaces and
    an over-long message (one quoting hostile input at length) keeps its start and its end."""

    def __str__(self) -> str:
        text = " ".join(super().__str__().splitlines())
        if len(text) > MAX_MESSAGE:
            text = text[: MAX_MESSAGE - 123] + " … " + text[-120:]
        return text


class SpecError(UserError):
    """A tower spec that cannot be read."""


class LabelError(UserError):
    """A node label that is not a node of the level asked for."""


class TooLarge(UserError):
    """A request refused before starting, because its estimated size exceeds a limit."""


class Cancelled(Exception):
    """Raised inside long work when the caller's cancel token is set."""
