"""The explorer: the Textual app, its screens and widgets; it asks the engine, holds no mathematics."""
