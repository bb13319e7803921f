"""The McKay (step) matrices of a tower with finite node sets: M_ij = number of edges from node i
of one level kind to node j of the next (McKay, *Graphs, singularities and finite groups*, 1980).
For matrix towers they are the stored steps; for any other tower the node sets are found by
walking children from the root until they stop growing."""

from __future__ import annotations

from typing import Any, Hashable

from engine.errors import UserError
from engine.tower import Tower

#: the largest node set ``mckay`` walks for a tower that is not given by matrices
MAX_NODES = 2000


def step_matrices(tower: Tower) -> list[dict[str, Any]]:
    """The matrices of the repeating steps: rows the nodes of one level kind, columns the next."""
    from engine.matrix_tower import MatrixTower

    if isinstance(tower, MatrixTower):
        out = []
        for step in tower.pattern:
            out.append({
                "step": step.name, "from": step.source.name, "to": step.target.name,
                "rows": list(step.source.labels), "columns": list(step.target.labels),
                "row_dimensions": list(step.source.dimensions), "column_dimensions": list(step.target.dimensions),
                "matrix": [list(r) for r in step.matrix], "constant": step.constant(),
            })
        return out
    return _closure_matrices(tower)


def _closure_matrices(tower: Tower) -> list[dict[str, Any]]:
    """Walk children from the root until the node set of each step kind stops growing."""
    if tower.max_index is not None:
        raise UserError(f"{tower.spec} has finitely many levels and no repeating step; mckay needs a repeating tower")
    period = tower.steps_per_unit
    sets: list[dict[Hashable, None]] = [dict() for _ in range(period)]
    sets[0][tower.root()] = None
    changed = True
    while changed:
        changed = False
        for r in range(period):
            for node in list(sets[r]):
                for child, _ in tower.children(r, node):
                    if child not in sets[(r + 1) % period]:
                        sets[(r + 1) % period][child] = None
                        changed = True
                        if sum(len(s) for s in sets) > MAX_NODES:
                            raise UserError(f"{tower.spec}: more than {MAX_NODES} nodes reached; its node sets are "
                                            "infinite or too large for a matrix (mckay needs finite node sets)")
    ordered = [sorted(s, key=lambda x, r=r: tower.sort_key(x, r)) for r, s in enumerate(sets)]
    out = []
    for r in range(period):
        rows, cols = ordered[r], ordered[(r + 1) % period]
        position = {c: j for j, c in enumerate(cols)}
        matrix = [[0] * len(cols) for _ in rows]
        for i, node in enumerate(rows):
            for child, m in tower.children(r, node):
                matrix[i][position[child]] += m
        out.append({
            "step": "restrict" if period == 2 and r == 0 else "induce" if period == 2 else "tensor",
            "from": tower.level_kind(r), "to": tower.level_kind(r + 1),
            "rows": [tower.format(x) for x in rows], "columns": [tower.format(x) for x in cols],
            "row_dimensions": [tower.dimension(r, x) for x in rows],
            "column_dimensions": [tower.dimension(r + 1, x) for x in cols],
            "matrix": matrix,
            "constant": tower.tensor_dimension(r + 1) // max(tower.tensor_dimension(r), 1),
        })
    return out
