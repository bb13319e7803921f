"""engine.records.record against the standard library's ``dataclasses.dataclass(frozen=True)`` (the
outside reference: the same class made both ways must behave the same)."""

from __future__ import annotations

import dataclasses
import subprocess
import sys
from pathlib import Path

import pytest

from engine.records import fields, record, replace


class Base:
    #: a plain base's annotations are not fields (as for a dataclass)
    title: str = "base"


def _make(decorate):
    class Point(Base):
        """A point."""

        x: int
        y: int
        label: str = "p"
        tags: tuple[str, ...] = ()
        title = "point"

        def norm(self) -> int:
            return self.x * self.x + self.y * self.y

    return decorate(Point)


OURS = _make(record)
THEIRS = _make(dataclasses.dataclass(frozen=True))


@pytest.mark.parametrize("args, kwargs", [((1, 2), {}), ((1, 2, "q"), {}), ((), {"x": 3, "y": 4, "tags": ("a",)}),
                                          ((5,), {"y": 6, "label": "r"})])
def test_init_repr_eq_hash_as_a_frozen_dataclass(args, kwargs):
    ours, theirs = OURS(*args, **kwargs), THEIRS(*args, **kwargs)
    assert repr(ours) == repr(theirs)
    assert (ours.x, ours.y, ours.label, ours.tags) == (theirs.x, theirs.y, theirs.label, theirs.tags)
    assert ours == OURS(*args, **kwargs) and hash(ours) == hash(OURS(*args, **kwargs))
    assert ours != theirs  # another class
    assert ours.norm() == theirs.norm() and ours.title == theirs.title == "point"
    assert fields(ours) == tuple(f.name for f in dataclasses.fields(theirs))
    assert replace(ours, y=9) == OURS(**{**dict(zip(fields(ours), (ours.x, ours.y, ours.label, ours.tags))), "y": 9})


def test_wrong_arguments_and_assignments_fail_as_they_do_for_a_dataclass():
    for cls in (OURS, THEIRS):
        with pytest.raises(TypeError):
            cls(1)
        with pytest.raises(TypeError):
            cls(1, 2, z=3)
        point = cls(1, 2)
        with pytest.raises(AttributeError):
            point.x = 5
        with pytest.raises(AttributeError):
            del point.y
    with pytest.raises(TypeError):
        replace(OURS(1, 2), z=1)


def test_a_field_without_default_after_one_with_a_default_is_refused():
    class Bad:
        a: int = 1
        b: int

    with pytest.raises(TypeError):
        record(Bad)


def test_a_lookup_does_not_import_dataclasses():
    # what the records are for: dataclasses imports inspect, ast and dis (bench/bench_startup.py)
    root = Path(__file__).resolve().parents[2]
    code = ("import sys\nfrom tui.cli.main import main\n"
            "main(['node', 'symmetric:n=4', '--level', '2', '--label', '(3,1)', '--json'])\n"
            "sys.stderr.write(' '.join(sys.modules))")
    done = subprocess.run([sys.executable, "-c", code], capture_output=True, text=True, cwd=root, check=True)
    loaded = set(done.stderr.split())
    assert "engine.diagram" in loaded and not {"dataclasses", "inspect"} & loaded
