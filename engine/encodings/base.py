"""The shape every path encoding has: a bijection between the paths of a tower and written objects
(label sequences, tableaux, up–down sequences), with a one-line text form and a drawing."""

from __future__ import annotations

from abc import ABC, abstractmethod
from typing import Any

from engine.paths import Path, PathError
from engine.tower import Tower

#: characters of a path written as text (a path to a level one can list is far shorter)
MAX_PATH_TEXT = 200_000


class Encoding(ABC):
    """Encode a path as an object, write it as text, read it back, draw it.

    ``decode(tower, read(tower, text(tower, encode(tower, p))))`` gives ``p`` back for every path
    ``p``; decoding only checks the written form, the caller checks the result is a path of the
    diagram (``PathIndex.check``)."""

    #: the name used on the command line (``--encoding NAME``)
    name: str = ""
    #: what a researcher calls the object, e.g. "standard Young tableau"
    title: str = ""
    #: how the text form is written, for help texts
    syntax: str = ""

    @abstractmethod
    def encode(self, tower: Tower, path: Path) -> Any:
        """The object that stands for ``path``."""

    @abstractmethod
    def decode(self, tower: Tower, value: Any) -> Path:
        """The path an object stands for; PathError when the object is malformed."""

    @abstractmethod
    def text(self, tower: Tower, value: Any) -> str:
        """The one-line text form of an object."""

    @abstractmethod
    def read(self, tower: Tower, text: str) -> Any:
        """The object written as ``text``; PathError with the expected syntax otherwise."""

    def draw(self, tower: Tower, value: Any) -> list[str]:
        """Lines of a drawing (box characters for tableaux)."""
        return [self.text(tower, value)]

    # ----- conveniences ---------------------------------------------------------------------
    def path_text(self, tower: Tower, path: Path) -> str:
        return self.text(tower, self.encode(tower, path))

    def path_from_text(self, tower: Tower, text: str) -> Path:
        if len(text) > MAX_PATH_TEXT:
            raise PathError(f"a path written in {len(text):,} characters is too long to read (at most {MAX_PATH_TEXT:,})")
        return self.decode(tower, self.read(tower, text))
