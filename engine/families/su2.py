"""``su2:kind=K[,m=M]``: a finite subgroup of SU(2) acting on C^2.

By the McKay correspondence (McKay, *Graphs, singularities and finite groups*, Proc. Symp. Pure
Math. 37, 1980) the McKay graph of V = C^2 is an affine simply-laced Dynkin diagram, and the
dimensions of the irreducibles form its null vector, 1 at the trivial node (Kac, *Infinite
Dimensional Lie Algebras*, 3rd ed., 1990, Table Aff 1):

| kind | group | order | graph |
|---|---|---|---|
| cyclic | C_M | M | affine A_{M−1} (a cycle; M = 2: a double edge, M = 1: a loop of weight 2) |
| binary-dihedral (also ``dihedral``) | binary dihedral, M ≥ 2 | 4M | affine D_{M+2} |
| tetrahedral | binary tetrahedral | 24 | affine E_6 |
| octahedral | binary octahedral | 48 | affine E_7 |
| icosahedral | binary icosahedral | 120 | affine E_8 |

Node names (ours, stable, the dimension after the colon):
- cyclic: ``c{j}:1``, the character g ↦ ζ_M^j of the generator g = diag(ζ_M, ζ_M^{−1}); V = c1 + c{M−1};
- binary-dihedral: ``d{j}:2`` for j = 1..M−1 (d1 is V; d_j ⊗ V = d_{j−1} + d_{j+1}), ``e0:1`` (trivial) and
  ``e1:1`` at the d1 end, ``f0:1`` and ``f1:1`` at the d_{M−1} end;
- tetrahedral, octahedral, icosahedral: the affine E graphs are stars with three arms around a
  centre ``o:{dim}``; arm ``a`` holds the trivial node, arms ``b`` and ``c`` the others, and
  ``{arm}{k}:{dim}`` is k steps from the centre, except the trivial node at the end of arm ``a``,
  ``trivial:1`` (e.g. icosahedral: trivial:1 – a4:2 – a3:3 – a2:4 – a1:5 – o:6, with b1:4 – b2:2
  and c1:3); its former name (a2:1, a3:1, a5:1) is still accepted on input.

Every kind also accepts ``trivial`` for its trivial node (``c0:1``, ``e0:1``, ``trivial:1``).
"""

from __future__ import annotations

from engine.capabilities import Encodings, FiniteSteps, LevelJump, SizeGuard
from engine.errors import SpecError
from engine.matrix_tower import MatrixTower, NodeSet, Step
from engine.specs import Family, choice_param, int_param

KINDS = ("cyclic", "binary-dihedral", "tetrahedral", "octahedral", "icosahedral")
#: other names of kinds accepted on input
KIND_ALIASES = {"dihedral": "binary-dihedral"}
TRIVIAL = "trivial:1"
ORDERS = {"tetrahedral": 24, "octahedral": 48, "icosahedral": 120}

#: arm lengths (a, b, c) and dimensions from the centre outwards, for the affine E graphs
_STARS = {
    "tetrahedral": (3, ((2, 1), (2, 1), (2, 1))),  # affine E6: centre 3
    "octahedral": (4, ((3, 2, 1), (3, 2, 1), (2,))),  # affine E7: centre 4
    "icosahedral": (6, ((5, 4, 3, 2, 1), (4, 2), (3,))),  # affine E8: centre 6
}


def _graph(kind: str, m: int) -> tuple[list[str], list[int], dict[tuple[str, str], int]]:
    """Labels, dimensions and symmetric edge weights (a loop counted once, with its weight)."""
    edges: dict[tuple[str, str], int] = {}

    def join(a: str, b: str, w: int = 1) -> None:
        edges[(a, b)] = edges.get((a, b), 0) + w
        if a != b:
            edges[(b, a)] = edges.get((b, a), 0) + w

    if kind == "cyclic":
        labels = [f"c{j}:1" for j in range(m)]
        for j in range(m):  # c_j ⊗ (c_1 + c_{−1}) = c_{j+1} + c_{j−1}
            for step in (1, -1):
                edges[(labels[j], labels[(j + step) % m])] = edges.get((labels[j], labels[(j + step) % m]), 0) + 1
        return labels, [1] * m, edges
    if kind == "binary-dihedral":
        chain = [f"d{j}:2" for j in range(1, m)]
        labels = ["e0:1", "e1:1"] + chain + ["f0:1", "f1:1"]
        dims = [1, 1] + [2] * len(chain) + [1, 1]
        for a, b in zip(chain, chain[1:]):
            join(a, b)
        for end in ("e0:1", "e1:1"):
            join(end, chain[0])
        for end in ("f0:1", "f1:1"):
            join(end, chain[-1])
        return labels, dims, edges
    centre_dim, arms = _STARS[kind]
    centre = f"o:{centre_dim}"
    labels, dims = [], []
    for letter, arm in zip("abc", arms):
        names = [f"{letter}{k + 1}:{d}" for k, d in enumerate(arm)]
        if letter == "a":
            names[-1] = TRIVIAL
            labels += list(reversed(names)) + [centre]
            dims += list(reversed(arm)) + [centre_dim]
        else:
            labels += names
            dims += list(arm)
        for a, b in zip([centre] + names, names):
            join(a, b)
    return labels, dims, edges


def su2_tower(spec: str, kind: str, m: int) -> MatrixTower:
    labels, dims, edges = _graph(kind, m)
    order = {"cyclic": m, "binary-dihedral": 4 * m}.get(kind) or ORDERS[kind]
    nodes = NodeSet(f"{kind} ({order})", tuple(labels), tuple(dims))
    matrix = tuple(tuple(edges.get((a, b), 0) for b in labels) for a in labels)
    root = "c0:1" if kind == "cyclic" else "e0:1" if kind == "binary-dihedral" else labels[0]
    tower = MatrixTower(spec, "su2", [Step("tensor C^2", nodes, nodes, matrix)], root)
    if kind in _STARS:
        tower.label_aliases = {f"a{len(_STARS[kind][1][0])}:1": TRIVIAL}  # the former name
    return tower


def _build(spec: str, params: dict[str, str]) -> MatrixTower:
    if params.get("kind") in KIND_ALIASES:
        params = {**params, "kind": KIND_ALIASES[params["kind"]]}
    kind = choice_param("su2", params, "kind", KINDS, "cyclic")
    if kind in ORDERS:
        if "m" in params:
            raise SpecError(f"su2: key 'm' is only for kind=cyclic or kind=binary-dihedral, not {kind}")
        return su2_tower(spec, kind, 0)
    if "m" not in params:
        raise SpecError(f"su2: kind={kind} needs m=M ({'the order' if kind == 'cyclic' else 'order 4M, M ≥ 2'})")
    if kind == "binary-dihedral":
        m = int_param("su2", params, "m", minimum=0)
        if m < 2:
            raise SpecError(f"su2: the binary dihedral group needs m ≥ 2 (order 4m), got m={m}; for m=1 use kind=cyclic,m=4")
    else:
        m = int_param("su2", params, "m", minimum=1)
    if m > 2000:
        raise SpecError(f"su2: m={m} is too large (at most 2000)")
    return su2_tower(spec, kind, m)


FAMILY = Family(
    name="su2",
    summary="a finite subgroup of SU(2) on C^2; McKay graphs: affine A, D, E",
    keys={
        "kind": "cyclic (order m), binary-dihedral (order 4m; `dihedral` is accepted too), tetrahedral, "
        "octahedral or icosahedral (the binary polyhedral groups)",
        "m": "for cyclic: the order m ≥ 1; for binary-dihedral: m ≥ 2 (order 4m)",
    },
    build=_build,
    required=("kind",),
    rank=60,
    example="su2:kind=icosahedral",
    examples=("su2:kind=cyclic,m=3", "su2:kind=binary-dihedral,m=3"),
    capabilities=(SizeGuard, FiniteSteps, LevelJump, Encodings,),
)
