"""The towerscope command line: argparse, one module per command in ``commands/``; no mathematics."""
