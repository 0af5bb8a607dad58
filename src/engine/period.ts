/**
 * Season length detection from the autocorrelation function (ACF).
 */
import { acf } from "./acf";
import { badInput } from "./errors";

/**
 * Detects the season length of a series: the lag at which the detrended series' autocorrelation
 * has its strongest significant seasonal peak, or 1 when there is none.
 *
 * Idea (textbook practice, e.g. Hyndman & Athanasopoulos, Forecasting: Principles and Practice,
 * section "Autocorrelation"; Makridakis, Wheelwright & Hyndman 1998, Forecasting: Methods and
 * Applications): once the trend is removed, a seasonal series has a "scalloped" ACF, larger at
 * the seasonal lag than at the lags around it, and significant against the white-noise band
 * +/-1.96/sqrt(n). The rule below is
 * Ebb's own tightening of that practice, made so that white noise, trends, random walks and level
 * shifts give 1; the thresholds were chosen and checked on seeded simulations
 * (test/engine/period.test.ts keeps a reproducible check of both error rates).
 *
 * Method, on the series with leading and trailing missing values removed (length n):
 *
 * 1. Candidate lags k = 2..K with K = min(maxPeriod, floor(n/3)), so that every candidate season
 *    repeats at least three times. K < 2 gives 1.
 * 2. Stage 1: remove the least-squares straight line (fitted over the values present) and take the
 *    ACF r_1..r_{K+1} ({@link acf}: missing values are skipped pair by pair).
 * 3. Lag k is a seasonal peak when all of these hold (N = number of values present, s = 1):
 *    a. it is a local maximum: r_k > r_{k-1} and r_k >= r_{k+1};
 *    b. it is significant: r_k > z * s / sqrt(N), where z is the one-sided normal quantile at
 *       0.05 / (K - 1): the white-noise band with a Bonferroni correction for testing K - 1 lags,
 *       so that a series without seasonality passes by chance in about 5% of cases at most,
 *       instead of in about half of them with 1.96 at every lag;
 *    c. it rises above the trough half a season back: r_k - min(r_j, ceil(k/2) <= j < k) >
 *       1.96 * s * sqrt(2/N). A seasonal ACF swings between peaks and troughs; the slowly
 *       decaying ACF left by a curved trend, a level shift or a persistent series does not, and
 *       would otherwise yield spurious "peaks".
 * 4. The strongest peak k* (largest r_k) is taken; if a divisor d of k* (2 <= d < k*) is itself a
 *    peak with r_d >= r_{k*} - 1/sqrt(N), the smallest such d is taken instead (the ACF also peaks
 *    at whole multiples of the season length, and noise can make a multiple the tallest).
 * 5. Stage 2, only when stage 1 finds no peak: the same on the first differences (consecutive
 *    values both present), themselves freed of a straight line (a quadratic trend in the data),
 *    with s = sqrt(1.5): differencing white noise gives r_1 = -0.5, and Bartlett's formula then
 *    gives var(r_k) = (1 + 2 * 0.25) / N at the other lags. This stage finds seasonality riding
 *    on a wandering (random-walk) level, which a straight line cannot remove.
 * 6. No peak in either stage: 1. A residual that is only rounding noise (root mean square below
 *    1e-9 of the largest absolute value of the data, as for an exact straight line) counts as
 *    no peak.
 *
 * Deterministic: no randomness, the same input gives the same answer.
 *
 * @param y history, oldest first; NaN marks a missing period
 * @param maxPeriod the longest season length considered (default 24); floor(n/3) also limits it
 * @returns the detected season length, or 1 when no seasonality is found
 * @throws EbbError #VALUE! when a value is infinite or maxPeriod is not a number >= 1
 * @example
 * detectPeriod([5, 9, 2, 5, 9, 2, 5, 9, 2, 5, 9, 2]) // 3
 */
export function detectPeriod(y: ArrayLike<number>, maxPeriod = 24): number {
  if (typeof maxPeriod !== "number" || !(maxPeriod >= 1) || !Number.isFinite(maxPeriod)) {
    throw badInput("bad-max-period", `The longest season length to consider must be a number of at least 1, not ${maxPeriod}.`);
  }
  for (let i = 0; i < y.length; i++) {
    const v = y[i];
    if (v === Infinity || v === -Infinity) {
      throw badInput("not-finite", `The history holds an infinite value in cell ${i + 1}. Use finite numbers, or leave the cell blank for a missing value.`, { index: i });
    }
  }
  let first = 0;
  let last = y.length - 1;
  while (first <= last && !(y[first] === y[first])) first++;
  while (last >= first && !(y[last] === y[last])) last--;
  const n = last - first + 1;
  if (n <= 0) return 1;
  const series = new Float64Array(n);
  for (let i = 0; i < n; i++) series[i] = y[first + i];

  const K = Math.min(Math.floor(maxPeriod), Math.floor(n / 3));
  if (K < 2) return 1;

  // Residuals this small against the data are rounding noise (an exact line, a constant series).
  let size = 0;
  for (let i = 0; i < n; i++) if (series[i] === series[i]) size = Math.max(size, Math.abs(series[i]));
  const negligible = 1e-9 * size;

  const stage1 = seasonalPeak(removeLine(series), K, 1, negligible);
  if (stage1 > 1) return stage1;

  const diff = new Float64Array(n - 1);
  for (let t = 1; t < n; t++) diff[t - 1] = series[t] - series[t - 1]; // NaN when either is missing
  return seasonalPeak(removeLine(diff), K, Math.sqrt(1.5), negligible);
}

/** Residuals from the least-squares line over the values present (NaN stays NaN). */
function removeLine(x: Float64Array): Float64Array {
  const n = x.length;
  let c = 0;
  let sx = 0;
  let sy = 0;
  for (let t = 0; t < n; t++) {
    if (x[t] === x[t]) {
      c++;
      sx += t;
      sy += x[t];
    }
  }
  const out = new Float64Array(n);
  if (c === 0) return out.fill(NaN);
  const mx = sx / c;
  const my = sy / c;
  let sxx = 0;
  let sxy = 0;
  for (let t = 0; t < n; t++) {
    if (x[t] === x[t]) {
      sxx += (t - mx) * (t - mx);
      sxy += (t - mx) * (x[t] - my);
    }
  }
  const slope = sxx > 0 ? sxy / sxx : 0;
  for (let t = 0; t < n; t++) out[t] = x[t] === x[t] ? x[t] - my - slope * (t - mx) : NaN;
  return out;
}

/** Steps 3-4 of detectPeriod on one detrended series; 1 when there is no peak. */
function seasonalPeak(x: Float64Array, K: number, s: number, negligible: number): number {
  let present = 0;
  let ss = 0;
  for (let t = 0; t < x.length; t++) {
    if (x[t] === x[t]) {
      present++;
      ss += x[t] * x[t];
    }
  }
  if (present < 6 || Math.sqrt(ss / present) <= negligible) return 1;
  const r = acf(x, K + 1);
  if (r[0] === 0) return 1; // no variation left (e.g. an exact straight line)
  const sd = s / Math.sqrt(present);
  const bound = normalUpperQuantile(0.05 / (K - 1)) * sd;
  const swing = 1.96 * Math.SQRT2 * sd;
  const isPeak = (k: number): boolean => {
    if (!(r[k] > r[k - 1] && r[k] >= r[k + 1] && r[k] > bound)) return false;
    let trough = Infinity;
    for (let j = Math.ceil(k / 2); j < k; j++) trough = Math.min(trough, r[j]);
    return r[k] - trough > swing;
  };
  let best = 1;
  let bestR = -Infinity;
  const peak: boolean[] = [];
  for (let k = 2; k <= K; k++) {
    peak[k] = isPeak(k);
    if (peak[k] && r[k] > bestR) {
      bestR = r[k];
      best = k;
    }
  }
  if (best === 1) return 1;
  const tolerance = 1 / Math.sqrt(present);
  for (let d = 2; d < best; d++) {
    if (best % d === 0 && peak[d] && r[d] >= bestR - tolerance) return d;
  }
  return best;
}

/**
 * Upper-tail probability of the standard normal distribution, Q(z) = P(Z > z), for z >= 0, by
 * Abramowitz & Stegun (1964), Handbook of Mathematical Functions, formula 26.2.17
 * (absolute error below 7.5e-8).
 */
function normalUpperTail(z: number): number {
  const t = 1 / (1 + 0.2316419 * z);
  const poly = t * (0.31938153 + t * (-0.356563782 + t * (1.781477937 + t * (-1.821255978 + t * 1.330274429))));
  return (Math.exp((-z * z) / 2) / Math.sqrt(2 * Math.PI)) * poly;
}

/** z with Q(z) = alpha (0 < alpha < 0.5), by bisection on {@link normalUpperTail}. */
function normalUpperQuantile(alpha: number): number {
  let lo = 0;
  let hi = 12;
  for (let i = 0; i < 60; i++) {
    const mid = (lo + hi) / 2;
    if (normalUpperTail(mid) > alpha) lo = mid;
    else hi = mid;
  }
  return (lo + hi) / 2;
}
