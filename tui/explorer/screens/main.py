"""The explorer's main screen: level panes side by side, the details pane, the sums bar."""

from __future__ import annotations

from typing import TYPE_CHECKING

from textual.app import ComposeResult
from textual.containers import Horizontal
from textual.screen import Screen
from textual.widgets import Footer, ProgressBar

from engine.files.session import MAX_PANES
from tui.explorer import view_model as vm
from tui.explorer.actions import MAIN, bindings
from tui.explorer.widgets.details import DetailsPane
from tui.explorer.widgets.level_pane import LevelPane
from tui.explorer.widgets.sums_bar import SumsBar

if TYPE_CHECKING:
    from tui.explorer.app import ExplorerApp


class MainScreen(Screen[None]):
    """Draws the app's state; its actions (from the registry) ask the app to change it."""

    BINDINGS = bindings(MAIN)
    AUTO_FOCUS = None

    def compose(self) -> ComposeResult:
        with Horizontal(id="body"):
            with Horizontal(id="panes"):
                for n in range(MAX_PANES):
                    yield LevelPane(id=f"pane-{n}", classes="level-pane")
            yield DetailsPane(id="details")
        with Horizontal(id="status"):
            yield SumsBar("", id="sums")
            yield ProgressBar(id="progress", show_eta=False, show_percentage=True)
        yield Footer(compact=True, show_command_palette=False)

    @property
    def explorer(self) -> "ExplorerApp":
        return self.app  # type: ignore[return-value]

    def on_mount(self) -> None:
        self.query_one("#progress", ProgressBar).display = False

    def on_resize(self) -> None:
        self.explorer.view_changed()

    # ----- layout -------------------------------------------------------------------------------------
    def pane_count(self) -> int:
        state = self.explorer.state
        return vm.pane_count(self.size.width or 80, state.view.details, state.view.panes)

    def panes(self) -> list[LevelPane]:
        return list(self.query(LevelPane))

    # ----- drawing ------------------------------------------------------------------------------------
    def redraw(self) -> None:
        """Everything from the app's state (after a level is ready, a tower is opened, ...)."""
        state = self.explorer.state
        diagram = state.diagram
        count = self.pane_count()
        first = vm.first_shown(diagram, state.index, count)
        details = self.query_one("#details", DetailsPane)
        details.display = state.view.details
        details.styles.width = vm.details_width(self.size.width or 80)
        cursor = self.explorer.cursor
        for n, pane in enumerate(self.panes()):
            index = first + n
            pane.display = n < count
            if n >= count:
                continue
            pane.set_class(index == state.index, "-current")
            pane.show(vm.level_rows(diagram, index), vm.pane_marks(state, index, cursor))
            if index == state.index and cursor is not None:
                pane.scroll_to_center_if_needed(cursor)
        self.redraw_details()
        self.redraw_sums()

    def redraw_marks(self, moved_only: bool = False) -> None:
        """After the selection moved within the level: the cursor, the links, the details."""
        state = self.explorer.state
        count = self.pane_count()
        first = vm.first_shown(state.diagram, state.index, count)
        cursor = self.explorer.cursor
        for n, pane in enumerate(self.panes()[:count]):
            index = first + n
            if index == state.index and moved_only and cursor is not None:
                pane.move_cursor(cursor)
            elif pane.rows is not None or index == state.index:
                marks = vm.pane_marks(state, index, cursor)
                if moved_only and index != state.index and not marks.links and not pane.marks.links:
                    continue
                pane.show(pane.rows, marks)
        self.redraw_details()

    def redraw_details(self) -> None:
        state = self.explorer.state
        if state.view.details:
            self.query_one("#details", DetailsPane).show(vm.node_details(state))

    def redraw_sums(self) -> None:
        self.query_one("#sums", SumsBar).show(vm.sums_line(self.explorer.state, self.explorer.unfaithful()))

    def show_progress(self, done: float, total: float, text: str) -> None:
        bar = self.query_one("#progress", ProgressBar)
        bar.display = True
        bar.update(total=max(total, 1e-9), progress=done)
        self.query_one("#sums", SumsBar).show(None, text)

    def hide_progress(self) -> None:
        self.query_one("#progress", ProgressBar).display = False
        self.redraw_sums()

    # ----- actions: moving ------------------------------------------------------------------------------
    def action_move_level(self, step: int) -> None:
        self.explorer.step_level(step)

    def action_move_node(self, step: int) -> None:
        self.explorer.move_cursor(step)

    def action_first_node(self) -> None:
        self.explorer.set_cursor(0)

    def action_last_node(self) -> None:
        self.explorer.set_cursor(-1)

    def action_jump_level(self) -> None:
        self.explorer.ask_level()

    def action_find_node(self) -> None:
        self.explorer.ask_node()

    def action_next_bookmark(self) -> None:
        self.explorer.go_next_bookmark()

    def action_show_paths(self) -> None:
        self.explorer.open_path_browser()

    def action_clear_path(self) -> None:
        self.explorer.highlight_path([])

    # ----- actions: marking, files ----------------------------------------------------------------------
    def action_toggle_bookmark(self) -> None:
        self.explorer.toggle_bookmark()

    def action_edit_note(self) -> None:
        self.explorer.ask_note()

    def action_toggle_details(self) -> None:
        self.explorer.toggle_details()

    def action_pick_tower(self) -> None:
        self.explorer.ask_tower()

    def action_save_session(self) -> None:
        self.explorer.ask_save()

    def action_open_session(self) -> None:
        self.explorer.ask_open()

    def action_export_levels(self) -> None:
        from tui.explorer.exporting import ask_export

        ask_export(self.explorer)

    def action_cancel_build(self) -> None:
        self.explorer.cancel_build()

