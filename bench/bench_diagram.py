"""Speed of the diagram against honest pure-Python floors (issue: speed at the machine's floor).

    uv run python bench/bench_diagram.py            # S_60 to level 30 and S_80 to level 40
    uv run python bench/bench_diagram.py --quick    # S_60 only

Two comparisons per case, each the median of alternated runs in one fresh subprocess:

- sweep: the engine's build with the tower's children answered from a memo (so the partition
  arithmetic is left out, as the floor leaves it out; the engine's numbering and learning of
  edges stay in) against the floor: levels as lists over per-level node positions, every
  level computed by ``[sum(map(previous.__getitem__, parents)) for parents in step]`` over
  parent positions precomputed for every level — integer ids, precomputed edges, one C-level
  reduction per node, the fastest plain-Python form of the recurrence we know.
- pull: the engine's own loop (``PathCounts.build_next`` without learning) over the passages a
  build has learned, level sizes as built — what a re-sweep of known edges costs.
- build: the engine's whole build from the spec against an independent pure-Python build that
  takes its edges from one pass over the lattice of small partitions ν (a node (N−|ν|, ν);
  restriction ν → ν and ν−□, induction ν → ν and ν+□; valid in the stable range N ≥ 2·level).
  Peak memory: the maximum resident size of a fresh subprocess doing only that build.

No faster non-pure-Python floor is reported for the sweep: each step is a sparse 0/1 matrix
over up to 10^5 nodes, which python-flint (dense matrices) cannot hold, and numpy is not a
dependency of the project.  The finite towers' jumps (dense, small) use flint: bench_groups.py.
"""

from __future__ import annotations

import argparse
import json
import subprocess
import sys

CASE = r"""
import json, statistics, sys, time
sys.set_int_max_str_digits(0)
from engine.diagram import Diagram
from engine.path_counts import PathCounts
from engine.specs import parse_spec
spec, upto, runs = sys.argv[1], int(sys.argv[2]), int(sys.argv[3])
tower = parse_spec(spec)
reference = Diagram(tower)
reference.ensure(upto)
memo, layouts, steps, edges = {}, [[tower.root()]], [], 0
for index in range(upto):
    layout = layouts[-1]
    position = {node: j for j, node in enumerate(layout)}
    parents = {}
    for node in layout:
        kids = memo[(tower.step_key(index), node)] = list(tower.children(index, node))
        for child, e in kids:
            parents.setdefault(child, []).extend([position[node]] * e)
            edges += e
    layouts.append(list(parents))
    steps.append([tuple(parents[c]) for c in layouts[-1]])

def floor():
    values = [1]
    for step in steps:
        get = values.__getitem__
        values = [sum(map(get, p)) for p in step]
    return values

class Memo:
    def __init__(self, tower): self.tower = tower
    def __getattr__(self, name): return getattr(self.tower, name)
    def children(self, index, node): return memo[(self.tower.step_key(index), node)]

memo_tower = Memo(tower)
def sweep():
    counts = PathCounts(memo_tower)
    while len(counts.levels) <= upto:
        counts.build_next()
    return counts

learned = sweep()
for i in range(upto):  # a passage pulled once has dropped its parents: rebuild them for the pull
    if learned.passage(i).parents is None:
        PathCounts._parents_again(learned.passage(i))
plan = [(learned.passage(i).parents, len(learned.levels[i + 1][1]), len(learned.levels[i][0].nodes)) for i in range(upto)]
def pull():
    # the engine's pull alone, over its own learned passages (build_next without the learning)
    values = [1]
    for parents, size, pad in plan:
        get = (values + [0] * (pad - len(values))).__getitem__
        values = [sum(map(get, p)) for p in parents[:size]]
    return values

def build():
    Diagram(parse_spec(spec)).ensure(upto)

def lattice():
    import bench_floors
    return bench_floors.symmetric_by_small_partitions(tower.n, upto)

sys.path.insert(0, "bench")
times = {"floor": [], "pull": [], "sweep": [], "build": [], "lattice": []}
for _ in range(runs):
    for name, work in (("floor", floor), ("pull", pull), ("sweep", sweep), ("build", build), ("lattice", lattice)):
        start = time.perf_counter(); work(); times[name].append(time.perf_counter() - start)
assert dict(zip(layouts[-1], floor())) == reference.level(upto) == sweep().level(upto)
assert sorted(lattice()) == sorted(reference.level(upto).values())
print(json.dumps({"edges": edges, **{k: statistics.median(v) for k, v in times.items()}}))
"""

PEAK = r"""
import resource, sys
sys.set_int_max_str_digits(0)
sys.path.insert(0, "bench")
spec, upto, which = sys.argv[1], int(sys.argv[2]), sys.argv[3]
if which == "engine":
    from engine.diagram import Diagram
    from engine.specs import parse_spec
    Diagram(parse_spec(spec)).ensure(upto)
else:
    import bench_floors
    bench_floors.symmetric_by_small_partitions(int(spec.split("=")[1]), upto, keep=True)
print(resource.getrusage(resource.RUSAGE_SELF).ru_maxrss / 1024)
"""


def run(code: str, *args: object) -> str:
    return subprocess.run([sys.executable, "-c", code, *map(str, args)], check=True, capture_output=True, text=True).stdout


def main() -> None:
    parser = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    parser.add_argument("--quick", action="store_true")
    parser.add_argument("--runs", type=int, default=3)
    args = parser.parse_args()
    cases = [("symmetric:n=60", 60)] + ([] if args.quick else [("symmetric:n=80", 80)])
    for spec, upto in cases:
        r = json.loads(run(CASE, spec, upto, args.runs))
        ours_mb, floor_mb = (float(run(PEAK, spec, upto, which)) for which in ("engine", "lattice"))
        print(f"{spec} to level {upto // 2}: {r['edges']:,} edges (medians of {args.runs} alternated runs)")
        print(f"  pull (the engine's loop over its learned edges): {r['pull']:.2f} s, floor {r['floor']:.2f} s: "
              f"{r['pull'] / r['floor']:.2f}x the floor")
        print(f"  sweep with learning (edges given by a memo): {r['sweep']:.2f} s: {r['sweep'] / r['floor']:.2f}x the floor")
        print(f"  build: engine {r['build']:.2f} s, small-partition build {r['lattice']:.2f} s: "
              f"{r['build'] / r['lattice']:.2f}x; peak {ours_mb:.0f} MB against {floor_mb:.0f} MB ({ours_mb / floor_mb:.2f}x)")


if __name__ == "__main__":
    main()
