/**
 * The review list behind EBB.WATCH: for one series, a status word a planner can sort by and the
 * figures that decided it, from one fit over the whole history and one over all but its last
 * season.
 */
import normalQuantile from "@stdlib/stats-base-dists-normal-quantile";
import { TRACKING_LIMIT, TRACKING_WINDOW, windowSignal } from "./accuracy/tracking";
import { seasonalNaiveScale } from "./backtest";
import { EbbError } from "./errors";
import { oneStepRelativeSd, oneStepVariance } from "./intervals";
import { fitModel, forecastModel, modelStates, resolvePeriod, type ModelOptions } from "./model";
import { cleanHistory } from "./series";
import type { FittedModel } from "./types";

/** The status words, in the order they are decided (the first that applies is shown). */
export const WATCH_STATUSES = ["too short", "forecast too low", "forecast too high", "worse than seasonal naive", "ok"] as const;
export type WatchStatus = (typeof WATCH_STATUSES)[number];

/** Periods scored against the band and the bias: the tracking signal's window. */
export const WATCH_RECENT = TRACKING_WINDOW;

export interface WatchRow {
  status: WatchStatus;
  /** Latest windowed tracking signal (NaN: not yet defined). */
  signal: number;
  /** Mean error over the recent periods as a percent of their mean actual (NaN when undefined). */
  biasPercent: number;
  /** MASE of the forecasts for the last season made from a fit on the history before it (NaN when the history is too short). */
  mase: number;
  /** Absolute error of the model's forecasts of the last (up to 3) seasons, each from a refit before it, over the seasonal naive forecast's from the same origins (above 1: worse). */
  naiveRatio: number;
  /** Recent actuals outside the one-step 95% band (NaN when the model has too few errors). */
  outside: number;
}

/** How the review list fits a history (the worksheet functions pass their cached fit). */
export type Fitter = (history: Float64Array, options: ModelOptions) => FittedModel;

/**
 * How much worse than the seasonal naive forecast the tested seasons must be to count: 10%. A
 * few seasons' absolute errors are themselves noisy (12 a season for monthly data), so without a
 * margin about half of the series on which the two are equally good would be flagged by chance.
 */
export const NAIVE_MARGIN = 1.1;

/** Origins of the naive test (seasons tested, newest first), and the whole seasons each origin after the first needs before it. */
export const NAIVE_ORIGINS = 3;
export const SEASONS_BEFORE_ORIGIN = 3;

const Z95 = normalQuantile(0.975, 0, 1);

const TOO_SHORT: WatchRow = { status: "too short", signal: NaN, biasPercent: NaN, mase: NaN, naiveRatio: NaN, outside: NaN };

/**
 * One series' row of the review list. The status is the first of these that applies:
 *
 * - "too short": the model cannot be fitted, or its tracking signal is not yet defined (it needs
 *   6 one-step errors before a 6-period window);
 * - "forecast too low" / "forecast too high": the latest windowed tracking signal is above
 *   +2.2 / below -2.2 (errors = actual - forecast have leaned one way over the last 6 periods;
 *   see trackingSignal for the false-alarm rate);
 * - "worse than seasonal naive": refitted (same form) before each of its last seasons (up to 3,
 *   max(p, 6) periods each, p the planner's season length), the model's forecasts of those
 *   seasons have a total absolute error more than 10% above that of the seasonal naive forecast
 *   from the same origins (each month forecast by the same month a season earlier); see
 *   {@link naiveTest};
 * - "ok" otherwise.
 *
 * The MASE shown is of the last season's forecasts, scaled by the in-sample seasonal naive
 * MAE of the history before it (Hyndman & Koehler 2006). The bias and the band count are shown
 * for review and do not decide the status: bias is the
 * mean one-step error over the last 6 periods as a percent of their mean actual; the band is the
 * one-step 95% interval, forecast +/- 1.96 sigma (additive or no season) or forecast * (1 +/- 1.96
 * sigma_rel) (multiplicative), with the sigmas of intervals.ts.
 *
 * @throws EbbError #VALUE! for a history the model refuses (text was caught earlier; for example
 * a non-positive value with multiplicative seasonality); "not enough history" becomes "too short"
 */
export function watchSeries(history: ArrayLike<number | null | undefined>, options: ModelOptions = {}, fit: Fitter = fitModel): WatchRow {
  const y = cleanHistory(history);
  let model: FittedModel;
  try {
    model = fit(y, options);
  } catch (e) {
    if (e instanceof EbbError && e.kind === "na") return TOO_SHORT;
    throw e;
  }
  const states = modelStates(model);
  const n = y.length;
  const signal = windowSignal(states.error)[n - 1];
  const test = naiveTest(y, model, options, fit);
  const row: WatchRow = { status: "ok", signal, biasPercent: recentBias(y, states.error), mase: test.mase, naiveRatio: test.ratio, outside: outsideBand(model, states.forecast, states.error) };
  if (signal !== signal) row.status = "too short";
  else if (signal > TRACKING_LIMIT) row.status = "forecast too low";
  else if (signal < -TRACKING_LIMIT) row.status = "forecast too high";
  else if (test.ratio > NAIVE_MARGIN) row.status = "worse than seasonal naive";
  return row;
}

function recentBias(y: Float64Array, error: Float64Array): number {
  let sumE = 0, sumY = 0, k = 0;
  for (let t = Math.max(0, y.length - WATCH_RECENT); t < y.length; t++) {
    if (error[t] !== error[t]) continue;
    sumE += error[t];
    sumY += y[t];
    k++;
  }
  return k === 0 || sumY === 0 ? NaN : (100 * sumE) / sumY;
}

function outsideBand(model: FittedModel, forecast: Float64Array, error: Float64Array): number {
  if (model.errorCount < 2) return NaN;
  const multiplicative = model.spec.seasonality === "multiplicative";
  const sd = multiplicative ? oneStepRelativeSd(model) : Math.sqrt(oneStepVariance(model));
  let count = 0;
  for (let t = Math.max(0, error.length - WATCH_RECENT); t < error.length; t++) {
    const e = error[t];
    if (e !== e) continue;
    const half = Z95 * sd * (multiplicative ? Math.abs(forecast[t]) : 1);
    if (Math.abs(e) > half) count++;
  }
  return count;
}

/**
 * Rolling-origin test against the seasonal naive forecast (Tashman 2000, "Out-of-sample tests of
 * forecasting accuracy", International Journal of Forecasting 16(4)): from each of up to
 * NAIVE_ORIGINS origins, one season apart and ending at the history's end, the same model form
 * is refitted on the history before the origin and forecasts the season after it; its absolute
 * errors are summed against those of the seasonal naive forecast from the same origin. An origin
 * beyond the first needs SEASONS_BEFORE_ORIGIN whole seasons before it. The season is the
 * planner's season length, also when the model found no seasonality (the benchmark is still the
 * same month a year earlier). MASE: the last season's forecasts, scaled by the in-sample seasonal
 * naive MAE of the history before it (Hyndman & Koehler 2006).
 */
function naiveTest(y: Float64Array, model: FittedModel, options: ModelOptions, fit: Fitter): { mase: number; ratio: number } {
  const p = Math.max(1, resolvePeriod(y, options.period));
  const h = Math.max(p, WATCH_RECENT);
  let abs = 0, naive = 0;
  let mase = NaN;
  for (let k = 0; k < NAIVE_ORIGINS; k++) {
    const origin = y.length - (k + 1) * h;
    if (origin <= 0 || (k > 0 && origin < SEASONS_BEFORE_ORIGIN * p)) break;
    const one = seasonFrom(y, origin, h, p, model, options, fit);
    if (one === undefined) break;
    abs += one.abs;
    naive += one.naive;
    if (k === 0) mase = one.mase;
  }
  if (!Number.isFinite(abs) || (abs === 0 && naive === 0 && Number.isNaN(mase))) return { mase: NaN, ratio: NaN };
  return { mase, ratio: naive > 0 ? abs / naive : abs > 0 ? Infinity : 1 };
}

/** One origin: the same model form refitted on y[0, origin), its h forecasts against the actuals, and the seasonal naive's errors. */
function seasonFrom(y: Float64Array, origin: number, h: number, p: number, model: FittedModel, options: ModelOptions, fit: Fitter): { abs: number; naive: number; mase: number } | undefined {
  const train = y.slice(0, origin);
  let before: FittedModel;
  try {
    before = fit(train, { ...options, period: model.spec.period, seasonality: model.spec.seasonality, trend: model.spec.trend, start: model.spec.start });
  } catch (e) {
    if (e instanceof EbbError) return undefined;
    throw e;
  }
  const forecast = forecastModel(before, h);
  let abs = 0, naive = 0, k = 0;
  for (let i = 0; i < h; i++) {
    const t = origin + i;
    // The seasonal naive forecast from the same origin: the value one season back, repeated
    // season after season when the tested stretch is longer than p (h > p).
    let back = t - p;
    while (back >= origin) back -= p;
    const a = y[t];
    if (a !== a || back < 0 || y[back] !== y[back]) continue;
    abs += Math.abs(a - forecast[i]);
    naive += Math.abs(a - y[back]);
    k++;
  }
  if (k === 0) return undefined;
  const scale = seasonalNaiveScale(train, p);
  return { abs, naive, mase: scale > 0 ? abs / k / scale : NaN };
}
