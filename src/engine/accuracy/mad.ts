import { finite, pairs } from "./pairs";

/**
 * MAD, the mean absolute deviation of the forecast errors (also called the mean absolute error, MAE):
 *
 *     MAD = (1/n) * sum_t |y_t - f_t|
 *
 * over the n periods where both the actual y_t and the forecast f_t are present.
 * Source: the standard definition, e.g. Hyndman, R. J. & Koehler, A. B. (2006), "Another look at
 * measures of forecast accuracy", International Journal of Forecasting 22(4), 679-688 (MAE);
 * Makridakis, Wheelwright & Hyndman (1998), Forecasting: Methods and Applications, ch. 2.
 *
 * @param actual actuals, oldest first (NaN = missing)
 * @param forecast forecasts for the same periods (NaN = missing)
 * @returns the mean absolute error, in the units of the data
 * @throws EbbError #VALUE! for ranges of different length; #N/A when no period has both values
 * @example
 * mad([10, 12, 8], [11, 10, 8]) // (1 + 2 + 0) / 3 = 1
 */
export function mad(actual: ArrayLike<number>, forecast: ArrayLike<number>): number {
  const p = pairs(actual, forecast, "MAD");
  let s = 0;
  for (let i = 0; i < p.count; i++) s += Math.abs(p.actual[i] - p.forecast[i]);
  return finite(s / p.count, "MAD");
}
