/**
 * The designs compared for item 3 of the automatic model (combination), and their scoring on a
 * set of cuts (rolling origins or holdouts). Used by rollingBlend.ts (M3 or public series, on the
 * command line) and by the bench's "public" section.
 *
 * Combinations of point forecasts (the engine's combineIntervals: forecasts and interval ends
 * averaged with the weights, the averaging of quantiles of Lichtendahl, Grushka-Cockayne &
 * Winkler 2013, Management Science 59(7)):
 * - the simple mean of the automatic model and the Theta method (src/engine/theta.ts), the
 *   combination that is hard to beat (Clemen 1989, IJF 5(4); Makridakis & Hibon 2000);
 * - weights inversely proportional to each member's in-sample one-step MSE (Bates & Granger
 *   1969, "The combination of forecasts", Operational Research Quarterly 20(4));
 * - weights inversely proportional to each member's MSE over the last h values of the history,
 *   forecast from an inner origin h back (Bates & Granger 1969 on out-of-sample errors at the
 *   horizon used; Stock & Watson 2004, J. Forecasting 23(6)), and the single member that did
 *   better there (selection by validation; Tashman 2000); equal weights where the inner
 *   history is too short to fit;
 * - the optimised Theta model, static and dynamic (src/engine/optimizedTheta.ts; Fiorucci et al.
 *   2016, IJF 32(4)): theta fitted, so a strong trend is carried at more than half its slope; alone
 *   and in an equal mean with the automatic model (and with the Theta method);
 * - the M4 competition's "Comb" benchmark (simple, Holt and damped smoothing of the adjusted
 *   history, equal weights), alone and with the automatic model;
 * - the automatic model with the optimised start (initial states fitted with the constants),
 *   alone and with the Theta method, and with a start window of 3 or 4 seasons (2 where the
 *   history is too short for more): the start using more of the history;
 * - Akaike weights (the engine's akaikeWeights; Kolassa 2011, IJF 27(2)) over the automatic
 *   model's own candidates, and over the whole family (every trend, and the non-seasonal
 *   candidates beside the seasonal ones).
 */
import {
  akaikeWeights,
  AUTO_DESIGN,
  combineIntervals,
  fitCandidates,
  fitOne,
  fitOptimizedTheta,
  fitTheta,
  lowestAicc,
  maseScale,
  optimizedThetaInterval,
  predictionInterval,
  smape,
  thetaAdjusted,
  thetaInterval,
  type AutoDesign,
  type FittedModel,
  type Interval,
} from "../../src/engine";
import type { Cut } from "./rollingOrigins";

export const COVERAGES = [0.8, 0.95] as const;

/** One method's interval at each coverage (the forecast is each band's), with its in-sample one-step MSE. */
type Outlook = { bands: Interval[]; mse: number };

function modelOutlook(m: FittedModel, h: number): Outlook {
  return { bands: COVERAGES.map((c) => predictionInterval(m, h, c)), mse: m.sse / m.errorCount };
}

function thetaOutlook(history: Float64Array, period: number, h: number): Outlook {
  const fit = fitTheta(history, period);
  // The smoothing's errors are on the adjusted scale; back on the data's scale through the indices.
  const s = fit.smoothing;
  return { bands: COVERAGES.map((c) => thetaInterval(fit, h, c)), mse: (s.sse / s.errorCount) * meanSquareIndex(fit.indices) };
}

function optimizedThetaOutlook(history: Float64Array, period: number, h: number, dynamic: boolean): Outlook {
  const fit = fitOptimizedTheta(history, period, { dynamic });
  return { bands: COVERAGES.map((c) => optimizedThetaInterval(fit, h, c)), mse: (fit.sse / fit.errorCount) * meanSquareIndex(fit.indices) };
}

/**
 * The M4 competition's "Comb" benchmark (Makridakis, Spiliotis & Assimakopoulos 2020, IJF 36(1)):
 * simple, Holt and damped exponential smoothing on the classically adjusted history (the Theta
 * methods' adjustment), averaged with equal weights and put back on the data's scale.
 */
function combOutlook(history: Float64Array, period: number, h: number): Outlook {
  const { adjusted, indices, y } = thetaAdjusted(history, period);
  const p = indices.length;
  const index = (k: number) => (p === 0 ? 1 : indices[(y.length + k) % p]);
  const members = (["none", "linear", "damped"] as const).map((trend) => {
    const m = fitOne(adjusted, 1, "none", trend, "optimized", 2, {});
    return { bands: COVERAGES.map((c) => rescale(predictionInterval(m, h, c), index)), mse: (m.sse / m.errorCount) * meanSquareIndex(indices) };
  });
  return weighted(members, [1, 1, 1]);
}

function rescale(band: Interval, index: (k: number) => number): Interval {
  const by = (a: Float64Array) => a.map((v, k) => v * index(k));
  return { forecast: by(band.forecast), low: by(band.low), high: by(band.high) };
}

const meanSquareIndex = (indices: Float64Array) => (indices.length === 0 ? 1 : indices.reduce((a, v) => a + v * v, 0) / indices.length);

function weighted(members: Outlook[], weights: number[]): Outlook {
  return { bands: COVERAGES.map((_, ci) => combineIntervals(members.map((m) => m.bands[ci]), weights)), mse: NaN };
}

/** The lowest-AICc candidate and the Akaike-weighted combination of all of them, for one design. */
function akaike(history: Float64Array, period: number, h: number, design: AutoDesign, start?: "optimized", cycles?: number): { best: Outlook; blend: Outlook } {
  let scored;
  try {
    scored = fitCandidates(history, { period, seasonality: "auto", trend: "auto", start, cycles }, design);
  } catch (e) {
    if (cycles === undefined) throw e;
    scored = fitCandidates(history, { period, seasonality: "auto", trend: "auto", start }, design);
  }
  const weights = akaikeWeights(scored).filter((w) => w.weight > 0);
  return { best: modelOutlook(lowestAicc(scored), h), blend: weighted(weights.map((w) => modelOutlook(w.model, h)), weights.map((w) => w.weight)) };
}

const WHOLE_FAMILY: AutoDesign = { trends: ["none", "linear", "damped"], seasonalityTest: true, noneWhenSeasonal: true };

export const METHODS = [
  "automatic model",
  "Theta method",
  "auto + Theta, equal",
  "auto + Theta, inverse MSE",
  "Akaike weights, auto's candidates",
  "whole family, lowest AICc",
  "Akaike weights, whole family",
  "family Akaike + Theta, equal",
  "auto + Theta, inverse validation MSE",
  "better of auto, Theta on validation",
  "optimised Theta, static",
  "auto + static optimised Theta, equal",
  "dynamic optimised Theta",
  "auto + dynamic optimised Theta, equal",
  "auto + Theta + dynamic opt. Theta, equal",
  "Comb (simple, Holt, damped; adjusted)",
  "auto + Comb, equal",
  "auto + Theta + Comb, equal",
  "auto, optimised start",
  "auto opt. start + Theta, equal",
  "auto, 3-season window (2 if short)",
  "auto, 4-season window (2 if short)",
] as const;

/** The automatic model's and the Theta method's MSE on the last h values, forecast from h back; null when too short. */
function validationMse(history: Float64Array, period: number, h: number): [number, number] | null {
  const inner = history.subarray(0, history.length - h);
  const held = history.subarray(history.length - h);
  try {
    const auto = lowestAicc(fitCandidates(inner, { period, seasonality: "auto", trend: "auto" }, AUTO_DESIGN));
    const theta = fitTheta(inner, period);
    return [meanSquaredError(held, predictionInterval(auto, h, 0.8).forecast), meanSquaredError(held, thetaInterval(theta, h, 0.8).forecast)];
  } catch {
    return null;
  }
}

function meanSquaredError(actual: ArrayLike<number>, forecast: ArrayLike<number>): number {
  let sum = 0;
  for (let k = 0; k < actual.length; k++) sum += (actual[k] - forecast[k]) ** 2;
  return sum / actual.length;
}

/** Inverse-MSE weights, equal when either MSE is unknown or zero. */
function inverseWeights(mse: [number, number] | null): number[] {
  if (mse === null || !(mse[0] > 0) || !(mse[1] > 0)) return [1, 1];
  return [1 / mse[0], 1 / mse[1]];
}

/** Every method's outlook for one cut, in the order of METHODS. */
function outlooks(history: Float64Array, period: number, h: number): Outlook[] {
  const auto = akaike(history, period, h, AUTO_DESIGN);
  const family = akaike(history, period, h, WHOLE_FAMILY);
  const theta = thetaOutlook(history, period, h);
  const optimized = optimizedThetaOutlook(history, period, h, false);
  const dynamic = optimizedThetaOutlook(history, period, h, true);
  const comb = combOutlook(history, period, h);
  const optimizedStart = akaike(history, period, h, AUTO_DESIGN, "optimized");
  const validation = validationMse(history, period, h);
  const validationWeights = inverseWeights(validation);
  return [
    auto.best,
    theta,
    weighted([auto.best, theta], [1, 1]),
    weighted([auto.best, theta], [1 / auto.best.mse, 1 / theta.mse]),
    auto.blend,
    family.best,
    family.blend,
    weighted([family.blend, theta], [1, 1]),
    weighted([auto.best, theta], validationWeights),
    validationWeights[1] > validationWeights[0] ? theta : auto.best,
    optimized,
    weighted([auto.best, optimized], [1, 1]),
    dynamic,
    weighted([auto.best, dynamic], [1, 1]),
    weighted([auto.best, theta, dynamic], [1, 1, 1]),
    comb,
    weighted([auto.best, comb], [1, 1]),
    weighted([auto.best, theta, comb], [1, 1, 1]),
    optimizedStart.best,
    weighted([optimizedStart.best, theta], [1, 1]),
    akaike(history, period, h, AUTO_DESIGN, undefined, 3).best,
    akaike(history, period, h, AUTO_DESIGN, undefined, 4).best,
  ];
}

export interface Tally {
  smape: number;
  mase: number;
  /** Forecasts scored, and those with a MASE scale. */
  n: number;
  nMase: number;
  /** Actuals inside the interval at each of COVERAGES, of `steps` actuals. */
  inside: number[];
  steps: number;
  /** Cuts where some method could not forecast (left out for every method, like for like). */
  skipped: number;
}

export function evaluateDesigns(cuts: Cut[]): Tally[] {
  const tallies: Tally[] = METHODS.map(() => ({ smape: 0, mase: 0, n: 0, nMase: 0, inside: COVERAGES.map(() => 0), steps: 0, skipped: 0 }));
  for (const { history, actual, period } of cuts) {
    const h = actual.length;
    let all: Outlook[];
    try {
      all = outlooks(history, period, h);
    } catch {
      tallies.forEach((t) => t.skipped++);
      continue;
    }
    const scale = maseScale(history, period);
    all.forEach((o, i) => {
      const tally = tallies[i];
      const forecast = o.bands[0].forecast;
      tally.smape += smape(actual, forecast);
      tally.n++;
      if (scale > 0) tally.mase += meanAbsoluteError(actual, forecast) / scale;
      if (scale > 0) tally.nMase++;
      o.bands.forEach((band, ci) => {
        for (let k = 0; k < h; k++) if (actual[k] >= band.low[k] && actual[k] <= band.high[k]) tally.inside[ci]++;
      });
      tally.steps += h;
    });
  }
  return tallies;
}

export function meanAbsoluteError(actual: ArrayLike<number>, forecast: ArrayLike<number>): number {
  let abs = 0;
  for (let k = 0; k < actual.length; k++) abs += Math.abs(actual[k] - forecast[k]);
  return abs / actual.length;
}
