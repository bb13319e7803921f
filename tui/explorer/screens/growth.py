"""The finite-tower view (key w): for the selected node, log10 m(k) against k with the asymptotic
line log10(p·d/|G|) + k·log10(dim V); the random walk's total-variation distance against k (and the lazy walk's) (exact
rationals from the engine, their logarithms plotted); and the McKay graph of the repeating step
drawn in text cells (``widgets/mckay_picture.py``: names, dimensions, edge counts, loops), or
where it does not fit the window, every node with its dimension and its neighbours.  Keys 1, 2, 3 switch between
them; Esc or w closes.  The screen holds no mathematics: it asks ``engine.export.finite_documents``."""

from __future__ import annotations

import math
from fractions import Fraction
from typing import TYPE_CHECKING

from rich.text import Text
from textual.app import ComposeResult
from textual import work
from textual.binding import Binding
from textual.containers import VerticalScroll
from textual.message import Message
from textual.screen import Screen
from textual.widgets import Footer, Static
from textual_plotext import PlotextPlot

from engine.errors import UserError

if TYPE_CHECKING:
    from tui.explorer.state import ExplorerState

#: levels plotted and walk steps taken
LEVELS = 60


def log10(x: int | Fraction) -> float:
    """log10 of a positive int or Fraction of any size (plotting only)."""
    x = Fraction(x)
    if x <= 0:
        return float("nan")

    def big(n: int) -> float:
        shift = max(n.bit_length() - 1000, 0)
        return math.log10(n >> shift) + shift * math.log10(2)

    return big(x.numerator) - big(x.denominator)


def _closed_form(tower, label: str) -> str | None:  # noqa: ANN001 - an engine Tower
    """The node's closed form over eigenvalues as ``series`` prints it, if it has one of at most
    160 characters (two lines at 80 columns; longer ones: ``towerscope series``)."""
    from engine.export.finite_documents import series_document

    document = series_document(tower, label)
    if "closed_form" not in document:
        return None
    text = f"{document['closed_form_of']} = {document['closed_form']}"
    return text if len(text) <= 160 else None


class GrowthScreen(Screen[None]):
    DEFAULT_CSS = """
    GrowthScreen #growth-title { height: auto; }
    GrowthScreen #growth-plot { height: 1fr; }
    GrowthScreen #growth-graph { height: 1fr; }
    """

    BINDINGS = [
        Binding("escape", "close", "back", key_display="Esc"),
        Binding("w", "close", "back", show=False),
        Binding("1", "show('growth')", "growth"),
        Binding("2", "show('walk')", "walk"),
        Binding("3", "show('graph')", "McKay graph"),
    ]

    def __init__(self, state: "ExplorerState", **kwargs: object) -> None:
        super().__init__(**kwargs)  # type: ignore[arg-type]
        self.state = state
        self.mode = "growth"
        self.growth: dict | None = None
        self.walk: dict | None = None
        self.lazy: dict | None = None
        self.problem: str | None = None
        self.picture_drawn = False  # the McKay graph as a picture (else as a list: no room)
        self.closed_form: str | None = None  # "m(k) = Σ ..." of the node, when short enough to show
        self._closed_form_pending = True  # computed after the plots are shown

    def compose(self) -> ComposeResult:
        yield Static(Text("reading the tower…"), id="growth-title")
        yield PlotextPlot(id="growth-plot")
        with VerticalScroll(id="growth-graph"):
            yield Static("", id="growth-graph-text")
        yield Footer(compact=True, show_command_palette=False)

    class Ready(Message):
        """The engine's documents for the view, computed off the UI thread."""

        def __init__(self, documents: dict) -> None:
            super().__init__()
            self.documents = documents

    class ClosedFormReady(Message):
        """The node's closed form, computed after the plots (its text may load sympy)."""

        def __init__(self, text: str | None) -> None:
            super().__init__()
            self.text = text

    def on_mount(self) -> None:
        self.query_one("#growth-plot", PlotextPlot).display = False
        self.query_one("#growth-graph", VerticalScroll).display = False
        self._compute()

    @work(thread=True, exclusive=True, group="growth", exit_on_error=False, description="growth documents")
    def _compute(self) -> None:
        """The walk, lazy walk and growth, posted as soon as they are known; then the closed form
        (whose text, on the first character tower with irrational values, loads sympy: seconds).
        In a thread, so keys still answer."""
        from engine.export.finite_documents import growth_document, walk_document

        tower = self.state.tower
        label = tower.format(self.state.node) if self.state.node is not None else None
        documents: dict = {}
        try:
            # the plots need no eigenvalues (their text is what loads sympy)
            documents["walk"] = walk_document(tower, LEVELS, spectrum=False)
            documents["lazy"] = walk_document(tower, LEVELS, lazy=True, spectrum=False)
            documents["growth"] = growth_document(tower, label or documents["walk"]["nodes"][0], LEVELS)
        except UserError as exc:
            documents = {"problem": str(exc)}
        except Exception as exc:  # noqa: BLE001 - a failure is said on the screen, not left as "reading"
            documents = {"problem": f"the view could not be computed: {type(exc).__name__}: {str(exc)[:200]}"}
        self.post_message(self.Ready(documents))
        if "growth" in documents:
            try:
                text = _closed_form(tower, documents["growth"]["label"])
            except Exception:  # noqa: BLE001 - the closed form is an extra line: without it the view stands
                text = None
            self.post_message(self.ClosedFormReady(text))

    def on_growth_screen_ready(self, message: "GrowthScreen.Ready") -> None:
        d = message.documents
        self.problem = d.get("problem")
        self.walk, self.lazy, self.growth = d.get("walk"), d.get("lazy"), d.get("growth")
        self.action_show(self.mode)

    def on_growth_screen_closed_form_ready(self, message: "GrowthScreen.ClosedFormReady") -> None:
        self.closed_form, self._closed_form_pending = message.text, False
        if self.mode == "growth" and self.growth is not None:
            self.action_show(self.mode)

    def action_show(self, mode: str) -> None:
        self.mode = mode
        if self.problem is None and self.growth is None and mode != "graph":
            # still reading: shown when Ready arrives, in the mode asked last (the graph needs none)
            self.query_one("#growth-title", Static).update(Text("reading the tower…"))
            self.query_one("#growth-plot", PlotextPlot).display = False
            self.query_one("#growth-graph", VerticalScroll).display = False
            return
        plot = self.query_one("#growth-plot", PlotextPlot)
        graph = self.query_one("#growth-graph", VerticalScroll)
        title = self.query_one("#growth-title", Static)
        if self.problem is not None:
            title.update(Text(self.problem))
            plot.display = graph.display = False
            return
        plot.display = mode != "graph"
        graph.display = mode == "graph"
        if mode == "growth":
            self._draw_growth(plot, title)
        elif mode == "walk":
            self._draw_walk(plot, title)
        else:
            self._draw_graph(title)
            self.call_after_refresh(self.on_resize)  # again at the size the layout gives

    def _draw_growth(self, plot: PlotextPlot, title: Static) -> None:
        g = self.growth
        assert g is not None
        points = [(k, log10(m)) for k, m in enumerate(g["values"]) if m]
        coefficient = Fraction(g["leading"]["coefficient"])
        line = [(k, log10(coefficient) + k * math.log10(g["base"])) for k, _ in points]
        plt = plot.plt
        plt.clear_data()
        plt.clear_figure()
        if points:
            plt.plot([p[0] for p in points], [p[1] for p in points], label=f"log10 m({g['levels']})", marker="dot")
            plt.plot([p[0] for p in line], [p[1] for p in line], label="asymptotic line", marker="braille")
        plt.xlabel("k")
        plt.title(f"{g['label']}: {g['text']}")
        last = g["ratios"][-1]["approximately"] if g["ratios"] else "—"
        closed = f"\n{self.closed_form}" if self.closed_form else (
            "\nclosed form: working it out…" if self._closed_form_pending else "")
        title.update(Text(f"1 growth  2 walk  3 McKay graph │ {g['label']}: m/leading term at k = "
                          f"{g['ratios'][-1]['k'] if g['ratios'] else '—'} ≈ {last}{closed}"))
        plot.refresh()

    def _draw_walk(self, plot: PlotextPlot, title: Static) -> None:
        w = self.walk
        assert w is not None
        points = [(k, log10(Fraction(d))) for k, d in enumerate(w["distance"]) if Fraction(d) > 0]
        plt = plot.plt
        plt.clear_data()
        plt.clear_figure()
        if points:
            plt.plot([p[0] for p in points], [p[1] for p in points], label="log10 total variation", marker="dot")
        if self.lazy is not None:
            lazy = [(k, log10(Fraction(d))) for k, d in enumerate(self.lazy["distance"]) if Fraction(d) > 0]
            plt.plot([p[0] for p in lazy], [p[1] for p in lazy], label="lazy walk ½(I + P)", marker="braille")
        plt.xlabel("steps k")
        plt.title("the walk from the trivial module: distance to the stationary law")
        lazy = self.lazy["mixing_time"] if self.lazy is not None else None
        word = (f"periodic (period {w['period']}): the distance does not tend to 0; lazy mixing time "
                f"to {w['epsilon']}: {lazy}" if w["period"] > 1 else f"mixing time to {w['epsilon']}: {w['mixing_time']}")
        law = "Plancherel d²/|G|" if w["plancherel"] else "stationary law on the nodes reached"
        title.update(Text(f"1 growth  2 walk  3 McKay graph │ {law}; {word}"))
        plot.refresh()

    def _draw_graph(self, title: Static) -> None:
        from engine.series.finite import finite_view
        from tui.explorer.widgets.mckay_picture import picture_text

        try:
            view = finite_view(self.state.tower, "the McKay graph")
        except UserError as exc:
            title.update(Text(str(exc)))
            return
        graph = self.query_one("#growth-graph", VerticalScroll)
        width, height = graph.size.width - 1, graph.size.height
        if width < 10 or height < 3:  # not laid out yet: drawn again on the next resize
            width, height = max(self.size.width - 1, 10), max(self.size.height - 3, 3)
        text, drawn = picture_text(view, width, height)
        self.picture_drawn = drawn
        self.query_one("#growth-graph-text", Static).update(text)
        title.update(Text(f"1 growth  2 walk  3 McKay graph │ the step of {view.spec}: {view.size} nodes, "
                          f"Σ_j M_ij d_j = {view.constant}·d_i, ◆ the root"))

    def on_resize(self) -> None:
        if self.mode == "graph" and self.problem is None:
            self._draw_graph(self.query_one("#growth-title", Static))

    def action_close(self) -> None:
        self.dismiss(None)
