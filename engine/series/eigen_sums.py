"""The multiplicity as a sum over the character values of V (character towers).

m_i(k) = ⟨χ_V^k, χ_i⟩ = (1/|G|) Σ_C |C| χ_V(C)^k conj(χ_i(C)) (Isaacs, *Character Theory of
Finite Groups*, 1976, ch. 2; Serre, *Linear Representations of Finite Groups*, 1977, §2.3), so
grouping the classes by the value λ = χ_V(C): m_i(k) = Σ_λ a_{i,λ}·λ^k with
a_{i,λ} = (1/|G|) Σ_{C : χ_V(C) = λ} |C|·conj(χ_i(C)).  The λ are the eigenvalues of the McKay
matrix (its eigenvectors are the columns of the character table; common practice), 0^k is 1 at
k = 0, else 0.  Towers with half levels are written by their matrices instead (``rational.py``)."""

from __future__ import annotations

from dataclasses import dataclass
from fractions import Fraction

from engine.capabilities import CharacterData
from engine.errors import UserError


@dataclass(frozen=True)
class EigenSum:
    """m(k) = Σ coefficient·base^k over ``terms`` (exact: ints, Fractions or ``Cyc``)."""

    label: str
    terms: tuple[tuple[object, object], ...]  # (base λ, coefficient a)

    def value(self, k: int):
        total = Fraction(0)
        for base, coefficient in self.terms:
            total = coefficient * base ** k + total
        return total

    def text(self) -> str:
        out = ""
        for base, coefficient in self.terms:
            b = _shown(base)
            b = b if _plain(b) and not b.startswith("-") else f"({b})"
            c = _shown(coefficient)
            join = " + "
            if out and c.startswith("-"):  # a later term with a leading minus: − and the negated coefficient
                join, c = " − ", _shown(-coefficient)
            c = "" if c == "1" else (c if _plain(c) and "/" not in c else f"({c})") + "·"
            out += (join if out else "") + f"{c}{b}^k"
        return out or "0"


def _shown(x) -> str:
    from engine.class_functions import exact

    value = exact(x)
    return str(value) if value is not None else str(x)


def _plain(text: str) -> bool:
    return text.lstrip("-").replace("/", "").isdigit()


def eigen_sum(tower, label: str, period: int) -> EigenSum:
    """The closed form of the node named ``label`` over the character values of V."""
    data = tower.capability(CharacterData)
    if data is None or period != 1:
        raise UserError(f"{tower.spec}: the closed form over characters needs a character table and "
                        "no half levels (the generating function is printed instead)")
    from engine.class_functions import exact
    from engine.cyclotomic import Cyc

    table = data.table
    if label not in table.names:
        raise UserError(f"{label[:60]!r} is not an irreducible of {table.name} ({', '.join(table.names[:12])})")
    row = table.values[table.names.index(label)]
    groups: list[list] = []  # [λ, a]
    for size, value, chi in zip(table.sizes, data.module, row):
        term = Fraction(size, table.order) * (chi.conjugate() if isinstance(chi, Cyc) else chi)
        for group in groups:
            if group[0] == value or (not isinstance(group[0], Cyc) and isinstance(value, Cyc) and value == group[0]):
                group[1] = group[1] + term
                break
        else:
            groups.append([value, term])
    terms = []
    for base, coefficient in groups:
        b, c = exact(base), exact(coefficient)
        if c == 0:
            continue
        terms.append((b if b is not None else base, c if c is not None else coefficient))
    terms.sort(key=lambda t: (-(t[0]) if isinstance(t[0], Fraction) else 0, str(t[0])))
    return EigenSum(label, tuple(terms))
