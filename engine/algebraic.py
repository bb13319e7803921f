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
from math import gcd
from typing import Any

from engine.cyclotomic import Cyc, sqrt_conductor, sqrt_rational
from engine.errors import UserError
from engine.numbers_in import explain_non_digits, quote

_TOKEN = re.compile(r"\s*(?:([0-9]+)|([A-Za-z_]+)|(.))", re.ASCII | re.DOTALL)
#: digits of one whole number in an entry
_MAX_DIGITS = 40
#: characters of one entry, and tokens in it (an entry of a character table is a few dozen)
MAX_TEXT = 4_000
MAX_TOKENS = 2_000
#: nesting of parentheses, sqrt, unity and powers
MAX_DEPTH = 40
#: the largest n of the field Q(ζ_n) an entry or any step of its evaluation may need
MAX_CONDUCTOR = 1_000
#: whole-number exponents x^k
_MAX_POWER = 10_000
#: bits of the largest coefficient of any intermediate value (about 6,000 digits)
MAX_COEFFICIENT_BITS = 20_000
#: term products (weighted by coefficient size) an entry may spend while it is evaluated
MAX_WORK = 500_000

Tree = tuple[Any, ...]


class AlgebraicError(UserError):
    """Text that is not an exact algebraic number in our syntax."""


_SYNTAX = "integers, fractions a/b, i, sqrt(q), unity(n) or unity(n,k), + - * / ^ and parentheses"


class _Parser:
    def __init__(self, text: str) -> None:
        self.text = text
        if len(text) > MAX_TEXT:
            raise AlgebraicError(f"{quote(text)} is too long for a table entry (at most {MAX_TEXT:,} characters)")
        self.tokens: list[str] = []
        pos = 0
        stripped = text.rstrip()
        while pos < len(stripped):
            m = _TOKEN.match(stripped, pos)
            if m is None:  # pragma: no cover - the pattern matches any character
                break
            self.tokens.append(m.group(1) or m.group(2) or m.group(3))
            pos = m.end()
            if len(self.tokens) > MAX_TOKENS:
                raise AlgebraicError(f"{quote(text)} is too long for a table entry (at most {MAX_TOKENS} symbols)")
        self.pos = 0
        self.depth = 0

    def enter(self) -> None:
        self.depth += 1
        if self.depth > MAX_DEPTH:
            raise self.fail(f"it nests deeper than {MAX_DEPTH} levels")

    def leave(self) -> None:
        self.depth -= 1

    def fail(self, what: str) -> AlgebraicError:
        return AlgebraicError(f"{quote(self.text)} is not an exact number: {what} (accepted: {_SYNTAX})")

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
        negative = False
        while self.peek() in ("-", "+"):  # a loop, not recursion: any run of signs is cheap
            negative ^= self.take() == "-"
        tree = self.power()
        return ("neg", tree) if negative else tree

    def power(self) -> Tree:
        self.enter()
        try:
            return self._power()
        finally:
            self.leave()

    def _power(self) -> Tree:
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
        if tok is None or not tok.isdigit() or not tok.isascii():
            if tok is not None and tok.isnumeric():
                raise self.fail(f"expected {what}: {explain_non_digits(tok)}")
            raise self.fail(f"expected {what}, found {tok!r}" if tok else f"expected {what} at the end")
        self.take()
        if len(tok) > _MAX_DIGITS:
            raise self.fail(f"a number with more than {_MAX_DIGITS} digits")
        return int(tok)

    def atom(self) -> Tree:
        tok = self.peek()
        if tok is None:
            raise self.fail("it ends too early")
        if tok.isdigit() and tok.isascii():
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
            if not 1 <= n <= MAX_CONDUCTOR:
                raise self.fail(f"unity(n) needs 1 ≤ n ≤ {MAX_CONDUCTOR}, got {n}")
            return ("unity", n, k)
        if tok.isnumeric():
            raise self.fail(explain_non_digits(tok))
        raise self.fail(f"unexpected {tok!r}")


def parse_tree(text: str) -> Tree:
    """The syntax tree of an exact number; AlgebraicError with a one-line message otherwise."""
    return _Parser(text).parse()


def to_cyclotomic(tree: Tree, text: str = "") -> Cyc:
    """Evaluate a tree exactly in a cyclotomic field, within the limits above: every step's field
    Q(ζ_n) has n ≤ MAX_CONDUCTOR, every coefficient at most MAX_COEFFICIENT_BITS bits, and the
    whole evaluation at most MAX_WORK weighted term products; each is refused before it is done."""
    return _Evaluator(text).value(tree)


def _lcm(a: int, b: int) -> int:
    return a * b // gcd(a, b)


def _coefficient_bits(value: Cyc) -> int:
    return max((c.numerator.bit_length() + c.denominator.bit_length() for c in value.terms.values()), default=0)


class _Evaluator:
    def __init__(self, text: str) -> None:
        self.text = text
        self.work = 0

    def fail(self, what: str) -> AlgebraicError:
        return AlgebraicError(f"{quote(self.text)}: {what}")

    def field(self, n: int) -> None:
        if n > MAX_CONDUCTOR:
            raise self.fail(
                f"needs the field of {n:,}th roots of unity, beyond the {MAX_CONDUCTOR:,} accepted"
            )

    def spend(self, terms: int, bits: int) -> None:
        if bits > MAX_COEFFICIENT_BITS:
            raise self.fail(
                f"a coefficient would have about {bits:,} bits, more than the {MAX_COEFFICIENT_BITS:,} accepted"
            )
        self.work += terms * (1 + bits // 64)
        if self.work > MAX_WORK:
            raise self.fail(f"it takes more than {MAX_WORK:,} steps to evaluate (the limit for a table entry)")

    def add(self, a: Cyc, b: Cyc) -> Cyc:
        self.field(_lcm(a.n, b.n))
        self.spend(len(a.terms) + len(b.terms), max(_coefficient_bits(a), _coefficient_bits(b)) + 1)
        return a + b

    def mul(self, a: Cyc, b: Cyc) -> Cyc:
        self.field(_lcm(a.n, b.n))
        ta, tb = len(a.terms), len(b.terms)
        self.spend(ta * tb, _coefficient_bits(a) + _coefficient_bits(b) + min(ta, tb).bit_length())
        return a * b

    def power(self, base: Cyc, exponent: int) -> Cyc:
        if exponent < 0:
            try:
                base = base.inverse_monomial()
            except ValueError as exc:
                raise self.fail("a negative power needs a root of unity times a rational") from exc
            exponent = -exponent
        growth = max((c.numerator.bit_length() + c.denominator.bit_length() - 2 for c in base.terms.values()), default=0)
        growth += (len(base.terms) - 1).bit_length()
        if exponent * growth > MAX_COEFFICIENT_BITS:
            raise self.fail(
                f"the power ^{exponent} would have coefficients of about {exponent * growth:,} bits, "
                f"more than the {MAX_COEFFICIENT_BITS:,} accepted"
            )
        result = Cyc.of(1)
        while exponent:
            if exponent & 1:
                result = self.mul(result, base)
            exponent >>= 1
            if exponent:
                base = self.mul(base, base)
        return result

    def rational(self, sub: Tree, what: str) -> Fraction:
        value = self.value(sub)
        self.spend(len(value.terms) * max(1, len(value.terms)), _coefficient_bits(value))
        found = value.rational()
        if found is None:
            raise AlgebraicError(f"{quote(self.text)}: {what} must be rational (accepted: {_SYNTAX})")
        return found

    def value(self, tree: Tree) -> Cyc:
        kind = tree[0]
        if kind == "int":
            return Cyc.of(tree[1])
        if kind == "i":
            return Cyc.unity(4)
        if kind == "unity":
            self.field(tree[1])
            return Cyc.unity(tree[1], tree[2])
        if kind == "sqrt":
            argument = self.rational(tree[1], "the argument of sqrt")
            if abs(argument.numerator * argument.denominator) > 10**12:
                raise self.fail("the square root of a number this large is not supported (|a·b| ≤ 10^12 for sqrt(a/b))")
            self.field(sqrt_conductor(argument))
            try:
                return sqrt_rational(argument)
            except ValueError as exc:
                raise self.fail(str(exc)) from exc
        if kind == "neg":
            return -self.value(tree[1])
        if kind in ("add", "sub"):
            a, b = self.value(tree[1]), self.value(tree[2])
            return self.add(a, b if kind == "add" else -b)
        if kind == "mul":
            return self.mul(self.value(tree[1]), self.value(tree[2]))
        if kind == "div":
            divisor = self.rational(tree[2], "a divisor")
            if divisor == 0:
                raise self.fail("division by zero")
            return self.mul(self.value(tree[1]), Cyc.of(1 / divisor))
        if kind == "pow":
            return self.power(self.value(tree[1]), tree[2])
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
        raise AlgebraicError(f"{quote(repr(value))} is not an exact number (write a whole number or a string of {_SYNTAX})")
    return to_cyclotomic(parse_tree(value), value)


def parse_sympy(text: str):  # -> sympy.Expr
    """The sympy expression of an entry in our syntax."""
    return to_sympy(parse_tree(text))
