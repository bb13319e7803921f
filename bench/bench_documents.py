"""Streamed documents against the build and print of the sums (issue: speed at the machine's floor).

    uv run python bench/bench_documents.py [SPEC LEVEL] [--runs R]   # default symmetric:n=60 to 30, 5 runs

Each case is a whole `towerscope` run in a fresh subprocess with stdout to /dev/null, alternated,
medians of 5 (``--runs``): `levels --sums-only` (the build and the sums: the floor), `levels --json` and
`levels --csv` (streamed level by level), and `export -o FILE.json` (streamed into the atomic
temporary file).  Peak memory is the subprocess's maximum resident size.  Targets: time within
1.2x of the floor plus the printing, peak memory within 1.3x of the floor's.
"""

from __future__ import annotations

import argparse
import json
import os
import statistics
import subprocess
import sys
import tempfile
import time

RUN = r"""
import json, os, resource, sys, time
sys.stdout = open(os.devnull, "w")
from tui.cli.main import main
start = time.perf_counter()
main(sys.argv[1:])
elapsed = time.perf_counter() - start
sys.stderr.write(json.dumps({"s": elapsed, "mb": resource.getrusage(resource.RUSAGE_SELF).ru_maxrss / 1024}))
"""


PRINTING = r"""
import io, json, os, sys, time
sys.set_int_max_str_digits(0)
from engine.diagram import Diagram
from engine.export.documents import levels_document
from engine.specs import parse_spec
from fractions import Fraction
spec = sys.argv[1]
diagram = Diagram(parse_spec(spec))
level = diagram.tower.index_of(Fraction(sys.argv[2]))  # as the CLI reads --to (half levels count)
diagram.ensure(level)
document = levels_document(diagram, level)  # the data in memory, not timed
times = {}
with open(os.devnull, "w") as sink:
    for name, indent in (("json", None), ("export", 1)):
        start = time.perf_counter()
        sink.write(json.dumps(document, ensure_ascii=False, indent=indent))
        times[name] = time.perf_counter() - start
    rows = [(str(e["level"]), n["label"], n["multiplicity"], n["dimension"]) for e in document["levels"] for n in e["nodes"]]
    import csv
    start = time.perf_counter()
    csv.writer(sink, lineterminator="\n").writerows(rows)
    times["csv"] = time.perf_counter() - start
sys.stderr.write(json.dumps(times))
"""


def printing(spec: str, level: str) -> dict:
    """The cost of printing alone: the standard library writing the same document (JSON, JSON with
    indent 1 as `export` writes it, CSV rows) from data already in memory."""
    done = subprocess.run([sys.executable, "-c", PRINTING, spec, level], capture_output=True, text=True, check=True)
    return json.loads(done.stderr.strip().splitlines()[-1])


def once(argv: list[str]) -> dict:
    done = subprocess.run([sys.executable, "-c", RUN, *argv], capture_output=True, text=True, check=True)
    return json.loads(done.stderr.strip().splitlines()[-1])


def main() -> None:
    parser = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    parser.add_argument("spec", nargs="?", default="symmetric:n=60")
    parser.add_argument("level", nargs="?", default="30")
    parser.add_argument("--runs", type=int, default=5)
    args = parser.parse_args()
    spec, level, runs = args.spec, args.level, args.runs
    target = os.path.join(tempfile.mkdtemp(), "levels.json")
    cases = {
        "levels --sums-only": ["levels", spec, "--to", level, "--sums-only"],
        "levels --json": ["levels", spec, "--to", level, "--json"],
        "levels --csv": ["levels", spec, "--to", level, "--csv"],
        "export -o .json": ["export", spec, "--to", level, "-o", target],
    }
    results: dict[str, list[dict]] = {name: [] for name in cases}
    for _ in range(runs):
        for name, argv in cases.items():
            results[name].append(once(argv))
    floor = statistics.median(r["s"] for r in results["levels --sums-only"])
    floor_mb = statistics.median(r["mb"] for r in results["levels --sums-only"])
    prints = [printing(spec, level) for _ in range(runs)]
    print_cost = {k: statistics.median(p[k] for p in prints) for k in prints[0]}
    print(f"{spec} to level {level} (medians of {runs} alternated runs, stdout to /dev/null)")
    print(f"  printing alone (the standard library writing the same text from memory): json {print_cost['json']:.2f} s, "
          f"indented {print_cost['export']:.2f} s, csv {print_cost['csv']:.2f} s")
    kinds = {"levels --json": "json", "levels --csv": "csv", "export -o .json": "export"}
    for name in cases:
        s = statistics.median(r["s"] for r in results[name])
        mb = statistics.median(r["mb"] for r in results[name])
        against = ""
        if name in kinds:
            honest = floor + print_cost[kinds[name]]
            against = f"; {s / honest:.2f}x sums-only plus printing (target <= 1.2x)"
        print(f"  {name:20} {s:6.2f} s ({s / floor:.2f}x the sums-only run{against})  "
              f"peak {mb:6.0f} MB ({mb / floor_mb:.2f}x, target <= 1.3x)")
    print(f"  output file: {os.path.getsize(target) / 1e6:.0f} MB of JSON")


if __name__ == "__main__":
    main()
