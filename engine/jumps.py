"""Levels of a tower with finite node sets at any depth, by powers of its step matrix.

The multiplicities at level k are the row vector e_root·M^k (M the McKay matrix of the step;
for two half steps R (restrict) and I (induce), e_root·(RI)^j, times R once more at j+1/2):
the number of paths of length k in the McKay graph (McKay, *Graphs, singularities and finite
groups*, Proc. Symp. Pure Math. 37, 1980; Goodman, de la Harpe, Jones, *Coxeter Graphs and Towers
of Algebras*, 1989, 2.1).  M^k by repeated squaring (Knuth, *TAOCP* vol. 2, 4.6.3) with
python-flint's ``fmpz_mat``, exact.
"""

from __future__ import annotations

from math import log10

from engine.capabilities import FiniteSteps, Node, StepMatrix


def _matrix(step: StepMatrix):
    from flint import fmpz_mat

    return fmpz_mat([list(row) for row in step.matrix])


def level_vector(steps: FiniteSteps, index: int) -> list[int]:
    """The multiplicities at step index ``index``, in the order of the node set of that level."""
    from flint import fmpz_mat

    period = steps.period
    full, rest = divmod(index, period)
    first = steps.steps[0]
    vector = fmpz_mat(1, len(first.rows), [1 if i == steps.root_position else 0 for i in range(len(first.rows))])
    whole = _matrix(steps.whole_step())
    power = full
    while power:
        if power & 1:
            vector = vector * whole
        power >>= 1
        if power:
            whole = whole * whole
    for r in range(rest):
        vector = vector * _matrix(steps.steps[r])
    return [int(x) for x in vector.entries()]


def jump_level(steps: FiniteSteps, index: int) -> dict[Node, int]:
    """node → multiplicity at step index ``index``: every node with a path (multiplicity ≥ 1)."""
    rest = index % steps.period
    nodes = steps.steps[rest].rows
    return {node: m for node, m in zip(nodes, level_vector(steps, index)) if m}


def jump_digits(steps: FiniteSteps, index: int) -> int:
    """Digits of (dim V)^k at most: multiplicities are bounded by the tensor dimension, and the
    entries of M^k by (max row sum)^k."""
    whole = steps.whole_step()
    growth = max(max(sum(row) for row in whole.matrix), whole.constant, 2)
    return int((index / steps.period + 1) * log10(growth)) + 1
