"""The algebra view (key a) driven with Pilot: the diagrams of P_3(3) by rank and drawn, a product,
the rank of the action computed beside Σm², the kernel, and the cell modules against the tower.

Outside values: P_k(N) has Bell(2k) diagrams (OEIS A000110: Bell(6) = 203); the centralizer of S_3
on (C^3)^{⊗3} has dimension Σ_{j≤3} S(6, j) = 1 + 31 + 90 = 122 (Stirling numbers of the second
kind, sympy), so the kernel has dimension 203 − 122 = 81; e_1 = {1,2},{1',2'} satisfies
e_1·e_1 = N·e_1 (the loop value; from memory, the defining relations of the partition algebra)."""

from __future__ import annotations

from sympy.functions.combinatorial.numbers import bell, stirling

from tui.explorer.screens.algebra import AlgebraView

from .conftest import app_on, settle


def text(app, widget_id: str) -> str:  # noqa: ANN001
    return str(app.screen.query_one(widget_id).render())


async def go_to_level(pilot, level: str) -> None:  # noqa: ANN001
    await pilot.press("g")
    await pilot.press(*level, "enter")
    await settle(pilot)


async def open_algebra_view(app, pilot, level: str) -> None:  # noqa: ANN001
    await settle(pilot)
    await go_to_level(pilot, level)
    await pilot.press("a")
    await settle(pilot)
    assert isinstance(app.screen, AlgebraView)


async def test_the_algebra_view_of_p3_at_3() -> None:
    app = app_on("symmetric:n=3", search_faithful=False)
    async with app.run_test(size=(80, 24)) as pilot:
        await open_algebra_view(app, pilot, "3")
        summary = text(app, "#algebra-summary")
        assert f"{int(bell(6))} basis diagrams" in summary and "parameter x = 3" in summary
        squares = sum(int(stirling(6, j)) for j in range(1, 4))
        assert f"= {squares}" in summary and f"kernel of dimension {203 - squares}" in summary
        assert "diagram 0 of 0..202" in text(app, "#algebra-diagram")
        await pilot.press("down", "down")
        assert "diagram 2 of" in text(app, "#algebra-diagram")
        # e_1 · e_1 = 3·e_1
        await pilot.press("g")
        await pilot.press(*"{1,2},{1',2'},{3,3'}", "enter")
        await pilot.press("1", "2")
        product = text(app, "#algebra-product")
        assert "= 3*{1,2},{3,3'},{1',2'}" in product
        # the rank, by linear algebra, equals Σm²
        await pilot.press("r")
        await settle(pilot)
        assert f"computed by exact linear algebra): {squares} = Σm² ✓" in text(app, "#algebra-summary")
        # the kernel: its dimension
        await pilot.press("k")
        await settle(pilot)
        kernel = text(app, "#algebra-kernel")
        assert f"dimension {203 - squares}" in kernel
        assert "generator: the orbit-basis element" in kernel and "= the kernel's dimension ✓" in kernel
        # the cell modules: ranks at N agree with the tower
        await pilot.press("c")
        await settle(pilot)
        cells = text(app, "#algebra-cells")
        assert "not semisimple at x = 0, 1, 2, 3, 4" in cells  # P_3(x): x in {0, ..., 2k−2} (from memory)
        assert "agree with the tower's multiplicities on every node" in cells
        await pilot.press("escape")
        await settle(pilot)
        assert not isinstance(app.screen, AlgebraView)


async def test_a_family_without_an_algebra_says_so() -> None:
    app = app_on("su2:kind=icosahedral", search_faithful=False)
    async with app.run_test(size=(80, 24)) as pilot:
        await settle(pilot)
        await pilot.press("a")
        await settle(pilot)
        assert not isinstance(app.screen, AlgebraView)


async def test_details_show_the_nodes_cell_module() -> None:
    # S_3 at level 3: the trivial node (3) has multiplicity Σ_{t≤3} S(3,t) = Bell(3) = 5 (one S_3-orbit
    # of [3]^3 per set partition; OEIS A000110); its cell module is the one of λ̄ = () of P_3(3) (the
    # contract's matching (N − |λ̄|, λ̄)), spanned by the half diagrams with no propagating block:
    # the set partitions of [3], Bell(3) = 5 of them
    app = app_on("symmetric:n=3", search_faithful=False)
    async with app.run_test(size=(120, 40)) as pilot:
        await settle(pilot)
        await go_to_level(pilot, "3")
        details = str(app.screen.query_one("#details-text").render())
        assert app.state.node == (3,)
        assert "cell module () of P_3(3), dimension 5" in " ".join(details.split())
        assert "rank of its Gram form at x = 3: 5 = m ✓" in " ".join(details.split())


async def test_the_drawing_follows_the_terminal_width() -> None:
    # P_21(30): 21 strands are drawn 4 columns apart when there is room (160 columns), closer
    # together at 80 columns; a resize draws the shown diagram and the product again
    app = app_on("symmetric:n=30", search_faithful=False)
    async with app.run_test(size=(80, 24)) as pilot:
        await open_algebra_view(app, pilot, "21")
        await pilot.press("1", "2")

        def widest(widget_id: str) -> int:  # the drawing's lines: after the diagram's (the product's) notation
            skip = 2 if widget_id == "#algebra-product" else 1
            return max(len(line) for line in text(app, widget_id).splitlines()[skip:])

        narrow = widest("#algebra-diagram"), widest("#algebra-product")
        assert max(narrow) <= 80 - 6
        await pilot.resize_terminal(160, 48)
        await settle(pilot)
        wide = widest("#algebra-diagram"), widest("#algebra-product")
        assert wide[0] > narrow[0] and wide[1] > narrow[1] and max(wide) <= 160 - 6
        await pilot.resize_terminal(80, 24)
        await settle(pilot)
        assert (widest("#algebra-diagram"), widest("#algebra-product")) == narrow
