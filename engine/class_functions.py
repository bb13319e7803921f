"""Character tables as data, their checks, and the matrices of a tower computed from them.

Formulas (Isaacs, *Character Theory of Finite Groups*, 1976, ch. 2 and 5; Serre, *Linear
Representations of Finite Groups*, 1977, §2):

- inner product ⟨f, g⟩ = (1/|G|) Σ_C |C| f(C) conj(g(C));
- row orthogonality ⟨χ_i, χ_j⟩ = δ_ij; column orthogonality Σ_i χ_i(C) conj(χ_i(D)) = δ_CD |G|/|C|;
- the McKay matrix of a module V: M_ij = ⟨χ_V χ_i, χ_j⟩ = (1/|G|) Σ_C |C| χ_V(C) χ_i(C) conj(χ_j(C))
  (McKay, *Graphs, singularities and finite groups*, 1980);
- restriction to a subgroup H through the class fusion: R_ij = ⟨Res χ_i, ψ_j⟩_H, and induction is
  its transpose by Frobenius reciprocity (Isaacs, Lemma 5.2).

Entries are ints, Fractions or exact cyclotomic numbers (``engine.cyclotomic.Cyc``); every test is
exact.  Messages name the row (irreducible) or the class that breaks a rule.
"""

from __future__ import annotations

from engine.records import record
from fractions import Fraction
from typing import Sequence, Union

from engine.cyclotomic import Cyc
from engine.errors import UserError

Entry = Union[int, Fraction, Cyc]


class TableError(UserError):
    """A character table that breaks a rule of character theory."""


@record
class CharacterTable:
    """Classes (the identity first) with their sizes, and irreducible characters (the trivial first)."""

    name: str
    order: int
    classes: tuple[str, ...]
    sizes: tuple[int, ...]
    names: tuple[str, ...]
    values: tuple[tuple[Entry, ...], ...]

    def degree(self, i: int) -> int:
        value = exact(self.values[i][0])
        if value is None or value.denominator != 1 or value <= 0:
            raise TableError(f"{self.name}: row {self.names[i]!r} has degree {self.values[i][0]} at the identity, "
                             "not a positive whole number")
        return int(value)

    def degrees(self) -> tuple[int, ...]:
        return tuple(self.degree(i) for i in range(len(self.names)))

    def row(self, name: str) -> tuple[Entry, ...]:
        if name not in self.names:
            raise TableError(f"{self.name}: no irreducible named {name!r} (the table has {', '.join(self.names)})")
        return self.values[self.names.index(name)]


def exact(x: Entry) -> Fraction | None:
    """The value as a Fraction when rational, else None (exact test)."""
    if isinstance(x, Cyc):
        return x.rational()
    return Fraction(x)


def _conj(x: Entry) -> Entry:
    return x.conjugate()


def _weighted_sum(table: CharacterTable, rows: Sequence[Sequence[Entry]]) -> Entry:
    """Σ_C |C| Π_r rows[r][C] (the last row conjugated), not yet divided by |G|."""
    total: Entry = 0
    for c, size in enumerate(table.sizes):
        term: Entry = size
        for r in rows[:-1]:
            term = term * r[c]
        total = total + term * _conj(rows[-1][c])
    return total


def inner(table: CharacterTable, f: Sequence[Entry], g: Sequence[Entry]) -> Fraction | None:
    """⟨f, g⟩ when rational, else None."""
    value = exact(_weighted_sum(table, [f, g]))
    return None if value is None else value / table.order


def validate(table: CharacterTable) -> None:
    """Raise TableError, naming the class or row, at the first rule the table breaks."""
    t = table
    k = len(t.classes)
    if len(t.names) != k:
        raise TableError(f"{t.name}: {len(t.names)} irreducible characters but {k} classes (the numbers must agree)")
    if t.sizes[0] != 1:
        raise TableError(f"{t.name}: the first class {t.classes[0]!r} must be the identity, of size 1 (it has {t.sizes[0]})")
    for j, value in enumerate(t.values[0]):
        if exact(value) != 1:
            raise TableError(f"{t.name}: the first row {t.names[0]!r} must be the trivial character, "
                             f"but its value at class {t.classes[j]!r} is {value}")
    degrees = t.degrees()
    if sum(t.sizes) != t.order:
        blame = []
        for c in range(k):
            norm = exact(_weighted_column(t, c, c))
            if norm and t.order % norm == 0 and t.order // norm != t.sizes[c]:
                blame.append(f"class {t.classes[c]!r} has size {t.sizes[c]} but its column gives |G|/Σ|χ|² = {t.order // norm}")
        hint = "; " + "; ".join(blame) if blame else ""
        raise TableError(f"{t.name}: the class sizes sum to {sum(t.sizes)}, not the group order {t.order}{hint}")
    for c, size in enumerate(t.sizes):
        if t.order % size:
            raise TableError(f"{t.name}: class {t.classes[c]!r} has size {size}, which does not divide |G| = {t.order}")
    if sum(d * d for d in degrees) != t.order:
        raise TableError(f"{t.name}: the squares of the degrees sum to {sum(d * d for d in degrees)}, not |G| = {t.order}")
    for i in range(k):
        for j in range(i, k):
            value = inner(t, t.values[i], t.values[j])
            want = 1 if i == j else 0
            if value != want:
                shown = "not rational" if value is None else str(value)
                if i == j:
                    raise TableError(f"{t.name}: row {t.names[i]!r} has ⟨χ, χ⟩ = {shown}, not 1 (not irreducible)")
                raise TableError(f"{t.name}: rows {t.names[i]!r} and {t.names[j]!r} are not orthogonal (⟨χ_i, χ_j⟩ = {shown})")
    for c in range(k):
        for d in range(c, k):
            value = exact(_weighted_column(t, c, d))
            want = Fraction(t.order, t.sizes[c]) if c == d else 0
            if value != want:
                shown = "not rational" if value is None else str(value)
                if c == d:
                    raise TableError(f"{t.name}: column {t.classes[c]!r} has Σ|χ(g)|² = {shown}, "
                                     f"not |G|/|C| = {want} (check that class's size and values)")
                raise TableError(f"{t.name}: columns {t.classes[c]!r} and {t.classes[d]!r} are not orthogonal (Σ χ(g) conj χ(h) = {shown})")


def _weighted_column(t: CharacterTable, c: int, d: int) -> Entry:
    total: Entry = 0
    for row in t.values:
        total = total + row[c] * _conj(row[d])
    return total


def decompose(table: CharacterTable, f: Sequence[Entry], what: str) -> tuple[int, ...]:
    """Multiplicities ⟨f, χ_i⟩ of a character; TableError naming the irreducible when one is not a
    non-negative whole number."""
    out = []
    for i, row in enumerate(table.values):
        m = inner(table, f, row)
        if m is None or m.denominator != 1 or m < 0:
            shown = "not rational" if m is None else str(m)
            raise TableError(f"{table.name}: {what} contains {table.names[i]!r} {shown} times, "
                             "not a whole number ≥ 0 (is it a character?)")
        out.append(int(m))
    return tuple(out)


def sum_of_rows(table: CharacterTable, counts: Sequence[int]) -> tuple[Entry, ...]:
    """The character Σ_i counts_i χ_i."""
    out: list[Entry] = []
    for c in range(len(table.classes)):
        total: Entry = 0
        for i, n in enumerate(counts):
            if n:
                total = total + n * table.values[i][c]
        out.append(total)
    return tuple(out)


def mckay_matrix(table: CharacterTable, module: Sequence[Entry]) -> tuple[tuple[int, ...], ...]:
    """M_ij = ⟨χ_V χ_i, χ_j⟩: the multiplicity of χ_j in χ_i ⊗ V."""
    rows = []
    for i, chi in enumerate(table.values):
        product = [module[c] * chi[c] for c in range(len(table.classes))]
        rows.append(decompose(table, product, f"{table.names[i]!r} ⊗ V"))
    return tuple(rows)


def restrict(fusion: Sequence[int], f: Sequence[Entry]) -> tuple[Entry, ...]:
    """A class function of G read on the subgroup's classes (fusion[D] = the G-class holding D)."""
    return tuple(f[c] for c in fusion)


def restriction_matrix(group: CharacterTable, sub: CharacterTable, fusion: Sequence[int],
                       module: Sequence[Entry] | None = None) -> tuple[tuple[int, ...], ...]:
    """A_ij = multiplicity of ψ_j in Res χ_i (tensored with the subgroup module U when given)."""
    rows = []
    for i, chi in enumerate(group.values):
        res = restrict(fusion, chi)
        what = f"the restriction of {group.names[i]!r}"
        if module is not None:
            res = tuple(a * b for a, b in zip(res, module))
            what += " ⊗ U"
        rows.append(decompose(sub, res, what))
    return tuple(rows)


def check_fusion(group: CharacterTable, sub: CharacterTable, fusion: Sequence[int]) -> None:
    """Orders must divide, identity to identity, each subgroup class inside a G-class."""
    if group.order % sub.order:
        raise TableError(f"subgroup {sub.name}: its order {sub.order} does not divide |G| = {group.order}")
    if fusion[0] != 0:
        raise TableError(f"subgroup {sub.name}: its identity class must fuse to the identity class {group.classes[0]!r}")
    taken: dict[int, int] = {}
    for d, c in enumerate(fusion):
        taken[c] = taken.get(c, 0) + sub.sizes[d]
    for c, count in taken.items():
        if count > group.sizes[c]:
            raise TableError(f"subgroup {sub.name}: classes fused into {group.classes[c]!r} hold {count} elements, "
                             f"more than its {group.sizes[c]}")
