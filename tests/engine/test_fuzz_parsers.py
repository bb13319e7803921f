"""Property tests of every parser of user text, on hostile strings (hypothesis, deterministic).

Each parser either answers or raises ``engine.errors.UserError`` with one line of at most 500
characters (the CLI contract, cli-contract.md) — never another exception.  Where a parser has an
inverse, reading what was written gives the value back.  Expected values: Python's own ``int`` and
``str`` on ASCII digits and ``fractions.Fraction`` (reference implementations in the standard
library), and the notation of the contract (common practice)."""

from __future__ import annotations

import json
from fractions import Fraction

import pytest
from hypothesis import HealthCheck, given, settings
from hypothesis import strategies as st

from engine.algebraic import parse_number
from engine.character_tables import builtin_table
from engine.encodings import get_encoding
from engine.errors import UserError
from engine.files.session import parse_session
from engine.files.toml_checks import parse_toml
from engine.levels import format_level, parse_level
from engine.numbers_in import digit_count, read_big, read_whole
from engine.partition_pairs import format_pair, parse_pair
from engine.partitions import format_partition, parse_partition
from engine.paths import parse_rank
from engine.specs import parse_spec, split_spec

FUZZ = settings(
    max_examples=250, derandomize=True, deadline=None, database=None,
    suppress_health_check=[HealthCheck.too_slow, HealthCheck.filter_too_much],
)

#: characters that broke parsers: digits Python reads oddly, brackets, operators, NUL, spaces
HOSTILE = "0123456789²³₃①٣⁹½()[]{},;:=+-*/^_.eE xyzinsqrtunity#'\"\\\x00\t\n→∅/|"
hostile_text = st.text(alphabet=HOSTILE, max_size=60)
deep_text = st.builds(
    lambda opener, depth, core: opener * depth + core + {"(": ")", "[": "]", "-": ""}[opener] * depth,
    st.sampled_from("([-"), st.integers(0, 3000), st.sampled_from(["1", "²", "", "unity(5)", "x"]),
)
any_text = st.one_of(hostile_text, deep_text, st.text(max_size=40))


def answers_or_one_line(parse, text):
    try:
        return parse(text)
    except UserError as exc:
        message = str(exc)
        assert "\n" not in message, message[:300]
        assert len(message) <= 500, len(message)
        return None


@FUZZ
@given(any_text)
def test_whole_numbers(text):
    value = answers_or_one_line(lambda t: read_whole(t, "n"), text)
    if value is not None:
        assert value == int(text.strip().replace("_", ""))  # Python's int (ASCII digits only here)
        assert text.strip().replace("_", "").isascii()


@FUZZ
@given(st.integers(min_value=0, max_value=10**400))
def test_whole_numbers_read_back_and_digit_count(n):
    assert read_whole(str(n), "n") == n  # Python's str/int
    assert read_big(str(n), "n") == n
    assert digit_count(n) == len(str(n))


@FUZZ
@given(any_text)
def test_big_numbers(text):
    answers_or_one_line(lambda t: read_big(t, "n"), text)


@FUZZ
@given(st.integers(0, 40), st.integers(0, 40))
def test_powers_are_exact(base, exponent):
    assert read_big(f"{base}^{exponent}", "n") == base**exponent  # Python's integer power
    assert read_big(f"3*{base}**{exponent}", "n") == 3 * base**exponent


@FUZZ
@given(any_text)
def test_levels(text):
    value = answers_or_one_line(parse_level, text)
    if value is not None:
        assert value >= 0


@FUZZ
@given(st.fractions(min_value=0, max_value=10**12, max_denominator=7))
def test_levels_read_back(level):
    if level.denominator in (1, 2):
        assert parse_level(format_level(level)) == level  # the contract's notation: 3, 2.5
    assert parse_level(f"{level.numerator}/{level.denominator}") == level  # fractions.Fraction


@FUZZ
@given(any_text)
def test_partitions_and_pairs(text):
    answers_or_one_line(parse_partition, text)
    answers_or_one_line(parse_pair, text)


@FUZZ
@given(st.lists(st.integers(1, 30), max_size=8).map(lambda xs: tuple(sorted(xs, reverse=True))))
def test_partitions_read_back(parts):
    assert parse_partition(format_partition(parts)) == parts  # the contract's notation (3,1,1)
    assert parse_partition(" ".join(map(str, parts))) == parts
    assert parse_pair(format_pair((parts, parts[:1]))) == (parts, parts[:1])


@FUZZ
@given(any_text, st.integers(1, 10**30))
def test_ranks(text, total):
    value = answers_or_one_line(lambda t: parse_rank(t, total), text)
    if value is not None:
        assert value >= 0


@FUZZ
@given(st.integers(0, 10**50))
def test_ranks_read_back(n):
    assert parse_rank(str(n)) == n
    assert parse_rank(f"{n:_}") == n
    assert parse_rank(f"-{n + 1}", n + 1) == 0


@FUZZ
@given(st.one_of(any_text, st.builds(lambda f, k, v: f"{f}:{k}={v}", st.sampled_from(
    ["symmetric", "alternating", "orthogonal", "symplectic", "general-linear", "mixed", "su2", "characters"]),
    st.sampled_from(["n", "m", "kind", "word", "module", "group", "halves"]), hostile_text)))
def test_specs(text):
    answers_or_one_line(split_spec, text)
    tower = answers_or_one_line(parse_spec, text)
    if tower is not None:
        assert tower.spec


@FUZZ
@given(st.one_of(any_text, st.builds(
    lambda a, op, b: f"{a}{op}{b}", st.sampled_from(["unity(7)", "sqrt(5)", "(1+i)", "2", "unity(997)", "²"]),
    st.sampled_from(["*", "+", "^", "/", "-", "^-"]), st.sampled_from(["unity(991)", "3", "40", "sqrt(2003)", "₃", "9999"]))))
def test_table_entries(text):
    answers_or_one_line(parse_number, text)


@pytest.mark.parametrize("text, value", [("1+1", 2), ("(1+sqrt(5))/2*2-1", None), ("--3", 3), ("2^10", 1024)])
def test_table_entries_still_read(text, value):
    # hand computation
    number = parse_number(text)
    if value is not None:
        assert number.rational() == value


@FUZZ
@given(any_text)
def test_builtin_tables(text):
    answers_or_one_line(builtin_table, f"cyclic({text})")
    answers_or_one_line(builtin_table, text)


@FUZZ
@given(st.one_of(any_text, st.builds(lambda k, v: f"{k} = {v}\n", st.sampled_from(["format", "x", "matrix"]), any_text)))
def test_toml_text(text):
    answers_or_one_line(lambda t: parse_toml(t, "f.toml"), text)


@FUZZ
@given(st.one_of(any_text, st.builds(
    lambda key, value: json.dumps({"format": "towerscope-session", "version": 1, "tower": "symmetric:n=4", key: value}),
    st.sampled_from(["tower", "level", "node", "bookmarks", "notes", "view"]),
    st.recursive(st.one_of(st.none(), st.booleans(), st.integers(), st.floats(), hostile_text),
                 lambda inner: st.lists(inner, max_size=3) | st.dictionaries(hostile_text, inner, max_size=3), max_leaves=8),
)))
def test_session_text(text):
    answers_or_one_line(parse_session, text)


_TOWER = parse_spec("symmetric:n=4")


@FUZZ
@given(any_text, st.sampled_from([("symmetric:n=4", "labels"), ("symmetric:n=4", "vacillating"),
                                   ("symmetric:n=4", "updown"), ("general-linear:n=3", "tableau")]))
def test_paths_as_text(text, choice):
    tower = parse_spec(choice[0])
    encoding = get_encoding(tower, choice[1])
    answers_or_one_line(lambda t: encoding.path_from_text(tower, t), text)


@FUZZ
@given(any_text, st.integers(0, 6))
def test_node_labels(text, index):
    for spec in ("symmetric:n=4", "mixed:n=3,word=vdvd", "su2:kind=tetrahedral", "orthogonal:n=3"):
        tower = parse_spec(spec)
        if tower.max_index is not None and index > tower.max_index:
            continue  # callers check the level first (Tower.check_index)
        answers_or_one_line(lambda t: tower.parse(t, index), text)
