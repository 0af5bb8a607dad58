import { finite, pairs } from "./pairs";

/**
 * MSE, the mean squared forecast error:
 *
 *     MSE = (1/n) * sum_t (y_t - f_t)^2
 *
 * over the n periods where both the actual and the forecast are present.
 * Source: the standard definition, e.g. Hyndman & Koehler (2006), "Another look at measures of
 * forecast accuracy", International Journal of Forecasting 22(4), 679-688.
 *
 * @param actual actuals, oldest first (NaN = missing)
 * @param forecast forecasts for the same periods (NaN = missing)
 * @returns the mean squared error, in squared units of the data
 * @throws EbbError #VALUE! for ranges of different length or an overflow; #N/A when no period has both values
 * @example
 * mse([10, 12, 8], [11, 10, 8]) // (1 + 4 + 0) / 3 = 5/3
 */
export function mse(actual: ArrayLike<number>, forecast: ArrayLike<number>): number {
  const p = pairs(actual, forecast, "MSE");
  let s = 0;
  for (let i = 0; i < p.count; i++) {
    const e = p.actual[i] - p.forecast[i];
    s += e * e;
  }
  return finite(s / p.count, "MSE");
}
