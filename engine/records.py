"""Frozen records: the part of ``@dataclass(frozen=True)`` the engine uses, without its import.

``dataclasses`` imports ``inspect`` (and with it ``ast``, ``dis``, ``tokenize``): about a third of
the start-up of a quick lookup such as ``towerscope node ... --json`` (bench/bench_startup.py).
``@record`` makes the same class from the annotations of the class body: an ``__init__`` taking
the fields in order (those with a value in the body default to it), ``__repr__``, ``__eq__`` and
``__hash__`` over the fields, and no assignment after ``__init__``.  Only the class's own
annotations are fields (a base class's are not), as for a dataclass whose bases are plain classes.
``replace(record, **changes)`` is ``dataclasses.replace``.
"""

from __future__ import annotations

from typing import Any, TypeVar, dataclass_transform

R = TypeVar("R", bound=type)
T = TypeVar("T")

_FIELDS = "__record_fields__"


def _frozen_setattr(self: object, name: str, value: object) -> None:
    raise AttributeError(f"cannot assign to {name!r}: {type(self).__name__} is a frozen record")


def _frozen_delattr(self: object, name: str) -> None:
    raise AttributeError(f"cannot delete {name!r}: {type(self).__name__} is a frozen record")


def _values(self: object) -> tuple:
    return tuple(getattr(self, name) for name in getattr(type(self), _FIELDS))


def _eq(self: object, other: object) -> bool:
    if type(other) is not type(self):
        return NotImplemented
    return _values(self) == _values(other)


def _hash(self: object) -> int:
    return hash(_values(self))


def _repr(self: object) -> str:
    inner = ", ".join(f"{name}={getattr(self, name)!r}" for name in getattr(type(self), _FIELDS))
    return f"{type(self).__qualname__}({inner})"


@dataclass_transform(frozen_default=True)
def record(cls: R) -> R:
    """The class as a frozen record of the fields annotated in its body."""
    if any(hasattr(base, _FIELDS) for base in cls.__mro__[1:]):
        raise TypeError(f"{cls.__name__}: a record cannot extend another record")
    annotations = cls.__dict__.get("__annotations__", {})
    fields = [name for name, kind in annotations.items() if not str(kind).startswith(("ClassVar", "typing.ClassVar"))]
    defaults = {name: cls.__dict__[name] for name in fields if name in cls.__dict__}
    seen_default = False
    for name in fields:
        if name in defaults:
            seen_default = True
        elif seen_default:
            raise TypeError(f"{cls.__name__}: field {name!r} without a default follows one with a default")
    parameters = ", ".join(f"{name}=_default_{name}" if name in defaults else name for name in fields)
    body = "".join(f"    _set(self, {name!r}, {name})\n" for name in fields) or "    pass\n"
    namespace: dict[str, Any] = {"_set": object.__setattr__}
    namespace.update({f"_default_{name}": value for name, value in defaults.items()})
    exec(f"def __init__(self, {parameters}):\n{body}", namespace)  # as dataclasses makes __init__
    init = namespace["__init__"]
    init.__qualname__ = f"{cls.__qualname__}.__init__"
    setattr(cls, "__init__", init)
    setattr(cls, _FIELDS, tuple(fields))
    setattr(cls, "__setattr__", _frozen_setattr)
    setattr(cls, "__delattr__", _frozen_delattr)
    setattr(cls, "__eq__", _eq)
    setattr(cls, "__hash__", _hash)
    setattr(cls, "__repr__", _repr)
    return cls


def replace(item: T, **changes: Any) -> T:
    """A copy of a record with some fields changed (``dataclasses.replace``)."""
    names = getattr(type(item), _FIELDS)
    unknown = set(changes) - set(names)
    if unknown:
        raise TypeError(f"{type(item).__name__} has no field {sorted(unknown)[0]!r}")
    return type(item)(**{name: changes.get(name, getattr(item, name)) for name in names})  # type: ignore[call-arg]


def fields(item: object) -> tuple[str, ...]:
    """The names of a record's fields, in order."""
    return getattr(item, _FIELDS)
