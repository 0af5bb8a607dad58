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
  // References to other sheets (the history cells) are not cells of the ledger.
  const withoutNames = text.replace(NAME, "").replace(/(?:'(?:[^']|'')+'|[A-Za-z_][A-Za-z0-9_.]*)!\$?[A-Z]{1,3}\$?\d+(?::\$?[A-Z]{1,3}\$?\d+)?/g, "");
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

/**
 * Every described cell that reads, directly or through other cells, one of the `sources`.
 * Single-cell references are looked up by cell; ranges are kept per column, grouped by their
 * first row with the last rows in order, so each range is visited once when it is reached:
 * the running sums of a long table (ranges from the first update row down to each row) cost
 * a few passes instead of one entry per cell they cover.
 */
export function downstreamOf(cells: LedgerCell[], names: Map<string, Span>, sources: Set<CellKey>): Set<CellKey> {
  const single = new Map<CellKey, CellKey[]>();
  const ranges = new Map<number, Map<number, { r2: number; reader: CellKey }[]>>();
  for (const cell of cells) {
    if (cell.formula === undefined) continue;
    const me = key(cell.row, cell.col);
    for (const s of formulaSpans(cell.formula, names)) {
      if (s.r1 === s.r2 && s.c1 === s.c2) {
        const k = key(s.r1, s.c1);
        const list = single.get(k);
        if (list) list.push(me);
        else single.set(k, [me]);
        continue;
      }
      for (let col = s.c1; col <= s.c2; col++) {
        let groups = ranges.get(col);
        if (!groups) ranges.set(col, (groups = new Map()));
        const group = groups.get(s.r1);
        if (group) group.push({ r2: s.r2, reader: me });
        else groups.set(s.r1, [{ r2: s.r2, reader: me }]);
      }
    }
  }
  for (const groups of ranges.values()) for (const g of groups.values()) g.sort((a, b) => a.r2 - b.r2);
  const out = new Set<CellKey>();
  const queue = [...sources];
  const reach = (reader: CellKey) => {
    if (!out.has(reader)) {
      out.add(reader);
      queue.push(reader);
    }
  };
  while (queue.length > 0) {
    const k = queue.pop()!;
    for (const r of single.get(k) ?? []) reach(r);
    const [row, col] = k.split(",").map(Number);
    const groups = ranges.get(col);
    if (!groups) continue;
    for (const [r1, group] of groups) {
      if (r1 > row) continue;
      // Every range of this group that ends at or below the row holds the cell; take them off.
      while (group.length > 0 && group[group.length - 1].r2 >= row) reach(group.pop()!.reader);
    }
  }
  return out;
}
