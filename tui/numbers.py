"""How numbers are shown: short in the level panes, exact (and wrapped) in the details pane.

Presentation only.  Python 3.11 refuses ``str()`` of ints beyond 4,300 digits unless the limit is
lifted (the app lifts it at start); these helpers also avoid writing out enormous numbers at all.
"""

from __future__ import annotations

import math

#: beyond this many digits the details pane shows the number's head and tail only
EXACT_DIGITS_SHOWN = 3000


#: beyond this many bits, powers of ten and divisions go through python-flint (GMP): Python's
#: own are quadratic, and a level reached by a jump has numbers of hundreds of thousands of digits
_FLINT_BITS = 20_000


#: the python-flint copies of the last huge numbers shown (each pane line, the details and the
#: sums ask for the same few numbers again at every repaint); keyed by identity, the number kept
_BIG_CACHE: dict[int, tuple[int, object]] = {}
_BIG_CACHE_SIZE = 64
_DIGITS_CACHE: dict[int, tuple[int, int]] = {}


def _big(n: int):  # noqa: ANN202 - an int or a flint fmpz
    if n.bit_length() > _FLINT_BITS:
        found = _BIG_CACHE.get(id(n))
        if found is not None and found[0] is n:
            return found[1]
        import flint

        big = flint.fmpz(n)
        if len(_BIG_CACHE) >= _BIG_CACHE_SIZE:
            _BIG_CACHE.pop(next(iter(_BIG_CACHE)))
        _BIG_CACHE[id(n)] = (n, big)
        return big
    return n


def digit_count(n: int) -> int:
    """Number of decimal digits of |n| (1 for 0), without converting huge ints to text."""
    n = abs(n)
    if n < 10**18:
        return len(str(n))
    found = _DIGITS_CACHE.get(id(n))
    if found is not None and found[0] is n:
        return found[1]
    guess = int(n.bit_length() * math.log10(2))  # floor(log10 n) or one above it
    big = _big(n)
    digits = guess if big < big.__class__(10) ** guess else guess + 1
    if n.bit_length() > _FLINT_BITS:
        if len(_DIGITS_CACHE) >= _BIG_CACHE_SIZE:
            _DIGITS_CACHE.pop(next(iter(_DIGITS_CACHE)))
        _DIGITS_CACHE[id(n)] = (n, digits)
    return digits


def short_int(n: int, width: int = 8) -> str:
    """``n`` in at most ``width`` cells: exact when it fits, else ``3.18e41``."""
    if n < 0:
        return "-" + short_int(-n, max(width - 1, 5))
    if n < 10**width:
        return str(n)
    digits = digit_count(n)
    exponent = digits - 1
    tail = f"e{exponent}"
    mantissa_digits = max(1, width - len(tail) - 1)  # digits of the mantissa, one before the point
    big = _big(n)
    head = big // big.__class__(10) ** (digits - mantissa_digits)
    text = str(head)
    if len(text) > 1:
        text = text[0] + "." + text[1:]
    return text + tail


def exact_int(n: int) -> str:
    """All digits of ``n`` with thin grouping by threes; very long numbers show head … tail."""
    digits = digit_count(n)
    if digits > EXACT_DIGITS_SHOWN:
        big = _big(n)
        head = big // big.__class__(10) ** (digits - 60)
        tail = int(big % 10**60)
        return f"{head}…{tail:060d} ({digits:,} digits)"
    return f"{n:,}".replace(",", " ") if digits <= 30 else str(n)


def full_digits(n: int) -> str:
    """Every digit of ``n`` (python-flint for huge numbers: Python's int-to-text is quadratic)."""
    return str(_big(n))


def wrap_text(text: str, width: int) -> list[str]:
    """Cut a long unbroken string (an exact number) into lines of ``width`` cells."""
    width = max(width, 1)
    return [text[i : i + width] for i in range(0, len(text), width)] or [""]
