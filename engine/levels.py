"""Level values: 0, 1/2, 1, 3/2, ...

A level is held as a ``Fraction``.  On input ``2.5``, ``5/2`` and ``2+1/2`` all mean
the same level; on output an integer level is an int and a half level a decimal
(``2.5``), which JSON and readers take exactly since halves are exact in binary.
"""

from __future__ import annotations

import re
from fractions import Fraction

from engine.errors import UserError

Level = Fraction

_DECIMAL = re.compile(r"^\d+(\.\d+)?$")
_RATIO = re.compile(r"^(\d+)\s*/\s*(\d+)$")
_MIXED = re.compile(r"^(\d+)\s*\+\s*(\d+)\s*/\s*(\d+)$")


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
        value = Fraction(text)
    else:
        s = text.strip()
        if _DECIMAL.match(s):
            value = Fraction(s)
        elif m := _RATIO.match(s):
            if int(m.group(2)) == 0:
                raise LevelError(f"level {text!r} divides by zero")
            value = Fraction(int(m.group(1)), int(m.group(2)))
        elif m := _MIXED.match(s):
            if int(m.group(3)) == 0:
                raise LevelError(f"level {text!r} divides by zero")
            value = int(m.group(1)) + Fraction(int(m.group(2)), int(m.group(3)))
        else:
            raise LevelError(
                f"{text!r} is not a level (write a non-negative number such as 3, 2.5, 5/2 or 2+1/2)"
            )
    if value < 0:
        raise LevelError(f"level {text!r} is negative")
    return value


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
