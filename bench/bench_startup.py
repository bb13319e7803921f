"""Start-up of a lookup against a bare interpreter (issue: speed at the machine's floor).

    uv run python bench/bench_startup.py

Floor: ``python -c pass`` (the interpreter and site).  Each case is a whole process, run
alternately with the floor; medians of the runs are reported, and the difference to the floor
(target: within 0.1 s), with bytecode cached as after any installation.  ``python -X importtime`` of ``node --json`` lists the slowest imports
and checks that rich.table, textual and sympy are not among them.
"""

from __future__ import annotations

import os
import statistics
import subprocess
import sys
import tempfile
import time

CASES = {
    "--help": ["-m", "tui.cli.main", "--help"],
    "node --json": ["-m", "tui.cli.main", "node", "symmetric:n=4", "--level", "2", "--label", "(3,1)", "--json"],
    "levels (small)": ["-m", "tui.cli.main", "levels", "su2:kind=icosahedral", "--to", "6"],
    "levels --json (small)": ["-m", "tui.cli.main", "levels", "general-linear:n=3", "--to", "5", "--json"],
}
FLOOR = ["-c", "pass"]
RUNS = 9
#: bytecode cached as in any installation (the sandbox may set PYTHONDONTWRITEBYTECODE), in a
#: folder of its own so the tree stays clean
ENV = {k: v for k, v in os.environ.items() if k != "PYTHONDONTWRITEBYTECODE"}
ENV["PYTHONPYCACHEPREFIX"] = os.path.join(tempfile.gettempdir(), "towerscope-bench-pycache")


def wall(args: list[str]) -> float:
    start = time.perf_counter()
    subprocess.run([sys.executable, *args], check=True, stdout=subprocess.DEVNULL, stderr=subprocess.DEVNULL, env=ENV)
    return time.perf_counter() - start


def main() -> None:
    times: dict[str, list[float]] = {name: [] for name in ["floor", *CASES]}
    for args in CASES.values():  # warm the bytecode cache
        wall(args)
    for _ in range(RUNS):
        for name, args in [("floor", FLOOR), *CASES.items()]:
            times[name].append(wall(args))
    floor = statistics.median(times["floor"])
    print(f"floor (python -c pass): {floor * 1000:.0f} ms (median of {RUNS}, alternated)")
    for name in CASES:
        median = statistics.median(times[name])
        print(f"{name:24} {median * 1000:6.0f} ms  = floor + {(median - floor) * 1000:4.0f} ms  ({median / floor:.1f}x)")
    done = subprocess.run([sys.executable, "-X", "importtime", *CASES["node --json"]], capture_output=True, text=True, check=True, env=ENV)
    rows = []
    for line in done.stderr.splitlines():
        if line.startswith("import time:") and "|" in line:
            _, cumulative, name = line.split("|")
            if cumulative.strip().isdigit():
                rows.append((int(cumulative), name.rstrip()))
    loaded = {name.strip() for _, name in rows}
    heavy = sorted(m for m in loaded if m.split(".")[0] in {"textual", "sympy"} or m.startswith("rich.table"))
    print("node --json imports:", len(loaded), "modules; heavy ones:", ", ".join(heavy) or "none")
    for cumulative, name in sorted(rows, reverse=True)[:8]:
        print(f"  {cumulative / 1000:7.1f} ms cumulative  {name}")


if __name__ == "__main__":
    main()
