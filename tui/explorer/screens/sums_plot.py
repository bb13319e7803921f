"""A plot of the level sums against the diagram algebra's dimension, level by level: log10 Σm,
log10 Σm² and log10 dim A_k (the numbers are exact ints far beyond floats; their logarithms are
plotted), with a vertical line where Σm² first falls below dim A_k (the algebra stops acting
faithfully).  The sums of levels 0..current are read in a worker."""

from __future__ import annotations

import math
from typing import TYPE_CHECKING

from rich.text import Text
from textual import work
from textual.app import ComposeResult
from textual.binding import Binding
from textual.screen import Screen
from textual.widgets import Footer, Static
from textual.worker import get_current_worker
from textual_plotext import PlotextPlot

from engine.errors import Cancelled, UserError
from engine.levels import format_level

if TYPE_CHECKING:
    from tui.explorer.state import ExplorerState

#: the most levels plotted (the last ones up to the current level)
MOST_LEVELS = 400


def log10(n: int) -> float:
    """log10 of a positive int of any size (plotting only)."""
    if n <= 0:
        return float("nan")
    shift = max(n.bit_length() - 1000, 0)
    return math.log10(n >> shift) + shift * math.log10(2)


class SumsPlotScreen(Screen[None]):
    BINDINGS = [Binding("escape", "close", "back", key_display="Esc"), Binding("m", "close", "back", show=False)]

    def __init__(self, state: "ExplorerState", **kwargs: object) -> None:
        super().__init__(**kwargs)  # type: ignore[arg-type]
        self.state = state
        self.series: dict[str, list[tuple[float, float]]] = {}

    def compose(self) -> ComposeResult:
        yield Static(Text("reading the level sums…"), id="plot-title")
        yield PlotextPlot(id="plot")
        yield Footer(compact=True, show_command_palette=False)

    def on_mount(self) -> None:
        self._collect()

    @work(thread=True, exclusive=True, exit_on_error=False, description="level sums")
    def _collect(self) -> None:
        state = self.state
        diagram, tower = state.diagram, state.tower
        upto = min(state.index, diagram.built)
        cancel = get_current_worker().cancelled_event
        series: dict[str, list[tuple[float, float]]] = {"Σm": [], "Σm²": [], "dim A_k": []}
        try:
            for index in range(max(0, upto - MOST_LEVELS + 1), upto + 1):
                sums = diagram.sums(index, cancel=cancel)
                x = float(tower.level_of(index))
                series["Σm"].append((x, log10(sums.multiplicities)))
                series["Σm²"].append((x, log10(sums.squares)))
                if sums.generic_dimension is not None:
                    series["dim A_k"].append((x, log10(sums.generic_dimension)))
            first = diagram.first_unfaithful_of_tower()
        except (Cancelled, UserError, AssertionError):
            return
        try:
            self.app.call_from_thread(self._draw, series, upto, first)
        except RuntimeError:  # the app is closing
            pass

    def _draw(self, series: dict[str, list[tuple[float, float]]], upto: int, first: int | None) -> None:
        tower = self.state.tower
        plot = self.query_one("#plot", PlotextPlot)
        plt = plot.plt
        plt.clear_data()
        plt.title(f"{tower.spec}: log10 of the level sums, levels 0 to {format_level(tower.level_of(upto))}")
        markers = {"Σm": "dot", "Σm²": "braille", "dim A_k": "hd"}
        for name, points in series.items():
            if points:
                plt.plot([p[0] for p in points], [p[1] for p in points], label=name, marker=markers[name])
        plt.xlabel("level k")
        plt.ylabel("log10")
        title = Text(f"Σm, Σm² and the algebra's dimension on a log scale, {tower.spec}", style="bold")
        if first is not None and first <= upto:
            x = float(tower.level_of(first))
            plt.vline(x)
            title.append(f"   │ at {format_level(tower.level_of(first))}: Σm² < dim A_k, no longer faithful")
        elif not series["dim A_k"]:
            title.append("   (this family declares no diagram algebra)")
        else:
            title.append("   faithful on every level shown")
        self.query_one("#plot-title", Static).update(title)
        plot.refresh()

    def action_close(self) -> None:
        self.workers.cancel_all()
        self.dismiss(None)
