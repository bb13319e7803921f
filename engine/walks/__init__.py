"""Walks on the McKay graph of a finite tower: the tensor-product Markov chain (``chain.py``),
its graph structure (``graph.py``), the critical group (``critical.py``), chip-firing
(``chips.py``) and the graph drawn in text cells (``graph_layout.py`` places, ``graph_picture.py``
draws)."""
