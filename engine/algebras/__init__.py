"""Diagram algebras of the towers' centralizers, computed exactly.

- ``diagrams``: set-partition diagrams as canonical tuples of blocks, their notation and products
  by gluing (union–find), membership in each algebra's basis;
- ``bases``: the basis of each algebra counted by formula and listed by rank (rank/unrank);
- ``elements``, ``products``: integer (or polynomial) combinations of diagrams and their products;
- ``orbit``: the orbit basis of the partition algebra (Möbius inversion on set partitions);
- ``drawing``: a diagram drawn with box characters or as TikZ.

Engine code here takes an ``engine.capabilities.AlgebraLevel`` (or its fields), never a family name.
"""
