"""What every CLI command shares: reading specs, levels and labels; printing; progress on stderr."""

from __future__ import annotations

import sys
import time
from typing import TYPE_CHECKING, Any, Callable, TypeVar

if TYPE_CHECKING:  # the engine is imported by the functions that use it: `--help` and a
    # command's parser start without it (bench/bench_startup.py)
    from engine.diagram import Diagram
    from engine.tower import Node, Tower

T = TypeVar("T")


def open_diagram(spec: str) -> "Diagram":
    from engine.diagram import Diagram
    from engine.specs import parse_spec

    return Diagram(parse_spec(spec))


def level_index(tower: "Tower", text: str) -> int:
    from engine.levels import parse_level

    return tower.index_of(parse_level(text))


def node_at(tower: "Tower", index: int, label: str) -> "Node":
    return tower.parse(label, index)


def build_levels(diagram: "Diagram", index: int) -> None:
    """Build the diagram up to ``index`` (the size guard refuses first), with a delayed progress bar."""
    DelayedProgress(f"building {diagram.tower.spec}").run(lambda bar: diagram.ensure(index, progress=bar))


def print_json(document: Any) -> None:
    """One JSON object on stdout, exact ints of any size (written fast: ``engine.export.json_text``)."""
    from engine.export.json_text import dumps

    sys.stdout.write(dumps(document) + "\n")


def console():
    """A rich console on stdout (rich is imported only when a table is printed)."""
    from rich.console import Console

    from tui.cli.fit import output_width

    # the width of every text table: the terminal's, COLUMNS when set, 80 when piped
    return Console(highlight=False, soft_wrap=False, width=output_width())


class DelayedProgress:
    """A progress bar on stderr that appears only when work has run for more than ``delay`` seconds
    and stderr is a terminal.  Call it as the engine's progress callable: ``(done, total)``."""

    def __init__(self, description: str, delay: float = 1.0) -> None:
        self.description = description
        self.delay = delay
        self.start = time.monotonic()
        self._bar: Any = None
        self._task: Any = None
        self._enabled = sys.stderr.isatty()

    def __call__(self, done: float, total: float) -> None:
        if not self._enabled:
            return
        if self._bar is None:
            if time.monotonic() - self.start < self.delay:
                return
            from rich.console import Console
            from rich.progress import BarColumn, Progress, TaskProgressColumn, TextColumn, TimeElapsedColumn

            self._bar = Progress(
                TextColumn("{task.description}"), BarColumn(), TaskProgressColumn(), TimeElapsedColumn(),
                console=Console(stderr=True), transient=True,
            )
            self._bar.start()
            self._task = self._bar.add_task(self.description, total=total)
        self._bar.update(self._task, completed=done, total=total)

    def close(self) -> None:
        if self._bar is not None:
            self._bar.stop()
            self._bar = None

    def run(self, work: Callable[["DelayedProgress"], T]) -> T:
        try:
            return work(self)
        finally:
            self.close()
