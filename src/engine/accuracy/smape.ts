import { finite, pairs } from "./pairs";

/**
 * sMAPE, the symmetric mean absolute percentage error of the M3 competition, in percent:
 *
 *     sMAPE = (1/n) * sum_t |y_t - f_t| / ((y_t + f_t) / 2) * 100
 *           = (1/n) * sum_t 200 * |y_t - f_t| / (y_t + f_t)
 *
 * Source: Makridakis, S. & Hibon, M. (2000), "The M3-Competition: results, conclusions and
 * implications", International Journal of Forecasting 16(4), 451-476, which averages this over
 * the forecast horizon; the same form is written out as mean(200|Y_t - F_t| / (Y_t + F_t)) by
 * Hyndman & Koehler (2006), "Another look at measures of forecast accuracy", International
 * Journal of Forecasting 22(4), 679-688, in their discussion of percentage errors.
 *
 * The M3 form has no absolute values in its denominator. All M3 series are positive, and for
 * actuals and forecasts that are not negative it equals the form with |y_t| + |f_t| in the
 * denominator, used by the M4 competition (Makridakis, Spiliotis & Assimakopoulos 2020,
 * International Journal of Forecasting 36(1), 54-74). Ebb uses |y_t| + |f_t| so that each term
 * stays in [0, 200] when a value is negative (the M3 form could then be negative or infinite),
 * and counts a period with y_t = f_t = 0 (an exact forecast of zero sales) as 0, where the
 * formula itself would be 0/0. For data that are not negative the result is M3's sMAPE exactly.
 *
 * @param actual actuals, oldest first (NaN = missing)
 * @param forecast forecasts for the same periods (NaN = missing)
 * @returns the sMAPE in percent, between 0 and 200
 * @throws EbbError #VALUE! for ranges of different length; #N/A when no period has both values
 * @example
 * smape([100, 50], [80, 50]) // (200 * 20 / 180 + 0) / 2 = 11.111
 */
export function smape(actual: ArrayLike<number>, forecast: ArrayLike<number>): number {
  const p = pairs(actual, forecast, "sMAPE");
  let s = 0;
  for (let i = 0; i < p.count; i++) {
    const y = p.actual[i];
    const f = p.forecast[i];
    // Scale by the larger magnitude first so that neither the difference nor the sum can overflow.
    const m = Math.max(Math.abs(y), Math.abs(f));
    if (m === 0) continue; // y = f = 0: an exact forecast, term 0
    const ys = y / m;
    const fs = f / m;
    s += (200 * Math.abs(ys - fs)) / (Math.abs(ys) + Math.abs(fs));
  }
  return finite(s / p.count, "sMAPE");
}
