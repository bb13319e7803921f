"""The image of a diagram algebra in End(V^{⊗k}): its rank and its kernel, by exact linear algebra.

Stack the flattened action matrices (``engine.algebras.action``), one per basis diagram: the rank
of this stack is the dimension of the image.  Two reductions keep it small, neither changes the
rank: equal columns (positions (top labels, bottom labels) on which every diagram takes the same
values) are kept once — for set-partition diagrams a position only matters through the pattern of
equalities of its labels, so the columns left are the set partitions with at most n blocks — and,
when many distinct columns remain, the columns are combined by a random sparse matrix S (each
column added with random weights to two of bound + 16 new ones; likewise the rows for the rank alone): rank(A·S) ≤ rank(A).

The rank modulo a prime is a lower bound of the rational rank; Σm² of the Bratteli diagram (the
caller passes it) is an upper bound, since the image lies in the centralizer.  When they agree the
rank is proved (``rank_method = "computed"``); otherwise the unsketched matrix is tried, then a
second prime, then exact integer elimination (python-flint ``fmpz_mat``).  Where the stack would be
too large, the rank is Σm² (``"bratteli"``).

Kernel elements: the left kernel of the (sketched, full-rank) stack modulo p is read off the
reduced row echelon form of its transpose (pivot columns: diagrams whose actions are independent,
chosen greedily in rank order; each other diagram d gives d − Σ c_r r); the coefficients are
reconstructed as rationals, scaled to a primitive integer vector and checked exactly (the element's
matrix on V^{⊗k} is computed and must be zero).  The elements for the first non-pivot diagrams are
independent (each has its own non-pivot diagram with a nonzero coefficient and no other non-pivot one).
"""

from __future__ import annotations

import random
from dataclasses import dataclass, field
from typing import Callable

from engine.algebras.action import acts_as_zero, flat_entries, space_dimension
from engine.algebras.bases import count, iter_basis, unrank
from engine.algebras.diagrams import Blocks
from engine.algebras.linalg import PRIMES, crt, primitive, rational
from engine.capabilities import AlgebraLevel
from engine.combinatorics import stirling2
from engine.errors import Cancelled, TooLarge, UserError

#: the most cells of the dense matrix handed to flint (8 bytes each)
CELL_LIMIT = 30_000_000

Progress = Callable[[float, float], None]


def stack_entries(level: AlgebraLevel) -> int:
    """The nonzero entries of the stacked action matrices, by formula: Σ_d n^(free blocks of d)
    (set partitions: Σ_j S(2r, j)·n^j, Stirling numbers of the second kind; pairings: n^r each)."""
    n, r = level.n, level.vertices
    if level.kind == "partition":
        if level.half and r:
            return sum(stirling2(2 * r - 1, j) * n ** (j - 1) for j in range(1, 2 * r))
        return sum(stirling2(2 * r, j) * n ** j for j in range(2 * r + 1))
    return count(level) * n ** r


#: the most nonzero entries of the stacked action matrices (about 10 s of Python work)
STACK_ENTRY_LIMIT = 1_500_000
#: the most field operations (rows × columns × rank of the reduced system) a rank may take
#: (about 10 s with python-flint on one core)
OPERATION_LIMIT = 6 * 10 ** 9


def elimination_cost(level: AlgebraLevel, upper: int) -> int:
    """An estimate of the field operations of the rank: the reduced system has at most
    upper + 16 rows, and as many columns as diagrams up to 2·(upper + 16), else upper + 16
    (see ``image_rank``)."""
    rows = upper + 16
    cols = count(level) if count(level) <= 2 * rows else rows
    return rows * cols * min(rows, cols)


def infeasible(level: AlgebraLevel, upper: int) -> str:
    """Why the rank cannot be computed in reasonable time and memory ("" when it can)."""
    entries = stack_entries(level)
    if entries > STACK_ENTRY_LIMIT:
        return (f"the stacked action matrices would hold about {entries:,} entries (the limit is "
                f"{STACK_ENTRY_LIMIT:,})")
    cost = elimination_cost(level, upper)
    if cost > OPERATION_LIMIT:
        return (f"the elimination would take about {cost:.1e} operations modulo p (the limit is "
                f"{OPERATION_LIMIT:.0e})")
    return ""


@dataclass
class Stack:
    """The distinct columns of the stacked action matrices: each a tuple of (diagram rank, value)."""

    diagrams: int
    columns: list[tuple[tuple[int, int], ...]]


def build_stack(level: AlgebraLevel, progress: Progress | None = None, cancel=None) -> Stack:
    total = count(level)
    side = space_dimension(level)
    columns: dict[int, list[tuple[int, int]]] = {}
    get = columns.get
    for i, d in enumerate(iter_basis(level)):
        if i % 256 == 0:
            if cancel is not None and cancel.is_set():
                raise Cancelled()
            if progress is not None:
                progress(i, total)
        keys, values = flat_entries(d, level, side)
        if values is None:
            values = [1] * len(keys)
        for key, value in zip(keys, values):
            found = get(key)
            if found is None:
                columns[key] = [(i, value)]
            else:
                found.append((i, value))
    unique = {tuple(c) for c in columns.values()}
    return Stack(total, sorted(unique))


def _cells(stack: Stack, width: int | None, seed: int, across: int | None = None,
           prefix: int | None = None) -> tuple[int, int, dict[int, int]]:
    """(rows, columns, cells) of the transposed system: one row per (sketched) column of the stack,
    one column per diagram — or, with ``across``, per random combination of diagrams (a row
    sketch of the stack, for the rank alone: it keeps rank ≤ the true rank); with ``prefix``, only
    the diagrams of rank below it."""
    d = stack.diagrams if prefix is None else prefix
    rng = random.Random(seed)
    if across is None:
        targets = [((i, 1),) for i in range(d)]
        cols = d
    else:
        targets = [tuple((rng.randrange(across), rng.randrange(1, 1 << 30)) for _ in range(2)) for _ in range(d)]
        cols = across
    cells: dict[int, int] = {}
    rows = len(stack.columns) if width is None else width
    for j, column in enumerate(stack.columns):
        spots = [(j * cols, 1)] if width is None else \
            [(rng.randrange(width) * cols, rng.randrange(1, 1 << 30)) for _ in range(2)]
        for base, w in spots:
            for i, v in column:
                if i >= d:
                    break
                for t, u in targets[i]:
                    key = base + t
                    cells[key] = cells.get(key, 0) + w * u * v
    return rows, cols, cells


def _matrix(rows: int, cols: int, cells: dict[int, int], p: int | None):
    """The flint matrix (nmod_mat modulo p, or fmpz_mat when p is None)."""
    from flint import fmpz_mat, nmod_mat

    flat = [0] * (rows * cols)
    for key, value in cells.items():
        flat[key] = value
    exact = fmpz_mat(rows, cols, flat)
    return exact if p is None else nmod_mat(exact, p)


@dataclass
class RankReport:
    rank: int
    method: str  # "computed" | "bratteli"
    upper: int
    lower: int | None = None  # the best computed lower bound
    note: str = ""
    stack: Stack | None = field(default=None, repr=False)


def image_rank(level: AlgebraLevel, upper: int, progress: Progress | None = None, cancel=None,
               keep: bool = False) -> RankReport:
    """The dimension of the image of the level's algebra in End(V^{⊗k}); ``upper`` is Σm²."""
    why = infeasible(level, upper)
    if why:
        return RankReport(upper, "bratteli", upper, note=why)
    stack = build_stack(level, progress, cancel)
    d = stack.diagrams
    slack = upper + 16
    width = None if len(stack.columns) <= slack else slack
    across = None if d <= 2 * slack else slack
    best = 0
    attempts = [(width, across, 1, PRIMES[0]), (width, across, 2, PRIMES[1]), (None, None, 0, PRIMES[1])]
    for w, a, seed, p in attempts:
        rows, cols, cells = _cells(stack, w, seed, a)
        if rows * cols > CELL_LIMIT:
            continue
        found = _matrix(rows, cols, cells, p).rank() if rows and cols else 0
        best = max(best, found)
        if found > upper:
            raise AssertionError(f"{level.name}: a computed rank {found} exceeds Σm² = {upper}")
        if found == upper:
            return RankReport(found, "computed", upper, found, stack=stack if keep else None)
    rows, cols, cells = _cells(stack, None, 0)
    if rows * cols <= CELL_LIMIT // 4:
        exact = _matrix(rows, cols, cells, None).rank()
        return RankReport(exact, "computed", upper, exact, note="exact integer elimination",
                          stack=stack if keep else None)
    return RankReport(upper, "bratteli", upper, best, note=f"ranks modulo primes reached {best} of Σm² = {upper}")


# ----- kernel ----------------------------------------------------------------------------------
@dataclass
class KernelReport:
    dimension: int
    elements: list[dict[Blocks, int]]
    rank: RankReport


def kernel_elements(level: AlgebraLevel, upper: int, how_many: int = 20, progress: Progress | None = None,
                    cancel=None) -> KernelReport:
    """The kernel's dimension and its first ``how_many`` basis elements (primitive integer
    combinations of diagrams, each checked to act as zero)."""
    if how_many < 0:
        raise UserError(f"--count must be 0 or more, got {how_many}")
    report = image_rank(level, upper, progress, cancel, keep=True)
    if report.method != "computed" or report.stack is None:
        raise TooLarge(f"the kernel of {level.name} needs the stacked action matrices, which would be too "
                       f"large ({report.note}); its dimension is {count(level) - report.rank} by the Bratteli diagram")
    dimension = count(level) - report.rank
    wanted = min(how_many, dimension)
    if wanted == 0:
        return KernelReport(dimension, [], report)
    d = count(level)
    p = PRIMES[0]
    stack = report.stack
    width = None if len(stack.columns) <= upper + 16 else 2 * upper + 16
    # the greedy pivots among the first m diagrams, and the expressions of the other diagrams among
    # them in terms of earlier pivots, are those of the whole echelon form: grow m until it holds
    # enough non-pivot diagrams
    for sketch in ((width, 1), (None, 0)) if width is not None else ((None, 0),):
        found = _first_elements(level, stack, d, wanted, report.rank, sketch, p)
        if found is not None:
            return KernelReport(dimension, found, report)
    raise UserError(f"{level.name}: kernel elements could not be reconstructed from their residues modulo {p}")


def _first_elements(level: AlgebraLevel, stack: Stack, d: int, wanted: int, rank: int,
                    sketch: tuple[int | None, int], p: int) -> list[dict[Blocks, int]] | None:
    """The kernel elements of the first ``wanted`` non-pivot diagrams, or None when one fails its
    exact check (a sketch that lost rank on a prefix, or coefficients too large)."""
    width, seed = sketch
    # the greedy pivots among the first m diagrams, and the expressions of the other diagrams among
    # them in terms of earlier pivots, are those of the whole echelon form: grow m until it holds
    # enough non-pivot diagrams
    m = min(d, 4 * wanted + 64)
    while True:
        rows, _, cells = _cells(stack, width, seed, prefix=m)
        reduced, rk = _matrix(rows, m, cells, p).rref()
        if m == d and rk != rank:
            return None
        if m - rk >= wanted or m == d:
            break
        m = min(d, 2 * m + (wanted - (m - rk)))
    pivots: list[int] = []
    j = 0
    for i in range(rk):
        while int(reduced[i, j]) == 0:
            j += 1
        pivots.append(j)
        j += 1
    pivot_set = set(pivots)
    free = [f for f in range(m) if f not in pivot_set][:wanted]
    out = []
    for f in free:
        residues = [(pivots[i], (-int(reduced[i, f])) % p) for i in range(rk)]
        residues = [(c, v) for c, v in residues if v]
        element = _reconstruct(level, f, residues, p)
        if element is None:
            return None
        out.append(element)
    return out


def _reconstruct(level: AlgebraLevel, f: int, residues: list[tuple[int, int]], p: int) -> dict[Blocks, int] | None:
    fractions = [(1, 1)]
    for _, v in residues:
        found = rational(v, p)
        if found is None:
            return None
        fractions.append(found)
    ints = primitive(fractions)
    if ints is None:
        return None
    ranks = [f] + [c for c, _ in residues]
    element = {unrank(level, r): c for r, c in zip(ranks, ints) if c}
    return element if acts_as_zero(element, level) else None


def in_kernel(element: dict[Blocks, int], level: AlgebraLevel) -> bool:
    """Whether the element acts on V^{⊗k} as zero (its matrix computed exactly)."""
    return acts_as_zero(element, level)


__all__ = ["image_rank", "kernel_elements", "in_kernel", "stack_entries", "RankReport", "KernelReport", "crt"]


def orbit_kernel_elements(level: AlgebraLevel, how_many: int = 20) -> list[dict[Blocks, int]]:
    """The first ``how_many`` orbit-basis elements x_π (in rank order) with more than n blocks, each
    checked to act as zero (converted to the diagram basis by Möbius inversion, its matrix computed).

    x_π acts on the basis tensors whose pattern of equal labels is exactly π (the 2005 survey of
    partition algebras, §4), so it acts as zero exactly when π has more than n blocks; with the
    computed rank this gives the kernel's dimension as a count (the tests hold the two together)."""
    from engine.algebras.orbit import from_orbit

    if level.kind != "partition":
        raise UserError(f"{level.name} has no orbit basis (the orbit basis belongs to the partition algebras)")
    out: list[dict[Blocks, int]] = []
    if how_many <= 0:
        return out
    for d in iter_basis(level):
        if len(d) > level.n:
            if not acts_as_zero(from_orbit({d: 1}, level), level):
                raise AssertionError(f"the orbit element of {d} does not act as zero")
            out.append({d: 1})
            if len(out) == how_many:
                break
    return out
