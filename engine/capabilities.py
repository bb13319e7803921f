"""Capabilities: what a family knows beyond its graph, as small typed objects.

A tower is a graph (``engine.tower.Tower``).  Knowledge that only some families have is a
*capability* the family declares in ``Tower.capabilities()`` and a caller asks for with
``tower.capability(Kind)``, which returns the object or None:

| capability | what it answers |
|---|---|
| ``ClosedForm`` | the multiplicity at any level without path counting, reachability, the digit size of its numbers, the formula in k |
| ``DiagramAlgebra`` | the centralizer's diagram algebra per level: name, parameter, dimension (``AlgebraLevel``) |
| ``FiniteSteps`` | the repeating step(s) of a tower with finite node sets, as labelled exact matrices |
| ``LevelJump`` | a whole level at any depth without building the levels below (matrix powers, characters) |
| ``CharacterData`` | for towers built from a character table: the table and the character of V (jumps by characters) |
| ``Encodings`` | the names of the path encodings the family offers, its default first |
| ``SizeGuard`` | upper estimates of the edges walked to build levels, so costly builds are refused up front |

A view asks for a capability and, when the answer is None, says in one line that the family has
none (``missing``).  No code outside ``engine/families/`` tests a family's name.
"""

from __future__ import annotations

from engine.records import record
from fractions import Fraction
from typing import TYPE_CHECKING, Callable, Hashable, Sequence, TypeVar

from engine.errors import UserError

if TYPE_CHECKING:
    from engine.tower import Tower

Node = Hashable


class Capability:
    """Base of every capability (a marker: capabilities share no behaviour)."""

    #: how the capability is named in messages ("a closed form")
    title: str = "a capability"


C = TypeVar("C", bound=Capability)


def missing(tower: "Tower", kind: type[Capability], who: str = "") -> UserError:
    """The one-line error for a family without a capability, naming the families that have it."""
    from engine.specs import families_with

    have = ", ".join(families_with(kind)) or "none"
    what = f"{who}: " if who else ""
    return UserError(f"{what}{tower.spec} has no {kind.title.removeprefix('a ').removeprefix('an ')} "
                     f"(families with one: {have})")


def require(tower: "Tower", kind: type[C], who: str = "") -> C:
    """``tower.capability(kind)``, or the one-line UserError of ``missing``."""
    found = tower.capability(kind)
    if found is None:
        raise missing(tower, kind, who)
    return found


# ----- size guard ------------------------------------------------------------------------------
@record
class SizeGuard(Capability):
    """Estimates that let the diagram refuse a build before starting it (within a factor 10 of
    the real counts, held by ``tests/engine/test_estimates.py``):

    - ``edges(upto)``: the edges walked to build levels 0..upto (None: small);
    - ``nodes(upto)``: the nodes on levels 0..upto together (what the built levels keep);
      None: bounded by the edges;
    - ``digits(index)``: decimal digits of the largest multiplicity at a level; None: those of
      the tensor dimension (every multiplicity is at most it, since Σ m·dim = dim V^{⊗k});
    - ``extra(upto)``: other per-level work, in additions of 9-digit limbs (e.g. the Bell
      triangle behind the partition algebras' dimensions); None: nothing worth counting.

    ``engine.diagram.Diagram.cost`` turns them into seconds and bytes."""

    edges: Callable[[int], int | None]
    nodes: Callable[[int], int] | None = None
    digits: Callable[[int], int] | None = None
    extra: Callable[[int], int] | None = None
    title = "a size guard"


# ----- closed forms ----------------------------------------------------------------------------
@record
class ClosedForm(Capability):
    """The multiplicity of a node at any level without counting paths.

    - ``multiplicity(index, node)``: exact; 0 for nodes without a path;
    - ``reachable(index, node)``: whether the node has a path, decided without counting;
    - ``digits(index)``: an upper estimate of the decimal digits of the numbers the closed form
      works with at that level (the diagram refuses past its digit limit);
    - ``formula(index, node)``: the multiplicity as a formula in k (one line), or None;
    - ``expression(index, node)``: the formula as an object with ``value(k)`` and the fields the
      ``formula`` command prints (``engine.closed_forms.SymmetricClosedForm``), or None.
    """

    multiplicity: Callable[[int, Node], int]
    reachable: Callable[[int, Node], bool]
    digits: Callable[[int], int]
    formula: Callable[[int, Node], str | None] = lambda index, node: None
    #: None where the family has no formula in k to print (e.g. a node lives on one level only)
    expression: Callable[[int, Node], object] | None = None
    title = "a closed form"


# ----- diagram algebras ------------------------------------------------------------------------
@record
class AlgebraLevel:
    """The diagram algebra of one level, with what its bases, products and actions need.

    ``kind``: partition | brauer | temperley-lieb | symmetric-group | walled-brauer;
    ``vertices``: vertices in each row (k; k+1 at a half level k+1/2 of the partition tower);
    ``half``: a half partition algebra (the last top and last bottom vertex in one block);
    ``parameter``: the loop value x (N; −N for symplectic, −2 for TL; None for CS_k);
    ``word``: for walled Brauer, the letter (v or d) of each vertex; ``group``: how it acts on
    V^{⊗k} (symmetric, orthogonal, symplectic, general-linear); ``n``: V = C^n."""

    kind: str
    name: str
    vertices: int
    half: bool
    n: int
    parameter: int | None
    word: str
    group: str
    dimension: int
    level: Fraction
    index: int


@record
class DiagramAlgebra(Capability):
    """The diagram algebra that maps onto the centralizer at every level (``at(index)``).

    ``first_unfaithful`` is the first level index where the map to End(V^{⊗k}) is not injective,
    for the whole tower, by the family's published theorem (None: faithful at every level); the
    tests hold it against the level sums (Σm² < dimension) on small towers."""

    at: Callable[[int], AlgebraLevel]
    first_unfaithful: int | None
    title = "a diagram algebra"

    def name(self, index: int) -> str:
        return self.at(index).name

    def dimension(self, index: int) -> int:
        return self.at(index).dimension


# ----- finite steps ----------------------------------------------------------------------------
@record
class StepMatrix:
    """One step between finite node sets: M[i][j] edges from ``rows[i]`` to ``columns[j]``.

    ``constant``: c with Σ_j M_ij·dim_j = c·dim_i (dim V for a tensor step, 1 for a restriction,
    the index [G:H] for an induction)."""

    name: str
    source: str
    target: str
    rows: tuple[Node, ...]
    columns: tuple[Node, ...]
    row_labels: tuple[str, ...]
    column_labels: tuple[str, ...]
    row_dimensions: tuple[int, ...]
    column_dimensions: tuple[int, ...]
    matrix: tuple[tuple[int, ...], ...]
    constant: int


class FiniteSteps(Capability):
    """The repeating steps (one, or two half steps) of a tower with finite node sets.

    ``steps[r]`` leads from level index i to i+1 for i ≡ r (mod len(steps)); the root is
    ``steps[0].rows[root_position]``.  The matrices are made on first use (``make``), since
    finding them may walk the whole node set."""

    title = "a finite step matrix"

    def __init__(self, make: Callable[[], "FiniteSteps | tuple[tuple[StepMatrix, ...], int]"]) -> None:
        self._make = make
        self._made: tuple[tuple[StepMatrix, ...], int] | None = None

    def _get(self) -> tuple[tuple[StepMatrix, ...], int]:
        if self._made is None:
            made = self._make()
            self._made = (made.steps, made.root_position) if isinstance(made, FiniteSteps) else made
        return self._made

    @classmethod
    def of(cls, steps: Sequence[StepMatrix], root_position: int) -> "FiniteSteps":
        made = (tuple(steps), root_position)
        return cls(lambda: made)

    @property
    def steps(self) -> tuple[StepMatrix, ...]:
        return self._get()[0]

    @property
    def root_position(self) -> int:
        return self._get()[1]

    @property
    def period(self) -> int:
        """Steps per whole level: 1, or 2 for towers with half levels."""
        return len(self.steps)

    def whole_step(self) -> StepMatrix:
        """The step of one whole level: the matrix itself, or the product of the two half steps."""
        steps = self.steps
        if len(steps) == 1:
            return steps[0]
        a, b = steps
        m = [[sum(a.matrix[i][t] * b.matrix[t][j] for t in range(len(b.rows))) for j in range(len(b.columns))]
             for i in range(len(a.rows))]
        return StepMatrix("tensor", a.source, b.target, a.rows, b.columns, a.row_labels, b.column_labels,
                          a.row_dimensions, b.column_dimensions, tuple(tuple(r) for r in m),
                          a.constant * b.constant)

    @property
    def root(self) -> Node:
        return self.steps[0].rows[self.root_position]


@record
class LevelJump(Capability):
    """A whole level at any depth without building the levels below it (matrix powers, characters
    or a closed form): ``level(index)`` maps every node with a path to its multiplicity;
    ``digits(index)`` estimates the decimal digits of the numbers involved (the diagram's digit
    guard refuses past its limit); ``seconds(index)``, where the jump works node by node over a
    level that grows with the index (GL_N's closed form), estimates its time, and the diagram
    refuses past about a minute (None: a few matrix products, cheap whatever the depth)."""

    level: Callable[[int], dict[Node, int]]
    digits: Callable[[int], int]
    seconds: Callable[[int], float] | None = None
    title = "a jump to deep levels"


@record
class LevelDimensions(Capability):
    """The dimensions of a whole built level at once from its multiplicities, where a family's
    formula is far cheaper that way than node by node: ``of_level(index, nodes, multiplicities)``
    returns the dimensions in the order of ``nodes`` (the sweep's numbering)."""

    of_level: Callable[[int, Sequence[Node], Sequence[int]], list[int]]
    title = "dimensions by level"


@record
class CharacterData(Capability):
    """A tower built from a character table: the table, the character of V on its classes, and the
    position of each whole-level node in the table (``engine.class_functions.CharacterTable``)."""

    table: object
    module: tuple[object, ...]
    title = "a character table"


# ----- path encodings --------------------------------------------------------------------------
@record
class Encodings(Capability):
    """The names of the path encodings the family offers (``engine.encodings``), default first.
    ``labels`` is accepted for every tower whether listed or not."""

    names: tuple[str, ...]
    #: (index, node) → the set-partition tableaux of the node (``engine.set_partition_tableaux``),
    #: where the family has that second basis (the S_N tower with half levels), else None
    set_partition_tableaux: Callable[[int, Node], object] | None = None
    title = "path encodings"


def finite_steps_of_size(tower: "Tower", nodes: int, limit: int = 2000) -> FiniteSteps:
    """FiniteSteps found by closure, refused in one line (with the count) when the node sets hold
    more than ``limit`` nodes."""
    def make() -> FiniteSteps:
        if nodes > limit:
            raise UserError(f"{tower.spec}: its repeating step joins {nodes:,} nodes, too many for step matrices "
                            f"(at most {limit:,})")
        return finite_steps_from_closure(tower, limit)

    return FiniteSteps(make)


def finite_steps_from_closure(tower: "Tower", limit: int = 2000) -> FiniteSteps:
    """FiniteSteps of a tower whose node sets are finite, found by walking children from the root
    until each level kind's node set stops growing (McKay, *Graphs, singularities and finite
    groups*, 1980: the step matrices are the McKay matrices).  UserError past ``limit`` nodes."""
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
                        if sum(len(s) for s in sets) > limit:
                            raise UserError(f"{tower.spec}: more than {limit} nodes reached; its node sets are "
                                            "too large for a step matrix")
    ordered = [tower.sort_nodes(s, r) for r, s in enumerate(sets)]
    steps = []
    for r in range(period):
        rows, cols = ordered[r], ordered[(r + 1) % period]
        position = {c: j for j, c in enumerate(cols)}
        matrix = [[0] * len(cols) for _ in rows]
        for i, node in enumerate(rows):
            for child, m in tower.children(r, node):
                matrix[i][position[child]] += m
        name = ("restrict" if r == 0 else "induce") if period == 2 else "tensor"
        steps.append(StepMatrix(
            name, tower.level_kind(r), tower.level_kind(r + 1), tuple(rows), tuple(cols),
            tuple(tower.format(x) for x in rows), tuple(tower.format(x) for x in cols),
            tuple(tower.dimension(r, x) for x in rows), tuple(tower.dimension(r + 1, x) for x in cols),
            tuple(tuple(row) for row in matrix),
            tower.tensor_dimension(r + 1) // max(tower.tensor_dimension(r), 1),
        ))
    return FiniteSteps.of(steps, ordered[0].index(tower.root()))


__all__ = [
    "AlgebraLevel", "Capability", "CharacterData", "ClosedForm", "DiagramAlgebra", "Encodings",
    "FiniteSteps", "LevelJump", "SizeGuard", "StepMatrix", "finite_steps_from_closure", "finite_steps_of_size", "missing", "require",
]
