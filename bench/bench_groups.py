"""Speed of the group towers (run by hand: uv run python bench/bench_groups.py).

Targets: building S_N on a module from its character table (Murnaghan–Nakayama table, then the
McKay matrix) under 2 s for N = 14; su2:kind=icosahedral to level 200 under 0.5 s; reading and
validating the A_4 character file under 0.5 s (sympy's import included).
"""

from __future__ import annotations

import time
from pathlib import Path

from engine.diagram import Diagram
from engine.specs import parse_spec

ROOT = Path(__file__).resolve().parents[1]


def timed(label: str, target: float, work) -> None:
    start = time.perf_counter()
    work()
    spent = time.perf_counter() - start
    print(f"{label:55s} {spent:7.3f} s  (target {target} s) {'ok' if spent <= target else 'SLOW'}")


timed("characters file a4-points.toml, levels 0..20", 0.5,
      lambda: Diagram(parse_spec(f"characters:file={ROOT / 'sessions/examples/a4-points.toml'}")).level(20))
timed("symmetric:n=10,module=(9,1), levels 0..10", 1.0, lambda: Diagram(parse_spec("symmetric:n=10,module=(9,1)")).level(10))
timed("symmetric:n=14,module=(12,2) (build)", 2.0, lambda: parse_spec("symmetric:n=14,module=(12,2)"))
timed("su2:kind=icosahedral, levels 0..200", 0.5, lambda: Diagram(parse_spec("su2:kind=icosahedral")).level(200))
timed("alternating:n=12, levels 0..24", 2.0, lambda: Diagram(parse_spec("alternating:n=12")).level(24))
