"""Independent pure-Python builds the benches hold the engine to (no engine code used here).

``symmetric_by_small_partitions``: the S_N tower (levels 0, 1/2, 1, ...) in the stable range
N ≥ 2·level, where a node is (N−|ν|, ν) for a small partition ν: restriction keeps ν (a box off
the first row) or removes a corner of ν, induction keeps ν or adds a box to ν (the branching rule,
Sagan, *The Symmetric Group*, 2.8).  Small partitions are numbered by size, so every level is a
prefix of one numbering and the parents of a node are the same at every level: edges come from
one pass over the lattice, each level is one ``sum(map(...))`` per node.
"""

from __future__ import annotations


def _up(p: tuple[int, ...]) -> list[tuple[int, ...]]:
    out = [(p[0] + 1,) + p[1:]] if p else [(1,)]
    out += [p[:r] + (p[r] + 1,) + p[r + 1:] for r in range(1, len(p)) if p[r - 1] > p[r]]
    return out + [p + (1,)] if p else out


def symmetric_by_small_partitions(n: int, upto: int, keep: bool = False) -> list[int]:
    """Multiplicities of the top level (index ``upto``) of symmetric:n=N, N ≥ upto (stable)."""
    if n < upto:
        raise ValueError("valid in the stable range only (N ≥ 2·level)")
    top = upto // 2 + 1
    by_size = [[()]]  # one pass over the lattice: the partitions of s are those of s−1 plus a box
    up_of: dict[tuple[int, ...], list[tuple[int, ...]]] = {}
    for _ in range(top):
        for p in by_size[-1]:
            up_of[p] = _up(p)
        by_size.append(list(dict.fromkeys(q for p in by_size[-1] for q in up_of[p])))
    nodes = [p for level in by_size for p in level]
    number = {p: j for j, p in enumerate(nodes)}
    upto_size = [0] * (top + 2)  # upto_size[s] = how many partitions have size < s
    for p in nodes:
        upto_size[sum(p) + 1] += 1
    for s in range(1, top + 2):
        upto_size[s] += upto_size[s - 1]
    ups = [[number[q] for q in up_of.get(p, ())] for p in nodes]
    downs: list[list[int]] = [[] for _ in nodes]
    for j, targets in enumerate(ups):
        for t in targets:
            downs[t].append(j)
    restrict = [tuple([j] + ups[j]) for j in range(len(nodes))]  # parents of ν at a half level
    induce = [tuple([j] + downs[j]) for j in range(len(nodes))]  # parents of ν at an integer level
    values, kept = [1], []
    for index in range(upto):
        k = index // 2
        if index % 2 == 0:  # integer level k → half level k+1/2: ν with |ν| ≤ k
            size, step, padded = upto_size[k + 1], restrict, upto_size[k + 2]
        else:  # half level k+1/2 → integer level k+1: ν with |ν| ≤ k+1
            size, step, padded = upto_size[k + 2], induce, upto_size[k + 2]
        previous = values + [0] * (padded - len(values))
        get = previous.__getitem__
        values = [sum(map(get, step[j])) for j in range(size)]
        if keep:
            kept.append(values)
    return values
