"""Start the explorer: ``towerscope`` (the demo session), ``open FILE``, ``explore SPEC``.

Everything is checked before the terminal is taken over, so a bad file or spec is one line on
stderr (exit 2) rather than a screen that flashes and closes.  Work left unsaved by a run that did
not end cleanly (the autosave in the user data folder) is offered back once the explorer is up.
"""

from __future__ import annotations

import sys
from pathlib import Path


def launch(session_file: str | None = None, spec: str | None = None) -> int:
    sys.set_int_max_str_digits(0)
    from tui.explorer.session_files import demo_session_path, read_autosave, read_session
    from tui.explorer.state import state_for_spec

    demo = False
    if spec is not None:
        state = state_for_spec(spec)
    elif session_file is not None:
        state = read_session(Path(session_file).expanduser().resolve())
    else:
        state = read_session(demo_session_path())
        demo = True
    from tui.explorer.app import ExplorerApp

    ExplorerApp(state, demo=demo, restore=read_autosave()).run()
    return 0
