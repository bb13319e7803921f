"""Set-partition diagrams: notation, canonical form, gluing, and membership in each algebra's basis.

With r vertices per row, top vertex i (written ``i``, 1-based) is the int i−1 and bottom vertex i
(written ``i'``) is the int r+i−1.  A diagram is ``Blocks``: a tuple of blocks, each a tuple of
ascending ints, the blocks sorted by their smallest int.  This is exactly the contract's output
order (top vertices ascending, then bottom vertices ascending; blocks by their first vertex in the
order 1 < ... < k < 1' < ... < k'), so formatting needs no sorting.

The product ``compose(d1, d2, r)`` puts d1 above d2 and glues d1's bottom row to d2's top row
(Martin, *Potts models and related problems in statistical mechanics*, 1991;
Jones, "The Potts model and the symmetric group", 1994): union–find on the blocks of the two diagrams,
joined through the r middle points; components that meet neither outer row are counted (each
multiplies the product by the parameter).
"""

from __future__ import annotations

import re
from typing import TYPE_CHECKING

from engine.errors import UserError

if TYPE_CHECKING:
    from engine.capabilities import AlgebraLevel

Blocks = tuple[tuple[int, ...], ...]

_BLOCK = re.compile(r"\{([^{}]*)\}")
_WHOLE = re.compile(r"\{[^{}]*\}(,\{[^{}]*\})*")
_VERTEX = re.compile(r"([0-9]+)('?)")


def canonical(blocks) -> Blocks:
    """The canonical form of any iterable of blocks (empty blocks dropped)."""
    sorted_blocks = [tuple(sorted(b)) for b in blocks if len(b)]
    sorted_blocks.sort()
    return tuple(sorted_blocks)


def identity(r: int) -> Blocks:
    """The identity diagram {1,1'},{2,2'},... of r vertices per row."""
    return tuple((i, r + i) for i in range(r))


def vertex_name(v: int, r: int) -> str:
    """``i`` for a top vertex, ``i'`` for a bottom vertex."""
    return str(v + 1) if v < r else f"{v - r + 1}'"


def parse_diagram(text: str, r: int) -> Blocks:
    """Read ``{1,2'},{2,3,1'},{3'}`` (blocks and vertices in any order, spaces anywhere) as a
    diagram with r vertices per row; ``{}`` is the empty diagram (r = 0).  UserError (one line) on
    an unknown vertex, a vertex written twice or missing, or text that is not blocks in braces."""
    compact = "".join(text.split())
    if compact in ("{}", "") and r == 0:
        return ()
    if not _WHOLE.fullmatch(compact):
        raise UserError(f"cannot read the diagram {text.strip()[:80]!r}: write blocks in braces separated by "
                        "commas, e.g. {1,2'},{2,1'}")
    seen: set[int] = set()
    blocks = []
    for match in _BLOCK.finditer(compact):
        inner = match.group(1)
        if not inner:
            raise UserError(f"the diagram {compact[:80]} has an empty block {{}}")
        block = []
        for item in inner.split(","):
            vm = _VERTEX.fullmatch(item)
            if vm is None:
                raise UserError(f"cannot read the vertex {item[:20]!r} in {compact[:80]}: vertices are 1..{r} "
                                f"(top) and 1'..{r}' (bottom)")
            number = int(vm.group(1))
            if not 1 <= number <= r:
                raise UserError(f"no vertex {item[:20]} in a diagram with {r} vertices per row "
                                f"(vertices are 1..{r} and 1'..{r}')" if r else
                                f"no vertex {item[:20]} at level 0: the only diagram is {{}}")
            v = number - 1 + (r if vm.group(2) else 0)
            if v in seen:
                raise UserError(f"the vertex {item} appears twice in {compact[:80]}")
            seen.add(v)
            block.append(v)
        blocks.append(block)
    if len(seen) != 2 * r:
        absent = [vertex_name(v, r) for v in range(2 * r) if v not in seen]
        raise UserError(f"the diagram {compact[:80]} misses the vertices {','.join(absent[:10])}"
                        f"{' ...' if len(absent) > 10 else ''} (every one of 1..{r}, 1'..{r}' must be in a block)")
    return canonical(blocks)


def format_diagram(d: Blocks, r: int) -> str:
    """The contract's output form: ``{1,2'},{2,3,1'},{3'}``; ``{}`` for the empty diagram."""
    if not d:
        return "{}"
    names = [str(i + 1) for i in range(r)] + [f"{i + 1}'" for i in range(r)]
    return ",".join("{" + ",".join([names[v] for v in block]) + "}" for block in d)


def compose(d1: Blocks, d2: Blocks, r: int) -> tuple[Blocks, int]:
    """d1·d2 (d1 above d2): the glued diagram and the number of closed middle components.

    Union–find on the blocks of d1 (numbers 0..m1−1) and of d2 (m1..): middle point j joins the
    d1 block of bottom vertex j' with the d2 block of top vertex j.  Reading the top row of d1 and
    then the bottom row of d2 in order yields the blocks already canonical."""
    r2 = 2 * r
    label = [0] * (4 * r)  # d1's vertices at 0..2r−1, d2's at 2r..4r−1, valued by block number
    b = 0
    for block in d1:
        for v in block:
            label[v] = b
        b += 1
    for block in d2:
        for v in block:
            label[r2 + v] = b
        b += 1
    parent = list(range(b))
    for j in range(r):
        a = label[r + j]
        while parent[a] != a:
            a = parent[a]
        c = label[r2 + j]
        while parent[c] != c:
            c = parent[c]
        if a != c:
            parent[a] = c
    groups: dict[int, list[int]] = {}
    for v in range(r):
        a = label[v]
        while parent[a] != a:
            a = parent[a]
        g = groups.get(a)
        if g is None:
            groups[a] = [v]
        else:
            g.append(v)
    for v in range(r, r2):
        a = label[r2 + v]
        while parent[a] != a:
            a = parent[a]
        g = groups.get(a)
        if g is None:
            groups[a] = [v]
        else:
            g.append(v)
    components = 0
    for i in range(b):
        if parent[i] == i:
            components += 1
    return tuple(map(tuple, groups.values())), components - len(groups)


def propagating_count(d: Blocks, r: int) -> int:
    """The number of blocks meeting both rows (the propagating number)."""
    return sum(1 for block in d if block[0] < r <= block[-1])


def is_planar(d: Blocks, r: int) -> bool:
    """Whether the diagram can be drawn in the rectangle without crossings: its blocks form a
    non-crossing set partition of the boundary read 1, 2, ..., r, r', ..., 1' (common practice)."""
    position = list(range(r)) + [2 * r - 1 - j for j in range(r)]
    owner = [0] * (2 * r)
    last = {}
    for b, block in enumerate(d):
        for v in block:
            owner[position[v]] = b
        last[b] = max(position[v] for v in block)
    stack: list[int] = []
    opened: set[int] = set()
    for p in range(2 * r):
        b = owner[p]
        if b not in opened:
            opened.add(b)
            if last[b] != p:
                stack.append(b)
        else:
            if not stack or stack[-1] != b:
                return False
            if last[b] == p:
                stack.pop()
    return True


def is_diagram(d: Blocks, r: int) -> bool:
    """Whether ``d`` is a canonical set partition of the 2r vertices."""
    flat = [v for block in d for v in block]
    return sorted(flat) == list(range(2 * r)) and canonical(d) == d


def in_basis(d: Blocks, level: "AlgebraLevel") -> bool:
    """Whether the diagram is a basis diagram of the level's algebra.

    partition: any set partition (at a half level: the last top and last bottom vertex in one
    block); brauer: blocks of size 2; temperley-lieb: planar Brauer diagrams; symmetric-group: each
    block one top and one bottom vertex; walled-brauer: pairs, a vertical edge (top–bottom) joins
    vertices of one letter, a horizontal one (top–top, bottom–bottom) vertices of different letters
    (Turaev 1989, Koike 1989; the 1994 study of tensor products of GL_n-modules with their duals,
    J. Algebra)."""
    r = level.vertices
    if not is_diagram(d, r):
        return False
    kind = level.kind
    if kind == "partition":
        if level.half and r:
            return any(block[-1] == 2 * r - 1 and r - 1 in block for block in d)
        return True
    if any(len(block) != 2 for block in d):
        return False
    if kind == "brauer":
        return True
    if kind == "temperley-lieb":
        return is_planar(d, r)
    if kind == "symmetric-group":
        return all(a < r <= b for a, b in d)
    if kind == "walled-brauer":
        word = level.word
        for a, b in d:
            same = word[a % r] == word[b % r]
            vertical = a < r <= b
            if same != vertical:
                return False
        return True
    raise UserError(f"unknown kind of diagram algebra {kind!r}")
