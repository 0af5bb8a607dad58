/**
 * Sample autocorrelation function (ACF) with missing values, and the seasonality test of the
 * M3 competition's Naive2 benchmark.
 *
 * Series are oldest first; NaN marks a missing period.
 */

/**
 * Sample autocorrelations r_1..r_maxLag of a series.
 *
 * Without missing values this is the textbook estimator (Box & Jenkins; Hyndman &
 * Athanasopoulos, Forecasting: Principles and Practice, section "Autocorrelation"):
 *
 *     r_k = sum_{t=1}^{n-k} (y_t - ybar)(y_{t+k} - ybar) / sum_{t=1}^{n} (y_t - ybar)^2
 *
 * With missing values (NaN) the mean and the denominator use the N values present, and the
 * lag-k numerator is the mean cross product over the m_k pairs where both values are present,
 * multiplied back by (n - k) / n so that, without gaps, the estimator is exactly the one above:
 *
 *     r_k = [(1/m_k) sum_pairs (y_t - ybar)(y_{t+k} - ybar)] / [(1/N) sum (y_t - ybar)^2] * (n - k) / n
 *
 * (the "skip incomplete pairs" treatment of gaps, as in common statistical software's
 * pass-through of missing values; the rescaling to pair counts is ours so that a gap does not
 * shrink the autocorrelation at one lag more than at another). Values are clamped to [-1, 1].
 * r_k is 0 where no pair exists, and all r_k are 0 for a constant series (no variation to
 * correlate). Only finite values count as present.
 *
 * @param y series, oldest first, NaN for a missing period
 * @param maxLag largest lag wanted (>= 0)
 * @returns Float64Array of length maxLag + 1; element 0 is 1 (0 for a constant or empty series)
 * @example
 * acf([1, 2, 3, 4], 1)[1] // 0.25: sum of cross products 1.25 over sum of squares 5
 */
export function acf(y: ArrayLike<number>, maxLag: number): Float64Array {
  const n = y.length;
  const L = Math.max(0, Math.floor(maxLag));
  const r = new Float64Array(L + 1);
  let count = 0;
  let sum = 0;
  for (let t = 0; t < n; t++) {
    const v = y[t];
    if (Number.isFinite(v)) {
      count++;
      sum += v;
    }
  }
  if (count === 0) return r;
  const mean = sum / count;
  const d = new Float64Array(n);
  let ss = 0;
  for (let t = 0; t < n; t++) {
    const v = y[t];
    if (Number.isFinite(v)) {
      d[t] = v - mean;
      ss += d[t] * d[t];
    } else {
      d[t] = NaN;
    }
  }
  const c0 = ss / count;
  // A series with no variation (relative to its size) has no autocorrelation to speak of.
  const scale = Math.max(Math.abs(mean), 1e-300);
  if (!(c0 > 0) || Math.sqrt(c0) <= 1e-12 * scale) return r;
  r[0] = 1;
  for (let k = 1; k <= L && k < n; k++) {
    let pairs = 0;
    let cross = 0;
    for (let t = 0; t + k < n; t++) {
      const a = d[t];
      const b = d[t + k];
      if (a === a && b === b) {
        pairs++;
        cross += a * b;
      }
    }
    if (pairs === 0) continue;
    const rk = ((cross / pairs) / c0) * ((n - k) / n);
    r[k] = rk > 1 ? 1 : rk < -1 ? -1 : rk;
  }
  return r;
}

/**
 * The seasonality test of the M3 competition's deseasonalised naive benchmark (Naive2):
 * a series is treated as seasonal with season length p when its lag-p autocorrelation is
 * significantly different from zero at the 90% level,
 *
 *     |r_p| > 1.645 * sqrt((1 + 2 * sum_{k=1}^{p-1} r_k^2) / n)
 *
 * i.e. r_p outside the 90% band built on Bartlett's standard error for an MA(p-1) process.
 * Sources: Makridakis, S. & Hibon, M. (2000), "The M3-Competition: results, conclusions and
 * implications", International Journal of Forecasting 16(4), 451-476 (Naive2 and its
 * seasonality test); Makridakis, S., Wheelwright, S. C. & Hyndman, R. J. (1998),
 * Forecasting: Methods and Applications, 3rd ed., Wiley (the autocorrelation test and
 * Bartlett's standard error).
 *
 * The ACF is that of the raw series (no detrending), as in the benchmark; r_k comes from
 * {@link acf}, so missing values are skipped pair by pair and n is the number of values
 * present. Returns false when p < 2 (nothing to test) or when fewer than p + 1 values are
 * present. The published benchmark code of the later M4 competition also applies the test only
 * to series with at least 3 seasons of data; that length rule is left to the caller.
 *
 * @param y series, oldest first, NaN for a missing period
 * @param p candidate season length (integer >= 2)
 * @returns true when the series passes the 90% seasonality test at lag p
 * @example
 * seasonalityTest90([1, 5, 1, 5, 1, 5, 1, 5, 1, 5, 1, 5], 2) // true: r_1 = -11/12, r_2 = 10/12 > 1.645*sqrt((1 + 2*(11/12)^2)/12) = 0.78
 */
export function seasonalityTest90(y: ArrayLike<number>, p: number): boolean {
  if (!Number.isInteger(p) || p < 2) return false;
  let present = 0;
  for (let t = 0; t < y.length; t++) if (Number.isFinite(y[t])) present++;
  if (present < p + 1 || y.length <= p) return false;
  const r = acf(y, p);
  let s = 0;
  for (let k = 1; k < p; k++) s += r[k] * r[k];
  const limit = 1.645 * Math.sqrt((1 + 2 * s) / present);
  return Math.abs(r[p]) > limit;
}
