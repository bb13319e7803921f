"""``towerscope algebra``, ``kernel`` and ``act`` through main(argv) (cli-contract.md, "Centralizer
algebras"); exit statuses and messages through a subprocess."""

from __future__ import annotations

import pytest

from tests.cli.conftest import run_process


def test_algebra_json_is_the_contract_example(run_json):
    # the contract's example document; 1094 = Σ_{j≤3} S(8, j) (OEIS A008277 row sums), 4140 = Bell(8) (A000110)
    doc = run_json("algebra", "symmetric:n=3", "--level", "4")
    assert {k: doc[k] for k in ("tower", "level", "algebra", "parameter", "basis", "rank", "kernel", "rank_method")} == {
        "tower": "symmetric:n=3", "level": 4, "algebra": "P_4(3)", "parameter": 3,
        "basis": 4140, "rank": 1094, "kernel": 3046, "rank_method": "computed"}


@pytest.mark.parametrize("spec,level,name,parameter,basis,rank", [
    ("symmetric:n=3", "2.5", "P_{2+1/2}(3)", 3, 52, 41),  # Σ_{j≤3} S(5, j) = 1+15+25 (sympy Stirling)
    ("orthogonal:n=3", "4", "B_4(3)", 3, 105, 91),        # Riordan R(8) = 91, OEIS A005043 (from memory)
    ("symplectic:n=4", "3", "B_3(-4)", -4, 15, 14),       # OEIS A005700: C(3)C(5) − C(4)² = 14 (from memory)
    ("symplectic:n=2", "5", "TL_5", -2, 42, 42),          # Catalan(5), OEIS A000108
    ("general-linear:n=2", "4", "CS_4", None, 24, 14),    # Catalan(4): 321-avoiding permutations
    ("mixed:n=2,word=vvdd", "4", "B_{2,2}(2)", 2, 24, 14),  # flipped: End_GL2(V^{⊗4}), Catalan(4)
])
def test_algebra_every_family(run_json, spec, level, name, parameter, basis, rank):
    doc = run_json("algebra", spec, "--level", level)
    assert (doc["algebra"], doc["parameter"], doc["basis"], doc["rank"]) == (name, parameter, basis, rank)
    assert doc["kernel"] == basis - rank and doc["rank_method"] == "computed"


def test_algebra_text_says_when_the_rank_is_from_the_bratteli_diagram(run_cli, run_json):
    # Bell(12) diagrams of P_6(3) are refused up front; the rank is then Σm² (the contract)
    doc = run_json("algebra", "symmetric:n=3", "--level", "6")
    assert doc["rank_method"] == "bratteli" and doc["rank"] == doc["squares"]
    status, out, err = run_cli("algebra", "symmetric:n=3", "--level", "6")
    assert status == 0 and "from the Bratteli diagram" in out and "not computed" in out
    status, out, _ = run_cli("algebra", "symmetric:n=3", "--level", "3")
    assert "computed on the tensor space" in out and "122" in out


def test_kernel_json(run_json):
    # P_2(2): Bell(4) − (S(4,1) + S(4,2)) = 15 − 8 = 7 (sympy Stirling numbers); the generator is the
    # single orbit element with 3 blocks and generates the whole kernel (computed)
    doc = run_json("kernel", "symmetric:n=2", "--level", "2", "--count", "3")
    assert doc["algebra"] == "P_2(2)" and doc["dimension"] == 7 and len(doc["elements"]) == 3
    assert all(set(t) == {"coefficient", "diagram"} for e in doc["elements"] for t in e["terms"])
    assert doc["ideal_dimension"] == 7 and doc["generator_acts_as_zero"] is True
    assert doc["generator_orbit"] == {"terms": [{"coefficient": 1, "diagram": "{1,1'},{2},{2'}"}]}
    assert doc["generator"]["terms"][0] == {"coefficient": 2, "diagram": "{1,2,1',2'}"}


def test_kernel_of_cs3_is_the_antisymmetrizer(run_json):
    # Weyl, The Classical Groups: Λ³C² = 0, so the kernel of CS_3 for n = 2 is spanned by Σ sign(σ)σ
    doc = run_json("kernel", "general-linear:n=2", "--level", "3")
    assert doc["dimension"] == 1
    assert sorted(abs(t["coefficient"]) for t in doc["elements"][0]["terms"]) == [1] * 6
    assert doc["ideal_dimension"] == 1 and "generator_orbit" in doc and doc["generator_orbit"] is None


def test_kernel_faithful_and_without_generator(run_json, run_cli):
    # B_2(3) acts faithfully (3 = Σm², Riordan R(4), OEIS A005043): an empty kernel, no generator
    doc = run_json("kernel", "orthogonal:n=3", "--level", "2")
    assert doc == {"tower": "orthogonal:n=3", "level": 2, "algebra": "B_2(3)", "dimension": 0, "elements": []}
    status, out, _ = run_cli("kernel", "orthogonal:n=2", "--level", "3", "--count", "1")
    assert status == 0 and "no generator of this kernel is known here" in out


def test_kernel_element_test(run_json, run_cli):
    # hand computation: in P_1(1) the difference of the two diagrams acts as zero on C; the identity does not
    doc = run_json("kernel", "symmetric:n=1", "--level", "1", "--element", "{1,1'} - {1},{1'}")
    assert doc["test"]["in_kernel"] is True and doc["test"]["ideal_dimension"] == 1
    status, out, _ = run_cli("kernel", "symmetric:n=1", "--level", "1", "--element", "{1,1'}")
    assert status == 0 and "does not act as zero" in out


def test_act_matrix_and_tensor(run_json, run_cli):
    # hand computation: the flip on C²⊗C² and the symplectic sign (−1 for a transposition in B_k(−n))
    doc = run_json("act", "general-linear:n=2", "--level", "2", "{1,2'},{2,1'}")
    assert doc["space"] == 4 and doc["matrix"] == [[1, 0, 0, 0], [0, 0, 1, 0], [0, 1, 0, 0], [0, 0, 0, 1]]
    doc = run_json("act", "symplectic:n=4", "--level", "2", "{1,2'},{2,1'}", "--tensor", "1,2")
    assert doc["image"] == [{"coefficient": -1, "tensor": [2, 1]}]
    status, out, _ = run_cli("act", "general-linear:n=2", "--level", "2", "{1,2'},{2,1'}", "--tensor", "1 2")
    assert status == 0 and "e1⊗e2 ↦ e2⊗e1" in out


@pytest.mark.parametrize("args,words", [
    (["algebra", "su2:kind=icosahedral", "--level", "2"], "has no diagram algebra"),
    (["kernel", "alternating:n=4", "--level", "2"], "has no diagram algebra"),
    (["act", "general-linear:n=2", "--level", "2", "{1,2'},{2,1'}", "--tensor", "1,3"], "tensor labels run from 1 to 2"),
    (["act", "general-linear:n=2", "--level", "2", "{1,2},{1',2'}"], "not a diagram of CS_2"),
    (["act", "symmetric:n=3", "--level", "5", "{1,1'},{2,2'},{3,3'},{4,4'},{5,5'}"], "--tensor"),
    (["kernel", "symmetric:n=3", "--level", "6"], "too large"),
])
def test_errors_exit_2_with_one_line(args, words):
    # the contract's Errors section: one line on stderr, exit status 2, no traceback
    done = run_process(*args)
    assert done.returncode == 2, done.stderr
    assert words in done.stderr and "Traceback" not in done.stderr and len(done.stderr.strip().splitlines()) == 1


def test_kernel_in_the_orbit_basis(run_json):
    # the 2005 survey of partition algebras, §4: the x_π with more than n blocks span the kernel;
    # in P_2(2) there are Bell(4) − 8 = 7 of them (sympy Stirling numbers: S(4,1) + S(4,2) = 8)
    doc = run_json("kernel", "symmetric:n=2", "--level", "2", "--basis", "orbit", "--count", "100")
    assert doc["basis"] == "orbit" and doc["dimension"] == 7 and len(doc["elements"]) == 7
    assert all(len(e["terms"]) == 1 and e["terms"][0]["diagram"].count("{") > 2 for e in doc["elements"])
