"""Splitting user text at separators that stand outside parentheses (shared by specs and paths)."""

from __future__ import annotations

from typing import Callable

from engine.errors import UserError
from engine.numbers_in import quote


def split_outside_parentheses(text: str, is_separator: Callable[[str], bool]) -> list[str]:
    """Pieces of ``text`` between separators at depth 0 (``(``/``[`` open, ``)``/``]`` close);
    empty pieces are dropped.  A UserError for unbalanced parentheses."""
    pieces: list[str] = []
    current: list[str] = []
    depth = 0
    for ch in text:
        if ch in "([":
            depth += 1
        elif ch in ")]":
            depth -= 1
            if depth < 0:
                raise UserError(f"unbalanced parentheses in {quote(text)}")
        if depth == 0 and is_separator(ch):
            pieces.append("".join(current))
            current = []
        else:
            current.append(ch)
    if depth != 0:
        raise UserError(f"unbalanced parentheses in {quote(text)}")
    pieces.append("".join(current))
    return [p for p in pieces if p.strip()]
