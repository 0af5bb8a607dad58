import { badInput } from "../../engine";

/** A1 addressing: column letters, cell and range addresses, sheet-qualified references. */

export const MAX_ROWS = 1_048_576;
export const MAX_COLS = 16_384;

export function columnLetters(col: number): string {
  let n = col + 1;
  let s = "";
  while (n > 0) {
    const r = (n - 1) % 26;
    s = String.fromCharCode(65 + r) + s;
    n = Math.floor((n - 1) / 26);
  }
  return s;
}

/** "B12" from 0-based row and column; `absRow`/`absCol` add "$". */
export function cellAddress(row: number, col: number, absRow = false, absCol = false): string {
  return `${absCol ? "$" : ""}${columnLetters(col)}${absRow ? "$" : ""}${row + 1}`;
}

export function absolute(row: number, col: number): string {
  return cellAddress(row, col, true, true);
}

export function rangeAddress(r1: number, c1: number, r2: number, c2: number): string {
  return `${cellAddress(r1, c1)}:${cellAddress(r2, c2)}`;
}

/** 0-based row and column of an A1 cell address (with or without "$"). */
export function parseCell(address: string): { row: number; col: number } {
  const m = /^\$?([A-Za-z]{1,3})\$?(\d{1,7})$/.exec(address.trim());
  if (!m) throw badInput("bad-anchor", `"${address}" is not a cell address. Give the top-left cell as a letter and a number, like A1 or C5.`);
  let col = 0;
  for (const ch of m[1].toUpperCase()) col = col * 26 + (ch.charCodeAt(0) - 64);
  const row = Number(m[2]) - 1;
  if (row < 0 || row >= MAX_ROWS || col - 1 >= MAX_COLS) {
    throw badInput("bad-anchor", `The cell ${address} lies outside the sheet. Choose a cell nearer the top left.`);
  }
  return { row, col: col - 1 };
}

/** The sheet name quoted for a reference: 'My sheet'!$A$1. */
export function quoteSheet(sheet: string): string {
  return `'${sheet.replace(/'/g, "''")}'`;
}

/** A cell as messages name it: Sales!B50, or 'Hose reels'!B50 where the sheet name needs quotes. */
export function shownAddress(sheet: string, row: number, col: number): string {
  const shown = /^[A-Za-z_][A-Za-z0-9_.]*$/.test(sheet) ? sheet : quoteSheet(sheet);
  return `${shown}!${cellAddress(row, col)}`;
}

export function sheetReference(sheet: string, address: string): string {
  return `${quoteSheet(sheet)}!${address}`;
}

/** Sheet names the hosts accept: 1-31 characters, none of : \ / ? * [ ], not starting or ending with '. */
export function checkSheetName(sheet: string): string {
  if (typeof sheet !== "string" || sheet.length === 0 || sheet.length > 31 || /[:\\/?*[\]]/.test(sheet) || /^'|'$/.test(sheet)) {
    throw badInput(
      "bad-sheet",
      `"${String(sheet)}" cannot be a sheet name: use 1 to 31 characters without : \\ / ? * [ ] and not starting or ending with an apostrophe.`,
    );
  }
  return sheet;
}
