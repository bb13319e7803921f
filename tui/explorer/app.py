"""The explorer: a Textual app over one ExplorerState.

Workers build levels (``building.py``: the asked level first, the side panes' levels after it in
the background, with progress, cancelled by Escape through the engine's cancel token) and post
messages; only the handlers here change the state, then ask the main screen to redraw.  Dialogs
(and the unsaved-changes guard, the autosave) are in ``dialogs.py``.
"""

from __future__ import annotations

import gc
import sys
import time
from typing import Any, Iterable

from textual import on, work
from textual.app import App, SystemCommand
from textual.screen import Screen
from textual.worker import get_current_worker

from engine.diagram import Diagram
from engine.errors import Cancelled, UserError
from engine.levels import format_level
from engine.tower import Node
from tui.explorer.actions import ALL, GLOBAL, Act, bindings, key_text
from tui.explorer.building import Building
from tui.explorer.dialogs import Dialogs
from tui.explorer.messages import (
    BuildFailed,
    BuildProgress,
    FaithfulFound,
    LevelsReady,
    PathShown,
    SideReady,
    SumsReady,
)
from tui.explorer.screens.main import MainScreen
from tui.explorer.session_files import read_settings, write_settings
from tui.explorer.state import ExplorerState
from tui.explorer.widgets.level_pane import LevelPane


class ExplorerApp(Building, Dialogs, App[None]):
    CSS_PATH = "app.tcss"
    TITLE = "towerscope"
    BINDINGS = bindings(GLOBAL)

    def __init__(self, state: ExplorerState, *, demo: bool = False, search_faithful: bool = True,
                 restore: ExplorerState | None = None, autosave: bool = True) -> None:
        sys.set_int_max_str_digits(0)  # multiplicities deep in a tower have far more than 4,300 digits
        super().__init__()
        self.state = state
        self.demo = demo
        self.search_faithful = search_faithful
        #: a session left unsaved by a run that stopped without quitting, to offer back
        self.restore = restore
        self.autosave = autosave
        self.cursor: int | None = None
        self.main = MainScreen()
        self._init_building()
        self._faithful: dict[str, tuple[int, int | None]] = {}
        self.settings = read_settings()
        #: the one-line legend shows on the first start only
        self.first_start = not self.settings.get("legend_seen", False)

    def on_mount(self) -> None:
        # Rendering leaves cyclic garbage (cached strips refer to themselves); a full collection
        # walks every tracked object and stalls a key press for 50-150 ms on a deep level. Run full
        # collections ten times less often, and one whenever the explorer has been idle a second.
        gc.set_threshold(700, 10, 100)
        self.set_interval(1.0, self._collect_when_idle)
        self._last_key = 0.0
        theme = self.settings.get("theme")
        if isinstance(theme, str) and theme in self.available_themes:
            self.theme = theme
        self.theme_changed_signal.subscribe(self, self._theme_changed)
        if self.first_start:
            self.settings["legend_seen"] = True
            write_settings(self.settings)
        self.push_screen(self.main)
        self.go(self.state.index, self.state.node)
        self.show_notices()
        if self.restore is not None:
            self.offer_restore(self.restore)

    def _theme_changed(self, _theme: object) -> None:
        if self.settings.get("theme") != self.theme:
            self.settings["theme"] = self.theme
            write_settings(self.settings)
        if self.main.is_attached:
            self.main.redraw()

    def on_key(self) -> None:
        self._last_key = time.monotonic()

    def _collect_when_idle(self) -> None:
        if self._pending is None and time.monotonic() - self._last_key > 1.0 and gc.get_count()[1] > 0:
            gc.collect()

    def show_notices(self) -> None:
        for notice in self.state.notices:
            self.notify(notice, title="session opened with changes", severity="warning", timeout=10, markup=False)
        self.state.notices = []

    # ----- levels arriving --------------------------------------------------------------------------------
    def _drawable(self) -> bool:
        """False while the main screen is not (or no longer) mounted, e.g. during shutdown."""
        return bool(self.main.is_attached and self.main.query("#progress"))

    @on(BuildProgress)
    def _build_progress(self, message: BuildProgress) -> None:
        wanted = self._pending is not None and (message.request == self._request or message.index == self._pending)
        if wanted and self._drawable():
            # at most a few repaints a second: each one lays the screen out again, and on a deep
            # level that main-thread work slows the build itself (it holds the GIL)
            now = time.monotonic()
            last_at, last_index = getattr(self, "_progress_shown", (0.0, None))
            if now - last_at < 0.25 and last_index == message.index:
                return
            self._progress_shown = (now, message.index)
            level = format_level(self.state.tower.level_of(message.index))
            self.main.show_progress(message.done, message.total, f"building level {level}… Esc stops")

    @on(LevelsReady)
    def _levels_ready(self, message: LevelsReady) -> None:
        if message.request != self._request or not self._drawable():
            return
        self._pending = None
        self.state.index, self.state.node = message.index, message.node
        self.shown[message.index] = message.data
        self.sums = message.sums
        self.cursor = None if message.node is None else message.data.position.get(message.node)
        self.main.hide_progress()
        # the side panes' levels after the sums when those still come (a thread computing them
        # beside the sums would slow both: they share the interpreter)
        self._plan_after_sums = message.index if message.sums is None else None
        if message.sums is not None:
            self.plan_around(message.index)  # the layout may differ now that the level's widths are known
        self.main.redraw()
        # A deep level holds millions of long-lived objects; move them out of the cyclic garbage
        # collector's sight so that its full passes do not stall key presses (they are still freed
        # by reference counting when the diagram goes).
        gc.freeze()
        self._start_faithful_search()

    @on(SumsReady)
    def _sums_ready(self, message: SumsReady) -> None:
        if message.request == self._request and message.index == self.state.index and self._drawable():
            self.sums = message.sums
            self.main.redraw_sums()
            if self._plan_after_sums == message.index:
                self._plan_after_sums = None
                self.plan_around(message.index)
                self.main.redraw_panes()

    @on(SideReady)
    def _side_ready(self, message: SideReady) -> None:
        data = message.data
        if self._drawable() and (data.index in self.main.wanted_levels() or data.index == self.state.index - 1):
            self.shown[data.index] = data
            self.main.redraw_panes()
            if abs(data.index - self.state.index) == 1:
                self.main.redraw_details()  # the parents or children of a jumped level are known now
        else:  # built for a plan made before the asked level was shown: a later plan asks again
            with self._side_lock:
                self._side_ready_set.discard((self.state.diagram, data.index))

    @on(BuildFailed)
    def _build_failed(self, message: BuildFailed) -> None:
        if message.request != self._request or not self._drawable():
            return
        self._pending = None
        self.main.hide_progress()
        here = format_level(self.state.tower.level_of(self.state.index))
        if message.cancelled:
            self.notify(f"stopped building; still at level {here}", markup=False)
        else:
            self.notify(message.reason, title="cannot go there", severity="error", markup=False)
        self.plan_around(self.state.index)
        self.main.redraw()

    def cancel_build(self) -> None:
        self.workers.cancel_group(self, "build")
        self.stop_side()
        self.main.hide_progress()

    # ----- faithfulness -----------------------------------------------------------------------------------
    def unfaithful(self) -> tuple[int, int | None] | None:
        return self._faithful.get(self.state.spec)

    def _start_faithful_search(self) -> None:
        diagram, index = self.state.diagram, self.state.index
        known = self.unfaithful()
        if not self.search_faithful or diagram.algebra(0) is None:
            return
        if known is not None and (known[1] is not None or known[0] >= index):
            return
        self._search(diagram, index)

    @work(thread=True, exclusive=True, group="faithful", exit_on_error=False,
          description="the first level where the algebra stops acting faithfully")
    def _search(self, diagram: Diagram, upto: int) -> None:
        """The family's theorem where it has one (no level built), else a search of built levels."""
        try:
            first = diagram.first_unfaithful_of_tower()
            if first is not None:
                self.post_message(FaithfulFound(diagram.tower.spec, max(upto, first), first))
                return
            if upto > diagram.built:
                return
            first = diagram.first_unfaithful(upto, cancel=get_current_worker().cancelled_event)
        except (Cancelled, UserError, AssertionError):
            return
        self.post_message(FaithfulFound(diagram.tower.spec, upto, first))

    @on(FaithfulFound)
    def _faithful_found(self, message: FaithfulFound) -> None:
        known = self._faithful.get(message.spec)
        if known is None or known[1] is None and message.upto > known[0] or message.first is not None:
            self._faithful[message.spec] = (message.upto, message.first)
        if message.spec == self.state.spec and self._drawable():
            self.main.redraw_sums()

    # ----- moving ---------------------------------------------------------------------------------------
    def view_changed(self) -> None:
        """The screen was resized, panes added or the details pane toggled: plan and redraw."""
        if self.cursor is not None and self._pending is None:
            self.plan_around(self.state.index)
            self.main.redraw()

    def step_level(self, step: int) -> None:
        target = (self.state.index if self._pending is None else self._pending) + step
        last = self.state.tower.max_index
        if target < 0 or (last is not None and target > last):
            self.notify("no level there: this is the " + ("first" if target < 0 else "last") + " level")
            return
        node = self.state.node
        self.go(target, toward=None if node is None else (self.state.index, node))

    def set_cursor(self, position: int) -> None:
        data = self.shown.get(self.state.index)
        if data is None or not data.nodes:
            return
        nodes = data.nodes
        position = len(nodes) - 1 if position < 0 else min(position, len(nodes) - 1)
        self.cursor, self.state.node = position, nodes[position]
        self.main.redraw_marks(moved_only=True)

    def move_cursor(self, step: int) -> None:
        self.set_cursor(max(0, (self.cursor or 0) + step))

    def move_page(self, pages: int) -> None:
        self.move_cursor(pages * self.main.page_rows())

    def select(self, index: int, node: Node) -> None:
        data = self.shown.get(index)
        if index == self.state.index and data is not None and node in data.position:
            self.set_cursor(data.position[node])
        else:
            self.go(index, node)

    @on(LevelPane.Clicked)
    def _pane_clicked(self, message: LevelPane.Clicked) -> None:
        data = self.shown.get(message.index)
        if message.row is None or data is None:
            if message.index != self.state.index:
                self.go(message.index, self.state.node)
            return
        self.select(message.index, data.nodes[message.row])

    def go_next_bookmark(self) -> None:
        place = self.state.next_bookmark(self.state.index, self.state.node)
        if place is None:
            self.notify("no bookmarks yet: press b on a node")
        else:
            self.select(*place)

    def highlight_path(self, path: list[Any]) -> None:
        self.state.highlighted = list(path)
        self.main.redraw_marks()

    @on(PathShown)
    def _path_shown(self, message: PathShown) -> None:
        self.highlight_path(message.path)

    def change_panes(self, step: int) -> None:
        view = self.state.view
        count = self.main.pane_count_for(self.state.index)
        wanted = max(1, min(9, count + 2 * step))
        if wanted == count:
            self.notify("no room for more panes" if step > 0 else "one pane already", markup=False)
            return
        view.panes = wanted
        self.mark_modified()
        self.view_changed()
        self.notify(f"{self.main.pane_count_for(self.state.index)} level panes", markup=False)

    def copy_multiplicity(self) -> None:
        data = self.shown.get(self.state.index)
        node = self.state.node
        if data is None or node is None:
            return
        from tui.numbers import digit_count, full_digits

        value = data.multiplicity.get(node, 0)
        self.copy_to_clipboard(full_digits(value))
        digits = digit_count(value)
        self.notify(f"copied the multiplicity of {self.state.tower.format(node)} ({digits:,} digits)", markup=False)

    # ----- help and the command palette -------------------------------------------------------------------
    def action_show_help(self) -> None:
        from tui.explorer.screens.help import HelpScreen

        if not isinstance(self.screen, HelpScreen):
            self.push_screen(HelpScreen())

    def get_system_commands(self, screen: Screen[Any]) -> Iterable[SystemCommand]:
        yield from super().get_system_commands(screen)
        for act in ALL:
            if act.palette:
                keys = ", ".join(key_text(k) for k in act.keys)
                yield SystemCommand(act.help[0].upper() + act.help[1:], f"key: {keys}", self._palette_callback(act))

    def _palette_callback(self, act: Act):  # noqa: ANN202 - a zero-argument callable
        target = self if act in GLOBAL else self.main
        return lambda: self.call_later(target.run_action, act.action)
