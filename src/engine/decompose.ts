import { badInput, notEnough } from "./errors";
import type { Seasonality } from "./types";

/**
 * Centered moving average of order p (a 2xp average for even p), as in classical
 * decomposition (Makridakis, Wheelwright & Hyndman 1998, ch. 4; base R `decompose`).
 * NaN where the window runs past either end or covers a missing value.
 * @example centeredMovingAverage([1,2,3,4,5,6], 2) // [NaN, 2, 3, 4, 5, NaN]
 */
export function centeredMovingAverage(y: ArrayLike<number>, p: number): Float64Array {
  const n = y.length;
  const out = new Float64Array(n).fill(NaN);
  const even = p % 2 === 0;
  const half = Math.floor(p / 2);
  for (let t = half; t + half <= n - 1; t++) {
    let sum = 0;
    if (even) {
      sum = 0.5 * y[t - half] + 0.5 * y[t + half];
      for (let j = t - half + 1; j <= t + half - 1; j++) sum += y[j];
    } else {
      for (let j = t - half; j <= t + half; j++) sum += y[j];
    }
    out[t] = sum / p; // NaN propagates from a missing value
  }
  return out;
}

export interface Decomposition {
  movingAverage: Float64Array;
  /** y / MA (multiplicative) or y - MA (additive). */
  detrended: Float64Array;
  /** Per-position means of the detrended values; position 0 is the first value of `y`. */
  raw: Float64Array;
  /** raw normalised to mean 1 (multiplicative) or sum 0 (additive). */
  normal: Float64Array;
}

/**
 * Classical decomposition seasonal indices of `y` (all of it) for season length p.
 * Missing values are skipped; a season position with no detrended value is an error.
 */
export function classicalIndices(y: ArrayLike<number>, p: number, seasonality: Seasonality): Decomposition {
  if (!(p >= 2)) throw badInput("bad-period", `The season length must be 2 or more for seasonal indices; got ${p}.`);
  if (y.length < 2 * p) throw notEnough(2 * p, y.length);
  const mult = seasonality === "multiplicative";
  const ma = centeredMovingAverage(y, p);
  const det = new Float64Array(y.length);
  for (let t = 0; t < y.length; t++) det[t] = mult ? y[t] / ma[t] : y[t] - ma[t];
  const raw = new Float64Array(p);
  for (let j = 0; j < p; j++) {
    let s = 0;
    let c = 0;
    for (let t = j; t < y.length; t += p) {
      if (!Number.isNaN(det[t])) {
        s += det[t];
        c++;
      }
    }
    if (c === 0) {
      throw badInput("start-gap", `Season position ${j + 1} has no usable value in the start window (blanks around it). Fill the gaps or use more seasons.`);
    }
    raw[j] = s / c;
  }
  let mean = 0;
  for (let j = 0; j < p; j++) mean += raw[j];
  mean /= p;
  const normal = new Float64Array(p);
  for (let j = 0; j < p; j++) normal[j] = mult ? raw[j] / mean : raw[j] - mean;
  if (mult && !(mean > 0)) throw badInput("bad-indices", "The seasonal ratios are not positive; use additive seasonality for this series.");
  return { movingAverage: ma, detrended: det, raw, normal };
}

/** Ordinary least-squares line through (x[i], y[i]), skipping NaN y. */
export function leastSquaresLine(x: ArrayLike<number>, y: ArrayLike<number>): { intercept: number; slope: number } {
  let n = 0;
  let sx = 0;
  let sy = 0;
  for (let i = 0; i < y.length; i++) {
    if (Number.isNaN(y[i])) continue;
    n++;
    sx += x[i];
    sy += y[i];
  }
  if (n < 2) throw notEnough(2, n, "usable values in the start window");
  const mx = sx / n;
  const my = sy / n;
  let sxy = 0;
  let sxx = 0;
  for (let i = 0; i < y.length; i++) {
    if (Number.isNaN(y[i])) continue;
    sxy += (x[i] - mx) * (y[i] - my);
    sxx += (x[i] - mx) * (x[i] - mx);
  }
  const slope = sxy / sxx;
  return { intercept: my - slope * mx, slope };
}
