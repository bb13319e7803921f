"""Walks on the McKay graph of a finite tower: the tensor-product Markov chain (``chain.py``),
its graph structure (``graph.py``), the critical group (``critical.py``) and chip-firing
(``chips.py``)."""
