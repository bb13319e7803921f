"""Cell modules of the towers' diagram algebras, their Gram determinants and semisimplicity.

- ``specht``: Specht modules of S_t in Young's seminormal form (exact rational matrices, the form);
- ``half_diagrams``: the top halves of basis diagrams, which index the cell modules' bases;
- ``labels``: the cell labels of a level, how they are read, and the tower node each belongs to;
- ``modules``: a cell module's basis, the action of a diagram, the invariant bilinear form;
- ``gram``: the Gram matrix, its determinant as an exact polynomial in x, its rank at x = N;
- ``report``: one cell's answer, and a level's semisimplicity report checked against the tower.
"""
