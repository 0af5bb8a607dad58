/**
 * The workbook grid: one sheet as a table of cells with a roving focus, mouse and keyboard
 * selection, and an in-cell editor. Drawing is in gridTable, input in gridInput, editing in
 * cellEditor; this class holds them together and is what the page uses.
 */
import { DecorStore } from "../workbook/cellDecor";
import type { CellRect, PreviewWorkbook } from "../workbook/previewWorkbook";
import { el } from "../../taskpane/panel/dom";
import { CellEditor } from "./cellEditor";
import { listenToGridInput } from "./gridInput";
import type { GridEvents, GridState } from "./gridState";
import { GridTable, SPARE_COLS, SPARE_ROWS } from "./gridTable";
import { rectOf, single, type Selection } from "./selection";

export type { GridEvents } from "./gridState";

export class GridView {
  readonly element: HTMLElement;
  private readonly state: GridState = { sheet: "", sel: single({ row: 0, col: 0 }) };
  private readonly selections = new Map<string, Selection>();
  private readonly table: GridTable;
  private readonly editor: CellEditor;

  constructor(
    private readonly workbook: PreviewWorkbook,
    private readonly events: GridEvents,
    decor: DecorStore = new DecorStore(),
    id = "sheet-grid",
  ) {
    this.table = new GridTable(workbook, decor, this.state, id);
    this.element = el("div", { class: "grid-scroll" }, this.table.element);
    this.editor = new CellEditor(workbook, this.state, this.table, events, (next) => this.setSelection(next));
    listenToGridInput({ workbook, state: this.state, table: this.table, editor: this.editor, events, setSelection: (next) => this.setSelection(next) });
  }

  get sheet(): string {
    return this.state.sheet;
  }

  get selection(): Selection {
    return this.state.sel;
  }

  selectedRect(): CellRect {
    return rectOf(this.state.sel);
  }

  /** Column widths in pixels for one sheet (column index -> width). */
  setColumnWidths(sheet: string, widths: Record<number, number>): void {
    this.table.setColumnWidths(sheet, widths);
  }

  showSheet(name: string): void {
    if (this.state.sheet) this.selections.set(this.state.sheet, this.state.sel);
    this.cancelEdit();
    this.state.sheet = name;
    this.state.sel = this.selections.get(name) ?? single({ row: 0, col: 0 });
    this.table.element.setAttribute("aria-label", `Sheet ${name}`);
    this.table.build();
    this.element.scrollTo({ top: 0, left: 0 });
    this.revealActive();
    this.events.selectionChanged();
  }

  /** Selects a range (growing the shown area if needed) and moves the focus to its first cell. */
  select(rect: CellRect, focus = true): void {
    this.state.sel = { anchor: { row: rect.top, col: rect.left }, active: { row: rect.top, col: rect.left } };
    if (rect.bottom !== rect.top || rect.right !== rect.left) {
      this.state.sel = { anchor: { row: rect.bottom, col: rect.right }, active: { row: rect.top, col: rect.left } };
    }
    if (rect.bottom >= this.table.rows || rect.right >= this.table.cols) this.table.build(rect.bottom + 1, rect.right + 1);
    this.table.paintSelection();
    if (focus) this.focusActive();
    else this.revealActive();
    this.events.selectionChanged();
  }

  /** Re-reads every shown cell (after edits or writes); grows the table when the sheet grew. */
  refresh(): void {
    if (!this.workbook.sheetNames().includes(this.state.sheet)) return;
    const size = this.workbook.size(this.state.sheet);
    if (size.rows + SPARE_ROWS > this.table.rows || size.cols + SPARE_COLS > this.table.cols) {
      this.table.build();
      return;
    }
    this.table.paintAll();
    // repainting resets every cell's styling, the selection's included
    this.table.paintSelection();
  }

  focusActive(): void {
    this.table.focusActive();
  }

  /** Scrolls the active cell into view without moving the focus. */
  revealActive(): void {
    this.table.revealActive();
  }

  /** Opens the in-cell editor: with `initial` it replaces the contents, otherwise it edits them. */
  startEdit(initial?: string): void {
    this.editor.start(initial);
  }

  /** Writes `text` into the active cell and moves by (dRow, dCol). */
  commitEdit(text: string, dRow: number, dCol: number, focus = true): void {
    this.editor.commit(text, dRow, dCol, focus);
  }

  cancelEdit(): void {
    this.editor.cancel();
  }

  /** Selects, growing the table near its edge, and moves the focus to the active cell. */
  private setSelection(next: Selection): void {
    this.state.sel = next;
    if (next.active.row >= this.table.rows - 2 || next.active.col >= this.table.cols - 1) {
      this.table.build(next.active.row + SPARE_ROWS, next.active.col + SPARE_COLS);
    }
    this.table.paintSelection();
    this.focusActive();
    this.events.selectionChanged();
  }
}
