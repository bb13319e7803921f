"""Fuzz every parser of user text with mutated inputs, each under a time and a memory cap.

    uv run python bench/fuzz_parsers.py            # 10,000 inputs per parser
    uv run python bench/fuzz_parsers.py 2000 7     # 2,000 inputs per parser, seed 7
    uv run python bench/fuzz_parsers.py 10000 1 levels,entries   # some parsers only

Inputs are mutations of valid examples (characters inserted, deleted or replaced by hostile ones —
digits Python reads oddly, brackets, operators, NUL —, pieces repeated up to 10^5 times, nesting,
long digit runs, powers).  Each runs in a worker process limited to 2 GB of address space
(resource.setrlimit) and 10 s of time per input (signal.alarm).  A parser must answer or raise
``engine.errors.UserError`` with one line of at most 500 characters.  Printed per parser: inputs
tried, answers, refusals, tracebacks (other exceptions, and refusals that break the one-line rule),
hangs over 10 s, runs that hit the 2 GB cap, and the slowest input's time.
"""

from __future__ import annotations

import json
import multiprocessing
import os
import random
import resource
import signal
import sys
import tempfile
import time
import traceback
from pathlib import Path

sys.path.insert(0, str(Path(__file__).resolve().parent.parent))

MEMORY_CAP = 2 * 1024**3
TIME_CAP = 10
CHUNK = 100

HOSTILE = ["²", "₃", "①", "٣", "½", "\x00", "(", ")", "[", "]", "{", "}", ",", "=", ":", "+", "-", "*", "/",
           "^", "**", "_", ".", "e", " ", "\n", "'", '"', "\\", "#", "→", "∅", "unity(", "sqrt(", "i", "9" * 50]

TABLE = """format = "towerscope-character-table"
version = 1
group = "C_3"
order = 3
classes = ["1", "g", "g2"]
sizes = [1, 1, 1]
[[irreducible]]
name = "1"
values = [1, 1, 1]
[[irreducible]]
name = "w"
values = [1, "unity(3)", "unity(3)^2"]
[[irreducible]]
name = "w2"
values = [1, "unity(3)^2", "unity(3)"]
[module]
sum = ["w"]
"""

GRAPH = """format = "towerscope-tensor-graph"
version = 1
root = "1"
pattern = ["t"]
[sets.S]
labels = ["1", "s"]
dimensions = [1, 1]
[steps.t]
from = "S"
to = "S"
matrix = [[0, 1], [1, 0]]
"""

SESSION = json.dumps({"format": "towerscope-session", "version": 1, "tower": "symmetric:n=4", "level": 2.5,
                      "node": "(3)", "bookmarks": [{"level": 1, "label": "(3,1)"}],
                      "notes": [{"level": 2, "label": "(4)", "text": "a note"}], "view": {"details": True}})

SEEDS: dict[str, list[str]] = {
    "numbers": ["42", "1_000_000", "10^12", "3*10^12", "1e12", "0"],
    "levels": ["3", "2.5", "5/2", "2+1/2", "0", "10"],
    "partitions": ["(3,1,1)", "3,1,1", "3 1 1", "()", "(2,2)"],
    "pairs": ["((2,1),(1))", "((),())", "(2,1),(1)"],
    "ranks": ["42", "-1", "10^12", "1_000", "3*10^2"],
    "specs": ["symmetric:n=4", "mixed:n=3,word=vdvd", "su2:kind=dihedral,m=3", "symmetric:n=5,module=(4,1)",
              "characters:group=cyclic(4)", "orthogonal:n=3", "alternating:n=5,halves=no"],
    "entries": ["unity(5)+unity(5,4)", "(1+sqrt(5))/2", "sqrt(-3)", "2^10", "-unity(7)^-2", "i*sqrt(2)/3"],
    "tables": ["symmetric(4)", "cyclic(5)", "dihedral(3)"],
    "labels": ["(3,1)", "(2,2)", "((1),(1))", "2", "(2,1)"],
    "paths": ["(4) (3) (4) (3) (3,1)", "1,2,4/3", "+1 +1 -1 +2", "(4) → (3) → (3,1)", "∅"],
    "toml": [GRAPH, TABLE],
    "table-files": [TABLE],
    "graph-files": [GRAPH],
    "sessions": [SESSION],
}


def mutate(rng: random.Random, text: str) -> str:
    for _ in range(rng.randint(1, 4)):
        kind = rng.randrange(9)
        pos = rng.randint(0, len(text))
        if kind == 0:
            text = text[:pos] + rng.choice(HOSTILE) + text[pos:]
        elif kind == 1 and text:
            end = min(len(text), pos + rng.randint(1, 5))
            text = text[:pos] + text[end:]
        elif kind == 2 and text:
            end = min(len(text), pos + rng.randint(1, 8))
            text = text[:pos] + text[pos:end] * rng.choice([2, 10, 100, 1000, 10**4, 3 * 10**4]) + text[end:]
        elif kind == 3:
            depth = rng.choice([10, 100, 1000, 10**4])
            opener, closer = rng.choice([("(", ")"), ("[", "]"), ("{", "}"), ("-", ""), ("sqrt(", ")")])
            text = opener * depth + text + closer * depth
        elif kind == 4:
            text = text[:pos] + "9" * rng.choice([20, 400, 5000, 10**5, 2 * 10**5]) + text[pos:]
        elif kind == 5:
            text = text[:pos] + rng.choice(["^", "**", "e", "*10^"]) + str(rng.choice([9, 99, 10**4, 10**9, 10**99])) + text[pos:]
        elif kind == 6 and text:
            digits = [i for i, ch in enumerate(text) if ch.isdigit()]
            if digits:
                i = rng.choice(digits)
                text = text[:i] + rng.choice(["²", "₃", "①", "٣", "⁹"]) + text[i + 1:]
        elif kind == 7:
            text = text[:pos] + chr(rng.randrange(0x20, 0x3000)) + text[pos:]
        else:
            text = text[:pos] + rng.choice(["unity(997)*unity(991)", "sqrt(2003)", "(1+unity(720))^9999", "2^9999^9"]) + text[pos:]
    return text


# ----- the parsers, as functions of one string (run in the worker) --------------------------------
def _parsers():
    from engine.algebraic import parse_number
    from engine.character_tables import builtin_table
    from engine.encodings import get_encoding
    from engine.files.character_table import read_character_file
    from engine.files.session import parse_session
    from engine.files.tensor_graph import read_tensor_graph
    from engine.files.toml_checks import parse_toml
    from engine.levels import parse_level
    from engine.numbers_in import read_big
    from engine.partition_pairs import parse_pair
    from engine.partitions import parse_partition
    from engine.paths import parse_rank
    from engine.specs import parse_spec

    folder = Path(tempfile.mkdtemp(prefix="fuzz-"))
    s4 = parse_spec("symmetric:n=4")
    mixed = parse_spec("mixed:n=3,word=vdvd")
    gl3 = parse_spec("general-linear:n=3")
    encodings = [(s4, get_encoding(s4, name)) for name in ("labels", "updown", "vacillating")]
    encodings.append((gl3, get_encoding(gl3, "tableau")))

    def through_file(reader, suffix):
        def run(text: str):
            path = folder / f"f{suffix}"
            path.write_text(text, encoding="utf-8", errors="surrogatepass")
            return reader(path)
        return run

    def each(readers, text: str):
        """Every reader on the text: a refusal when all refuse (each refusal checked)."""
        from engine.errors import UserError

        refused = None
        answered = False
        for read in readers:
            try:
                read(text)
                answered = True
            except UserError as exc:
                _check_message(exc)
                refused = exc
        if not answered and refused is not None:
            raise refused

    def paths(text: str):
        each([lambda t, tw=tower, e=encoding: e.path_from_text(tw, t) for tower, encoding in encodings], text)

    def labels(text: str):
        each([lambda t, tw=tower, i=index: tw.parse(t, i) for tower, index in ((s4, 4), (s4, 3), (mixed, 2))], text)

    return {
        "numbers": lambda t: read_big(t, "n"),
        "levels": parse_level,
        "partitions": parse_partition,
        "pairs": parse_pair,
        "ranks": lambda t: parse_rank(t, 10**40),
        "specs": parse_spec,
        "entries": parse_number,
        "tables": builtin_table,
        "labels": labels,
        "paths": paths,
        "toml": lambda t: parse_toml(t, "f.toml"),
        "table-files": through_file(read_character_file, ".toml"),
        "graph-files": through_file(read_tensor_graph, ".toml"),
        "sessions": parse_session,
    }


class _TimeUp(BaseException):
    pass


def _alarm(signum, frame):
    raise _TimeUp()


def _check_message(exc: BaseException) -> None:
    text = str(exc)
    if "\n" in text or len(text) > 500:
        raise AssertionError(f"refusal breaks the one-line rule ({len(text)} characters)")


_PARSERS = None
_INIT_ERROR = ""


def _init() -> None:
    global _PARSERS, _INIT_ERROR
    try:
        sys.set_int_max_str_digits(0)  # as the CLI and the explorer run
        signal.signal(signal.SIGALRM, _alarm)
        _PARSERS = _parsers()  # imports first: the cap is for the inputs, not for the modules
        resource.setrlimit(resource.RLIMIT_AS, (MEMORY_CAP, MEMORY_CAP))
    except Exception as exc:  # noqa: BLE001 - reported by the first chunk, never a respawn loop
        _INIT_ERROR = f"{type(exc).__name__}: {exc}"


def inputs_for(name: str, seed: int, start: int, stop: int) -> list[str]:
    """Inputs start..stop-1 of a parser: the seeds first, then mutations (each from its own
    generator, so a worker makes them without the parent holding them all)."""
    seeds = SEEDS[name]
    out = []
    for i in range(start, stop):
        rng = random.Random(f"{seed}:{name}:{i}")
        out.append(seeds[i] if i < len(seeds) else mutate(rng, rng.choice(seeds)))
    return out


def _run_chunk(job: tuple[str, int, int, int]) -> list[tuple[str, float, str]]:
    from engine.errors import UserError

    name, seed, first, stop = job
    if _PARSERS is None:
        return [(f"traceback:worker could not start: {_INIT_ERROR}", 0.0, "")] * (stop - first)
    parse = _PARSERS[name]
    out = []
    for text in inputs_for(name, seed, first, stop):
        start = time.perf_counter()
        signal.alarm(TIME_CAP)
        try:
            parse(text)
            outcome = "answer"
        except _TimeUp:
            outcome = "hang"
        except MemoryError:
            outcome = "memory"
        except UserError as exc:
            try:
                _check_message(exc)
                outcome = "refusal"
            except AssertionError as bad:
                outcome = f"traceback:{bad}"
        except Exception:  # noqa: BLE001 - that is what we count
            outcome = "traceback:" + traceback.format_exc(limit=3).strip().splitlines()[-1][:200]
        finally:
            signal.alarm(0)
        out.append((outcome, time.perf_counter() - start, text[:80]))
    return out


def main() -> None:
    count = int(sys.argv[1]) if len(sys.argv) > 1 else 10_000
    seed = int(sys.argv[2]) if len(sys.argv) > 2 else 1
    chosen = sys.argv[3].split(",") if len(sys.argv) > 3 else list(SEEDS)
    print(f"fuzzing {len(chosen)} parsers, {count:,} inputs each (seed {seed}; caps {TIME_CAP} s and "
          f"{MEMORY_CAP // 1024**3} GB per input)")
    totals = {"tried": 0, "traceback": 0, "hang": 0, "memory": 0}
    with multiprocessing.get_context("fork").Pool(1, initializer=_init, maxtasksperchild=20) as pool:
        for name in chosen:
            started = time.perf_counter()
            tally: dict[str, int] = {"answer": 0, "refusal": 0, "traceback": 0, "hang": 0, "memory": 0}
            slowest = (0.0, "")
            seen: dict[str, str] = {}
            chunks = [(name, seed, i, min(count, i + CHUNK)) for i in range(0, count, CHUNK)]
            for result in pool.imap(_run_chunk, chunks):
                for outcome, seconds, text in result:
                    kind = outcome.split(":", 1)[0]
                    tally[kind] += 1
                    if kind == "traceback" and outcome not in seen:
                        seen[outcome] = text
                    if seconds > slowest[0]:
                        slowest = (seconds, text)
            wall = time.perf_counter() - started
            print(f"{name:12} tried {count:6,}  answers {tally['answer']:6,}  refusals {tally['refusal']:6,}  "
                  f"tracebacks {tally['traceback']:3}  hangs>10s {tally['hang']:3}  over 2 GB {tally['memory']:3}  "
                  f"slowest {slowest[0]:6.3f} s  ({wall:5.1f} s in all)")
            if slowest[0] > 1:
                print(f"{'':12} slowest input starts {slowest[1][:60]!r}")
            for outcome, text in list(seen.items())[:5]:
                print(f"{'':12} {outcome[10:]}  <- {text[:60]!r}")
            totals["tried"] += count
            totals["traceback"] += tally["traceback"]
            totals["hang"] += tally["hang"]
            totals["memory"] += tally["memory"]
    print(f"in all: {totals['tried']:,} inputs, {totals['traceback']} tracebacks, {totals['hang']} hangs over "
          f"{TIME_CAP} s, {totals['memory']} runs over 2 GB")


if __name__ == "__main__":
    os.environ.setdefault("PYTHONHASHSEED", "0")
    main()
