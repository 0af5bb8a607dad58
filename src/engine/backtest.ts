import { badInput, notEnough } from "./errors";
import { predictionInterval } from "./intervals";
import { checkHorizon, fitModel, forecastModel, resolvePeriod, type ModelOptions } from "./model";
import { cleanHistory } from "./series";
import type { FittedModel } from "./types";

/** Scores of forecasts made from one origin against the held-out actuals. */
export interface HoldoutResult {
  holdout: number;
  forecast: Float64Array;
  actual: Float64Array;
  low?: Float64Array;
  high?: Float64Array;
  mad: number;
  mape: number;
  smape: number;
  mase: number;
  rmse: number;
  bias: number;
  /** Share of held-out actuals inside the interval (when a coverage was asked for). */
  coverage?: number;
  /** The model fitted on the training part. */
  model: FittedModel;
}

/**
 * Fit on all but the last `holdout` values, forecast them and score the forecasts (the
 * M3 competition's protocol, Makridakis & Hibon 2000). A measure that is undefined for the
 * data (MAPE with a zero actual, MASE on a flat history) is NaN; callers show it as empty.
 */
export function holdoutScore(
  history: ArrayLike<number | null | undefined>,
  options: ModelOptions,
  holdout: number,
  coverage?: number,
): HoldoutResult {
  const y = cleanHistory(history);
  checkHorizon(holdout);
  if (y.length <= holdout) throw notEnough(holdout + 1, y.length);
  const p = resolvePeriod(y, options.period);
  const train = y.slice(0, y.length - holdout);
  const actual = y.slice(y.length - holdout);
  const model = fitModel(train, { ...options, period: p });
  let forecast: Float64Array;
  let low: Float64Array | undefined;
  let high: Float64Array | undefined;
  if (coverage !== undefined) ({ forecast, low, high } = predictionInterval(model, holdout, coverage));
  else forecast = forecastModel(model, holdout);
  const scale = seasonalNaiveScale(train, model.spec.period);
  let n = 0, abs = 0, sq = 0, sum = 0, pct = 0, sym = 0, inside = 0;
  for (let i = 0; i < holdout; i++) {
    if (Number.isNaN(actual[i])) continue;
    const e = actual[i] - forecast[i];
    n++;
    abs += Math.abs(e);
    sq += e * e;
    sum += e;
    pct += actual[i] === 0 ? NaN : (100 * Math.abs(e)) / Math.abs(actual[i]);
    const denom = Math.abs(actual[i]) + Math.abs(forecast[i]);
    sym += denom === 0 ? 0 : (200 * Math.abs(e)) / denom;
    if (low && high && actual[i] >= low[i] && actual[i] <= high[i]) inside++;
  }
  if (n === 0) throw badInput("empty-holdout", "Every held-out value is blank; hold out fewer values or fill them.");
  const result: HoldoutResult = {
    holdout,
    forecast,
    actual,
    low,
    high,
    mad: abs / n,
    mape: pct / n,
    smape: sym / n,
    mase: scale > 0 ? abs / n / scale : NaN,
    rmse: Math.sqrt(sq / n),
    bias: sum / n,
    model,
  };
  if (low) result.coverage = inside / n;
  return result;
}

/** In-sample mean absolute error of the seasonal naive forecast (period 1: the naive forecast), the MASE scale. */
export function seasonalNaiveScale(y: ArrayLike<number>, p: number): number {
  const lag = Math.max(1, p);
  let s = 0;
  let c = 0;
  for (let t = lag; t < y.length; t++) {
    const d = y[t] - y[t - lag];
    if (Number.isNaN(d)) continue;
    s += Math.abs(d);
    c++;
  }
  return c > 0 ? s / c : NaN;
}

export interface BacktestRow {
  step: number;
  mad: number;
  mape: number;
  mase: number;
  origins: number;
}

/**
 * Rolling-origin evaluation (Tashman 2000, "Out-of-sample tests of forecasting accuracy",
 * IJF 16(4)): the model is refitted at each of `origins` consecutive origins, the last one
 * `horizon` periods before the end, so every step ahead is scored by the same origins.
 * MASE scales each origin's errors by that origin's in-sample seasonal naive MAE.
 */
export function rollingBacktest(
  history: ArrayLike<number | null | undefined>,
  options: ModelOptions,
  horizon: number,
  origins = 12,
): BacktestRow[] {
  const y = cleanHistory(history);
  checkHorizon(horizon);
  if (!Number.isInteger(origins) || origins < 1 || origins > 500) {
    throw badInput("bad-origins", `The number of origins must be a whole number from 1 to 500; got ${String(origins)}.`);
  }
  const p = resolvePeriod(y, options.period);
  const opts = { ...options, period: p };
  const sums = Array.from({ length: horizon }, () => ({ abs: 0, pct: 0, scaled: 0, n: 0, pctN: 0, scaledN: 0 }));
  let used = 0;
  let lastError: unknown;
  for (let i = 0; i < origins; i++) {
    const end = y.length - horizon - i;
    if (end < 2) break;
    const train = y.slice(0, end);
    let forecast: Float64Array;
    try {
      forecast = forecastModel(fitModel(train, opts), horizon);
    } catch (e) {
      lastError = e;
      break; // shorter histories only get harder: stop at the first origin that cannot be fitted
    }
    used++;
    const scale = seasonalNaiveScale(train, p);
    for (let h = 0; h < horizon; h++) {
      const a = y[end + h];
      if (Number.isNaN(a)) continue;
      const e = Math.abs(a - forecast[h]);
      const s = sums[h];
      s.abs += e;
      s.n++;
      if (a !== 0) { s.pct += (100 * e) / Math.abs(a); s.pctN++; }
      if (scale > 0) { s.scaled += e / scale; s.scaledN++; }
    }
  }
  if (used === 0) {
    if (lastError) throw lastError;
    throw notEnough(horizon + 2, y.length);
  }
  return sums.map((s, h) => ({
    step: h + 1,
    mad: s.n ? s.abs / s.n : NaN,
    mape: s.pctN === s.n && s.n ? s.pct / s.pctN : NaN,
    mase: s.scaledN === s.n && s.n ? s.scaled / s.scaledN : NaN,
    origins: s.n,
  }));
}
