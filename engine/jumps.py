"""Levels of a tower with finite node sets at any depth, by powers of its step matrix.

The multiplicities at level k are the row vector e_root·M^k (M the McKay matrix of the step;
for two half steps R (restrict) and I (induce), e_root·(RI)^j, times R once more at j+1/2):
the number of paths of length k in the McKay graph (McKay, *Graphs, singularities and finite
groups*, Proc. Symp. Pure Math. 37, 1980; Goodman, de la Harpe, Jones, *Coxeter Graphs and Towers
of Algebras*, 1989, 2.1).

How: the Krylov vectors v, vM, vM², ... of v = e_root become dependent after d ≤ n steps; the
dependency is the monic minimal polynomial q of v (integer coefficients by Gauss's lemma).  Then
vM^k = Σ_j c_j·vM^j where Σ_j c_j t^j = t^k mod q(t), and t^k mod q by repeated squaring
(Knuth, *TAOCP* vol. 2, 4.6.3; the "Kitamasa" reduction of linear recurrences, common practice).
When q(t) = r(t^p) (a bipartite McKay graph gives p = 2) the powers are taken in y = t^p.  The
polynomials are python-flint ``fmpz_poly`` (Kronecker substitution), so a level costs about
log2(k) products of deg(q) numbers of the level's size, instead of n³ for a matrix square.
``matrix_level_vector`` keeps the plain route (``fmpz_mat`` squaring) for large d and the tests.
"""

from __future__ import annotations

from math import gcd, log10

from engine.capabilities import FiniteSteps, Node, StepMatrix

#: above this minimal-polynomial degree the matrix route is used
_KRYLOV_LIMIT = 120


def _matrix(step: StepMatrix):
    from flint import fmpz_mat

    return fmpz_mat([list(row) for row in step.matrix])


def _root_vector(steps: FiniteSteps):
    from flint import fmpz_mat

    n = len(steps.steps[0].rows)
    return fmpz_mat(1, n, [1 if i == steps.root_position else 0 for i in range(n)])


def matrix_level_vector(steps: FiniteSteps, index: int) -> list[int]:
    """The multiplicities at step index ``index`` by repeated squaring of the whole step matrix."""
    full, rest = divmod(index, steps.period)
    vector = _root_vector(steps)
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


class _Krylov:
    """v M^j for j < d + p and the minimal polynomial q of v under M (q = r(t^p))."""

    def __init__(self, steps: FiniteSteps) -> None:
        from flint import fmpz_mat, fmpz_poly

        whole = _matrix(steps.whole_step())
        vectors = [_root_vector(steps)]
        n = whole.ncols()
        coefficients = None
        while len(vectors) <= min(n + 1, _KRYLOV_LIMIT):
            rows = [list(v.entries()) for v in vectors]
            if fmpz_mat(rows).rank() < len(rows):
                # the last vector depends on the earlier ones: the nullspace of K^T is one vector
                space, nullity = fmpz_mat(rows).transpose().nullspace()
                coefficients = [int(space[i, 0]) for i in range(len(rows))]
                break
            vectors.append(vectors[-1] * whole)
        if coefficients is None:
            self.q = None
            return
        lead = coefficients[-1]
        q = [c // lead for c in coefficients]  # monic: q(t) = t^d + ...
        self.q = fmpz_poly(q)
        # q(t) = t^a·s(t) with s(0) ≠ 0: past the nilpotent part a, w = vM^a has minimal polynomial s
        self.a = next(j for j, c in enumerate(q) if c)
        s = q[self.a:]
        d = len(s) - 1
        p = 0
        for j, c in enumerate(s):
            if c:
                p = gcd(p, d - j)
        self.p = max(p, 1)
        self.r = fmpz_poly(s[:: self.p])
        while len(vectors) < self.a + d + self.p:
            vectors.append(vectors[-1] * whole)
        self.vectors = [[int(x) for x in v.entries()] for v in vectors]
        self.fmpz_poly = fmpz_poly

    def power(self, k: int) -> list[int]:
        """v M^k, for k ≥ a."""
        a, b = divmod(k - self.a, self.p)
        poly = self.fmpz_poly
        result, base, e = poly([1]), poly([0, 1]), a
        while e:
            if e & 1:
                result = (result * base) % self.r
            e >>= 1
            if e:
                base = (base * base) % self.r
        coeffs = [int(c) for c in result.coeffs()]
        n = len(self.vectors[0])
        out = [0] * n
        for j, c in enumerate(coeffs):
            if c:
                row = self.vectors[self.a + j * self.p + b]
                for i in range(n):
                    if row[i]:
                        out[i] += c * row[i]
        return out


_CACHE: dict[int, tuple[FiniteSteps, _Krylov]] = {}


def _krylov(steps: FiniteSteps) -> _Krylov:
    found = _CACHE.get(id(steps))
    if found is None or found[0] is not steps:
        if len(_CACHE) > 16:
            _CACHE.clear()
        found = (steps, _Krylov(steps))
        _CACHE[id(steps)] = found
    return found[1]


def level_vector(steps: FiniteSteps, index: int) -> list[int]:
    """The multiplicities at step index ``index``, in the order of the node set of that level."""
    full, rest = divmod(index, steps.period)
    krylov = _krylov(steps)
    if krylov.q is None or full < 2 * len(krylov.vectors):
        return matrix_level_vector(steps, index)
    from flint import fmpz_mat

    vector = krylov.power(full)
    if not rest:
        return vector
    out = fmpz_mat(1, len(vector), vector)
    for r in range(rest):
        out = out * _matrix(steps.steps[r])
    return [int(x) for x in out.entries()]


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
