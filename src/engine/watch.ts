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
import { fitModel, forecastModel, modelStates, type ModelOptions } from "./model";
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
  /** The same forecasts' mean absolute error over the seasonal naive forecast's from the same origin (above 1: worse). */
  naiveRatio: number;
  /** Recent actuals outside the one-step 95% band (NaN when the model has too few errors). */
  outside: number;
}

/** How the review list fits a history (the worksheet functions pass their cached fit). */
export type Fitter = (history: Float64Array, options: ModelOptions) => FittedModel;

/**
 * How much worse than the seasonal naive forecast the last season must be to count: 10%. One
 * season's mean absolute error is itself noisy (12 errors for monthly data), so without a margin
 * about half of the series on which the two are equally good would be flagged by chance.
 */
export const NAIVE_MARGIN = 1.1;

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
 * - "worse than seasonal naive": refitted (same form) on the history before its last season
 *   (max(p, 6) periods), the model's forecasts for that season have a mean absolute error more
 *   than 10% above that of the seasonal naive forecast from the same origin (each month forecast
 *   by the same month a season earlier);
 * - "ok" otherwise.
 *
 * The MASE shown is of those same last-season forecasts, scaled by the in-sample seasonal naive
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
  const test = lastSeason(y, model, options, fit);
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

/** The last season's forecasts from the same model form fitted on the history before it: their MASE, and their MAE over the seasonal naive's. */
function lastSeason(y: Float64Array, model: FittedModel, options: ModelOptions, fit: Fitter): { mase: number; ratio: number } {
  const p = model.spec.period;
  const h = Math.max(p, WATCH_RECENT);
  if (y.length <= h) return { mase: NaN, ratio: NaN };
  const train = y.slice(0, y.length - h);
  let before: FittedModel;
  try {
    before = fit(train, { ...options, period: p, seasonality: model.spec.seasonality, trend: model.spec.trend, start: model.spec.start });
  } catch (e) {
    if (e instanceof EbbError) return { mase: NaN, ratio: NaN };
    throw e;
  }
  const forecast = forecastModel(before, h);
  const lag = Math.max(1, p);
  let abs = 0, naive = 0, k = 0;
  for (let i = 0; i < h; i++) {
    const t = y.length - h + i;
    // The seasonal naive forecast from the same origin: the value one season back, repeated
    // season after season when the last season is longer than p (h > p).
    let back = t - lag;
    while (back >= train.length) back -= lag;
    const a = y[t];
    if (a !== a || y[back] !== y[back]) continue;
    abs += Math.abs(a - forecast[i]);
    naive += Math.abs(a - y[back]);
    k++;
  }
  const scale = seasonalNaiveScale(train, p);
  if (k === 0 || !Number.isFinite(abs)) return { mase: NaN, ratio: NaN };
  return { mase: scale > 0 ? abs / k / scale : NaN, ratio: naive > 0 ? abs / naive : abs > 0 ? Infinity : 1 };
}
