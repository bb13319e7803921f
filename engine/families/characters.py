"""``characters:file=PATH`` (or ``characters:group=dihedral(5),module=r1``): a tower from a character table.

Whole levels tensor with V: the step matrix is the McKay matrix M_ij = ⟨χ_V χ_i, χ_j⟩ (McKay,
*Graphs, singularities and finite groups*, 1980).  With a subgroup H and V = Ind_H^G U, half levels
hold H's irreducibles: G → H restricts and tensors with U, H → G induces, since
Ind_H^G(U ⊗ Res W) ≅ Ind_H^G(U) ⊗ W (Serre, *Linear Representations of Finite Groups*, 1977, §7.2,
Ex. 7.6) and ⟨Ind ψ, χ⟩_G = ⟨ψ, Res χ⟩_H (Frobenius reciprocity).  The matrices are computed
exactly (``engine.class_functions``); nothing here imports sympy at start-up.
"""

from __future__ import annotations

from typing import Callable, Hashable, Sequence

from engine.capabilities import Capability, CharacterData, Encodings, FiniteSteps, LevelJump, SizeGuard
from engine.class_functions import CharacterTable, Entry, decompose, mckay_matrix, sum_of_rows
from engine.errors import SpecError
from engine.matrix_tower import MatrixTower, NodeSet, Step
from engine.numbers_in import is_digits, read_whole
from engine.specs import Family, choice_param
class CharacterTower(MatrixTower):
    """A matrix tower whose labels may have several spellings (``normalize`` maps them to one)."""

    def __init__(self, spec: str, family: str, pattern: Sequence[Step], root: str,
                 normalize: Callable[[str], str] | None = None, table: CharacterTable | None = None,
                 module: Sequence[Entry] = (), encodings: tuple[str, ...] = ("walk",)) -> None:
        super().__init__(spec, family, pattern, root)
        self._normalize = normalize
        self._table = table
        self._module = tuple(module)
        self.encodings = encodings

    def capabilities(self) -> list[Capability]:
        found = super().capabilities()
        if self._table is not None:
            found.append(CharacterData(self._table, self._module))
        return found

    def normalize_label(self, text: str) -> str:
        if self._normalize is None:
            return text
        try:
            return self._normalize(text)
        except ValueError:
            return text


def node_set(table: CharacterTable, values: Sequence[Hashable] | None = None) -> NodeSet:
    return NodeSet(table.name, table.names, table.degrees(), None if values is None else tuple(values))


def character_tower(spec: str, family: str, table: CharacterTable, module: Sequence[Entry], *,
                    subgroup=None, halves: bool = True, values: Sequence[Hashable] | None = None,
                    normalize: Callable[[str], str] | None = None,
                    encodings: tuple[str, ...] = ("walk",)) -> CharacterTower:
    """The tower of V^{⊗k}: one tensor step, or restrict/induce through ``subgroup`` (a
    ``engine.files.character_table.Subgroup``) when given and ``halves``."""
    g = node_set(table, values)
    if subgroup is None or not halves:
        step = Step("tensor", g, g, mckay_matrix(table, module))
        return CharacterTower(spec, family, [step], table.names[0], normalize, table, module, encodings)
    sub = subgroup.table
    h = node_set(sub)
    down = []
    for i in range(len(table.names)):
        res = sum_of_rows(sub, subgroup.restriction[i])
        down.append(decompose(sub, [a * b for a, b in zip(res, subgroup.module)], f"the restriction of {table.names[i]!r} ⊗ U"))
    up = tuple(tuple(row[j] for row in subgroup.restriction) for j in range(len(sub.names)))
    steps = [Step("restrict", g, h, tuple(down)), Step("induce", h, g, up)]
    return CharacterTower(spec, family, steps, table.names[0], normalize, table, module, encodings)


def module_from_names(table: CharacterTable, text: str, normalize: Callable[[str], str] | None = None) -> tuple[Entry, ...]:
    """``a+b``, ``2*a+b`` (irreducibles by name) → the character of that sum."""
    counts = [0] * len(table.names)
    depth, term, terms = 0, "", []
    for ch in text:
        depth += ch == "("
        depth -= ch == ")"
        if ch == "+" and depth == 0:
            terms.append(term)
            term = ""
        else:
            term += ch
    terms.append(term)
    for raw in terms:
        piece = raw.strip()
        times = 1
        head, star, tail = piece.partition("*")
        if star and is_digits(head.strip()):
            times, piece = read_whole(head, "a module's multiplicity", max_digits=18), tail.strip()
        name = piece
        if name not in table.names and normalize is not None:
            try:
                name = normalize(piece)
            except ValueError:
                pass
        if name not in table.names:
            shown = ", ".join(table.names[:10]) + (", ..." if len(table.names) > 10 else "")
            raise SpecError(f"module: {piece!r} is not an irreducible of {table.name} "
                            f"(write a sum like a+2*b of: {shown})")
        counts[table.names.index(name)] += times
    if not any(counts):
        raise SpecError("module: the sum is empty")
    return sum_of_rows(table, counts)


def _build(spec: str, params: dict[str, str]) -> CharacterTower:
    halves = choice_param("characters", params, "halves", ("yes", "no"), "yes") == "yes"
    if ("file" in params) == ("group" in params):
        raise SpecError("characters: give exactly one of file=PATH or group=symmetric(N)|cyclic(N)|dihedral(N)")
    if "file" in params:
        from engine.files.character_table import read_character_file

        data = read_character_file(params["file"])
        module = data.module
        if "module" in params:
            if data.subgroup is not None and halves:
                raise SpecError("characters: module= cannot change V when the file has a subgroup (add halves=no)")
            module = module_from_names(data.table, params["module"])
            decompose(data.table, module, "the module V")
        return character_tower(spec, "characters", data.table, module, subgroup=data.subgroup, halves=halves)
    from engine.character_tables import builtin_table

    table = builtin_table(params["group"])
    if "module" not in params:
        raise SpecError(f"characters: key 'module' is required with group= (a sum of irreducibles of {table.name}, "
                        f"e.g. {table.names[-1]})")
    module = module_from_names(table, params["module"])
    return character_tower(spec, "characters", table, module)


FAMILY = Family(
    name="characters",
    summary="a group and module V from a character table (a file, or a built-in S_N, C_N, D_N table)",
    keys={
        "file": "PATH of a character-table file (TOML; README: Character table files)",
        "group": "a built-in table instead of a file: symmetric(N) (irreducibles named by partitions, "
        "(N) trivial), cyclic(N) (x0 trivial, ..., x{N-1}: g ↦ ζ^j) or dihedral(N) (D_N of order 2N: 1 "
        "trivial, e the sign on reflections, for even N also f and fe, and the 2-dimensional r1, r2, ...)",
        "module": "V as a sum of irreducibles by name, e.g. r1 or x1+x4 or 2*(3,1)+(4)",
        "halves": "yes (default) or no: with a subgroup in the file, show or hide the half levels",
    },
    build=_build,
    rank=70,
    example="characters:group=dihedral(5),module=r1",
    examples=("characters:group=cyclic(3),module=2*x1", "characters:file=sessions/examples/a4-points.toml"),
    capabilities=(SizeGuard, FiniteSteps, LevelJump, Encodings, CharacterData,),
)


def symmetric_module_tower(spec: str, n: int, module_text: str) -> CharacterTower:
    """S_N on the module named by partitions (``(5,1)``, ``(4)+(3,1)``), from its character table;
    nodes are partitions, as in the ``symmetric`` family."""
    from engine.character_tables import symmetric_table
    from engine.partitions import format_partition, parse_partition

    table = symmetric_table(n)

    def normalize(text: str) -> str:
        lam = parse_partition(text)
        if sum(lam) != n:
            raise SpecError(f"module: {text!r} is not a partition of {n}")
        return format_partition(lam)

    for piece in module_text.split("+"):
        head, star, tail = piece.partition("*")
        term = tail if star and is_digits(head.strip()) else piece
        normalize(term)  # a clear message for a partition of the wrong size
    module = module_from_names(table, module_text, normalize)
    values = [parse_partition(name) for name in table.names]
    return character_tower(spec, "symmetric", table, module, values=values, normalize=normalize,
                           encodings=("vacillating",))
