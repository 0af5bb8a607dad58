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
  flag: ConditionalFlag;
}

/** Whether a shown value meets a flag's rule (text compared ignoring case, as the hosts do). */
function meets(flag: ConditionalFlag, value: number | string): boolean {
  if ("outside" in flag) return typeof value === "number" && (value < flag.outside.low || value > flag.outside.high);
  return typeof value === "string" && value.toLowerCase().includes(flag.containsText.toLowerCase());
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
      if (p && q) areas.push({ top: p.row, left: p.col, bottom: q.row, right: q.col, flag: f });
    }
    this.flags.set(sheet, areas);
  }

  get(sheet: string, row: number, col: number): CellDecor | undefined {
    return this.cells.get(sheet)?.get(`${row},${col}`);
  }

  /** The note of a flag whose range holds this cell and whose rule the shown value meets. */
  flagged(sheet: string, row: number, col: number, value: number | string): string | undefined {
    for (const f of this.flags.get(sheet) ?? []) {
      if (row >= f.top && row <= f.bottom && col >= f.left && col <= f.right && meets(f.flag, value)) return f.flag.note;
    }
    return undefined;
  }
}

/**
 * A number shown with a spreadsheet number format code (the handful the ledger uses): 0, 0.00,
 * #,##0.00, a percent (0.0%), a quoted literal after the digits (0.0"%"), and two sections with a
 * condition on the first ([<=1]0.0%;0.0"%": the first section when the condition holds).
 */
export function formatNumber(v: number, format: string | undefined): string {
  if (!format || format === "General") return numberText(v);
  const conditional = /^\[(<=|>=|<|>|=)(-?\d+(?:\.\d+)?)\]([^;]+);(.+)$/.exec(format);
  if (conditional) {
    const [, op, bound, first, second] = conditional;
    const b = Number(bound);
    const holds = op === "<=" ? v <= b : op === ">=" ? v >= b : op === "<" ? v < b : op === ">" ? v > b : v === b;
    return formatNumber(v, holds ? first : second);
  }
  const literal = /^(.*?)"([^"]*)"$/.exec(format);
  const suffix = literal ? literal[2] : "";
  const code = literal ? literal[1] : format;
  const percent = code.endsWith("%");
  const body = percent ? code.slice(0, -1) : code;
  const m = /^(#,##)?0(?:\.(0+))?$/.exec(body);
  if (!m) return numberText(v);
  const decimals = m[2]?.length ?? 0;
  const x = percent ? v * 100 : v;
  const text = m[1]
    ? x.toLocaleString("en-US", { minimumFractionDigits: decimals, maximumFractionDigits: decimals })
    : x.toFixed(decimals);
  return `${text}${percent ? "%" : ""}${suffix}`;
}
