"""Lines of prose, lists and sums fitted to the output width without breaking a number.

Lines break at spaces; a lone sign goes with the term after it (sums fold before ``+ 3*x^2``); a
word longer than a line has its long numbers shortened with their digit counts (kept whole with
``exact``), then is cut after a comma, brace, slash or product sign, never inside a number, a
number with thousands separators or a fraction.  Presentation only: no mathematics here.
"""

from __future__ import annotations

import re
import sys
from typing import TextIO

from tui.cli.fit import KEEP, MIN_WIDTH, abbreviated, digits_note, exact_number, output_width, short_number


#: a lone sign or operator is kept with the term after it: a long sum folds before "+ 3*x^2", never after "+"
_LEADING = {"+", "-", "−", "=", "×", "·", "⊕"}
#: inside a word too long for a line, a break may follow one of these (never between two digits)
_BREAK_AFTER = ",})]|*·⊗;/"
_DIGITS = re.compile(r"\d+")
#: a number with thousands separators, 3,230,608,073 (not in a word holding a diagram's braces)
_GROUPED = re.compile(r"(?<![\d,])\d{1,3}(?:,\d{3})+(?![\d,])")
#: digit runs at most this long are never shortened (a short form would not be shorter)
_KEEP_DIGITS = 12


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
