"""The explorer's dialogs, mixed into the app: jump, find, note, bookmark, tower, save, open; the
guard that asks before unsaved bookmarks and notes are lost, and the autosave behind it."""

from __future__ import annotations

from pathlib import Path
from typing import Callable

from engine.errors import UserError
from engine.levels import format_level, parse_level
from engine.tower import Node
from tui.explorer import view_model as vm
from tui.explorer.screens.choice import Choice
from tui.explorer.screens.prompt import Prompt
from tui.explorer.session_files import (
    check_save_path,
    drop_autosave,
    read_session,
    resolve,
    session_text,
    write_autosave,
)
from tui.explorer.state import ExplorerState, state_for_spec


class Dialogs:
    """Needs ``state``, ``main``, ``go``, ``select``, ``notify``, ``push_screen`` from the app."""

    # ----- changes, the autosave and the guard ------------------------------------------------------------
    def mark_modified(self) -> None:
        """Bookmarks, notes or the view changed: show the mark, keep an autosave."""
        state = self.state  # type: ignore[attr-defined]
        state.modified = True
        if getattr(self, "autosave", False):
            try:
                write_autosave(session_text(state), state.path)
            except (OSError, UserError):
                pass  # the autosave is a safety net; the header still shows the unsaved mark
        self.main.redraw_header()  # type: ignore[attr-defined]

    def saved(self) -> None:
        self.state.modified = False  # type: ignore[attr-defined]
        drop_autosave()
        self.main.redraw_header()  # type: ignore[attr-defined]

    def guard_unsaved(self, then: Callable[[], None], doing: str) -> None:
        """Run ``then`` now, or after asking to save, discard or stay when there are unsaved changes."""
        state = self.state  # type: ignore[attr-defined]
        if not state.modified:
            then()
            return

        def chosen(answer: str | None) -> None:
            if answer == "save":
                self.ask_save(after=then)
            elif answer == "discard":
                drop_autosave()
                then()

        where = "" if state.path is None else f" in {state.path.name}"
        self.push_screen(  # type: ignore[attr-defined]
            Choice("Unsaved changes", f"Bookmarks or notes{where} are not saved. Save them before {doing}?",
                   [("s", "save", "save"), ("d", "discard", "discard them"), ("escape", "stay", "stay here")]),
            chosen,
        )

    def action_quit(self) -> None:
        if isinstance(self.screen, Choice):  # type: ignore[attr-defined]
            return  # already asking

        def leave() -> None:
            if not self.state.modified:  # type: ignore[attr-defined]
                drop_autosave()
            self.exit()  # type: ignore[attr-defined]

        self.guard_unsaved(leave, "quitting")

    def offer_restore(self, restored: ExplorerState) -> None:
        marks = f"{len(restored.bookmarks)} bookmarks, {len(restored.notes)} notes"

        def chosen(answer: str | None) -> None:
            if answer == "restore":
                self.replace_state(restored)
                self.mark_modified()
                self.notify("restored the unsaved session; save it with s", markup=False)  # type: ignore[attr-defined]
            elif answer == "discard":
                drop_autosave()

        self.push_screen(  # type: ignore[attr-defined]
            Choice("Restore unsaved work?", f"towerscope stopped last time with unsaved changes on {restored.spec} "
                   f"({marks}). Restore them?",
                   [("r", "restore", "restore"), ("d", "discard", "discard them"), ("escape", "later", "not now")]),
            chosen,
        )

    # ----- places ---------------------------------------------------------------------------------------
    def ask_level(self) -> None:
        state = self.state  # type: ignore[attr-defined]
        tower, diagram = state.tower, state.diagram

        def check(text: str) -> tuple[str | None, str]:
            if not text.strip():
                return "", f"{tower.spec}: levels 0, 1/2, 1, …" if tower.level_of(1) != 1 else f"{tower.spec}: levels 0, 1, 2, …"
            try:
                level = parse_level(text)
                index = tower.index_of(level)
                tower.check_index(index)
                if vm.by_jump(diagram, index):
                    diagram.check_digits(index)
                else:
                    diagram.check_size(index)
            except UserError as exc:
                return str(exc), ""
            how = " (by a jump: the levels below are not built)" if vm.by_jump(diagram, index) else ""
            return None, f"{tower.spec}, level {format_level(tower.level_of(index))}{how}"

        def done(text: str | None) -> None:
            if text is not None:
                self.go(tower.index_of(parse_level(text)), state.node)  # type: ignore[attr-defined]

        self.push_screen(Prompt("Jump to a level", "Level (3, 2.5, 5/2 or 2+1/2):", check=check), done)  # type: ignore[attr-defined]

    def ask_node(self) -> None:
        from tui.explorer.screens.find_node import FindNode

        state = self.state  # type: ignore[attr-defined]
        index = state.index
        data = self.shown.get(index)  # type: ignore[attr-defined]
        if data is None:
            return

        def done(node: Node | None) -> None:
            if node is not None and index == self.state.index:  # type: ignore[attr-defined]
                self.select(index, node)  # type: ignore[attr-defined]

        self.push_screen(FindNode(state.diagram, index, data.nodes, data.multiplicity), done)  # type: ignore[attr-defined]

    def ask_note(self) -> None:
        state = self.state  # type: ignore[attr-defined]
        if state.node is None:
            return
        index, node = state.index, state.node
        label = state.tower.format(node)

        def done(text: str | None) -> None:
            if text is not None and text.strip() != state.notes.get((index, node), ""):
                state.set_note(index, node, text)
                self.mark_modified()
                self.main.redraw_marks()  # type: ignore[attr-defined]

        question = f"Note on {label} at level {format_level(state.tower.level_of(index))} (empty removes it):"
        self.push_screen(Prompt("Note", question, state.notes.get((index, node), "")), done)  # type: ignore[attr-defined]

    def toggle_bookmark(self) -> None:
        state = self.state  # type: ignore[attr-defined]
        if state.node is None:
            return
        added = state.toggle_bookmark(state.index, state.node)
        label = state.tower.format(state.node)
        self.notify(f"bookmarked {label}" if added else f"bookmark on {label} removed", markup=False)  # type: ignore[attr-defined]
        self.mark_modified()
        self.main.redraw_marks()  # type: ignore[attr-defined]

    def toggle_details(self) -> None:
        self.state.view.details = not self.state.view.details  # type: ignore[attr-defined]
        self.view_changed()  # type: ignore[attr-defined]
        self.main.redraw()  # type: ignore[attr-defined]

    # ----- towers and files -------------------------------------------------------------------------------
    def ask_tower(self) -> None:
        from tui.explorer.screens.tower_form import TowerForm

        self.guard_unsaved(lambda: self.push_screen(TowerForm(self.state.spec), self._open_spec),  # type: ignore[attr-defined]
                           "opening another tower")

    def _open_spec(self, spec: str | None) -> None:
        if spec is None:
            return
        try:
            state = state_for_spec(spec)
        except UserError as exc:
            self.notify(str(exc), severity="error", markup=False)  # type: ignore[attr-defined]
            return
        state.view = self.state.view  # type: ignore[attr-defined]
        self.replace_state(state)
        drop_autosave()

    def replace_state(self, state: ExplorerState, demo: bool = False) -> None:
        self.workers.cancel_group(self, "build")  # type: ignore[attr-defined]
        self.workers.cancel_group(self, "faithful")  # type: ignore[attr-defined]
        self.forget_levels()  # type: ignore[attr-defined]
        self.state, self.demo, self.cursor = state, demo, None  # type: ignore[attr-defined]
        self.main.redraw_header()  # type: ignore[attr-defined]
        self.go(state.index, state.node)  # type: ignore[attr-defined]
        self.show_notices()  # type: ignore[attr-defined]

    def ask_save(self, after: Callable[[], None] | None = None) -> None:
        state = self.state  # type: ignore[attr-defined]
        default = "my-session.json" if self.demo or state.path is None else str(state.path)  # type: ignore[attr-defined]

        def write(text: str) -> str | None:
            """Save; the message of a failure (the dialog then stays open with it)."""
            try:
                path = resolve(text)
                path.parent.mkdir(parents=True, exist_ok=True)
                from engine.files.session import save_session

                written = save_session(path, state.to_session())
            except (UserError, OSError, ValueError) as exc:
                return f"not saved: {exc.strerror if isinstance(exc, OSError) and exc.strerror else exc}"
            state.path, self.demo = written, False  # type: ignore[attr-defined]
            self.saved()
            self.notify(f"saved {written}", markup=False)  # type: ignore[attr-defined]
            return None

        def done(text: str | None) -> None:
            if text is not None and after is not None:
                after()

        self.push_screen(  # type: ignore[attr-defined]
            Prompt("Save the session", "File name or path:", default, check=check_save_path, accept=write), done
        )

    def ask_open(self) -> None:
        from tui.explorer.screens.open_session import OpenSession

        self.guard_unsaved(lambda: self.push_screen(OpenSession(), self.open_file), "opening another session")  # type: ignore[attr-defined]

    def open_file(self, text: str | Path | None) -> None:
        """Open a session file; on any problem say what it is and change nothing."""
        if text is None:
            return
        try:
            state = read_session(resolve(str(text)))
        except (OSError, ValueError) as exc:
            self.notify(f"cannot open that path: {exc}"[:300], title="not opened", severity="error", markup=False)  # type: ignore[attr-defined]
            return
        except UserError as exc:
            self.notify(str(exc), title="not opened", severity="error", markup=False)  # type: ignore[attr-defined]
            return
        self.replace_state(state)
        drop_autosave()
        self.notify(f"opened {state.path}", markup=False)  # type: ignore[attr-defined]

    def open_path_browser(self) -> None:
        state = self.state  # type: ignore[attr-defined]
        if state.node is None:
            return
        if state.index > state.diagram.built:
            self.notify("paths are listed on built levels; this level was reached by a jump", severity="warning")  # type: ignore[attr-defined]
            return
        from tui.explorer.screens.path_browser import PathBrowser

        self.push_screen(PathBrowser(state.diagram, state.index, state.node))  # type: ignore[attr-defined]
