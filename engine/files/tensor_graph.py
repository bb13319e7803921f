"""Tensor-graph files: our TOML schema, and GraphML / GML through networkx.

TOML (``format = "towerscope-tensor-graph"``, ``version = 1``)::

    format = "towerscope-tensor-graph"
    version = 1
    title = "D_5 on its 2-dimensional module"   # optional
    root = "1"                                  # a node of the first step's source set
    pattern = ["tensor"]                        # one step (whole levels) or two (half levels)

    [sets.D5]                                   # a node set: the irreducibles of a group
    labels = ["1", "e", "r1", "r2"]
    dimensions = [1, 1, 2, 2]

    [steps.tensor]                              # a step: rows the source set, columns the target
    from = "D5"
    to = "D5"
    matrix = [[0, 0, 1, 0], [0, 0, 1, 0], [1, 1, 0, 1], [0, 0, 1, 1]]

Checked, each with a message naming the key, set, step, row or node: the header, shapes,
non-negative whole entries, positive dimensions, the root present, the pattern chaining
(each step ends where the next begins), and for each step a constant c with Σ_j M_ij d_j = c·d_i
(``engine.matrix_tower.Step.constant``; McKay 1980).

GraphML and GML carry one node set and one step (whole levels): node attribute ``dimension``,
edge attribute ``count`` (default 1; parallel edges add up), graph attribute ``root`` (default:
the first node of dimension 1).  An undirected edge counts both ways, a directed one i → j only
in row i.
"""

from __future__ import annotations

import re
from pathlib import Path
from typing import Any

from engine.errors import UserError
from engine.files.atomic import write_text_atomic
from engine.files.toml_checks import FileFormatError, check_header, check_keys, load_toml, names_list, need, whole_numbers
from engine.matrix_tower import MatrixTower, NodeSet, Step
from engine.numbers_in import quote

FORMAT = "towerscope-tensor-graph"
VERSIONS = (1,)
NETWORKX_SUFFIXES = (".graphml", ".gml")
#: nodes of one set: step matrices are held dense (2,000² entries), so larger graphs are refused
#: before any matrix is allocated
MAX_NODES = 2_000
#: GraphML and GML files larger than this are refused before they are read
MAX_GRAPH_BYTES = 16 * 1024 * 1024


#: how a node starts in each format (a cheap upper count, before the file is parsed)
_NODE_TAGS = {".graphml": re.compile(r"<(?:\w+:)?node\b"), ".gml": re.compile(r"\bnode\s*\[")}


def _check_node_count(count: int, where: str) -> None:
    if count > MAX_NODES:
        raise FileFormatError(
            f"{where}: {count:,} nodes, more than the {MAX_NODES:,} a tensor graph may have "
            f"(its step matrix would hold {count * count:,} entries)"
        )


def read_toml_graph(path: str | Path) -> tuple[list[Step], str, str]:
    """(pattern of steps, root label, title) from a TOML tensor graph; FileFormatError otherwise."""
    where = Path(path).name
    data = load_toml(path)
    check_header(data, where, FORMAT, VERSIONS)
    check_keys(data, where, {"format", "version", "title", "root", "pattern", "sets", "steps"})
    title = data.get("title", where)
    if not isinstance(title, str):
        raise FileFormatError(f"{where}: key 'title' must be a string")
    sets_raw = need(data, "sets", where, dict, "tables [sets.NAME] with labels and dimensions")
    sets: dict[str, NodeSet] = {}
    for name, body in sets_raw.items():
        label = f"{where}: [sets.{name}]"
        if not isinstance(body, dict):
            raise FileFormatError(f"{label} must be a table with labels and dimensions")
        check_keys(body, label, {"labels", "dimensions"})
        labels = names_list(body, "labels", label)
        _check_node_count(len(labels), label)
        dims = need(body, "dimensions", label, list, "a list of positive whole numbers")
        if len(dims) != len(labels):
            raise FileFormatError(f"{label}: {len(dims)} dimensions for {len(labels)} labels")
        for node, d in zip(labels, dims):
            if isinstance(d, bool) or not isinstance(d, int) or d < 1:
                raise FileFormatError(f"{label}: node {node!r} has dimension {d!r}, not a positive whole number")
        sets[name] = NodeSet(name, labels, tuple(dims))
    if not sets:
        raise FileFormatError(f"{where}: key 'sets' defines no node set")
    steps_raw = need(data, "steps", where, dict, "tables [steps.NAME] with from, to and matrix")
    steps: dict[str, Step] = {}
    for name, body in steps_raw.items():
        steps[name] = _read_step(name, body, sets, where)
    pattern_names = need(data, "pattern", where, list, "a list of one or two step names")
    if len(pattern_names) not in (1, 2):
        raise FileFormatError(f"{where}: key 'pattern' must list one step (whole levels) or two (half levels), got {len(pattern_names)}")
    pattern = []
    for name in pattern_names:
        if name not in steps:
            raise FileFormatError(f"{where}: key 'pattern': {name!r} is not a step (steps: {', '.join(steps) or 'none'})")
        pattern.append(steps[name])
    for a, b in zip(pattern, pattern[1:] + pattern[:1]):
        if a.target.name != b.source.name:
            raise FileFormatError(f"{where}: key 'pattern': step {a.name!r} ends in set {a.target.name!r} "
                                  f"but the next step {b.name!r} starts in {b.source.name!r}")
    root = need(data, "root", where, str, "the label of the trivial module")
    first = pattern[0].source
    if root not in first.labels:
        raise FileFormatError(f"{where}: key 'root': {root!r} is not a node of set {first.name!r} ({', '.join(first.labels)})")
    for step in pattern:
        step.constant()
    return pattern, root, title


def _read_step(name: str, body: Any, sets: dict[str, NodeSet], where: str) -> Step:
    label = f"{where}: [steps.{name}]"
    if not isinstance(body, dict):
        raise FileFormatError(f"{label} must be a table with from, to and matrix")
    check_keys(body, label, {"from", "to", "matrix"})
    ends = []
    for key in ("from", "to"):
        set_name = need(body, key, label, str, "the name of a node set")
        if set_name not in sets:
            raise FileFormatError(f"{label}: key {key!r}: {set_name!r} is not a node set (sets: {', '.join(sets)})")
        ends.append(sets[set_name])
    source, target = ends
    rows = need(body, "matrix", label, list, "a list of rows of whole numbers")
    if len(rows) != len(source.labels):
        raise FileFormatError(f"{label}: the matrix has {len(rows)} rows but set {source.name!r} has {len(source.labels)} nodes")
    matrix = []
    for node, row in zip(source.labels, rows):
        values = whole_numbers(row, f"{label}: row {node!r}")
        if len(values) != len(target.labels):
            raise FileFormatError(f"{label}: row {node!r} has {len(values)} entries but set {target.name!r} has {len(target.labels)} nodes")
        matrix.append(values)
    return Step(name, source, target, tuple(matrix))


def read_networkx_graph(path: str | Path) -> tuple[list[Step], str, str]:
    """(one step, root, title) from GraphML or GML, validated like the TOML form."""
    import warnings

    import networkx as nx

    p = Path(path)
    where = p.name
    kind = p.suffix[1:].upper()
    try:
        if not p.is_file():
            raise FileFormatError(f"cannot read {str(p)!r}: {'not a regular file' if p.exists() else 'no such file'}")
        if p.stat().st_size > MAX_GRAPH_BYTES:
            raise FileFormatError(f"{where}: too large ({p.stat().st_size:,} bytes; at most {MAX_GRAPH_BYTES:,})")
    except OSError as exc:
        raise FileFormatError(f"cannot read {str(p)!r}: {exc.strerror or exc}") from None
    try:  # count the nodes before networkx reads them (reading 5,000 GML nodes takes seconds)
        raw = p.read_text(encoding="utf-8", errors="replace")
    except OSError as exc:
        raise FileFormatError(f"cannot read {str(p)!r}: {exc.strerror or exc}") from None
    _check_node_count(len(_NODE_TAGS[p.suffix.lower()].findall(raw)), where)
    with warnings.catch_warnings(record=True) as caught:  # networkx warns on stderr; we say it in one line
        warnings.simplefilter("always")
        try:
            graph = nx.read_graphml(p) if p.suffix.lower() == ".graphml" else nx.read_gml(p, label="label")
        except RecursionError:
            raise FileFormatError(f"cannot read {where} as {kind}: it nests too deeply") from None
        except (OSError, nx.NetworkXError, ValueError, Exception) as exc:  # the readers raise many kinds
            raise FileFormatError(f"cannot read {where} as {kind}: {quote(str(exc), 200)}") from None
    untyped = " (its GraphML <key> has no attr.type: write attr.type=\"int\")" if any(
        "No key type" in str(w.message) for w in caught) else ""
    _check_node_count(graph.number_of_nodes(), where)
    labels = tuple(str(n) for n in graph.nodes)
    if not labels:
        raise FileFormatError(f"{where}: the graph has no nodes")
    dims = []
    for node, attrs in graph.nodes(data=True):
        d = attrs.get("dimension")
        if isinstance(d, str) and untyped:
            raise FileFormatError(f"{where}: node {quote(str(node))} has dimension {quote(d)} as text{untyped}")
        if isinstance(d, bool) or not isinstance(d, int) or d < 1:
            raise FileFormatError(f"{where}: node {str(node)!r} has dimension {d!r} (node attribute 'dimension' must be a positive whole number)")
        dims.append(d)
    index = {str(n): i for i, n in enumerate(graph.nodes)}
    matrix = [[0] * len(labels) for _ in labels]
    for a, b, attrs in graph.edges(data=True):
        count = attrs.get("count", 1)
        if isinstance(count, str) and untyped:
            raise FileFormatError(f"{where}: edge {quote(str(a))}–{quote(str(b))} has count {quote(count)} as text{untyped}")
        if isinstance(count, bool) or not isinstance(count, int) or count < 0:
            raise FileFormatError(f"{where}: edge {str(a)!r}–{str(b)!r} has count {count!r} (edge attribute 'count' must be a whole number ≥ 0)")
        i, j = index[str(a)], index[str(b)]
        matrix[i][j] += count
        if not graph.is_directed() and i != j:
            matrix[j][i] += count
    root = graph.graph.get("root")
    if root is None:
        root = next(label for label, d in zip(labels, dims) if d == 1) if 1 in dims else labels[0]
    if str(root) not in labels:
        raise FileFormatError(f"{where}: graph attribute 'root' = {root!r} is not a node")
    nodes = NodeSet(str(graph.graph.get("name") or "G"), labels, tuple(dims))
    step = Step("tensor", nodes, nodes, tuple(tuple(r) for r in matrix))
    step.constant()
    return [step], str(root), str(graph.graph.get("title") or where)


def read_tensor_graph(path: str | Path) -> tuple[list[Step], str, str]:
    """Read a tensor graph by its suffix: .toml, .graphml or .gml."""
    suffix = Path(path).suffix.lower()
    if suffix in NETWORKX_SUFFIXES:
        return read_networkx_graph(path)
    if suffix == ".toml":
        return read_toml_graph(path)
    raise UserError(f"{Path(path).name}: unknown tensor-graph file type {suffix!r} (accepted: .toml, .graphml, .gml)")


def write_networkx_graph(step: Step, root: str, path: str | Path) -> None:
    """Write one step as a directed GraphML or GML graph (by suffix), with dimension and count."""
    import networkx as nx

    if step.source != step.target:
        raise UserError("GraphML and GML hold one node set; a restriction or induction step cannot be written")
    graph = nx.DiGraph(root=root, name=step.source.name)
    for label, d in zip(step.source.labels, step.source.dimensions):
        graph.add_node(label, dimension=d)
    for i, row in enumerate(step.matrix):
        for j, m in enumerate(row):
            if m:
                graph.add_edge(step.source.labels[i], step.target.labels[j], count=m)
    p = Path(path)
    if p.suffix.lower() == ".graphml":
        write_text_atomic(p, "\n".join(nx.generate_graphml(graph)) + "\n")
    elif p.suffix.lower() == ".gml":
        write_text_atomic(p, "\n".join(nx.generate_gml(graph)) + "\n")
    else:
        raise UserError(f"{p.name}: write GraphML (.graphml) or GML (.gml)")


def graph_tower(spec: str, path: str | Path) -> MatrixTower:
    pattern, root, title = read_tensor_graph(path)
    return MatrixTower(spec, "graph", pattern, root)
