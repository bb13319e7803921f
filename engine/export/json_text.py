"""JSON text with exact integers of any size, written fast.

``json.dumps`` turns an int into text with CPython's int-to-decimal conversion, which is quadratic
in the number of digits (about 1.6 s for 300,000 digits here, and refused past 4,300 digits unless
the caller lifts ``sys.set_int_max_str_digits``).  Here every large int is written by python-flint
(``fmpz``, subquadratic; about 0.03 s for the same number) and put in place of a placeholder, so the
text is byte for byte what ``json.dumps`` would write."""

from __future__ import annotations

import json
import os
from typing import Any

#: ints with at least this many bits are written by flint
BIG_BITS = 3000


def number_text(x: int) -> str:
    """An int as JSON writes it, large ones by flint."""
    if x.bit_length() < BIG_BITS:
        return str(x)
    from flint import fmpz

    return str(fmpz(x))


def dumps(value: Any, indent: int | None = None) -> str:
    """``json.dumps(value, ensure_ascii=False, indent=indent)`` with large ints written by flint."""
    found: list[int] = []
    token = os.urandom(8).hex()  # not secrets.token_hex: secrets loads hashlib and OpenSSL

    def swap(x: Any) -> Any:
        if type(x) is int:
            if x.bit_length() >= BIG_BITS:
                found.append(x)
                return f"{token}:{len(found) - 1}"
            return x
        if isinstance(x, dict):
            return {k: swap(v) for k, v in x.items()}
        if isinstance(x, (list, tuple)):
            return [swap(v) for v in x]
        return x

    swapped = swap(value)
    text = json.dumps(swapped, ensure_ascii=False, indent=indent)
    if not found:
        return text
    from flint import fmpz

    parts = text.split(f'"{token}:')
    out = [parts[0]]
    for part in parts[1:]:
        number, _, rest = part.partition('"')
        out.append(str(fmpz(found[int(number)])))
        out.append(rest)
    return "".join(out)
