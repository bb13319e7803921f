"""Products in a diagram algebra: d1·d2 = x^(closed middle components) · (d1 glued above d2).

The multiplication rule is the usual one for partition algebras (Martin 1991; Jones, "The Potts
model and the symmetric group", 1994), Brauer algebras (Brauer, "On algebras which are connected
with the semisimple continuous groups", Ann. of Math. 1937), Temperley–Lieb algebras (Temperley–
Lieb 1971, in Kauffman's diagrams) and walled Brauer algebras (Koike 1989; Turaev 1989): each
subalgebra's basis is closed under gluing, so a product of basis diagrams is a basis diagram of the
same algebra times a power of the parameter.  The parameter is an int (the spec's N, −N for
symplectic) or the symbol x (``symbolic=True``: coefficients become ``Poly``).
"""

from __future__ import annotations

from engine.algebras.diagrams import Blocks, compose
from engine.algebras.elements import Coefficient, Element, Poly, add_term
from engine.capabilities import AlgebraLevel

X = Poly.x_power(1)


def parameter_of(level: AlgebraLevel, symbolic: bool = False) -> Coefficient:
    """The loop value: the symbol x when ``symbolic``, else the level's parameter (1 for CS_k,
    whose products close no loops)."""
    if symbolic:
        return X
    return 1 if level.parameter is None else level.parameter


def multiply_diagrams(d1: Blocks, d2: Blocks, level: AlgebraLevel, symbolic: bool = False) -> tuple[Blocks, Coefficient]:
    """(d1·d2 as a diagram, the parameter to the number of closed loops)."""
    product, loops = compose(d1, d2, level.vertices)
    if symbolic:
        return product, Poly.x_power(loops)
    return product, parameter_of(level) ** loops


def multiply(e1: Element, e2: Element, level: AlgebraLevel, symbolic: bool = False) -> Element:
    """The product of two elements (bilinear extension of the diagram product), zero terms dropped.

    Each pair of diagrams is glued once; the powers of the parameter are looked up in a small
    table, so a product of t1·t2 terms costs t1·t2 gluings and dict updates."""
    r = level.vertices
    x = parameter_of(level, symbolic)
    powers: list[Coefficient] = [Poly((1,)) if symbolic else 1]
    out: Element = {}
    for d1, c1 in e1.items():
        for d2, c2 in e2.items():
            product, loops = compose(d1, d2, r)
            while len(powers) <= loops:
                powers.append(powers[-1] * x)
            c = c1 * c2 * powers[loops] if loops or symbolic else c1 * c2
            if product in out:
                total = out[product] + c
                if total:
                    out[product] = total
                else:
                    del out[product]
            elif c:
                out[product] = c
    return out


def power(e: Element, exponent: int, level: AlgebraLevel, symbolic: bool = False) -> Element:
    """e^exponent (exponent ≥ 1) by repeated multiplication."""
    result = e
    for _ in range(exponent - 1):
        result = multiply(result, e, level, symbolic)
    return result


def scale(e: Element, c: Coefficient) -> Element:
    out: Element = {}
    for d, v in e.items():
        add_term(out, d, v * c)
    return out


def add(e1: Element, e2: Element) -> Element:
    out = dict(e1)
    for d, v in e2.items():
        add_term(out, d, v)
    return out


def specialize(e: Element, value: int) -> dict[Blocks, int]:
    """An element with polynomial coefficients evaluated at x = ``value``."""
    out: dict[Blocks, int] = {}
    for d, c in e.items():
        add_term(out, d, c(value) if isinstance(c, Poly) else c)
    return out
