/** Small helpers to build formula-engine sheets and read spilled results in the workbook tests. */
import { DetailedCellError, type HyperFormula } from "hyperformula";
import { createEbbWorkbook } from "../../../src/functions/hyperformula";
import { columnLetters } from "../../../src/ledger/describe/addresses";

export type Cell = number | string | boolean | null;

/** A sheet of `rows` rows from columns placed side by side starting at column `firstCol` (0 = A). */
export function gridFromColumns(columns: Cell[][], rows: number, firstCol = 0): Cell[][] {
  const grid: Cell[][] = Array.from({ length: rows }, () => []);
  columns.forEach((col, c) => {
    for (let r = 0; r < rows; r++) grid[r][firstCol + c] = r < col.length ? col[r] : null;
  });
  return grid.map((row) => Array.from({ length: row.length }, (_, i) => row[i] ?? null));
}

/** A workbook with one sheet named "S" (exact values: no display rounding). */
export function workbook(grid: Cell[][]): { hf: HyperFormula; sheet: number } {
  const hf = createEbbWorkbook({ S: grid as never }, { smartRounding: false });
  return { hf, sheet: hf.getSheetId("S")! };
}

export function address(hf: HyperFormula, sheet: number, a1: string) {
  const addr = hf.simpleCellAddressFromString(a1, sheet);
  if (!addr) throw new Error(`bad address ${a1}`);
  return addr;
}

export function value(hf: HyperFormula, sheet: number, a1: string): unknown {
  return hf.getCellValue(address(hf, sheet, a1));
}

/** The values of a block of `rows` x `cols` cells starting at `a1`. */
export function block(hf: HyperFormula, sheet: number, a1: string, rows: number, cols: number): unknown[][] {
  const start = address(hf, sheet, a1);
  return Array.from({ length: rows }, (_, r) =>
    Array.from({ length: cols }, (_, c) => hf.getCellValue({ sheet, row: start.row + r, col: start.col + c })),
  );
}

/** The error in a cell, or a failure naming what is there instead. */
export function errorIn(hf: HyperFormula, sheet: number, a1: string): { type: string; message: string } {
  const v = value(hf, sheet, a1);
  if (!(v instanceof DetailedCellError)) throw new Error(`${a1} holds ${JSON.stringify(v)}, not an error`);
  return { type: v.type, message: v.message };
}

/** Column letter(s) of a 0-based column index. */
export const columnName = columnLetters;
