"""Partitions against outside sources: brute-force tableau counts, OEIS, sympy."""

from itertools import permutations
from math import factorial

import pytest
from sympy.utilities.iterables import partitions as sympy_partitions

from engine.partitions import (
    PartitionError,
    addable_corners,
    conjugate,
    contents,
    format_partition,
    hook_length_product,
    hook_lengths,
    parse_partition,
    partition_count,
    partitions_of,
    removable_corners,
    skew_tableaux_count,
    standard_tableaux_count,
)


def brute_force_standard_tableaux(outer, inner=()):
    """Count fillings of the skew shape outer/inner with 1..n increasing along rows and columns,
    by trying every order in which the boxes can be filled (independent of the hook formula)."""
    cells = [(i, j) for i, part in enumerate(outer) for j in range(inner[i] if i < len(inner) else 0, part)]
    count = 0
    for order in permutations(range(len(cells))):
        value = {cells[pos]: n for n, pos in enumerate(order)}
        if all(
            ((i, j + 1) not in value or value[(i, j)] < value[(i, j + 1)])
            and ((i + 1, j) not in value or value[(i, j)] < value[(i + 1, j)])
            for (i, j) in cells
        ):
            count += 1
    return count


def test_parse_and_format_per_contract():
    # cli-contract: (3,1,1), 3,1,1 and 3 1 1 are accepted; () is the empty partition
    assert parse_partition("(3,1,1)") == parse_partition("3,1,1") == parse_partition("3 1 1") == (3, 1, 1)
    assert parse_partition("()") == () and parse_partition("") == ()
    assert format_partition((3, 1, 1)) == "(3,1,1)" and format_partition(()) == "()"
    for bad in ["(1,3)", "(a)", "(3,-1)", "((2)", "3.5"]:
        with pytest.raises(PartitionError):
            parse_partition(bad)


def test_partitions_of_matches_sympy_and_oeis():
    # OEIS A000041: 1, 1, 2, 3, 5, 7, 11, 15, 22, 30, 42
    assert [partition_count(n) for n in range(11)] == [1, 1, 2, 3, 5, 7, 11, 15, 22, 30, 42]
    for n in range(1, 12):
        ours = sorted(partitions_of(n))
        theirs = sorted(tuple(sorted([k for k, m in p.items() for _ in range(m)], reverse=True)) for p in sympy_partitions(n))
        assert ours == theirs


def test_bounded_counts_against_enumeration():
    for n in range(12):
        for k in range(13):
            for length in range(13):
                expected = sum(1 for p in partitions_of(n) if (not p or p[0] <= k) and len(p) <= length)
                assert partition_count(n, k, length) == expected


def count_by_largest_entry(p):
    """Standard tableaux counted by where the largest entry n sits (a removable corner), recursively:
    a direct count of the fillings, independent of any product formula."""
    if sum(p) == 0:
        return 1
    total = 0
    for i in range(len(p)):
        if i == len(p) - 1 or p[i] > p[i + 1]:
            smaller = tuple(x for x in p[:i] + (p[i] - 1,) + p[i + 1:] if x)
            total += count_by_largest_entry(smaller)
    return total


def test_hook_length_formula_against_brute_force():
    # Frame-Robinson-Thrall hook length formula checked by direct enumeration of the fillings,
    # every partition of n <= 8 (by trying every filling order for n <= 7; by the largest entry for 8)
    for n in range(0, 9):
        for p in partitions_of(n):
            if n <= 7:
                assert standard_tableaux_count(p) == brute_force_standard_tableaux(p), p
            assert standard_tableaux_count(p) == count_by_largest_entry(p), p
            assert standard_tableaux_count(p) * hook_length_product(p) == factorial(n)


def test_sum_of_squares_is_n_factorial():
    # sum_lambda (f^lambda)^2 = n! (Sagan, The Symmetric Group, 2.6.5)
    from math import factorial

    for n in range(12):
        assert sum(standard_tableaux_count(p) ** 2 for p in partitions_of(n)) == factorial(n)


def test_skew_counts_against_brute_force():
    # Aitken's determinant against enumeration of skew fillings
    for n in range(1, 7):
        for outer in partitions_of(n):
            for m in range(n):
                for inner in partitions_of(m):
                    if len(inner) <= len(outer) and all(a >= b for a, b in zip(outer, inner)):
                        assert skew_tableaux_count(outer, inner) == brute_force_standard_tableaux(outer, inner)
    assert skew_tableaux_count((2, 1), (3,)) == 0


def test_conjugate_corners_contents_hooks():
    # Macdonald, Symmetric Functions, I.1 examples (from memory)
    assert conjugate((4, 2, 1)) == (3, 2, 1, 1)
    assert conjugate(conjugate((5, 3, 3, 1))) == (5, 3, 3, 1)
    assert removable_corners((3, 1, 1)) == [0, 2]
    assert addable_corners((3, 1, 1)) == [0, 1, 3]
    assert sorted(contents((2, 2))) == [-1, 0, 0, 1]
    assert sorted(hook_lengths((3, 1))) == [1, 1, 2, 4]
