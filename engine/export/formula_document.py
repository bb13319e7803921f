"""The ``formula`` command's document: a node's closed form in k (shared guide cli-contract.md).

``values[i]`` is the multiplicity on the i-th level where the node can occur (level i, or i+1/2
for a node of a half level), and with the shifts given as fields

    values[i] = Σ (numerator/denominator)·base^(i + exponent_shift)   over ``powers``
              = Σ coefficient·S(i + exponent_shift, t + t_shift)       over ``stirling``

(S the Stirling numbers of the second kind, 0^0 = 1), so a script evaluates either sum directly.
"""

from __future__ import annotations

import math
from typing import Any

from engine.capabilities import ClosedForm, missing
from engine.closed_forms import SymmetricClosedForm
from engine.errors import TooLarge, UserError
from engine.tower import Node, Tower


def node_of_some_kind(tower: Tower, text: str) -> tuple[int, Node]:
    """The first level index (0, or 1 for a node of the half levels) whose nodes include ``text``."""
    errors = []
    for index in range(tower.steps_per_unit):
        try:
            return index, tower.parse(text, index)
        except UserError as exc:
            errors.append(str(exc))
    raise UserError(" or ".join(errors) if len(errors) < 2 else errors[0] + "; nor a node of the half levels")


def closed_form_of(tower: Tower, text: str) -> SymmetricClosedForm:
    """The family's closed form in k of the node ``text``; a one-line UserError where it has none."""
    closed = tower.capability(ClosedForm)
    if closed is None:
        raise missing(tower, ClosedForm, "formula")
    if closed.expression is None:
        raise UserError(f"formula: {tower.spec} has no formula in k to print "
                        "(each node lives on one level only)")
    index, node = node_of_some_kind(tower, text)
    form = closed.expression(index, node)
    assert isinstance(form, SymmetricClosedForm)
    return form


#: decimal digits the checked values of a formula may hold together (about 10 MB of text)
MAX_VALUE_DIGITS = 5_000_000


def check_values_size(form: SymmetricClosedForm, count: int) -> None:
    """TooLarge, with the estimate, when the values at k = 0..count would hold more than
    MAX_VALUE_DIGITS digits: the value at k has at most about k·log10(largest base) + 1 digits
    (the exponential sum Σ b_j·j^k), so together about count²/2 · log10(base)."""
    base = max((j for j in form.powers if j > 1), default=2)
    digits = (count + 1) + int(count * (count + 1) / 2 * math.log10(base))
    if digits > MAX_VALUE_DIGITS:
        raise TooLarge(
            f"the values at k = 0..{count:,} would hold about {digits:,} digits (the limit is "
            f"{MAX_VALUE_DIGITS:,}); ask for a smaller --check"
        )


def formula_document(tower: Tower, form: SymmetricClosedForm, count: int) -> dict[str, Any]:
    check_values_size(form, count)
    shift = 1 if form.half else 0
    return {
        "tower": tower.spec,
        "label": tower.format(form.node),
        "levels": "half" if form.half else "integer",
        "exponent_shift": shift,
        "t_shift": shift,
        "stirling": [{"t": t, "coefficient": c} for t, c in sorted(form.stirling.items())],
        "powers": [
            {"base": j, "numerator": b.numerator, "denominator": b.denominator}
            for j, b in sorted(form.powers.items(), reverse=True)
        ],
        "values": [form.value(k) for k in range(count + 1)],
    }
