from fractions import Fraction

import pytest

from engine.levels import LevelError, format_level, level_to_json, parse_level


def test_level_forms_mean_the_same():
    # cli-contract: 2.5, 5/2 and 2+1/2 all mean the same level
    assert parse_level("2.5") == parse_level("5/2") == parse_level("2+1/2") == Fraction(5, 2)
    assert parse_level("3") == 3 and parse_level(" 0 ") == 0


def test_bad_levels():
    for bad in ["-1", "x", "1/0", "2+", ""]:
        with pytest.raises(LevelError):
            parse_level(bad)


def test_output_forms():
    assert level_to_json(Fraction(3)) == 3 and isinstance(level_to_json(Fraction(3)), int)
    assert level_to_json(Fraction(5, 2)) == 2.5
    assert format_level(Fraction(5, 2)) == "2.5" and format_level(Fraction(4)) == "4"
