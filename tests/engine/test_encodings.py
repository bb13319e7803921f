"""Encodings of paths: each a bijection with the paths, checked on every node to level 6, and
tableau counts against the hook length formula, OEIS A000085 and A001147."""

from __future__ import annotations

from math import comb, factorial

import pytest

from engine.diagram import Diagram
from engine.encodings import encodings_for, get_encoding
from engine.errors import UserError
from engine.paths import PathError, PathIndex
from engine.specs import parse_spec
from tests.engine.path_towers import BrauerLatticeTower, WalledTower, YoungLatticeTower, cyclic_tower

DEPTH = 6


def cases():
    towers = [
        parse_spec("symmetric:n=4"),
        parse_spec("symmetric:n=5"),
        parse_spec("symmetric:n=4,halves=no"),
        YoungLatticeTower(3),
        YoungLatticeTower(6),
        BrauerLatticeTower("orthogonal"),
        BrauerLatticeTower("symplectic"),
        WalledTower("vvdvdd"),
        cyclic_tower(2, 1, 1),
    ]
    return [(t, e) for t in towers for e in encodings_for(t)]


@pytest.mark.parametrize("tower, encoding", cases(), ids=lambda x: getattr(x, "spec", None) or x.name)
def test_each_encoding_is_a_bijection_on_the_paths(tower, encoding):
    diagram = Diagram(tower)
    index = PathIndex(diagram)
    depth = DEPTH if tower.max_index is None else min(DEPTH, tower.max_index)
    for i in range(depth + 1):
        for node in diagram.nodes(i):
            texts = set()
            for path in index.iterate(i, node):
                text = encoding.path_text(tower, path)
                back = encoding.path_from_text(tower, text)
                assert back == path, (text, back, path)
                index.check(back, i, node)
                assert encoding.draw(tower, encoding.encode(tower, path))
                texts.add(text)
            assert len(texts) == index.total(i, node)  # distinct paths, distinct texts


def test_family_registry():
    assert [e.name for e in encodings_for(parse_spec("symmetric:n=3"))] == ["vacillating", "updown"]
    assert [e.name for e in encodings_for(parse_spec("symmetric:n=3,halves=no"))] == ["vacillating"]
    assert [e.name for e in encodings_for(YoungLatticeTower(2))] == ["tableau", "updown", "labels"]
    assert [e.name for e in encodings_for(WalledTower("vd"))] == ["pairs"]
    assert [e.name for e in encodings_for(cyclic_tower(3, 1, 1))] == ["walk"]
    assert get_encoding(cyclic_tower(3, 1, 1), "labels").name == "labels"
    with pytest.raises(UserError, match="accepted: walk, labels"):
        get_encoding(cyclic_tower(3, 1, 1), "tableau")


def hook_length_count(shape):
    """f^λ = n!/Π hooks (Frame, Robinson, Thrall 1954), written out here independently."""
    conj = [sum(1 for p in shape if p > j) for j in range(shape[0])] if shape else []
    product = 1
    for i, part in enumerate(shape):
        for j in range(part):
            product *= part - j + conj[j] - i - 1
    return factorial(sum(shape)) // product


# OEIS A000085: involutions of n, = Σ_{λ ⊢ n} f^λ (the number of standard Young tableaux of size n)
A000085 = [1, 1, 2, 4, 10, 26, 76, 232, 764]


def test_standard_tableaux_counts():
    tower = YoungLatticeTower(9)
    diagram = Diagram(tower)
    index = PathIndex(diagram)
    tableau = get_encoding(tower, "tableau")
    for k in range(9):
        seen = 0
        for shape in diagram.nodes(k):
            tableaux = {tableau.path_text(tower, p) for p in index.iterate(k, shape)}
            assert len(tableaux) == hook_length_count(shape)
            seen += len(tableaux)
        assert seen == A000085[k]


# OEIS A001147: (2k−1)!! = 1, 1, 3, 15, 105, 945, 10395
A001147 = [1, 1, 3, 15, 105, 945, 10395]


def test_up_down_tableaux_in_the_stable_range():
    tower = BrauerLatticeTower()
    diagram = Diagram(tower)
    index = PathIndex(diagram)
    updown = get_encoding(tower, "updown")
    for k in range(2 * len(A001147) - 1):
        if k % 2 == 0:
            words = {updown.path_text(tower, p) for p in index.iterate(k, ())}
            assert len(words) == A001147[k // 2]
        for shape in diagram.nodes(k):
            # dimension of the Brauer algebra's irreducible module in the stable range:
            # C(k,|λ|)·(k−|λ|−1)!!·f^λ (from memory; Goodman and Wallach, Symmetry, Representations,
            # and Invariants, ch. 10)
            free = k - sum(shape)
            assert free % 2 == 0
            expected = comb(k, sum(shape)) * A001147[free // 2] * hook_length_count(shape)
            assert index.total(k, shape) == expected


def test_tableau_drawing_and_text():
    tower = YoungLatticeTower(3)
    index = PathIndex(Diagram(tower))
    tableau = get_encoding(tower, "tableau")
    path = tableau.path_from_text(tower, "1,2,4/3")
    assert path.nodes == ((), (1,), (2,), (2, 1), (3, 1))
    index.check(path, 4, (3, 1))
    assert tableau.draw(tower, tableau.encode(tower, path)) == [
        "┌───┬───┬───┐",
        "│ 1 │ 2 │ 4 │",
        "├───┼───┴───┘",
        "│ 3 │",
        "└───┘",
    ]
    for bad in ("1,3/2,4/5,6,7", "2,1", "1,2/2", "a,b"):
        with pytest.raises(PathError):
            tableau.path_from_text(tower, bad)


def test_labels_with_edge_numbers():
    tower = parse_spec("symmetric:n=4,halves=no")
    labels = get_encoding(tower, None)
    index = PathIndex(Diagram(tower))
    path = labels.path_from_text(tower, "(4) (3,1) (3,1)#2")
    assert path.edges == (1, 2)
    assert index.rank(path) == 2  # after (4)(4)(3,1) and the first edge (3,1)→(3,1)
    assert labels.path_text(tower, path) == "(4) (3,1) (3,1)#2"
    assert labels.path_from_text(tower, "(4) -> (3, 1) → (3 1)#2") == path
    with pytest.raises(PathError, match="label 2"):
        labels.path_from_text(tower, "(4) (5)")


def test_up_down_reading():
    tower = parse_spec("symmetric:n=3")
    updown = get_encoding(tower, "updown")
    path = updown.path_from_text(tower, "-1 +2")
    assert path.nodes == ((3,), (2,), (2, 1))
    with pytest.raises(PathError, match="row 3"):
        updown.path_from_text(tower, "-1 +3")
    with pytest.raises(PathError, match="up–down"):
        updown.path_from_text(tower, "1 2")
