"""``towerscope open [FILE]`` and ``towerscope explore SPEC``: the terminal explorer."""

from __future__ import annotations

import argparse


def add_commands(sub: argparse._SubParsersAction) -> None:
    p = sub.add_parser("open", help="open a session file in the explorer (default: the demo session)")
    p.add_argument("file", nargs="?", help="a session file (.json)")
    p.set_defaults(handler=run_open)
    q = sub.add_parser("explore", help="open the explorer on a tower spec")
    q.add_argument("spec", help="a tower spec, e.g. symmetric:n=5")
    q.set_defaults(handler=run_explore)


def run_open(args: argparse.Namespace) -> int:
    from tui.explorer.launch import launch

    return launch(session_file=args.file)


def run_explore(args: argparse.Namespace) -> int:
    from tui.explorer.launch import launch

    return launch(spec=args.spec)
