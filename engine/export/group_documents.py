"""Documents of the ``mckay`` and ``check`` commands: step matrices of towers with finite node sets
and what a tensor-graph or character-table file holds (plain data, exact ints).

A step's ``constant`` is the c with Σ_j M_ij·dim_j = c·dim_i for every row i: dim V for a tensor
step, 1 for a restriction, the index [G:H] for an induction (McKay, *Graphs, singularities and
finite groups*, 1980)."""

from __future__ import annotations

from pathlib import Path
from typing import Any

from engine.capabilities import FiniteSteps, StepMatrix, require
from engine.class_functions import CharacterTable
from engine.errors import UserError
from engine.tower import Tower


def step_entry(step: StepMatrix) -> dict[str, Any]:
    return {
        "step": step.name, "from": step.source, "to": step.target,
        "rows": list(step.row_labels), "columns": list(step.column_labels),
        "row_dimensions": list(step.row_dimensions), "column_dimensions": list(step.column_dimensions),
        "matrix": [list(r) for r in step.matrix], "constant": step.constant,
    }


def mckay_document(tower: Tower) -> dict[str, Any]:
    """``{"tower", "steps": [...]}``, and ``"whole_step"`` (the product ⊗ V) for two half steps."""
    finite = require(tower, FiniteSteps, "mckay")
    out: dict[str, Any] = {"tower": tower.spec, "steps": [step_entry(s) for s in finite.steps]}
    if finite.period == 2:
        out["whole_step"] = [list(r) for r in finite.whole_step().matrix]
    return out


def file_kind(path: str) -> str:
    """``graph`` or ``characters``, by suffix and by the ``format`` key of a TOML file."""
    from engine.files.character_table import FORMAT as TABLE_FORMAT
    from engine.files.tensor_graph import FORMAT as GRAPH_FORMAT, NETWORKX_SUFFIXES
    from engine.files.toml_checks import load_toml

    suffix = Path(path).suffix.lower()
    if suffix in NETWORKX_SUFFIXES:
        return "graph"
    if suffix != ".toml":
        raise UserError(f"{Path(path).name}: unknown file type {suffix!r} (accepted: .toml, .graphml, .gml)")
    fmt = load_toml(path).get("format")
    kinds = {GRAPH_FORMAT: "graph", TABLE_FORMAT: "characters"}
    if not isinstance(fmt, str) or fmt not in kinds:
        raise UserError(f"{Path(path).name}: key 'format' is {fmt!r} (accepted: {GRAPH_FORMAT!r}, {TABLE_FORMAT!r})")
    return kinds[fmt]


def check_report(path: str) -> dict[str, Any]:
    """What a valid file holds, as plain data; UserError naming the first problem otherwise."""
    if file_kind(path) == "graph":
        from engine.files.tensor_graph import read_tensor_graph
        from engine.matrix_tower import MatrixTower

        pattern, root, title = read_tensor_graph(path)
        tower = MatrixTower(f"graph:file={path}", "graph", pattern, root)
        return {"file": path, "kind": "tensor graph", "title": title, "root": root,
                "half_levels": len(pattern) == 2, "steps": mckay_document(tower)["steps"]}
    from engine.class_functions import decompose, mckay_matrix
    from engine.families.characters import character_tower
    from engine.files.character_table import read_character_file

    data = read_character_file(path)
    t = data.table
    tower = character_tower(f"characters:file={path}", "characters", t, data.module, subgroup=data.subgroup)
    module = decompose(t, data.module, "V")
    report: dict[str, Any] = {
        "file": path, "kind": "character table", "group": t.name, "order": t.order,
        "classes": len(t.classes), "irreducibles": _irreducibles(t),
        "module_dimension": int(sum(m * d for m, d in zip(module, t.degrees()))),
        "module": {n: m for n, m in zip(t.names, module) if m},
        "mckay": [list(row) for row in mckay_matrix(t, data.module)],  # the whole step ⊗ V
        "steps": mckay_document(tower)["steps"],
    }
    if data.subgroup is not None:
        s = data.subgroup.table
        report["subgroup"] = {"group": s.name, "order": s.order, "index": t.order // s.order,
                              "irreducibles": _irreducibles(s)}
    return report


def _irreducibles(table: CharacterTable) -> list[dict[str, Any]]:
    """Name and dimension of each irreducible character of a table."""
    return [{"name": n, "dimension": d} for n, d in zip(table.names, table.degrees())]
