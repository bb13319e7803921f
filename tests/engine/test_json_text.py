"""engine.export.json_text writes what json.dumps writes (the standard library is the reference),
with large ints written by python-flint."""

import json
import sys

from engine.export.json_text import dumps


def test_same_text_as_json_dumps():
    sys.set_int_max_str_digits(0)
    value = {"a": [1, -2, 3**5000, {"b": -(7**4000), "c": "x\"y"}], "d": None, "e": 2.5, "f": "ε"}
    for indent in (None, 1):
        assert dumps(value, indent=indent) == json.dumps(value, ensure_ascii=False, indent=indent)
    assert json.loads(dumps(value)) == value


def test_a_string_that_looks_like_a_placeholder_stays():
    value = {"s": "deadbeef:0", "n": 10**2000}
    assert json.loads(dumps(value)) == value
