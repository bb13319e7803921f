"""Start-up of a lookup against a bare interpreter (issue: speed at the machine's floor).

    uv run python bench/bench_startup.py

Floor: ``python -c pass`` (the interpreter and site).  Each case is a whole process started the
way the installed ``towerscope`` script starts it (``from tui.cli.main import entry; entry()``;
``python -m`` adds runpy, shown once for reference), run alternately with the floor; medians of
the runs are reported, wall time and CPU time (user + system of the child: less moved by the
other work on the shared machine), and the difference to the floor (target: within 0.1 s), with
bytecode cached as after any installation.  ``python -X importtime`` of ``node --json`` lists the
slowest imports and checks that rich, textual, sympy and networkx are not among them.
"""

from __future__ import annotations

import os
import resource
import statistics
import subprocess
import sys
import tempfile
import time

ENTRY = ["-c", "from tui.cli.main import entry; entry()"]
NODE = ["node", "symmetric:n=4", "--level", "2", "--label", "(3,1)", "--json"]
CASES = {
    "--help": [*ENTRY, "--help"],
    "node --json": [*ENTRY, *NODE],
    "node (text)": [*ENTRY, "node", "orthogonal:n=3", "--level", "4", "--label", "(2)"],
    "levels (small, text)": [*ENTRY, "levels", "su2:kind=icosahedral", "--to", "6"],
    "levels --json (small)": [*ENTRY, "levels", "general-linear:n=3", "--to", "5", "--json"],
    "python -m, node --json": ["-m", "tui.cli.main", *NODE],
}
FLOOR = ["-c", "pass"]
RUNS = 15
TARGET = 0.1
#: bytecode cached as in any installation (the sandbox may set PYTHONDONTWRITEBYTECODE), in a
#: folder of its own so the tree stays clean
ENV = {k: v for k, v in os.environ.items() if k != "PYTHONDONTWRITEBYTECODE"}
ENV["PYTHONPYCACHEPREFIX"] = os.path.join(tempfile.gettempdir(), "towerscope-bench-pycache")


def run(args: list[str]) -> tuple[float, float]:
    """Wall and CPU seconds of one whole process."""
    before = resource.getrusage(resource.RUSAGE_CHILDREN)
    start = time.perf_counter()
    subprocess.run([sys.executable, *args], check=True, stdout=subprocess.DEVNULL, stderr=subprocess.DEVNULL, env=ENV)
    wall = time.perf_counter() - start
    after = resource.getrusage(resource.RUSAGE_CHILDREN)
    return wall, (after.ru_utime - before.ru_utime) + (after.ru_stime - before.ru_stime)


def imports_of(args: list[str]) -> list[tuple[int, int, str]]:
    """(self µs, cumulative µs, indented name) of every import, from ``python -X importtime``."""
    done = subprocess.run([sys.executable, "-X", "importtime", *args], capture_output=True, text=True, check=True, env=ENV)
    rows = []
    for line in done.stderr.splitlines():
        if line.startswith("import time:") and line.count("|") == 2:
            own, cumulative, name = line.removeprefix("import time:").split("|")
            if cumulative.strip().isdigit():
                rows.append((int(own), int(cumulative), name.rstrip()))
    return rows


def main() -> None:
    names = ["floor", *CASES]
    walls: dict[str, list[float]] = {name: [] for name in names}
    cpus: dict[str, list[float]] = {name: [] for name in names}
    for args in CASES.values():  # warm the bytecode cache
        run(args)
    for _ in range(RUNS):
        for name, args in [("floor", FLOOR), *CASES.items()]:
            wall, cpu = run(args)
            walls[name].append(wall)
            cpus[name].append(cpu)
    floor_wall, floor_cpu = statistics.median(walls["floor"]), statistics.median(cpus["floor"])
    print(f"floor (python -c pass): {floor_wall * 1000:.0f} ms wall, {floor_cpu * 1000:.0f} ms CPU "
          f"(medians of {RUNS}, alternated with every case)")
    print(f"{'case':26} {'wall':>8} {'over floor':>11} {'ratio':>6}   {'CPU':>6} {'over floor':>11}   within {TARGET * 1000:.0f} ms")
    for name in CASES:
        wall, cpu = statistics.median(walls[name]), statistics.median(cpus[name])
        verdict = "yes" if wall - floor_wall <= TARGET else "NO"
        print(f"{name:26} {wall * 1000:6.0f}ms {(wall - floor_wall) * 1000:+9.0f}ms {wall / floor_wall:5.1f}x"
              f"   {cpu * 1000:4.0f}ms {(cpu - floor_cpu) * 1000:+9.0f}ms   {verdict}")
    rows = imports_of(CASES["node --json"])
    loaded = {name.strip() for _, _, name in rows}
    heavy = sorted(m for m in loaded if m.split(".")[0] in {"textual", "sympy", "networkx", "numpy", "rich"})
    own = sum(r[0] for r in rows) / 1000
    project = sum(r[0] for r in rows if r[2].strip().split(".")[0] in {"engine", "tui"}) / 1000
    print(f"node --json imports {len(loaded)} modules ({own:.0f} ms under -X importtime, {project:.0f} ms of it "
          f"the project's own); rich, textual, sympy, networkx among them: {', '.join(heavy) or 'none'}")
    for _, cumulative, name in sorted(rows, key=lambda r: -r[1])[:10]:
        print(f"  {cumulative / 1000:7.1f} ms cumulative  {name}")


if __name__ == "__main__":
    main()
