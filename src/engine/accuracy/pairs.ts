/**
 * Shared input handling of the accuracy measures (internal to the accuracy module).
 *
 * Every measure takes an `actual` and a `forecast` range of the same length, oldest first.
 * NaN marks a missing value (a blank cell): a period where either side is missing is skipped.
 * Infinite values are refused. Measures never return NaN or Infinity.
 */
import { badInput, notEnough } from "../errors";

/** The periods where both an actual and a forecast are present, in order. */
export interface Pairs {
  actual: Float64Array;
  forecast: Float64Array;
  /** 0-based position in the input of each pair. */
  position: Int32Array;
  count: number;
}

/** Throws #VALUE! when a range holds an infinite value. */
export function checkFinite(values: ArrayLike<number>, label: string): void {
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    if (v === Infinity || v === -Infinity) {
      throw badInput("not-finite", `The ${label} range holds an infinite value in cell ${i + 1}. Use finite numbers, or leave the cell blank for a missing value.`, { index: i, argument: label });
    }
    if (typeof v !== "number") {
      throw badInput("not-a-number", `The ${label} range holds a non-number in cell ${i + 1}. Use numbers, or leave the cell blank for a missing value.`, { index: i, argument: label });
    }
  }
}

/**
 * Checks the two ranges and returns the periods where both values are present.
 * @param measure name of the measure, for messages
 * @throws #VALUE! when the lengths differ or a value is infinite; #N/A when no period has both values
 */
export function pairs(actual: ArrayLike<number>, forecast: ArrayLike<number>, measure: string): Pairs {
  if (actual.length !== forecast.length) {
    throw badInput(
      "length-mismatch",
      `${measure}: the actual and forecast ranges must have the same number of cells (actual has ${actual.length}, forecast has ${forecast.length}). Select ranges of equal size, one forecast per actual.`,
    );
  }
  checkFinite(actual, "actual");
  checkFinite(forecast, "forecast");
  const n = actual.length;
  const a = new Float64Array(n);
  const f = new Float64Array(n);
  const pos = new Int32Array(n);
  let count = 0;
  for (let i = 0; i < n; i++) {
    const y = actual[i];
    const g = forecast[i];
    if (y === y && g === g) {
      a[count] = y;
      f[count] = g;
      pos[count] = i;
      count++;
    }
  }
  if (count === 0) throw notEnough(1, 0, "period(s) with both an actual and a forecast");
  return { actual: a.subarray(0, count), forecast: f.subarray(0, count), position: pos.subarray(0, count), count };
}

/** Returns `value` when finite; otherwise throws #VALUE! (the sums overflowed double precision). */
export function finite(value: number, measure: string): number {
  if (!Number.isFinite(value)) {
    throw badInput("overflow", `${measure} cannot be computed: the values are too large for double precision. Rescale the data (for example to thousands of units).`);
  }
  // Normalise -0 to 0 so a perfect forecast reads 0.
  return value === 0 ? 0 : value;
}
