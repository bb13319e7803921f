"""The algebra view: the diagram algebra of the current level, its basis drawn, products, the rank
of its action on V^{⊗k} beside Σm², the kernel and its generator, and the cell modules.

``AlgebraView(diagram, index, node)``.  Keys: ↓/↑ the next or previous basis diagram, PgDn/PgUp
ten on, g go to a rank or a diagram typed in the contract's notation, 1 and 2 take the shown
diagram as the left or right factor (their product is shown), r computes the rank of the action
(exact linear algebra, in a worker), k the kernel (its dimension, its first elements and, where the
family knows one, the generator with the dimension of the ideal it generates), c the cell modules
(the Gram determinants' zeros: the parameters where the level is not semisimple; the table at
x = N beside the tower), Esc stops a computation or closes.  The screen holds no mathematics: it
asks ``engine.algebras``.
"""

from __future__ import annotations

from typing import Any

from dataclasses import dataclass

from rich.text import Text
from textual import on, work
from textual.app import ComposeResult
from textual.binding import Binding
from textual.containers import Vertical, VerticalScroll
from textual.message import Message
from textual.screen import ModalScreen
from textual.widgets import ProgressBar, Static
from textual.worker import get_current_worker

from engine.capabilities import AlgebraLevel
from engine.diagram import Diagram
from engine.errors import Cancelled, UserError
from engine.levels import format_level
from engine.tower import Node

KEYS = ("↓↑ next/previous diagram  PgDn/PgUp ten  g go to a rank or diagram  1/2 left/right factor  "
        "r rank  k kernel  c cell modules  Esc stop or close")


class AlgebraView(ModalScreen[None]):
    """The diagram algebra at level index ``index`` of ``diagram``'s tower."""

    @dataclass
    class Progressed(Message):
        done: float
        total: float

        def can_replace(self, message: Message) -> bool:
            return isinstance(message, AlgebraView.Progressed)

    @dataclass
    class Finished(Message):
        attribute: str
        text: str

    @dataclass
    class Failed(Message):
        text: str

    DEFAULT_CSS = """
    AlgebraView { align: center middle; }
    AlgebraView > #algebra-box { width: 96%; height: 94%; border: round $accent; background: $panel; padding: 0 1; }
    AlgebraView #algebra-title { text-style: bold; }
    AlgebraView #algebra-body { height: 1fr; }
    AlgebraView #algebra-keys { color: $text-muted; }
    AlgebraView ProgressBar { display: none; }
    AlgebraView ProgressBar.-busy { display: block; }
    """

    BINDINGS = [
        Binding("escape", "close", "Close"),
        Binding("down", "step(1)", "Next"),
        Binding("up", "step(-1)", "Previous"),
        Binding("pagedown", "step(10)", "10 on", show=False),
        Binding("pageup", "step(-10)", "10 back", show=False),
        Binding("g", "go", "Go to"),
        Binding("1", "factor(0)", "Left factor"),
        Binding("2", "factor(1)", "Right factor"),
        Binding("r", "rank", "Rank"),
        Binding("k", "kernel", "Kernel"),
        Binding("c", "cells", "Cell modules"),
    ]

    def __init__(self, diagram: Diagram, index: int, node: Node | None = None) -> None:
        super().__init__()
        self.diagram = diagram
        self.index = index
        self.node = node
        found = diagram.algebra(index)
        if found is None:
            raise UserError(f"{diagram.tower.spec} has no diagram algebra")
        self.algebra: AlgebraLevel = found
        self.position = 0
        self.factors: list[Any] = [None, None]
        self.rank_text = "rank of the action: press r to compute it"
        self.kernel_text = ""
        self.cells_text = ""
        self.busy = False

    # ----- layout -----------------------------------------------------------------------------------
    def compose(self) -> ComposeResult:
        a = self.algebra
        where = format_level(a.level)
        with Vertical(id="algebra-box"):
            yield Static(Text(f"{a.name} at level {where} of {self.diagram.tower.spec}"), id="algebra-title")
            yield ProgressBar(show_eta=False, id="algebra-progress")
            with VerticalScroll(id="algebra-body"):
                yield Static("", id="algebra-summary")
                yield Static("", id="algebra-diagram")
                yield Static("", id="algebra-product")
                yield Static("", id="algebra-kernel")
                yield Static("", id="algebra-cells")
            yield Static(Text(KEYS), id="algebra-keys")

    def on_mount(self) -> None:
        self._show_summary()
        self._show_diagram()
        self._show_product()

    def on_resize(self) -> None:
        # the drawings are laid out for a width (strands 4, 3 or 2 columns apart, or listed):
        # drawn again when the terminal's width changes it
        if self._width() != self.drawn_width:
            self._show_diagram()
            self._show_product()

    # ----- drawing ----------------------------------------------------------------------------------
    def _summary_lines(self) -> list[str]:
        a = self.algebra
        sums = self.diagram.sums_of(self.index, self.diagram.level_at(self.index))
        parameter = "no parameter" if a.parameter is None else f"parameter x = {a.parameter}"
        lines = [f"{a.dimension:,} basis diagrams · {parameter} · acts on V^⊗k, V = C^{a.n}",
                 f"Σm² (the centralizer's dimension, from the Bratteli diagram) = {sums.squares:,}"
                 + ("  · acts faithfully" if sums.faithful else f"  · kernel of dimension {a.dimension - sums.squares:,}"),
                 self.rank_text]
        return lines

    def _show_summary(self) -> None:
        self.query_one("#algebra-summary", Static).update(Text("\n".join(self._summary_lines())))

    def _width(self) -> int:
        return max(30, self.size.width - 6)

    #: the width the shown drawings were laid out for
    drawn_width = 0

    def _show_diagram(self) -> None:
        from engine.algebras.bases import unrank
        from engine.algebras.diagrams import format_diagram
        from engine.algebras.drawing import draw

        a = self.algebra
        if a.dimension == 0:
            self.query_one("#algebra-diagram", Static).update(Text("the basis is empty"))
            return
        d = unrank(a, self.position)
        self.shown = d
        self.drawn_width = self._width()
        lines = [f"diagram {self.position:,} of 0..{a.dimension - 1:,}: {format_diagram(d, a.vertices)}"]
        lines += ["  " + line for line in draw(d, a.vertices, self.drawn_width)]
        self.query_one("#algebra-diagram", Static).update(Text("\n".join(lines)))

    def _show_product(self) -> None:
        from engine.algebras.diagrams import format_diagram
        from engine.algebras.elements import format_element
        from engine.algebras.products import multiply_diagrams

        a = self.algebra
        left, right = self.factors
        names = ["1 takes the shown diagram as the left factor", "2 as the right factor"]
        if left is None or right is None:
            parts = [f"left: {format_diagram(left, a.vertices)}" if left is not None else names[0],
                     f"right: {format_diagram(right, a.vertices)}" if right is not None else names[1]]
            self.query_one("#algebra-product", Static).update(Text("product: " + "; ".join(parts)))
            return
        product, coefficient = multiply_diagrams(left, right, a)
        text = format_element({product: coefficient} if coefficient else {}, a) if coefficient != 0 else "0"
        lines = [f"product {format_diagram(left, a.vertices)} · {format_diagram(right, a.vertices)}",
                 f"  = {text}"]
        if coefficient:
            from engine.algebras.drawing import draw

            lines += ["  " + line for line in draw(product, a.vertices, self._width())]
        self.query_one("#algebra-product", Static).update(Text("\n".join(lines)))

    # ----- actions ----------------------------------------------------------------------------------
    def action_close(self) -> None:
        if self.busy:
            self.workers.cancel_group(self, "algebra")
            self._done("stopped")
            return
        self.dismiss(None)

    def action_step(self, step: int) -> None:
        if self.algebra.dimension:
            self.position = max(0, min(self.algebra.dimension - 1, self.position + step))
            self._show_diagram()

    def action_go(self) -> None:
        from tui.explorer.screens.prompt import Prompt

        self.app.push_screen(
            Prompt("Go to a diagram", f"a rank 0..{self.algebra.dimension - 1:,} or a diagram such as "
                   "{1,2'},{2,1'}", check=self._check_target, placeholder="rank or diagram"),
            self._went,
        )

    def _read_target(self, text: str) -> int:
        from engine.algebras.bases import rank
        from engine.algebras.diagrams import parse_diagram
        from engine.paths import parse_rank

        body = text.strip()
        if body.startswith("{"):
            return rank(self.algebra, parse_diagram(body, self.algebra.vertices))
        return parse_rank(body, self.algebra.dimension)

    def _check_target(self, text: str) -> tuple[str | None, str]:
        if not text.strip():
            return "", ""
        try:
            self._read_target(text)
        except UserError as exc:
            return str(exc), ""
        return None, ""

    def _went(self, text: str | None) -> None:
        if text is not None:
            self.position = self._read_target(text)
            self._show_diagram()

    def action_factor(self, which: int) -> None:
        if self.algebra.dimension:
            self.factors[which] = self.shown
            self._show_product()

    def action_rank(self) -> None:
        if not self.busy:
            self._start("computing the rank of the action on V^⊗k ...")
            self._rank_worker()

    def action_kernel(self) -> None:
        if not self.busy:
            self._start("computing the kernel ...")
            self._kernel_worker()

    def action_cells(self) -> None:
        if not self.busy:
            self._start("computing the cell modules' Gram determinants ...")
            self._cells_worker()

    # ----- workers ----------------------------------------------------------------------------------
    def _start(self, text: str) -> None:
        self.busy = True
        bar = self.query_one("#algebra-progress", ProgressBar)
        bar.update(total=None, progress=0)
        bar.add_class("-busy")
        self.notify(text, timeout=2)

    def _done(self, note: str | None = None) -> None:
        self.busy = False
        self.query_one("#algebra-progress", ProgressBar).remove_class("-busy")
        if note:
            self.notify(note, timeout=2)

    def _progress(self, done: float, total: float) -> None:
        self.post_message(self.Progressed(done, total))

    @on(Progressed)
    def _progressed(self, message: Progressed) -> None:
        if self.busy:
            self.query_one("#algebra-progress", ProgressBar).update(total=message.total, progress=message.done)

    @on(Finished)
    def _finish(self, message: Finished) -> None:
        setattr(self, message.attribute, message.text)
        self._show_summary()
        self.query_one("#algebra-kernel", Static).update(Text(self.kernel_text))
        self.query_one("#algebra-cells", Static).update(Text(self.cells_text))
        self._done()

    @on(Failed)
    def _fail(self, message: Failed) -> None:
        self._done()
        self.notify(message.text, severity="error", markup=False)

    def _run(self, attribute: str, compute) -> None:
        worker = get_current_worker()
        try:
            text = compute(worker.cancelled_event)
        except Cancelled:
            return
        except UserError as exc:
            if not worker.is_cancelled:
                self.post_message(self.Failed(str(exc)))
            return
        except (MemoryError, RecursionError):
            self.post_message(self.Failed("the computation ran out of memory"))
            return
        if not worker.is_cancelled:
            self.post_message(self.Finished(attribute, text))

    @work(thread=True, exclusive=True, group="algebra", exit_on_error=False, description="algebra")
    def _rank_worker(self) -> None:
        self._run("rank_text", lambda cancel: rank_text(self.diagram, self.index, self._progress, cancel))

    @work(thread=True, exclusive=True, group="algebra", exit_on_error=False, description="algebra")
    def _kernel_worker(self) -> None:
        self._run("kernel_text", lambda cancel: kernel_text(self.diagram, self.index, self._width(), cancel))

    @work(thread=True, exclusive=True, group="algebra", exit_on_error=False, description="algebra")
    def _cells_worker(self) -> None:
        self._run("cells_text", lambda cancel: cells_text(self.diagram, self.index, self.node, self._progress, cancel))


# ----- what the workers ask the engine (text only: no mathematics here) -----------------------------
def rank_text(diagram: Diagram, index: int, progress, cancel) -> str:
    from engine.algebras.kernel import image_rank

    algebra = diagram.algebra(index)
    squares = diagram.sums_of(index, diagram.level_at(index)).squares
    report = image_rank(algebra, squares, progress, cancel)
    if report.method == "computed":
        agree = "= Σm² ✓" if report.rank == squares else f"≠ Σm² = {squares:,}"
        return f"rank of the action (computed by exact linear algebra): {report.rank:,} {agree}"
    return f"rank of the action: {report.rank:,} = Σm² (too large to compute here: {report.note})"


def kernel_text(diagram: Diagram, index: int, width: int, cancel) -> str:
    from engine.algebras.elements import format_element
    from engine.algebras.kernel import kernel_elements

    algebra = diagram.algebra(index)
    squares = diagram.sums_of(index, diagram.level_at(index)).squares
    found = kernel_elements(algebra, squares, 5, cancel=cancel)
    lines = [f"kernel of the action: dimension {found.dimension:,}"]
    for element in found.elements:
        lines.append("  " + _fold(format_element(element, algebra), width - 2))
    lines += generator_lines(algebra, found.dimension, width, cancel)
    return "\n".join(lines)


def generator_lines(algebra: AlgebraLevel, kernel_dimension: int, width: int, cancel) -> list[str]:
    """The family's known generator of the kernel (engine.algebras.generators) in both bases, and the
    dimension of the two-sided ideal it generates, computed."""
    from engine.algebras.elements import format_element
    from engine.algebras.generators import known_generator
    from engine.algebras.ideal import ideal_dimension

    if kernel_dimension == 0:
        return []
    found = known_generator(algebra)
    if found is None:
        return ["no generator of the kernel is known for this algebra"]
    lines = [f"generator: {found.description}", "  " + _fold(format_element(found.element, algebra), width - 2)]
    if found.orbit is not None:
        lines.append("  in the orbit basis: " + _fold(format_element(found.orbit, algebra), width - 22))
    ideal = ideal_dimension(found.element, algebra, kernel_dimension, cancel)
    proved = "" if ideal.proved else " at least"
    same = "  = the kernel's dimension ✓" if ideal.dimension == kernel_dimension else ""
    lines.append(f"  the two-sided ideal it generates has dimension{proved} {ideal.dimension:,}{same}")
    return lines


def cells_text(diagram: Diagram, index: int, node: Node | None, progress, cancel) -> str:
    from engine.algebras.cells.report import level_report
    from engine.export.cell_documents import polynomial_text

    algebra = diagram.algebra(index)
    tower = diagram.tower
    level = diagram.level_at(index)
    report = level_report(algebra, level, tower.format, cancel=lambda: cancel.is_set(), progress=progress)
    parameters = ", ".join(str(x) for x in report.rational_parameters) or "none"
    lines = [f"not semisimple at x = {parameters}"
             + (f"; and at the roots of {', '.join(polynomial_text(f) for f in report.other_factors)}"
                if report.other_factors else ""),
             f"at x = {algebra.parameter}: " + ("semisimple" if report.semisimple_at_parameter else "not semisimple"),
             report.note,
             "cell       dim   rank at N   node        m   agree"]
    selected = None if node is None else tower.format(node)
    for row in report.rows:
        cell = row.cell
        mark = "▶" if row.node_label is not None and row.node_label == selected else " "
        lines.append(f"{mark}{cell.label.text:<10} {cell.dimension:>4} {cell.rank:>11}   "
                     f"{row.node_label or '-':<10} {row.multiplicity or '-':>3}   {row.agree}")
    lines.append("the ranks agree with the tower's multiplicities on every node" if report.agree
                 else "THE RANKS DISAGREE WITH THE TOWER somewhere above")
    return "\n".join(lines)


def _fold(text: str, width: int) -> str:
    if len(text) <= width:
        return text
    return text[: max(10, width - 12)] + f" … ({len(text):,} chars)"
