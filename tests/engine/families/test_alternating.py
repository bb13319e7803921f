"""alternating:n=N against orbit counts of A_N computed with sympy's permutation groups."""

import pytest

from engine.diagram import Diagram
from engine.errors import SpecError
from engine.specs import parse_spec


def _burnside(elements, points: int, tuples: int) -> int:
    """Orbits on [points]^tuples: (1/|G|) Σ_g fix(g)^tuples (Burnside's lemma)."""
    total = sum(sum(1 for x in range(points) if g(x) == x) ** tuples for g in elements)
    assert total % len(elements) == 0
    return total // len(elements)


@pytest.mark.parametrize("n", [3, 4, 5, 6, 7])
def test_sums_against_orbits(n):
    from sympy.combinatorics.named_groups import AlternatingGroup

    group = list(AlternatingGroup(n).elements)
    stabiliser = [g for g in group if g(n - 1) == n - 1]  # A_{N-1}
    assert len(stabiliser) * n == len(group)
    d = Diagram(parse_spec(f"alternating:n={n}"))
    for k in range(4 if n <= 5 else 3):
        # dim End_{A_N}(V^{⊗k}) = number of A_N-orbits on [N]^{2k} (sympy, Burnside)
        assert d.sums(2 * k).squares == _burnside(group, n, 2 * k)
        assert d.sums(2 * k + 1).squares == _burnside(stabiliser, n, 2 * k)
        assert d.sums(2 * k).weighted == n**k and d.sums(2 * k + 1).weighted == n**k


@pytest.mark.parametrize("n", [3, 4, 5, 6, 8])
def test_closed_form_matches_path_counting(n):
    # restriction from S_N: m(V_λ) = m_λ + m_λ', m(V_λ±) = m_λ (Fulton and Harris, §5.1)
    tower = parse_spec(f"alternating:n={n}")
    d = Diagram(tower)
    for index in range(10):
        for node, m in d.level(index).items():
            assert tower.multiplicity(index, node) == m


def test_labels_and_dimensions_of_a5():
    # A_5: degrees 1, 4, 5, 3, 3 (Fulton and Harris, §5.1, from memory)
    tower = parse_spec("alternating:n=5")
    d = Diagram(tower)
    top = {tower.format(x): tower.dimension(4, x) for x in d.level(8)}
    assert top == {"(5)": 1, "(4,1)": 4, "(3,2)": 5, "(3,1,1)+": 3, "(3,1,1)-": 3}
    assert tower.parse("(2,1,1,1)", 2) == tower.parse("4,1", 2)  # the conjugate spelling is accepted
    with pytest.raises(SpecError):
        parse_spec("alternating:n=2")
