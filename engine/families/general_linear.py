"""``general-linear:n=N``: GL_N on V = C^N; centralizers: the symmetric group algebras CS_k.

Level k holds the partitions of k with at most N rows; an edge adds a box (Pieri rule).  By
Schur–Weyl duality (Schur 1901 and 1927; Weyl, *The Classical Groups*, 1939, ch. IV;
Fulton and Harris, *Representation Theory*, 6.1) V^{⊗k} = ⊕ V_λ ⊗ S^λ, so the multiplicity of
V_λ is f^λ, the number of standard tableaux (hook length formula), and the dimension of V_λ is
given by the hook-content formula (engine.classical_dimensions).  CS_k has dimension k!
(OEIS A000142) and maps onto the centralizer injectively exactly while k ≤ N.
"""

from __future__ import annotations

from fractions import Fraction
from math import factorial, lgamma, log

from engine.capabilities import (
    AlgebraLevel,
    Capability,
    ClosedForm,
    DiagramAlgebra,
    Encodings,
    LevelDimensions,
    LevelJump,
    SizeGuard,
)
from engine.classical_dimensions import general_linear_dimension, general_linear_dimensions_of_level
from engine.partition_tower import OneBoxTower, vector_dimension
from engine.partitions import Partition, larger_by_one_box, partitions_of, standard_tableaux_count
from engine.specs import Family
class GeneralLinearTower(OneBoxTower):
    family = "general-linear"
    removes = False

    def __init__(self, spec: str, n: int) -> None:
        super().__init__(spec, n, n)

    def admissible(self, lam: Partition) -> bool:
        return len(lam) <= self.n

    def admissible_text(self) -> str:
        return f"at most {self.n} rows"

    def children(self, index: int, node: Partition) -> list[tuple[Partition, int]]:
        """Add a box at each addable corner (Pieri); only a new row can break "at most N rows"."""
        kids = larger_by_one_box(node)
        if len(node) >= self.n:
            kids.pop()  # the last one is the new row
        return [(lam, 1) for lam in kids]

    def level_kind(self, index: int) -> str:
        return f"GL_{self.n}"

    def dimension(self, index: int, node: Partition) -> int:
        return general_linear_dimension(self.n, node)

    encodings = ("tableau", "updown", "labels")

    def capabilities(self) -> list[Capability]:
        return [*super().capabilities(),
                ClosedForm(self.multiplicity, self.on_level, self.estimate_digits, self.formula),
                LevelJump(self.deep_level, self.estimate_digits, self.jump_seconds),
                LevelDimensions(lambda index, nodes, ms: general_linear_dimensions_of_level(self.n, index, nodes, ms))]

    def deep_level(self, index: int) -> dict[Partition, int]:
        """Level k at once: every partition of k with at most N rows, with f^λ (Schur–Weyl duality)."""
        return {lam: standard_tableaux_count(lam) for lam in partitions_of(index, max_length=self.n)}

    def jump_seconds(self, index: int) -> float:
        """The time of ``deep_level`` and of writing the level out: per node about 3·10^-5 s plus
        2.5·10^-5 s per (thousand digits of k!)², measured on this project's 2-core machine with
        ``levels general-linear:n=3 --at K --json`` at K = 400, 800, 1200 (0.63, 5.2, 31 s)."""
        nodes = self.level_node_count(index)
        thousands = self.estimate_digits(index) / 1000
        return nodes * (3e-5 + 2.5e-5 * thousands * thousands)

    def algebra_level(self, index: int) -> AlgebraLevel:
        """CS_k, of dimension k! (OEIS A000142), acting by permuting the tensor factors."""
        return AlgebraLevel("symmetric-group", f"CS_{index}", index, False, self.n, None, "", "general-linear",
                            factorial(index), Fraction(index), index)

    def first_unfaithful(self) -> int:
        """CS_k → End(V^{⊗k}) is injective iff k ≤ N: its kernel is spanned by the isotypic parts of
        the λ with more than N rows (Schur–Weyl duality; Weyl, *The Classical Groups*, ch. IV)."""
        return self.n + 1

    def formula(self, index: int, node: Partition) -> str:
        """f^λ for every N ≥ ℓ(λ): Schur–Weyl duality, the hook length formula."""
        from engine.partitions import format_partition

        return f"m_{format_partition(node)} = f^{format_partition(node)} (hook length formula), for every k = |λ|"

    def estimate_digits(self, index: int) -> int:
        """Digits of k!, the largest factor of the hook length formula (log10 k! by lgamma)."""
        return int(lgamma(index + 1) / log(10)) + 1

    def multiplicity(self, index: int, node: Partition) -> int:
        """f^λ by the hook length formula (Schur–Weyl duality), 0 off the level."""
        return standard_tableaux_count(node) if self.on_level(index, node) else 0


def _build(spec: str, params: dict[str, str]) -> GeneralLinearTower:
    n = vector_dimension("general-linear", params, minimum=1)
    return GeneralLinearTower(spec, n)


FAMILY = Family(
    name="general-linear",
    summary="GL_N on C^N; centralizers: symmetric group algebras CS_k (Schur-Weyl duality)",
    keys={"n": "N, the dimension of V (N ≥ 1)"},
    build=_build,
    required=("n",),
    rank=30,
    example="general-linear:n=3",
    capabilities=(SizeGuard, ClosedForm, LevelJump, DiagramAlgebra, Encodings, LevelDimensions),
)
