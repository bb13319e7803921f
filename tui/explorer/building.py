"""Building levels for the explorer, in two kinds of worker.

The *asked* level (a step, a jump, an opened session) is built first, by the ``build`` worker, and
shown as soon as it is there.  The levels the side panes want are built after it by one background
``side`` worker that follows a plan the UI thread replaces at every move (nearest levels first);
when a move makes the level it is building unwanted, its cancel token stops it.  Neither ever
delays a key: they post messages, and only the handlers on the app change what is shown.
Where the family can jump (closed forms, matrix powers), a level deeper than what is built comes by
the jump, and so do its neighbours, without building the levels below.
"""

from __future__ import annotations

import threading
import time
from typing import TYPE_CHECKING, Any

from textual import work
from textual.worker import get_current_worker

from engine.diagram import Diagram
from engine.errors import Cancelled, UserError
from engine.tower import Node
from tui.explorer import view_model as vm
from tui.explorer.messages import BuildFailed, BuildProgress, LevelsReady, SideReady, SumsReady

if TYPE_CHECKING:
    from tui.explorer.view_model import LevelData


def _every_so_often(report, interval: float = 0.2):  # noqa: ANN001, ANN202 - a progress callback
    """``report`` at most every ``interval`` seconds: each message wakes the UI thread, whose work
    holds the GIL that the build needs (hundreds of reports a deep level otherwise)."""
    last = [0.0]

    def progress(done: float, total: float) -> None:
        now = time.monotonic()
        if now - last[0] >= interval or done >= total:
            last[0] = now
            report(done, total)

    return progress


class Building:
    """Mixed into the app: ``shown`` holds the LevelData of the levels on screen."""

    def _init_building(self) -> None:
        self.shown: dict[int, LevelData] = {}
        self.sums: Any = None
        self._request = 0
        #: the level a running build is heading for (so that keys pressed meanwhile add up)
        self._pending: int | None = None
        self._side_lock = threading.Lock()
        self._side_plan: tuple[Diagram | None, tuple[int, ...]] = (None, ())
        self._side_running = False
        self._side_current: int | None = None
        self._side_cancel = threading.Event()
        #: a level shown before its sums: its side panes are planned when the sums come
        self._plan_after_sums: int | None = None

    # ----- the asked level ------------------------------------------------------------------------
    def go(self, index: int, node: Node | None = None, toward: tuple[int, Node] | None = None) -> None:
        """Move to level ``index`` once it is there (node: preferred selection; toward: the place we
        came from, to select a neighbour of it)."""
        self._request += 1
        self._pending = index
        diagram = self.state.diagram  # type: ignore[attr-defined]
        if index not in self.shown and (index > diagram.built or vm.by_jump(diagram, index)):
            # the asked level alone first (its LevelsReady plans the side panes), unless the side
            # worker is building that very level
            if self._side_current != index:
                self.stop_side()
        else:
            self.plan_around(index)
        self._build(self._request, diagram, index, node, toward, self.shown.get(index))

    # a description of our own: else Textual reprs every argument (a deep level's data: seconds)
    @work(thread=True, exclusive=True, group="build", exit_on_error=False, description="the asked level")
    def _build(self, request: int, diagram: Diagram, index: int, node: Node | None,
               toward: tuple[int, Node] | None, data: "LevelData | None") -> None:
        cancel = get_current_worker().cancelled_event
        post = self.post_message  # type: ignore[attr-defined]
        try:
            if data is None:
                if not vm.by_jump(diagram, index):
                    diagram.ensure(index, _every_so_often(lambda d, t: post(BuildProgress(request, d, t, index))), cancel)
                data = vm.level_data(diagram, index)
            level = data.multiplicity
            if node is None and toward is not None:
                there, came_from = toward
                near = diagram.children(there, came_from) if there < index else diagram.parents(there, came_from)
                node = next((n for n, _ in near if n in level), None)
            if node is None or node not in level:
                node = data.nodes[0] if data.nodes else None
            if index > 0 and node is not None and not data.jumped:
                diagram.parents(index, node)  # warms the reverse edges for families without parents()
            known = None if data.jumped else diagram.cached_sums(index)
            post(LevelsReady(request, index, node, data, known))
            if known is None:  # show the level now; its sums (dimensions of every node) follow
                post(SumsReady(request, index, vm.level_sums(diagram, data)))
        except Cancelled:
            post(BuildFailed(request, "stopped", cancelled=True))
        except UserError as exc:
            post(BuildFailed(request, str(exc)))
        except Exception as exc:  # noqa: BLE001 - report, never crash the explorer
            post(BuildFailed(request, f"building failed: {type(exc).__name__}: {exc}"))

    # ----- the side panes' levels -------------------------------------------------------------------
    def plan_around(self, index: int) -> None:
        """Plan the side panes' levels for the current layout around ``index``; drop the others."""
        diagram = self.state.diagram  # type: ignore[attr-defined]
        wanted = list(vm.span(diagram, index, self.main.pane_count_for(index)))  # type: ignore[attr-defined]
        if index > 0 and index - 1 > diagram.built and index - 1 not in wanted:
            wanted.append(index - 1)  # a jumped level's parents (the details) need the level before it
        with self._side_lock:
            for i in [i for i in self.shown if i not in wanted and i != index]:
                del self.shown[i]
                self._side_ready_set.discard((diagram, i))
        self._plan_side(diagram, [i for i in wanted if i != index])

    def _plan_side(self, diagram: Diagram, wanted: list[int]) -> None:
        """Replace the background plan; stop the level being built when it is no longer wanted."""
        with self._side_lock:
            self._side_plan = (diagram, tuple(wanted))
            current = self._side_current
            if current is not None and current not in wanted:
                self._side_cancel.set()
            if not self._side_running and wanted:
                self._side_running = True
                self._side()

    def stop_side(self) -> None:
        with self._side_lock:
            self._side_plan = (None, ())
            self._side_cancel.set()

    def _next_side(self) -> tuple[Diagram, int, threading.Event] | None:
        with self._side_lock:
            diagram, wanted = self._side_plan
            ready = self._side_ready_set
            for index in wanted:
                if diagram is not None and (diagram, index) not in ready and index not in self.shown:
                    if self._side_cancel.is_set():
                        self._side_cancel = threading.Event()
                    self._side_current = index
                    return diagram, index, self._side_cancel
            self._side_current = None
            self._side_running = False
            return None

    @work(thread=True, group="side", exit_on_error=False, description="the side panes' levels")
    def _side(self) -> None:
        post = self.post_message  # type: ignore[attr-defined]
        while True:
            step = self._next_side()
            if step is None:
                return
            diagram, index, cancel = step
            try:
                if not vm.by_jump(diagram, index):
                    diagram.ensure(index, _every_so_often(lambda d, t: post(BuildProgress(-1, d, t, index))), cancel)
                data = vm.level_data(diagram, index)
            except Cancelled:
                continue
            except Exception:  # noqa: BLE001 - a side pane that cannot be built stays empty
                data = None
            with self._side_lock:
                self._side_ready_set.add((diagram, index))
            if data is not None:
                post(SideReady(data))

    @property
    def _side_ready_set(self) -> set[tuple[Diagram, int]]:
        found = getattr(self, "_ready_levels", None)
        if found is None:
            found = self._ready_levels = set()
        return found

    def forget_levels(self) -> None:
        """A new tower: nothing shown is valid any more."""
        self.stop_side()
        with self._side_lock:
            self._side_ready_set.clear()
        self.shown.clear()
        self.sums = None
