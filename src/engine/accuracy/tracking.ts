import { finite, pairs } from "./pairs";

/**
 * Running tracking signal: at each period, the running sum of forecast errors divided by the
 * running MAD (mean absolute error so far), with error = actual - forecast:
 *
 *     TS_t = sum_{s<=t} e_s / ((1/k_t) * sum_{s<=t} |e_s|)
 *
 * where k_t is the number of errors up to period t. It lies between -k_t and +k_t; a value that
 * drifts outside about +/-4 is the common-practice signal of a biased forecast (positive: the
 * forecasts run low; negative: they run high). Source: common practice in demand planning and
 * operations-management textbooks (the cumulative-error tracking signal goes back to R. G.
 * Brown's work on forecasting for inventory control, e.g. Statistical Forecasting for Inventory
 * Control, McGraw-Hill, 1959). The +/-4 limit is a rule of thumb, not a statistical bound. Ebb's
 * MAD here is the plain running mean absolute error (not an exponentially smoothed one).
 *
 * A period where either value is missing adds no error: the signal keeps its previous value there
 * (0 before the first error). The signal is 0 wherever the running MAD is 0.
 *
 * @param actual actuals, oldest first (NaN = missing)
 * @param forecast forecasts for the same periods (NaN = missing)
 * @returns Float64Array of the same length as the inputs, one tracking signal per period
 * @throws EbbError #VALUE! for ranges of different length; #N/A when no period has both values
 * @example
 * trackingSignal([10, 12, 8], [11, 10, 8]) // [-1, 1/1.5 = 0.667, 1/1 = 1]
 */
export function trackingSignal(actual: ArrayLike<number>, forecast: ArrayLike<number>): Float64Array {
  const p = pairs(actual, forecast, "Tracking signal");
  const out = new Float64Array(actual.length);
  let sum = 0;
  let sumAbs = 0;
  let k = 0;
  let current = 0;
  let next = 0;
  for (let i = 0; i < out.length; i++) {
    if (next < p.count && p.position[next] === i) {
      const e = p.actual[next] - p.forecast[next];
      next++;
      k++;
      sum += e;
      sumAbs += Math.abs(e);
      finite(sumAbs, "Tracking signal");
      // sum / (sumAbs / k), arranged so that it cannot overflow: |sum / sumAbs| <= 1.
      current = sumAbs > 0 ? finite((sum / sumAbs) * k, "Tracking signal") : 0;
    }
    out[i] = current;
  }
  return out;
}

/**
 * Running sum of errors (the tracking signal's numerator), one value per period; a missing
 * error (NaN) adds nothing.
 * @example runningErrorSum([1, NaN, -3]) // [1, 1, -2]
 */
export function runningErrorSum(errors: ArrayLike<number>): Float64Array {
  const out = new Float64Array(errors.length);
  let sum = 0;
  for (let i = 0; i < errors.length; i++) {
    if (!Number.isNaN(errors[i])) sum += errors[i];
    out[i] = sum;
  }
  return out;
}
