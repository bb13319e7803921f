"""``general-linear:n=N``: GL_N on V = C^N; centralizers: the symmetric group algebras CS_k.

Level k holds the partitions of k with at most N rows; an edge adds a box (Pieri rule).  By
Schur–Weyl duality (Schur 1901 and 1927; Weyl, *The Classical Groups*, 1939, ch. IV;
Fulton and Harris, *Representation Theory*, 6.1) V^{⊗k} = ⊕ V_λ ⊗ S^λ, so the multiplicity of
V_λ is f^λ, the number of standard tableaux (hook length formula), and the dimension of V_λ is
given by the hook-content formula (engine.classical_dimensions).  CS_k has dimension k!
(OEIS A000142) and maps onto the centralizer injectively exactly while k ≤ N.
"""

from __future__ import annotations

from math import factorial, lgamma, log

from engine.classical_dimensions import general_linear_dimension
from engine.partition_tower import OneBoxTower, vector_dimension
from engine.partitions import Partition, standard_tableaux_count
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

    def level_kind(self, index: int) -> str:
        return f"GL_{self.n}"

    def dimension(self, index: int, node: Partition) -> int:
        return general_linear_dimension(self.n, node)

    def generic_dimension(self, index: int) -> int:
        """k!, the dimension of CS_k (OEIS A000142)."""
        return factorial(index)

    def algebra_name(self, index: int) -> str:
        return f"CS_{index}"

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
)
