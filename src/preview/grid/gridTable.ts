/**
 * Drawing the shown sheet as a table: headers, cell values with their styles and titles, and the
 * selection. Spilled arrays and errors are styled; an error's message is the cell's title.
 */
import { a1, columnLetters } from "../workbook/addresses";
import { DecorStore, formatNumber, type CellDecor } from "../workbook/cellDecor";
import type { CellView, PreviewWorkbook } from "../workbook/previewWorkbook";
import { el } from "../../taskpane/panel/dom";
import type { GridState } from "./gridState";
import { contains, rectOf, type CellPos } from "./selection";

/** Extra empty rows and columns shown past the used area, so there is room to type. */
export const SPARE_ROWS = 12;
export const SPARE_COLS = 3;
const MIN_ROWS = 40;
const MIN_COLS = 12;
const DEFAULT_WIDTH = 92;
const ROW_HEAD_WIDTH = 44;

export class GridTable {
  readonly element: HTMLTableElement;
  private cells: HTMLTableCellElement[][] = [];
  private shownRows = 0;
  private shownCols = 0;
  private readonly widths = new Map<string, Record<number, number>>();

  constructor(
    private readonly workbook: PreviewWorkbook,
    private readonly decor: DecorStore,
    private readonly state: GridState,
    id: string,
  ) {
    this.element = el("table", { class: "grid", role: "grid", id, "aria-multiselectable": "true" });
  }

  /** Rows and columns shown (the used area plus room to type). */
  get rows(): number {
    return this.shownRows;
  }

  get cols(): number {
    return this.shownCols;
  }

  /** Column widths in pixels for one sheet (column index -> width). */
  setColumnWidths(sheet: string, widths: Record<number, number>): void {
    this.widths.set(sheet, { ...(this.widths.get(sheet) ?? {}), ...widths });
    if (sheet === this.state.sheet) this.build();
  }

  /** Redraws the whole table, at least minRows x minCols and always holding the active cell. */
  build(minRows = 0, minCols = 0): void {
    const { sheet, sel } = this.state;
    const size = this.workbook.size(sheet);
    const hadFocus = this.element.contains(document.activeElement);
    this.shownRows = Math.max(MIN_ROWS, size.rows + SPARE_ROWS, minRows, sel.active.row + 1);
    this.shownCols = Math.max(MIN_COLS, size.cols + SPARE_COLS, minCols, sel.active.col + 1);
    const widths = this.widths.get(sheet) ?? {};
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
    this.element.replaceChildren(colgroup, el("thead", {}, headRow), body);
    this.element.style.width = `${tableWidth}px`;
    this.element.setAttribute("aria-rowcount", String(this.rows + 1));
    this.element.setAttribute("aria-colcount", String(this.cols + 1));
    this.paintAll();
    this.paintSelection();
    if (hadFocus) this.focusActive();
  }

  /** Re-reads every shown cell from the workbook. */
  paintAll(): void {
    for (let r = 0; r < this.rows; r++) for (let c = 0; c < this.cols; c++) this.paintCell(r, c);
  }

  /** One cell's text, classes and title; the cell being edited is left alone. */
  paintCell(r: number, c: number): void {
    const td = this.cells[r][c];
    const { sheet, editor } = this.state;
    if (editor && editor.pos.row === r && editor.pos.col === c) return;
    const view = this.workbook.cell(sheet, r, c);
    const right = c + 1 < this.cols ? this.workbook.cell(sheet, r, c + 1) : undefined;
    const decor = this.decor.get(sheet, r, c);
    const flag = view.kind === "number" || view.kind === "text" ? this.decor.flagged(sheet, r, c, view.value as number | string) : undefined;
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

  /** Marks the selected cells, and makes the active one the only focusable cell. */
  paintSelection(): void {
    const { sel } = this.state;
    const rect = rectOf(sel);
    for (let r = 0; r < this.rows; r++) {
      for (let c = 0; c < this.cols; c++) {
        const td = this.cells[r][c];
        const inside = contains(rect, r, c);
        const active = r === sel.active.row && c === sel.active.col;
        if (inside) td.setAttribute("aria-selected", "true");
        else td.removeAttribute("aria-selected");
        td.classList.toggle("in-selection", inside);
        td.classList.toggle("active", active);
        if (active) td.tabIndex = 0;
        else td.removeAttribute("tabindex");
      }
    }
  }

  focusActive(): void {
    this.cellAt(this.state.sel.active)?.focus();
  }

  /** Scrolls the active cell into view without moving the focus. */
  revealActive(): void {
    this.cellAt(this.state.sel.active)?.scrollIntoView({ block: "nearest", inline: "nearest" });
  }

  cellAt(pos: CellPos): HTMLTableCellElement | undefined {
    return this.cells[pos.row]?.[pos.col];
  }

  /** The cell an event happened on, if any. */
  posOf(target: EventTarget | null): CellPos | undefined {
    const td = (target as HTMLElement | null)?.closest?.("td[data-cell]") as HTMLTableCellElement | null;
    if (!td) return undefined;
    const tr = td.parentElement as HTMLTableRowElement;
    return { row: tr.sectionRowIndex, col: td.cellIndex - 1 };
  }

  private columnWidth(c: number): number {
    return this.widths.get(this.state.sheet)?.[c] ?? DEFAULT_WIDTH;
  }

  /** Pixels from a cell's left edge to the next cell in use on its row (at most 30 columns on). */
  private overflowWidth(r: number, c: number): number {
    let width = this.columnWidth(c) - 8;
    for (let k = c + 1; k < Math.min(this.cols, c + 30); k++) {
      if (this.workbook.cell(this.state.sheet, r, k).kind !== "empty") break;
      width += this.columnWidth(k);
    }
    return width;
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
