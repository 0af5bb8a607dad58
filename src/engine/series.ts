import { badInput } from "./errors";

/**
 * Turn a history into the engine's form: a Float64Array with NaN for missing periods.
 * Trailing missing values are dropped, so a range over B2:B200 works while only B2:B40
 * hold actuals. Leading missing values are kept as missing periods.
 */
export function cleanHistory(values: ArrayLike<number | null | undefined>): Float64Array {
  let end = values.length;
  while (end > 0 && isMissing(values[end - 1])) end--;
  const out = new Float64Array(end);
  for (let i = 0; i < end; i++) {
    const v = values[i];
    if (isMissing(v)) out[i] = NaN;
    else if (typeof v !== "number" || !Number.isFinite(v)) {
      throw badInput("not-a-number", `Value ${i + 1} of the history is not a finite number. Replace it with a number or leave the cell blank.`, { index: i });
    } else out[i] = v;
  }
  return out;
}

export function isMissing(v: unknown): boolean {
  return v === null || v === undefined || (typeof v === "number" && Number.isNaN(v));
}

/** Count of non-missing values. */
export function countPresent(y: ArrayLike<number>): number {
  let c = 0;
  for (let i = 0; i < y.length; i++) if (!Number.isNaN(y[i])) c++;
  return c;
}

/** Multiplicative seasonality divides by indices and levels: every actual must be positive. */
export function requirePositive(y: ArrayLike<number>): void {
  for (let i = 0; i < y.length; i++) {
    if (y[i] <= 0) {
      throw badInput(
        "non-positive",
        `Value ${i + 1} of the history is ${y[i]}: multiplicative seasonality needs every actual above 0. Use additive seasonality, or correct the value.`,
        { index: i },
      );
    }
  }
}

export function allPositive(y: ArrayLike<number>): boolean {
  for (let i = 0; i < y.length; i++) if (y[i] <= 0) return false;
  return true;
}
