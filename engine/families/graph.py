"""``graph:file=PATH``: a tower read from a tensor-graph file (TOML, GraphML or GML; see
``engine.files.tensor_graph``).  Σ m·dim at a level is the product of the step constants taken
(McKay, *Graphs, singularities and finite groups*, 1980; Goodman, de la Harpe, Jones, *Coxeter
Graphs and Towers of Algebras*, 1989, 2.1), checked by ``engine.matrix_tower``."""

from __future__ import annotations

from engine.capabilities import Encodings, FiniteSteps, LevelJump, SizeGuard
from engine.matrix_tower import MatrixTower
from engine.specs import Family


def _build(spec: str, params: dict[str, str]) -> MatrixTower:
    from engine.files.tensor_graph import graph_tower

    return graph_tower(spec, params["file"])


FAMILY = Family(
    name="graph",
    summary="a tower from a tensor-graph file (TOML, GraphML or GML)",
    keys={"file": "PATH of a tensor-graph file: .toml (our schema), .graphml or .gml"},
    build=_build,
    required=("file",),
    rank=80,
    example="graph:file=sessions/examples/dihedral10.toml",
    examples=("graph:file=sessions/examples/a4-points-graph.toml",),
    capabilities=(SizeGuard, FiniteSteps, LevelJump, Encodings,),
)
