"""JSON documents of the finite-tower commands (shared guide cli-contract.md, "Finite towers"):
``series``, ``walk``, ``critical-group``, and our ``chips`` and ``growth``.  Exact rationals are
strings "p/q" (or "p"); the contract's keys come first, the extras after them."""

from __future__ import annotations

from fractions import Fraction
from typing import Any

from engine.errors import UserError
from engine.series.finite import FiniteView, finite_view, locate


def rational(x: Fraction | int) -> str:
    x = Fraction(x)
    return str(x.numerator) if x.denominator == 1 else f"{x.numerator}/{x.denominator}"


def exact_text(x: object) -> str:
    from engine.class_functions import exact

    value = exact(x)  # type: ignore[arg-type]
    return rational(value) if value is not None else str(x)


def read_fraction(text: str, what: str) -> Fraction:
    try:
        if len(text) > 60:
            raise ValueError
        value = Fraction(text.strip())
    except (ValueError, ZeroDivisionError):
        raise UserError(f"{what}: {text[:60]!r} is not a number such as 1/4 or 0.25") from None
    if not 0 < value < 1:
        raise UserError(f"{what} must lie strictly between 0 and 1, got {text}")
    return value


# ----- series ----------------------------------------------------------------------------------
def series_document(tower, label: str) -> dict[str, Any]:
    from engine.series.rational import node_series

    view = finite_view(tower, "series")
    half, position = locate(tower, view, label)
    found = node_series(view, half, position)
    document: dict[str, Any] = {"label": found.label, "numerator": list(found.numerator),
                                "denominator": list(found.denominator), "levels": "k+1/2" if half else "k"}
    closed = closed_form_text(tower, view, found.label, half)
    if closed:
        document["closed_form"] = closed
        document["closed_form_of"] = "m(k+1/2)" if half else "m(k)"
    return document


def all_series_document(tower) -> dict[str, Any]:
    from engine.series.rational import all_series

    view = finite_view(tower, "series")
    return {"tower": tower.spec, "series": [
        {"label": s.label, "numerator": list(s.numerator), "denominator": list(s.denominator),
         "levels": "k+1/2" if s.half else "k"} for s in all_series(view)]}


def closed_form_text(tower, view: FiniteView, label: str, half: bool) -> str | None:
    """m(k) as a sum over the character values of V (a character table, no half levels), else over
    the rational eigenvalues of the whole step (``engine.series.power_sums``; m(k+1/2) at half
    levels); None where they are not rational."""
    from engine.capabilities import CharacterData

    if half or view.period != 1 or tower.capability(CharacterData) is None:
        from engine.series.power_sums import node_power_sum

        found = node_power_sum(view, half, label)
        return found.text() if found is not None else None
    from engine.series.eigen_sums import eigen_sum

    return eigen_sum(tower, label, view.period).text()


# ----- growth ----------------------------------------------------------------------------------
def growth_document(tower, label: str, upto: int) -> dict[str, Any]:
    from engine.series.growth import growth
    from engine.series.rational import terms

    if not 1 <= upto <= 5000:
        raise UserError(f"--to must be between 1 and 5000, got {upto}")
    view = finite_view(tower, "growth")
    half, position = locate(tower, view, label)
    whole, halves = terms(view, upto + 1)
    values = [row[position] for row in (halves if half else whole)]
    g = growth(view, half, position, values)
    return {"label": g.label, "levels": "k+1/2" if half else "k", "dimension": g.dimension, "base": g.base,
            "order": g.order, "period": g.period, "residue": g.residue,
            "leading": {"coefficient": rational(Fraction(g.period * g.dimension, g.order)), "base": g.base},
            "text": g.leading(), "values": values,
            "ratios": [{"k": k, "ratio": rational(r), "approximately": f"{float(r):.12g}"} for k, r in g.ratios]}


# ----- walk ------------------------------------------------------------------------------------
def walk_document(tower, steps: int, lazy: bool = False, epsilon: Fraction = Fraction(1, 4),
                  spectrum: bool = True) -> dict[str, Any]:
    """The walk's document (``walk --json``); ``spectrum=False`` leaves out the eigenvalues (or
    the characteristic factors), whose text for irrational character values loads sympy."""
    from engine.walks.chain import characteristic_factors, eigenvalues, walk

    view = finite_view(tower, "walk")
    w = walk(view, steps, lazy)
    document: dict[str, Any] = {
        "nodes": list(w.labels), "stationary": [rational(x) for x in w.stationary],
        "distance": [rational(x) for x in w.total_variation],
        "separation": [rational(x) for x in w.separation],
        "lazy": lazy, "period": w.period, "plancherel": w.plancherel, "reached": w.reached,
        "epsilon": rational(epsilon), "mixing_time": w.mixing_time(epsilon),
        "step_constant": view.constant,
    }
    if not spectrum:
        return document
    values = eigenvalues(tower, view)
    if values is not None:
        document["eigenvalues"] = [{"class": name, "value": exact_text(x if not lazy else (x + 1) * Fraction(1, 2))}
                                   for name, x in values]
    else:
        document["characteristic_factors"] = [{"factor": f, "multiplicity": e} for f, e in characteristic_factors(view)]
    return document


# ----- critical group --------------------------------------------------------------------------
def critical_document(tower) -> dict[str, Any]:
    from engine.walks.critical import critical_group

    view = finite_view(tower, "critical-group")
    g = critical_group(view)
    return {"invariant_factors": list(g.invariant_factors), "order": g.order, "free_rank": g.free_rank,
            "determinant": g.determinant, "group": g.text(), "root": view.labels[view.root],
            "step_constant": view.constant}


def chips_document(tower, items: list[str], listing: bool) -> dict[str, Any]:
    from engine.walks.chips import read_config, sandpile
    from engine.walks.critical import critical_group

    view = finite_view(tower, "chips")
    pile = sandpile(view)
    g = critical_group(view)
    if g.order is None:
        raise UserError(f"{tower.spec}: the reduced McKay–Cartan matrix is singular (V not faithful): "
                        "chip-firing does not stabilise every configuration")
    config = read_config(pile, items)
    stable, topplings = pile.stabilise(config)
    recurrent = pile.recurrent(config, g.determinant)
    document: dict[str, Any] = {
        "sink": view.labels[view.root], "nodes": list(pile.labels),
        "thresholds": [pile.cartan[i][i] for i in range(len(pile.labels))],
        "configuration": config, "stable": stable, "topplings": topplings, "recurrent": recurrent,
        "order": g.order,
    }
    if listing:
        every = pile.all_recurrent(g.determinant)
        document["all_recurrent"] = [list(c) for c in every]
        document["count_matches_determinant"] = len(every) == abs(g.determinant)
    return document
