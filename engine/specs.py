"""Tower specs: ``FAMILY`` or ``FAMILY:key=value,key=value`` → a Tower.

Families register themselves: every module in ``engine/families/`` that defines ``FAMILY``
(a ``Family``) is a family.  Adding a family is adding a module; nothing here changes.
The module of family ``general-linear`` is ``engine/families/general_linear.py``: a spec imports
only its family's module (a quick start); listings discover them all.
A comma inside parentheses belongs to the value (``module=(5,1)``).
"""

from __future__ import annotations

import sys
from engine.records import record
from typing import Callable

from engine.errors import SpecError, UserError
from engine.numbers_in import NumberError, quote, read_whole
from engine.text import split_outside_parentheses
from engine.tower import Tower


@record
class Family:
    name: str
    summary: str
    #: key → one-line help; keys not listed are refused
    keys: dict[str, str]
    build: Callable[[str, dict[str, str]], Tower]
    #: keys that must be given
    required: tuple[str, ...] = ()
    #: position in listings
    rank: int = 100
    example: str = ""
    #: more specs worth trying (other keys, multiple edges, files): the generic tests run them all
    examples: tuple[str, ...] = ()
    #: the capabilities its towers declare (``engine.capabilities``; some only for some keys),
    #: for listings and for the one-line "has none" messages
    capabilities: tuple[type, ...] = ()


_REGISTRY: dict[str, Family] | None = None
#: families imported one at a time by name (``family``)
_LOADED: dict[str, Family] = {}


def module_name(name: str) -> str | None:
    """The module a family of that name lives in (``general-linear`` → ``general_linear``), or None
    for a name no module can carry."""
    module = name.replace("-", "_")
    if not module.isidentifier() or not module.isascii() or module.startswith("_") or not module.islower():
        return None
    return module


def _import_family(module: str) -> Family | None:
    path = f"engine.families.{module}"
    try:
        __import__(path)  # the import statement's machinery: ``python -X importtime`` sees it
    except ModuleNotFoundError as exc:
        if exc.name == path:
            return None
        raise
    family = getattr(sys.modules[path], "FAMILY", None)
    return family if isinstance(family, Family) else None


def family(name: str) -> Family | None:
    """The family called ``name``, importing only its module (every module when it is not found
    there: then the whole registry decides), or None."""
    if name in _LOADED:
        return _LOADED[name]
    module = module_name(name)
    found = _import_family(module) if module is not None else None
    if found is not None and found.name == name:
        _LOADED[name] = found
        return found
    return families().get(name)


def families() -> dict[str, Family]:
    """name → Family, discovered from engine/families/, in listing order."""
    global _REGISTRY
    if _REGISTRY is None:
        import pkgutil

        import engine.families as package

        found: list[Family] = []
        for info in pkgutil.iter_modules(package.__path__):
            one = _import_family(info.name)
            if one is not None:
                found.append(one)
        found.sort(key=lambda f: (f.rank, f.name))
        _REGISTRY = {f.name: f for f in found}
    return _REGISTRY


def families_with(kind: type) -> list[str]:
    """Names of the families whose towers may declare a capability of that kind."""
    return [f.name for f in families().values() if any(issubclass(c, kind) for c in f.capabilities)]


def split_spec(spec: str) -> tuple[str, dict[str, str]]:
    """``family:k=v,k=v`` → (family, {k: v}); commas inside parentheses stay in the value."""
    text = spec.strip()
    if not text:
        raise SpecError(f"empty tower spec (write FAMILY or FAMILY:key=value,...; families: {', '.join(families())})")
    name, _, rest = text.partition(":")
    name = name.strip()
    params: dict[str, str] = {}
    if rest.strip():
        try:
            items = split_outside_parentheses(rest, lambda ch: ch == ",")
        except UserError as exc:
            raise SpecError(f"in spec {quote(spec)}: {exc}") from None
        for item in items:
            key, eq, value = item.partition("=")
            key = key.strip()
            if not eq or not key:
                raise SpecError(f"in spec {quote(spec)}: {quote(item.strip())} is not key=value")
            if key in params:
                raise SpecError(f"in spec {quote(spec)}: key {quote(key)} given twice")
            params[key] = value.strip()
    return name, params


def parse_spec(spec: str) -> Tower:
    """Build the tower a spec names; SpecError with a one-line message otherwise."""
    name, params = split_spec(spec)
    chosen = family(name)
    if chosen is None:
        raise SpecError(f"unknown tower family {quote(name)} (known: {', '.join(families())})")
    for key in params:
        if key not in chosen.keys:
            accepted = ", ".join(chosen.keys) or "none"
            raise SpecError(f"{chosen.name}: unknown key {quote(key)} (accepted keys: {accepted})")
    for key in chosen.required:
        if key not in params:
            raise SpecError(f"{chosen.name}: key {quote(key)} is required ({chosen.keys[key]})")
    canonical = chosen.name + (":" + ",".join(f"{k}={v}" for k, v in params.items()) if params else "")
    return chosen.build(canonical, params)


#: digits of a whole-number spec key (n=, m=, ...): no family is usable beyond this
MAX_KEY_DIGITS = 18


def int_param(family: str, params: dict[str, str], key: str, *, minimum: int = 0, default: int | None = None) -> int:
    """A whole-number value of a spec key, at least ``minimum``; a SpecError naming the key otherwise."""
    raw = params.get(key)
    if raw is None:
        if default is None:
            raise SpecError(f"{family}: key {quote(key)} is required")
        return default
    try:
        value = read_whole(raw, f"{family}: key {quote(key)}", max_digits=MAX_KEY_DIGITS)
    except NumberError as exc:
        raise SpecError(str(exc)) from None
    if value < minimum:
        raise SpecError(f"{family}: key {quote(key)} must be at least {minimum}, got {value}")
    return value


def choice_param(family: str, params: dict[str, str], key: str, choices: tuple[str, ...], default: str) -> str:
    raw = params.get(key, default)
    if raw not in choices:
        raise SpecError(f"{family}: key {quote(key)} must be one of {', '.join(choices)}, got {quote(raw)}")
    return raw
