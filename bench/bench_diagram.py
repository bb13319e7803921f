"""Speed of the diagram against the floor, and of the closed form (issue: foundation).

    uv run python bench/bench_diagram.py            # both S_60 to level 30 and S_80 to level 40
    uv run python bench/bench_diagram.py --quick    # S_60 only

The floor is the barest loop that can count paths: the same edges, precomputed as flat lists
of children in a dict (a child repeated when its edge count is above 1), walked level by level
adding multiplicities into a dict.  The diagram's time includes computing those edges from the
partitions; the floor's does not.  Peak memory is the process's maximum resident size, taken in a
fresh subprocess per case so the cases do not share caches.
"""

from __future__ import annotations

import argparse
import json
import subprocess
import sys

CASE = r"""
import json, resource, sys, time
sys.set_int_max_str_digits(0)
from engine.diagram import Diagram
from engine.specs import parse_spec
spec, upto = sys.argv[1], int(sys.argv[2])
tower = parse_spec(spec)
diagram = Diagram(tower)
start = time.perf_counter()
diagram.ensure(upto)
ours = time.perf_counter() - start
peak_mb = resource.getrusage(resource.RUSAGE_SELF).ru_maxrss / 1024
edges = 0
adjacency = []
for index in range(upto):
    flat = {}
    for node in diagram.level(index):
        kids = []
        for child, e in diagram.children(index, node):
            kids.extend([child] * e)
        edges += len(kids)
        flat[node] = kids
    adjacency.append(flat)
root = tower.root()
start = time.perf_counter()
current = {root: 1}
for index in range(upto):
    flat = adjacency[index]
    new = {}
    get = new.get
    for node, m in current.items():
        for child in flat[node]:
            new[child] = get(child, 0) + m
    current = new
floor = time.perf_counter() - start
assert current == diagram.level(upto)
print(json.dumps({"spec": spec, "upto": upto, "edges": edges, "ours": ours, "floor": floor,
                  "ratio": ours / floor, "peak_mb": peak_mb}))
"""

CLOSED = r"""
import sys, time
sys.set_int_max_str_digits(0)
from engine.diagram import Diagram
from engine.specs import parse_spec
tower = parse_spec("symmetric:n=12")
start = time.perf_counter()
value = Diagram(tower).multiplicity(2 * 100_000, (6, 3, 3))
elapsed = time.perf_counter() - start
print(f"closed form: (6,3,3) at level 100000 of symmetric:n=12: {len(str(value))} digits in {elapsed:.3f} s")
"""


def run_case(spec: str, upto_index: int) -> dict:
    out = subprocess.run([sys.executable, "-c", CASE, spec, str(upto_index)], check=True, capture_output=True, text=True)
    return json.loads(out.stdout)


def main() -> None:
    parser = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    parser.add_argument("--quick", action="store_true")
    args = parser.parse_args()
    cases = [("symmetric:n=60", 60)] + ([] if args.quick else [("symmetric:n=80", 80)])
    for spec, upto in cases:
        r = run_case(spec, upto)
        print(
            f"{r['spec']} to level {upto // 2}: {r['edges']:,} edges; diagram {r['ours']:.2f} s, "
            f"floor {r['floor']:.2f} s, ratio {r['ratio']:.2f}x; peak {r['peak_mb']:.0f} MB"
        )
    print(subprocess.run([sys.executable, "-c", CLOSED], check=True, capture_output=True, text=True).stdout.strip())


if __name__ == "__main__":
    main()
