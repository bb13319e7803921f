"""The ``towerscope`` command: the app with no arguments, and scriptable subcommands.

Contract: shared guide cli-contract.md.  Bad input: one line on stderr, exit status 2, no
traceback.  Start-up imports neither textual nor sympy (commands import what they need).
"""

from __future__ import annotations

import argparse
import os
import sys
from typing import Sequence

from engine.errors import Cancelled, UserError

EXIT_USAGE = 2


class _Parser(argparse.ArgumentParser):
    """argparse with a one-line error (the contract wants one line on stderr, exit 2)."""

    def error(self, message: str) -> None:  # type: ignore[override]
        self.exit(EXIT_USAGE, f"{self.prog}: error: {message} (see {self.prog} --help)\n")


def build_parser() -> argparse.ArgumentParser:
    from tui.cli.commands import COMMAND_MODULES

    parser = _Parser(
        prog="towerscope",
        description="Exact Bratteli diagrams of tensor-power towers. With no command: open the "
        "explorer on the demo session.",
        epilog="The CLI contract: what --json prints (fields, exact integers), the spec, level and label "
        "syntax and the exit statuses (2 for bad input) stay fixed for scripts; README, 'For scripts'.",
    )
    sub = parser.add_subparsers(dest="command", metavar="COMMAND", parser_class=_Parser)
    for module in COMMAND_MODULES:
        module.add_commands(sub)
    return parser


def main(argv: Sequence[str] | None = None) -> int:
    sys.set_int_max_str_digits(0)  # deep levels have multiplicities with far more than 4,300 digits
    args_list = list(sys.argv[1:] if argv is None else argv)
    parser = build_parser()
    args = parser.parse_args(args_list)
    if args.command is None:
        args_list = ["open"]
        args = parser.parse_args(args_list)
    try:
        result = args.handler(args)
    except UserError as exc:
        print(f"towerscope: {exc}", file=sys.stderr)
        return EXIT_USAGE
    except MemoryError:
        print("towerscope: out of memory: the request is too large for this machine (ask for fewer levels or paths)", file=sys.stderr)
        return EXIT_USAGE
    except RecursionError:
        print("towerscope: the input nests too deeply to be read", file=sys.stderr)
        return EXIT_USAGE
    except Cancelled:
        print("towerscope: cancelled", file=sys.stderr)
        return 130
    except KeyboardInterrupt:
        print("towerscope: interrupted", file=sys.stderr)
        return 130
    except BrokenPipeError:
        # the reader went away (e.g. `| head`); say nothing more
        try:
            sys.stdout = open(os.devnull, "w")
        except OSError:
            pass
        return 0
    return int(result or 0)


def entry() -> None:
    sys.exit(main())


if __name__ == "__main__":
    entry()
