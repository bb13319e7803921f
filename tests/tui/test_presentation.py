"""Presentation helpers: shortened and exact numbers, Young diagrams drawn from labels."""

from __future__ import annotations

import pytest

from tui.numbers import digit_count, exact_int, short_int
from tui.explorer.young import draw_boxes, draw_label, shapes_of_label


@pytest.mark.parametrize("n", [0, 9, 10, 99, 10**17, 10**18 - 1, 10**18, 751 * 10**37, 10**40 - 1, 10**40, 2**4000])
def test_digit_count_agrees_with_str(n: int) -> None:
    import sys

    sys.set_int_max_str_digits(0)
    assert digit_count(n) == len(str(n))  # the decimal length, by definition (common practice)


@pytest.mark.parametrize("width", [5, 6, 8, 10])
@pytest.mark.parametrize("n", [0, 12345, 10**8, 3180 * 10**38, 751 * 10**37, 7**500])
def test_short_int_fits_and_keeps_the_leading_digits(n: int, width: int) -> None:
    import sys

    sys.set_int_max_str_digits(0)
    text = short_int(n, width)
    assert len(text) <= width
    if "e" in text:
        mantissa, exponent = text.split("e")
        assert int(exponent) == len(str(n)) - 1
        assert str(n).startswith(mantissa.replace(".", ""))
    else:
        assert text == str(n)


def test_exact_int_groups_and_elides() -> None:
    assert exact_int(1234567) == "1 234 567"
    long_text = exact_int(10**5000)
    assert "(5,001 digits)" in long_text and long_text.startswith("1000")


def test_shapes_of_labels() -> None:
    assert shapes_of_label("(3,1)") == [(3, 1)]
    assert shapes_of_label("((2,1),(1))") == [(2, 1), (1,)]
    assert shapes_of_label("()") == [()]
    assert shapes_of_label("(1,3)") is None  # not weakly decreasing: not a partition
    assert shapes_of_label("V_2") is None and draw_label("V_2", 20, 10) == []


def test_drawing_has_one_box_per_part() -> None:
    # English notation: row i has λ_i boxes, rows flush left (Macdonald I.1, common practice)
    lines = draw_boxes((3, 1))
    assert lines == ["┌─┬─┬─┐", "│ │ │ │", "├─┼─┴─┘", "│ │", "└─┘"]
    for shape in [(4, 2, 2, 1), (1, 1, 1), (5,)]:
        inner = draw_boxes(shape)[1::2]
        assert [line.count("│") - 1 for line in inner] == list(shape)


def test_large_shapes_are_drawn_as_row_bars() -> None:
    # (80) in 28 cells: one bar, to scale, with its length (row lengths of the partition, hand computation)
    lines = draw_label("(80)", 28, 10)
    assert lines[0] == "80 boxes, 1 rows, bars to scale" and lines[1].endswith(" 80")
    # (30,30,30,5,1^20) in 8 lines: equal rows share a line; the bars keep the rows' proportions
    shape = "(" + ",".join(["30"] * 3 + ["5"] + ["1"] * 20) + ")"
    lines = draw_label(shape, 28, 8)
    assert lines[0] == "115 boxes, 24 rows, bars to scale"
    assert lines[1].endswith(" 30×3") and lines[2].endswith(" 5") and lines[3].endswith(" 1×20")
    assert lines[1].count("█") == 20 and lines[2].count("█") == 5 * 20 // 30
    assert draw_label("((1),())", 20, 12)[0] == "first:"
