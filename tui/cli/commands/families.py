"""``towerscope families``: each family, its keys, one line."""

from __future__ import annotations

import argparse

from tui.cli.support import print_json


def add_commands(sub: argparse._SubParsersAction) -> None:
    p = sub.add_parser("families", help="the tower families and their keys")
    p.add_argument("--json", action="store_true", help="as JSON")
    p.set_defaults(handler=run)


def run(args: argparse.Namespace) -> int:
    from engine.specs import families

    found = families()
    if args.json:
        from engine.export.family_documents import families_document

        print_json(families_document(found.values()))
        return 0
    from tui.cli.tables import print_families

    print_families(list(found.values()))
    return 0
