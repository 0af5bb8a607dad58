import { badInput, notEnough } from "../errors";
import { detectPeriod } from "../period";
import { checkFinite, finite, pairs } from "./pairs";

/**
 * The scale of MASE: the in-sample mean absolute error of the seasonal naive forecast
 * (each value forecast by the value one season earlier) over the history,
 *
 *     Q = (1/(n - p)) * sum_{t=p+1}^{n} |h_t - h_{t-p}|
 *
 * skipping pairs where either value is missing (the mean is then over the pairs present).
 * @throws EbbError #N/A when no pair one season apart is present; #VALUE! when Q is 0
 */
export function maseScale(history: ArrayLike<number>, period: number): number {
  checkFinite(history, "history");
  let count = 0;
  let present = 0;
  let s = 0;
  for (let t = 0; t < history.length; t++) {
    const h = history[t];
    if (h !== h) continue;
    present++;
    if (t < period) continue;
    const b = history[t - period];
    if (b !== b) continue;
    count++;
    s += Math.abs(h - b);
  }
  if (count === 0) throw notEnough(period + 1, present, "history values (at least one pair a season apart)");
  const q = finite(s / count, "MASE");
  if (q === 0) {
    throw badInput(
      "mase-flat-history",
      `MASE is undefined for this history: it does not change from one season to the next (period ${period}), so the seasonal naive forecast is exact and the MASE scale is 0. Use MAD instead.`,
    );
  }
  return q;
}

/**
 * MASE, the mean absolute scaled error: the forecasts' mean absolute error divided by the in-sample
 * mean absolute error of the seasonal naive forecast over the history,
 *
 *     MASE = mean_t |y_t - f_t| / Q,   Q = (1/(n - p)) * sum_{t=p+1}^{n} |h_t - h_{t-p}|
 *
 * with season length p; p = 1 gives the plain naive (no-change) forecast. Below 1, the forecasts
 * beat the one-step seasonal naive forecast's average in-sample error; above 1 they do worse.
 * Source: Hyndman, R. J. & Koehler, A. B. (2006), "Another look at measures of forecast
 * accuracy", International Journal of Forecasting 22(4), 679-688 (scaled errors), with the seasonal
 * naive scale as in Hyndman & Athanasopoulos, Forecasting: Principles and Practice, "Scaled errors".
 *
 * Missing values are skipped pair by pair, in the errors and in the scale.
 *
 * @param actual actuals, oldest first (NaN = missing)
 * @param forecast forecasts for the same periods (NaN = missing)
 * @param history the in-sample history the forecasts were made from, oldest first (NaN = missing)
 * @param period season length p (integer >= 1); 0 or omitted: detected from the history with {@link detectPeriod}
 * @returns the MASE (no unit)
 * @throws EbbError #VALUE! for a bad period, ranges of different length, or a flat history (scale 0); #N/A when the history is too short or no period has both values
 * @example
 * // history 10, 20, 30, 20, 10 with p = 2: Q = (|30-10| + |20-20| + |10-30|) / 3 = 40/3
 * mase([25, 15], [20, 20], [10, 20, 30, 20, 10], 2) // MAE 5 / (40/3) = 0.375
 */
export function mase(actual: ArrayLike<number>, forecast: ArrayLike<number>, history: ArrayLike<number>, period?: number): number {
  let p = period ?? 0;
  if (!Number.isInteger(p) || p < 0) {
    throw badInput("bad-period", `MASE: the period must be a whole number of at least 1 (or 0 to detect it), not ${period}.`);
  }
  const e = pairs(actual, forecast, "MASE");
  if (p === 0) p = detectPeriod(history);
  const q = maseScale(history, p);
  let s = 0;
  for (let i = 0; i < e.count; i++) s += Math.abs(e.actual[i] - e.forecast[i]);
  return finite(s / e.count / q, "MASE");
}
