/**
 * Where the running function's range arguments lie on the sheet, when the host says (the
 * preview's formula engine always does): messages then name the cell a planner sees (B86)
 * instead of a position ("cell 85 of history"). Set by invoke() for one call.
 */
import { EbbError } from "../engine";
import { cellAddress, shownAddress } from "../ledger/describe/addresses";

/** A range argument's top-left cell and size; `sheet` only when it is not the formula's own sheet. */
export interface RangePlace {
  sheet?: string;
  row: number;
  col: number;
  rows: number;
  cols: number;
}

export type ArgumentPlaces = Record<string, RangePlace | undefined>;

let current: ArgumentPlaces | undefined;

/** Run one function call with the places of its arguments (by parameter name). */
export function withPlaces<T>(places: ArgumentPlaces | undefined, run: () => T): T {
  const before = current;
  current = places;
  try {
    return run();
  } finally {
    current = before;
  }
}

/**
 * The address of position `index` of series `column` of a range argument (a single row is one
 * series along the row; otherwise one series per column), or undefined when the host did not say.
 */
export function addressIn(argument: string, index: number, column = 0): string | undefined {
  const p = current?.[argument];
  if (!p) return undefined;
  const along = p.rows === 1 && p.cols > 1;
  const row = along ? p.row : p.row + index;
  const col = along ? p.col + index : p.col + column;
  return p.sheet === undefined ? cellAddress(row, col) : shownAddress(p.sheet, row, col);
}

/** The error with the address of the input cell it is about in front, when the engine said which and the host where. */
export function located(e: EbbError, column = 0): EbbError {
  if (!e.at) return e;
  const address = addressIn(e.at.argument ?? "history", e.at.index, column);
  return address ? new EbbError(e.kind, e.code, `${address}: ${e.message}`) : e;
}
