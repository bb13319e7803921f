"""What the explorer is showing: the tower's diagram, the place, bookmarks, notes, view settings.

The app owns one ``ExplorerState``; widgets render from it.  It converts to and from the engine's
``Session`` (the file format), checking every label against the tower, so a session that names a
node the tower does not have is refused whole, before anything on screen changes.
"""

from __future__ import annotations

from dataclasses import dataclass, field
from pathlib import Path
from typing import Any

from engine.diagram import Diagram
from engine.files.session import Mark, Session, ViewSettings
from engine.specs import parse_spec
from engine.tower import Node

Place = tuple[int, Node]


@dataclass
class ExplorerState:
    diagram: Diagram
    index: int = 0
    node: Node | None = None
    bookmarks: list[Place] = field(default_factory=list)
    notes: dict[Place, str] = field(default_factory=dict)
    view: ViewSettings = field(default_factory=ViewSettings)
    #: the file this state was read from or last saved to
    path: Path | None = None
    #: a path (one node per level index) highlighted in the panes, from the path browser
    highlighted: list[Any] = field(default_factory=list)

    @property
    def tower(self):  # noqa: ANN201 - a Tower
        return self.diagram.tower

    @property
    def spec(self) -> str:
        return self.diagram.tower.spec

    # ----- marks ----------------------------------------------------------------------------------
    def toggle_bookmark(self, index: int, node: Node) -> bool:
        """Add or remove a bookmark; True when the node is now bookmarked."""
        place = (index, node)
        if place in self.bookmarks:
            self.bookmarks.remove(place)
            return False
        self.bookmarks.append(place)
        return True

    def set_note(self, index: int, node: Node, text: str) -> None:
        text = text.strip()
        if text:
            self.notes[(index, node)] = text
        else:
            self.notes.pop((index, node), None)

    def next_bookmark(self, index: int, node: Node | None) -> Place | None:
        """The bookmark after the current place in the order they were made (wrapping), or None."""
        if not self.bookmarks:
            return None
        place = (index, node)
        if place in self.bookmarks:
            return self.bookmarks[(self.bookmarks.index(place) + 1) % len(self.bookmarks)]
        return self.bookmarks[0]

    # ----- sessions -------------------------------------------------------------------------------
    def to_session(self) -> Session:
        tower = self.tower
        fmt = tower.format

        def mark(place: Place) -> Mark:
            return Mark(tower.level_of(place[0]), fmt(place[1]))

        return Session(
            tower=self.spec,
            level=tower.level_of(self.index),
            node=None if self.node is None else fmt(self.node),
            bookmarks=[mark(p) for p in self.bookmarks],
            notes={mark(p): text for p, text in self.notes.items()},
            view=ViewSettings(details=self.view.details, panes=self.view.panes),
        )


def state_from_session(session: Session, path: Path | None = None) -> ExplorerState:
    """Check a session against its tower and make the state; a UserError names what does not fit."""
    from engine.errors import UserError
    from engine.levels import format_level

    tower = parse_spec(session.tower)
    diagram = Diagram(tower)

    def place(mark: Mark, what: str) -> Place:
        try:
            index = tower.index_of(mark.level)
            return index, tower.parse(mark.label, index)
        except UserError as exc:
            raise UserError(f"{what} at level {format_level(mark.level)}: {exc}") from None

    index = tower.index_of(session.level)
    node = None if session.node is None else place(Mark(session.level, session.node), "the current node")[1]
    state = ExplorerState(diagram=diagram, index=index, node=node, view=session.view, path=path)
    state.bookmarks = [place(m, "a bookmark") for m in session.bookmarks]
    state.notes = {place(m, "a note"): text for m, text in session.notes.items()}
    return state


def state_for_spec(spec: str) -> ExplorerState:
    """A fresh state at level 0 of a tower."""
    return ExplorerState(diagram=Diagram(parse_spec(spec)))
