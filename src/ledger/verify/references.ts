import { parseCell } from "../describe/addresses";
import type { LedgerCell, LedgerName } from "../describe/types";

/**
 * The cells a ledger formula reads: its A1 references, ranges and the ledger's defined names,
 * as "row,col" keys. Only used on formulas Ebb wrote, whose shape is known.
 */
export type CellKey = string;
export const key = (row: number, col: number): CellKey => `${row},${col}`;

const REF = /(\$?[A-Z]{1,3}\$?\d+)(?::(\$?[A-Z]{1,3}\$?\d+))?/g;
const NAME = /ebb_[A-Za-z0-9]+_[A-Za-z]+/g;

export interface Span {
  r1: number;
  c1: number;
  r2: number;
  c2: number;
}

export function nameSpans(names: LedgerName[]): Map<string, Span> {
  const out = new Map<string, Span>();
  for (const n of names) {
    const ref = n.refersTo.slice(n.refersTo.lastIndexOf("!") + 1);
    const [a, b] = ref.split(":");
    const p = parseCell(a);
    const q = b ? parseCell(b) : p;
    out.set(n.name.toLowerCase(), { r1: p.row, c1: p.col, r2: q.row, c2: q.col });
  }
  return out;
}

/** Spans (rectangles) a formula reads. */
export function formulaSpans(formula: string, names: Map<string, Span>): Span[] {
  const text = formula.replace(/"[^"]*"/g, '""');
  const spans: Span[] = [];
  for (const m of text.matchAll(NAME)) {
    const s = names.get(m[0].toLowerCase());
    if (s) spans.push(s);
  }
  const withoutNames = text.replace(NAME, "");
  for (const m of withoutNames.matchAll(REF)) {
    const p = parseCell(m[1]);
    const q = m[2] ? parseCell(m[2]) : p;
    spans.push({ r1: Math.min(p.row, q.row), c1: Math.min(p.col, q.col), r2: Math.max(p.row, q.row), c2: Math.max(p.col, q.col) });
  }
  return spans;
}

export function spanHas(s: Span, row: number, col: number): boolean {
  return row >= s.r1 && row <= s.r2 && col >= s.c1 && col <= s.c2;
}

/** Every described cell that reads, directly or through other cells, one of the `sources`. */
export function downstreamOf(cells: LedgerCell[], names: Map<string, Span>, sources: Set<CellKey>): Set<CellKey> {
  const byColumn = new Map<number, LedgerCell[]>();
  for (const c of cells) {
    const list = byColumn.get(c.col) ?? [];
    list.push(c);
    byColumn.set(c.col, list);
  }
  for (const list of byColumn.values()) list.sort((a, b) => a.row - b.row);
  const readers = new Map<CellKey, CellKey[]>();
  for (const cell of cells) {
    if (cell.formula === undefined) continue;
    const me = key(cell.row, cell.col);
    for (const s of formulaSpans(cell.formula, names)) {
      for (let col = s.c1; col <= s.c2; col++) {
        const list = byColumn.get(col);
        if (!list) continue;
        for (let i = lowerBound(list, s.r1); i < list.length && list[i].row <= s.r2; i++) {
          const k = key(list[i].row, col);
          const r = readers.get(k) ?? [];
          r.push(me);
          readers.set(k, r);
        }
      }
    }
  }
  const out = new Set<CellKey>();
  const queue = [...sources];
  while (queue.length > 0) {
    const k = queue.pop()!;
    for (const r of readers.get(k) ?? []) {
      if (!out.has(r)) {
        out.add(r);
        queue.push(r);
      }
    }
  }
  return out;
}

function lowerBound(list: LedgerCell[], row: number): number {
  let lo = 0;
  let hi = list.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (list[mid].row < row) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}
