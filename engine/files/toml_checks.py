"""Small helpers shared by the readers of our TOML formats: load, check the header, and fetch keys
with messages that name the key and say what would be accepted."""

from __future__ import annotations

import tomllib
from pathlib import Path
from typing import Any

from engine.errors import UserError


class FileFormatError(UserError):
    """A file that does not follow its format."""


def load_toml(path: str | Path) -> dict[str, Any]:
    p = Path(path)
    try:
        text = p.read_text(encoding="utf-8")
    except OSError as exc:
        raise FileFormatError(f"cannot read {str(p)!r}: {exc.strerror or exc}") from exc
    except UnicodeDecodeError as exc:
        raise FileFormatError(
            f"{p.name}: not a TOML file (byte {exc.start} is not UTF-8 text; TOML files are UTF-8)"
        ) from exc
    try:
        return tomllib.loads(text)
    except tomllib.TOMLDecodeError as exc:
        raise FileFormatError(f"{p.name}: not valid TOML ({exc})") from exc


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
