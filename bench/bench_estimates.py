"""The size guard's estimates against real builds (issue: true estimates, within a factor 10).

    uv run python bench/bench_estimates.py

Part 1, counts: for every family over small and large N (the cases of
tests/engine/test_estimates_wide.py and every family's examples), the worst ratio estimate/real of
the edges walked, the nodes kept and the digits of the largest multiplicity over every level
compared.  Part 2, the cost model of ``engine/costs.py``: for a few builds of a second or more,
each in a process of its own, the estimated seconds and bytes against the measured wall time
(median of 3) and the growth of the peak resident memory.  Figures move with the shared
machine's load; the counts do not.
"""

from __future__ import annotations

import json
import os
import statistics
import subprocess
import sys
import time
from pathlib import Path

ROOT = Path(__file__).resolve().parents[1]
sys.path.insert(0, str(ROOT))
sys.path.insert(0, str(ROOT / "tests" / "engine"))

BUILDS = [("symmetric:n=60", 60), ("general-linear:n=12", 22), ("orthogonal:n=3", 500), ("symplectic:n=8", 20),
          ("mixed:n=4,word=" + "vd" * 20, 40), ("su2:kind=icosahedral", 40_000)]

CHILD = """
import json, sys, time, tracemalloc
sys.set_int_max_str_digits(0)
from engine.diagram import Diagram
from engine.specs import parse_spec
spec, top, memory = sys.argv[1], int(sys.argv[2]), sys.argv[3] == "memory"
diagram = Diagram(parse_spec(spec))
cost = diagram.cost(top)
if memory:
    tracemalloc.start()
start = time.perf_counter()
diagram.ensure(top)
seconds = time.perf_counter() - start
peak = tracemalloc.get_traced_memory()[1] if memory else 0
print(json.dumps({"seconds": seconds, "peak": peak, "estimate_seconds": cost.seconds, "estimate_bytes": cost.bytes,
                  "edges": cost.edges}))
"""

BELL = """
import sys, time
sys.set_int_max_str_digits(0)
from engine.combinatorics import bell
from engine.costs import T_LIMB
from engine.specs import parse_spec
k = int(sys.argv[1])
extra = parse_spec("symmetric:n=3").capability(__import__("engine.capabilities").capabilities.SizeGuard).extra(2 * k)
start = time.perf_counter()
bell(2 * k + 2)
print(extra * T_LIMB, time.perf_counter() - start)
"""


def worst_ratios(spec: str, top: int) -> dict[str, tuple[float, int]]:
    from engine.capabilities import SizeGuard
    from engine.costs import digits_of
    from engine.diagram import Diagram
    from engine.specs import parse_spec

    tower = parse_spec(spec)
    guard = tower.capability(SizeGuard)
    diagram = Diagram(tower)
    top = top if tower.max_index is None else min(top, tower.max_index)
    worst: dict[str, tuple[float, int]] = {}
    edges = nodes = 0

    def note(what: str, estimate: float, real: float, index: int) -> None:
        ratio = estimate / real
        if what not in worst or max(ratio, 1 / ratio) > max(worst[what][0], 1 / worst[what][0]):
            worst[what] = (ratio, index)

    for index in range(top + 1):
        level = diagram.level(index)
        nodes += len(level)
        if index > 0:
            note("edges", guard.edges(index), edges, index)
            note("nodes", guard.nodes(index), nodes, index)
            note("digits", diagram.cost(index).digits, digits_of(max(level.values())), index)
        if index < top:
            edges += sum(len(diagram.children(index, node)) for node in level)
    return worst


def part_counts() -> None:
    from engine.specs import families
    from test_estimates_wide import CASES

    cases = dict(CASES)
    for family in families().values():
        for spec in (family.example, *family.examples):
            cases.setdefault(spec, 40)
    overall: dict[str, tuple[float, str]] = {}
    print(f"counts: {len(cases)} towers, estimate/real at every level compared (worst level in brackets)")
    for spec in sorted(cases):
        start = time.perf_counter()
        worst = worst_ratios(spec, cases[spec])
        cells = "  ".join(f"{k} {v[0]:6.2f} [{v[1]}]" for k, v in worst.items())
        print(f"  {spec[:44]:44} {cells}   ({time.perf_counter() - start:.1f} s)", flush=True)
        for k, (ratio, _) in worst.items():
            if k not in overall or max(ratio, 1 / ratio) > max(overall[k][0], 1 / overall[k][0]):
                overall[k] = (ratio, spec)
    for k, (ratio, spec) in overall.items():
        verdict = "within 10x" if 0.1 <= ratio <= 10 else "OUT OF 10x"
        print(f"worst {k} ratio over every family: {ratio:.2f} ({spec[:44]}): {verdict}")


def _child(code: str, *args: str) -> str:
    env = {k: v for k, v in os.environ.items() if k != "PYTHONDONTWRITEBYTECODE"}
    return subprocess.run([sys.executable, "-c", code, *args], capture_output=True, text=True, cwd=ROOT, env=env,
                          check=True).stdout


def part_model() -> None:
    print("cost model (engine/costs.py): estimate against a real build, each in its own process "
          "(time: median of 3; memory: tracemalloc's peak in a 4th run)")
    for spec, top in BUILDS:
        runs = [json.loads(_child(CHILD, spec, str(top), "time")) for _ in range(3)]
        seconds = statistics.median(r["seconds"] for r in runs)
        peak = json.loads(_child(CHILD, spec, str(top), "memory"))["peak"]
        first = runs[0]
        print(f"  {spec[:30]:30} to {top:6}: {first['edges']:9.3g} edges est; time est {first['estimate_seconds']:6.2f} s "
              f"real {seconds:6.2f} s ({first['estimate_seconds'] / seconds:5.2f}x); memory est "
              f"{first['estimate_bytes'] / 1e6:7.1f} MB real {peak / 1e6:7.1f} MB "
              f"({first['estimate_bytes'] / max(peak, 1):5.2f}x)", flush=True)
    for k in (500, 1000):
        estimate, real = map(float, _child(BELL, str(k)).split())
        print(f"  Bell triangle of symmetric:n=3 to level {k} (the algebra dimensions printed): est {estimate:.2f} s "
              f"real {real:.2f} s ({estimate / real:.2f}x)", flush=True)


if __name__ == "__main__":
    sys.set_int_max_str_digits(0)
    part_counts()
    part_model()
