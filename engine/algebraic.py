"""A small safe reader of exact algebraic numbers, for character-table files.

Accepted syntax (documented in README, "Character table files"):

- whole numbers ``3``, ``-2``; fractions by division ``1/2``, ``(1+sqrt(5))/2``;
- ``i`` (a square root of −1);
- ``sqrt(q)`` for a rational q, negative allowed (``sqrt(-3)`` = i·√3);
- ``unity(n)`` = e^{2πi/n} and ``unity(n, k)`` = e^{2πik/n}, the roots of unity;
- ``+ - * /``, parentheses, and whole-number powers ``x^k``.

Division is only by a non-zero rational; a negative power only of a single root of unity times a
rational.  The text is tokenised and parsed by recursive descent into a small tree; nothing is
evaluated by Python or sympy from the raw text.  A tree evaluates to an exact cyclotomic number
(``engine.cyclotomic.Cyc``) or to a sympy expression built node by node.
"""

from __future__ import annotations

import re
from fractions import Fraction
from typing import Any

from engine.cyclotomic import Cyc, sqrt_rational
from engine.errors import UserError

_TOKEN = re.compile(r"\s*(?:(\d+)|([A-Za-z_]+)|(.))")
_MAX_DIGITS = 40
_MAX_ORDER = 10_000
_MAX_POWER = 10_000

Tree = tuple[Any, ...]


class AlgebraicError(UserError):
    """Text that is not an exact algebraic number in our syntax."""


_SYNTAX = "integers, fractions a/b, i, sqrt(q), unity(n) or unity(n,k), + - * / ^ and parentheses"


class _Parser:
    def __init__(self, text: str) -> None:
        self.text = text
        self.tokens: list[str] = []
        pos = 0
        stripped = text.rstrip()
        while pos < len(stripped):
            m = _TOKEN.match(stripped, pos)
            if m is None:  # pragma: no cover - the pattern matches any character
                break
            self.tokens.append(m.group(1) or m.group(2) or m.group(3))
            pos = m.end()
        self.pos = 0

    def fail(self, what: str) -> AlgebraicError:
        return AlgebraicError(f"{self.text!r} is not an exact number: {what} (accepted: {_SYNTAX})")

    def peek(self) -> str | None:
        return self.tokens[self.pos] if self.pos < len(self.tokens) else None

    def take(self, expected: str | None = None) -> str:
        tok = self.peek()
        if tok is None:
            raise self.fail("it ends too early" if expected is None else f"expected {expected!r} at the end")
        if expected is not None and tok != expected:
            raise self.fail(f"expected {expected!r}, found {tok!r}")
        self.pos += 1
        return tok

    def parse(self) -> Tree:
        if not self.tokens:
            raise self.fail("it is empty")
        tree = self.sum()
        if self.peek() is not None:
            raise self.fail(f"unexpected {self.peek()!r}")
        return tree

    def sum(self) -> Tree:
        tree = self.product()
        while self.peek() in ("+", "-"):
            op = self.take()
            tree = ("add" if op == "+" else "sub", tree, self.product())
        return tree

    def product(self) -> Tree:
        tree = self.unary()
        while self.peek() in ("*", "/"):
            op = self.take()
            tree = ("mul" if op == "*" else "div", tree, self.unary())
        return tree

    def unary(self) -> Tree:
        if self.peek() == "-":
            self.take()
            return ("neg", self.unary())
        if self.peek() == "+":
            self.take()
            return self.unary()
        return self.power()

    def power(self) -> Tree:
        base = self.atom()
        if self.peek() in ("^",):
            self.take()
            sign = 1
            if self.peek() == "-":
                self.take()
                sign = -1
            exponent = self.whole("a whole-number exponent")
            if exponent > _MAX_POWER:
                raise self.fail(f"exponent {exponent} is too large (at most {_MAX_POWER})")
            return ("pow", base, sign * exponent)
        return base

    def whole(self, what: str) -> int:
        tok = self.peek()
        if tok is None or not tok.isdigit():
            raise self.fail(f"expected {what}, found {tok!r}" if tok else f"expected {what} at the end")
        self.take()
        if len(tok) > _MAX_DIGITS:
            raise self.fail(f"a number with more than {_MAX_DIGITS} digits")
        return int(tok)

    def atom(self) -> Tree:
        tok = self.peek()
        if tok is None:
            raise self.fail("it ends too early")
        if tok.isdigit():
            return ("int", self.whole("a number"))
        if tok == "(":
            self.take()
            tree = self.sum()
            self.take(")")
            return tree
        if tok == "i":
            self.take()
            return ("i",)
        if tok == "sqrt":
            self.take()
            self.take("(")
            arg = self.sum()
            self.take(")")
            return ("sqrt", arg)
        if tok == "unity":
            self.take()
            self.take("(")
            n = self.whole("the order n of unity(n)")
            k = 1
            if self.peek() == ",":
                self.take()
                sign = 1
                if self.peek() == "-":
                    self.take()
                    sign = -1
                k = sign * self.whole("the power k of unity(n,k)")
            self.take(")")
            if not 1 <= n <= _MAX_ORDER:
                raise self.fail(f"unity(n) needs 1 ≤ n ≤ {_MAX_ORDER}, got {n}")
            return ("unity", n, k)
        raise self.fail(f"unexpected {tok!r}")


def parse_tree(text: str) -> Tree:
    """The syntax tree of an exact number; AlgebraicError with a one-line message otherwise."""
    return _Parser(text).parse()


def to_cyclotomic(tree: Tree, text: str = "") -> Cyc:
    """Evaluate a tree exactly in a cyclotomic field."""
    kind = tree[0]

    def rational_of(sub: Tree, what: str) -> Fraction:
        value = to_cyclotomic(sub, text).rational()
        if value is None:
            raise AlgebraicError(f"{text!r}: {what} must be rational (accepted: {_SYNTAX})")
        return value

    if kind == "int":
        return Cyc.of(tree[1])
    if kind == "i":
        return Cyc.unity(4)
    if kind == "unity":
        return Cyc.unity(tree[1], tree[2])
    if kind == "sqrt":
        argument = rational_of(tree[1], "the argument of sqrt")
        try:
            return sqrt_rational(argument)
        except ValueError as exc:
            raise AlgebraicError(f"{text!r}: {exc}") from exc
    if kind == "neg":
        return -to_cyclotomic(tree[1], text)
    if kind in ("add", "sub", "mul"):
        a, b = to_cyclotomic(tree[1], text), to_cyclotomic(tree[2], text)
        return a + b if kind == "add" else a - b if kind == "sub" else a * b
    if kind == "div":
        divisor = rational_of(tree[2], "a divisor")
        if divisor == 0:
            raise AlgebraicError(f"{text!r}: division by zero")
        return to_cyclotomic(tree[1], text) * (1 / divisor)
    if kind == "pow":
        base = to_cyclotomic(tree[1], text)
        try:
            return base ** tree[2]
        except ValueError as exc:
            raise AlgebraicError(f"{text!r}: a negative power needs a root of unity times a rational") from exc
    raise AssertionError(kind)  # pragma: no cover


def to_sympy(tree: Tree):  # -> sympy.Expr
    """Build the sympy expression of a tree node by node (no parsing of text by sympy)."""
    import sympy

    kind = tree[0]
    if kind == "int":
        return sympy.Integer(tree[1])
    if kind == "i":
        return sympy.I
    if kind == "unity":
        return sympy.exp(2 * sympy.pi * sympy.I * sympy.Rational(tree[2], tree[1]))
    if kind == "sqrt":
        return sympy.sqrt(to_sympy(tree[1]))
    if kind == "neg":
        return -to_sympy(tree[1])
    a, b = to_sympy(tree[1]), (to_sympy(tree[2]) if kind != "pow" else tree[2])
    if kind == "add":
        return a + b
    if kind == "sub":
        return a - b
    if kind == "mul":
        return a * b
    if kind == "div":
        return a / b
    if kind == "pow":
        return a ** sympy.Integer(b)
    raise AssertionError(kind)  # pragma: no cover


def parse_number(value: str | int) -> Cyc:
    """A table entry (TOML integer or string in our syntax) as an exact cyclotomic number."""
    if isinstance(value, bool):
        raise AlgebraicError(f"{value!r} is not an exact number (accepted: {_SYNTAX})")
    if isinstance(value, int):
        return Cyc.of(value)
    if not isinstance(value, str):
        raise AlgebraicError(f"{value!r} is not an exact number (write a whole number or a string of {_SYNTAX})")
    return to_cyclotomic(parse_tree(value), value)


def parse_sympy(text: str):  # -> sympy.Expr
    """The sympy expression of an entry in our syntax."""
    return to_sympy(parse_tree(text))
