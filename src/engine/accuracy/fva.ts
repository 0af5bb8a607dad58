import { badInput, notEnough } from "../errors";
import { checkFinite, finite } from "./pairs";
import { maseScale } from "./mase";

/** The measures forecast value added can be stated in. */
export const FVA_MEASURES = ["mad", "mape", "mase", "bias"] as const;
export type FvaMeasure = (typeof FVA_MEASURES)[number];

/** Reads a measure word (blank: MAD). */
export function parseFvaMeasure(v: unknown): FvaMeasure {
  if (v === undefined || v === null || v === "") return "mad";
  const w = typeof v === "string" ? v.trim().toLowerCase() : v;
  if ((FVA_MEASURES as readonly unknown[]).includes(w)) return w as FvaMeasure;
  throw badInput("bad-option", `Unknown measure "${String(v)}". Use MAD (the default), MAPE, MASE or bias.`);
}

/** One step of the forecasting process and what it added. */
export interface FvaStep {
  step: "seasonal naive" | "model" | "adjusted";
  /** The measure over the compared periods (bias: the mean error). */
  value: number;
  /** Value added over the step before: its error less this one's (NaN for the seasonal naive). */
  overPrevious: number;
  /** Value added over the seasonal naive forecast (NaN for the seasonal naive itself). */
  overNaive: number;
}

export interface FvaResult {
  measure: FvaMeasure;
  steps: [FvaStep, FvaStep, FvaStep];
  /** Periods compared: those with an actual, both forecasts and the actual one season back. */
  count: number;
}

/**
 * Forecast value added (FVA) in the sense of Gilliland, M. (2002), "Is forecasting a waste of
 * time?", Supply Chain Management Review 6(4), 16-23, and Gilliland, M. (2010), The Business
 * Forecasting Deal, Wiley, ch. 5: each step of the forecasting process is compared with the step
 * before it, starting from a naive forecast, and its value added is the previous step's error
 * measure less its own, so a positive value means the step made the forecast better. Here the
 * steps are the seasonal naive forecast (each actual forecast by the actual one season back),
 * the model's forecast, and the planner's adjusted forecast.
 *
 * Every measure is taken over the same periods: those where the actual, both forecasts and the
 * actual one season back are all present. Measures (error = actual - forecast): MAD, the mean
 * |error|; MAPE, mean 100 |error| / |actual| (no actual may be 0); MASE, MAD over the in-sample
 * seasonal naive MAE of the actuals (Hyndman & Koehler 2006), so the seasonal naive's own MASE is
 * close to 1; bias, the mean error, whose value added is the drop in its size: |bias before| -
 * |bias after|.
 *
 * @param actual actuals, oldest first (NaN = missing)
 * @param model the model's forecasts for the same periods
 * @param adjusted the adjusted (final) forecasts for the same periods
 * @param measure "mad" (default), "mape", "mase" or "bias"
 * @param period season length of the seasonal naive forecast (1: the plain naive forecast)
 * @throws EbbError #VALUE! for ranges of different size, an infinite value, a bad period or a zero actual with MAPE; #N/A when no period can be compared
 * @example
 * // actual 10 20 30 | 12 18 33, model 11 19 31 | 13 17 31, adjusted ... | 12 20 30, period 3:
 * // compared periods 4-6; naive forecasts 10 20 30: MAD naive (2+2+3)/3 = 2.333, model (1+1+2)/3 = 1.333,
 * // adjusted (0+2+3)/3 = 1.667; value added: model +1.0 over naive, adjusted -0.333 over the model.
 */
export function forecastValueAdded(
  actual: ArrayLike<number>,
  model: ArrayLike<number>,
  adjusted: ArrayLike<number>,
  measure: FvaMeasure = "mad",
  period = 1,
): FvaResult {
  const n = actual.length;
  if (model.length !== n || adjusted.length !== n) {
    throw badInput(
      "length-mismatch",
      `Forecast value added: actual, model_forecast and adjusted_forecast must have the same number of cells (they have ${n}, ${model.length} and ${adjusted.length}). Select ranges of equal size, one forecast per actual.`,
    );
  }
  if (!Number.isInteger(period) || period < 1) {
    throw badInput("bad-period", `Forecast value added: the period must be a whole number of at least 1 (1 for the plain naive forecast), not ${period}.`);
  }
  checkFinite(actual, "actual");
  checkFinite(model, "model_forecast");
  checkFinite(adjusted, "adjusted_forecast");
  const errors: number[][] = [[], [], []];
  const actuals: number[] = [];
  for (let t = period; t < n; t++) {
    const a = actual[t];
    const f = [actual[t - period], model[t], adjusted[t]];
    if (a !== a || f.some((v) => v !== v)) continue;
    if (measure === "mape" && a === 0) {
      throw badInput("mape-zero-actual", `MAPE is undefined: the actual in cell ${t + 1} is 0. Use MAD or MASE for series with zero sales.`, { index: t, argument: "actual" });
    }
    actuals.push(a);
    f.forEach((v, i) => errors[i].push(a - v));
  }
  if (actuals.length === 0) {
    throw notEnough(period + 1, n, "periods", `Forecast value added compares periods that have an actual, both forecasts and the actual ${period} period(s) before; none has all four yet.`);
  }
  const scale = measure === "mase" ? maseScale(actual, period) : 1;
  const value = (e: number[]): number => {
    let s = 0;
    for (let i = 0; i < e.length; i++) {
      if (measure === "bias") s += e[i];
      else if (measure === "mape") s += (100 * Math.abs(e[i])) / Math.abs(actuals[i]);
      else s += Math.abs(e[i]);
    }
    return finite(s / e.length / scale, "Forecast value added");
  };
  const [naive, fitted, final] = errors.map(value);
  // For bias the size of the lean is what a step should reduce.
  const size = (v: number): number => (measure === "bias" ? Math.abs(v) : v);
  const added = (before: number, after: number): number => finite(size(before) - size(after), "Forecast value added");
  return {
    measure,
    count: actuals.length,
    steps: [
      { step: "seasonal naive", value: naive, overPrevious: NaN, overNaive: NaN },
      { step: "model", value: fitted, overPrevious: added(naive, fitted), overNaive: added(naive, fitted) },
      { step: "adjusted", value: final, overPrevious: added(fitted, final), overNaive: added(naive, final) },
    ],
  };
}
