"""CLI subcommands: each module has ``add_commands(subparsers)`` and imports heavy libraries only
inside its handlers."""

from tui.commands import app_commands, export, families, groups, levels, node, paths, tableaux

COMMAND_MODULES = [levels, node, paths, tableaux, families, groups, export, app_commands]
