"""Shared helpers of the cell-module tests: algebra levels built by hand, random basis diagrams."""

from __future__ import annotations

import random
from fractions import Fraction

from engine.algebras.diagrams import canonical, in_basis
from engine.capabilities import AlgebraLevel


def level_of(kind: str, r: int, *, half: bool = False, word: str = "", n: int = 3,
             group: str = "symmetric") -> AlgebraLevel:
    parameter = None if kind == "symmetric-group" else n
    k = r - 1 if half else r
    return AlgebraLevel(kind, f"{kind}-{r}", r, half, n, parameter, word, group, 0,
                        Fraction(2 * k + 1, 2) if half else Fraction(k), 2 * k + 1 if half else k)


def random_diagram(level: AlgebraLevel, rng: random.Random):
    """A random basis diagram of the level (rejection sampling)."""
    r = level.vertices
    while True:
        points = list(range(2 * r))
        rng.shuffle(points)
        if level.kind == "partition":
            blocks: list[list[int]] = []
            for v in points:
                if blocks and rng.random() < 0.45:
                    rng.choice(blocks).append(v)
                else:
                    blocks.append([v])
        else:
            blocks = [points[i:i + 2] for i in range(0, 2 * r, 2)]
        d = canonical(blocks)
        if in_basis(d, level):
            return d


def upside_down(d, r: int):
    return canonical([[v + r if v < r else v - r for v in block] for block in d])
