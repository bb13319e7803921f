"""Closed forms in k for the S_N tower, against path counting and sympy's Stirling numbers."""

from sympy.functions.combinatorial.numbers import stirling

from engine.closed_forms import symmetric_closed_form
from engine.diagram import Diagram
from engine.partitions import partitions_of
from engine.specs import parse_spec


def test_both_forms_agree_with_path_counting():
    for n in range(1, 7):
        tower = parse_spec(f"symmetric:n={n}")
        d = Diagram(tower)
        for parity in (0, 1):
            top = n - parity
            for node in partitions_of(top):
                form = symmetric_closed_form(n, node, parity == 1)
                for k in range(9):
                    m = d.level(2 * k + parity).get(node, 0)
                    assert form.value(k) == m == form.value_from_powers(k), (n, node, k, parity)


def test_trivial_node_of_s3_by_hand():
    # m_(3)(k) = S(k,0) + S(k,1) + S(k,2) + S(k,3) (the orbit decomposition); for k ≥ 1 this is
    # 1 + (2^(k−1) − 1) + (3^k − 3·2^k + 3)/6 = 3^k/6 + 1/2 (sympy's Stirling numbers check it)
    tower = parse_spec("symmetric:n=3")
    form = symmetric_closed_form(3, (3,), False)
    assert form.stirling == {0: 1, 1: 1, 2: 1, 3: 1}
    for k in range(1, 12):
        assert form.value_from_powers(k) == sum(stirling(k, t) for t in range(1, 4))
    assert form.powers_text().startswith("(1/6)·3^k")
    assert all(form.value_from_powers(k) * 6 == 3**k + 3 for k in range(1, 12))
