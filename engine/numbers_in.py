"""The one reading of whole numbers typed by a user or found in a file, for every parser.

Rules (shared by spec keys, levels, partitions, ranks, table entries and file fields):

- only the ASCII digits ``0-9`` are digits: ``²``, ``₃``, ``①`` or ``٣`` are refused by name,
  although ``str.isdigit`` accepts some of them (and ``int`` takes some it rejects);
- the length of a digit string is checked before it is converted (converting a string of n
  digits costs about n² steps in CPython);
- a power ``a^b`` (or ``a**b``, ``aEb``) is bounded by the digits of its value, estimated from
  ``b·log10(a)`` before it is computed;
- a number too long to show is quoted by its length, never by its digits.

Every refusal is an ``engine.errors.UserError`` whose one-line message names the field.
"""

from __future__ import annotations

import math
import re

from engine.errors import UserError

#: digits a typed or stored whole number may have unless the caller says otherwise
MAX_DIGITS = 1000
#: longest piece of hostile text quoted in a message
MAX_QUOTE = 60

_ASCII_DIGITS = re.compile(r"[0-9]+")
_LOG10_2 = math.log10(2)


class NumberError(UserError):
    """Text that is not a whole number within the limits."""


def is_digits(text: str) -> bool:
    """True for a non-empty string of ASCII digits only (unlike ``str.isdigit``)."""
    return _ASCII_DIGITS.fullmatch(text) is not None


def quote(text: str, limit: int = MAX_QUOTE) -> str:
    """``repr`` of short text; long text as ``'1234…' (200,000 characters)``."""
    if len(text) <= limit:
        return repr(text)
    return f"{text[:limit // 2]!r}… ({len(text):,} characters)"


def digit_count(value: int) -> int:
    """Decimal digits of |value| (at least 1), without converting it to text: from its bit length,
    corrected by one comparison with a power of ten when the estimate is on a boundary."""
    value = abs(value)
    if value < 10:
        return 1
    if value.bit_length() <= 60:
        return len(str(value))
    estimate = int((value.bit_length() - 1) * _LOG10_2) + 1  # digits of 2^(bits-1), a lower bound
    return estimate if value < 10**estimate else estimate + 1


def describe(value: int, limit: int = 30) -> str:
    """The number itself when short, else ``a 309-digit number`` (never formats a huge int)."""
    if abs(value).bit_length() <= limit * 3:
        text = str(value)
        if len(text) <= limit:
            return text
    return f"a {digit_count(value):,}-digit number"


def _non_ascii_digit(text: str) -> str | None:
    for ch in text:
        if ch not in "0123456789" and (ch.isdigit() or ch.isnumeric()):
            return ch
    return None


def explain_non_digits(text: str) -> str:
    """A short reason why ``text`` is not a whole number (names a non-ASCII digit when there is one)."""
    odd = _non_ascii_digit(text)
    if odd is not None:
        return f"{odd!r} is not one of the digits 0-9"
    return "write the digits 0-9 only"


def read_whole(text: str, what: str, *, max_digits: int = MAX_DIGITS) -> int:
    """A whole number ≥ 0 written in ASCII digits (``_`` between digits allowed), at most
    ``max_digits`` long; a NumberError naming ``what`` otherwise."""
    if not isinstance(text, str):
        raise NumberError(f"{what} must be a whole number, got {type(text).__name__}")
    body = text.strip()
    if "_" in body and not body.startswith("_") and not body.endswith("_") and "__" not in body:
        body = body.replace("_", "")
    if not is_digits(body):
        raise NumberError(f"{what} must be a whole number, got {quote(text.strip())} ({explain_non_digits(body)})")
    return _convert(body, what, max_digits)


def _convert(digits: str, what: str, max_digits: int) -> int:
    stripped = digits.lstrip("0") or "0"
    if len(stripped) > max_digits:
        raise NumberError(f"{what} has {len(stripped):,} digits, more than the {max_digits:,} accepted")
    return int(stripped)


def power_digits(base: int, exponent: int) -> int:
    """An upper estimate of the decimal digits of base**exponent (base, exponent ≥ 0)."""
    if base <= 1 or exponent == 0:
        return 1
    return int(exponent * math.log10(base)) + 1


def checked_power(base: int, exponent: int, what: str, *, max_digits: int = MAX_DIGITS) -> int:
    """base**exponent, refused before it is computed when it would have more than ``max_digits``."""
    digits = power_digits(base, exponent)
    if digits > max_digits:
        raise NumberError(
            f"{what} would have about {digits:,} digits, more than the {max_digits:,} accepted"
        )
    return base**exponent


_POWER = re.compile(r"(?:([0-9]+)\*)?([0-9]+)(?:\^|\*\*)([0-9]+)", re.ASCII)
_SCIENTIFIC = re.compile(r"([0-9]+)[eE]([0-9]+)", re.ASCII)
#: digits of an exponent itself (an exponent of more digits is refused without reading it)
_EXPONENT_DIGITS = 12


def read_big(text: str, what: str, *, max_digits: int = MAX_DIGITS) -> int:
    """A whole number written as digits, ``1_000_000``, ``10^12``, ``3*10^12``, ``10**12`` or
    ``1e12``; powers are bounded by their digits before they are computed."""
    if not isinstance(text, str):
        raise NumberError(f"{what} must be a whole number, got {type(text).__name__}")
    body = text.strip().replace(" ", "")
    if "_" in body:
        body = body.replace("_", "")
    if is_digits(body):
        return _convert(body, what, max_digits)
    m = _POWER.fullmatch(body)
    if m:
        factor = _convert(m.group(1), what, max_digits) if m.group(1) else 1
        base = _convert(m.group(2), what, max_digits)
        exponent = _exponent(m.group(3), what, max_digits)
        value = checked_power(base, exponent, what, max_digits=max_digits)
        return _bounded(factor * value, what, max_digits)
    m = _SCIENTIFIC.fullmatch(body)
    if m:
        mantissa = _convert(m.group(1), what, max_digits)
        exponent = _exponent(m.group(2), what, max_digits)
        value = checked_power(10, exponent, what, max_digits=max_digits)
        return _bounded(mantissa * value, what, max_digits)
    raise NumberError(
        f"{what} must be a whole number such as 42, 1_000_000, 10^12, 3*10^12 or 1e12, "
        f"got {quote(text.strip())} ({explain_non_digits(body)})"
    )


def _exponent(digits: str, what: str, max_digits: int) -> int:
    stripped = digits.lstrip("0") or "0"
    if len(stripped) > _EXPONENT_DIGITS:
        raise NumberError(
            f"{what} has an exponent of {len(stripped):,} digits: its value would have far more "
            f"than the {max_digits:,} digits accepted"
        )
    return int(stripped)


def _bounded(value: int, what: str, max_digits: int) -> int:
    if value and digit_count(value) > max_digits:
        raise NumberError(f"{what} has {digit_count(value):,} digits, more than the {max_digits:,} accepted")
    return value
