"""Finite towers as sequences: generating functions, closed forms over eigenvalues, growth.

``finite.py`` reads a tower's repeating step (``FiniteSteps``) into one exact view shared with
``engine.walks``; ``rational.py`` the generating functions N(t)/D(t); ``eigen_sums.py`` the closed
form over the character values of V; ``power_sums.py`` the closed form over the rational eigenvalues
of the whole step, read off N(t)/D(t) (towers with half levels: m(k+1/2)); ``growth.py`` the leading
term d_i·(dim V)^k/|G|."""
