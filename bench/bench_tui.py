"""Speed of the explorer (issue: the explorer).  Targets: first paint under 1 s; a key press to the
repaint under 50 ms on a 200,000-node level (symmetric:n=80 at level 40).

    uv run python bench/bench_tui.py            # both measures
    uv run python bench/bench_tui.py --quick    # first paint only

First paint: a fresh process imports the app, opens the demo session headless and waits until the
panes hold the built levels (what the user sees first); timed from the process start.
Key to repaint: on the built level, the handler of a key (down, page down, end, up) plus rendering
every visible line of every pane and the details text, as the compositor does after the key; the
terminal write is not included.  The level is built first (not timed here: see bench_diagram.py).
"""

from __future__ import annotations

import argparse
import statistics
import subprocess
import sys
import time

FIRST_PAINT = r"""
import time
start = time.perf_counter()
import asyncio, sys
sys.set_int_max_str_digits(0)
from tui.explorer.app import ExplorerApp
from tui.explorer.session_files import demo_session_path, read_session

async def main():
    app = ExplorerApp(read_session(demo_session_path()), demo=True, search_faithful=False)
    async with app.run_test(size=(80, 24)) as pilot:
        while app.cursor is None:
            await asyncio.sleep(0.002)
        app.screen._compositor  # the screen exists and is laid out
        elapsed = time.perf_counter() - start
        print(f"{elapsed:.4f}")
asyncio.run(main())
"""


#: the floor: a bare Textual app with one line of text and a footer, timed the same way
BARE_APP = r"""
import time
start = time.perf_counter()
import asyncio
from textual.app import App
from textual.widgets import Footer, Static

class Bare(App):
    def compose(self):
        yield Static("hello")
        yield Footer()

async def main():
    async with Bare().run_test(size=(80, 24)) as pilot:
        await pilot.pause()
        print(f"{time.perf_counter() - start:.4f}")
asyncio.run(main())
"""


def first_paint(runs: int, script: str = FIRST_PAINT) -> list[float]:
    times = []
    for _ in range(runs):
        out = subprocess.run([sys.executable, "-c", script], capture_output=True, text=True, check=True)
        times.append(float(out.stdout.strip().splitlines()[-1]))
    return times


async def key_to_repaint(spec: str, level: int, presses: int) -> dict[str, list[float]]:
    import contextlib

    from textual.worker import WorkerCancelled

    from tui.explorer.app import ExplorerApp
    from tui.explorer.state import state_for_spec
    from tui.explorer.widgets.level_pane import LevelPane

    sys.set_int_max_str_digits(0)
    state = state_for_spec(spec)
    app = ExplorerApp(state, search_faithful=False)
    results: dict[str, list[float]] = {}
    async with app.run_test(size=(200, 60)) as pilot:
        await pilot.pause()
        index = state.tower.index_of(__import__("fractions").Fraction(level))
        start = time.perf_counter()
        app.go(index)
        while app.state.index != index:
            with contextlib.suppress(WorkerCancelled):
                await app.workers.wait_for_complete()
            await pilot.pause()
        print(f"built and showed level {level} of {spec} in {time.perf_counter() - start:.1f} s "
              f"({len(state.diagram.level(index)):,} nodes)")
        screen = app.main
        panes = [p for p in screen.query(LevelPane) if p.display]

        def repaint() -> None:
            for pane in panes:
                for y in range(pane.size.height):
                    pane.render_line(y)
            screen.query_one("#details-text").render()

        for name, action in (("down", lambda: app.move_cursor(1)), ("page down", lambda: app.move_cursor(10)),
                             ("up", lambda: app.move_cursor(-1)), ("end", lambda: app.set_cursor(-1)),
                             ("home", lambda: app.set_cursor(0))):
            times = []
            for _ in range(presses):
                t0 = time.perf_counter()
                app._last_key = time.monotonic()  # what the real key event records (on_key)
                action()
                repaint()
                times.append(time.perf_counter() - t0)
                await pilot.pause()
            results[name] = times
    return results


def main() -> None:
    parser = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    parser.add_argument("--quick", action="store_true", help="first paint only")
    args = parser.parse_args()
    paints = first_paint(5)
    print(f"first paint (demo session, 80x24): median {statistics.median(paints) * 1000:.0f} ms, "
          f"worst {max(paints) * 1000:.0f} ms   target < 1000 ms")
    bare = first_paint(5, BARE_APP)
    print(f"  floor, a bare Textual app: median {statistics.median(bare) * 1000:.0f} ms, "
          f"worst {max(bare) * 1000:.0f} ms")
    if args.quick:
        return
    import asyncio

    results = asyncio.run(key_to_repaint("symmetric:n=80", 40, 30))
    for name, times in results.items():
        ms = [t * 1000 for t in times]
        print(f"key {name:<9} to repaint: median {statistics.median(ms):.1f} ms, worst {max(ms):.1f} ms   target < 50 ms")


if __name__ == "__main__":
    main()
