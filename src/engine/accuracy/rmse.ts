import { finite, pairs } from "./pairs";

/**
 * RMSE, the root mean squared forecast error:
 *
 *     RMSE = sqrt((1/n) * sum_t (y_t - f_t)^2)
 *
 * over the n periods where both the actual and the forecast are present. Computed with the errors
 * scaled by the largest one, so it does not overflow where the MSE itself would.
 * Source: the standard definition, e.g. Hyndman & Koehler (2006), "Another look at measures of
 * forecast accuracy", International Journal of Forecasting 22(4), 679-688.
 *
 * @param actual actuals, oldest first (NaN = missing)
 * @param forecast forecasts for the same periods (NaN = missing)
 * @returns the root mean squared error, in the units of the data
 * @throws EbbError #VALUE! for ranges of different length; #N/A when no period has both values
 * @example
 * rmse([10, 12, 8], [11, 10, 8]) // sqrt(5/3) = 1.2910
 */
export function rmse(actual: ArrayLike<number>, forecast: ArrayLike<number>): number {
  const p = pairs(actual, forecast, "RMSE");
  let big = 0;
  for (let i = 0; i < p.count; i++) big = Math.max(big, Math.abs(p.actual[i] - p.forecast[i]));
  if (big === 0) return 0;
  if (!Number.isFinite(big)) return finite(big, "RMSE");
  let s = 0;
  for (let i = 0; i < p.count; i++) {
    const e = (p.actual[i] - p.forecast[i]) / big;
    s += e * e;
  }
  return finite(big * Math.sqrt(s / p.count), "RMSE");
}
