"""Counting paths level by level: the sweep under ``engine.diagram.Diagram``.

m(root) = 1 and m(child) = Σ_parents m(parent)·edges (Bratteli 1972; Goodman, de la Harpe,
Jones 1989, ch. 2).

Layout.  The nodes of a level live in a *space* (``tower.space_key(index)``: e.g. the
partitions of N at the integer levels of the S_N tower, the nodes of one node set of a finite
tower, or the level alone).  A space numbers its nodes 0, 1, 2, ... as it meets them; a level is
a list of multiplicities indexed by those numbers (0 for a node of the space not on the level).
A *passage* joins a source space to a target space by one step kind (``tower.step_key``): it
asks the tower for the children of each source node once and keeps, for every target node, the
list of its source parents (repeated by the edge count when the count is small).  A level is then
*pulled*: ``[sum(map(previous.__getitem__, parents)) for parents in passage.parents]`` — one
C-level reduction per node, no bytecode per edge, and a passage met again (the repeating steps
of S_N, O(N), finite towers) only learns the nodes that are new.
"""

from __future__ import annotations

import threading
import time
from collections import defaultdict
from itertools import compress, repeat
from operator import mul
from typing import Callable, Hashable, Iterable, Iterator

from engine.errors import Cancelled
from engine.tower import Node, Tower

#: edge counts up to this are stored as repeated parents (pulled at C speed); larger counts
#: (e.g. a tensor-graph file with an entry 10^18) are kept with their count and multiplied
REPEAT_UP_TO = 16
#: nodes pulled between two looks at the cancel token
CHUNK = 1 << 15
#: nodes learned under one hold of the lock
LEARN_CHUNK = 2048


def _drop(_: object) -> None:
    """Keep nothing (the parents side of a passage that dropped it)."""


class Space:
    """The nodes of one kind of level, numbered as met."""

    __slots__ = ("key", "ids", "nodes", "dims")

    def __init__(self, key: Hashable) -> None:
        self.key = key
        self.ids: dict[Node, int] = {}
        self.nodes: list[Node] = []
        #: dimensions of the nodes, by number, as far as they were asked for (``dimensions``)
        self.dims: list[int] = []

    def number(self, node: Node) -> int:
        ident = self.ids.get(node)
        if ident is None:
            ident = self.ids[node] = len(self.nodes)
            self.nodes.append(node)
        return ident


class Passage:
    """One step kind from a source space to a target space, with its edges both ways."""

    __slots__ = ("source", "target", "kids", "counts", "parents", "weighted", "upto", "pulls")

    def __init__(self, source: Space, target: Space) -> None:
        self.source = source
        self.target = target
        self.kids: dict[int, tuple[int, ...]] = {}
        self.counts: dict[int, tuple[int, ...]] = {}
        #: by target number: the source numbers stepping to it (repeated by small edge counts);
        #: tuples, which the garbage collector stops tracking (lists would make every collection
        #: walk them all)
        self.parents: list[tuple[int, ...]] | None = []
        #: target number → [(source number, edge count)] for counts above REPEAT_UP_TO
        self.weighted: dict[int, list[tuple[int, int]]] = {}
        #: every source number below this has its children learned
        self.upto = 0
        #: levels pulled through this passage (after the first, it keeps its parents)
        self.pulls = 0


class PathCounts:
    """Spaces, passages and the levels built so far (level index → (space, multiplicities))."""

    def __init__(self, tower: Tower) -> None:
        self.tower = tower
        self._spaces: dict[Hashable, Space] = {}
        self._passages: dict[tuple[Hashable, Hashable, Hashable], Passage] = {}
        root_space = self.space(0)
        root_space.number(tower.root())
        self.levels: list[tuple[Space, list[int]]] = [(root_space, [1])]
        self.lock = threading.RLock()  # numbering and learning (the UI thread may ask too)

    def space(self, index: int) -> Space:
        key = self.tower.space_key(index)
        found = self._spaces.get(key)
        if found is None:
            found = self._spaces.setdefault(key, Space(key))
        return found

    def passage(self, index: int) -> Passage:
        source, target = self.space(index), self.space(index + 1)
        key = (source.key, self.tower.step_key(index), target.key)
        found = self._passages.get(key)
        if found is None:
            with self.lock:
                found = self._passages.setdefault(key, Passage(source, target))
        return found

    # ----- edges ----------------------------------------------------------------------------
    def _learn(self, index: int, passage: Passage, idents: Iterable[int]) -> None:
        """Ask the tower for the children of the source nodes numbered ``idents`` (those learned
        already are skipped); register the edges both ways (the parents side only while the
        passage keeps it, see ``_parents_again``).  One call learns a batch: the lookups are
        made once per batch, not once per source (on GL_N, about 4 edges per source, a fifth
        of the sweep), and a simple edge goes into the parents side in the loop that numbers it
        (one pass over the edges, not two: 3–15% of the sweep with learning)."""
        kids, counts_of, weighted = passage.kids, passage.counts, passage.weighted
        children, sources = self.tower.children, passage.source.nodes
        target = passage.target
        ids, nodes, parents = target.ids, target.nodes, passage.parents
        get, number = ids.get, nodes.append
        if parents is not None and len(parents) < len(nodes):  # numbered by another passage
            parents.extend(repeat((), len(nodes) - len(parents)))
        if parents is None:
            # the passage keeps its children side only (see _parents_again): the parents side of
            # these edges (a source at a time, asked for by ``edges``) is collected and dropped
            parents, weighted = defaultdict(tuple), {}  # type: ignore[assignment]
            grow = _drop
        else:
            grow = parents.append
        for ident in idents:
            if ident in kids:
                continue
            found: list[int] = []
            keep = found.append
            counts: list[int] | None = None  # the edge counts, once one is not 1
            one = (ident,)
            # distinct children, new ones numbered as met; each simple edge goes into the parents
            # side at once, the others once the source's counts are known
            for child, e in children(index, sources[ident]):
                c = get(child)
                if c is None:
                    c = ids[child] = len(nodes)
                    number(child)
                    grow(one if e == 1 else ())
                elif e == 1:
                    parents[c] += one
                keep(c)
                if counts is not None:
                    counts.append(e)
                elif e != 1:
                    counts = [1] * (len(found) - 1)
                    counts.append(e)
            if counts is not None:
                counts_of[ident] = tuple(counts)
                self._add_counted(parents, weighted, ident, found, counts, skip_simple=True)
            kids[ident] = tuple(found)

    @staticmethod
    def _add_counted(parents: list[tuple[int, ...]], weighted: dict[int, list[tuple[int, int]]], ident: int,
                     found: tuple[int, ...] | list[int], counts: tuple[int, ...] | list[int],
                     skip_simple: bool = False) -> None:
        """Register source ``ident``'s edges with counts: repeated in the parents up to
        REPEAT_UP_TO, kept with their count in ``weighted`` above it (the simple ones left out
        with ``skip_simple``: ``_learn`` registered them already)."""
        for c, e in zip(found, counts):
            if e == 1 and skip_simple:
                continue
            if e <= REPEAT_UP_TO:
                parents[c] += (ident,) * e
            else:
                weighted.setdefault(c, []).append((ident, e))

    @staticmethod
    def _parents_again(passage: Passage) -> None:
        """The parents side of a passage from its children side.  A passage's first pull drops
        its parents (on towers whose every level is a space of its own, as GL_N's, it is never
        pulled again, and the parents are a quarter of the memory); a second pull rebuilds them
        here, once, and keeps them from then on."""
        parents: list[tuple[int, ...]] = [()] * len(passage.target.nodes)
        weighted: dict[int, list[tuple[int, int]]] = {}
        every = passage.counts
        for ident, found in passage.kids.items():
            counts = every.get(ident)
            if counts is None:
                for c in found:
                    parents[c] += (ident,)
            else:
                PathCounts._add_counted(parents, weighted, ident, found, counts)
        passage.parents, passage.weighted = parents, weighted

    def edges(self, index: int, node: Node) -> list[tuple[Node, int]]:
        """The children of ``node`` at ``index`` with edge counts (learned once per passage)."""
        passage = self.passage(index)
        ident = passage.source.ids.get(node)
        kids = None if ident is None else passage.kids.get(ident)
        if kids is None:  # not learned yet: numbering and learning under the lock
            with self.lock:
                ident = passage.source.number(node)
                self._learn(index, passage, (ident,))
                kids = passage.kids[ident]
        # learned nodes are only read (their lists never change): no lock, so that a build running
        # in another thread does not hold up the screen
        counts = passage.counts.get(ident)
        nodes = passage.target.nodes
        return [(nodes[k], 1 if counts is None else counts[n]) for n, k in enumerate(kids)]

    # ----- the sweep ------------------------------------------------------------------------
    def build_next(self, progress: Callable[[float], None] | None = None, cancel=None) -> None:
        """Build the level after the deepest one."""
        index = len(self.levels) - 1
        source_space, previous = self.levels[index]
        passage = self.passage(index)
        learn = self._learn
        # learn the nodes of the level not learned yet (nodes of the space that are not on the
        # level, value 0, are left alone: their children may lie far from the level), a chunk at
        # a time under the lock, so that another thread asking for edges waits a chunk at most
        kids = passage.kids
        with self.lock:
            if passage.parents is None:
                self._parents_again(passage)
        start = passage.upto
        new = [j for j in compress(range(start, len(previous)), previous[start:]) if j not in kids]
        for first in range(0, len(new), LEARN_CHUNK):
            with self.lock:
                learn(index, passage, new[first:first + LEARN_CHUNK])
            time.sleep(0)  # let a thread waiting for the lock take it (locks are not fair)
            if cancel is not None and cancel.is_set():
                raise Cancelled()
            if progress is not None:
                progress(0.5 * min(first + LEARN_CHUNK, len(new)) / len(new))
        with self.lock:
            while passage.upto in kids:
                passage.upto += 1
            size = len(passage.target.nodes)
        values = self.pull(passage, previous, size, progress, cancel)
        self.levels.append((passage.target, values))
        passage.pulls += 1
        if passage.pulls == 1:
            with self.lock:
                passage.parents, passage.weighted = None, {}

    def pull(self, passage: Passage, previous: list[int], size: int,
             progress: Callable[[float], None] | None = None, cancel=None) -> list[int]:
        """The first ``size`` values of the target space from ``previous`` (by source number) over
        the passage's learned parents: ``sum(map(previous.__getitem__, parents))`` per node, a
        chunk at a time under the lock; counts above REPEAT_UP_TO are multiplied in after."""
        with self.lock:
            if passage.parents is None:
                self._parents_again(passage)
            parents = passage.parents
            if len(parents) < size:
                parents.extend([()] * (size - len(parents)))
        if len(previous) < len(passage.source.nodes):  # sources numbered after the level was built
            previous = previous + [0] * (len(passage.source.nodes) - len(previous))
        get = previous.__getitem__
        values: list[int] = []
        for start in range(0, size, CHUNK):
            with self.lock:
                part = parents[start:start + CHUNK] if size > CHUNK else parents[:size]
                values.extend([sum(map(get, p)) for p in part])
            if cancel is not None and cancel.is_set():
                raise Cancelled()
            if progress is not None and size > CHUNK:
                progress(0.5 + 0.5 * min(start + CHUNK, size) / size)
        for child, pairs in passage.weighted.items():
            if child < size:
                values[child] += sum(get(p) * e for p, e in pairs)
        if cancel is not None and cancel.is_set():
            raise Cancelled()
        return values

    # ----- reading --------------------------------------------------------------------------
    def multiplicity(self, index: int, node: Node) -> int:
        space, values = self.levels[index]
        ident = space.ids.get(node)
        return 0 if ident is None or ident >= len(values) else values[ident]

    def level(self, index: int) -> dict[Node, int]:
        """node → multiplicity for the nodes with a path (C-level: ``compress`` drops the zeros)."""
        space, values = self.levels[index]
        return dict(compress(zip(space.nodes, values), values))

    def dimensions(self, index: int) -> list[int]:
        """The dimensions of the level's space, by number, computed once per node of a space."""
        space, values = self.levels[index]
        dims = space.dims
        start = len(dims)
        if start < len(values):
            # computed outside the lock (seconds on a deep level; edges asked meanwhile must not
            # wait), added under it unless another thread added them first
            nodes = space.nodes[start:len(values)]
            by_level = self._by_level
            if by_level is not None:
                found = by_level.of_level(index, nodes, values[start:])
            else:
                dimension = self.tower.dimension
                found = [dimension(index, node) for node in nodes]
            with self.lock:
                if len(dims) == start:
                    dims.extend(found)
        return dims

    @property
    def _by_level(self):  # noqa: ANN202 - a LevelDimensions capability or None
        found = self.__dict__.get("_level_dimensions", False)
        if found is False:
            from engine.capabilities import LevelDimensions

            found = self.__dict__["_level_dimensions"] = self.tower.capability(LevelDimensions)
        return found

    def dimension_lookup(self, index: int) -> Callable[[Node], int]:
        """node → dimension for the nodes of a built level (from ``dimensions``)."""
        space, _ = self.levels[index]
        dims, ids = self.dimensions(index), space.ids
        return lambda node: dims[ids[node]]

    def dimensions_of(self, index: int, nodes: list[Node]) -> Iterator[int]:
        """The dimensions of some nodes of a built level, in their order (C-level lookups)."""
        space, _ = self.levels[index]
        return map(self.dimensions(index).__getitem__, map(space.ids.__getitem__, nodes))

    def sums(self, index: int, cancel=None) -> tuple[int, int, int]:
        """Σm, Σm², Σm·dim of a built level, at C speed over its lists."""
        _, values = self.levels[index]
        dims = self.dimensions(index)
        if cancel is not None and cancel.is_set():
            raise Cancelled()
        return sum(values), sum(map(mul, values, values)), sum(map(mul, values, dims))


__all__ = ["CHUNK", "PathCounts", "REPEAT_UP_TO"]
