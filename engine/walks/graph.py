"""Reachability and period of the whole step's graph from the root (common practice: the period of
an irreducible chain is the gcd of its cycle lengths, computed from breadth-first distances d as
gcd over edges u → v of d(u) + 1 − d(v); Norris, *Markov Chains*, 1997, 1.8)."""

from __future__ import annotations

from collections import deque
from math import gcd

from engine.series.finite import FiniteView


def distances(view: FiniteView) -> dict[int, int]:
    """Breadth-first distance from the root of every node reached by whole steps."""
    seen = {view.root: 0}
    queue = deque([view.root])
    while queue:
        i = queue.popleft()
        for j, m in enumerate(view.matrix[i]):
            if m and j not in seen:
                seen[j] = seen[i] + 1
                queue.append(j)
    return seen


def closed_class(view: FiniteView) -> bool:
    """Whether every node reached from the root leads back to it (the reached set is one class)."""
    reached = distances(view)
    back = {view.root}
    changed = True
    while changed:
        changed = False
        for i in reached:
            if i not in back and any(view.matrix[i][j] for j in back):
                back.add(i)
                changed = True
    return set(reached) <= back


def period(view: FiniteView) -> int:
    """The period of the graph on the nodes reached from the root (2 for a bipartite McKay graph)."""
    d = distances(view)
    p = 0
    for i in d:
        for j, m in enumerate(view.matrix[i]):
            if m and j in d:
                p = gcd(p, d[i] + 1 - d[j])
    return abs(p) or 1
