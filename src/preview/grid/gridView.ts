/**
 * The workbook grid: one sheet as a table of cells with a roving focus, mouse and keyboard
 * selection, and an in-cell editor. Values come from the PreviewWorkbook; spilled arrays and
 * errors are styled, an error's message is the cell's title.
 */
import { a1, columnLetters } from "../workbook/addresses";
import { DecorStore, formatNumber, type CellDecor } from "../workbook/cellDecor";
import type { CellRect, CellView, PreviewWorkbook } from "../workbook/previewWorkbook";
import { el } from "../../taskpane/panel/dom";
import { editKey, gridAction } from "./gridKeys";
import { contains, moved, rectOf, single, type CellPos, type Selection } from "./selection";

/** Extra empty rows and columns shown past the used area, so there is room to type. */
const SPARE_ROWS = 12;
const SPARE_COLS = 3;
const MIN_ROWS = 40;
const MIN_COLS = 12;
const DEFAULT_WIDTH = 92;
const ROW_HEAD_WIDTH = 44;

export interface GridEvents {
  /** The selection or the sheet changed. */
  selectionChanged(): void;
  /** A cell is being edited; `text` is what is typed so far (for the formula bar). */
  editing(text: string): void;
  /** An edit was refused (the message says why). */
  editRefused(message: string): void;
}

export class GridView {
  readonly element: HTMLElement;
  private readonly table: HTMLTableElement;
  private cells: HTMLTableCellElement[][] = [];
  private rows = 0;
  private cols = 0;
  private sheetName = "";
  private sel: Selection = single({ row: 0, col: 0 });
  private readonly selections = new Map<string, Selection>();
  private readonly widths = new Map<string, Record<number, number>>();
  private dragging = false;
  private editor?: { input: HTMLInputElement; pos: CellPos };

  constructor(
    private readonly workbook: PreviewWorkbook,
    private readonly events: GridEvents,
    private readonly decor: DecorStore = new DecorStore(),
    id = "sheet-grid",
  ) {
    this.table = el("table", { class: "grid", role: "grid", id, "aria-multiselectable": "true" });
    this.element = el("div", { class: "grid-scroll" }, this.table);
    this.table.addEventListener("keydown", (e) => this.onKey(e));
    this.table.addEventListener("mousedown", (e) => this.onMouseDown(e));
    this.table.addEventListener("mouseover", (e) => this.onMouseOver(e));
    this.table.addEventListener("dblclick", (e) => {
      if (this.posOf(e.target)) this.startEdit();
    });
    window.addEventListener("mouseup", () => (this.dragging = false));
  }

  get sheet(): string {
    return this.sheetName;
  }

  get selection(): Selection {
    return this.sel;
  }

  selectedRect(): CellRect {
    return rectOf(this.sel);
  }

  /** Column widths in pixels for one sheet (column index -> width). */
  setColumnWidths(sheet: string, widths: Record<number, number>): void {
    this.widths.set(sheet, { ...(this.widths.get(sheet) ?? {}), ...widths });
    if (sheet === this.sheetName) this.build();
  }

  showSheet(name: string): void {
    if (this.sheetName) this.selections.set(this.sheetName, this.sel);
    this.cancelEdit();
    this.sheetName = name;
    this.sel = this.selections.get(name) ?? single({ row: 0, col: 0 });
    this.table.setAttribute("aria-label", `Sheet ${name}`);
    this.build();
    this.element.scrollTo({ top: 0, left: 0 });
    this.revealActive();
    this.events.selectionChanged();
  }

  /** Selects a range (growing the shown area if needed) and moves the focus to its first cell. */
  select(rect: CellRect, focus = true): void {
    this.sel = { anchor: { row: rect.top, col: rect.left }, active: { row: rect.top, col: rect.left } };
    if (rect.bottom !== rect.top || rect.right !== rect.left) {
      this.sel = { anchor: { row: rect.bottom, col: rect.right }, active: { row: rect.top, col: rect.left } };
    }
    if (rect.bottom >= this.rows || rect.right >= this.cols) this.build(rect.bottom + 1, rect.right + 1);
    this.paintSelection();
    if (focus) this.focusActive();
    else this.revealActive();
    this.events.selectionChanged();
  }

  /** Re-reads every shown cell (after edits or writes); grows the table when the sheet grew. */
  refresh(): void {
    if (!this.workbook.sheetNames().includes(this.sheetName)) return;
    const size = this.workbook.size(this.sheetName);
    if (size.rows + SPARE_ROWS > this.rows || size.cols + SPARE_COLS > this.cols) {
      this.build();
      return;
    }
    for (let r = 0; r < this.rows; r++) for (let c = 0; c < this.cols; c++) this.paintCell(r, c);
  }

  focusActive(): void {
    this.cellAt(this.sel.active)?.focus();
  }

  /** Scrolls the active cell into view without moving the focus. */
  revealActive(): void {
    this.cellAt(this.sel.active)?.scrollIntoView({ block: "nearest", inline: "nearest" });
  }

  private build(minRows = 0, minCols = 0): void {
    const size = this.workbook.size(this.sheetName);
    const hadFocus = this.table.contains(document.activeElement);
    this.rows = Math.max(MIN_ROWS, size.rows + SPARE_ROWS, minRows, this.sel.active.row + 1);
    this.cols = Math.max(MIN_COLS, size.cols + SPARE_COLS, minCols, this.sel.active.col + 1);
    const widths = this.widths.get(this.sheetName) ?? {};
    const colgroup = el("colgroup", {}, el("col", { style: `width:${ROW_HEAD_WIDTH}px` }));
    let tableWidth = ROW_HEAD_WIDTH;
    const headRow = el("tr", {}, el("th", { class: "corner" }, el("span", { class: "visually-hidden", text: "Row" })));
    for (let c = 0; c < this.cols; c++) {
      const w = widths[c] ?? DEFAULT_WIDTH;
      tableWidth += w;
      colgroup.append(el("col", { style: `width:${w}px` }));
      const th = el("th", { scope: "col", class: "col-head", text: columnLetters(c) });
      th.dataset.col = String(c);
      th.title = `Select the used part of column ${columnLetters(c)}`;
      headRow.append(th);
    }
    const body = el("tbody");
    this.cells = [];
    for (let r = 0; r < this.rows; r++) {
      const tr = el("tr", {}, el("th", { scope: "row", class: "row-head", text: String(r + 1) }));
      const line: HTMLTableCellElement[] = [];
      for (let c = 0; c < this.cols; c++) {
        // No role or tabindex per cell: a td in a role="grid" table is a grid cell already, and only
        // the active cell is focusable (roving focus). This keeps thousands of cells light.
        const td = el("td");
        td.dataset.cell = a1(r, c);
        tr.append(td);
        line.push(td);
      }
      this.cells.push(line);
      body.append(tr);
    }
    this.table.replaceChildren(colgroup, el("thead", {}, headRow), body);
    this.table.style.width = `${tableWidth}px`;
    this.table.setAttribute("aria-rowcount", String(this.rows + 1));
    this.table.setAttribute("aria-colcount", String(this.cols + 1));
    for (let r = 0; r < this.rows; r++) for (let c = 0; c < this.cols; c++) this.paintCell(r, c);
    this.paintSelection();
    if (hadFocus) this.focusActive();
  }

  private paintCell(r: number, c: number): void {
    const td = this.cells[r][c];
    if (this.editor && this.editor.pos.row === r && this.editor.pos.col === c) return;
    const view = this.workbook.cell(this.sheetName, r, c);
    const right = c + 1 < this.cols ? this.workbook.cell(this.sheetName, r, c + 1) : undefined;
    const decor = this.decor.get(this.sheetName, r, c);
    const flag = view.kind === "number" ? this.decor.flagged(this.sheetName, r, c, view.value as number) : undefined;
    const text = view.kind === "number" && decor?.format ? formatNumber(view.value as number, decor.format) : view.text;
    td.className = cellClasses(view, right, decor, flag !== undefined);
    if (td.classList.contains("overflow")) {
      // Long text runs on over the empty cells to its right, and stops at the next cell in use.
      td.replaceChildren(el("span", { class: "overflow-text", style: `max-width:${this.overflowWidth(r, c)}px`, text }));
    } else td.textContent = text;
    if (view.kind === "number") td.dataset.value = String(view.value);
    else delete td.dataset.value;
    td.dataset.kind = view.kind;
    const title = [cellTitle(view), decor?.note, flag].filter(Boolean).join("\n");
    if (title) td.title = title;
    else td.removeAttribute("title");
  }

  private columnWidth(c: number): number {
    return this.widths.get(this.sheetName)?.[c] ?? DEFAULT_WIDTH;
  }

  /** Pixels from a cell's left edge to the next cell in use on its row (at most 30 columns on). */
  private overflowWidth(r: number, c: number): number {
    let width = this.columnWidth(c) - 8;
    for (let k = c + 1; k < Math.min(this.cols, c + 30); k++) {
      if (this.workbook.cell(this.sheetName, r, k).kind !== "empty") break;
      width += this.columnWidth(k);
    }
    return width;
  }

  private paintSelection(): void {
    const rect = rectOf(this.sel);
    for (let r = 0; r < this.rows; r++) {
      for (let c = 0; c < this.cols; c++) {
        const td = this.cells[r][c];
        const inside = contains(rect, r, c);
        const active = r === this.sel.active.row && c === this.sel.active.col;
        if (inside) td.setAttribute("aria-selected", "true");
        else td.removeAttribute("aria-selected");
        td.classList.toggle("in-selection", inside);
        td.classList.toggle("active", active);
        if (active) td.tabIndex = 0;
        else td.removeAttribute("tabindex");
      }
    }
  }

  private cellAt(pos: CellPos): HTMLTableCellElement | undefined {
    return this.cells[pos.row]?.[pos.col];
  }

  private posOf(target: EventTarget | null): CellPos | undefined {
    const td = (target as HTMLElement | null)?.closest?.("td[data-cell]") as HTMLTableCellElement | null;
    if (!td) return undefined;
    const tr = td.parentElement as HTMLTableRowElement;
    return { row: tr.sectionRowIndex, col: td.cellIndex - 1 };
  }

  private setSelection(next: Selection): void {
    this.sel = next;
    if (next.active.row >= this.rows - 2 || next.active.col >= this.cols - 1) {
      this.build(next.active.row + SPARE_ROWS, next.active.col + SPARE_COLS);
    }
    this.paintSelection();
    this.focusActive();
    this.events.selectionChanged();
  }

  private onMouseDown(e: MouseEvent): void {
    if (e.button !== 0) return;
    const head = (e.target as HTMLElement).closest("th.col-head") as HTMLElement | null;
    if (head) {
      e.preventDefault();
      this.selectColumn(Number(head.dataset.col));
      return;
    }
    const pos = this.posOf(e.target);
    if (!pos) return;
    if (this.editor && this.editor.input === e.target) return;
    if (this.editor) this.commitEdit(this.editor.input.value, 0, 0);
    e.preventDefault();
    this.dragging = true;
    this.setSelection(e.shiftKey ? { anchor: this.sel.anchor, active: pos } : single(pos));
  }

  private onMouseOver(e: MouseEvent): void {
    if (!this.dragging) return;
    const pos = this.posOf(e.target);
    if (pos && (pos.row !== this.sel.active.row || pos.col !== this.sel.active.col)) {
      this.setSelection({ anchor: this.sel.anchor, active: pos });
    }
  }

  /** The used part of a column: from row 1 to the sheet's last used row. */
  private selectColumn(col: number): void {
    const last = Math.max(0, this.workbook.size(this.sheetName).rows - 1);
    this.setSelection({ anchor: { row: last, col }, active: { row: 0, col } });
  }

  private onKey(e: KeyboardEvent): void {
    if (this.editor) return; // the editor handles its own keys
    const action = gridAction(e);
    switch (action.type) {
      case "move":
        e.preventDefault();
        this.setSelection(moved(this.sel, action.dRow, action.dCol, action.extend, this.rows + 1000, this.cols + 100));
        break;
      case "edit":
        e.preventDefault();
        this.startEdit(action.initial);
        break;
      case "clear":
        e.preventDefault();
        this.clearSelection();
        break;
      case "select-column":
        e.preventDefault();
        this.selectColumn(this.sel.active.col);
        break;
    }
  }

  private clearSelection(): void {
    const r = rectOf(this.sel);
    for (let row = r.top; row <= r.bottom; row++) {
      for (let col = r.left; col <= r.right; col++) {
        const view = this.workbook.cell(this.sheetName, row, col);
        if (view.spill === "part") continue; // cleared with its formula cell
        const result = this.workbook.setInput(this.sheetName, row, col, "");
        if (!result.ok) this.events.editRefused(result.message);
      }
    }
  }

  /** Opens the in-cell editor: with `initial` it replaces the contents, otherwise it edits them. */
  startEdit(initial?: string): void {
    const pos = { ...this.sel.active };
    const td = this.cellAt(pos);
    if (!td) return;
    const current = this.workbook.input(this.sheetName, pos.row, pos.col);
    const input = el("input", {
      type: "text",
      class: "cell-editor",
      spellcheck: "false",
      autocomplete: "off",
      "aria-label": `Edit ${a1(pos.row, pos.col)}`,
    });
    input.value = initial ?? (current.spilledFrom ? "" : current.text);
    this.editor = { input, pos };
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
        this.commitEdit(input.value, k.dRow, k.dCol);
      } else if (k.type === "cancel") {
        e.preventDefault();
        this.cancelEdit();
        this.focusActive();
        this.events.selectionChanged();
      }
      e.stopPropagation();
    });
    input.addEventListener("blur", () => {
      if (this.editor?.input === input) this.commitEdit(input.value, 0, 0, false);
    });
  }

  /** Writes `text` into the active cell and moves by (dRow, dCol). */
  commitEdit(text: string, dRow: number, dCol: number, focus = true): void {
    const pos = this.editor ? this.editor.pos : this.sel.active;
    this.closeEditor();
    const result = this.workbook.setInput(this.sheetName, pos.row, pos.col, text);
    this.paintCell(pos.row, pos.col);
    if (focus) {
      // A refused edit keeps the cell selected, so the message sits beside it.
      this.setSelection(result.ok ? moved(single(pos), dRow, dCol, false, this.rows + 1000, this.cols + 100) : single(pos));
    }
    if (!result.ok) this.events.editRefused(result.message);
  }

  cancelEdit(): void {
    const pos = this.editor?.pos;
    this.closeEditor();
    if (pos) this.paintCell(pos.row, pos.col);
  }

  private closeEditor(): void {
    if (!this.editor) return;
    const { input, pos } = this.editor;
    this.editor = undefined;
    input.remove();
    this.cellAt(pos)?.classList.remove("editing");
  }
}

function cellClasses(view: CellView, right: CellView | undefined, decor: CellDecor | undefined, flagged: boolean): string {
  const classes = [`k-${view.kind}`];
  if (decor?.role) classes.push(`role-${decor.role}`);
  if (decor?.note) classes.push("has-note");
  if (flagged) classes.push("flagged");
  if (view.spill === "anchor") classes.push("spill-anchor");
  if (view.spill === "part") classes.push("spill-part");
  if (view.hasFormula) classes.push("has-formula");
  if (view.kind === "text" && right && right.kind === "empty") classes.push("overflow");
  return classes.join(" ");
}

function cellTitle(view: CellView): string | undefined {
  if (view.error) return `${view.error.code} ${view.error.message}`;
  if (view.spill === "part" && view.spillRange) return `Spilled result (${view.spillRange})`;
  if (view.spill === "anchor" && view.spillRange) return `Formula with a spilled result (${view.spillRange})`;
  if (view.kind === "text" && view.text.length > 12) return view.text; // may be cut off in a narrow column
  return undefined;
}
