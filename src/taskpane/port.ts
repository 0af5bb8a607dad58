/**
 * The workbook port: everything the Ebb ledger panel asks of a workbook. Two implementations:
 * the spreadsheet host (ports/excelPort.ts, through the Excel JS API) and the preview workbook
 * (src/preview/panelPort, through the embedded formula engine). The panel's logic sees only this.
 */
import type { LedgerCell, LedgerDescription, LedgerExtension, LedgerReader } from "../ledger";

/** A cell's value as the panel sees it; errors carry their code (#N/A, #VALUE!, ...). */
export type PortValue = number | string | boolean | null | { error: string };

/** A rectangle of values on a sheet; top and left are 0-based. */
export interface SheetBlock {
  sheet: string;
  top: number;
  left: number;
  values: PortValue[][];
}

/** A ledger found in the workbook: its sheet, its top-left cell and its name tag. */
export interface LedgerLocation {
  sheet: string;
  cell: string;
  tag: string;
}

/** Called while a long write goes on: cells written so far and in all. */
export type ProgressReport = (done: number, total: number) => void;

export type WriteOutcome = { status: "written" } | { status: "needs-confirmation"; message: string };

export interface WorkbookPort {
  readonly kind: "host" | "preview";
  /** The selected cells and their values. */
  selection(): Promise<SheetBlock>;
  /** Values of a rectangle. */
  read(sheet: string, top: number, left: number, rows: number, cols: number): Promise<SheetBlock>;
  /** 0-based index of the last row in use on a sheet (-1 when the sheet is empty). */
  lastUsedRow(sheet: string): Promise<number>;
  sheetNames(): Promise<string[]>;
  /** The first cell holding anything inside these A1 ranges of a sheet, or undefined when all are empty (or the sheet does not exist). */
  firstUsedCell(sheet: string, ranges: string[]): Promise<string | undefined>;
  /**
   * Writes a whole ledger (adding its sheet when missing). Unless `confirmed`, it writes nothing
   * when the destination holds anything, and says what is there instead.
   */
  writeLedger(ledger: LedgerDescription, confirmed: boolean, onProgress?: ProgressReport): Promise<WriteOutcome>;
  /** Appends the new rows of an extended ledger (and refreshes its engine numbers and chart). */
  writeExtension(extension: LedgerExtension, onProgress?: ProgressReport): Promise<void>;
  /** Writes some cells of a ledger (fitted constants, refreshed engine numbers). */
  writeCells(sheet: string, cells: LedgerCell[]): Promise<void>;
  /** Formulas and values of a ledger's area, for reading it back (verify, extend, fit). */
  reader(sheet: string, anchorCell: string): Promise<LedgerReader>;
  /** Shows a sheet and selects a cell or range on it; `focus` moves the keyboard focus there too. */
  select(sheet: string, address: string, focus?: boolean): Promise<void>;
  /** Ledgers in the workbook, found by their defined names. */
  ledgers(): Promise<LedgerLocation[]>;
  /** Tells the page a ledger was written or changed (the preview draws its chart). */
  ledgerShown?(ledger: LedgerDescription): void;
}
