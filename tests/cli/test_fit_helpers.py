"""The text-fitting helpers of tui/cli/fit.py: folding prose, sums and long words without breaking a
number, short forms with digit counts, exact decimal approximations of fractions."""

from __future__ import annotations

from fractions import Fraction

from tui.cli.fit import abbreviated, approximate
from tui.cli.folding import number_line, wrap_words


def _lines(text: str) -> list[str]:
    return text.rstrip("\n").split("\n")


def test_sums_fold_before_a_sign():
    poly = " + ".join(f"{c}*x^{e}" for c, e in zip(range(100001, 100031), range(30, 0, -1)))
    lines = _lines(wrap_words("Gram determinant: " + poly, 80, "  "))
    assert all(len(line) <= 80 for line in lines)
    assert all(line.startswith("  + ") for line in lines[1:])  # no line ends with a lone sign
    assert " ".join(line.strip() for line in lines) == "Gram determinant: " + poly


def test_a_number_too_long_for_a_line_is_shortened_with_its_digit_count():
    n = 3**200  # 96 digits (3^200 = 10^95.4, hand computation)
    out = wrap_words(f"coefficient {n} here", 80, "  ")
    assert str(n) not in out and "(96 digits)" in out and out.startswith("coefficient " + str(n)[0] + ".")
    exact = wrap_words(f"coefficient {n} here", 80, "  ", exact=True)
    assert str(n) in exact.split()


def test_long_words_are_cut_after_commas_and_braces_never_in_a_number():
    diagram = ",".join("{" + f"{i},{i}'" + "}" for i in range(1, 41))
    lines = _lines(wrap_words("0  " + diagram, 80, "    "))
    assert all(len(line) <= 80 for line in lines)
    assert "".join(line.strip() for line in lines) == "0  " + diagram  # the cuts lose nothing
    assert all(line.rstrip()[-1] in ",}" for line in lines[:-1])
    grouped = "3,230,608,073,654,421,621,518,459,327,536,258,596,168,744,464,763,714,232,285,323,875,369,675"
    kept = _lines(wrap_words("about " + grouped + " entries", 80, "  ", exact=True))
    assert grouped in [line.strip() for line in kept]  # exact: whole, on a line of its own


def test_abbreviated_and_number_line():
    # 2^100 = 1267650600228229401496703205376, 31 digits (common practice)
    assert abbreviated(2**100) == "1.26765060022e30 (31 digits)"
    assert abbreviated(-(2**100), keep=3) == "-1.26e30 (31 digits)"
    assert number_line("  kernel  ", 2**100, 80, False) == f"  kernel  {2**100}"
    assert number_line("  kernel  ", 2**300, 80, False).endswith("(91 digits)")  # 2^300: 91 digits
    assert number_line("  kernel  ", 2**300, 80, True) == f"  kernel\n{2**300} (91 digits)"  # too long to indent


def test_approximate_is_exact_decimal_rounding_down():
    # hand computation: 1/3 = 0.333..., 2/3 * 10^400, (7/9)^1000 = 10^(1000 * log10(7/9)) = 7.17...e-110
    assert approximate(Fraction(1, 3)) == "3.33333e-1"
    assert approximate(Fraction(2, 3) * 10**400) == "6.66666e399"
    assert approximate(Fraction(7, 9) ** 1000) == "7.17018e-110"
    assert approximate(Fraction(-5, 4)) == "-1.25"
    assert approximate(Fraction(999999, 1000000)) == "9.99999e-1"
    assert approximate(Fraction(0)) == "0"
