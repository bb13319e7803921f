"""App-wide messages, as small dataclasses."""

from __future__ import annotations

from dataclasses import dataclass

from textual.message import Message


@dataclass
class PathShown(Message):
    """A path browser shows a path: ``path`` holds its nodes, one per level index 0..index."""

    path: list
