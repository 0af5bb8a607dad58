/**
 * The in-cell editor: typing into the active cell, committing into the workbook (then moving
 * like the keys say) or cancelling. A refused edit keeps its cell selected beside the message.
 */
import { a1 } from "../workbook/addresses";
import type { PreviewWorkbook } from "../workbook/previewWorkbook";
import { el } from "../../taskpane/panel/dom";
import { editKey } from "./gridKeys";
import type { GridEvents, GridState } from "./gridState";
import type { GridTable } from "./gridTable";
import { moved, single, type Selection } from "./selection";

export class CellEditor {
  constructor(
    private readonly workbook: PreviewWorkbook,
    private readonly state: GridState,
    private readonly table: GridTable,
    private readonly events: GridEvents,
    /** Selects and focuses a cell after an edit. */
    private readonly setSelection: (next: Selection) => void,
  ) {}

  get isOpen(): boolean {
    return this.state.editor !== undefined;
  }

  /** True when the event target is the editor's own input. */
  owns(target: EventTarget | null): boolean {
    return this.state.editor !== undefined && this.state.editor.input === target;
  }

  /** Opens the editor: with `initial` it replaces the contents, otherwise it edits them. */
  start(initial?: string): void {
    const pos = { ...this.state.sel.active };
    const td = this.table.cellAt(pos);
    if (!td) return;
    const current = this.workbook.input(this.state.sheet, pos.row, pos.col);
    const input = el("input", {
      type: "text",
      class: "cell-editor",
      spellcheck: "false",
      autocomplete: "off",
      "aria-label": `Edit ${a1(pos.row, pos.col)}`,
    });
    input.value = initial ?? (current.spilledFrom ? "" : current.text);
    this.state.editor = { input, pos };
    td.textContent = "";
    td.classList.add("editing");
    td.append(input);
    input.focus();
    input.setSelectionRange(input.value.length, input.value.length);
    this.events.editing(input.value);
    input.addEventListener("input", () => this.events.editing(input.value));
    input.addEventListener("keydown", (e) => {
      const k = editKey(e);
      if (k.type === "commit") {
        e.preventDefault();
        this.commit(input.value, k.dRow, k.dCol);
      } else if (k.type === "cancel") {
        e.preventDefault();
        this.cancel();
        this.table.focusActive();
        this.events.selectionChanged();
      }
      e.stopPropagation();
    });
    input.addEventListener("blur", () => {
      if (this.state.editor?.input === input) this.commit(input.value, 0, 0, false);
    });
  }

  /** Commits what an open editor holds, staying on its cell (a click elsewhere does this). */
  commitOpen(): void {
    if (this.state.editor) this.commit(this.state.editor.input.value, 0, 0);
  }

  /** Writes `text` into the edited (else the active) cell and moves by (dRow, dCol). */
  commit(text: string, dRow: number, dCol: number, focus = true): void {
    const pos = this.state.editor ? this.state.editor.pos : this.state.sel.active;
    this.close();
    const result = this.workbook.setInput(this.state.sheet, pos.row, pos.col, text);
    this.table.paintCell(pos.row, pos.col);
    if (focus) {
      this.setSelection(result.ok ? moved(single(pos), dRow, dCol, false, this.table.rows + 1000, this.table.cols + 100) : single(pos));
    }
    if (!result.ok) this.events.editRefused(result.message);
  }

  cancel(): void {
    const pos = this.state.editor?.pos;
    this.close();
    if (pos) this.table.paintCell(pos.row, pos.col);
  }

  private close(): void {
    if (!this.state.editor) return;
    const { input, pos } = this.state.editor;
    this.state.editor = undefined;
    input.remove();
    this.table.cellAt(pos)?.classList.remove("editing");
  }
}
