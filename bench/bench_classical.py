"""Speed of the classical towers (issue 5): building to level 30 in the stable range, and to
level 12 for small N, with the level sums (which compute every dimension on the level).

    uv run python bench/bench_classical.py

Targets: each stable-range case in seconds, each small case at once (well under 0.1 s).
Every case runs in a fresh subprocess so that the cases do not share caches.
"""

from __future__ import annotations

import json
import subprocess
import sys

CASE = r"""
import json, sys, time
from engine.diagram import Diagram
from engine.specs import parse_spec
spec, upto = sys.argv[1], int(sys.argv[2])
diagram = Diagram(parse_spec(spec))
start = time.perf_counter()
diagram.ensure(upto)
built = time.perf_counter() - start
start = time.perf_counter()
sums = diagram.sums(upto)
summed = time.perf_counter() - start
print(json.dumps({"nodes": len(diagram.level(upto)), "build": built, "sums": summed,
                  "estimate": diagram.tower.estimate_edges(upto), "consistent": sums.consistent}))
"""

CASES = [
    ("general-linear:n=30", 30),
    ("orthogonal:n=30", 30),
    ("symplectic:n=60", 30),
    ("mixed:n=30,word=" + "vd" * 15, 30),
    ("mixed:n=30,word=" + "v" * 15 + "d" * 15, 30),
    ("general-linear:n=3", 12),
    ("orthogonal:n=3", 12),
    ("symplectic:n=2", 12),
    ("symplectic:n=4", 12),
    ("mixed:n=3,word=vdvdvdvdvdvd", 12),
]


def main() -> None:
    print(f"{'spec':44} {'level':>5} {'nodes':>7} {'build s':>8} {'sums s':>8} {'estimate':>9}")
    for spec, upto in CASES:
        out = subprocess.run([sys.executable, "-c", CASE, spec, str(upto)], capture_output=True, text=True, check=True)
        r = json.loads(out.stdout)
        assert r["consistent"], spec
        label = spec if len(spec) <= 44 else spec[:41] + "..."
        print(f"{label:44} {upto:5} {r['nodes']:7} {r['build']:8.3f} {r['sums']:8.3f} {r['estimate']:9.2e}")


if __name__ == "__main__":
    main()
