"""Character-table files: the examples load, and each broken table gets its own message."""

from pathlib import Path

import pytest

from engine.diagram import Diagram
from engine.errors import UserError
from engine.files.character_table import read_character_file
from engine.specs import parse_spec

EXAMPLES = Path(__file__).resolve().parents[2] / "sessions" / "examples"
A4 = (EXAMPLES / "a4-on-3.toml").read_text()


def _write(tmp_path, text):
    path = tmp_path / "table.toml"
    path.write_text(text)
    return path


def test_a4_example_reads():
    # A_4: degrees 1, 1, 1, 3 (James and Liebeck, 18.3; from memory); 3 ⊗ 3 = 1 + w + w2 + 2·3
    data = read_character_file(EXAMPLES / "a4-on-3.toml")
    assert data.table.degrees() == (1, 1, 1, 3)
    d = Diagram(parse_spec(f"characters:file={EXAMPLES / 'a4-on-3.toml'}"))
    assert d.level(2) == {"1": 1, "w": 1, "w2": 1, "3": 2}
    for k in range(8):
        assert d.sums(k).weighted == 3**k


def test_subgroup_example_equals_the_alternating_tower():
    # A_4 on 4 points with half levels C_3 is alternating:n=4 (A_3 = C_3), up to names
    ours = Diagram(parse_spec(f"characters:file={EXAMPLES / 'a4-points.toml'}"))
    graph = Diagram(parse_spec(f"graph:file={EXAMPLES / 'a4-points-graph.toml'}"))
    ref = Diagram(parse_spec("alternating:n=4"))
    for k in range(10):
        assert ours.level(k) == graph.level(k)
        assert sorted(ours.level(k).values()) == sorted(ref.level(k).values())
        assert ours.sums(k).squares == ref.sums(k).squares


@pytest.mark.parametrize("old, new, words", [
    # a wrong class size
    ("sizes = [1, 3, 4, 4]", "sizes = [1, 4, 4, 4]", r"sum to 13, not the group order 12; class '\(12\)\(34\)' has size 4 but its column gives"),
    # a class size that still sums right but breaks column orthogonality
    ("order = 12\nclasses = [\"1\", \"(12)(34)\", \"(123)\", \"(132)\"]\nsizes = [1, 3, 4, 4]",
     "order = 12\nclasses = [\"1\", \"(12)(34)\", \"(123)\", \"(132)\"]\nsizes = [1, 3, 5, 3]", "does not divide|not orthogonal|not 1"),
    # a non-orthogonal row
    ('values = [3, -1, 0, 0]', 'values = [3, 1, 0, 0]', "rows '1' and '3' are not orthogonal"),
    # the first row not trivial
    ('name = "1"\nvalues = [1, 1, 1, 1]', 'name = "1"\nvalues = [1, 1, -1, 1]', "first row '1' must be the trivial character"),
    # a module with a non-integer multiplicity
    ('[module]\nsum = ["3"]', '[module]\nvalues = [2, 0, 0, 0]', "contains '1' 1/6 times, not a whole number"),
    # an unreadable entry
    ('"unity(3)^2", "unity(3)"]', '"unity(3)^2", "cbrt(2)"]', "row 'w2', class '\\(132\\)'"),
    # a module naming no irreducible
    ('sum = ["3"]', 'sum = ["4"]', "'4' is not an irreducible"),
    # wrong header
    ('version = 1', 'version = 7', "key 'version'"),
    # too few values
    ('values = [3, -1, 0, 0]', 'values = [3, -1, 0]', "row '3': 3 values for 4 classes"),
    # unknown key
    ('order = 12', 'order = 12\ncolour = "red"', "unknown key 'colour'"),
    # degree not positive
    ('values = [3, -1, 0, 0]', 'values = ["1/2", -1, 0, 0]', "degree"),
])
def test_broken_tables_have_their_own_messages(tmp_path, old, new, words):
    assert old in A4
    path = _write(tmp_path, A4.replace(old, new, 1))
    with pytest.raises(UserError, match=words):
        read_character_file(path)


def test_subgroup_mistakes_are_named(tmp_path):
    text = (EXAMPLES / "a4-points.toml").read_text()
    bad_fusion = _write(tmp_path, text.replace('fusion = ["1", "(123)", "(132)"]', 'fusion = ["1", "(123)", "(999)"]'))
    with pytest.raises(UserError, match="'\\(999\\)' is not a class of A_4"):
        read_character_file(bad_fusion)
    wrong_v = _write(tmp_path, text.replace("\n[subgroup]\n", "\n[module]\nsum = [\"3\"]\n\n[subgroup]\n"))
    with pytest.raises(UserError, match="not the module induced"):
        read_character_file(wrong_v)
