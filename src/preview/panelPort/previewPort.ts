/**
 * The panel's workbook port in the preview: the embedded formula engine through the ledger's
 * HyperFormula adapter, and the preview grid for selecting and showing cells.
 */
import {
  hyperFormulaReader,
  writeCellsToHyperFormula,
  writeLedgerToHyperFormula,
  type LedgerCell,
  type LedgerDescription,
  type LedgerExtension,
  type LedgerReader,
} from "../../ledger";
import type { LedgerLocation, PortValue, SheetBlock, WorkbookPort, WriteOutcome } from "../../taskpane/port";
import type { WorkbookView } from "../grid/workbookView";
import { a1, parseA1 } from "../workbook/addresses";
import type { DecorStore } from "../workbook/cellDecor";
import type { PreviewWorkbook } from "../workbook/previewWorkbook";

const LEDGER_NAME = /^ebb_([A-Za-z0-9]+)_ledger$/i;

export class PreviewPort implements WorkbookPort {
  readonly kind = "preview" as const;
  /** The ledger written or changed last (the end-to-end tests read its layout). */
  lastLedger?: LedgerDescription;
  private readonly shownListeners = new Set<(ledger: LedgerDescription) => void>();

  constructor(
    private readonly workbook: PreviewWorkbook,
    private readonly view: WorkbookView,
    private readonly decor: DecorStore,
  ) {}

  onLedgerShown(listener: (ledger: LedgerDescription) => void): void {
    this.shownListeners.add(listener);
  }

  async selection(): Promise<SheetBlock> {
    const r = this.view.grid.selectedRect();
    return this.read(this.view.sheet, r.top, r.left, r.bottom - r.top + 1, r.right - r.left + 1);
  }

  async read(sheet: string, top: number, left: number, rows: number, cols: number): Promise<SheetBlock> {
    const values: PortValue[][] = [];
    for (let r = 0; r < rows; r++) {
      const line: PortValue[] = [];
      for (let c = 0; c < cols; c++) {
        const cell = this.workbook.cell(sheet, top + r, left + c);
        line.push(cell.error ? { error: cell.error.code } : cell.value);
      }
      values.push(line);
    }
    return { sheet, top, left, values };
  }

  async lastUsedRow(sheet: string): Promise<number> {
    return this.workbook.size(sheet).rows - 1;
  }

  async sheetNames(): Promise<string[]> {
    return this.workbook.sheetNames();
  }

  async firstUsedCell(sheet: string, ranges: string[]): Promise<string | undefined> {
    const used = this.usedCells(sheet, ranges);
    return used.length ? `${sheet}!${a1(used[0].row, used[0].col)}` : undefined;
  }

  async writeLedger(ledger: LedgerDescription, confirmed: boolean): Promise<WriteOutcome> {
    // One undo step: clearing the area, the sheet, its names and cells.
    return this.workbook.step(() => this.writeLedgerNow(ledger, confirmed));
  }

  private writeLedgerNow(ledger: LedgerDescription, confirmed: boolean): WriteOutcome {
    const used = this.usedCells(ledger.sheet, ledger.footprint);
    // Names of this tag belong to a ledger already: writing would point them here.
    const prefix = `ebb_${ledger.tag}_`.toLowerCase();
    const existingNames = this.workbook.hf.listNamedExpressions().filter((n) => n.toLowerCase().startsWith(prefix));
    if ((used.length > 0 || existingNames.length > 0) && !confirmed) {
      const shown = used.slice(0, 5).map((c) => a1(c.row, c.col)).join(", ");
      const parts: string[] = [];
      if (used.length > 0) parts.push(`${used.length} cell${used.length > 1 ? "s" : ""} of "${ledger.sheet}" in ${ledger.footprint.join(", ")} already hold something (${shown}${used.length > 5 ? ", ..." : ""})`);
      if (existingNames.length > 0) parts.push(`the names ${existingNames.slice(0, 3).join(", ")}${existingNames.length > 3 ? ", ..." : ""} belong to a ledger already`);
      return { status: "needs-confirmation", message: `${parts.join("; ")}. Write the ledger over them?` };
    }
    if (used.length > 0) {
      // Agreed: clear the area first, as the host adapter does, so nothing old is left inside the ledger.
      const sheetId = this.workbook.sheetId(ledger.sheet);
      this.workbook.hf.batch(() => {
        for (const c of used) this.workbook.hf.setCellContents({ sheet: sheetId, row: c.row, col: c.col }, [[null]]);
      });
    }
    this.decor.addCells(ledger.sheet, ledger.cells);
    this.decor.setFlags(ledger.sheet, ledger.flags);
    const widths: Record<number, number> = {};
    for (const [col, chars] of Object.entries(ledger.columnWidths)) widths[Number(col)] = Math.round(chars * 7.2 + 12);
    this.view.grid.setColumnWidths(ledger.sheet, widths);
    writeLedgerToHyperFormula(this.workbook.hf, ledger);
    this.lastLedger = ledger;
    return { status: "written" };
  }

  async writeExtension(ext: LedgerExtension): Promise<void> {
    const cells = [...ext.append, ...ext.refresh];
    this.decor.addCells(ext.sheet, cells);
    this.workbook.step(() => writeCellsToHyperFormula(this.workbook.hf, ext.sheet, cells, ext.names));
    this.lastLedger = ext.description;
  }

  async writeCells(sheet: string, cells: LedgerCell[]): Promise<void> {
    this.decor.addCells(sheet, cells);
    this.workbook.step(() => writeCellsToHyperFormula(this.workbook.hf, sheet, cells));
  }

  async reader(sheet: string, _anchorCell: string): Promise<LedgerReader> {
    return hyperFormulaReader(this.workbook.hf, sheet);
  }

  /** Cells holding anything (a value or a formula) inside A1 ranges of a sheet. */
  private usedCells(sheet: string, ranges: string[]): { row: number; col: number }[] {
    if (!this.workbook.sheetNames().includes(sheet)) return [];
    const size = this.workbook.size(sheet);
    const out: { row: number; col: number }[] = [];
    for (const range of ranges) {
      const [a, b] = range.split(":");
      const p = parseA1(a);
      const q = parseA1(b ?? a);
      if (!p || !q) continue;
      for (let r = p.row; r <= Math.min(q.row, size.rows - 1); r++) {
        for (let c = p.col; c <= Math.min(q.col, size.cols - 1); c++) {
          const cell = this.workbook.cell(sheet, r, c);
          if (cell.kind !== "empty" || cell.hasFormula) out.push({ row: r, col: c });
        }
      }
    }
    return out;
  }

  async select(sheet: string, address: string, focus = true): Promise<void> {
    const [a, b] = address.replace(/\$/g, "").split(":");
    const p = parseA1(a);
    const q = parseA1(b ?? a);
    if (!p || !q) return;
    this.view.select(sheet, { top: Math.min(p.row, q.row), left: Math.min(p.col, q.col), bottom: Math.max(p.row, q.row), right: Math.max(p.col, q.col) }, focus);
  }

  async ledgers(): Promise<LedgerLocation[]> {
    const hf = this.workbook.hf;
    const found: LedgerLocation[] = [];
    for (const name of hf.listNamedExpressions()) {
      const m = LEDGER_NAME.exec(name);
      if (!m) continue;
      const expression = hf.getNamedExpression(name)?.expression ?? "";
      const ref = /^=?(?:'((?:[^']|'')+)'|([^'!]+))!\$?([A-Z]{1,3})\$?(\d+)$/i.exec(String(expression).trim());
      if (!ref) continue;
      const sheet = (ref[1] ?? ref[2]).replace(/''/g, "'");
      if (!this.workbook.sheetNames().includes(sheet)) continue;
      found.push({ sheet, cell: `${ref[3].toUpperCase()}${ref[4]}`, tag: m[1] });
    }
    return found;
  }

  ledgerShown(ledger: LedgerDescription): void {
    this.lastLedger = ledger;
    this.decor.setFlags(ledger.sheet, ledger.flags);
    this.shownListeners.forEach((l) => l(ledger));
  }
}
