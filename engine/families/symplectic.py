"""``symplectic:n=2M``: Sp(2M) on V = C^{2M}; centralizers: Brauer algebras B_k(−2M).

Level k holds the partitions λ with at most M rows, |λ| ≤ k and |λ| ≡ k (mod 2), labelling the
irreducible Sp(2M)-modules ⟨λ⟩ (Weyl, *The Classical Groups*, 1939, ch. VI); an edge adds or
removes one box within M rows (engine.partition_tower).  Dimensions by the El Samra–King product
(engine.classical_dimensions), equal to Weyl's dimension formula of type C_M.

Brauer's centralizer theorem (Brauer, Ann. of Math. 38, 1937): B_k(−2M), of dimension (2k−1)!!
(OEIS A001147), maps onto the centralizer of Sp(2M), injectively exactly while k ≤ M.

``n=2`` is SL_2 = Sp(2): the levels are the path graph (), (1), (2), …; the centralizer is the
Temperley–Lieb algebra TL_k (Temperley and Lieb, Proc. Roy. Soc. A 322, 1971; Jones, Invent. Math.
72, 1983), of dimension Catalan(k) (OEIS A000108), which acts faithfully on every level.
"""

from __future__ import annotations

from fractions import Fraction

from engine.capabilities import AlgebraLevel, DiagramAlgebra, Encodings, SizeGuard
from engine.classical_dimensions import symplectic_dimension
from engine.combinatorics import catalan, double_factorial_odd
from engine.errors import SpecError
from engine.partition_tower import OneBoxTower, vector_dimension
from engine.partitions import Partition
from engine.specs import Family
class SymplecticTower(OneBoxTower):
    family = "symplectic"
    removes = True

    def __init__(self, spec: str, n: int) -> None:
        super().__init__(spec, n, n // 2)

    def admissible(self, lam: Partition) -> bool:
        return len(lam) <= self.rows

    def admissible_text(self) -> str:
        return f"at most {self.rows} row{'s' if self.rows > 1 else ''}"

    def level_kind(self, index: int) -> str:
        return "SL_2" if self.n == 2 else f"Sp({self.n})"

    def dimension(self, index: int, node: Partition) -> int:
        return symplectic_dimension(self.n, node)

    def first_unfaithful(self) -> int | None:
        """B_k(−2M) → End(V^{⊗k}) is injective iff k ≤ M (Goodman and Wallach 2009, 10.2: the second
        fundamental theorem for Sp(2M)); TL_k(−2) is the whole centralizer of SL_2 at every k
        (Temperley–Lieb; Goodman, de la Harpe, Jones 1989, 2.8), so faithful throughout."""
        return None if self.n == 2 else self.n // 2 + 1

    def algebra_level(self, index: int) -> AlgebraLevel:
        """TL_k(−2) when n = 2, of dimension Catalan(k) (OEIS A000108; Temperley and Lieb 1971),
        else the Brauer algebra B_k(−n), of dimension (2k−1)!! (OEIS A001147; Brauer 1937)."""
        if self.n == 2:
            return AlgebraLevel("temperley-lieb", f"TL_{index}", index, False, 2, -2, "", "symplectic",
                                catalan(index), Fraction(index), index)
        return AlgebraLevel("brauer", f"B_{index}(-{self.n})", index, False, self.n, -self.n, "", "symplectic",
                            double_factorial_odd(index), Fraction(index), index)


def _build(spec: str, params: dict[str, str]) -> SymplecticTower:
    n = vector_dimension("symplectic", params, minimum=2)
    if n % 2:
        raise SpecError(f"symplectic: key 'n' must be even (Sp(N) acts on C^N for N = 2, 4, 6, ...), got {n}")
    return SymplecticTower(spec, n)


FAMILY = Family(
    name="symplectic",
    summary="Sp(N) on C^N, N even (n=2 is SL_2); centralizers: Brauer algebras B_k(-N), Temperley-Lieb TL_k for N=2",
    keys={"n": "N, the dimension of V (even, N ≥ 2)"},
    build=_build,
    required=("n",),
    rank=32,
    example="symplectic:n=4",
    examples=("symplectic:n=2",),
    capabilities=(SizeGuard, DiagramAlgebra, Encodings,),
)
