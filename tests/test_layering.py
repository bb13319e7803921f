"""House rules of the layout: engine/ never imports the UI; the CLI starts without textual or sympy."""

import subprocess
import sys
from pathlib import Path

ROOT = Path(__file__).resolve().parents[1]


def _modules_after(code: str) -> set[str]:
    done = subprocess.run(
        [sys.executable, "-c", code + "\nimport sys\nprint('\\n'.join(sys.modules))"],
        capture_output=True, text=True, cwd=ROOT, check=True,
    )
    return set(done.stdout.split())


def test_engine_never_imports_textual_or_rich():
    modules = sorted(
        ".".join(p.relative_to(ROOT).with_suffix("").parts)
        for p in (ROOT / "engine").rglob("*.py")
        if p.name != "__init__.py"
    )
    loaded = _modules_after("\n".join(f"import {m}" for m in modules) + "\nfrom engine.specs import families\nfamilies()")
    assert not {m for m in loaded if m.split(".")[0] in {"textual", "rich", "tui"}}


def test_cli_start_up_is_light():
    loaded = _modules_after("from tui.cli.main import build_parser\nbuild_parser()\nfrom engine.specs import families\nfamilies()")
    heavy = {m.split(".")[0] for m in loaded} & {"textual", "sympy", "networkx", "rich"}
    assert not heavy
