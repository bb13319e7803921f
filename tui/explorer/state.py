"""What the explorer is showing: the tower's diagram, the place, bookmarks, notes, view settings.

The app owns one ``ExplorerState``; widgets render from it.  It converts to and from the engine's
``Session`` (the file format).  Reading is forgiving where it can be: a level deeper than the size
guard allows opens at the deepest allowed level, and a bookmark or note on a node the tower does not
have is dropped; each such change is a notice for the user (``ExplorerState.notices``).  Only a file
that names no tower the engine can build is refused.
"""

from __future__ import annotations

from dataclasses import dataclass, field
from pathlib import Path
from typing import Any

from engine.diagram import Diagram
from engine.errors import UserError
from engine.files.session import Mark, Session
from engine.levels import format_level
from engine.specs import parse_spec
from engine.tower import Node
from tui.explorer.view_settings import ViewSettings

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
    #: bookmarks, notes or view changed since the last save or open
    modified: bool = False
    #: what was changed to open a session file (shown once when the state is shown)
    notices: list[str] = field(default_factory=list)

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
        self.modified = True
        if place in self.bookmarks:
            self.bookmarks.remove(place)
            return False
        self.bookmarks.append(place)
        return True

    def set_note(self, index: int, node: Node, text: str) -> None:
        text = text.strip()
        if text == self.notes.get((index, node), ""):
            return
        self.modified = True
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
            view=self.view.to_dict(),
        )


def deepest_allowed(diagram: Diagram, index: int) -> int:
    """``index`` if the diagram may show it, else the deepest level below it that the size guard
    (and, where the family jumps, the digit guard) allows: a binary search, each check an estimate."""
    from tui.explorer.view_model import by_jump

    tower = diagram.tower
    if tower.max_index is not None:
        index = min(index, tower.max_index)

    def allowed(i: int) -> bool:
        try:
            if by_jump(diagram, i):
                diagram.check_digits(i)
            else:
                diagram.check_size(i)
        except UserError:
            return False
        return True

    if allowed(index):
        return index
    low, high = 0, index  # allowed at low, refused at high
    while high - low > 1:
        middle = (low + high) // 2
        low, high = (middle, high) if allowed(middle) else (low, middle)
    return low


def state_from_session(session: Session, path: Path | None = None) -> ExplorerState:
    """The state a session describes; a UserError only when its tower cannot be built."""
    tower = parse_spec(session.tower)
    diagram = Diagram(tower)
    notices: list[str] = []

    def place(mark: Mark) -> Place | None:
        try:
            index = tower.index_of(mark.level)
            tower.check_index(index)
            return index, tower.parse(mark.label, index)
        except UserError:
            return None

    try:
        index = tower.index_of(session.level)
    except UserError:
        index = 0
        notices.append(f"{session.tower} has no level {format_level(session.level)}; opened at level 0")
    allowed = deepest_allowed(diagram, index)
    if allowed < index:
        notices.append(
            f"level {format_level(session.level)} is deeper than the explorer builds for {session.tower}; "
            f"opened at level {format_level(tower.level_of(allowed))}"
        )
        index = allowed
    node = None
    if session.node is not None and not notices:
        found = place(Mark(tower.level_of(index), session.node))
        node = None if found is None else found[1]
        if found is None:
            notices.append(f"no node {session.node} at level {format_level(session.level)}; selected the first node")
    state = ExplorerState(diagram=diagram, index=index, node=node, view=ViewSettings.from_dict(session.view), path=path)
    for mark in session.bookmarks:
        found = place(mark)
        if found is None:
            notices.append(f"dropped a bookmark on {mark.label} at level {format_level(mark.level)}: not in {session.tower}")
        elif found not in state.bookmarks:
            state.bookmarks.append(found)
    for mark, text in session.notes.items():
        found = place(mark)
        if found is None:
            notices.append(f"dropped a note on {mark.label} at level {format_level(mark.level)}: not in {session.tower}")
        else:
            state.notes[found] = text
    # Anything dropped is a change the file does not have yet.
    state.modified = any(n.startswith("dropped") for n in notices)
    state.notices = notices
    return state


def state_for_spec(spec: str) -> ExplorerState:
    """A fresh state at level 0 of a tower."""
    return ExplorerState(diagram=Diagram(parse_spec(spec)))
