/**
 * How the preview shows a ledger's cells: its number formats, style roles, notes and flagged
 * ranges, as given by the ledger description (the embedded engine keeps values only).
 */
import type { ConditionalFlag, LedgerCell } from "../../ledger/describe/types";
import { numberText } from "./cellText";
import { parseA1 } from "./addresses";

export interface CellDecor {
  format?: string;
  role?: string;
  note?: string;
}

interface FlagArea {
  top: number;
  left: number;
  bottom: number;
  right: number;
  low: number;
  high: number;
  note: string;
}

export class DecorStore {
  private readonly cells = new Map<string, Map<string, CellDecor>>();
  private readonly flags = new Map<string, FlagArea[]>();

  addCells(sheet: string, cells: LedgerCell[]): void {
    let map = this.cells.get(sheet);
    if (!map) this.cells.set(sheet, (map = new Map()));
    for (const c of cells) map.set(`${c.row},${c.col}`, { format: c.format, role: c.role, note: c.note });
  }

  /** A style role for plain cells (the demo's header rows: role "header" wraps its text). */
  addRoles(sheet: string, cells: { row: number; col: number; role: string }[]): void {
    let map = this.cells.get(sheet);
    if (!map) this.cells.set(sheet, (map = new Map()));
    for (const c of cells) map.set(`${c.row},${c.col}`, { ...map.get(`${c.row},${c.col}`), role: c.role });
  }

  setFlags(sheet: string, flags: ConditionalFlag[]): void {
    const areas: FlagArea[] = [];
    for (const f of flags) {
      const [a, b] = f.range.split(":");
      const p = parseA1(a);
      const q = parseA1(b ?? a);
      if (p && q) areas.push({ top: p.row, left: p.col, bottom: q.row, right: q.col, low: f.outside.low, high: f.outside.high, note: f.note });
    }
    this.flags.set(sheet, areas);
  }

  get(sheet: string, row: number, col: number): CellDecor | undefined {
    return this.cells.get(sheet)?.get(`${row},${col}`);
  }

  /** The note of a flag whose range holds this cell and whose limits the value leaves. */
  flagged(sheet: string, row: number, col: number, value: number): string | undefined {
    for (const f of this.flags.get(sheet) ?? []) {
      if (row >= f.top && row <= f.bottom && col >= f.left && col <= f.right && (value < f.low || value > f.high)) return f.note;
    }
    return undefined;
  }
}

/** A number shown with a spreadsheet number format code (the handful the ledger uses). */
export function formatNumber(v: number, format: string | undefined): string {
  if (!format || format === "General") return numberText(v);
  const percent = format.endsWith("%");
  const body = percent ? format.slice(0, -1) : format;
  const m = /^(#,##)?0(?:\.(0+))?$/.exec(body);
  if (!m) return numberText(v);
  const decimals = m[2]?.length ?? 0;
  const x = percent ? v * 100 : v;
  const text = m[1]
    ? x.toLocaleString("en-US", { minimumFractionDigits: decimals, maximumFractionDigits: decimals })
    : x.toFixed(decimals);
  return percent ? `${text}%` : text;
}
