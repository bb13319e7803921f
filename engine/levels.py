"""Level values: 0, 1/2, 1, 3/2, ...

A level is held as a ``Fraction``.  On input ``2.5``, ``5/2`` and ``2+1/2`` all mean
the same level; on output an integer level is an int and a half level a decimal
(``2.5``), which JSON and readers take exactly since halves are exact in binary.
"""

from __future__ import annotations

import math
import re
from fractions import Fraction

from engine.errors import UserError
from engine.numbers_in import NumberError, describe, explain_non_digits, quote, read_whole

Level = Fraction

_DECIMAL = re.compile(r"^([0-9]+)(?:\.([0-9]+))?$", re.ASCII)
_RATIO = re.compile(r"^([0-9]+)\s*/\s*([0-9]+)$", re.ASCII)
_MIXED = re.compile(r"^([0-9]+)\s*\+\s*([0-9]+)\s*/\s*([0-9]+)$", re.ASCII)
#: digits a level may have (no tower can be walked, jumped or even estimated much beyond 10^30)
MAX_LEVEL_DIGITS = 30
_ACCEPTED = "write a non-negative number such as 3, 2.5, 5/2 or 2+1/2"


class LevelError(UserError):
    """A string that does not denote a level."""


def parse_level(text: str | int | float | Fraction) -> Fraction:
    """Read ``3``, ``2.5``, ``5/2`` or ``2+1/2`` into a non-negative Fraction."""
    if isinstance(text, Fraction):
        value = text
    elif isinstance(text, bool):
        raise LevelError(f"{text!r} is not a level")
    elif isinstance(text, int):
        value = Fraction(text)
    elif isinstance(text, float):
        if not math.isfinite(text):
            raise LevelError(f"{text!r} is not a level ({_ACCEPTED})")
        value = Fraction(text)
    elif isinstance(text, str):
        value = _parse_text(text)
    else:
        raise LevelError(f"{type(text).__name__} is not a level ({_ACCEPTED})")
    if value < 0:
        raise LevelError(f"a level is never negative, got {quote(text) if isinstance(text, str) else describe(math.floor(value))} ({_ACCEPTED})")
    if value >= _TOO_DEEP:
        raise LevelError(f"level {describe(int(value))} is too deep (levels have at most {MAX_LEVEL_DIGITS} digits)")
    return value


_TOO_DEEP = 10**MAX_LEVEL_DIGITS


def _parse_text(text: str) -> Fraction:
    """The string forms, read by ``engine.numbers_in`` (ASCII digits, lengths checked first)."""
    s = text.strip()
    if len(s) > 3 * MAX_LEVEL_DIGITS + 10:
        raise LevelError(f"{quote(s)} is not a level: too long (levels have at most {MAX_LEVEL_DIGITS} digits)")

    def whole(digits: str) -> int:
        try:
            return read_whole(digits, "a level", max_digits=MAX_LEVEL_DIGITS)
        except NumberError as exc:
            raise LevelError(str(exc)) from None

    if m := _DECIMAL.match(s):
        value = Fraction(whole(m.group(1)))
        if m.group(2):
            value += Fraction(whole(m.group(2)), 10 ** len(m.group(2)))
        return value
    if m := _RATIO.match(s):
        if whole(m.group(2)) == 0:
            raise LevelError(f"level {quote(text)} divides by zero")
        return Fraction(whole(m.group(1)), whole(m.group(2)))
    if m := _MIXED.match(s):
        if whole(m.group(3)) == 0:
            raise LevelError(f"level {quote(text)} divides by zero")
        return whole(m.group(1)) + Fraction(whole(m.group(2)), whole(m.group(3)))
    raise LevelError(f"{quote(text)} is not a level ({_ACCEPTED}; {explain_non_digits(s)})")


def level_to_json(level: Fraction) -> int | float:
    """An int for integer levels, else a float (exact for halves)."""
    if level.denominator == 1:
        return int(level)
    return float(level)


def format_level(level: Fraction) -> str:
    """``3``, ``2.5``; other fractions as ``7/3``."""
    if level.denominator == 1:
        return str(level.numerator)
    if level.denominator == 2:
        return f"{level.numerator // 2}.5"
    return f"{level.numerator}/{level.denominator}"
