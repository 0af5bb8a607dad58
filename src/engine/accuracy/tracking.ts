import { badInput } from "../errors";
import { finite, pairs } from "./pairs";

/** Periods in the tracking signal's window: the latest six errors are summed. */
export const TRACKING_WINDOW = 6;

/**
 * Alarm limit of the windowed signal: |signal| above 2.2 flags the period. For independent
 * normal errors of known spread the signal is standard normal, so the nominal false-alarm rate
 * is 2 * (1 - Phi(2.2)) = 2.78% of periods (normal table); the benchmark reports the rate met
 * on series simulated from fitted models.
 */
export const TRACKING_LIMIT = 2.2;

/** Limit of the running-sum form: +/-4 is the common-practice rule of thumb, not a statistical bound. */
export const RUNNING_LIMIT = 4;

/** Errors needed before the window to measure their spread (the MAD) before the signal reads. */
export const TRACKING_BASELINE = 6;

/** MAD to standard deviation for normal errors: E|e| = sigma * sqrt(2 / pi), so sigma = sqrt(pi / 2) * MAD (about 1.25, Brown's rule). */
export const MEAN_ABS_TO_SD = Math.sqrt(Math.PI / 2);

/** The two forms: "window" (default, with a known false-alarm rate) and "running" (the sum since the start, which grows with time). */
export type TrackingForm = "window" | "running";
export const TRACKING_FORMS: readonly TrackingForm[] = ["window", "running"];

/** Reads a form word (blank: "window"); anything else is refused with the words to use. */
export function parseTrackingForm(v: unknown): TrackingForm {
  if (v === undefined || v === null || v === "") return "window";
  const w = typeof v === "string" ? v.trim().toLowerCase() : v;
  if (w === "window" || w === "running") return w;
  throw badInput("bad-option", `Unknown tracking signal form "${String(v)}". Use window (the default, a known false-alarm rate) or running (the sum since the start, which grows with time).`);
}

/** The alarm limit of a form. */
export const trackingLimit = (form: TrackingForm): number => (form === "window" ? TRACKING_LIMIT : RUNNING_LIMIT);

/**
 * Tracking signal, one value per period, error = actual - forecast (positive: the forecasts
 * ran low). Two forms:
 *
 * **window** (default): a backward cumulative sum over the latest w = 6 periods, standardised
 * by the spread of the errors before the window,
 *
 *     TS_t = S_t / (sqrt(pi/2) * MAD_{t-w} * sqrt(k_t)),
 *     S_t = sum of the errors of periods t-w+1 .. t (k_t of them present),
 *     MAD_{t-w} = mean |error| over every period up to t-w.
 *
 * This is the fixed-length arm of the backward CUSUM of Harrison, P. J. & Davies, O. L. (1964),
 * "The use of cumulative sum (CUSUM) techniques for the control of routine forecasts of product
 * demand", Operations Research 12(2), 325-333, reviewed among the tracking signals with known
 * false-alarm behaviour by Gardner, E. S. (1983), "Automatic monitoring of forecast errors",
 * Journal of Forecasting 2(1), 1-21. sqrt(pi/2) * MAD estimates the error standard deviation for
 * normal errors (Brown's 1.25 * MAD). For independent normal errors the signal is then close to
 * standard normal whatever the length of the history, so the limit |TS| > 2.2 has a stated
 * false-alarm rate (2.78% of periods) instead of one that grows with time. The MAD comes from
 * before the window so that a shift inside the window does not dilute its own alarm. The
 * signal is NaN (not yet defined) until 6 errors precede a window holding at least one error.
 *
 * **running**: the running sum of all errors since the start over the running MAD,
 * TS_t = sum_{s<=t} e_s / ((1/k_t) sum_{s<=t} |e_s|) (R. G. Brown, Statistical Forecasting for
 * Inventory Control, 1959; common practice). On an unbiased forecast its numerator wanders
 * like a random walk, so it GROWS WITH TIME and crosses the usual +/-4 on most long series;
 * it stays for planners who must match an older report. 0 before the first error.
 *
 * A period where either value is missing adds no error.
 *
 * @param actual actuals, oldest first (NaN = missing)
 * @param forecast forecasts for the same periods (NaN = missing)
 * @param form "window" (default) or "running"
 * @returns Float64Array of the same length as the inputs, one tracking signal per period (NaN: not yet defined)
 * @throws EbbError #VALUE! for ranges of different length; #N/A when no period has both values
 * @example
 * // errors 1, -1, 1, -1, 1, -1 then 2, 2, 2, 2, 2, 2: MAD before the window = 1, window sum 12
 * trackingSignal(actual, forecast)[11] // 12 / (sqrt(pi/2) * 1 * sqrt(6)) = 3.909
 * trackingSignal([10, 12, 8], [11, 10, 8], "running") // [-1, 0.667, 1]
 */
export function trackingSignal(actual: ArrayLike<number>, forecast: ArrayLike<number>, form: TrackingForm = "window"): Float64Array {
  const p = pairs(actual, forecast, "Tracking signal");
  const errors = new Float64Array(actual.length).fill(NaN);
  for (let i = 0; i < p.count; i++) errors[p.position[i]] = p.actual[i] - p.forecast[i];
  return form === "running" ? runningSignal(errors) : windowSignal(errors);
}

/** The windowed signal over a series of errors (NaN = missing), as defined in {@link trackingSignal}. */
export function windowSignal(errors: ArrayLike<number>, window = TRACKING_WINDOW): Float64Array {
  return windowFigures(errors, window).signal;
}

/** The windowed signal with the two figures it divides, per period, as the ledger's columns show them. */
export interface WindowFigures {
  /** Sum of the errors present in the window ending at each period (0 when none is). */
  windowSum: Float64Array;
  /** Mean |error| of the periods before the window; NaN until TRACKING_BASELINE errors precede it. */
  baselineMad: Float64Array;
  /** The signal; NaN while the baseline MAD is missing or the window holds no error. */
  signal: Float64Array;
}

/**
 * The windowed signal's parts over a series of errors (NaN = missing): the window sum, the MAD
 * before the window and the signal, as defined in {@link trackingSignal}.
 * @example
 * // errors 1, -1, 1, -1, 1, -1, 2, 2, 2, 2, 2, 2 (window 6)
 * windowFigures(e).windowSum[11] // 12
 * windowFigures(e).baselineMad[11] // 1 (the six errors before the window)
 * windowFigures(e).baselineMad[10] // NaN (only five errors before its window)
 */
export function windowFigures(errors: ArrayLike<number>, window = TRACKING_WINDOW): WindowFigures {
  const n = errors.length;
  const windowSum = new Float64Array(n);
  const baselineMad = new Float64Array(n).fill(NaN);
  const signal = new Float64Array(n).fill(NaN);
  let sumAbs = 0; // |errors| of the periods before the window
  let before = 0;
  for (let t = 0; t < n; t++) {
    const leaving = t - window;
    if (leaving >= 0 && errors[leaving] === errors[leaving]) {
      sumAbs += Math.abs(errors[leaving]);
      before++;
    }
    // The window's sum is added afresh each period (as the ledger's SUM does), so no rounding builds up.
    let sum = 0;
    let inWindow = 0;
    for (let s = Math.max(0, t - window + 1); s <= t; s++) {
      if (errors[s] === errors[s]) {
        sum += errors[s];
        inWindow++;
      }
    }
    windowSum[t] = finite(sum, "Tracking signal");
    if (before < TRACKING_BASELINE) continue;
    const mad = finite(sumAbs, "Tracking signal") / before;
    baselineMad[t] = mad;
    if (inWindow === 0) continue;
    signal[t] = mad > 0 ? finite(sum / (MEAN_ABS_TO_SD * mad * Math.sqrt(inWindow)), "Tracking signal") : 0;
  }
  return { windowSum, baselineMad, signal };
}

/** The running-sum signal over a series of errors (NaN = missing), as defined in {@link trackingSignal}. */
function runningSignal(errors: ArrayLike<number>): Float64Array {
  const out = new Float64Array(errors.length);
  let sum = 0;
  let sumAbs = 0;
  let k = 0;
  let current = 0;
  for (let i = 0; i < out.length; i++) {
    const e = errors[i];
    if (e === e) {
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
