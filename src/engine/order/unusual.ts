import { badInput } from "../errors";
import { fitModel, modelStates, type ModelOptions } from "../model";
import { cleanHistory } from "../series";
import type { FittedModel } from "../types";

/** Default threshold, in robust standard deviations of the one-step errors (see `unusualPeriods`). */
export const UNUSUAL_THRESHOLD = 4;

/** MAD to standard deviation for normal errors: 1 / Phi^-1(3/4) (Hampel 1974; Rousseeuw & Croux 1993). */
export const MAD_TO_SD = 1.4826;

const MAX_PASSES = 6;

export interface UnusualPeriods {
  /** Per period: +1 unusually high, -1 unusually low, 0 not flagged (or no one-step forecast there). */
  flag: Int8Array;
  /** Per period: the suggested replacement (the one-step forecast) where flagged, NaN elsewhere. */
  suggestion: Float64Array;
  /** Per period: the one-step forecast of the model that leaves flagged periods out (NaN in its start window). */
  forecast: Float64Array;
  /** The score compared with the threshold: (error - median error) / robust scale; NaN where there is no error. */
  score: Float64Array;
  /** Robust scale of the errors: 1.4826 x their median absolute deviation from the median. */
  scale: number;
  /** True when errors are measured relative to the forecast (multiplicative seasonality). */
  relative: boolean;
  threshold: number;
  /** The model whose one-step forecasts are the suggestions (fitted with the flagged periods left out). */
  model: FittedModel;
}

/**
 * Periods whose actual is far from what the model expected: candidates for a planner's correction
 * (a promotion, a stock-out, a one-off order). It suggests; it never changes the history.
 *
 * The one-step error of each period is scored against a robust scale of all the errors, the
 * Hampel identifier (Hampel 1974, JASA 69(346); Pearson 2002, IEEE Trans. Control Systems
 * Technology 10(1)): score = (e_t - median e) / (1.4826 * median |e - median e|), where 1.4826
 * makes the median absolute deviation estimate the standard deviation of normal errors
 * (Rousseeuw & Croux 1993, JASA 88(424)). A period is flagged when |score| > threshold.
 * With multiplicative seasonality the errors are taken relative to the forecast (as the
 * intervals take them), so a growing product is not flagged for growing.
 *
 * An unusual period also pulls the model's level, trend and index, so the periods after it
 * would look unusual too. So the model is refitted with the flagged periods left out (like
 * blank cells) and the periods scored again, until the flags settle (at most 6 passes); the
 * suggestion is that model's one-step forecast, the figure the model expected had the period
 * been normal. Periods in the start window have no one-step forecast and are never flagged.
 */
export function unusualPeriods(history: ArrayLike<number | null | undefined>, options: ModelOptions, threshold = UNUSUAL_THRESHOLD): UnusualPeriods {
  const t = checkThreshold(threshold);
  const y = history instanceof Float64Array ? history : cleanHistory(history);
  let left = new Uint8Array(y.length);
  let result = score(y, left, options);
  for (let pass = 1; pass < MAX_PASSES; pass++) {
    const next = new Uint8Array(y.length);
    for (let i = 0; i < y.length; i++) next[i] = Math.abs(result.score[i]) > t ? 1 : 0;
    if (sameFlags(next, left)) break;
    left = next;
    result = score(y, left, options);
  }
  const flag = new Int8Array(y.length);
  const suggestion = new Float64Array(y.length).fill(NaN);
  for (let i = 0; i < y.length; i++) {
    if (Math.abs(result.score[i]) > t) {
      flag[i] = result.score[i] > 0 ? 1 : -1;
      suggestion[i] = result.forecast[i];
    }
  }
  return { flag, suggestion, forecast: result.forecast, score: result.score, scale: result.scale, relative: result.relative, threshold: t, model: result.model };
}

interface Scored {
  model: FittedModel;
  forecast: Float64Array;
  score: Float64Array;
  scale: number;
  relative: boolean;
}

/** Fit with the periods in `left` blanked, then score every period's error (left-out ones included). */
function score(y: Float64Array, left: Uint8Array, options: ModelOptions): Scored {
  const masked = y.map((v, i) => (left[i] ? NaN : v));
  const model = fitModel(masked, options);
  const forecast = modelStates(model).forecast;
  const relative = model.shape.multiplicative;
  const error = new Float64Array(y.length).fill(NaN);
  for (let i = 0; i < y.length; i++) {
    const f = forecast[i];
    if (Number.isNaN(y[i]) || Number.isNaN(f)) continue;
    error[i] = relative ? (y[i] - f) / f : y[i] - f;
  }
  const present = Array.from(error).filter((e) => !Number.isNaN(e));
  const centre = median(present);
  const scale = robustScale(present, centre);
  const out = new Float64Array(y.length).fill(NaN);
  for (let i = 0; i < y.length; i++) {
    if (Number.isNaN(error[i])) continue;
    const d = error[i] - centre;
    out[i] = scale > 0 ? d / scale : d === 0 ? 0 : Math.sign(d) * Infinity;
  }
  return { model, forecast, score: out, scale, relative };
}

/**
 * 1.4826 x the median absolute deviation. When more than half the errors are equal (the MAD is 0),
 * the mean absolute deviation scaled to the normal standard deviation (x sqrt(pi/2)) stands in,
 * so a few exact fits do not make every other error "unusual".
 */
function robustScale(e: number[], centre: number): number {
  if (e.length === 0) return NaN;
  const dev = e.map((v) => Math.abs(v - centre));
  const mad = MAD_TO_SD * median(dev);
  if (mad > 0) return mad;
  return Math.sqrt(Math.PI / 2) * (dev.reduce((s, v) => s + v, 0) / dev.length);
}

function median(v: number[]): number {
  if (v.length === 0) return NaN;
  const s = [...v].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m] : (s[m - 1] + s[m]) / 2;
}

function sameFlags(a: Uint8Array, b: Uint8Array): boolean {
  for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return false;
  return true;
}

export function checkThreshold(v: number): number {
  if (typeof v !== "number" || !Number.isFinite(v) || v < 1 || v > 20) {
    throw badInput("bad-threshold", `The threshold is a number of robust standard deviations from 1 to 20 (default ${UNUSUAL_THRESHOLD}); got ${String(v)}.`);
  }
  return v;
}
