"""The character-table file (TOML, our own schema, ``format = "towerscope-character-table"``,
``version = 1``); see README, "Character table files".

    format = "towerscope-character-table"
    version = 1
    group = "A_4"                       # a name for messages and listings
    order = 12
    classes = ["1", "(12)(34)", "(123)", "(132)"]   # the identity first
    sizes = [1, 3, 4, 4]

    [[irreducible]]                     # the trivial character first
    name = "1"
    values = [1, 1, 1, 1]               # whole numbers, or strings in our exact syntax
    ...

    [module]                            # V: a character row, or a sum of irreducibles by name
    values = [3, -1, 0, 0]              # or: sum = ["3"]   (repeat a name for multiplicity)

    [subgroup]                          # optional: half levels G → H → G
    group = "C_3"
    order = 3
    classes = ["1", "c", "c^2"]
    sizes = [1, 1, 1]
    fusion = ["1", "(123)", "(132)"]    # the G-class of each subgroup class
    # or restriction = [[...], ...]     # rows: G's irreducibles, columns: H's, multiplicities
    [[subgroup.irreducible]] ...
    [subgroup.module] ...               # optional U with V = Ind U (default the trivial module)

Every rule broken gives a message naming the key, row or class.
"""

from __future__ import annotations

from dataclasses import dataclass
from math import gcd
from pathlib import Path
from typing import Any

from engine.algebraic import MAX_CONDUCTOR, AlgebraicError, parse_number
from engine.cyclotomic import Cyc
from engine.class_functions import (
    CharacterTable,
    Entry,
    TableError,
    check_fusion,
    decompose,
    sum_of_rows,
    validate,
)
from engine.files.toml_checks import FileFormatError, check_header, check_keys, load_toml, names_list, need, whole_numbers

FORMAT = "towerscope-character-table"
VERSIONS = (1,)

_TABLE_KEYS = {"group", "order", "classes", "sizes", "irreducible", "module"}
_TOP_KEYS = _TABLE_KEYS | {"format", "version", "subgroup"}
_SUB_KEYS = _TABLE_KEYS | {"fusion", "restriction"}


@dataclass(frozen=True)
class Subgroup:
    table: CharacterTable
    #: restriction multiplicities: rows G's irreducibles, columns H's
    restriction: tuple[tuple[int, ...], ...]
    #: the G-class of each subgroup class, when given
    fusion: tuple[int, ...] | None
    #: the subgroup module U (a character of H)
    module: tuple[Entry, ...]


@dataclass(frozen=True)
class CharacterFile:
    table: CharacterTable
    module: tuple[Entry, ...]
    subgroup: Subgroup | None


def _read_table(data: dict[str, Any], where: str) -> CharacterTable:
    name = data.get("group", where)
    if not isinstance(name, str):
        raise FileFormatError(f"{where}: key 'group' must be a name, got {name!r}")
    order = need(data, "order", where, int, "the group order, a positive whole number")
    if order < 1:
        raise FileFormatError(f"{where}: key 'order' must be positive, got {order}")
    classes = names_list(data, "classes", where)
    if len(classes) > MAX_CLASSES:
        raise FileFormatError(f"{where}: {len(classes):,} classes, more than the {MAX_CLASSES} a table file may have")
    sizes = whole_numbers(need(data, "sizes", where, list, "a list of class sizes"), f"{where}: key 'sizes'", positive=True)
    if len(sizes) != len(classes):
        raise FileFormatError(f"{where}: {len(sizes)} sizes for {len(classes)} classes (key 'sizes')")
    rows = need(data, "irreducible", where, list, "a list of [[irreducible]] tables with name and values")
    names: list[str] = []
    values: list[tuple[Entry, ...]] = []
    for pos, row in enumerate(rows):
        label = f"{where}: irreducible {pos + 1}"
        if not isinstance(row, dict):
            raise FileFormatError(f"{label} must be a table with keys name and values")
        check_keys(row, label, {"name", "values"})
        rname = need(row, "name", label, str, "a name")
        if rname in names:
            raise FileFormatError(f"{where}: two irreducibles are named {rname!r}")
        names.append(rname)
        values.append(_row(row, f"{where}: row {rname!r}", classes))
    if not names:
        raise FileFormatError(f"{where}: key 'irreducible' lists no characters")
    _check_cost(values, classes, where)
    return CharacterTable(name, order, classes, sizes, tuple(names), tuple(values))


#: classes of a table read from a file
MAX_CLASSES = 300
#: products of terms of entries the checks of a table may take (orthogonality of rows and columns)
MAX_CHECK_WORK = 5_000_000


def _check_cost(values: list[tuple[Entry, ...]], classes: tuple[str, ...], where: str) -> None:
    """Refuse, before checking orthogonality, a table whose checks would multiply more than
    MAX_CHECK_WORK pairs of terms, or whose entries together need a field Q(ζ_n) with n beyond
    ``engine.algebraic.MAX_CONDUCTOR``."""
    conductor = 1
    work = 0
    for c in range(len(classes)):
        column = sum(len(v[c].terms) if isinstance(v[c], Cyc) else 1 for v in values)
        work += column * column
        for v in values:
            if isinstance(v[c], Cyc):
                conductor = conductor * v[c].n // gcd(conductor, v[c].n)
    if conductor > MAX_CONDUCTOR:
        raise FileFormatError(
            f"{where}: the entries together need the field of {conductor:,}th roots of unity, "
            f"beyond the {MAX_CONDUCTOR:,} accepted"
        )
    if work > MAX_CHECK_WORK:
        raise FileFormatError(
            f"{where}: checking this table would take about {work:,} products of terms, "
            f"more than the {MAX_CHECK_WORK:,} accepted"
        )


def _row(table: dict[str, Any], where: str, classes: tuple[str, ...]) -> tuple[Entry, ...]:
    raw = need(table, "values", where, list, "a list of values, one per class")
    if len(raw) != len(classes):
        raise FileFormatError(f"{where}: {len(raw)} values for {len(classes)} classes")
    out: list[Entry] = []
    for c, item in enumerate(raw):
        try:
            value = parse_number(item)
        except AlgebraicError as exc:
            raise FileFormatError(f"{where}, class {classes[c]!r}: {exc}") from exc
        out.append(value.terms.get(0, 0) if value.n == 1 else value)
    return tuple(out)


def _module(data: dict[str, Any], where: str, table: CharacterTable) -> tuple[Entry, ...] | None:
    raw = data.get("module")
    if raw is None:
        return None
    label = f"{where}: [module]"
    if not isinstance(raw, dict):
        raise FileFormatError(f"{label} must be a table with values = [...] or sum = [names]")
    check_keys(raw, label, {"values", "sum"})
    if ("values" in raw) == ("sum" in raw):
        raise FileFormatError(f"{label} needs exactly one of values = [...] or sum = [names]")
    if "values" in raw:
        return _row(raw, label, table.classes)
    names = need(raw, "sum", label, list, "a list of irreducible names")
    counts = [0] * len(table.names)
    for name in names:
        if name not in table.names:
            raise FileFormatError(f"{label}: {name!r} is not an irreducible of {table.name} (it has {', '.join(table.names)})")
        counts[table.names.index(name)] += 1
    if not names:
        raise FileFormatError(f"{label}: key 'sum' is empty")
    return sum_of_rows(table, counts)


def read_character_file(path: str | Path) -> CharacterFile:
    """Read and validate a character-table file; FileFormatError or TableError naming the problem."""
    where = Path(path).name
    data = load_toml(path)
    check_header(data, where, FORMAT, VERSIONS)
    check_keys(data, where, _TOP_KEYS)
    table = _read_table(data, where)
    validate(table)
    module = _module(data, where, table)
    sub = data.get("subgroup")
    subgroup = None
    if sub is not None:
        if not isinstance(sub, dict):
            raise FileFormatError(f"{where}: [subgroup] must be a table")
        subgroup = _read_subgroup(sub, f"{where}: [subgroup]", table)
        induced = _induced(table, subgroup)
        if module is None:
            module = induced
        elif decompose(table, module, "V") != decompose(table, induced, "Ind U"):
            raise TableError(f"{where}: the module V is not the module induced from the subgroup's module U "
                             "(half levels need V = Ind_H^G U; drop [module] to use Ind U)")
    if module is None:
        raise FileFormatError(f"{where}: give the module V as [module] (values or sum), or a [subgroup]")
    decompose(table, module, "the module V")
    return CharacterFile(table, module, subgroup)


def _read_subgroup(sub: dict[str, Any], where: str, group: CharacterTable) -> Subgroup:
    from engine.class_functions import restriction_matrix

    check_keys(sub, where, _SUB_KEYS)
    table = _read_table(sub, where)
    validate(table)
    module = _module(sub, where, table) or table.values[0]
    decompose(table, module, "the subgroup module U")
    if ("fusion" in sub) == ("restriction" in sub):
        raise FileFormatError(f"{where}: give exactly one of fusion = [G-classes] or restriction = [[...]]")
    if "fusion" in sub:
        raw = need(sub, "fusion", where, list, "the G-class of each subgroup class")
        if len(raw) != len(table.classes):
            raise FileFormatError(f"{where}: key 'fusion' has {len(raw)} entries for {len(table.classes)} subgroup classes")
        fusion = []
        for d, name in enumerate(raw):
            if name not in group.classes:
                raise FileFormatError(f"{where}: fusion of class {table.classes[d]!r}: {name!r} is not a class of {group.name}")
            fusion.append(group.classes.index(name))
        check_fusion(group, table, fusion)
        restriction = restriction_matrix(group, table, fusion)
        return Subgroup(table, restriction, tuple(fusion), module)
    raw = need(sub, "restriction", where, list, "rows of multiplicities, one per irreducible of G")
    if len(raw) != len(group.names):
        raise FileFormatError(f"{where}: key 'restriction' has {len(raw)} rows for {len(group.names)} irreducibles of {group.name}")
    rows = tuple(whole_numbers(r, f"{where}: restriction row {group.names[i]!r}") for i, r in enumerate(raw))
    hdeg = table.degrees()
    for i, r in enumerate(rows):
        if len(r) != len(table.names):
            raise FileFormatError(f"{where}: restriction row {group.names[i]!r} has {len(r)} entries for {len(table.names)} irreducibles of {table.name}")
        if sum(m * d for m, d in zip(r, hdeg)) != group.degree(i):
            raise TableError(f"{where}: restriction row {group.names[i]!r} has dimension "
                             f"{sum(m * d for m, d in zip(r, hdeg))}, not the degree {group.degree(i)}")
    return Subgroup(table, rows, None, module)


def _induced(group: CharacterTable, sub: Subgroup) -> tuple[Entry, ...]:
    """The character of Ind_H^G U: ⟨Ind U, χ_l⟩ = ⟨U, Res χ_l⟩_H (Frobenius reciprocity)."""
    counts = []
    for l in range(len(group.names)):
        res = [sum((m * v for m, v in zip(sub.restriction[l], (row[d] for row in sub.table.values))), start=0)
               for d in range(len(sub.table.classes))]
        counts.append(_mult(sub, res))
    return sum_of_rows(group, counts)


def _mult(sub: Subgroup, res: list[Entry]) -> int:
    from engine.class_functions import inner

    value = inner(sub.table, sub.module, res)
    if value is None or value.denominator != 1 or value < 0:
        raise TableError(f"subgroup {sub.table.name}: the module U meets a restriction {value} times, not a whole number")
    return int(value)
