"""The exact number reader, against sympy's own exact values."""

import pytest
import sympy

from engine.algebraic import AlgebraicError, parse_number, parse_sympy


@pytest.mark.parametrize("text, reference", [
    ("(1+sqrt(5))/2", sympy.GoldenRatio),
    ("unity(5)+unity(5,4)", 2 * sympy.cos(2 * sympy.pi / 5)),
    ("sqrt(-3)", sympy.I * sympy.sqrt(3)),
    ("unity(3)^-1", sympy.exp(-2 * sympy.pi * sympy.I / 3)),
    ("sqrt(12)/2 - 3/4", sympy.sqrt(3) - sympy.Rational(3, 4)),
    ("i^3 + 2*i", sympy.I),
    ("-unity(8)^2", -sympy.I),
    ("sqrt(1/3)", 1 / sympy.sqrt(3)),
])
def test_values_agree_with_sympy(text, reference):
    # both our cyclotomic value and the sympy tree equal sympy's reference to 40 digits
    ours = complex(parse_number(text).to_sympy().evalf(40))
    tree = complex(parse_sympy(text).evalf(40))
    ref = complex(sympy.N(reference, 40))
    assert abs(ours - ref) < 1e-30 and abs(tree - ref) < 1e-30


def test_exact_identities():
    # Gauss sum: ζ5 + ζ5^4 − ζ5^2 − ζ5^3 = √5 (Ireland and Rosen, 6.3); 1 + ζ3 + ζ3² = 0
    assert parse_number("unity(5)+unity(5,4)-unity(5,2)-unity(5,3)") == parse_number("sqrt(5)")
    assert parse_number("1+unity(3)+unity(3,2)").rational() == 0
    assert parse_number("sqrt(2)^2").rational() == 2
    assert parse_number("sqrt(2)").rational() is None
    assert parse_number(7).rational() == 7


@pytest.mark.parametrize("bad, words", [
    ("", "empty"), ("1+", "ends too early"), ("x", "unexpected 'x'"), ("1/0", "division by zero"),
    ("2^(1/2)", "whole-number exponent"), ("1/sqrt(2)", "divisor must be rational"),
    ("sqrt(i)", "argument of sqrt must be rational"), ("__import__('os')", "unexpected"),
    ("(1+2", r"expected '\)'"), ("unity(0)", "1 ≤ n"),
])
def test_bad_entries_are_refused(bad, words):
    with pytest.raises(AlgebraicError, match=words):
        parse_number(bad)


def test_cyclotomic_reduction_agrees_with_sympy():
    # Φ_n and remainders modulo Φ_n against sympy's cyclotomic_poly and Poly.rem (sympy)
    from fractions import Fraction

    from sympy import Poly, QQ, symbols
    from sympy.polys.specialpolys import cyclotomic_poly

    from engine.cyclotomic import Cyc, cyclotomic_coefficients

    x = symbols("x")
    for n in list(range(1, 40)) + [60, 84, 105]:
        ref = Poly(cyclotomic_poly(n, x), x).all_coeffs()
        assert list(cyclotomic_coefficients(n)) == [int(c) for c in reversed(ref)]
        terms = {k: Fraction((3 * k * k + 1) % 7 - 3, 1 + k % 4) for k in range(n)}
        ours = Cyc(n, terms).reduce()[1]
        rem = Poly({(k,): QQ(c.numerator, c.denominator) for k, c in terms.items()}, x, domain=QQ).rem(
            Poly(cyclotomic_poly(n, x), x, domain=QQ))
        theirs = [Fraction(int(c.numerator), int(c.denominator)) for c in reversed(rem.all_coeffs())]
        while theirs and theirs[-1] == 0:
            theirs.pop()
        mine = list(ours)
        while mine and mine[-1] == 0:
            mine.pop()
        assert mine == theirs, n


# ----- the text of a cyclotomic number (engine.cyclotomic.trigonometric_text) ---------------------
from fractions import Fraction  # noqa: E402
import subprocess  # noqa: E402
import sys  # noqa: E402

from hypothesis import given, settings, strategies as st  # noqa: E402

from engine.cyclotomic import Cyc  # noqa: E402


def _from_text(text: str):
    # sympy reads the text as it is printed: i is the imaginary unit, the rest is sympy's syntax
    return sympy.parse_expr(text, local_dict={"i": sympy.I})


@st.composite
def cyclotomic(draw):
    n = draw(st.integers(1, 24))
    terms = draw(st.dictionaries(st.integers(0, n - 1), st.fractions(min_value=-5, max_value=5, max_denominator=6),
                                 max_size=6))
    return Cyc(n, terms)


@settings(max_examples=300, deadline=None)
@given(cyclotomic())
def test_the_text_is_the_number(x):
    # sympy's value of the printed text equals sympy's value of Σ c_k e^{2πik/n} to 40 digits; a
    # text without cos or sin is also read back exactly by our own reader
    text = str(x)
    assert "exp" not in text and "I" not in text
    ours = complex(sympy.N(_from_text(text), 40))
    reference = complex(sympy.N(x.to_sympy(), 40))
    assert abs(ours - reference) < 1e-25
    if "cos" not in text and "sin" not in text:
        assert parse_number(text) == x


@pytest.mark.parametrize("text, shown", [
    # 2·cos(2π/5) = (√5 − 1)/2 and 2·cos(4π/5) = −(1 + √5)/2 (from memory: the regular pentagon)
    ("unity(5)+unity(5,4)", "-1/2 + sqrt(5)/2"),
    ("unity(5,2)+unity(5,3)", "-1/2 - sqrt(5)/2"),
    # ζ_3 = −1/2 + i·√3/2, ζ_8 = (1 + i)/√2, ζ_4 = i (common practice)
    ("unity(3)", "-1/2 + i*sqrt(3)/2"),
    ("unity(8)", "sqrt(2)/2 + i*sqrt(2)/2"),
    ("unity(4)", "i"),
    ("-3*unity(4)/2", "-3*i/2"),
    # 2·cos(2π/7) has degree 3: no square root writes it
    ("unity(7)+unity(7,6)", "2*cos(2*pi/7)"),
    # the sums of ζ_p^a over the quadratic residues a are (−1 + g_p)/2 with the Gauss sum
    # g_p = √p for p ≡ 1 (mod 4), i·√p for p ≡ 3 (mod 4) (Ireland and Rosen, Prop. 6.3.2)
    ("unity(7)+unity(7,2)+unity(7,4)", "-1/2 + i*sqrt(7)/2"),
    ("unity(13)+unity(13,3)+unity(13,4)+unity(13,9)+unity(13,10)+unity(13,12)", "-1/2 + sqrt(13)/2"),
])
def test_familiar_values_are_written_by_square_roots(text, shown):
    assert str(parse_number(text)) == shown


def test_printing_a_number_does_not_import_sympy():
    code = ("import sys; from engine.algebraic import parse_number; "
            "print(parse_number('unity(7)+unity(7,3)')); assert 'sympy' not in sys.modules")
    done = subprocess.run([sys.executable, "-c", code], capture_output=True, text=True, check=False)
    assert done.returncode == 0, done.stderr
    assert "cos(2*pi/7)" in done.stdout


@settings(max_examples=200, deadline=None)
@given(st.fractions(min_value=-9, max_value=9, max_denominator=7), st.fractions(min_value=-9, max_value=9, max_denominator=7),
       st.integers(-60, 60).filter(lambda m: m not in (0, 1)), st.fractions(min_value=-3, max_value=3, max_denominator=5))
def test_a_quadratic_number_is_written_by_its_square_root(a, b, m, c):
    # a + b·√m + c·i, √m written as a cyclotomic number by Gauss sums (engine.cyclotomic.sqrt_rational):
    # the text has no cosine and our reader gives back the same number exactly
    from engine.cyclotomic import sqrt_rational

    x = Cyc.of(a) + sqrt_rational(Fraction(m)) * b + Cyc.unity(4) * c
    text = str(x)
    assert "cos" not in text and "sin" not in text, text
    assert parse_number(text) == x
