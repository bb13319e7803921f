"""The documents of the cell-module commands: ``gram`` (the CLI contract's fields, then ours) and
the semisimplicity report of a level.

Exact numbers only: integers as JSON integers, rationals as strings ``"p/q"`` (as ``walk`` writes
them); polynomials as integer coefficient lists, constant term first, no trailing zeros.
"""

from __future__ import annotations

from fractions import Fraction
from typing import Any

from engine.algebras.cells.report import CellAnswer, LevelReport
from engine.levels import level_to_json


def exact(q: Fraction | int) -> int | str:
    """An int as itself, any other rational as ``"p/q"``."""
    q = Fraction(q)
    return q.numerator if q.denominator == 1 else f"{q.numerator}/{q.denominator}"


def _roots(answer: CellAnswer) -> list[dict[str, Any]]:
    return [{"root": exact(root), "multiplicity": m} for root, m in answer.roots]


def gram_matrix_rows(answer: CellAnswer) -> list[list[list[int | str]]]:
    """The symmetric Gram matrix G = Γ·G′, each entry a coefficient list (constant term first)."""
    gram = answer.gram
    assert gram is not None
    rows = []
    for i in range(gram.size):
        row: list[list[int | str]] = []
        dense: dict[int, tuple[int, Fraction]] = {}
        for j, c, q in gram.rows[i]:
            dense[j] = (c, gram.gamma[i] * q)
        for j in range(gram.size):
            if j in dense:
                c, q = dense[j]
                row.append([0] * c + [exact(q)])
            else:
                row.append([0])
        rows.append(row)
    return rows


def gram_document(spec: str, answer: CellAnswer, format_node) -> dict[str, Any]:
    """``gram --json``: algebra, label, dimension, rank, determinant (the contract), then the tower,
    level, parameter, propagating blocks, the determinant's roots and the matching node."""
    level = answer.level
    document: dict[str, Any] = {
        "algebra": level.name,
        "label": answer.label.text,
        "dimension": answer.dimension,
        "rank": answer.rank,
        "determinant": answer.determinant,
        "tower": spec,
        "level": level_to_json(level.level),
        "parameter": level.parameter,
        "propagating": answer.through,
        "rational_roots": _roots(answer),
        "other_factors": [{"coefficients": f, "multiplicity": m} for f, m in answer.others],
        "node": None if answer.node is None else format_node(answer.node),
    }
    if answer.gram is not None:
        document["matrix"] = gram_matrix_rows(answer)
    return document


def report_document(spec: str, report: LevelReport) -> dict[str, Any]:
    """The semisimplicity report: where the algebra is not semisimple, and the table at x = N."""
    level = report.level
    return {
        "tower": spec,
        "level": level_to_json(level.level),
        "algebra": level.name,
        "parameter": level.parameter,
        "not_semisimple_at": [exact(x) for x in report.rational_parameters],
        "other_factors": report.other_factors,
        "semisimple_at_parameter": report.semisimple_at_parameter,
        "matching": report.note,
        "cells": [
            {"label": row.cell.label.text, "dimension": row.cell.dimension, "rank": row.cell.rank,
             "determinant": row.cell.determinant, "rational_roots": _roots(row.cell),
             "node": row.node_label, "multiplicity": row.multiplicity, "agree": row.agree}
            for row in report.rows
        ],
        "unmatched_nodes": [{"label": label, "multiplicity": m} for label, m in report.unmatched],
        "agree": report.agree,
    }


def polynomial_text(coefficients: list[int | Fraction], variable: str = "x") -> str:
    """``x^6 - 12*x^4 + 16*x^3``: highest power first; ``0`` for the zero polynomial."""
    terms = []
    for power in range(len(coefficients) - 1, -1, -1):
        c = Fraction(coefficients[power])
        if not c:
            continue
        sign = "-" if c < 0 else "+"
        magnitude = abs(c)
        monomial = "" if power == 0 else (variable if power == 1 else f"{variable}^{power}")
        if not monomial:
            body = str(magnitude)
        elif magnitude == 1:
            body = monomial
        else:
            body = f"{magnitude}*{monomial}"
        terms.append((sign, body))
    if not terms:
        return "0"
    first_sign, first = terms[0]
    text = ("-" if first_sign == "-" else "") + first
    for sign, body in terms[1:]:
        text += f" {sign} {body}"
    return text


def roots_text(answer_roots: list[tuple[Fraction, int]]) -> str:
    """``-4, 0 (3 times), 2 (twice)``."""
    parts = []
    for root, m in answer_roots:
        parts.append(str(exact(root)) + ("" if m == 1 else " (twice)" if m == 2 else f" ({m} times)"))
    return ", ".join(parts)
