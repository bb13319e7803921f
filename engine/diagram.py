"""The Bratteli diagram over any tower.

Multiplicities by path counting (Bratteli, *Inductive limits of finite dimensional
C*-algebras*, Trans. AMS 171, 1972; Goodman, de la Harpe, Jones, *Coxeter Graphs and Towers of
Algebras*, 1989, ch. 2): m(root) = 1 and m(child) = Σ_parents m(parent)·edges.  The number of
paths to a node is the multiplicity of the group's irreducible module in the tensor space and
the dimension of the centralizer's irreducible module, so at every level
Σ m·dim = dim of the tensor space and Σ m² = dim of the centralizer (double centralizer theorem).

Levels are built lazily, once, and kept.  Long work reports progress through a callable and
stops when a cancel token (anything with ``is_set()``, e.g. ``threading.Event``) is set.
"""

from __future__ import annotations

import threading
from itertools import repeat
from math import log10
from typing import Callable, Hashable, Iterable, Iterator, Protocol

from engine.capabilities import AlgebraLevel, ClosedForm, DiagramAlgebra, LevelJump, SizeGuard
from engine.costs import TIME_LIMIT, Cost, digits_of, estimate, multiplicity_digits, seconds_text
from engine.errors import Cancelled, TooLarge
from engine.path_counts import PathCounts
from engine.records import record
from engine.tower import Edge, Node, Tower

#: default size guard: refuse builds estimated to walk more edges than this
DEFAULT_EDGE_LIMIT = 50_000_000
#: default size guard for closed forms: refuse when their numbers would pass this many digits
#: (a 100,000-digit answer takes well under a second; CPython turns a million digits into text
#: in about ten seconds, and the time grows with the square of the length)
DEFAULT_DIGIT_LIMIT = 600_000

Progress = Callable[[float, float], None]


#: above this many bits a square is taken by python-flint (FFT multiplication: a 300,000-digit
#: multiplicity squares in ~7 ms there, ~135 ms by CPython's Karatsuba)
_FLINT_SQUARE_BITS = 20_000


def _square(m: int) -> int:
    if m.bit_length() < _FLINT_SQUARE_BITS:
        return m * m
    from flint import fmpz

    f = fmpz(m)
    return int(f * f)


class CancelToken(Protocol):
    def is_set(self) -> bool: ...


@record
class LevelSums:
    """Σm, Σm² and Σm·dim of one level, beside what the tower says they should be."""

    multiplicities: int
    squares: int
    weighted: int
    tensor_dimension: int
    generic_dimension: int | None

    @property
    def consistent(self) -> bool:
        """Σ m·dim equals the dimension of the tensor space."""
        return self.weighted == self.tensor_dimension

    @property
    def faithful(self) -> bool | None:
        """Whether the diagram algebra maps injectively (Σm² equals its dimension); None if unknown."""
        if self.generic_dimension is None:
            return None
        return self.squares == self.generic_dimension


_CHECK_EVERY = 2048


class Diagram:
    """Levels of a tower as mappings node → multiplicity (exact ints), built on demand."""

    def __init__(
        self, tower: Tower, edge_limit: int = DEFAULT_EDGE_LIMIT, digit_limit: int = DEFAULT_DIGIT_LIMIT
    ) -> None:
        self.tower = tower
        self.edge_limit = edge_limit
        self.digit_limit = digit_limit
        self._counts = PathCounts(tower)
        #: public views of built levels: index → {node: multiplicity}
        self._public: dict[int, dict[Node, int]] = {}
        self._sorted: dict[int, list[Node]] = {}
        self._sums: dict[int, LevelSums] = {}
        #: closed-form multiplicities asked for at levels not built (a few, kept briefly)
        self._closed: dict[tuple[int, Node], int] = {}
        self._reverse: dict[int, dict[Node, list[Edge]]] = {}
        self._lock = threading.RLock()
        self._guard = tower.capability(SizeGuard)
        self._closed_form = tower.capability(ClosedForm)
        self._jump = tower.capability(LevelJump)
        self._algebra = tower.capability(DiagramAlgebra)
        #: whole levels reached by a jump (closed form or matrix powers), not built: index → level
        self._jumped: dict[int, dict[Node, int]] = {}

    @property
    def can_jump(self) -> bool:
        """Whether deep levels can be had without building the levels below them."""
        return self._jump is not None

    @property
    def has_closed_form(self) -> bool:
        """Whether single nodes can be had at deep levels without building the levels below."""
        return self._closed_form is not None or self._jump is not None

    def generic_dimension(self, index: int) -> int | None:
        """The dimension of the level's diagram algebra, or None when the family knows none."""
        return None if self._algebra is None else self._algebra.dimension(index)

    def algebra(self, index: int) -> AlgebraLevel | None:
        """The level's diagram algebra (name, parameter, dimension), or None."""
        return None if self._algebra is None else self._algebra.at(index)

    def formula(self, index: int, node: Node) -> str | None:
        """The multiplicity of ``node`` as a formula in k, where the family has a closed form."""
        return None if self._closed_form is None else self._closed_form.formula(index, node)

    # ----- building -------------------------------------------------------------------------
    @property
    def built(self) -> int:
        """Index of the deepest level built so far."""
        return len(self._counts.levels) - 1

    def cost(self, upto: int, start: int = 0, printed: bool = False, kept: bool = True) -> Cost:
        """The estimated cost of building levels start..upto (``engine.costs``): edges, nodes and
        digits from the family's size guard, where it gives none those of the tensor dimension (and of
        the square root of the diagram algebra's dimension, ``engine.costs.multiplicity_digits``)."""
        guard = self._guard
        edges = nodes = 0
        if guard is not None:
            edges = guard.edges(upto) or 0
            if start > 0:
                edges = max(0, edges - (guard.edges(start - 1) or 0))
            nodes = guard.nodes(upto) if guard.nodes is not None else edges
            if start > 0 and guard.nodes is not None:  # levels start..upto only (a jump gives start)
                nodes = max(0, nodes - guard.nodes(start - 1))
        if guard is not None and guard.digits is not None:
            digits = guard.digits(upto)
        else:
            digits = multiplicity_digits(self.tower, upto, self._tensor_digits(upto))
        extra = guard.extra(upto) if guard is not None and guard.extra is not None else 0
        return estimate(edges, nodes, digits, extra, printed, kept, upto - start + 1)

    def _tensor_digits(self, index: int) -> int:
        """Digits of the tensor dimension at ``index``, by logarithms past a few thousand levels
        (it is (dim V)^k: computing it exactly at level 10^23 would never finish)."""
        if index <= 4096:
            return digits_of(max(1, self.tower.tensor_dimension(index)))
        period = self.tower.steps_per_unit
        whole = max(2, self.tower.tensor_dimension(period))
        return int((index // period + 1) * log10(whole)) + 1

    def check_size(self, index: int, printed: bool = False) -> None:
        """Raise TooLarge when building up to ``index`` is estimated to exceed the edge limit, or
        to take more than about a minute or 2 GB (``printed``: the levels will be printed too)."""
        if index <= self.built:
            return
        self._refuse(self.cost(index, printed=printed), f"building {self.tower.spec} to level", index)

    def check_stream(self, start: int, upto: int, printed: bool = True) -> None:
        """``check_size`` for levels start..upto swept one after the other and not kept."""
        self._refuse(self.cost(upto, start, printed, kept=False), f"sweeping {self.tower.spec} to level", upto)

    def _refuse(self, cost: Cost, what: str, index: int) -> None:
        if cost.edges <= self.edge_limit and not cost.too_large():
            return
        from engine.levels import format_level

        limit = f"over the limit of {self.edge_limit:.0e} edges" if cost.edges > self.edge_limit else \
            "over the limits of about a minute and 2 GB"
        raise TooLarge(
            f"{what} {format_level(self.tower.level_of(index))} would walk {cost.text()}, {limit}; "
            "ask for a lower level, or for single nodes (answered by a closed form or a jump where "
            "the family has one)"
        )

    def check_digits(self, index: int) -> None:
        """Raise TooLarge when the tower's closed form (or jump) at ``index`` would work with numbers
        of more than ``digit_limit`` digits (and the level is not built, so it would be used)."""
        if index <= self.built:
            return
        if self._closed_form is not None:
            digits: int | None = self._closed_form.digits(index)
        elif self._jump is not None:
            digits = self._jump.digits(index)
        else:
            digits = None
        if digits is not None and digits > self.digit_limit:
            from engine.levels import format_level

            raise TooLarge(
                f"the closed form for {self.tower.spec} at level {format_level(self.tower.level_of(index))} "
                f"would work with numbers of about {digits:.2e} digits, over the limit of "
                f"{self.digit_limit:.0e}; ask for a lower level"
            )

    def check_jump(self, index: int) -> None:
        """Raise TooLarge when the family's jump to ``index`` is estimated to take more than about
        a minute (``LevelJump.seconds``; the level not built, so the jump would be used)."""
        if index <= self.built or self._jump is None or self._jump.seconds is None:
            return
        seconds = self._jump.seconds(index)
        if seconds > TIME_LIMIT:
            from engine.levels import format_level

            raise TooLarge(
                f"level {format_level(self.tower.level_of(index))} of {self.tower.spec} at once would take "
                f"about {seconds_text(seconds)}, over the limit of about a minute; ask for a lower level, "
                "or for single nodes (answered by the closed form)"
            )

    def ensure(self, index: int, progress: Progress | None = None, cancel: CancelToken | None = None) -> None:
        """Build every level up to ``index`` (raises TooLarge before starting, Cancelled midway)."""
        self.tower.check_index(index)
        if index <= self.built:
            return
        self.check_size(index)
        with self._lock:
            start = self.built
            span = index - start
            while self.built < index:
                done_before = self.built - start
                self._build_next(
                    None if progress is None else (lambda f, d=done_before: progress(d + f, span)),
                    cancel,
                )
            if progress is not None:
                progress(span, span)

    def _build_next(self, progress: Callable[[float], None] | None, cancel: CancelToken | None) -> None:
        """Build the level after the deepest one (``ensure`` has checked that the tower has it)."""
        self._counts.build_next(progress, cancel)

    # ----- reading --------------------------------------------------------------------------
    def level(self, index: int, progress: Progress | None = None, cancel: CancelToken | None = None) -> dict[Node, int]:
        """node → multiplicity on level ``index`` (exactly the nodes with a path)."""
        self.ensure(index, progress, cancel)
        found = self._public.get(index)
        if found is None:
            found = self._public[index] = self._counts.level(index)
        return found

    def sorted_nodes(self, index: int, level: dict[Node, int]) -> list[Node]:
        """The nodes of ``level`` (level ``index``, built or not) in display order; kept only if
        they were already (a streamed document does not keep every level's order)."""
        found = self._sorted.get(index)
        return found if found is not None else self.tower.sort_nodes(level, index)

    def dimension_lookup(self, index: int) -> Callable[[Node], int]:
        """node → dimension at a level: from the dimensions kept for the built levels' node space,
        else the tower's formula."""
        if index <= self.built:
            return self._counts.dimension_lookup(index)
        return lambda node: self.tower.dimension(index, node)

    def dimensions_of(self, index: int, nodes: list[Node]) -> Iterable[int]:
        """The dimensions of ``nodes`` at a level, in their order (``dimension_lookup`` without a
        call per node on the built levels)."""
        if index <= self.built:
            return self._counts.dimensions_of(index, nodes)
        return map(self.tower.dimension, repeat(index), nodes)

    def nodes(self, index: int) -> list[Node]:
        """The nodes of a level in the tower's display order."""
        found = self._sorted.get(index)
        if found is None:
            found = self.tower.sort_nodes(self.level(index), index)
            self._sorted[index] = found
        return found

    def multiplicity(self, index: int, node: Node) -> int:
        """Paths from the root to ``node``; a closed form where the family has one and the level is
        not built yet."""
        self.tower.check_index(index)
        if index <= self.built:
            return self._counts.multiplicity(index, node)
        key = (index, node)
        if key in self._closed:
            return self._closed[key]
        jumped = self._jumped.get(index)
        if jumped is not None:
            return jumped.get(node, 0)
        self.check_digits(index)
        if self._closed_form is not None:
            closed = self._closed_form.multiplicity(index, node)
            if len(self._closed) > 256:
                self._closed.clear()
            self._closed[key] = closed
            return closed
        if self._jump is not None:
            return self.level_at(index).get(node, 0)
        return self.level(index).get(node, 0)

    def level_at(self, index: int, progress: Progress | None = None, cancel: CancelToken | None = None) -> dict[Node, int]:
        """node → multiplicity on level ``index``: the built level, or, where the family can jump
        and the level is not built, the level by the jump (nothing below it is built)."""
        self.tower.check_index(index)
        if index <= self.built or self._jump is None:
            return self.level(index, progress, cancel)
        found = self._jumped.get(index)
        if found is None:
            self.check_digits(index)
            self.check_jump(index)
            found = self._jump.level(index)
            if len(self._jumped) > 8:
                self._jumped.clear()
            self._jumped[index] = found
        return found

    def levels_between(
        self, start: int, upto: int, progress: Progress | None = None, cancel: CancelToken | None = None
    ) -> Iterator[tuple[int, dict[Node, int]]]:
        """(index, level) for start..upto.  Where the family can jump and ``start`` is past the built
        levels, level ``start`` comes by the jump and the rest by stepping from it (nothing below
        ``start`` is built or kept); otherwise the levels are built as usual."""
        self.tower.check_index(upto)
        if start > upto:
            return
        if start <= self.built or self._jump is None:
            self.ensure(upto, progress, cancel)
            public, counts = self._public, self._counts
            for index in range(start, upto + 1):  # not kept: a streamed document holds one level
                found = public.get(index)
                yield index, found if found is not None else counts.level(index)
            return
        self.check_digits(upto)
        self.check_stream(start, upto, printed=False)
        level = self.level_at(start)
        yield start, level
        children = self.tower.children
        for index in range(start, upto):
            if cancel is not None and cancel.is_set():
                raise Cancelled()
            new: dict[Node, int] = {}
            for node, m in level.items():
                for child, e in children(index, node):
                    new[child] = new.get(child, 0) + m * e
            level = new
            if progress is not None:
                progress(index + 1 - start, upto - start)
            yield index + 1, level

    def sums_of(self, index: int, level: dict[Node, int]) -> LevelSums:
        """The sums of a level given as a mapping (built, jumped or swept by ``levels_between``)."""
        if index <= self.built:
            return self.sums(index)
        return self._sums_of(index, level, None)

    def nodes_at(self, index: int) -> list[Node]:
        """The nodes of ``level_at(index)`` in the tower's display order."""
        if index <= self.built or self._jump is None:
            return self.nodes(index)
        return self.tower.sort_nodes(self.level_at(index), index)

    def sums_at(self, index: int, progress: Progress | None = None, cancel: CancelToken | None = None) -> LevelSums:
        """``sums`` of ``level_at(index)``: no level below is built where the family can jump."""
        if index <= self.built or self._jump is None:
            return self.sums(index, progress, cancel)
        return self._sums_of(index, self.level_at(index), cancel)

    def reachable(self, index: int, node: Node) -> bool:
        """Whether ``node`` has a path from the root (by the family's rule where it has one)."""
        if index > self.built and self._closed_form is not None:
            return self._closed_form.reachable(index, node)
        return self.multiplicity(index, node) > 0

    def children(self, index: int, node: Node) -> list[Edge]:
        """Nodes of the next level joined to ``node``, with edge counts (empty at the last level)."""
        if self.tower.max_index is not None and index >= self.tower.max_index:
            return []
        found = self._counts.edges(index, node)
        key = self.tower.sort_key
        return sorted(found, key=lambda ce: key(ce[0], index + 1))

    def parents(self, index: int, node: Node) -> list[Edge]:
        """Nodes of the previous level (with a path) joined to ``node``, with edge counts."""
        if index == 0:
            return []
        candidates = self.tower.parents(index, node)
        if candidates is not None:
            if index - 1 <= self.built:
                prev = self.level(index - 1)
                found = [(p, e) for p, e in candidates if p in prev]
            else:
                found = [(p, e) for p, e in candidates if self.reachable(index - 1, p)]
            return sorted(found, key=lambda pe: self.tower.sort_key(pe[0], index - 1))
        reverse = self._reverse.get(index)
        if reverse is None:
            reverse = {}
            for p in self.nodes(index - 1):
                for child, e in self.children(index - 1, p):
                    reverse.setdefault(child, []).append((p, e))
            self._reverse[index] = reverse
        return list(reverse.get(node, []))

    def cached_sums(self, index: int) -> LevelSums | None:
        """``sums(index)`` if it was computed already, else None (never computes)."""
        return self._sums.get(index)

    def sums(self, index: int, progress: Progress | None = None, cancel: CancelToken | None = None) -> LevelSums:
        found = self._sums.get(index)
        if found is not None:
            return found
        self.ensure(index, progress, cancel)
        total, squares, weighted = self._counts.sums(index, cancel)
        found = LevelSums(total, squares, weighted, self.tower.tensor_dimension(index), self.generic_dimension(index))
        self._sums[index] = found
        return found

    def _sums_of(self, index: int, level: dict[Node, int], cancel: CancelToken | None) -> LevelSums:
        total = squares = weighted = 0
        dim = self.tower.dimension
        for count, (node, m) in enumerate(level.items(), 1):
            total += m
            squares += _square(m)
            weighted += m * dim(index, node)
            if count % _CHECK_EVERY == 0 and cancel is not None and cancel.is_set():
                raise Cancelled()
        return LevelSums(total, squares, weighted, self.tower.tensor_dimension(index), self.generic_dimension(index))

    def first_unfaithful_of_tower(self) -> int | None:
        """The first level index, anywhere in the tower, where the diagram algebra stops acting
        faithfully (None: it never does, or the family knows no algebra): the family's theorem,
        held against the level sums where those levels are built."""
        if self._algebra is None:
            return None
        found = self._algebra.first_unfaithful
        if found is not None and found <= self.built:
            assert self.first_unfaithful(found) == found, "the family's faithfulness theorem disagrees with Σm²"
        return found

    def first_unfaithful(self, upto: int, cancel: CancelToken | None = None) -> int | None:
        """The first level index ≤ upto where Σm² falls below the generic dimension (there the
        diagram algebra stops acting faithfully), or None.

        Faithfulness only fails upwards: A_k sits in A_{k+1} compatibly with V^{⊗k} in V^{⊗(k+1)}
        (the towers are inclusions; Goodman, de la Harpe, Jones 1989, ch. 2), so an element acting as
        zero at level k still does at k+1.  Hence a binary search: O(log upto) levels' sums.
        """
        if self._algebra is None:
            return None
        if self.sums(upto, cancel=cancel).faithful:
            return None
        low, high = 0, upto  # faithful below low is unknown; unfaithful at high
        while low < high:
            middle = (low + high) // 2
            if self.sums(middle, cancel=cancel).faithful:
                low = middle + 1
            else:
                high = middle
        return high
