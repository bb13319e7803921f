"""Closed forms in k for the multiplicities of the S_N tower.

V^{⊗k} ≅ ⊕_t S(k,t)·Ind_{S_{N−t}}^{S_N} 1 (the S_N-orbits on [N]^k are the set partitions of [k]
into t ≤ N blocks; Jones 1994, Martin 1994) and Ind_{S_{N−t}}^{S_N} 1 holds S^λ f^{λ/(N−t)} times
(Pieri rule; Macdonald, *Symmetric Functions and Hall Polynomials*, I.5), so

    m_λ(k) = Σ_t c_t·S(k,t),  c_t = f^{λ/(N−t)},                       (integer levels)
    m_μ(k+1/2) = Σ_t c_t·S(k+1,t+1),  c_t = f^{μ/(N−1−t)}              (half levels).

With S(k,t) = Σ_{j≤t} (−1)^{t−j} j^k / (j!(t−j)!) (Graham, Knuth, Patashnik, *Concrete
Mathematics*, (6.19)) both become exponential sums m(k) = Σ_j b_j·j^k (resp. Σ_j b_j·j^{k+1}),
exact rationals b_j, valid for every k ≥ 0 (0^k is 1 at k = 0 and 0 after: it only corrects level 0).
"""

from __future__ import annotations

from engine.records import record
from fractions import Fraction
from math import factorial
from functools import lru_cache

from engine.combinatorics import stirling2_row
from engine.partitions import Partition, format_partition, skew_tableaux_count


@record
class SymmetricClosedForm:
    """m(k) for one node of ``symmetric:n=N``: Stirling coefficients and the exponential sum."""

    n: int
    node: Partition
    half: bool
    #: t → c_t (nonzero only)
    stirling: dict[int, int]
    #: j → b_j (nonzero only)
    powers: dict[int, Fraction]

    def value(self, k: int) -> int:
        """m at level k (or k+1/2), from the Stirling form."""
        if not self.stirling:
            return 0
        shift = 1 if self.half else 0
        row = stirling2_row(k + shift, max(self.stirling) + shift)
        return sum(c * row[t + shift] for t, c in self.stirling.items())

    def value_from_powers(self, k: int) -> int:
        """m at level k (or k+1/2), from the exponential sum."""
        e = k + 1 if self.half else k
        total = sum(b * j**e for j, b in self.powers.items())
        assert total.denominator == 1
        return int(total)

    def stirling_text(self) -> str:
        arg = "k+1" if self.half else "k"
        terms = [
            (f"{c}·" if c != 1 else "") + f"S({arg},{t + 1 if self.half else t})" for t, c in sorted(self.stirling.items())
        ]
        return " + ".join(terms) or "0"

    def powers_text(self) -> str:
        exponent = "k+1" if self.half else "k"
        out = []
        for j, b in sorted(self.powers.items(), reverse=True):
            size = abs(b)
            coefficient = "" if size == 1 else (f"{size.numerator}" if size.denominator == 1 else f"({size})")
            power = f"^({exponent})" if "+" in exponent else f"^{exponent}"
            base = "1" if j == 1 else f"{j}{power}"
            term = base if not coefficient else (coefficient if j == 1 else f"{coefficient}·{base}")
            sign = "−" if b < 0 else "+"
            out.append((sign, term))
        if not out:
            return "0"
        text = ("−" if out[0][0] == "−" else "") + out[0][1]
        for sign, term in out[1:]:
            text += f" {sign} {term}"
        return text

    def name(self) -> str:
        return f"m_{format_partition(self.node)}({'k+1/2' if self.half else 'k'})"


@lru_cache(maxsize=4096)
def symmetric_closed_form(n: int, node: Partition, half: bool) -> SymmetricClosedForm:
    """The closed form of ``node`` in the S_n tower: λ ⊢ n at integer levels, μ ⊢ n−1 at half levels
    (``half``).  The one place the S_N closed form is written; the family, its ``formula`` and the
    set-partition tableaux all read it."""
    top = n - 1 if half else n
    stirling: dict[int, int] = {}
    for t in range(top + 1):
        inner = (top - t,) if top - t else ()
        c = skew_tableaux_count(node, inner)
        if c:
            stirling[t] = c
    powers: dict[int, Fraction] = {}
    for t, c in stirling.items():
        tt = t + 1 if half else t
        for j in range(tt + 1):
            term = Fraction((-1) ** (tt - j) * c, factorial(j) * factorial(tt - j))
            powers[j] = powers.get(j, Fraction(0)) + term
    # at half levels the exponent k+1 is at least 1, so the 0^(k+1) term vanishes
    return SymmetricClosedForm(n, node, half, stirling, {j: b for j, b in powers.items() if b and (j or not half)})
