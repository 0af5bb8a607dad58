/**
 * How verify, extend and fit read a ledger back from any host: a function from a 0-based
 * row and column to the cell's formula (when it has one) and its value.
 */
export interface ReadCell {
  /** Formula text as the host gives it (with or without the leading "="). */
  formula?: string;
  /** Number, text, null for empty; errors as text such as "#DIV/0!". */
  value: number | string | null;
}

export type LedgerReader = (row: number, col: number) => ReadCell;

/** A reader over 2-D arrays of formulas and values read from a rectangle starting at (top, left). */
export function gridReader(top: number, left: number, formulas: unknown[][], values: unknown[][]): LedgerReader {
  return (row, col) => {
    const r = row - top;
    const c = col - left;
    const v = values[r]?.[c];
    const fo = formulas[r]?.[c];
    const value = v === undefined || v === null || v === "" ? (v === "" ? "" : null) : typeof v === "number" || typeof v === "string" ? v : String(v);
    if (typeof fo === "string" && fo.startsWith("=")) return { formula: fo, value };
    return { value };
  };
}
