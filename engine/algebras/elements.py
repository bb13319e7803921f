"""Elements of a diagram algebra: combinations of basis diagrams with exact coefficients.

An element is ``dict[Blocks, coefficient]`` without zero coefficients; a coefficient is a Python
int, or a ``Poly`` (an integer polynomial in the loop parameter x, constant term first) when the
parameter is kept as a symbol.  Text form (the contract's "Elements"):
``{1,1'},{2,2'} - 2*{1,2},{1',2'}``; JSON form ``{"terms": [{"coefficient": c, "diagram": "..."}]}``
with the terms in basis order (the rank order of ``engine.algebras.bases``) and, for a polynomial
coefficient, the list of its integer coefficients, constant term first.
"""

from __future__ import annotations

import re
from typing import Union

from engine.algebras.bases import rank
from engine.algebras.diagrams import Blocks, format_diagram, in_basis, parse_diagram
from engine.capabilities import AlgebraLevel
from engine.errors import UserError


class Poly:
    """An integer polynomial in x, coefficients constant term first, no trailing zeros."""

    __slots__ = ("coefficients",)

    def __init__(self, coefficients=()) -> None:
        c = list(coefficients)
        while c and c[-1] == 0:
            c.pop()
        self.coefficients: tuple[int, ...] = tuple(c)

    @classmethod
    def x_power(cls, e: int) -> "Poly":
        return cls((0,) * e + (1,))

    @staticmethod
    def _of(value: "Poly | int") -> "Poly":
        return value if isinstance(value, Poly) else Poly((value,))

    def __add__(self, other: "Poly | int") -> "Poly":
        a, b = self.coefficients, Poly._of(other).coefficients
        if len(a) < len(b):
            a, b = b, a
        return Poly(tuple(x + (b[i] if i < len(b) else 0) for i, x in enumerate(a)))

    __radd__ = __add__

    def __neg__(self) -> "Poly":
        return Poly(tuple(-x for x in self.coefficients))

    def __sub__(self, other: "Poly | int") -> "Poly":
        return self + (-Poly._of(other))

    def __rsub__(self, other: "Poly | int") -> "Poly":
        return Poly._of(other) - self

    def __mul__(self, other: "Poly | int") -> "Poly":
        if not isinstance(other, Poly):
            return Poly(tuple(x * other for x in self.coefficients))
        a, b = self.coefficients, other.coefficients
        if not a or not b:
            return Poly()
        out = [0] * (len(a) + len(b) - 1)
        for i, x in enumerate(a):
            if x:
                for j, y in enumerate(b):
                    out[i + j] += x * y
        return Poly(out)

    __rmul__ = __mul__

    def __pow__(self, e: int) -> "Poly":
        result = Poly((1,))
        for _ in range(e):
            result = result * self
        return result

    def __bool__(self) -> bool:
        return bool(self.coefficients)

    def __eq__(self, other: object) -> bool:
        if isinstance(other, int):
            other = Poly((other,))
        return isinstance(other, Poly) and self.coefficients == other.coefficients

    def __hash__(self) -> int:
        return hash(self.coefficients)

    def __call__(self, value: int) -> int:
        """The value at x = ``value`` (Horner)."""
        result = 0
        for c in reversed(self.coefficients):
            result = result * value + c
        return result

    def __repr__(self) -> str:
        return f"Poly({list(self.coefficients)})"

    def text(self) -> str:
        """``3*x^2 - x + 1`` (highest power first); ``0`` for the zero polynomial."""
        parts = []
        for e in range(len(self.coefficients) - 1, -1, -1):
            c = self.coefficients[e]
            if not c:
                continue
            power = "" if e == 0 else ("x" if e == 1 else f"x^{e}")
            size = abs(c)
            body = str(size) if not power else (power if size == 1 else f"{size}*{power}")
            parts.append(("-" if c < 0 else "+", body))
        if not parts:
            return "0"
        first = ("-" if parts[0][0] == "-" else "") + parts[0][1]
        return " ".join([first] + [f"{s} {b}" for s, b in parts[1:]])


Coefficient = Union[int, Poly]
Element = dict[Blocks, Coefficient]

_TERM = re.compile(r"(?:([0-9]+)\*?)?(\{.*\})")


def _split_terms(text: str) -> list[tuple[int, str]]:
    """Split at + and − outside braces: (sign, term text) pairs."""
    terms: list[tuple[int, str]] = []
    depth, sign, current = 0, None, []
    for ch in text:
        if ch == "{":
            depth += 1
        elif ch == "}":
            depth -= 1
        if depth == 0 and ch in "+-":
            body = "".join(current)
            if body:
                terms.append((sign or 1, body))
            elif sign is not None:
                raise UserError(f"cannot read the element {text[:80]!r}: two signs in a row")
            sign, current = (-1 if ch == "-" else 1), []
            continue
        current.append(ch)
    body = "".join(current)
    if not body:
        raise UserError(f"cannot read the element {text[:80]!r}: it ends with a sign")
    terms.append((sign or 1, body))
    return terms


def parse_element(text: str, level: AlgebraLevel) -> dict[Blocks, int]:
    """Read ``{1,1'},{2,2'} - 2*{1,2},{1',2'}`` (spaces anywhere, ``1*`` optional, a leading
    sign allowed) as an element of the level's algebra; UserError (one line) when a term is not a
    coefficient times a basis diagram."""
    compact = "".join(text.split())
    if not compact:
        raise UserError("an empty element: write terms c*D, e.g. {1,1'},{2,2'} - 2*{1,2},{1',2'}")
    element: dict[Blocks, int] = {}
    for sign, term in _split_terms(compact):
        match = _TERM.fullmatch(term)
        if match is None:
            raise UserError(f"cannot read the term {term[:80]!r}: write c*D with an integer c and a diagram D "
                            "in braces, e.g. 2*{1,2},{1',2'}")
        c = sign * int(match.group(1) or 1)
        d = parse_diagram(match.group(2), level.vertices)
        if not in_basis(d, level):
            raise UserError(f"{format_diagram(d, level.vertices)[:200]} is not a diagram of {level.name}")
        add_term(element, d, c)
    return element


def add_term(element: Element, d: Blocks, c: Coefficient) -> None:
    """element += c·d in place, dropping the term when it cancels."""
    total = element.get(d, 0) + c
    if total:
        element[d] = total
    else:
        element.pop(d, None)


def ordered(element: Element, level: AlgebraLevel) -> list[tuple[Blocks, Coefficient]]:
    """The terms in basis order (rank order)."""
    return sorted(element.items(), key=lambda item: rank(level, item[0], check=False))


def _coefficient_text(c: Coefficient) -> tuple[str, str]:
    """(sign, body before the diagram): ``("-", "2*")``, ``("+", "")``, ``("+", "(x^2 - 1)*")``."""
    if isinstance(c, Poly):
        if len(c.coefficients) == 1:
            return _coefficient_text(c.coefficients[0])
        nonzero = [v for v in c.coefficients if v]
        if len(nonzero) == 1:
            sign = "-" if nonzero[0] < 0 else "+"
            return sign, (-c if sign == "-" else c).text() + "*"
        return "+", f"({c.text()})*"
    sign = "-" if c < 0 else "+"
    return sign, "" if abs(c) == 1 else f"{abs(c)}*"


def format_element(element: Element, level: AlgebraLevel) -> str:
    """The text form, terms in basis order; ``0`` for the zero element."""
    parts = []
    for d, c in ordered(element, level):
        sign, body = _coefficient_text(c)
        parts.append((sign, body + format_diagram(d, level.vertices)))
    if not parts:
        return "0"
    first = ("-" if parts[0][0] == "-" else "") + parts[0][1]
    return " ".join([first] + [f"{s} {b}" for s, b in parts[1:]])


def coefficient_json(c: Coefficient) -> int | list[int]:
    return list(c.coefficients) if isinstance(c, Poly) else c


def element_json(element: Element, level: AlgebraLevel) -> dict:
    """``{"terms": [{"coefficient": c, "diagram": "..."}, ...]}`` in basis order (a polynomial
    coefficient is the list of its coefficients, constant term first)."""
    return {"terms": [{"coefficient": coefficient_json(c), "diagram": format_diagram(d, level.vertices)}
                      for d, c in ordered(element, level)]}


def diagram_element(d: Blocks) -> dict[Blocks, int]:
    return {d: 1}
