import { finite, pairs } from "./pairs";

/**
 * Bias, the mean forecast error, with error = actual - forecast:
 *
 *     bias = (1/n) * sum_t (y_t - f_t)
 *
 * over the n periods where both the actual and the forecast are present. A positive bias means the
 * forecasts were too low on average (under-forecasting), a negative one too high.
 * Source: the mean error (ME) of Hyndman & Koehler (2006), "Another look at measures of forecast
 * accuracy", International Journal of Forecasting 22(4), 679-688; Makridakis, Wheelwright &
 * Hyndman (1998), Forecasting: Methods and Applications, ch. 2.
 *
 * @param actual actuals, oldest first (NaN = missing)
 * @param forecast forecasts for the same periods (NaN = missing)
 * @returns the mean error, in the units of the data
 * @throws EbbError #VALUE! for ranges of different length; #N/A when no period has both values
 * @example
 * bias([10, 12, 8], [11, 10, 8]) // (-1 + 2 + 0) / 3 = 1/3
 */
export function bias(actual: ArrayLike<number>, forecast: ArrayLike<number>): number {
  const p = pairs(actual, forecast, "Bias");
  let s = 0;
  for (let i = 0; i < p.count; i++) s += p.actual[i] - p.forecast[i];
  return finite(s / p.count, "Bias");
}
