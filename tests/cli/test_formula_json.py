"""``formula --json`` evaluated as a script would, from its fields alone (exponent_shift, t_shift),
against its own ``values`` and against ``levels --json``, at integer and half levels."""

from __future__ import annotations

from fractions import Fraction

import pytest
from sympy.functions.combinatorial.numbers import stirling

from engine.partitions import partitions_of

LEVELS = 9


def _power(base: int, exponent: int) -> int:
    return 1 if exponent == 0 else base**exponent  # 0^0 = 1 (the document's convention)


@pytest.mark.parametrize("n", [3, 4, 5])
def test_formula_json_evaluates_to_values_at_every_level(run_json, n):
    levels = run_json("levels", f"symmetric:n={n}", "--to", str(LEVELS))["levels"]
    by_level = {(lv["level"], node["label"]): node["multiplicity"] for lv in levels for node in lv["nodes"]}
    for size, half in ((n, False), (n - 1, True)):
        for shape in partitions_of(size):
            label = "(" + ",".join(map(str, shape)) + ")"
            doc = run_json("formula", f"symmetric:n={n}", "--label", label, "--check", str(LEVELS - 1))
            assert doc["levels"] == ("half" if half else "integer")
            shift, t_shift = doc["exponent_shift"], doc["t_shift"]
            for i, value in enumerate(doc["values"]):
                k = i + shift
                # Stirling numbers of the second kind from sympy
                by_stirling = sum(term["coefficient"] * int(stirling(k, term["t"] + t_shift, kind=2))
                                  for term in doc["stirling"])
                by_powers = sum(Fraction(term["numerator"], term["denominator"]) * _power(term["base"], k)
                                for term in doc["powers"])
                assert by_stirling == by_powers == value
                level = i + 0.5 if half else i
                assert value == by_level.get((level, label), 0)  # the path count of the diagram
