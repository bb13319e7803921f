"""Exact numbers in cyclotomic fields Q(ζ_n), the numbers of character tables.

Every character value of a finite group is a sum of roots of unity, so it lies in Q(ζ_n) with n the
exponent of the group (Isaacs, *Character Theory of Finite Groups*, 1976, Lemma 2.15); square roots
of rationals lie in cyclotomic fields too, by the quadratic Gauss sum
g_p = Σ_{a=1}^{p−1} (a/p) ζ_p^a = √p for p ≡ 1 (mod 4) and i√p for p ≡ 3 (mod 4)
(Ireland and Rosen, *A Classical Introduction to Modern Number Theory*, 2nd ed., 1990, Prop. 6.3.2),
√2 = ζ_8 + ζ_8^{−1} and √−1 = ζ_4.

A value is held as Σ_k c_k ζ_n^k with rational c_k (not unique); ``reduce`` takes the remainder
modulo the cyclotomic polynomial Φ_n (irreducible over Q: Lang, *Algebra*, VI §3), which is
unique, so equality and rationality are decided exactly.  Φ_n and the remainder are computed in
pure Python (sympy takes seconds to import); tests/engine/test_algebraic.py holds both against
sympy's ``cyclotomic_poly`` and ``Poly.rem``.
"""

from __future__ import annotations

from fractions import Fraction
from functools import lru_cache
from math import gcd
from typing import Union

Number = Union[int, Fraction, "Cyc"]


def _lcm(a: int, b: int) -> int:
    return a * b // gcd(a, b)


class Cyc:
    """Σ_k c_k ζ_n^k, ζ_n = e^{2πi/n}; immutable."""

    __slots__ = ("n", "terms")

    def __init__(self, n: int, terms: dict[int, Fraction] | None = None) -> None:
        self.n = n
        self.terms = {k % n: Fraction(c) for k, c in (terms or {}).items() if c}

    # ----- construction ---------------------------------------------------------------------
    @staticmethod
    def of(value: Number) -> "Cyc":
        if isinstance(value, Cyc):
            return value
        return Cyc(1, {0: Fraction(value)})

    @staticmethod
    def unity(n: int, k: int = 1) -> "Cyc":
        """ζ_n^k = e^{2πik/n}."""
        return Cyc(n, {k % n: Fraction(1)})

    def lift(self, m: int) -> "Cyc":
        """The same number written in Q(ζ_m), m a multiple of n."""
        if m == self.n:
            return self
        f = m // self.n
        return Cyc(m, {k * f: c for k, c in self.terms.items()})

    # ----- arithmetic -----------------------------------------------------------------------
    def __add__(self, other: Number) -> "Cyc":
        o = Cyc.of(other)
        m = _lcm(self.n, o.n)
        a, b = self.lift(m), o.lift(m)
        out = dict(a.terms)
        for k, c in b.terms.items():
            out[k] = out.get(k, 0) + c
        return Cyc(m, out)

    __radd__ = __add__

    def __neg__(self) -> "Cyc":
        return Cyc(self.n, {k: -c for k, c in self.terms.items()})

    def __sub__(self, other: Number) -> "Cyc":
        return self + (-Cyc.of(other))

    def __rsub__(self, other: Number) -> "Cyc":
        return Cyc.of(other) - self

    def __mul__(self, other: Number) -> "Cyc":
        o = Cyc.of(other)
        if o.n == 1:
            c0 = o.terms.get(0, Fraction(0))
            return Cyc(self.n, {k: c * c0 for k, c in self.terms.items()})
        m = _lcm(self.n, o.n)
        a, b = self.lift(m), o.lift(m)
        out: dict[int, Fraction] = {}
        for k1, c1 in a.terms.items():
            for k2, c2 in b.terms.items():
                k = (k1 + k2) % m
                out[k] = out.get(k, 0) + c1 * c2
        return Cyc(m, out)

    __rmul__ = __mul__

    def conjugate(self) -> "Cyc":
        """Complex conjugation: ζ^k ↦ ζ^{−k}."""
        return Cyc(self.n, {-k: c for k, c in self.terms.items()})

    def inverse_monomial(self) -> "Cyc":
        """1/(c·ζ^k) for a single term; a ValueError otherwise."""
        if len(self.terms) != 1:
            raise ValueError("only a single root of unity times a rational can be inverted")
        ((k, c),) = self.terms.items()
        return Cyc(self.n, {-k: 1 / c})

    def __pow__(self, e: int) -> "Cyc":
        if e < 0:
            return self.inverse_monomial() ** (-e)
        result, base = Cyc.of(1), self
        while e:
            if e & 1:
                result = result * base
            base = base * base
            e >>= 1
        return result

    # ----- exact tests ----------------------------------------------------------------------
    def reduce(self) -> tuple[int, tuple[Fraction, ...]]:
        """(n, coefficients of the remainder modulo Φ_n, constant first): a canonical form."""
        if not self.terms:
            return (1, ())
        if self.n == 1:
            return (1, (self.terms[0],))
        return (self.n, _remainder(self.n, tuple(sorted(self.terms.items()))))

    def rational(self) -> Fraction | None:
        """The value as a Fraction when it is rational, else None."""
        n, coeffs = self.reduce()
        if not coeffs:
            return Fraction(0)
        if all(c == 0 for c in coeffs[1:]):
            return coeffs[0]
        return None

    def is_zero(self) -> bool:
        return not any(self.reduce()[1])

    def __eq__(self, other: object) -> bool:
        if not isinstance(other, (int, Fraction, Cyc)):
            return NotImplemented
        return (self - other).is_zero()

    def __hash__(self) -> int:
        value = self.rational()
        return hash(value) if value is not None else hash(self.reduce())

    # ----- output ---------------------------------------------------------------------------
    def to_sympy(self):  # -> sympy.Expr
        import sympy

        total = sympy.Integer(0)
        for k, c in sorted(self.terms.items()):
            root = sympy.Integer(1) if k == 0 else sympy.exp(2 * sympy.pi * sympy.I * sympy.Rational(k, self.n))
            total += sympy.Rational(c.numerator, c.denominator) * root
        return total

    def __str__(self) -> str:
        value = self.rational()
        if value is not None:
            return str(value)
        return trigonometric_text(self)

    __repr__ = __str__


@lru_cache(maxsize=None)
def cyclotomic_coefficients(n: int) -> tuple[int, ...]:
    """Φ_n, constant term first: x^n − 1 divided by Φ_d for every proper divisor d of n
    (x^n − 1 = Π_{d | n} Φ_d(x); Lang, *Algebra*, VI §3).  Pure Python, so that reading a table
    does not import sympy (tests hold it against sympy's ``cyclotomic_poly``)."""
    poly = [-1] + [0] * (n - 1) + [1]
    for d in range(1, n):
        if n % d == 0:
            poly = _divide_exactly(poly, list(cyclotomic_coefficients(d)))
    return tuple(poly)


def _divide_exactly(num: list[int], den: list[int]) -> list[int]:
    """Quotient of integer polynomials (constant first) by a monic divisor that divides exactly."""
    num = num[:]
    out = [0] * (len(num) - len(den) + 1)
    for shift in range(len(out) - 1, -1, -1):
        q = num[shift + len(den) - 1]
        out[shift] = q
        if q:
            for k, c in enumerate(den):
                num[shift + k] -= q * c
    assert not any(num), "not an exact division"
    return out


@lru_cache(maxsize=4096)
def _remainder(n: int, terms: tuple[tuple[int, Fraction], ...]) -> tuple[Fraction, ...]:
    """Coefficients (constant first) of Σ c_k x^k modulo the monic Φ_n(x), exactly over Q."""
    phi = cyclotomic_coefficients(n)
    degree = len(phi) - 1
    top = max(k for k, _ in terms)
    coeffs = [Fraction(0)] * (max(top, degree) + 1)
    for k, c in terms:
        coeffs[k] += c
    for k in range(len(coeffs) - 1, degree - 1, -1):
        lead = coeffs[k]
        if lead:
            base = k - degree
            for j, c in enumerate(phi):
                if c:
                    coeffs[base + j] -= lead * c
    rest = coeffs[:degree]
    return tuple(rest) if any(rest) else ()


def _squarefree_split(m: int) -> tuple[int, int]:
    """m = s²·f with f squarefree (sign kept in f); m ≠ 0 and |m| ≤ 10^12."""
    sign = -1 if m < 0 else 1
    m = abs(m)
    s, f, p = 1, 1, 2
    while p * p <= m:
        while m % (p * p) == 0:
            m //= p * p
            s *= p
        if m % p == 0:
            m //= p
            f *= p
        p += 1
    return s, sign * f * m


def _sqrt_prime(p: int) -> Cyc:
    """√p (positive) in Q(ζ_8) for p = 2, else in Q(ζ_4p) by the quadratic Gauss sum."""
    if p == 2:
        return Cyc(8, {1: Fraction(1), 7: Fraction(1)})
    gauss = Cyc(p, {a: Fraction(1 if pow(a, (p - 1) // 2, p) == 1 else -1) for a in range(1, p)})
    return gauss if p % 4 == 1 else gauss * Cyc.unity(4, 3)


def sqrt_conductor(q: Fraction) -> int:
    """The n of the field Q(ζ_n) in which ``sqrt_rational`` writes √q (|ab| ≤ 10^12 for q = a/b):
    the lcm over the primes p of the squarefree part of 8 (p = 2), p (p ≡ 1 mod 4) or 4p
    (p ≡ 3 mod 4), and 4 when q < 0 (Ireland and Rosen, Prop. 6.3.2, as above)."""
    if q == 0:
        return 1
    _, f = _squarefree_split(q.numerator * q.denominator)
    n = 4 if f < 0 else 1
    f, p = abs(f), 2
    while f > 1:
        if p * p > f:
            p = f  # what is left is prime
        if f % p == 0:
            n = _lcm(n, 8 if p == 2 else p if p % 4 == 1 else 4 * p)
            f //= p
        p += 1
    return n


def sqrt_rational(q: Fraction) -> Cyc:
    """The principal square root of a rational (i·√|q| for q < 0), as a cyclotomic number."""
    if q == 0:
        return Cyc.of(0)
    num = q.numerator * q.denominator  # √(a/b) = √(ab)/b
    if abs(num) > 10**12:
        raise ValueError(f"square root of a number this large ({q}) is not supported")
    s, f = _squarefree_split(num)
    value = Cyc.of(Fraction(s, q.denominator))
    if f < 0:
        value = value * Cyc.unity(4)
        f = -f
    p = 2
    while f > 1:
        if f % p == 0:
            value = value * _sqrt_prime(p)
            f //= p
        p += 1
    return value


# ----- text -----------------------------------------------------------------------------------
_Q = Fraction
#: cos(aπ) for the rational a in [0, 1] where it is rational (by Niven's theorem, Niven,
#: *Irrational Numbers*, 1956, Cor. 3.12, these are all) or a rational plus a rational multiple
#: of one square root (the regular polygons with 4, 5, 6, 8, 10 and 12 sides; common practice):
#: a → (rational part, radicand, coefficient of its square root)
_COS = {_Q(0): (_Q(1), 0, _Q(0)), _Q(1, 3): (_Q(1, 2), 0, _Q(0)), _Q(1, 2): (_Q(0), 0, _Q(0)),
        _Q(2, 3): (_Q(-1, 2), 0, _Q(0)), _Q(1): (_Q(-1), 0, _Q(0)),
        _Q(1, 4): (_Q(0), 2, _Q(1, 2)), _Q(3, 4): (_Q(0), 2, _Q(-1, 2)),
        _Q(1, 6): (_Q(0), 3, _Q(1, 2)), _Q(5, 6): (_Q(0), 3, _Q(-1, 2)),
        _Q(1, 5): (_Q(1, 4), 5, _Q(1, 4)), _Q(2, 5): (_Q(-1, 4), 5, _Q(1, 4)),
        _Q(3, 5): (_Q(1, 4), 5, _Q(-1, 4)), _Q(4, 5): (_Q(-1, 4), 5, _Q(-1, 4))}
#: sin(aπ) = cos((1/2 − a)π) for 0 < a < 1, where that is in ``_COS``
_SIN = {a: _COS[abs(_Q(1, 2) - a)] for a in (_Q(1, 6), _Q(1, 4), _Q(1, 3), _Q(1, 2), _Q(2, 3), _Q(3, 4), _Q(5, 6))}


def trigonometric_text(x: Cyc) -> str:
    """``x`` as a real part and an imaginary part, each a rational plus rational multiples of
    square roots and of cos(aπ) or sin(aπ) with 0 < a < 1 rational, in plain ASCII
    (``-1/4 + sqrt(5)/4``, ``-1/2 + i*sqrt(3)/2``, ``cos(2*pi/7)``), so that it pastes into a
    computer algebra system.  Exact, from ζ_n^k + ζ_n^{−k} = 2·cos(2πk/n) and
    ζ_n^k − ζ_n^{−k} = 2i·sin(2πk/n) (Euler's formula): a pair c·ζ^k + c'·ζ^{−k} is
    (c + c')·cos(2πk/n) + i·(c − c')·sin(2πk/n).  A part that is rational or of degree 2 over Q
    (a Gauss sum, the golden ratio) is written a + b·sqrt(m) as a whole; any other part term by
    term, the cosines and sines of ``_COS`` and ``_SIN`` by their values.  That form depends on
    how ``x`` is written (the ζ_n^k are not independent): the shorter of the form held and the
    canonical remainder modulo Φ_n is shown."""
    conjugate = x.conjugate()
    real_text = _closed_text((x + conjugate) * Fraction(1, 2))
    imaginary_text = _closed_text((x - conjugate) * Cyc(4, {3: Fraction(1, 2)}), unit="i")  # (x − x̄)/(2i)
    if real_text is None or imaginary_text is None:
        n, coeffs = x.reduce()
        forms = [_term_texts(x), _term_texts(Cyc(n, dict(enumerate(coeffs))))]
        if real_text is None:
            real_text = min((f[0] for f in forms), key=len)
        if imaginary_text is None:
            imaginary_text = min((f[1] for f in forms), key=len)
    if imaginary_text == "0":
        return real_text
    if real_text == "0":
        return imaginary_text
    if imaginary_text.startswith("-"):
        return f"{real_text} - {imaginary_text[1:]}"
    return f"{real_text} + {imaginary_text}"


def _term_texts(x: Cyc) -> tuple[str, str]:
    """The real part and i times the imaginary part of ``x`` term by term, as written."""
    n, a = x.n, x.terms
    zero = Fraction(0)
    real: dict[Fraction, Fraction] = {}  # a → coefficient of cos(aπ)
    imaginary: dict[Fraction, Fraction] = {}  # a → coefficient of sin(aπ)
    for k in range(n // 2 + 1):
        c, c_ = a.get(k, zero), a.get((n - k) % n, zero)
        angle = Fraction(2 * k, n)
        if k == 0 or 2 * k == n:  # ζ^0 = 1 and ζ^{n/2} = −1 stand alone
            real[angle] = c
        else:
            real[angle], imaginary[angle] = c + c_, c - c_
    return _sum_text(real, _COS, "cos"), _sum_text(imaginary, _SIN, "sin", unit="i")


def _quadratic(y: Cyc) -> tuple[Fraction, Fraction, int] | None:
    """(a, b, m) with y = a + b·√m, m > 1 squarefree, for a real y of degree 2 over Q; None for
    any other y.  y² = p + q·y is solved on the canonical coordinates (``reduce``); then
    y = q/2 ± √(q²/4 + p), the sign read from y's value in floating point (the two roots lie
    2|b|√m apart)."""
    _, v = y.reduce()
    _, w = (y * y).reduce()
    j = next((i for i in range(1, len(v)) if v[i]), None)
    if j is None:
        return None
    w = w + (Fraction(0),) * (len(v) - len(w))
    q = w[j] / v[j] if j < len(w) else Fraction(0)
    rest = [c - q * d for c, d in zip(w, v)] + list(w[len(v):])
    if any(rest[1:]):
        return None
    disc = q * q / 4 + rest[0]
    product = disc.numerator * disc.denominator
    if disc <= 0 or product > 10 ** 12:
        return None
    root, m = _squarefree_split(product)
    if m == 1:
        return None
    b = Fraction(root, disc.denominator)  # √disc = b·√m
    from cmath import exp, pi

    value = sum(float(c) * exp(2j * pi * k / y.n) for k, c in y.terms.items()).real
    if abs(value - q / 2) < 1e-9 * float(b * b * m) ** 0.5:
        return None
    return q / 2, (b if value > q / 2 else -b), m


def _closed_text(y: Cyc, unit: str = "") -> str | None:
    """unit·y for a real y that is rational or of degree 2 (``_quadratic``); None otherwise."""
    r = y.rational()
    if r is not None:
        return _format([(r, "")], unit) if r else "0"
    found = _quadratic(y)
    if found is None:
        return None
    a, b, m = found
    return _format(([(a, "")] if a else []) + [(b, f"sqrt({m})")], unit)


def _format(bodies: list[tuple[Fraction, str]], unit: str) -> str:
    """unit·Σ c·body, a body "" for a rational term; signs folded into the joins."""
    parts = []
    for c, body in bodies:
        if unit and len(bodies) == 1:  # i times a single term: the unit joins the term
            body = f"{unit}*{body}" if body else unit
        m, d = abs(c).numerator, abs(c).denominator
        text = body if m == 1 and body else f"{m}*{body}" if body else str(m)
        parts.append((c < 0, text + ("" if d == 1 else f"/{d}")))
    text = ("-" if parts[0][0] else "") + parts[0][1]
    for negative, part in parts[1:]:
        text += (" - " if negative else " + ") + part
    return text if not unit or len(bodies) == 1 else f"{unit}*({text})"


def _sum_text(terms: dict[Fraction, Fraction], known: dict, function: str, unit: str = "") -> str:
    """unit·Σ c·function(aπ) over ``terms`` (a → c), the values in ``known`` written out: a
    rational, then square roots by radicand, then the other terms by angle."""
    constant = Fraction(0)
    roots: dict[int, Fraction] = {}
    rest: dict[Fraction, Fraction] = {}
    for angle, c in terms.items():
        if not c:
            continue
        if angle in known:
            q, radicand, r = known[angle]
            constant += c * q
            if r:
                roots[radicand] = roots.get(radicand, Fraction(0)) + c * r
        else:
            rest[angle] = c
    bodies = ([(constant, "")] if constant else []) + [(roots[m], f"sqrt({m})") for m in sorted(roots) if roots[m]]
    for angle in sorted(rest):
        p, q = angle.numerator, angle.denominator
        top = "pi" if p == 1 else f"{p}*pi"
        bodies.append((rest[angle], f"{function}({top if q == 1 else f'{top}/{q}'})"))
    return _format(bodies, unit) if bodies else "0"
