"""The explorer: a Textual app over one ExplorerState.

Workers build levels (with progress, cancelled by Escape through the engine's cancel token) and
post messages; only the handlers here change the state, then ask the main screen to redraw.
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
from engine.files.session import save_session
from engine.levels import format_level, parse_level
from engine.tower import Node
from tui.explorer import view_model as vm
from tui.explorer.actions import ALL, GLOBAL, Act, bindings, key_text
from tui.explorer.messages import BuildFailed, BuildProgress, FaithfulFound, LevelsReady, PathShown
from tui.explorer.screens.main import MainScreen
from tui.explorer.screens.prompt import Prompt
from tui.explorer.session_files import check_open_path, check_save_path, read_session, resolve
from tui.explorer.state import ExplorerState, state_for_spec


class ExplorerApp(App[None]):
    CSS_PATH = "app.tcss"
    TITLE = "towerscope"
    BINDINGS = bindings(GLOBAL)

    def __init__(self, state: ExplorerState, *, demo: bool = False, search_faithful: bool = True) -> None:
        sys.set_int_max_str_digits(0)  # multiplicities deep in a tower have far more than 4,300 digits
        super().__init__()
        self.state = state
        self.demo = demo
        self.search_faithful = search_faithful
        self.cursor: int | None = None
        self.main = MainScreen()
        self._request = 0
        self._wanted: tuple[int, int] = (-1, -1)
        #: the level a running build is heading for (so that keys pressed meanwhile add up)
        self._pending: int | None = None
        self._faithful: dict[str, tuple[int, int | None]] = {}

    def on_mount(self) -> None:
        # Rendering leaves cyclic garbage (cached strips refer to themselves); a full collection
        # walks every tracked object and stalls a key press for 50-150 ms on a deep level. Run full
        # collections ten times less often, and one whenever the explorer has been idle a second.
        gc.set_threshold(700, 10, 100)
        self.set_interval(1.0, self._collect_when_idle)
        self._last_key = 0.0
        self.push_screen(self.main)
        self.go(self.state.index, self.state.node)

    def on_key(self) -> None:
        self._last_key = time.monotonic()

    def _collect_when_idle(self) -> None:
        if time.monotonic() - self._last_key > 1.0 and gc.get_count()[1] > 0:
            gc.collect()

    # ----- building levels ------------------------------------------------------------------------------
    def go(self, index: int, node: Node | None = None, toward: tuple[int, Node] | None = None) -> None:
        """Move to level ``index`` once it is built (node: preferred selection; toward: the place we
        came from, to select a neighbour of it)."""
        first, need = self._wanted = self._pane_span(index)
        self._request += 1
        self._pending = index
        self._build(self._request, self.state.diagram, index, node, toward, first, need)

    def _pane_span(self, index: int) -> tuple[int, int]:
        """(first level shown, deepest level needed) for the panes around level ``index``."""
        count = self.main.pane_count()
        diagram = self.state.diagram
        return vm.first_shown(diagram, index, count), vm.last_needed(diagram, index, count)

    @work(thread=True, exclusive=True, group="build", exit_on_error=False)
    def _build(self, request: int, diagram: Diagram, index: int, node: Node | None,
               toward: tuple[int, Node] | None, first: int, need: int) -> None:
        cancel = get_current_worker().cancelled_event
        try:
            diagram.ensure(need, lambda done, total: self.post_message(BuildProgress(request, done, total)), cancel)
            for i in range(first, need + 1):
                diagram.nodes(i)
            diagram.sums(index, cancel=cancel)
            level = diagram.level(index)
            if node is None and toward is not None:
                there, came_from = toward
                near = diagram.children(there, came_from) if there < index else diagram.parents(there, came_from)
                node = next((n for n, _ in near if n in level), None)
            if node is None or node not in level:
                nodes = diagram.nodes(index)
                node = nodes[0] if nodes else None
            if index > 0 and node is not None:
                diagram.parents(index, node)  # warms the reverse edges for families without parents()
            self.post_message(LevelsReady(request, index, node))
        except Cancelled:
            self.post_message(BuildFailed(request, "stopped", cancelled=True))
        except UserError as exc:
            self.post_message(BuildFailed(request, str(exc)))
        except Exception as exc:  # noqa: BLE001 - report, never crash the explorer
            self.post_message(BuildFailed(request, f"building failed: {type(exc).__name__}: {exc}"))

    def _drawable(self) -> bool:
        """False while the main screen is not (or no longer) mounted, e.g. during shutdown."""
        return bool(self.main.is_attached and self.main.query("#progress"))

    @on(BuildProgress)
    def _build_progress(self, message: BuildProgress) -> None:
        if message.request == self._request and self._pending is not None and self._drawable():
            level = format_level(self.state.tower.level_of(self._pending))
            self.main.show_progress(message.done, message.total, f"building level {level}… Esc stops")

    @on(LevelsReady)
    def _levels_ready(self, message: LevelsReady) -> None:
        if message.request != self._request or not self._drawable():
            return
        self._pending = None
        self.state.index, self.state.node = message.index, message.node
        nodes = self.state.diagram.nodes(message.index)
        self.cursor = None if message.node is None else nodes.index(message.node)
        self.main.hide_progress()
        self.main.redraw()
        # A deep level holds millions of long-lived objects; move them out of the cyclic garbage
        # collector's sight so that its full passes do not stall key presses (they are still freed
        # by reference counting when the diagram goes).
        gc.freeze()
        self._start_faithful_search()

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
        self.main.redraw()

    def cancel_build(self) -> None:
        self.workers.cancel_group(self, "build")

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

    @work(thread=True, exclusive=True, group="faithful", exit_on_error=False)
    def _search(self, diagram: Diagram, upto: int) -> None:
        try:
            first = diagram.first_unfaithful(upto, cancel=get_current_worker().cancelled_event)
        except (Cancelled, UserError):
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
        """The screen was resized or the details pane toggled: rebuild what the panes need."""
        if self._pane_span(self.state.index) != self._wanted and self._request:
            self.go(self.state.index, self.state.node)
        elif self.cursor is not None:
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
        nodes = self.state.diagram.nodes(self.state.index)
        if not nodes:
            return
        position = len(nodes) - 1 if position < 0 else min(position, len(nodes) - 1)
        self.cursor, self.state.node = position, nodes[position]
        self.main.redraw_marks(moved_only=True)

    def move_cursor(self, step: int) -> None:
        self.set_cursor(max(0, (self.cursor or 0) + step))

    def select(self, index: int, node: Node) -> None:
        if index == self.state.index and node in self.state.diagram.level(index):
            self.set_cursor(self.state.diagram.nodes(index).index(node))
        else:
            self.go(index, node)

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

    # ----- dialogs --------------------------------------------------------------------------------------
    def ask_level(self) -> None:
        tower = self.state.tower

        def check(text: str) -> tuple[str | None, str]:
            try:
                index = tower.index_of(parse_level(text))
                self.state.diagram.check_size(index)
            except UserError as exc:
                return str(exc), ""
            return None, f"{tower.spec}, level index {index}"

        def done(text: str | None) -> None:
            if text is not None:
                self.go(tower.index_of(parse_level(text)), self.state.node)

        self.push_screen(Prompt("Jump to a level", "Level (3, 2.5, 5/2 or 2+1/2):", check=check), done)

    def ask_node(self) -> None:
        from tui.explorer.screens.find_node import FindNode

        index = self.state.index

        def done(node: Node | None) -> None:
            if node is not None and index == self.state.index:
                self.select(index, node)

        self.push_screen(FindNode(self.state.diagram, index), done)

    def ask_note(self) -> None:
        state = self.state
        if state.node is None:
            return
        index, node = state.index, state.node
        label = state.tower.format(node)

        def done(text: str | None) -> None:
            if text is not None:
                state.set_note(index, node, text)
                self.main.redraw_marks()

        question = f"Note on {label} at level {format_level(state.tower.level_of(index))} (empty removes it):"
        self.push_screen(Prompt("Note", question, state.notes.get((index, node), "")), done)

    def toggle_bookmark(self) -> None:
        state = self.state
        if state.node is None:
            return
        added = state.toggle_bookmark(state.index, state.node)
        label = state.tower.format(state.node)
        self.notify(f"bookmarked {label}" if added else f"bookmark on {label} removed", markup=False)
        self.main.redraw_marks()

    def toggle_details(self) -> None:
        self.state.view.details = not self.state.view.details
        self.main.redraw()
        self.view_changed()

    def ask_tower(self) -> None:
        from tui.explorer.screens.tower_form import TowerForm

        self.push_screen(TowerForm(self.state.spec), self._open_spec)

    def _open_spec(self, spec: str | None) -> None:
        if spec is None:
            return
        try:
            state = state_for_spec(spec)
        except UserError as exc:
            self.notify(str(exc), severity="error", markup=False)
            return
        state.view = self.state.view
        self.replace_state(state)

    def replace_state(self, state: ExplorerState, demo: bool = False) -> None:
        self.workers.cancel_group(self, "build")
        self.workers.cancel_group(self, "faithful")
        self.state, self.demo, self.cursor = state, demo, None
        self.go(state.index, state.node)

    def ask_save(self) -> None:
        state = self.state
        default = "my-session.json" if self.demo or state.path is None else str(state.path)

        def done(text: str | None) -> None:
            if text is None:
                return
            path = resolve(text)
            try:
                path.parent.mkdir(parents=True, exist_ok=True)
                written = save_session(path, state.to_session())
            except (UserError, OSError) as exc:
                self.notify(str(exc), title="not saved", severity="error", markup=False)
                return
            state.path, self.demo = written, False
            self.notify(f"saved {written}", markup=False)

        self.push_screen(Prompt("Save the session", "File name or path:", default, check=check_save_path), done)

    def ask_open(self) -> None:
        self.push_screen(Prompt("Open a session", "File name or path:", check=check_open_path), self.open_file)

    def open_file(self, text: str | None) -> None:
        """Open a session file; on any problem say what it is and change nothing."""
        if text is None:
            return
        try:
            state = read_session(resolve(text))
        except UserError as exc:
            self.notify(str(exc), title="not opened", severity="error", markup=False)
            return
        self.replace_state(state)
        self.notify(f"opened {state.path}", markup=False)

    def open_path_browser(self) -> None:
        if self.state.node is None:
            return
        try:
            from tui.explorer.screens.path_browser import PathBrowser  # type: ignore[import-not-found]
        except ImportError:
            self.notify("path browser not available", severity="warning")
            return
        self.push_screen(PathBrowser(self.state.diagram, self.state.index, self.state.node))

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
