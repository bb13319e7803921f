"""A lookup imports only what it needs (common practice for command-line tools: start-up is most
of a quick command's time).  bench/bench_startup.py measures the time; this keeps the heavy
libraries out of the import graph."""

import subprocess
import sys
from pathlib import Path

ROOT = Path(__file__).resolve().parents[1]

CODE = """
import sys
from tui.cli.main import main
main(sys.argv[1:])
sys.stderr.write("\\n".join(sys.modules))
"""


def _loaded(*argv: str) -> set[str]:
    done = subprocess.run([sys.executable, "-c", CODE, *argv], capture_output=True, text=True, cwd=ROOT, check=True)
    return set(done.stderr.split())


def test_node_json_imports_neither_rich_tables_nor_textual_nor_sympy():
    loaded = _loaded("node", "symmetric:n=4", "--level", "2", "--label", "(3,1)", "--json")
    assert "engine.diagram" in loaded  # it did the lookup
    heavy = {m for m in loaded if m.split(".")[0] in {"textual", "sympy", "networkx", "numpy"} or m.startswith("rich")}
    assert not heavy


def test_help_imports_no_engine_mathematics():
    done = subprocess.run([sys.executable, "-c", "import sys\nfrom tui.cli.main import build_parser\nbuild_parser()\n"
                           "sys.stderr.write('\\n'.join(sys.modules))"], capture_output=True, text=True, cwd=ROOT, check=True)
    loaded = set(done.stderr.split())
    assert not {"engine.diagram", "engine.specs", "sympy", "textual", "rich"} & loaded
