/** The grid's selection: an anchor cell (where it started) and an active cell (where it is now). */
import type { CellRect } from "../workbook/previewWorkbook";

export interface CellPos {
  row: number;
  col: number;
}

export interface Selection {
  anchor: CellPos;
  active: CellPos;
}

export function rectOf(s: Selection): CellRect {
  return {
    top: Math.min(s.anchor.row, s.active.row),
    bottom: Math.max(s.anchor.row, s.active.row),
    left: Math.min(s.anchor.col, s.active.col),
    right: Math.max(s.anchor.col, s.active.col),
  };
}

export function single(pos: CellPos): Selection {
  return { anchor: { ...pos }, active: { ...pos } };
}

export function contains(r: CellRect, row: number, col: number): boolean {
  return row >= r.top && row <= r.bottom && col >= r.left && col <= r.right;
}

/** Moves (or, with extend, stretches) a selection by one step, kept inside the sheet's shown area. */
export function moved(s: Selection, dRow: number, dCol: number, extend: boolean, rows: number, cols: number): Selection {
  const active = {
    row: clamp(s.active.row + dRow, 0, rows - 1),
    col: clamp(s.active.col + dCol, 0, cols - 1),
  };
  return extend ? { anchor: s.anchor, active } : single(active);
}

function clamp(v: number, lo: number, hi: number): number {
  return Math.max(lo, Math.min(hi, v));
}
