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

import re
import shutil
import sys
from dataclasses import dataclass
from typing import TYPE_CHECKING, Sequence, TextIO, Union

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


#: a lone sign or operator is kept with the term after it: a long sum folds before "+ 3*x^2", never after "+"
_LEADING = {"+", "-", "−", "=", "×", "·", "⊕"}
#: inside a word too long for a line, a break may follow one of these (never between two digits)
_BREAK_AFTER = ",})]|*·⊗;/"
_DIGITS = re.compile(r"\d+")
#: a number with thousands separators, 3,230,608,073 (not in a word holding a diagram's braces)
_GROUPED = re.compile(r"(?<![\d,])\d{1,3}(?:,\d{3})+(?![\d,])")
#: digit runs at most this long are never shortened (a short form would not be shorter)
_KEEP_DIGITS = 12


def abbreviated(n: int, keep: int = 12) -> str:
    """``n`` always shortened: ``keep`` leading digits (at most) and the digit count, ``9.91267988808e86 (87 digits)``."""
    digits = digit_count(n)
    head = str(abs(n) // 10 ** max(0, digits - keep))
    mantissa = head[0] + ("." + head[1:] if len(head) > 1 else "")
    return f"{'-' if n < 0 else ''}{mantissa}e{digits - 1} {digits_note(n)}"


def shorten_digit_runs(word: str, room: int) -> str:
    """``word`` with its longest numbers shortened (``1.9628e40 (41 digits)``, the space a KEEP) until it
    fits ``room`` cells or no number is longer than 12 digits.  Numbers with thousands separators count
    whole, except in a word holding a diagram's braces."""
    while len(word) > room:
        pattern = _DIGITS if "{" in word else _GROUPED
        runs = [m for m in pattern.finditer(word) if len(m.group().replace(",", "")) > _KEEP_DIGITS]
        if not runs and pattern is _GROUPED:
            runs = [m for m in _DIGITS.finditer(word) if len(m.group()) > _KEEP_DIGITS]
        if not runs:
            break
        longest = max(len(m.group()) for m in runs)  # every number of that length (the two ends of a..b alike)
        for m in reversed([m for m in runs if len(m.group()) == longest]):
            word = word[: m.start()] + abbreviated(int(m.group().replace(",", ""))).replace(" ", KEEP) + word[m.end():]
    return word


def _cuts(word: str) -> list[int]:
    """Where a word too long for a line may be cut: after a comma, brace, bar or product sign, never
    between two digits of a number (a diagram's ``{1,2}`` may be cut after its comma, ``3,230,608`` not)."""
    inside: set[int] = set()  # cut positions inside a number 3,230,608 or a fraction 22/7
    if "{" not in word:
        for m in [*_GROUPED.finditer(word), *re.finditer(r"\d+/\d+", word)]:
            inside.update(range(m.start() + 1, m.end()))
    return [i + 1 for i, ch in enumerate(word[:-1]) if ch in _BREAK_AFTER and word[i + 1] not in ",;)}]"
            and i + 1 not in inside and not (word[i].isdigit() and word[i + 1].isdigit())]


def _take(word: str, cuts: list[int], begin: int, room: int) -> int:
    """The end of the longest piece ``word[begin:end]`` of at most ``room`` cells ending at a cut (or
    the word's end); ``begin`` itself when none fits."""
    best = begin
    for cut in cuts + [len(word)]:
        if cut <= begin:
            continue
        if cut - begin > room:
            break
        best = cut
    return best


def wrap_words(line: str, width: int | None = None, indent: str = "  ", exact: bool = False) -> str:
    """One line of prose or a list, broken only at spaces to fit ``width`` (continuations start with
    ``indent``), so that no number or label is ever split; ends with a newline.

    A lone sign (``+``, ``-``, ``=``) goes to the line of the term after it, so sums fold at term
    boundaries.  A word longer than a whole line has its long numbers shortened with their digit
    counts (not with ``exact``: then a number stays whole, on a line of its own if need be), then is
    cut after a comma, brace or product sign, never inside a number.
    """
    width = output_width() if width is None else width
    text = line.rstrip("\n")
    if len(text) <= width:
        return text.replace(KEEP, " ") + "\n"
    lead = text[: len(text) - len(text.lstrip(" "))]
    room = max(MIN_WIDTH // 2, width - len(indent))
    words: list[tuple[str, str]] = []
    for sep, word in re.findall(r"( *)([^ ]+)", text[len(lead):]):  # spaces only: KEEP joins
        if words and words[-1][1] in _LEADING:
            words[-1] = (words[-1][0], words[-1][1] + sep + word)  # "+ 3*x^2" as one unit
            continue
        words.append((sep, word))
    lines: list[str] = []
    current = lead
    for sep, word in words:
        if len(word) > room and not exact:
            word = shorten_digit_runs(word, room)
        if len(word) <= room or not _cuts(word):
            if current.strip() and len(current) + len(sep) + len(word) > width:
                lines.append(current)
                current = indent + word
            else:
                current += sep + word
            continue
        cuts, begin, gap = _cuts(word), 0, sep  # too long for any line: cut it, filling each line
        while begin < len(word):
            end = _take(word, cuts, begin, width - len(current) - len(gap))
            if end == begin:
                if current.strip():
                    lines.append(current)
                    current, gap = indent, ""
                    continue
                end = _take(word, cuts, begin, 10 ** 9) if _take(word, cuts, begin, room) == begin else \
                    _take(word, cuts, begin, room)
            current += gap + word[begin:end]
            gap, begin = "", end
            if begin < len(word):
                lines.append(current)
                current = indent
    lines.append(current)
    return "\n".join(lines).replace(KEEP, " ") + "\n"


class FittedOutput:
    """A stand-in for ``sys.stdout`` whose complete lines are fitted by ``wrap_words`` (broken only at
    spaces, continuations indented, too long numbers shortened unless ``exact``): for commands that
    write prose and lists line by line.  ``raw`` writes drawings as they are."""

    def __init__(self, indent: str = "    ", stream: TextIO | None = None, exact: bool = False) -> None:
        self.indent = indent
        self.stream = stream or sys.stdout
        self.width = output_width()
        self.exact = exact
        self._pending = ""

    def write(self, text: str) -> int:
        self._pending += text
        while "\n" in self._pending:
            line, self._pending = self._pending.split("\n", 1)
            self.stream.write(wrap_words(line, self.width, self.indent, self.exact))
        return len(text)

    def raw(self, text: str) -> None:
        """Text written as it is (a drawing that cannot be folded)."""
        self.flush()
        self.stream.write(text)

    def number(self, prefix: str, n: int, suffix: str = "") -> None:
        """One line ``prefix`` ``n`` ``suffix``: see ``number_line``."""
        self.flush()
        self.stream.write(number_line(prefix, n, self.width, self.exact, suffix) + "\n")

    def flush(self) -> None:
        if self._pending:
            self.stream.write(wrap_words(self._pending, self.width, self.indent, self.exact))
            self._pending = ""
        self.stream.flush()


def number_line(prefix: str, n: int, width: int, exact: bool, suffix: str = "", note: bool = False) -> str:
    """``prefix`` then ``n`` (then ``suffix``, folded after it where needed): all digits when they fit the
    line or with ``exact`` (then a long number on a line of its own), else shortened with its digit
    count.  ``note`` adds the digit count to a number shown whole."""
    count = digits_note(n)
    whole = f"{n} {count}" if note else str(n)
    if len(prefix) + len(whole) <= width:
        text = prefix + whole
    elif exact:  # the number on a line of its own, indented where it fits
        alone = exact_number(n)
        text = prefix.rstrip() + "\n" + ("    " + alone if len(alone) + 4 <= width else alone)
    else:
        text = prefix + short_number(n, max(20, width - len(prefix)))
    if suffix:
        last = text.rsplit("\n", 1)[-1]
        joined = last + suffix
        text = text[: len(text) - len(last)] + wrap_words(joined, width, "    ", exact).rstrip("\n")
    return text


def rank_range(start: int, last: int) -> str:
    """``3..7``; two long ranks as ``A to B``, so that each may stand whole on its own line."""
    return f"{start}..{last}" if len(str(start)) + len(str(last)) <= 40 else f"{start} to {last}"


def add_exact_option(parser) -> None:
    """The ``--exact`` option of commands that print numbers that may be huge."""
    parser.add_argument("--exact", action="store_true", help="every digit of every number (by default a "
                        "number too wide for the screen is shortened, with its digit count)")
