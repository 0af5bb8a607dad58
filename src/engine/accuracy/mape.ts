import { badInput } from "../errors";
import { finite, pairs } from "./pairs";

/**
 * MAPE, the mean absolute percentage error, in percent:
 *
 *     MAPE = (100/n) * sum_t |(y_t - f_t) / y_t|
 *
 * over the n periods where both the actual and the forecast are present. It does not depend on the
 * unit of the data (it is scale-invariant), but it is undefined when an actual is 0 and it
 * weighs over-forecasts of small actuals heavily.
 * Source: Makridakis, Wheelwright & Hyndman (1998), Forecasting: Methods and Applications, 3rd ed.,
 * Wiley, ch. 2; Hyndman & Koehler (2006), "Another look at measures of forecast accuracy",
 * International Journal of Forecasting 22(4), 679-688 (where the zero-actual problem is discussed).
 *
 * @param actual actuals, oldest first (NaN = missing)
 * @param forecast forecasts for the same periods (NaN = missing)
 * @returns the mean absolute percentage error, in percent (12.5 means 12.5%)
 * @throws EbbError #VALUE! when an actual used is 0, for ranges of different length; #N/A when no period has both values
 * @example
 * mape([100, 200, 50], [110, 180, 50]) // 100 * (0.1 + 0.1 + 0) / 3 = 6.667
 */
export function mape(actual: ArrayLike<number>, forecast: ArrayLike<number>): number {
  const p = pairs(actual, forecast, "MAPE");
  let s = 0;
  for (let i = 0; i < p.count; i++) {
    const y = p.actual[i];
    if (y === 0) {
      throw badInput(
        "mape-zero-actual",
        `MAPE is undefined when an actual is 0 (cell ${p.position[i] + 1} of the actual range): it divides by the actual. Use sMAPE or MAD for this series instead.`,
        { index: p.position[i], argument: "actual" },
      );
    }
    s += Math.abs((y - p.forecast[i]) / y);
  }
  return finite((100 * s) / p.count, "MAPE");
}
