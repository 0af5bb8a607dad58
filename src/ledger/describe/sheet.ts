import { cellAddress } from "./addresses";
import type { CellKind, CellValue, LedgerCell, StyleRole } from "./types";

/** Collects the cells of one ledger; later puts at the same address replace earlier ones. */
export class SheetCells {
  private readonly byAddress = new Map<string, LedgerCell>();

  put(row: number, col: number, kind: CellKind, role: StyleRole, value: CellValue, extra: { formula?: string; format?: string; note?: string } = {}): LedgerCell {
    const address = cellAddress(row, col);
    const cell: LedgerCell = { address, row, col, kind, role, value: clean(value) };
    if (extra.formula !== undefined) cell.formula = extra.formula;
    if (extra.format !== undefined) cell.format = extra.format;
    if (extra.note !== undefined) cell.note = extra.note;
    this.byAddress.set(address, cell);
    return cell;
  }

  text(row: number, col: number, text: string, role: StyleRole, note?: string): LedgerCell {
    return this.put(row, col, "constant", role, text, note === undefined ? {} : { note });
  }

  formula(row: number, col: number, formula: string, value: CellValue, format: string, role: StyleRole = "formula", note?: string): LedgerCell {
    return this.put(row, col, "formula", role, value, { formula, format, ...(note === undefined ? {} : { note }) });
  }

  get(row: number, col: number): LedgerCell | undefined {
    return this.byAddress.get(cellAddress(row, col));
  }

  all(): LedgerCell[] {
    return [...this.byAddress.values()].sort((a, b) => a.row - b.row || a.col - b.col);
  }
}

/** Engine NaN (missing) becomes an empty value; -0 becomes 0. */
function clean(v: CellValue): CellValue {
  if (typeof v === "number") {
    if (Number.isNaN(v)) return null;
    if (v === 0) return 0;
  }
  return v;
}

/** Number formats (en-US codes; hosts localise them). */
export const FORMAT = {
  period: "0",
  actual: "General",
  units: "#,##0.00",
  trend: "#,##0.0000",
  ratio: "0.0000",
  constant: "0.0000",
  percent: "0.00",
  signal: "0.00",
  // A fraction (0.95) shows as 95.0%, a percent typed as 95 as 95.0% too (parseCoverage reads both).
  coverage: '[<=1]0.0%;0.0"%"',
  count: "0",
} as const;
