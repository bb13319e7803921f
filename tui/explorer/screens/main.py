"""The explorer's main screen: a header line, level panes side by side, the details pane, the
sums bar (and, on the first start, a one-line legend)."""

from __future__ import annotations

from typing import TYPE_CHECKING

from rich.text import Text
from textual.app import ComposeResult
from textual.containers import Horizontal
from textual.screen import Screen
from textual.widgets import Footer, ProgressBar, Static

from tui.explorer import view_model as vm
from tui.explorer.actions import MAIN, bindings
from tui.explorer.view_settings import MAX_PANES
from tui.explorer.widgets.details import DetailsPane
from tui.explorer.widgets.level_pane import LevelPane
from tui.explorer.widgets.sums_bar import SumsBar

if TYPE_CHECKING:
    from tui.explorer.app import ExplorerApp

LEGEND = "▶ selected  1-9: edges to it  • path  * bookmark  ✎ note  ✓ Σm·dim = dim V⊗k   ? keys"


class MainScreen(Screen[None]):
    """Draws the app's state; its actions (from the registry) ask the app to change it."""

    BINDINGS = bindings(MAIN)
    AUTO_FOCUS = None

    def compose(self) -> ComposeResult:
        yield Static("", id="header")
        yield Static(Text(LEGEND), id="legend")
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
        self.query_one("#legend", Static).display = self.explorer.first_start
        self.redraw_header()

    def on_resize(self) -> None:
        self.explorer.view_changed()

    # ----- layout -------------------------------------------------------------------------------------
    def layout_for(self, index: int) -> vm.Layout:
        app = self.explorer
        shown = app.shown
        current = shown.get(index) or shown.get(app.state.index)
        width = current.width if current is not None else 30
        sides = [d.width for i, d in shown.items() if i != index]
        side = max(sides) if sides else width
        view = app.state.view
        return vm.layout(self.size.width or 80, view.details, view.panes, width, side)

    def pane_count_for(self, index: int) -> int:
        return self.layout_for(index).count

    def wanted_levels(self) -> list[int]:
        state = self.explorer.state
        return vm.span(state.diagram, state.index, self.pane_count_for(state.index))

    def panes(self) -> list[LevelPane]:
        return list(self.query(LevelPane))

    def page_rows(self) -> int:
        current = [p for p in self.panes() if p.has_class("-current")]
        return current[0].page() if current else 10

    # ----- drawing ------------------------------------------------------------------------------------
    def redraw(self) -> None:
        """Everything from the app's state (after a level is ready, a tower is opened, ...)."""
        self.redraw_header()
        self.redraw_panes()
        self.redraw_details()
        self.redraw_sums()

    def redraw_header(self) -> None:
        app = self.explorer
        state = app.state
        parts = [f"towerscope  {state.spec}"]
        if app.demo:
            parts.append("demo session")
        elif state.path is not None:
            parts.append(shown_path(state.path))
        else:
            parts.append("not saved yet")
        text = "  ·  ".join(parts)
        header = Text(text, no_wrap=True, overflow="ellipsis")
        if state.modified:
            header.append("  ● modified", style="bold")
        self.query_one("#header", Static).update(header)

    def redraw_panes(self) -> None:
        app = self.explorer
        state = app.state
        diagram = state.diagram
        lay = self.layout_for(state.index)
        first = vm.first_shown(diagram, state.index, lay.count)
        details = self.query_one("#details", DetailsPane)
        details.display = state.view.details
        details.styles.width = lay.details_width
        cursor = app.cursor
        last = diagram.tower.max_index
        for n, pane in enumerate(self.panes()):
            index = first + n
            pane.display = n < lay.count and (last is None or index <= last)
            if not pane.display:
                continue
            is_current = index == state.index
            pane.set_class(is_current, "-current")
            pane.styles.width = lay.current_width if is_current and lay.count > 1 else "1fr"
            data = app.shown.get(index)
            if data is None:
                pane.show_waiting(vm.level_text(diagram, index), "  building…")
                continue
            marks = vm.pane_marks(state, index, cursor, app.shown)
            pane.show(vm.level_rows(diagram, data), marks)
            if is_current and cursor is not None:
                pane.scroll_to_center_if_needed(cursor)
            elif marks.links:
                pane.scroll_to_nodes(list(marks.links))

    def redraw_marks(self, moved_only: bool = False) -> None:
        """After the selection moved within the level: the cursor, the links, the details."""
        state = self.explorer.state
        cursor = self.explorer.cursor
        for pane in self.panes():
            if not pane.display or pane.rows is None:
                continue
            index = pane.rows.index
            if index == state.index and moved_only and cursor is not None:
                pane.move_cursor(cursor)
                continue
            marks = vm.pane_marks(state, index, cursor, self.explorer.shown)
            if moved_only and index != state.index and not marks.links and not pane.marks.links:
                continue
            pane.show(pane.rows, marks)
            if marks.links:
                pane.scroll_to_nodes(list(marks.links))
        self.redraw_details()

    def redraw_details(self) -> None:
        app = self.explorer
        state = app.state
        if state.view.details:
            details = self.query_one("#details", DetailsPane)
            details.unfold = getattr(app, "unfold", False)
            details.show(vm.node_details(state, app.shown.get(state.index), app.shown))

    def redraw_sums(self) -> None:
        app = self.explorer
        self.query_one("#sums", SumsBar).show(vm.sums_line(app.state, app.sums, app.unfaithful()))

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

    def action_move_page(self, pages: int) -> None:
        self.explorer.move_page(pages)

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

    # ----- actions: views -------------------------------------------------------------------------------
    def action_more_panes(self, step: int) -> None:
        self.explorer.change_panes(step)

    def action_scroll_details(self, lines: int) -> None:
        details = self.query_one("#details", DetailsPane)
        if details.display:
            details.scroll_relative(y=lines, animate=False)

    def action_fold_details(self) -> None:
        app = self.explorer
        app.unfold = not getattr(app, "unfold", False)
        self.redraw_details()

    def action_copy_multiplicity(self) -> None:
        self.explorer.copy_multiplicity()

    def action_show_diagram(self) -> None:
        from tui.explorer.screens.bratteli import BratteliScreen

        self.app.push_screen(BratteliScreen(self.explorer.state))

    def action_plot_sums(self) -> None:
        from tui.explorer.screens.sums_plot import SumsPlotScreen

        self.app.push_screen(SumsPlotScreen(self.explorer.state))

    def action_show_growth(self) -> None:
        from tui.explorer.screens.growth import GrowthScreen

        self.app.push_screen(GrowthScreen(self.explorer.state))

    def action_show_algebra(self) -> None:
        from engine.errors import UserError
        from tui.explorer.screens.algebra import AlgebraView

        state = self.explorer.state
        try:
            self.app.push_screen(AlgebraView(state.diagram, state.index, state.node))
        except UserError as exc:
            self.notify(str(exc), severity="warning", markup=False)

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


def shown_path(path) -> str:  # noqa: ANN001 - a pathlib.Path
    """A session file as the header shows it: relative to the working folder when inside it, with
    ~ for the home folder otherwise (the same wherever the project is checked out)."""
    from pathlib import Path

    full = Path(path)
    try:
        return str(full.resolve().relative_to(Path.cwd().resolve()))
    except (ValueError, OSError):
        pass
    try:
        return "~/" + str(full.resolve().relative_to(Path.home().resolve()))
    except (ValueError, OSError, RuntimeError):
        return str(full)
