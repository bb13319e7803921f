"""The command-line contract (shared guide cli-contract.md) held over every family.

For each family's example spec (``towerscope families --json``) and a few more towers with half
levels, multiple edges, self-conjugate labels or a file behind them: ``levels --json`` shapes and
exact ints, ``node --json`` at level 0, in the middle and at the last level asked for, ``paths
--json`` with its default count, ``--start`` and ``--count``, and ``export --format dot``.
Then every error path: one line on stderr, exit status 2, no traceback.

Outside facts used: dim V^{⊗k} = (dim V)^k, and restriction to a subgroup keeps dimensions, so
Σ m·dim at level k and at k + 1/2 is (dim V)^k (common practice); a multiplicity is the number of
paths from the root, so m(node) = Σ_parents m(parent)·edges (Bratteli 1972, the definition of a
Bratteli diagram); dim V is read off the contract's table of families.
"""

from __future__ import annotations

import re
from fractions import Fraction
from pathlib import Path

import pytest

from engine.diagram import Diagram
from engine.specs import families, parse_spec, split_spec
from tests.cli.conftest import main_json as run_json
from tests.cli.conftest import main_output, run_process

ROOT = Path(__file__).resolve().parents[2]

def _towers():
    """(spec, K, half levels?, dim V) for every registered family's example specs: K = 2 with half
    levels, 4 without (the last level of a shorter mixed word); dim V as the contract's table says
    (C^N for the N-families, C^2 for su2) or, for files and built-in tables, Σ m·dim at level 1,
    which is then held to (dim V)^k at every level."""
    import os

    here = os.getcwd()
    os.chdir(ROOT)
    try:
        out = []
        for family in families().values():
            for spec in (family.example, *family.examples):
                tower = parse_spec(spec)
                halves = tower.steps_per_unit == 2
                top = 2 if halves else 4 if tower.max_index is None else min(4, tower.max_index)
                if family.name == "su2":
                    dim_v = 2
                elif "n" in split_spec(spec)[1] and "module" not in split_spec(spec)[1]:
                    dim_v = int(split_spec(spec)[1]["n"])
                else:
                    dim_v = Diagram(tower).sums(tower.steps_per_unit).weighted
                out.append((spec, str(top), halves, dim_v))
        return out
    finally:
        os.chdir(here)


TOWERS = _towers()
IDS = [spec.split(":")[0] + "-" + str(i) for i, (spec, *_rest) in enumerate(TOWERS)]


@pytest.fixture(autouse=True)
def _from_the_project_folder(monkeypatch):
    # the example specs name files relative to the project folder
    monkeypatch.chdir(ROOT)


def level_values(top: str, halves: bool) -> list[Fraction]:
    end = Fraction(top)
    step = Fraction(1, 2) if halves else Fraction(1)
    values, v = [], Fraction(0)
    while v <= end:
        values.append(v)
        v += step
    return values


def as_json_number(value: Fraction):
    return int(value) if value.denominator == 1 else float(value)


def is_count(x) -> bool:
    return type(x) is int  # not bool, float or str


@pytest.fixture(scope="module")
def documents():
    """levels --json of every tower, computed once for the module."""
    return {}


def levels_doc(documents, capsys, spec: str, top: str):
    if spec not in documents:
        documents[spec] = run_json(capsys, "levels", spec, "--to", top)
    return documents[spec]


@pytest.mark.parametrize("spec,top,halves,dim_v", TOWERS, ids=IDS)
def test_levels_json(documents, capsys, spec, top, halves, dim_v):
    doc = levels_doc(documents, capsys, spec, top)
    assert set(doc) == {"tower", "levels", "first_unfaithful"} and doc["tower"] == spec
    expected = level_values(top, halves)
    assert [lv["level"] for lv in doc["levels"]] == [as_json_number(v) for v in expected]
    for lv, value in zip(doc["levels"], expected):
        assert type(lv["level"]) is (int if value.denominator == 1 else float)
        assert set(lv) in ({"level", "nodes", "sums"}, {"level", "nodes", "sums", "algebra"})
        if "algebra" in lv:
            algebra = lv["algebra"]
            assert set(algebra) == {"name", "dimension", "faithful"} and is_count(algebra["dimension"])
            assert algebra["faithful"] == (algebra["dimension"] == lv["sums"]["squares"])
        labels = [n["label"] for n in lv["nodes"]]
        assert labels and len(labels) == len(set(labels)), "each node once"
        for n in lv["nodes"]:
            assert set(n) == {"label", "multiplicity", "dimension"} and isinstance(n["label"], str)
            assert is_count(n["multiplicity"]) and n["multiplicity"] >= 1
            assert is_count(n["dimension"]) and n["dimension"] >= 1
        sums = lv["sums"]
        assert all(is_count(sums[key]) for key in ("multiplicities", "squares", "weighted"))
        assert sums["multiplicities"] == sum(n["multiplicity"] for n in lv["nodes"])
        assert sums["squares"] == sum(n["multiplicity"] ** 2 for n in lv["nodes"])
        assert sums["weighted"] == sum(n["multiplicity"] * n["dimension"] for n in lv["nodes"])
        assert sums["weighted"] == dim_v ** int(value)  # dim V^{⊗k}, also at k + 1/2
    root = doc["levels"][0]["nodes"]
    assert len(root) == 1 and root[0]["multiplicity"] == 1 and root[0]["dimension"] == 1


def _check_node(capsys, spec, levels, position, label):
    level = levels[position]
    doc = run_json(capsys, "node", spec, "--level", str(level["level"]), "--label", label)
    assert set(doc) == {"level", "label", "multiplicity", "dimension", "parents", "children"}
    assert doc["level"] == level["level"] and type(doc["level"]) is type(level["level"])
    listed = {n["label"]: n for n in level["nodes"]}
    assert doc["label"] == label
    assert doc["multiplicity"] == listed[label]["multiplicity"] and is_count(doc["multiplicity"])
    assert doc["dimension"] == listed[label]["dimension"]
    if position == 0:
        assert doc["parents"] == []
    else:
        before = {n["label"]: n["multiplicity"] for n in levels[position - 1]["nodes"]}
        for p in doc["parents"]:
            assert set(p) == {"label", "level", "edges"} and p["level"] == levels[position - 1]["level"]
            assert is_count(p["edges"]) and p["edges"] >= 1 and p["label"] in before
        # paths to a node = Σ over parents of paths to the parent times the edges joining them
        assert doc["multiplicity"] == sum(before[p["label"]] * p["edges"] for p in doc["parents"])
    if position + 1 < len(levels):
        after = {n["label"] for n in levels[position + 1]["nodes"]}
        assert {c["label"] for c in doc["children"]} <= after
    for c in doc["children"]:
        assert set(c) == {"label", "level", "edges"} and is_count(c["edges"]) and c["edges"] >= 1
    return doc


@pytest.mark.parametrize("spec,top,halves,dim_v", TOWERS, ids=IDS)
def test_node_json_at_the_root_middle_and_last_level(documents, capsys, spec, top, halves, dim_v):
    levels = levels_doc(documents, capsys, spec, top)["levels"]
    _check_node(capsys, spec, levels, 0, levels[0]["nodes"][0]["label"])
    middle = len(levels) // 2
    for n in levels[middle]["nodes"][:3]:
        _check_node(capsys, spec, levels, middle, n["label"])
    last = len(levels) - 1
    for n in (levels[last]["nodes"][0], levels[last]["nodes"][-1]):
        doc = _check_node(capsys, spec, levels, last, n["label"])
    if spec.startswith("mixed:") and top == str(len(spec.split("word=")[1])):  # the word ends here
        assert doc["children"] == []
    # the children seen from above agree with the parents seen from below
    for n in levels[last - 1]["nodes"][:2]:
        above = run_json(capsys, "node", spec, "--level", str(levels[last - 1]["level"]), "--label", n["label"])
        for c in above["children"]:
            below = run_json(capsys, "node", spec, "--level", str(levels[last]["level"]), "--label", c["label"])
            assert {"label": n["label"], "level": levels[last - 1]["level"], "edges": c["edges"]} in below["parents"]


@pytest.mark.parametrize("spec,top,halves,dim_v", TOWERS, ids=IDS)
def test_paths_json(documents, capsys, spec, top, halves, dim_v):
    levels = levels_doc(documents, capsys, spec, top)["levels"]
    node = max(levels[-1]["nodes"], key=lambda n: n["multiplicity"])
    where = ("paths", spec, "--level", str(levels[-1]["level"]), "--label", node["label"])
    doc = run_json(capsys, *where)
    assert set(doc) >= {"level", "label", "total", "start", "paths"}
    assert doc["level"] == levels[-1]["level"] and doc["label"] == node["label"]
    assert doc["total"] == node["multiplicity"] and is_count(doc["total"]) and doc["start"] == 0
    assert len(doc["paths"]) == min(20, doc["total"])  # --count defaults to 20
    assert [p["rank"] for p in doc["paths"]] == list(range(len(doc["paths"])))
    seen = set()
    for p in doc["paths"]:
        labels = p["labels"]
        assert len(labels) == len(levels), "every level 0..L"
        assert labels[0] == levels[0]["nodes"][0]["label"] and labels[-1] == node["label"]
        for label, level in zip(labels, levels):
            assert label in {n["label"] for n in level["nodes"]}
        edges = p.get("edges", [1] * (len(labels) - 1))  # which edge, where nodes are joined by several
        assert len(edges) == len(labels) - 1 and all(is_count(e) and e >= 1 for e in edges)
        seen.add((tuple(labels), tuple(edges)))
    assert len(seen) == len(doc["paths"]), "distinct paths"
    if doc["total"] >= 3:
        part = run_json(capsys, *where, "--start", "1", "--count", "2")
        assert part["start"] == 1 and part["total"] == doc["total"]
        assert part["paths"] == doc["paths"][1:3]
    last = run_json(capsys, *where, "--start", str(doc["total"] - 1), "--count", "5")
    assert [p["rank"] for p in last["paths"]] == [doc["total"] - 1]


_NODE = re.compile(r'^\s*(\w+) \[(.*)\];$')
_EDGE = re.compile(r'^\s*(\w+) -> (\w+)(?: \[(.*)\])?;$')
_ATTR = re.compile(r'(\w+)=("(?:[^"\\]|\\.)*"|[^,\s]+)')


def _attrs(text: str | None) -> dict[str, str]:
    return {k: v.strip('"') for k, v in _ATTR.findall(text or "")}


@pytest.mark.parametrize("spec,top,halves,dim_v", TOWERS, ids=IDS)
def test_export_dot(documents, capsys, tmp_path, spec, top, halves, dim_v):
    levels = levels_doc(documents, capsys, spec, top)["levels"]
    target = tmp_path / "tower.dot"
    status, _, err = main_output(capsys, "export", spec, "--to", top, "--format", "dot", "-o", str(target))
    assert status == 0, err
    lines = target.read_text(encoding="utf-8").splitlines()
    assert lines[0].startswith("digraph") and lines[-1] == "}"
    nodes, edges = {}, []
    for line in lines:
        if m := _NODE.match(line):
            if m.group(1) not in ("node", "graph", "edge"):
                nodes[m.group(1)] = _attrs(m.group(2))
        elif m := _EDGE.match(line):
            edges.append((m.group(1), m.group(2), _attrs(m.group(3))))
    assert all("label" in a and "level" in a for a in nodes.values())
    shown = {(Fraction(a["level"]), a["label"]) for a in nodes.values()}
    assert len(shown) == len(nodes)
    assert shown == {(Fraction(str(lv["level"])), n["label"]) for lv in levels for n in lv["nodes"]}
    # edges: between consecutive levels; `edges` only (and exactly) where the count exceeds 1
    counts = {}
    for lv in levels[:-1]:
        for n in lv["nodes"]:
            doc = run_json(capsys, "node", spec, "--level", str(lv["level"]), "--label", n["label"])
            for c in doc["children"]:
                counts[(Fraction(str(lv["level"])), n["label"], c["label"])] = c["edges"]
    found = {}
    for a, b, attrs in edges:
        level_a, level_b = Fraction(nodes[a]["level"]), Fraction(nodes[b]["level"])
        assert level_b - level_a == (Fraction(1, 2) if halves else 1)
        count = int(attrs["edges"]) if "edges" in attrs else 1
        assert ("edges" in attrs) == (count > 1)
        found[(level_a, nodes[a]["label"], nodes[b]["label"])] = count
    assert found == counts


# ----- errors ---------------------------------------------------------------------------------


@pytest.fixture
def bad_files(tmp_path):
    (tmp_path / "latin1.toml").write_bytes('group = "caf\xe9"\n'.encode("latin-1"))
    (tmp_path / "folder.toml").mkdir()
    (tmp_path / "broken.toml").write_text("format = [\n", encoding="utf-8")
    (tmp_path / "wrong.toml").write_text('format = "something-else"\nversion = 1\n', encoding="utf-8")
    (tmp_path / "bad.graphml").write_text("<graphml", encoding="utf-8")
    (tmp_path / "bytes.gml").write_bytes(b"\xff\xfe\x00")
    return tmp_path


ERRORS = [
    # bad specs
    ("levels", "nosuch:n=3", "--to", "2"),
    ("levels", "symmetric", "--to", "2"),
    ("levels", "symmetric:n=0", "--to", "2"),
    ("levels", "symmetric:n=four", "--to", "2"),
    ("levels", "symmetric:n=4,colour=red", "--to", "2"),
    ("levels", "symmetric:n=4,halves=maybe", "--to", "2"),
    ("levels", "symmetric:n=6,module=(5,1", "--to", "2"),
    ("levels", "symmetric:n=6,module=(5,2)", "--to", "2"),
    ("levels", "symplectic:n=3", "--to", "2"),
    ("levels", "mixed:n=3,word=vxd", "--to", "2"),
    ("levels", "mixed:n=3", "--to", "2"),
    ("levels", "su2:kind=pentagonal", "--to", "2"),
    ("levels", "su2:kind=cyclic", "--to", "2"),
    ("levels", "su2:kind=dihedral,m=1", "--to", "2"),
    ("levels", "characters", "--to", "2"),
    ("levels", "characters:group=dihedral(5),module=zz", "--to", "2"),
    ("levels", "characters:group=symmetric(30)", "--to", "2"),
    ("levels", "characters:group=cyclic(99999999),module=x1", "--to", "2"),
    ("levels", "characters:group=dihedral(99999999),module=r1", "--to", "2"),
    # bad levels
    ("levels", "symmetric:n=4", "--to", "-1"),
    ("levels", "symmetric:n=4", "--to", "1/3"),
    ("levels", "symmetric:n=4", "--to", "two"),
    ("levels", "general-linear:n=3", "--to", "2.5"),
    ("levels", "mixed:n=3,word=vdvd", "--to", "5"),  # beyond the word
    ("node", "mixed:n=3,word=vd", "--level", "3", "--label", "((),())"),
    ("node", "symmetric:n=4", "--level", "-2", "--label", "(4)"),
    # bad labels
    ("node", "symmetric:n=4", "--level", "3", "--label", "(5)"),
    ("node", "symmetric:n=4", "--level", "3", "--label", "(3,a)"),
    ("node", "symmetric:n=4", "--level", "2.5", "--label", "(4)"),
    ("node", "symmetric:n=4", "--level", "1", "--label", "(2,2)"),  # a partition, but no path yet
    ("node", "alternating:n=4", "--level", "2", "--label", "(2,2)"),  # needs its sign
    ("node", "mixed:n=3,word=vd", "--level", "1", "--label", "((1)"),
    ("node", "su2:kind=icosahedral", "--level", "2", "--label", "zz"),
    ("paths", "symmetric:n=4", "--level", "3", "--label", "(5)"),
    ("paths", "symmetric:n=4", "--level", "3", "--label", "(3,1)", "--start", "10"),
    ("paths", "symmetric:n=4", "--level", "3", "--label", "(3,1)", "--start", "ten"),
    ("paths", "symmetric:n=4", "--level", "3", "--label", "(3,1)", "--count", "-1"),
    ("paths", "symmetric:n=4", "--level", "3", "--label", "(3,1)", "--encoding", "tableau"),
    ("rank", "general-linear:n=4", "--level", "4", "--label", "(2,1,1)", "1,2/3/5"),
    ("rank", "symmetric:n=4", "--level", "3", "--label", "(3,1)", "(4) (3)"),
    # huge requests: refused up front with the estimate
    ("levels", "symmetric:n=80", "--to", "200"),
    ("levels", "symmetric:n=4", "--to", "99999999999999999999999"),
    ("levels", "orthogonal:n=50", "--to", "300"),
    ("node", "symmetric:n=12", "--level", "10000000000", "--label", "(6,3,3)"),
    ("node", "general-linear:n=2", "--level", "1000000", "--label", "(500000,500000)"),
    ("paths", "symmetric:n=12", "--level", "100000", "--label", "(6,3,3)"),
    ("tableaux", "symmetric:n=12", "--level", "10000000000", "--label", "(6,3,3)"),
    # command-line usage
    ("levels", "symmetric:n=4", "--to", "3", "--json", "--csv"),
    ("export", "symmetric:n=4", "--to", "3", "--format", "png", "-o", "x.png"),
]

FILE_ERRORS = [
    ("levels", "graph:file={d}/missing.toml", "--to", "2"),
    ("levels", "graph:file={d}/latin1.toml", "--to", "2"),
    ("levels", "graph:file={d}/folder.toml", "--to", "2"),
    ("levels", "graph:file={d}/broken.toml", "--to", "2"),
    ("levels", "graph:file={d}/wrong.toml", "--to", "2"),
    ("levels", "graph:file={d}/bad.graphml", "--to", "2"),
    ("levels", "graph:file={d}/bytes.gml", "--to", "2"),
    ("levels", "graph:file={d}", "--to", "2"),
    ("levels", "characters:file={d}/missing.toml", "--to", "2"),
    ("levels", "characters:file={d}/latin1.toml", "--to", "2"),
    ("levels", "characters:file={d}/folder.toml", "--to", "2"),
    ("levels", "characters:file={d}/wrong.toml", "--to", "2"),
    ("check", "{d}/missing.toml"),
    ("check", "{d}/latin1.toml"),
    ("check", "{d}/folder.toml"),
    ("check", "{d}/broken.toml"),
    ("mckay", "graph:file={d}/latin1.toml"),
    ("export", "symmetric:n=4", "--to", "2", "--format", "dot", "-o", "{d}/no/such/folder/x.dot"),
    ("export", "symmetric:n=4", "--to", "2", "--format", "dot", "-o", "{d}/folder.toml"),
]


def _one_line_exit_2(status, out, err):
    assert status == 2, (status, out, err)
    assert "Traceback" not in err and len(err.strip().splitlines()) == 1, err
    assert err.startswith("towerscope"), err


@pytest.mark.parametrize("argv", ERRORS, ids=lambda a: " ".join(a)[:60])
def test_bad_input_is_one_line_and_exit_2(capsys, argv):
    _one_line_exit_2(*main_output(capsys, *argv))


@pytest.mark.parametrize("argv", FILE_ERRORS, ids=lambda a: " ".join(a)[:60])
def test_bad_files_are_one_line_and_exit_2(capsys, bad_files, argv):
    _one_line_exit_2(*main_output(capsys, *(a.format(d=bad_files) for a in argv)))


def test_refusals_name_their_estimate(capsys):
    _, _, err = main_output(capsys, "levels", "symmetric:n=80", "--to", "200")
    # the estimate: edges, and the time and memory they would take
    assert re.search(r"would walk \d\.\d\de\+\d+ edges", err) and re.search(r"about .* GB", err)
    _, _, err = main_output(capsys, "node", "symmetric:n=12", "--level", "10000000000", "--label", "(6,3,3)")
    assert re.search(r"about \d\.\d\de\+\d+ digits", err)


@pytest.mark.parametrize(
    "argv",
    [
        ("levels", "symmetric:n=4", "--to", "1/3"),
        ("node", "symmetric:n=12", "--level", "10000000000", "--label", "(6,3,3)"),
        ("check", "{d}/latin1.toml"),
        ("export", "symmetric:n=4", "--to", "2", "--format", "dot", "-o", "/proc/towerscope-test.dot"),
    ],
    ids=["level", "huge-node", "latin1-file", "unwritable-folder"],
)
def test_the_real_command_prints_one_line(bad_files, argv):
    if "/proc/" in " ".join(argv) and not Path("/proc/self").exists():
        pytest.skip("needs a /proc file system (a folder nobody can create files in)")
    done = run_process(*(a.format(d=bad_files) for a in argv))
    _one_line_exit_2(done.returncode, done.stdout, done.stderr)


@pytest.mark.parametrize("spec,top,halves,dim_v", TOWERS, ids=IDS)
def test_levels_from_and_at(documents, capsys, spec, top, halves, dim_v):
    # --from A --to K prints levels A..K only and --at L the single level L, each level exactly as
    # in the full listing (the contract); first_unfaithful is the tower's, whatever is printed
    full = levels_doc(documents, capsys, spec, top)
    levels = full["levels"]
    middle = levels[len(levels) // 2]["level"]
    part = run_json(capsys, "levels", spec, "--from", str(middle), "--to", top)
    assert part["levels"] == [lv for lv in levels if Fraction(str(lv["level"])) >= Fraction(str(middle))]
    assert part["first_unfaithful"] == full["first_unfaithful"]
    one = run_json(capsys, "levels", spec, "--at", str(middle))
    assert one["levels"] == [lv for lv in levels if lv["level"] == middle]
    assert one["first_unfaithful"] == full["first_unfaithful"]


# first_unfaithful against the published statements (the contract: computed for the tower, not the
# printed levels): P_k(N) acts faithfully iff 2k ≤ N (Jones 1994, Martin 1994), CS_k iff k ≤ N and
# B_k(N) iff k ≤ N (Brauer 1937; Goodman and Wallach 2009, ch. 10), B_k(−2M) iff k ≤ M, TL_k(−2)
# always (it is the whole centralizer of SL_2), the walled Brauer algebra iff r + s ≤ N
FIRST_UNFAITHFUL = [
    ("symmetric:n=4", 2.5), ("symmetric:n=5", 3), ("symmetric:n=5,halves=no", 3),
    ("general-linear:n=3", 4), ("orthogonal:n=3", 4), ("symplectic:n=4", 3), ("symplectic:n=6", 4),
    ("symplectic:n=2", None), ("mixed:n=2,word=vvdd", 3), ("mixed:n=3,word=vvd", None),
    ("su2:kind=icosahedral", None),
]


@pytest.mark.parametrize("spec,expected", FIRST_UNFAITHFUL)
def test_first_unfaithful_is_for_the_whole_tower(capsys, spec, expected):
    doc = run_json(capsys, "levels", spec, "--to", "1")
    assert doc["first_unfaithful"] == expected
    if expected is not None:  # and the printed levels agree where they reach it
        deep = run_json(capsys, "levels", spec, "--to", str(expected))
        assert [lv["algebra"]["faithful"] for lv in deep["levels"]][-1] is False
        assert all(lv["algebra"]["faithful"] for lv in deep["levels"][:-1])


def test_deep_at_without_building(capsys):
    # level 10^6 of the icosahedral tower by a jump (matrix powers); Σ m·dim = 2^(10^6)
    # (dim V^{⊗k}, common practice), the node count is the five nodes of even distance from the
    # trivial one in the affine E8 graph (McKay 1980, from memory)
    import sys

    sys.set_int_max_str_digits(0)
    doc = run_json(capsys, "levels", "su2:kind=icosahedral", "--at", "1000000")
    (level,) = doc["levels"]
    assert level["level"] == 1000000 and len(level["nodes"]) == 5
    assert level["sums"]["weighted"] == 2**1000000
