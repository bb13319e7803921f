"""Streamed documents against the build and print of the sums (issue: speed at the machine's floor).

    uv run python bench/bench_documents.py [SPEC LEVEL]     # default symmetric:n=60 to 30

Each case is a whole `towerscope` run in a fresh subprocess with stdout to /dev/null, alternated,
medians of 3: `levels --sums-only` (the build and the sums: the floor), `levels --json` and
`levels --csv` (streamed level by level), and `export -o FILE.json` (streamed into the atomic
temporary file).  Peak memory is the subprocess's maximum resident size.  Targets: time within
1.2x of the floor plus the printing, peak memory within 1.3x of the floor's.
"""

from __future__ import annotations

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


def once(argv: list[str]) -> dict:
    done = subprocess.run([sys.executable, "-c", RUN, *argv], capture_output=True, text=True, check=True)
    return json.loads(done.stderr.strip().splitlines()[-1])


def main() -> None:
    spec, level = (sys.argv[1], sys.argv[2]) if len(sys.argv) > 2 else ("symmetric:n=60", "30")
    target = os.path.join(tempfile.mkdtemp(), "levels.json")
    cases = {
        "levels --sums-only": ["levels", spec, "--to", level, "--sums-only"],
        "levels --json": ["levels", spec, "--to", level, "--json"],
        "levels --csv": ["levels", spec, "--to", level, "--csv"],
        "export -o .json": ["export", spec, "--to", level, "-o", target],
    }
    results: dict[str, list[dict]] = {name: [] for name in cases}
    for _ in range(3):
        for name, argv in cases.items():
            results[name].append(once(argv))
    floor = statistics.median(r["s"] for r in results["levels --sums-only"])
    floor_mb = statistics.median(r["mb"] for r in results["levels --sums-only"])
    print(f"{spec} to level {level} (medians of 3 alternated runs, stdout to /dev/null)")
    for name in cases:
        s = statistics.median(r["s"] for r in results[name])
        mb = statistics.median(r["mb"] for r in results[name])
        print(f"  {name:20} {s:6.2f} s ({s / floor:.2f}x the sums-only run)  peak {mb:6.0f} MB ({mb / floor_mb:.2f}x)")
    print(f"  output file: {os.path.getsize(target) / 1e6:.0f} MB of JSON")


if __name__ == "__main__":
    main()
