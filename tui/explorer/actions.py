"""The one registry of the explorer's actions: name, keys, short label, help text.

It feeds the key bindings, the footer (``footer=True``), the help screen and the command palette,
so the four cannot drift apart.
"""

from __future__ import annotations

from dataclasses import dataclass

from textual.binding import Binding


@dataclass(frozen=True)
class Act:
    action: str  # the Textual action string, e.g. "move_level(1)"
    keys: tuple[str, ...]
    label: str  # short, for the footer and palette
    help: str  # one line, for the help screen and palette
    group: str
    footer: bool = False
    palette: bool = True


MOVE, FIND, MARK, VIEW, FILES, APP = "Moving", "Finding", "Marking", "Views", "Towers and files", "The app"

#: actions of the explorer's main screen
MAIN: tuple[Act, ...] = (
    Act("move_level(-1)", ("left", "h"), "back", "go to the previous level (half levels included)", MOVE),
    Act("move_level(1)", ("right", "l"), "on", "go to the next level", MOVE),
    Act("move_node(1)", ("down", "j"), "down", "select the next node on this level", MOVE),
    Act("move_node(-1)", ("up", "k"), "up", "select the previous node on this level", MOVE),
    Act("move_page(1)", ("pagedown",), "page down", "move the selection one page down", MOVE),
    Act("move_page(-1)", ("pageup",), "page up", "move the selection one page up", MOVE),
    Act("first_node", ("home",), "first node", "select the first node of the level", MOVE),
    Act("last_node", ("end",), "last node", "select the last node of the level", MOVE),
    Act("jump_level", ("g",), "level", "jump to a level: type 3, 2.5, 5/2 or 2+1/2", MOVE, footer=True),
    Act("find_node", ("slash", "f"), "find", "find a node on this level by typing its label", FIND, footer=True),
    Act("next_bookmark", ("apostrophe",), "next mark", "go to the next bookmarked node", FIND),
    Act("show_paths", ("p",), "paths", "browse the paths from the root to the selected node", FIND),
    Act("clear_path", ("x",), "clear path", "stop highlighting a path in the level panes", FIND),
    Act("toggle_bookmark", ("b",), "mark", "bookmark the selected node, or remove its bookmark", MARK, footer=True),
    Act("edit_note", ("n",), "note", "write a note on the selected node", MARK, footer=True),
    Act("toggle_details", ("d",), "details", "show or hide the details pane", VIEW),
    Act("scroll_details(3)", ("right_square_bracket",), "details down", "scroll the details pane down", VIEW),
    Act("scroll_details(-3)", ("left_square_bracket",), "details up", "scroll the details pane up", VIEW),
    Act("fold_details", ("z",), "fold", "fold or unfold a long formula in the details pane", VIEW),
    Act("copy_multiplicity", ("c",), "copy", "copy the exact multiplicity of the selected node to the clipboard", VIEW),
    Act("more_panes(1)", ("plus", "equals_sign"), "more panes", "show more level panes (kept in the session)", VIEW),
    Act("more_panes(-1)", ("minus",), "fewer panes", "show fewer, wider level panes (kept in the session)", VIEW),
    Act("show_diagram", ("v",), "diagram", "draw the Bratteli diagram around this level, the selection's paths highlighted", VIEW, footer=True),
    Act("plot_sums", ("m",), "plot", "plot Σm and Σm² against the algebra's dimension by level (log scale)", VIEW),
    Act("show_growth", ("w",), "growth", "finite towers: the selected node's growth against its asymptotic line, "
        "the random walk's distance by step, the McKay graph of the step", VIEW),
    Act("show_algebra", ("a",), "algebra", "the level's diagram algebra: its diagrams drawn, products, the rank "
        "of its action, the kernel and its generator, cell modules and Gram determinants", VIEW),
    Act("pick_tower", ("t",), "tower", "open another tower: pick the family, fill in its keys", FILES, footer=True),
    Act("save_session", ("s", "ctrl+s"), "save", "save the session (tower, place, bookmarks, notes, view)", FILES, footer=True),
    Act("open_session", ("o",), "open", "open a saved session file", FILES),
    Act("export_levels", ("e",), "export", "export levels 0..current as a TikZ picture, LaTeX table, DOT, CSV or JSON", FILES),
    Act("cancel_build", ("escape",), "stop", "stop the level being built", APP),
)

#: actions valid everywhere
GLOBAL: tuple[Act, ...] = (
    Act("show_help", ("question_mark", "f1"), "help", "list every key", APP, footer=True),
    Act("command_palette", ("ctrl+p",), "commands", "search all commands by name", APP, palette=False),
    Act("quit", ("q", "ctrl+q"), "quit", "leave the explorer", APP, footer=True),
)

ALL: tuple[Act, ...] = MAIN + GLOBAL

_KEY_NAMES = {"slash": "/", "apostrophe": "'", "question_mark": "?", "pagedown": "PgDn", "pageup": "PgUp",
              "left": "←", "right": "→", "up": "↑", "down": "↓", "escape": "Esc", "home": "Home", "end": "End",
              "plus": "+", "minus": "-", "equals_sign": "=", "left_square_bracket": "[", "right_square_bracket": "]"}


def key_text(key: str) -> str:
    """How a key is written on screen: ``?`` for question_mark, ``ctrl+s`` as is."""
    return _KEY_NAMES.get(key, key)


def bindings(acts: tuple[Act, ...]) -> list[Binding]:
    """Textual bindings for ``acts``: the first key of each shows in the footer when ``footer``."""
    found: list[Binding] = []
    for act in acts:
        for n, key in enumerate(act.keys):
            found.append(
                Binding(key, act.action, act.label, show=act.footer and n == 0, key_display=key_text(key))
            )
    return found
