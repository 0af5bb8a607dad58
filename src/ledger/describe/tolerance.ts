/**
 * The size of numbers a ledger's check allows for rounding: formulas recomputed by a
 * spreadsheet agree with the engine to about 1e-12 of the data's size (LibreOffice and the
 * preview's engine both); the check allows 1e-9, relative to a value's own size and, for
 * values that are differences of data-sized numbers, to the data's size.
 */
export const RELATIVE_TOLERANCE = 1e-9;

/** Typical size of the data: the mean absolute actual (1 without actuals). */
export function dataScale(history: ArrayLike<number | null>): number {
  let s = 0;
  let c = 0;
  for (let i = 0; i < history.length; i++) {
    const v = history[i];
    if (v !== null && !Number.isNaN(v)) {
      s += Math.abs(v);
      c++;
    }
  }
  return c > 0 ? s / c : 1;
}
