"""The explorer's view settings, kept in a session file's ``view`` object (the engine keeps that
object as it is; the explorer reads it here, leniently: an unknown key or a value out of range
falls back to the default, so files written by older or newer explorers always open)."""

from __future__ import annotations

from dataclasses import dataclass
from typing import Any

#: the most level panes the explorer shows at once
MAX_PANES = 9


@dataclass
class ViewSettings:
    details: bool = True
    #: how many level panes: None lets the explorer choose from the terminal and the labels
    panes: int | None = None

    def to_dict(self) -> dict[str, Any]:
        found: dict[str, Any] = {"details": self.details}
        if self.panes is not None:
            found["pane_count"] = self.panes
        return found

    @classmethod
    def from_dict(cls, raw: dict[str, Any]) -> "ViewSettings":
        """Older files wrote ``panes`` as an upper bound of an automatic count: it is ignored (the
        layout now sizes panes by their labels); ``pane_count`` is a count chosen with the + and - keys."""
        details = raw.get("details", True)
        panes = raw.get("pane_count")
        if isinstance(panes, bool) or not isinstance(panes, int) or not 1 <= panes <= MAX_PANES:
            panes = None
        return cls(details=details if isinstance(details, bool) else True, panes=panes)
