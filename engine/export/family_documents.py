"""The ``families`` command's document: each family, its keys, examples and capabilities."""

from __future__ import annotations

from typing import Any, Iterable

from engine.specs import Family


def families_document(found: Iterable[Family]) -> list[dict[str, Any]]:
    return [
        {"family": f.name, "summary": f.summary, "keys": f.keys, "required": list(f.required),
         "example": f.example, "examples": list(f.examples),
         "capabilities": [getattr(c, "title", c.__name__).removeprefix("a ").removeprefix("an ") for c in f.capabilities]}
        for f in found
    ]
