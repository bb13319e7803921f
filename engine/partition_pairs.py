"""Pairs of partitions (α, β), the labels of rational GL_N-modules: written ``((2,1),(1))``.

On input the outer parentheses may be left out and spaces may stand anywhere:
``((2,1),(1))``, ``( (2, 1) , (1) )``, ``(2,1),(1)`` and ``((2 1) (1))`` are the same pair.
"""

from __future__ import annotations

import re

from engine.numbers_in import quote
from engine.partitions import MAX_PARTITION_TEXT, Partition, PartitionError, format_partition, parse_partition

PartitionPair = tuple[Partition, Partition]

_GROUP = r"(\([^()]*\))"
_WITH_OUTER = re.compile(r"^\s*\(\s*" + _GROUP + r"\s*,?\s*" + _GROUP + r"\s*\)\s*$")
_WITHOUT_OUTER = re.compile(r"^\s*" + _GROUP + r"\s*,?\s*" + _GROUP + r"\s*$")


def format_pair(pair: PartitionPair) -> str:
    """``((2,1),(1))``; the empty pair is ``((),())``."""
    return "(" + format_partition(pair[0]) + "," + format_partition(pair[1]) + ")"


def parse_pair(text: str) -> PartitionPair:
    """Read a pair of partitions; PartitionError with the accepted forms otherwise."""
    if len(text) > MAX_PARTITION_TEXT:
        raise PartitionError(f"{quote(text)} is too long for a pair of partitions (at most {MAX_PARTITION_TEXT:,} characters)")
    found = _WITH_OUTER.match(text) or _WITHOUT_OUTER.match(text)
    if found is None:
        raise PartitionError(f"{quote(text)} is not a pair of partitions (write e.g. ((2,1),(1)) or ((),(1)))")
    return parse_partition(found.group(1)), parse_partition(found.group(2))
