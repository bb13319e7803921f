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
    """argparse with a one-line error (the contract wants one line on stderr, exit 2), and help
    fitted to the terminal without importing shutil (argparse's default does, at every argument)."""

    def error(self, message: str) -> None:  # type: ignore[override]
        self.exit(EXIT_USAGE, f"{self.prog}: error: {message} (see {self.prog} --help)\n")

    def _get_formatter(self) -> argparse.HelpFormatter:
        return self.formatter_class(prog=self.prog, width=_columns() - 2)


def _columns() -> int:
    """The terminal's width as ``shutil.get_terminal_size`` finds it: $COLUMNS, the terminal, or 80."""
    try:
        columns = int(os.environ.get("COLUMNS", "0"))
    except ValueError:
        columns = 0
    if columns <= 0:
        try:
            columns = os.get_terminal_size(sys.__stdout__.fileno()).columns  # type: ignore[union-attr]
        except (AttributeError, ValueError, OSError):
            columns = 0
    return columns if columns > 0 else 80


def build_parser(command: str | None = None) -> argparse.ArgumentParser:
    """The whole parser; with ``command``, only the command module named like it (a quick start:
    a lookup neither imports nor sets up the other commands).  The whole parser when no module is
    named like it or the module does not register it."""
    from tui.cli import commands

    parser = _Parser(
        prog="towerscope",
        description="Exact Bratteli diagrams of tensor-power towers. With no command: open the "
        "explorer on the demo session.",
        epilog="The CLI contract: what --json prints (fields, exact integers), the spec, level and label "
        "syntax and the exit statuses (2 for bad input) stay fixed for scripts; README, 'For scripts'. "
        "Text output fits the terminal; piped or redirected it is 80 columns wide unless COLUMNS asks for "
        "more (COLUMNS=200 towerscope ...). A number too wide is shortened with its digit count; --exact "
        "prints every digit; JSON and CSV are always exact.",
    )
    sub = parser.add_subparsers(dest="command", metavar="COMMAND", parser_class=_Parser)
    name = commands.module_for(command) if command else None
    if name is not None:
        commands.load(name).add_commands(sub)
        if command in sub.choices:
            return parser
        return build_parser()
    for module in commands.command_modules():
        module.add_commands(sub)
    return parser


def main(argv: Sequence[str] | None = None) -> int:
    sys.set_int_max_str_digits(0)  # deep levels have multiplicities with far more than 4,300 digits
    args_list = list(sys.argv[1:] if argv is None else argv)
    quick = args_list[0] if args_list and not args_list[0].startswith("-") else None
    parser = build_parser(quick)
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
