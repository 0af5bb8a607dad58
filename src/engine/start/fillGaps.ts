import { classicalIndices } from "../decompose";
import type { Seasonality } from "../types";

/**
 * Fill the blanks of a start window so its decomposition can run, by the seasonally adjusted
 * linear interpolation of Hyndman's na.interp (R's forecast package, documented in Hyndman &
 * Athanasopoulos, Forecasting: Principles and Practice, 2nd ed., section 12.9 "Missing values":
 * "a seasonal decomposition is first computed, then a linear interpolation is applied to the
 * seasonally adjusted data, and the seasonal component is added back"), with the classical
 * decomposition of the start itself in place of STL:
 *
 * 1. each blank is first filled by straight-line interpolation between the nearest values
 *    present before and after it (before the first or after the last value: the nearest value);
 * 2. with seasons, the classical indices of that filled window deseasonalise the values present,
 *    the blanks are interpolated again on the deseasonalised values, and reseasonalised.
 *
 * A season position left blank in every season of the window gets its index from its
 * neighbours this way, so the start never fails for a blank. Returns the window unchanged when
 * nothing is blank.
 */
export function fillStartGaps(w: Float64Array, p: number, seasonality: Seasonality, seasonal: boolean): { values: Float64Array; filled: number[] } {
  const filled: number[] = [];
  for (let t = 0; t < w.length; t++) if (Number.isNaN(w[t])) filled.push(t);
  if (filled.length === 0) return { values: w, filled };
  let values = interpolateLinear(w);
  if (seasonal) {
    const mult = seasonality === "multiplicative";
    const idx = classicalIndices(values, p, seasonality).normal;
    const adjusted = new Float64Array(w.length);
    for (let t = 0; t < w.length; t++) adjusted[t] = mult ? w[t] / idx[t % p] : w[t] - idx[t % p];
    const smooth = interpolateLinear(adjusted);
    values = Float64Array.from(w);
    for (const t of filled) values[t] = mult ? smooth[t] * idx[t % p] : smooth[t] + idx[t % p];
  }
  return { values, filled };
}

/** Straight-line interpolation over NaN gaps; the nearest value present at either end. */
export function interpolateLinear(y: Float64Array): Float64Array {
  const out = Float64Array.from(y);
  let prev = -1;
  for (let t = 0; t <= y.length; t++) {
    if (t < y.length && Number.isNaN(y[t])) continue;
    // t is present (or one past the end): fill prev+1 .. t-1
    for (let k = prev + 1; k < t; k++) {
      if (prev < 0 && t >= y.length) break;
      if (prev < 0) out[k] = y[t];
      else if (t >= y.length) out[k] = y[prev];
      else out[k] = y[prev] + ((y[t] - y[prev]) * (k - prev)) / (t - prev);
    }
    prev = t;
  }
  return out;
}
