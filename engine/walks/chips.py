"""Chip-firing on the McKay graph, with the root as the sink.

A configuration puts c_i ≥ 0 chips on each node but the root; node i is unstable when
c_i ≥ C̃_ii = dim V − M_ii, and toppling it subtracts row i of C̃: it loses dim V − M_ii chips and
sends M_ij to each other node j (those sent to the root vanish).  C̃ is a non-singular M-matrix when
V is faithful (its null vector on the whole graph is the positive vector of dimensions), and such a
matrix is avalanche-finite: every configuration stabilises, to one stable configuration whatever
the order of topplings (a 1993 result on avalanche-finite matrices, extending Dhar's abelian
sandpile, Phys. Rev. Lett. 64, 1990).  The recurrent configurations (stabilisations of
c_max + b, b ≥ 0, c_max = (C̃_ii − 1)_i) are one per class of Z^{r−1}/(rows of C̃) (Dhar 1990;
Biggs 1999 for graphs), so listing them counts the critical group: the count must be |det C̃|.
The class of c holds c + det(C̃)·(1, ..., 1) (since det·I = adj(C̃)·C̃), which lifts any c above
c_max before stabilising."""

from __future__ import annotations

from collections import deque
from dataclasses import dataclass

from engine.errors import TooLarge, UserError
from engine.series.finite import FiniteView
from engine.walks.critical import reduced_cartan

#: bulk topplings (a node toppled q times at once counts once) before giving up
MAX_ROUNDS = 2_000_000
#: chips per node (in units of the largest C̃_ii) above which stabilising starts with a jump
JUMP_ABOVE = 64
#: recurrent configurations listed at most
MAX_LISTED = 20_000


@dataclass(frozen=True)
class Sandpile:
    labels: tuple[str, ...]  # the non-root nodes, in display order
    cartan: tuple[tuple[int, ...], ...]

    def stabilise(self, config: list[int]) -> tuple[list[int], int]:
        """(the stable configuration, the number of topplings).  A configuration with many chips
        first topples, at once, a vector known to be at most its odometer (``_sure_topplings``)."""
        c = list(config)
        r = len(c)
        if any(self.cartan[i][i] <= 0 for i in range(r)):
            raise UserError("a node with C̃_ii ≤ 0 never stabilises: this graph is not a McKay graph of a faithful module")
        topplings, rounds = 0, 0
        if sum(c) > JUMP_ABOVE * r * max(self.cartan[i][i] for i in range(r)):
            sure = self._sure_topplings(c)
            for i, q in enumerate(sure):
                if q:
                    row = self.cartan[i]
                    for j in range(r):
                        c[j] -= q * row[j]
            topplings = sum(sure)
        queue = deque(i for i in range(r) if c[i] >= self.cartan[i][i])
        while queue:
            i = queue.popleft()
            q = c[i] // self.cartan[i][i]
            if q <= 0:
                continue
            rounds += 1
            if rounds > MAX_ROUNDS:
                raise TooLarge(f"the configuration did not stabilise in {MAX_ROUNDS:,} rounds of topplings "
                               "(C̃ may not be an M-matrix)")
            topplings += q
            row = self.cartan[i]
            for j in range(r):
                if row[j]:
                    c[j] -= q * row[j]
                    if c[j] >= self.cartan[j][j] and j != i:
                        queue.append(j)
            if c[i] >= self.cartan[i][i]:
                queue.append(i)
        return c, topplings

    def _sure_topplings(self, config: list[int]) -> list[int]:
        """u = max(0, ⌊(c − c_max)·C̃⁻¹⌋), at most the odometer x of c (the topplings of its
        stabilisation s = c − x·C̃).  Since 0 ≤ s ≤ c_max and C̃⁻¹ ≥ 0 entrywise (C̃ a non-singular
        M-matrix: Berman and Plemmons, *Nonnegative Matrices in the Mathematical Sciences*, 1979,
        6.2), x ≥ (c − c_max)·C̃⁻¹.  Toppling u first, chips going negative where they must, and then
        only legal topplings ends at s: by the least action principle (a 2010 result on sandpile
        growth) the legal topplings from c − u·C̃ are x − u.  What is left is at most c_max·C̃⁻¹ + 1
        topplings per node, however many chips c holds."""
        from flint import fmpz_mat

        excess = [x - t for x, t in zip(config, self.maximal())]
        solved = fmpz_mat([list(col) for col in zip(*self.cartan)]).solve(fmpz_mat([[e] for e in excess]))
        return [max(0, int(solved[i, 0].p // solved[i, 0].q)) for i in range(len(config))]

    def maximal(self) -> list[int]:
        return [self.cartan[i][i] - 1 for i in range(len(self.labels))]

    def recurrent(self, config: list[int], determinant: int) -> list[int]:
        """The recurrent configuration of the class of ``config``."""
        top = self.maximal()
        det = abs(determinant)
        lift = max([0] + [-(-(t - x) // det) for x, t in zip(config, top)])
        return self.stabilise([x + lift * det for x in config])[0]

    def all_recurrent(self, determinant: int) -> list[tuple[int, ...]]:
        """Every recurrent configuration (one per class), by closing the recurrent identity's class
        under adding one chip at each node."""
        if abs(determinant) > MAX_LISTED:
            raise TooLarge(f"the critical group has {abs(determinant):,} elements; listing is limited to {MAX_LISTED:,}")
        start = tuple(self.recurrent([0] * len(self.labels), determinant))
        seen = {start}
        queue = deque([start])
        while queue:
            c = queue.popleft()
            for i in range(len(c)):
                bumped = list(c)
                bumped[i] += 1
                nxt = tuple(self.stabilise(bumped)[0])
                if nxt not in seen:
                    seen.add(nxt)
                    queue.append(nxt)
        return sorted(seen)


def sandpile(view: FiniteView) -> Sandpile:
    labels = tuple(label for i, label in enumerate(view.labels) if i != view.root)
    return Sandpile(labels, tuple(tuple(row) for row in reduced_cartan(view)))


def read_config(pile: Sandpile, items: list[str]) -> list[int]:
    """``LABEL=COUNT`` items (split at the last ``=``) into a configuration; unnamed nodes hold 0."""
    config = [0] * len(pile.labels)
    for item in items:
        label, sep, count = item.rpartition("=")
        if not sep or not count.strip().isdigit() or len(count.strip()) > 30:
            raise UserError(f"chips: {item[:60]!r} is not LABEL=COUNT with a count of 0 or more")
        if label not in pile.labels:
            shown = ", ".join(pile.labels[:12])
            raise UserError(f"chips: {label[:60]!r} is not a node other than the root (nodes: {shown})")
        config[pile.labels.index(label)] += int(count)
    return config
