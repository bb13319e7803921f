"""``orthogonal:n=N``: O(N) on V = C^N; centralizers: the Brauer algebras B_k(N).

Level k holds the partitions λ with |λ| ≤ k, |λ| ≡ k (mod 2) and λ'_1 + λ'_2 ≤ N; these label the
irreducible O(N)-modules [λ], with [λ] = det ⊗ [λ*] when λ'_1 > N/2, λ* having its first column
cut to N − λ'_1 (Weyl, *The Classical Groups*, 1939, ch. V; Goodman and Wallach, *Symmetry,
Representations, and Invariants*, 2009, 10.2).  An edge adds or removes one box, both ends
admissible (engine.partition_tower).  Dimensions by the El Samra–King product
(engine.classical_dimensions).

Brauer's centralizer theorem (Brauer, *On algebras which are connected with the semisimple
continuous groups*, Ann. of Math. 38, 1937): B_k(N), of dimension (2k−1)!! (OEIS A001147), maps
onto the centralizer of O(N) in End(V^{⊗k}), injectively exactly while k ≤ N.
"""

from __future__ import annotations

from fractions import Fraction

from engine.capabilities import AlgebraLevel, DiagramAlgebra, Encodings, SizeGuard
from engine.classical_dimensions import orthogonal_dimension
from engine.combinatorics import double_factorial_odd
from engine.partition_tower import CountTable, OneBoxTower, orthogonal_counts, vector_dimension
from engine.partitions import Partition
from engine.specs import Family
class OrthogonalTower(OneBoxTower):
    family = "orthogonal"
    removes = True

    def __init__(self, spec: str, n: int) -> None:
        super().__init__(spec, n, n)

    def admissible(self, lam: Partition) -> bool:
        """λ'_1 + λ'_2 ≤ N: rows, plus rows of length at least 2."""
        second = 0
        for part in lam:
            if part < 2:
                break
            second += 1
        return len(lam) + second <= self.n

    def admissible_text(self) -> str:
        return f"λ'_1 + λ'_2 ≤ {self.n} (first two columns)"

    def size_counts(self, upto: int) -> "CountTable | list[int]":
        """Exactly the admissible partitions of each size (``orthogonal_counts``), where the table
        is cheap; else those with at most N rows."""
        exact = orthogonal_counts(self.n, upto)
        return super().size_counts(upto) if exact is None else exact

    def level_kind(self, index: int) -> str:
        return f"O({self.n})"

    def dimension(self, index: int, node: Partition) -> int:
        return orthogonal_dimension(self.n, node)

    def first_unfaithful(self) -> int:
        """B_k(N) → End(V^{⊗k}) is injective iff k ≤ N (Brauer 1937; Goodman and Wallach,
        *Symmetry, Representations, and Invariants*, 2009, 10.2: the second fundamental theorem
        for O(N))."""
        return self.n + 1

    def algebra_level(self, index: int) -> AlgebraLevel:
        """The Brauer algebra B_k(N), of dimension (2k−1)!! (OEIS A001147; Brauer 1937)."""
        return AlgebraLevel("brauer", f"B_{index}({self.n})", index, False, self.n, self.n, "", "orthogonal",
                            double_factorial_odd(index), Fraction(index), index)


def _build(spec: str, params: dict[str, str]) -> OrthogonalTower:
    n = vector_dimension("orthogonal", params, minimum=1)
    return OrthogonalTower(spec, n)


FAMILY = Family(
    name="orthogonal",
    summary="O(N) on C^N; centralizers: Brauer algebras B_k(N)",
    keys={"n": "N, the dimension of V (N ≥ 1)"},
    build=_build,
    required=("n",),
    rank=31,
    example="orthogonal:n=3",
    capabilities=(SizeGuard, DiagramAlgebra, Encodings,),
)
