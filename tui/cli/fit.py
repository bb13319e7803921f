"""Plain-text tables that never break a number.

A number is never wrapped across lines.  A table wider than the output is first given narrower
headers (broken only between words), then narrower text columns (wrapped between words), then
split into parts that repeat the key columns (the level, say), as wide printed tables are
commonly split (common practice).  Only a number that cannot fit even alone beside the keys is
shortened, always with its digit count: ``1.9628e40 (41 digits)``; with ``exact=True`` such
numbers are listed in full after the table instead, one per line.

The width is the terminal's (``COLUMNS`` respected), 80 when the output is not a terminal.
Presentation only: no mathematics here.
"""

from __future__ import annotations

from dataclasses import dataclass
from typing import TYPE_CHECKING, Sequence, Union

from engine.numbers_in import digit_count

if TYPE_CHECKING:
    from fractions import Fraction

Cell = Union[int, str]

#: the width used when the output is not a terminal and COLUMNS is not set
DEFAULT_WIDTH = 80
#: never lay out narrower than this, whatever COLUMNS says
MIN_WIDTH = 40
GAP = "  "


def output_width() -> int:
    """The width to fit: ``COLUMNS`` when set, else the terminal's, else 80."""
    import shutil

    columns, _ = shutil.get_terminal_size((DEFAULT_WIDTH, 24))  # COLUMNS first, then the terminal
    return max(MIN_WIDTH, columns)


def digits_note(n: int) -> str:
    """``(41 digits)``, ``(1 digit)``."""
    d = digit_count(n)
    return f"({d:,} digit{'s' if d != 1 else ''})"


def short_number(n: int, width: int) -> str:
    """``n`` exactly when it has at most ``width`` characters, else shortened with its digit count,
    ``1.9628e40 (41 digits)``, with as many mantissa digits as ``width`` allows (at least one: the
    result may then be wider than ``width``, never cut)."""
    digits = digit_count(n)
    sign = "-" if n < 0 else ""
    if digits + len(sign) <= width:
        return str(n)
    m = abs(n)
    note = " " + digits_note(n)
    tail = f"e{digits - 1}"
    room = width - len(sign) - len(tail) - len(note)
    keep = min(room - 1 if room >= 3 else 1, 12, digits)  # the point takes a cell
    head = str(m // 10 ** (digits - keep))
    mantissa = head[0] + ("." + head[1:] if len(head) > 1 else "")
    return f"{sign}{mantissa}{tail}{note}"


def approximate(value: "Fraction", digits: int = 6) -> str:
    """``value`` rounded down in magnitude to ``digits`` significant digits, ``3.14159e-5``, by
    integer arithmetic (exact however small or large the value; no float)."""
    if value == 0:
        return "0"
    sign = "-" if value < 0 else ""
    p, q = abs(value.numerator), value.denominator
    exponent = digit_count(p) - digit_count(q)
    if p * 10 ** max(0, -exponent) < q * 10 ** max(0, exponent):
        exponent -= 1  # now 10^exponent <= p/q < 10^(exponent+1)
    shift = digits - 1 - exponent
    head = str(p * 10 ** shift // q if shift >= 0 else p // (q * 10 ** -shift))
    mantissa = (head[0] + "." + head[1:]).rstrip("0").rstrip(".")
    return f"{sign}{mantissa}" + (f"e{exponent}" if exponent else "")


def abbreviated(n: int, keep: int = 12) -> str:
    """``n`` always shortened: ``keep`` leading digits (at most) and the digit count, ``9.91267988808e86 (87 digits)``."""
    digits = digit_count(n)
    head = str(abs(n) // 10 ** max(0, digits - keep))
    mantissa = head[0] + ("." + head[1:] if len(head) > 1 else "")
    return f"{'-' if n < 0 else ''}{mantissa}e{digits - 1} {digits_note(n)}"


def exact_number(n: int) -> str:
    """Every digit, with the digit count beside it when there are more than 12."""
    return str(n) + (f" {digits_note(n)}" if digit_count(n) > 12 else "")


@dataclass
class Column:
    header: str
    align: str = "left"  # "left" or "right"
    key: bool = False  # repeated in every part of a split table
    wrap: bool = False  # text that may wrap between words


#: joins words that must stay on one line (a header such as "= dim V^⊗k"); printed as a space
KEEP = "\u00a0"


def _words_width(text: str) -> int:
    return max((len(w) for w in text.split(" ")), default=0)


def _wrap(text: str, width: int) -> list[str]:
    """Lines of at most ``width`` cells, broken only at spaces (a longer word stays whole)."""
    lines: list[str] = []
    current = ""
    for word in text.split(" "):
        if not current:
            current = word
        elif len(current) + 1 + len(word) <= width:
            current += " " + word
        else:
            lines.append(current)
            current = word
    lines.append(current)
    return lines


class Table:
    """Rows of cells (ints are numbers, strings are text) under headers; ``render`` fits a width."""

    def __init__(self, columns: Sequence[Column], title: str = "") -> None:
        self.columns = list(columns)
        self.title = title
        self.rows: list[list[Cell]] = []

    def add_row(self, *cells: Cell) -> None:
        assert len(cells) == len(self.columns)
        self.rows.append(list(cells))

    # -- measuring -------------------------------------------------------------------------------
    def _cell_width(self, cell: Cell) -> int:
        return digit_count(cell) + (cell < 0) if isinstance(cell, int) else len(cell)

    def _natural(self, i: int) -> int:
        return max([len(self.columns[i].header)] + [self._cell_width(r[i]) for r in self.rows])

    def _narrowest(self, i: int) -> int:
        """Header broken between words; wrapping text down to its longest word."""
        col = self.columns[i]
        cells = [r[i] for r in self.rows]
        body = max((_words_width(c) if col.wrap and isinstance(c, str) else self._cell_width(c)
                    for c in cells), default=0)
        return max(_words_width(col.header), body)

    # -- laying out ------------------------------------------------------------------------------
    def render(self, width: int | None = None, exact: bool = False) -> str:
        width = output_width() if width is None else width
        parts, outside = self._plan(width, exact)
        chunks = [self.title] if self.title else []
        for n, (indices, widths) in enumerate(parts):
            if n:
                chunks.append("")
                chunks.append(f"{self.title} (continued)" if self.title else "(continued)")
            chunks.append(self._draw(indices, widths))
        if outside:
            keys = [k for k, c in enumerate(self.columns) if c.key]
            chunks.append("")
            chunks.append("In full:")
            for i in outside:
                for row in self.rows:
                    where = ", ".join(f"{self.columns[k].header} {row[k]}" for k in keys)
                    value = row[i]
                    shown = exact_number(value) if isinstance(value, int) else value
                    chunks.append(f"{self.columns[i].header}" + (f", {where}" if where else "") + f": {shown}")
        return "\n".join(chunks) + "\n"

    def _plan(self, width: int, exact: bool) -> tuple[list[tuple[list[int], dict[int, int]]], list[int]]:
        count = len(self.columns)
        natural = {i: self._natural(i) for i in range(count)}
        narrow = {i: self._narrowest(i) for i in range(count)}

        def total(indices: Sequence[int], widths: dict[int, int]) -> int:
            return sum(widths[i] for i in indices) + len(GAP) * (len(indices) - 1)

        everything = list(range(count))
        if total(everything, natural) <= width:
            return [(everything, natural)], []
        fitted = self._squeeze(everything, natural, narrow, width)
        if fitted is not None:
            return [(everything, fitted)], []
        keys = [i for i in everything if self.columns[i].key]
        others = [i for i in everything if not self.columns[i].key]
        key_width = total(keys, narrow) + (len(GAP) if keys else 0)
        room = width - key_width
        parts: list[list[int]] = []
        outside: list[int] = []
        current: list[int] = []
        for i in others:
            if narrow[i] > room:  # cannot fit even alone beside the keys
                if exact and any(isinstance(r[i], int) for r in self.rows):
                    outside.append(i)
                    continue
                narrow[i] = max(room, _words_width(self.columns[i].header))
            if current and total(current + [i], narrow) > room:
                parts.append(current)
                current = []
            current.append(i)
        if current:
            parts.append(current)
        plans = []
        for part in parts or [[]]:
            indices = keys + part
            widths = self._squeeze(indices, natural, narrow, width) or {i: narrow[i] for i in indices}
            plans.append((indices, widths))
        return plans, outside

    def _squeeze(self, indices: list[int], natural: dict[int, int], narrow: dict[int, int],
                 width: int) -> dict[int, int] | None:
        """Widths between ``narrow`` and ``natural`` that fit ``width``, or None: the spare room is
        given back to the columns in order, numbers and headers first."""
        widths = {i: narrow[i] for i in indices}
        spare = width - sum(widths.values()) - len(GAP) * (len(indices) - 1)
        if spare < 0:
            return None
        for i in [i for i in indices if not self.columns[i].wrap]:
            grow = min(spare, natural[i] - widths[i])
            widths[i] += grow
            spare -= grow
        wrapping = [i for i in indices if self.columns[i].wrap]
        while spare > 0 and any(widths[i] < natural[i] for i in wrapping):
            for i in sorted(wrapping, key=lambda i: widths[i] / natural[i]):  # the most squeezed first
                if spare and widths[i] < natural[i]:
                    widths[i] += 1
                    spare -= 1
                    break
        return widths

    def _draw(self, indices: list[int], widths: dict[int, int]) -> str:
        def lines_of(i: int, cell: Cell, header: bool = False) -> list[str]:
            w = widths[i]
            col = self.columns[i]
            if isinstance(cell, int):
                return [short_number(cell, w)]
            if (header or col.wrap) and len(cell) > w:
                return _wrap(cell, w)
            return [cell]

        def block(cells: list[list[str]]) -> list[str]:
            height = max(len(c) for c in cells)
            out = []
            for line in range(height):
                pieces = []
                for i, c in zip(indices, cells):
                    text = c[line] if line < len(c) else ""
                    w = widths[i]
                    pieces.append(text.rjust(w) if self.columns[i].align == "right" else text.ljust(w))
                out.append(GAP.join(pieces).rstrip().replace(KEEP, " "))
            return out

        head = [lines_of(i, self.columns[i].header, header=True) for i in indices]
        height = max(len(h) for h in head)
        head = [[""] * (height - len(h)) + h for h in head]  # headers sit on the rule
        out = block(head)
        out.append(GAP.join("─" * widths[i] for i in indices))
        for row in self.rows:
            out.extend(block([lines_of(i, row[i]) for i in indices]))
        return "\n".join(out)
