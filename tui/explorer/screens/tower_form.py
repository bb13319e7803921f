"""Open another tower: pick a family, fill in its keys; the spec is checked as it is typed."""

from __future__ import annotations

import re

from rich.text import Text
from textual import on
from textual.app import ComposeResult
from textual.binding import Binding
from textual.containers import Vertical, VerticalScroll
from textual.screen import ModalScreen
from textual.widgets import Input, Label, Select, Static

from engine.errors import UserError
from engine.specs import Family, families, parse_spec, split_spec


def _field_id(key: str) -> str:
    return "key-" + re.sub(r"[^A-Za-z0-9_-]", "_", key)


class TowerForm(ModalScreen[str | None]):
    """Dismissed with a valid tower spec, or None."""

    BINDINGS = [
        Binding("escape", "dismiss_none", "cancel", key_display="Esc"),
        Binding("tab", "field(1)", show=False, priority=True),
        Binding("shift+tab", "field(-1)", show=False, priority=True),
    ]

    def __init__(self, current_spec: str = "", **kwargs: object) -> None:
        super().__init__(**kwargs)  # type: ignore[arg-type]
        self.opened_spec = current_spec
        self.families: dict[str, Family] = families()
        try:
            self.current_family, self.current_values = split_spec(current_spec)
        except UserError:
            self.current_family, self.current_values = "", {}
        if self.current_family not in self.families:
            self.current_family = next(iter(self.families), "")
            self.current_values = {}
        self._generation = 0

    def compose(self) -> ComposeResult:
        options = [(f"{f.name}: {f.summary}", f.name) for f in self.families.values()]
        with Vertical(classes="dialog tower-dialog"):
            yield Static(Text("Open another tower"), classes="dialog-title")
            with VerticalScroll(id="tower-body"):
                yield Label("family")
                yield Select(options, value=self.current_family, allow_blank=False, id="family")
                yield Vertical(id="keys")
            yield Static("", id="spec-preview", classes="dialog-hint")
            yield Static("", id="spec-error", classes="dialog-error")
            yield Static(Text("Enter: open   Tab: next key   shift+Tab: back to the family   Esc: cancel"),
                         classes="dialog-keys")

    async def on_mount(self) -> None:
        await self._fill_keys(self.current_family, self.current_values)

    async def _fill_keys(self, name: str, values: dict[str, str]) -> None:
        family = self.families[name]
        box = self.query_one("#keys", Vertical)
        await box.remove_children()
        self._generation += 1
        fields = []
        for key, help_text in family.keys.items():
            required = " (required)" if key in family.required else ""
            fields.append(Label(Text(f"{key}{required}: {help_text}"), classes="key-label"))
            field = Input(values.get(key, ""), placeholder=key, id=_field_id(key), classes="key-input")
            field.cursor_blink = False
            fields.append(field)
        if not family.keys:
            fields.append(Label(Text("this family has no keys")))
        await box.mount_all(fields)
        inputs = box.query(Input)
        if inputs:
            inputs.first().focus()
        self._check()

    def spec(self) -> str:
        family = self.families[str(self.query_one("#family", Select).value)]
        parts = []
        for key in family.keys:
            found = self.query(f"#{_field_id(key)}")
            if found:
                value = found.first(Input).value.strip()
                if value:
                    parts.append(f"{key}={value}")
        return family.name + (":" + ",".join(parts) if parts else "")

    def _check(self) -> str | None:
        """The spec when it names a tower, else None; the preview and the error are updated."""
        spec = self.spec()
        self.query_one("#spec-preview", Static).update(Text(f"spec: {spec}"))
        status = self.query_one("#spec-error", Static)
        try:
            parse_spec(spec)
        except UserError as exc:
            status.set_classes("dialog-error")
            status.update(Text(f"✗ {exc}"))
            return None
        status.set_classes("dialog-ok")
        if spec == self.opened_spec:
            status.update(Text("✓ the tower open now: change a key to open another"))
        else:
            status.update(Text("✓ a valid tower: Enter opens it"))
        return spec

    @on(Select.Changed, "#family")
    async def _family_changed(self, event: Select.Changed) -> None:
        name = str(event.value)
        values = self.current_values if name == self.current_family else {}
        await self._fill_keys(name, values)

    @on(Input.Changed, ".key-input")
    def _changed(self) -> None:
        self._check()

    @on(Input.Submitted, ".key-input")
    def _submitted(self) -> None:
        spec = self._check()
        if spec is not None and spec != self.opened_spec:
            self.dismiss(spec)

    def action_field(self, step: int) -> None:
        """Tab moves through the key fields without wrapping into the family selector; shift+Tab from
        the first field goes back to it."""
        fields = list(self.query(".key-input").results(Input))
        focused = self.focused
        if focused in fields:
            n = fields.index(focused) + step
            if n < 0:
                self.query_one("#family", Select).focus()
            else:
                fields[min(n, len(fields) - 1)].focus()
        elif step > 0 and fields:
            fields[0].focus()

    def action_dismiss_none(self) -> None:
        self.dismiss(None)
