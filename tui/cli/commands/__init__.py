"""CLI subcommands: each module has ``add_commands(subparsers)`` and imports heavy libraries only
inside its handlers.

Modules are imported on demand (``tui.cli.main`` loads only the module named like the command
asked for, ``critical-group`` → ``critical_group``; ``--help`` and unknown commands load all).
``MODULE_NAMES`` is the order of the commands in ``--help``."""

from __future__ import annotations

import sys
from types import ModuleType

MODULE_NAMES = ("levels", "node", "formula", "paths", "tableaux", "families", "groups", "export", "diagrams",
                "multiply", "algebra", "kernel", "act", "gram", "semisimple", "series", "walk", "critical_group",
                "chips", "growth", "app_commands")


def load(name: str) -> ModuleType:
    """The command module ``name`` (one of ``MODULE_NAMES``)."""
    path = f"{__name__}.{name}"
    __import__(path)  # the import statement's machinery: ``python -X importtime`` sees it
    return sys.modules[path]


def command_modules() -> list[ModuleType]:
    """Every command module, in ``--help`` order."""
    return [load(name) for name in MODULE_NAMES]


def module_for(command: str) -> str | None:
    """The module named like ``command`` (it may register more), or None."""
    name = command.replace("-", "_")
    return name if name in MODULE_NAMES else None
