"""CLI subcommands: each module has ``add_commands(subparsers)`` and imports heavy libraries only
inside its handlers."""

from tui.cli.commands import diagrams, multiply
from tui.cli.commands import gram, semisimple
from tui.cli.commands import act, algebra, kernel
from tui.cli.commands import series, walk, critical_group, chips, growth
from tui.cli.commands import app_commands, export, families, formula, groups, levels, node, paths, tableaux

COMMAND_MODULES = [levels, node, formula, paths, tableaux, families, groups, export, diagrams, multiply, algebra, kernel, act, gram, semisimple, series, walk, critical_group, chips, growth, app_commands]
