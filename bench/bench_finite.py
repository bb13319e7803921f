"""Speed of the finite-tower work (run by hand: uv run python bench/bench_finite.py).

Targets (issue 12): level 10^6 of su2:kind=icosahedral, every node, under 1 s, against a plain
Python repeated squaring of the same 9×9 matrix (ratio printed); the generating function of every
node of characters:group=symmetric(8) (22 irreducibles) under 2 s; walk --steps 1000 on
characters:group=symmetric(10),module=(9,1), exact, under 5 s.  Each target is timed on a fresh
tower (its step matrices, Krylov vectors and character table included).  Also: the closed forms over
the whole step's eigenvalues of every node of symmetric:n=8 (whole and half levels) against the
series alone and against the S_N closed form of engine/closed_forms.py; the McKay graph picture at
the explorer's sizes (no target: it runs on the UI thread, so it should stay well under 0.1 s).
"""

from __future__ import annotations

import sys
import time

from engine.capabilities import FiniteSteps
from engine.specs import parse_spec

sys.set_int_max_str_digits(0)


def timed(work) -> tuple[float, object]:
    start = time.perf_counter()
    result = work()
    return time.perf_counter() - start, result


def report(label: str, spent: float, target: float | None = None, extra: str = "") -> None:
    verdict = "" if target is None else f"(target {target} s) {'ok' if spent <= target else 'SLOW'}"
    print(f"{label:58s} {spent:7.3f} s  {verdict} {extra}")


def plain_python_level(matrix: list[list[int]], root: int, k: int) -> list[int]:
    """e_root·M^k by repeated squaring with Python ints and loops (the floor we compare with)."""
    n = len(matrix)

    def mul(a, b):
        return [[sum(a[i][t] * b[t][j] for t in range(n) if a[i][t]) for j in range(n)] for i in range(n)]

    vector = [1 if i == root else 0 for i in range(n)]
    power, e = matrix, k
    while e:
        if e & 1:
            vector = [sum(vector[t] * power[t][j] for t in range(n)) for j in range(n)]
        e >>= 1
        if e:
            power = mul(power, power)
    return vector


def main() -> None:
    # 1. level 10^6 of su2:kind=icosahedral
    from engine.jumps import level_vector, matrix_level_vector

    def ours():
        steps = parse_spec("su2:kind=icosahedral").capability(FiniteSteps)
        return level_vector(steps, 10 ** 6)

    spent, vector = timed(ours)
    digits = max(len(str(x)) for x in vector)
    report("su2:kind=icosahedral level 10^6, all nodes (jumps)", spent, 1.0, f"({digits:,} digits)")
    steps = parse_spec("su2:kind=icosahedral").capability(FiniteSteps)
    flint_spent, same = timed(lambda: matrix_level_vector(steps, 10 ** 6))
    assert same == vector
    report("  the same by fmpz_mat squaring", flint_spent)
    whole = steps.whole_step()
    plain_spent, plain = timed(lambda: plain_python_level([list(r) for r in whole.matrix], steps.root_position, 10 ** 6))
    assert plain == vector
    report("  the same by plain-Python squaring", plain_spent, extra=f"ratio plain/ours = {plain_spent / spent:.1f}")

    # 2. series of every node of S_8's character tower
    from engine.series.finite import finite_view
    from engine.series.rational import all_series

    def series():
        tower = parse_spec("characters:group=symmetric(8),module=(7,1)")
        return all_series(finite_view(tower, "bench"))

    spent, found = timed(series)
    report(f"series of every node, characters:group=symmetric(8) ({len(found)} nodes)", spent, 2.0)

    # 3. the exact walk
    from engine.walks.chain import walk

    def walking():
        tower = parse_spec("characters:group=symmetric(10),module=(9,1)")
        return walk(finite_view(tower, "bench"), 1000)

    spent, w = timed(walking)
    report("walk --steps 1000, characters:group=symmetric(10),module=(9,1)", spent, 5.0,
           f"(distance at 1000 has {len(str(w.total_variation[-1].denominator)):,} digits below the bar)")

    # 4. closed forms of every node of a tower with half levels
    from engine.closed_forms import symmetric_closed_form
    from engine.partitions import parse_partition
    from engine.series.power_sums import power_sum

    def closed_forms():
        found = all_series(finite_view(parse_spec("symmetric:n=8"), "bench"))
        return found, [power_sum(s) for s in found]

    spent, (found, forms) = timed(closed_forms)
    alone, _ = timed(lambda: all_series(finite_view(parse_spec("symmetric:n=8"), "bench")))
    symmetric_closed_form.cache_clear()
    direct, _ = timed(lambda: [symmetric_closed_form(8, parse_partition(s.label), s.half) for s in found])
    report(f"closed forms over eigenvalues, symmetric:n=8 ({len(forms)} nodes)", spent,
           extra=f"ratio to the series alone = {spent / alone:.2f}, to engine/closed_forms = {spent / direct:.1f}")

    # 5. the McKay graph picture at the explorer's sizes
    from engine.walks.graph_picture import draw_graph

    for spec, size in (("su2:kind=icosahedral", (79, 19)), ("characters:group=symmetric(5),module=(4,1)", (79, 19)),
                       ("characters:group=symmetric(7),module=(6,1)", (159, 43)),
                       ("characters:group=symmetric(8),module=(7,1)", (159, 43))):
        view = finite_view(parse_spec(spec), "bench")
        args = (view.labels, view.dimensions, view.matrix, view.root, *size)
        spent, drawn = timed(lambda: draw_graph.__wrapped__(*args))
        what = f"{drawn.width}x{drawn.height}" if hasattr(drawn, "rows") else "refused, " + drawn.reason
        report(f"McKay graph picture {spec} in {size[0]}x{size[1]}", spent, extra=f"({what})")


if __name__ == "__main__":
    main()
