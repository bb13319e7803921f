"""Small helpers shared by the readers of our TOML formats: load, check the header, and fetch keys
with messages that name the key and say what would be accepted."""

from __future__ import annotations

import re
import tomllib
from pathlib import Path
from typing import Any

from engine.errors import UserError

#: our TOML files are tables of a few hundred rows: refuse larger ones before reading them
MAX_BYTES = 16 * 1024 * 1024
#: nesting of arrays and tables (a matrix is 2 deep, a file 4 or 5)
MAX_DEPTH = 32
#: digits of one number in a file (TOML integers are read by int(), n² steps for n digits)
MAX_NUMBER_DIGITS = 1000
_LONG_DIGITS = re.compile(r"[0-9_]{%d,}" % (MAX_NUMBER_DIGITS + 1), re.ASCII)


class FileFormatError(UserError):
    """A file that does not follow its format."""


def load_toml(path: str | Path) -> dict[str, Any]:
    """The TOML document of a file, refused in one line when it is too large, nests deeper than
    MAX_DEPTH or holds a number of more than MAX_NUMBER_DIGITS digits."""
    p = Path(path)
    try:
        if not p.is_file() and p.exists():
            raise FileFormatError(f"cannot read {str(p)!r}: not a regular file")
        if p.stat().st_size > MAX_BYTES:
            raise FileFormatError(f"{p.name}: too large ({p.stat().st_size:,} bytes; at most {MAX_BYTES:,})")
        text = p.read_text(encoding="utf-8")
    except OSError as exc:
        raise FileFormatError(f"cannot read {str(p)!r}: {exc.strerror or exc}") from exc
    except UnicodeDecodeError as exc:
        raise FileFormatError(
            f"{p.name}: not a TOML file (byte {exc.start} is not UTF-8 text; TOML files are UTF-8)"
        ) from exc
    return parse_toml(text, p.name)


def parse_toml(text: str, where: str) -> dict[str, Any]:
    """``tomllib.loads`` within the limits above (checked before and after parsing)."""
    if "\x00" in text:
        raise FileFormatError(f"{where}: not a TOML file (it holds a NUL byte)")
    _pre_scan(text, where)
    long = _LONG_DIGITS.search(text)
    if long is not None:
        raise FileFormatError(
            f"{where}: a run of {len(long.group()):,} digits, more than the {MAX_NUMBER_DIGITS:,} "
            "accepted for one number"
        )
    try:
        data = tomllib.loads(text)
    except tomllib.TOMLDecodeError as exc:
        raise FileFormatError(f"{where}: not valid TOML ({str(exc)[:200]})") from None
    except RecursionError:
        raise FileFormatError(f"{where}: nests arrays or tables deeper than {MAX_DEPTH} levels") from None
    depth = nesting_depth(data)
    if depth > MAX_DEPTH:
        raise FileFormatError(f"{where}: nests arrays or tables {depth} levels deep (at most {MAX_DEPTH})")
    return data


_STRINGS_AND_COMMENTS = re.compile(
    r'"""[\s\S]*?"""|\'\'\'[\s\S]*?\'\'\'|"(?:[^"\\\n]|\\.)*"|\'[^\'\n]*\'|#[^\n]*'
)
_BRACKETS = re.compile(r"[\[\]{}]")


def _pre_scan(text: str, where: str) -> None:
    """Refuse, before tomllib reads it, text that nests brackets or dotted keys deeper than
    MAX_DEPTH (tomllib builds dotted keys in time quadratic in their length).  Strings and comments
    are blanked first, so brackets and dots inside them do not count."""
    bare = _STRINGS_AND_COMMENTS.sub('""', text)
    depth = 0
    for found in _BRACKETS.finditer(bare):
        depth += 1 if found.group() in "[{" else -1
        if depth > MAX_DEPTH:
            raise FileFormatError(f"{where}: nests arrays or tables deeper than {MAX_DEPTH} levels")
    for line in bare.splitlines():
        key = line if line.lstrip().startswith("[") else line.partition("=")[0]
        if key.count(".") > MAX_DEPTH:
            raise FileFormatError(f"{where}: a dotted key of more than {MAX_DEPTH} parts (tables nest at most {MAX_DEPTH} deep)")


def nesting_depth(value: Any) -> int:
    """How deep lists and dicts nest in a parsed document (iterative: no recursion limit)."""
    deepest = 0
    stack: list[tuple[Any, int]] = [(value, 1)]
    while stack:
        item, depth = stack.pop()
        if isinstance(item, dict):
            children = item.values()
        elif isinstance(item, list):
            children = item
        else:
            continue
        deepest = max(deepest, depth)
        stack.extend((child, depth + 1) for child in children if isinstance(child, (dict, list)))
    return deepest


def check_header(data: dict[str, Any], where: str, fmt: str, versions: tuple[int, ...]) -> None:
    got = data.get("format")
    if got != fmt:
        raise FileFormatError(f"{where}: key 'format' must be {fmt!r}, got {got!r}")
    version = data.get("version")
    if version not in versions:
        raise FileFormatError(f"{where}: key 'version' must be one of {', '.join(map(str, versions))}, got {version!r}")


def check_keys(table: dict[str, Any], where: str, allowed: set[str]) -> None:
    for key in table:
        if key not in allowed:
            raise FileFormatError(f"{where}: unknown key {key!r} (accepted: {', '.join(sorted(allowed))})")


def need(table: dict[str, Any], key: str, where: str, kind: type | tuple[type, ...], what: str) -> Any:
    if key not in table:
        raise FileFormatError(f"{where}: key {key!r} is missing ({what})")
    value = table[key]
    if isinstance(value, bool) or not isinstance(value, kind):
        raise FileFormatError(f"{where}: key {key!r} must be {what}, got {value!r}")
    return value


def names_list(table: dict[str, Any], key: str, where: str) -> tuple[str, ...]:
    """A non-empty list of distinct, non-empty strings."""
    value = need(table, key, where, list, "a list of names")
    if not value:
        raise FileFormatError(f"{where}: key {key!r} is an empty list")
    for item in value:
        if not isinstance(item, str) or not item.strip():
            raise FileFormatError(f"{where}: key {key!r}: {item!r} is not a non-empty name")
    seen: set[str] = set()
    for item in value:
        if item in seen:
            raise FileFormatError(f"{where}: key {key!r}: the name {item!r} appears twice")
        seen.add(item)
    return tuple(value)


def whole_numbers(value: Any, where: str, *, positive: bool = False) -> tuple[int, ...]:
    """A list of whole numbers ≥ 0 (or > 0)."""
    if not isinstance(value, list):
        raise FileFormatError(f"{where}: must be a list of whole numbers, got {value!r}")
    out = []
    for pos, item in enumerate(value):
        if isinstance(item, bool) or not isinstance(item, int) or item < (1 if positive else 0):
            rule = "a positive whole number" if positive else "a whole number ≥ 0"
            raise FileFormatError(f"{where}: entry {pos + 1} is {item!r}, not {rule}")
        out.append(item)
    return tuple(out)
