"""Speed of the explorer (issue: the explorer).  Targets: first paint under 1 s; a key press to the
repaint under 50 ms on a 200,000-node level (symmetric:n=80 at level 40); at 160x48, level 50 of
general-linear:n=30 shown under 15 s, each → there under 1 s once the level exists, peak memory
under 1 GB (``--depth``).

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
import asyncio
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


async def steps_at_depth(spec: str, level: int, steps: int) -> None:
    """Reach ``level`` at 160x48 (the asked level shown first), then step → ``steps`` times, each
    timed from the key to the level shown; the side panes' levels build in the background."""
    import contextlib
    import resource

    from textual.worker import WorkerCancelled

    from tui.explorer.app import ExplorerApp
    from tui.explorer.state import state_for_spec

    sys.set_int_max_str_digits(0)
    app = ExplorerApp(state_for_spec(spec), search_faithful=False, autosave=False)
    async with app.run_test(size=(160, 48)) as pilot:
        await pilot.pause()
        start = time.perf_counter()
        app.go(level)
        while app.state.index != level:
            await asyncio.sleep(0.01)
        print(f"{spec}: level {level} shown {time.perf_counter() - start:.1f} s after the jump key   target < 15 s")
        while not set(app.main.wanted_levels()) <= set(app.shown):  # the side panes' levels, built in the background
            await asyncio.sleep(0.05)
        print(f"  side panes' levels ready {time.perf_counter() - start:.1f} s after it")
        for n in range(steps):
            while not set(app.main.wanted_levels()) <= set(app.shown):
                await asyncio.sleep(0.05)
            target = app.state.index + 1
            t0 = time.perf_counter()
            app.step_level(1)
            while app.state.index != target:
                await asyncio.sleep(0.002)
            print(f"  → to level {target} (built): {(time.perf_counter() - t0) * 1000:.0f} ms   target < 1000 ms")
        app.cancel_build()
        with contextlib.suppress(WorkerCancelled):
            await app.workers.wait_for_complete()
    peak = resource.getrusage(resource.RUSAGE_SELF).ru_maxrss / 1024
    print(f"  peak memory {peak:,.0f} MB   target < 1024 MB")


async def deep_jump(spec: str, level: int) -> None:
    """``g LEVEL`` on a finite tower: from the jump to the level painted, against the engine's jump
    alone (a fresh diagram, the same matrix power) as the floor."""
    from fractions import Fraction

    from engine.diagram import Diagram
    from tui.explorer.app import ExplorerApp
    from tui.explorer.state import state_for_spec

    sys.set_int_max_str_digits(0)
    app = ExplorerApp(state_for_spec(spec), search_faithful=False, autosave=False)
    async with app.run_test(size=(80, 24)) as pilot:
        await pilot.pause()
        index = app.state.tower.index_of(Fraction(level))
        start = time.perf_counter()
        before = app.sums
        app.go(index)
        # the level and its sums drawn (their handlers redraw at once); the level before it, which
        # the details want for the parents, comes after in the background and is not waited for
        while app.state.index != index or app.sums is None or app.sums is before:
            await asyncio.sleep(0.002)
        await asyncio.sleep(0)  # the next screen refresh
        shown = time.perf_counter() - start
    diagram = Diagram(state_for_spec(spec).tower)
    start = time.perf_counter()
    diagram.level_at(index)
    floor = time.perf_counter() - start
    print(f"g {level} on {spec}: painted {shown * 1000:.0f} ms after the jump; the engine's jump alone "
          f"{floor * 1000:.0f} ms (ratio {shown / floor:.1f})   target: instant (< 300 ms)")


def main() -> None:
    parser = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    parser.add_argument("--quick", action="store_true", help="first paint only")
    parser.add_argument("--depth", action="store_true", help="only the steps at depth (general-linear:n=30, level 50)")
    args = parser.parse_args()
    if args.depth:
        asyncio.run(steps_at_depth("general-linear:n=30", 50, 2))
        return
    paints = first_paint(5)
    print(f"first paint (demo session, 80x24): median {statistics.median(paints) * 1000:.0f} ms, "
          f"worst {max(paints) * 1000:.0f} ms   target < 1000 ms")
    bare = first_paint(5, BARE_APP)
    print(f"  floor, a bare Textual app: median {statistics.median(bare) * 1000:.0f} ms, "
          f"worst {max(bare) * 1000:.0f} ms")
    asyncio.run(deep_jump("su2:kind=icosahedral", 1_000_000))
    if args.quick:
        return

    results = asyncio.run(key_to_repaint("symmetric:n=80", 40, 30))
    for name, times in results.items():
        ms = [t * 1000 for t in times]
        print(f"key {name:<9} to repaint: median {statistics.median(ms):.1f} ms, worst {max(ms):.1f} ms   target < 50 ms")


if __name__ == "__main__":
    main()
