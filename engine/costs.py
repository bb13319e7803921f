"""What building (and printing) levels will cost, estimated before starting.

The model (constants measured once on the development machine, rounded up;
``bench/bench_estimates.py`` prints it against real builds, and the counts against real counts):

    seconds = E·(t_edge + t_limb·d/9) + X·t_limb + [printed] n·t_text·d²
    bytes   = n·(b_node + b_digit·d)            (the levels kept; one level when streamed)

E: edges walked (``SizeGuard.edges``), n: nodes on the levels (``SizeGuard.nodes``), d: the
average decimal digits of the multiplicities (half those of the top level: they grow about
linearly with the level), X: other per-level work (``SizeGuard.extra``, e.g. the Bell triangle),
9 decimal digits ≈ one 30-bit limb of a CPython int, and CPython turns an int of d digits into
text in time ∝ d².
"""

from __future__ import annotations

from engine.records import record
from math import isqrt, log10
from typing import TYPE_CHECKING

if TYPE_CHECKING:
    from engine.tower import Tower

#: seconds per edge walked with machine-size multiplicities (learning the edge included)
T_EDGE = 4e-7
#: seconds per 30-bit limb added (big multiplicities)
T_LIMB = 6e-9
#: seconds per (decimal digit)² to turn one int into text
T_TEXT = 8e-11
#: bytes per node kept on a level (list slot, int object, its share of the node store)
B_NODE = 120
#: bytes per decimal digit of a kept int (log2(10)/8, rounded up)
B_DIGIT = 0.42

#: refuse work estimated past these
TIME_LIMIT = 60.0
MEMORY_LIMIT = 2 * 10**9


@record
class Cost:
    edges: int
    nodes: int
    digits: int
    seconds: float
    bytes: float

    def too_large(self) -> bool:
        return self.seconds > TIME_LIMIT or self.bytes > MEMORY_LIMIT

    def text(self) -> str:
        """One line: '… edges, multiplicities of about … digits: about … s and … GB'."""
        return (f"{self.edges:.2e} edges, {self.nodes:.2e} nodes, multiplicities of up to {self.digits:,} digits: "
                f"about {seconds_text(self.seconds)} and {self.bytes / 1e9:.2g} GB")


def seconds_text(value: float) -> str:
    if value < 120:
        return f"{value:.2g} s"
    if value < 7200:
        return f"{value / 60:.2g} min"
    return f"{value / 3600:.2g} h" if value < 1e6 else f"{value:.1e} s"


def digits_of(value: int) -> int:
    """Decimal digits of a positive int, from its bit length (no conversion to text)."""
    return max(1, int(value.bit_length() * log10(2)) + 1)


#: up to this level index the digits are also bounded by the diagram algebra's dimension (past it
#: the tensor dimension's bound is within a factor 10 anyway, see ``multiplicity_digits``)
ALGEBRA_BOUND_LEVELS = 64


def multiplicity_digits(tower: "Tower", index: int, tensor_digits: int) -> int:
    """Decimal digits bounding every multiplicity at ``index``: those of the tensor dimension
    (Σ m·dim = dim V^{⊗k}), and, where the family has a diagram algebra mapping onto the centralizer,
    those of √(its dimension) (m² ≤ Σ m² = dim of the centralizer ≤ dim of the algebra).

    The second bound matters for large N at low levels: GL_N at level k has multiplicities f^λ of
    about ½·log10 k! digits (their squares sum to k!: Schur–Weyl duality, Fulton and Harris,
    *Representation Theory*, §6.1) while (dim V)^k has k·log10 N, more than 10 times as many only
    while N > (k/e)^5, i.e. k ≤ 11 for N ≤ 1000 (Brauer and partition algebras: fewer levels);
    so it is computed only up to ``ALGEBRA_BOUND_LEVELS``, where the dimensions are small."""
    if index > ALGEBRA_BOUND_LEVELS:
        return tensor_digits
    from engine.capabilities import DiagramAlgebra

    algebra = tower.capability(DiagramAlgebra)
    if algebra is None:
        return tensor_digits
    return min(tensor_digits, digits_of(max(1, isqrt(algebra.dimension(index)))))


def estimate(edges: int, nodes: int, digits: int, extra: int = 0, printed: bool = False,
             kept: bool = True, levels: int = 1) -> Cost:
    """The cost of walking ``edges`` edges over ``nodes`` nodes whose largest multiplicity at the
    top has ``digits`` digits (``levels``: how many levels, for the memory of a streamed walk)."""
    average = max(1.0, digits / 2)
    seconds = edges * (T_EDGE + T_LIMB * average / 9) + extra * T_LIMB
    if printed:
        seconds += nodes * T_TEXT * average * average
    held = nodes if kept else nodes / max(levels, 1) * 2
    return Cost(edges, nodes, digits, seconds, held * (B_NODE + B_DIGIT * average))
