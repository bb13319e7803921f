"""App-wide messages, as small dataclasses.  Workers post them; handlers on the app change state."""

from __future__ import annotations

from dataclasses import dataclass
from typing import Any

from textual.message import Message


@dataclass
class PathShown(Message):
    """A path to highlight in the level panes: its nodes, one per level index 0, 1, 2, ...
    Posted by the path browser whenever the path it shows changes."""

    path: list[Any]


@dataclass
class BuildProgress(Message):
    """Progress of a build: ``done`` out of ``total`` (any unit); ``index`` is the level built."""

    request: int
    done: float
    total: float
    index: int = -1

    def can_replace(self, message: Message) -> bool:
        return isinstance(message, BuildProgress)


@dataclass
class LevelsReady(Message):
    """The asked level is built (or reached by a jump) and sorted; the view may move there."""

    request: int
    index: int
    node: Any
    data: Any = None  # a view_model.LevelData
    sums: Any = None  # its LevelSums


@dataclass
class SumsReady(Message):
    """The sums of a level shown before them (a level reached by a jump)."""

    request: int
    index: int
    sums: Any


@dataclass
class SideReady(Message):
    """A level that a side pane shows is ready (built in the background after the asked one)."""

    data: Any  # a view_model.LevelData


@dataclass
class BuildFailed(Message):
    """A build ended without a result: cancelled, refused as too large, or failed."""

    request: int
    reason: str
    cancelled: bool = False


@dataclass
class FaithfulFound(Message):
    """Where the centralizer stops being faithful, searched up to ``upto``: ``first`` or None."""

    spec: str
    upto: int
    first: int | None
