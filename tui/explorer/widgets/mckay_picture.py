"""The McKay graph of the repeating step as the growth view shows it (key 3): the picture of
``engine.walks.graph_picture`` sized to the cells free, or, where it does not fit, the reason and
the list of every node with its neighbours.  Styles only underline what the characters already say
(bold node names, the root reversed); nothing is told by colour alone."""

from __future__ import annotations

from rich.text import Text

from engine.series.finite import FiniteView
from engine.walks.graph_picture import NoRoom, Picture, draw_graph



def picture_text(view: FiniteView, width: int, height: int) -> tuple[Text, bool]:
    """The text for ``width`` × ``height`` cells and whether it is the picture (else the list)."""
    drawn = draw_graph(view.labels, view.dimensions, view.matrix, view.root, width, max(height - 1, 1))
    if isinstance(drawn, Picture):
        return _picture(view, drawn, width), True
    return _listing(view, drawn, width), False


def legend(picture: Picture) -> str:
    """The marks the picture uses, explained in one line."""
    rows = "".join(picture.rows)
    parts = ["◆ root", "dN dimension"]
    parts += ["↺ loop (↺m: m loops)"] if picture.loops else []
    parts += ["×m m edges"] if "×" in rows or any(n.edge.count > 1 for n in picture.notes) else []
    parts += ["► ◄ ▲ ▼ direction"] if any(e.directed for e in picture.edges) else []
    parts += ["┼ lines crossing"] if "┼" in rows else []
    return " · ".join(parts)


def _picture(view: FiniteView, picture: Picture, width: int) -> Text:
    pad = max((width - picture.width) // 2, 0)
    starts = {}
    for node in picture.nodes:
        starts.setdefault(node.row, []).append(node)
    out = Text(no_wrap=True, overflow="crop")
    for y, row in enumerate(picture.rows):
        line = Text(" " * pad + row)
        for node in starts.get(y, ()):
            style = "bold reverse" if node.index == view.root else "bold"
            line.stylize(style, pad + node.start, pad + node.start + len(node.text))
        out.append_text(line)
        out.append("\n")
    for note in picture.notes:
        e = note.edge
        sign = "→" if e.directed else "—"
        out.append(f"{view.labels[e.a]} {sign} {view.labels[e.b]}: {e.count} edge{'s' if e.count > 1 else ''} "
                   "(no room on its line)\n")
    words = legend(picture)
    out.append(" " * max(min(pad, width - len(words)), 0) + words[:width], style="dim")
    return out


def _listing(view: FiniteView, refused: NoRoom, width: int) -> Text:
    label_width = max(len(label) for label in view.labels)
    out = Text(no_wrap=False)
    out.append(f"no picture here: {refused.reason}; every node with its neighbours instead\n", style="italic")
    for i, label in enumerate(view.labels):
        edges = []
        for j, m in enumerate(view.matrix[i]):
            if m:
                edges.append(f"{view.labels[j]}" + (f"×{m}" if m > 1 else "") + (" (loop)" if i == j else ""))
        mark = "◆" if i == view.root else "●"
        out.append(f"{mark} {label:<{label_width}} d={view.dimensions[i]:<4}", style="bold" if i == view.root else "")
        out.append(" ── " + ", ".join(edges) + "\n")
    return out
