import type { LedgerCell, StyleRole } from "./types";

/** How each role looks. Ebb's own palette: slate headings, sand inputs, grey records. */
export interface RoleStyle {
  bold?: boolean;
  italic?: boolean;
  size?: number;
  color?: string;
  fill?: string;
  wrap?: boolean;
}

export const ROLE_STYLES: Record<StyleRole, RoleStyle> = {
  title: { bold: true, size: 14, color: "#23404A" },
  subtitle: { italic: true, color: "#4F6670" },
  heading: { bold: true, size: 12, color: "#23404A" },
  header: { bold: true, color: "#23404A", fill: "#DDE7E4", wrap: true },
  label: {},
  input: { fill: "#FBEFC8", bold: true },
  written: { color: "#595959" }, // 7:1 on white, above the 4.5:1 accessibility minimum
  actual: { fill: "#EEF3F7" },
  linked: { color: "#4F6670", fill: "#F2F2F6" },
  start: { fill: "#F2F2F6" },
  formula: {},
  result: { bold: true },
  engine: { italic: true, color: "#6A4C93" },
  explain: { italic: true, color: "#4F6670" },
};

/** Fill and text colour of a flagged tracking signal. */
export const FLAG_STYLE = { fill: "#F6C9C0", color: "#7A1F14" };

/** Runs of horizontally adjacent cells sharing a role: [row, firstCol, lastCol, role]. */
export function roleRuns(cells: LedgerCell[]): { row: number; first: number; last: number; role: StyleRole }[] {
  const sorted = [...cells].sort((a, b) => a.row - b.row || a.col - b.col);
  const runs: { row: number; first: number; last: number; role: StyleRole }[] = [];
  for (const c of sorted) {
    const prev = runs[runs.length - 1];
    if (prev && prev.row === c.row && prev.last === c.col - 1 && prev.role === c.role) prev.last = c.col;
    else runs.push({ row: c.row, first: c.col, last: c.col, role: c.role });
  }
  return runs;
}

/** Rectangles of cells sharing a role (horizontal runs stacked over consecutive rows). */
export function roleRectangles(cells: LedgerCell[]): { r1: number; r2: number; c1: number; c2: number; role: StyleRole }[] {
  const rects: { r1: number; r2: number; c1: number; c2: number; role: StyleRole }[] = [];
  const open = new Map<string, { r1: number; r2: number; c1: number; c2: number; role: StyleRole }>();
  for (const run of roleRuns(cells)) {
    const k = `${run.first},${run.last},${run.role}`;
    const rect = open.get(k);
    if (rect && rect.r2 === run.row - 1) rect.r2 = run.row;
    else {
      const fresh = { r1: run.row, r2: run.row, c1: run.first, c2: run.last, role: run.role };
      rects.push(fresh);
      open.set(k, fresh);
    }
  }
  return rects;
}
