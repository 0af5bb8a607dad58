import { badInput, notEnough } from "../errors";
import { checkFinite, finite } from "./pairs";

/**
 * Theil's U2 statistic: the forecasts' relative errors against those of the naive (no-change)
 * forecast, which forecasts each period by the previous actual,
 *
 *     U2 = sqrt( sum_t ((f_{t+1} - y_{t+1}) / y_t)^2  /  sum_t ((y_{t+1} - y_t) / y_t)^2 )
 *
 * summed over t = 1..n-1. U2 < 1: better than the no-change forecast; U2 = 1: as good; U2 > 1:
 * worse. Source: Theil, H. (1966), Applied Economic Forecasting, North-Holland; in this form in
 * Makridakis, Wheelwright & Hyndman (1998), Forecasting: Methods and Applications, 3rd ed.,
 * Wiley, ch. 2 (Theil's U-statistic).
 *
 * A term is used when y_t, y_{t+1} and f_{t+1} are all present; others are skipped.
 *
 * @param actual actuals, oldest first (NaN = missing)
 * @param forecast forecasts for the same periods (NaN = missing); forecast[0] is not used
 * @returns Theil's U2 (no unit, at least 0)
 * @throws EbbError #VALUE! for ranges of different length, a 0 actual used as divisor, or actuals that never change; #N/A with no usable pair of consecutive periods
 * @example
 * // actuals 100, 110, 99; forecasts -, 105, 104.5
 * theilU([100, 110, 99], [NaN, 105, 104.5]) // sqrt((0.05^2 + 0.05^2) / (0.1^2 + 0.1^2)) = 0.5
 */
export function theilU(actual: ArrayLike<number>, forecast: ArrayLike<number>): number {
  if (actual.length !== forecast.length) {
    throw badInput(
      "length-mismatch",
      `Theil's U2: the actual and forecast ranges must have the same number of cells (actual has ${actual.length}, forecast has ${forecast.length}). Select ranges of equal size, one forecast per actual.`,
    );
  }
  checkFinite(actual, "actual");
  checkFinite(forecast, "forecast");
  let num = 0;
  let den = 0;
  let count = 0;
  let present = 0;
  for (let t = 0; t < actual.length; t++) if (actual[t] === actual[t] && forecast[t] === forecast[t]) present++;
  for (let t = 0; t + 1 < actual.length; t++) {
    const y0 = actual[t];
    const y1 = actual[t + 1];
    const f1 = forecast[t + 1];
    if (y0 !== y0 || y1 !== y1 || f1 !== f1) continue;
    if (y0 === 0) {
      throw badInput(
        "theil-zero-actual",
        `Theil's U2 is undefined when an actual is 0 (cell ${t + 1} of the actual range): it divides each error by the previous actual. Use MASE or MAD for this series instead.`,
      );
    }
    const a = (f1 - y1) / y0;
    const b = (y1 - y0) / y0;
    num += a * a;
    den += b * b;
    count++;
  }
  if (count === 0) throw notEnough(2, present, "consecutive periods with actuals and a forecast for the second");
  finite(num, "Theil's U2");
  finite(den, "Theil's U2");
  if (den === 0) {
    throw badInput(
      "theil-flat-actuals",
      "Theil's U2 is undefined here: the actuals do not change from one period to the next, so the no-change forecast it compares against is exact. Use MAD or MASE instead.",
    );
  }
  return finite(Math.sqrt(num / den), "Theil's U2");
}
