"""Built-in character tables: symmetric, cyclic and dihedral groups.

- S_n: classes are cycle types μ (the identity (1^n) first) of size n!/z_μ with
  z_μ = Π_i i^{m_i} m_i! (Sagan, *The Symmetric Group*, 2nd ed., 2001, Prop. 1.1.1); irreducibles are
  partitions λ ((n) first); values by the Murnaghan–Nakayama rule χ^λ(μ) = Σ (−1)^{ht(ξ)} χ^{λ−ξ}(μ − μ_1)
  over rim hooks ξ of size μ_1 (Sagan, Thm 4.10.2), computed on β-sets: removing a rim hook of size r
  moves one bead from b to b − r, with sign (−1)^{beads strictly between} (James and Kerber,
  *The Representation Theory of the Symmetric Group*, 1981, 2.7).
- C_n = ⟨g⟩: χ_j(g^k) = ζ_n^{jk} (Serre, *Linear Representations of Finite Groups*, 1977, §5.1).
- D_n of order 2n = ⟨r, s | r^n = s² = 1, srs = r^{−1}⟩: the 2-dimensional ρ_j with
  χ(r^k) = ζ^{jk} + ζ^{−jk}, χ(s r^k) = 0, and 2 or 4 characters of degree 1 (Serre, §5.3).
"""

from __future__ import annotations

from functools import lru_cache
from math import factorial

from engine.class_functions import CharacterTable
from engine.cyclotomic import Cyc
from engine.errors import UserError
from engine.numbers_in import is_digits, quote, read_whole
from engine.partitions import Partition, format_partition, partitions_of

#: S_n tables are dense p(n) × p(n); beyond this their McKay matrices take too long
MAX_SYMMETRIC_DEGREE = 14
#: built-in cyclic and dihedral tables are checked and decomposed exactly, in time growing like
#: the cube of the number of classes: C_40 and D_64 take a few seconds, C_120 well over a minute
MAX_CYCLIC_ORDER = 40
MAX_DIHEDRAL_DEGREE = 64


def centralizer_order(mu: Partition) -> int:
    """z_μ = Π_i i^{m_i} m_i!, so that the class of cycle type μ has n!/z_μ elements."""
    z = 1
    for part in set(mu):
        m = mu.count(part)
        z *= part**m * factorial(m)
    return z


def _beta(lam: Partition, length: int) -> tuple[int, ...]:
    padded = list(lam) + [0] * (length - len(lam))
    return tuple(sorted((padded[i] + length - 1 - i for i in range(length)), reverse=True))


@lru_cache(maxsize=None)
def _mn(beta: tuple[int, ...], mu: tuple[int, ...]) -> int:
    """Murnaghan–Nakayama on a β-set (sorted decreasing) and the remaining cycle lengths."""
    if not mu:
        return 1
    r, rest = mu[0], mu[1:]
    beads = set(beta)
    total = 0
    for b in beta:
        target = b - r
        if target < 0 or target in beads:
            continue
        between = sum(1 for x in beta if target < x < b)
        moved = tuple(sorted((target if x == b else x for x in beta), reverse=True))
        value = _mn(moved, rest)
        total += -value if between % 2 else value
    return total


def symmetric_character(lam: Partition, mu: Partition) -> int:
    """χ^λ(μ) by the Murnaghan–Nakayama rule."""
    length = max(len(lam), 1)
    return _mn(_beta(lam, length), tuple(mu))


def symmetric_table(n: int) -> CharacterTable:
    if not 1 <= n <= MAX_SYMMETRIC_DEGREE:
        raise UserError(f"character tables of S_n are built for 1 ≤ n ≤ {MAX_SYMMETRIC_DEGREE}, not n = {n}")
    irreducibles = list(partitions_of(n))
    classes = list(reversed(irreducibles))
    order = factorial(n)
    return CharacterTable(
        name=f"S_{n}",
        order=order,
        classes=tuple(format_partition(mu) for mu in classes),
        sizes=tuple(order // centralizer_order(mu) for mu in classes),
        names=tuple(format_partition(lam) for lam in irreducibles),
        values=tuple(tuple(symmetric_character(lam, mu) for mu in classes) for lam in irreducibles),
    )


def cyclic_table(n: int) -> CharacterTable:
    if n < 1:
        raise UserError(f"a cyclic group needs order n ≥ 1, not {n}")
    if n > MAX_CYCLIC_ORDER:
        raise UserError(
            f"the built-in cyclic tables go up to order {MAX_CYCLIC_ORDER}, not {n} "
            "(a cyclic group of any order up to 2000 on C^2: su2:kind=cyclic,m=M)"
        )
    return CharacterTable(
        name=f"C_{n}",
        order=n,
        classes=tuple("1" if k == 0 else "g" if k == 1 else f"g^{k}" for k in range(n)),
        sizes=(1,) * n,
        names=tuple(f"x{j}" for j in range(n)),
        values=tuple(tuple(Cyc.unity(n, j * k) if n > 1 else 1 for k in range(n)) for j in range(n)),
    )


def dihedral_table(n: int) -> CharacterTable:
    """D_n of order 2n, n ≥ 3."""
    if n < 3:
        raise UserError(f"the dihedral group D_n (order 2n) needs n ≥ 3, not {n}")
    if n > MAX_DIHEDRAL_DEGREE:
        raise UserError(f"the built-in dihedral tables go up to D_{MAX_DIHEDRAL_DEGREE} (order {2 * MAX_DIHEDRAL_DEGREE}), not D_{n}")
    half = (n - 1) // 2 if n % 2 else n // 2 - 1
    rotations = list(range(1, half + 1))
    classes = ["1"] + (["r^" + str(n // 2)] if n % 2 == 0 else []) + [f"r^{k}" if k > 1 else "r" for k in rotations]
    sizes = [1] + ([1] if n % 2 == 0 else []) + [2] * len(rotations)
    powers = [0] + ([n // 2] if n % 2 == 0 else []) + rotations
    if n % 2:
        classes.append("s")
        sizes.append(n)
        ones = {"1": (1, 1), "e": (1, -1)}  # (value on r, value on s)
    else:
        classes += ["s", "sr"]
        sizes += [n // 2, n // 2]
        ones = {"1": (1, 1), "e": (1, -1), "f": (-1, 1), "fe": (-1, -1)}
    names, values = [], []
    for name, (on_r, on_s) in ones.items():
        row = [on_r**k for k in powers]
        row += [on_s] if n % 2 else [on_s, on_s * on_r]
        names.append(name)
        values.append(tuple(row))
    for j in range(1, half + 1):
        row = [Cyc.unity(n, j * k) + Cyc.unity(n, -j * k) for k in powers] + [0] * (1 if n % 2 else 2)
        names.append(f"r{j}")
        values.append(tuple(row))
    return CharacterTable(f"D_{n}", 2 * n, tuple(classes), tuple(sizes), tuple(names), tuple(values))


def builtin_table(text: str) -> CharacterTable:
    """``symmetric(N)``, ``cyclic(N)`` or ``dihedral(N)`` (D_N of order 2N)."""
    makers = {"symmetric": symmetric_table, "cyclic": cyclic_table, "dihedral": dihedral_table}
    name, _, rest = text.strip().partition("(")
    if name not in makers or not rest.endswith(")") or not is_digits(rest[:-1].strip()):
        raise UserError(f"{quote(text)} is not a built-in table (write symmetric(N), cyclic(N) or dihedral(N))")
    return makers[name](read_whole(rest[:-1], f"the N of {name}(N)", max_digits=18))
