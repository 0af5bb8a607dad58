import studentQuantile from "@stdlib/stats-base-dists-t-quantile";
import { leastSquaresLine } from "./decompose";
import { notEnough } from "./errors";
import type { Interval } from "./intervals";
import { checkCoverage } from "./intervals";
import { checkHorizon } from "./model";
import { countPresent } from "./series";
import { modelShape, requiredLength } from "./shape";
import { thetaAdjusted } from "./thetaAdjusted";

/**
 * The optimised Theta model (Fiorucci, Pellegrini, Louzada, Petropoulos & Koehler 2016,
 * "Models for optimising the theta method and their relationship to state space models",
 * IJF 32(4)): the Theta method with the weight of the theta line fitted instead of fixed at
 * theta = 2, so a strong trend is carried at more than half its slope and a flat series at less.
 *
 * On the adjusted history a_t (classically deseasonalised as for the Theta method) with its
 * least-squares line L_t = A + B t, the theta line is Z_t = theta a_t + (1 - theta) L_t and the
 * forecast is Z's simple exponential smoothing times 1/theta plus the line times 1 - 1/theta.
 * Because smoothing is linear, with w = 1 - 1/theta that is (see `pass`)
 *
 *   forecast_{t+h} = S_t + w (L_{t+h} - S^L_t)
 *
 * where S is the smoothing of a (start level l0) and S^L that of the line started on the line;
 * L_{t+h} - S^L_t = B ((h - 1) + (1 - (1 - alpha)^(t+1)) / alpha) with no blanks (the Hyndman &
 * Billah drift term; w = 1/2 is the standard method). alpha, l0 and w (theta >= 1, so 0 <= w <= 1)
 * minimise the one-step squared errors: l0 and w in closed form for each alpha, alpha by a grid
 * and golden-section search. Blanks are skipped by both smoothings alike.
 */
export interface OptimizedThetaFit {
  /** Seasonal indices, position 0 = the first period kept; empty when the test finds no season. */
  indices: Float64Array;
  alpha: number;
  /** The weight of the line, 1 - 1/theta. */
  lineWeight: number;
  /** The least-squares slope of the adjusted history, per period. */
  slope: number;
  /** Start level l0 of the smoothing of the adjusted history (before the first period kept). */
  start: number;
  /** Smoothed level of the adjusted history after the last period. */
  level: number;
  /** The line's lead over its smoothing after the last period, in periods of slope (u_n, see `pass`). */
  lagUnits: number;
  /** Periods from the first value present to the last. */
  length: number;
  sse: number;
  errorCount: number;
  /** Quantities estimated: alpha, l0, theta, the line's two and the p - 1 free indices. */
  estimated: number;
}

interface Pass {
  sse: number;
  start: number;
  lineWeight: number;
  level: number;
  /** u after the last period: the line's lead over its own smoothing is slope * u. */
  lagUnits: number;
  errorCount: number;
}

/**
 * One pass for a given alpha. The one-step forecast of a_t is S_{t-1} + w D_t, with
 * D_t = L_t - S^L_{t-1} = B u_t, where u_0 = 1, u grows to 1 + (1 - alpha) u after a value and by 1
 * over a blank (the line's smoothing started on the line lags it by B u). S_{t-1} = c_t + g_t l0
 * (c: the smoothing started at 0, g = (1 - alpha)^m after m values), so the forecast is linear in
 * (l0, w): ordinary least squares for both, w held to [0, 1].
 *
 * `dynamic` (the dynamic optimised Theta model of Fiorucci et al. 2016) fits with the slope of the
 * values before t, B_{t-1}, in place of the whole history's B, so the weight of the line is
 * chosen on forecasts that did not see the future; the intercept's part of that model decays as
 * (1 - alpha)^t and is taken up by the start level.
 */
function pass(a: Float64Array, slope: number, alpha: number, dynamic: boolean): Pass {
  const n = a.length;
  const c = new Float64Array(n);
  const g = new Float64Array(n);
  const d = new Float64Array(n);
  let cLevel = 0;
  let decay = 1;
  let units = 1;
  let m = 0, st = 0, sa = 0, stt = 0, sta = 0; // running sums for the slope of the values so far
  for (let t = 0; t < n; t++) {
    c[t] = cLevel;
    g[t] = decay;
    const slopeSoFar = m >= 2 ? (m * sta - st * sa) / (m * stt - st * st) : 0;
    d[t] = (dynamic ? slopeSoFar : slope) * units;
    if (Number.isNaN(a[t])) {
      units += 1;
      continue;
    }
    cLevel = alpha * a[t] + (1 - alpha) * cLevel;
    decay *= 1 - alpha;
    units = 1 + (1 - alpha) * units;
    m++;
    st += t;
    sa += a[t];
    stt += t * t;
    sta += t * a[t];
  }
  // Normal equations of a_t - c_t = l0 g_t + w d_t.
  let sgg = 0, sgd = 0, sdd = 0, sgr = 0, sdr = 0, count = 0;
  for (let t = 0; t < n; t++) {
    if (Number.isNaN(a[t])) continue;
    const r = a[t] - c[t];
    sgg += g[t] * g[t];
    sgd += g[t] * d[t];
    sdd += d[t] * d[t];
    sgr += g[t] * r;
    sdr += d[t] * r;
    count++;
  }
  const det = sgg * sdd - sgd * sgd;
  let w = det > 1e-12 * sgg * sdd ? (sgg * sdr - sgd * sgr) / det : 0.5;
  w = Math.min(1, Math.max(0, w));
  const start = sgg > 0 ? (sgr - w * sgd) / sgg : 0;
  let sse = 0;
  for (let t = 0; t < n; t++) {
    if (Number.isNaN(a[t])) continue;
    const e = a[t] - c[t] - start * g[t] - w * d[t];
    sse += e * e;
  }
  return { sse, start, lineWeight: w, level: cLevel + decay * start, lagUnits: units, errorCount: count };
}

const ALPHA_LOW = 1e-4;
const ALPHA_HIGH = 1 - 1e-4;

/** alpha minimising the pass's SSE: the best of a grid, refined by golden section between its neighbours. */
function bestAlpha(sseAt: (alpha: number) => number): number {
  const grid = 20;
  const at = (i: number) => ALPHA_LOW + ((ALPHA_HIGH - ALPHA_LOW) * i) / grid;
  let best = 0;
  let bestSse = Infinity;
  for (let i = 0; i <= grid; i++) {
    const s = sseAt(at(i));
    if (s < bestSse) [best, bestSse] = [i, s];
  }
  let lo = at(Math.max(0, best - 1));
  let hi = at(Math.min(grid, best + 1));
  const ratio = (Math.sqrt(5) - 1) / 2;
  let x1 = hi - ratio * (hi - lo);
  let x2 = lo + ratio * (hi - lo);
  let f1 = sseAt(x1);
  let f2 = sseAt(x2);
  for (let k = 0; k < 40 && hi - lo > 1e-7; k++) {
    if (f1 <= f2) {
      hi = x2;
      x2 = x1;
      f2 = f1;
      x1 = hi - ratio * (hi - lo);
      f1 = sseAt(x1);
    } else {
      lo = x1;
      x1 = x2;
      f1 = f2;
      x2 = lo + ratio * (hi - lo);
      f2 = sseAt(x2);
    }
  }
  const end = f1 <= f2 ? x1 : x2;
  return Math.min(f1, f2) <= bestSse ? end : at(best);
}

/** Fit the optimised Theta model to a history with season length p (1 or less: not seasonal). */
export function fitOptimizedTheta(history: Float64Array, p: number, options: { dynamic?: boolean } = {}): OptimizedThetaFit {
  const dynamic = options.dynamic ?? true;
  const { y, indices, adjusted } = thetaAdjusted(history, p);
  // One more quantity than the level-only smoothing (theta), so one more value than it needs.
  const needed = requiredLength(modelShape({ period: 1, seasonality: "none", trend: "none", start: "optimized", cycles: 2 }), 1) + 1;
  if (countPresent(y) < needed) throw notEnough(needed, countPresent(y), "values", "The optimised Theta model fits a level, its smoothing constant, the weight of the trend line and the line; add more history.");
  const x = new Float64Array(y.length);
  for (let t = 0; t < y.length; t++) x[t] = t;
  const { slope } = leastSquaresLine(x, adjusted);
  const alpha = bestAlpha((al) => pass(adjusted, slope, al, dynamic).sse);
  const fit = pass(adjusted, slope, alpha, dynamic);
  const p1 = indices.length;
  return {
    indices,
    alpha,
    lineWeight: fit.lineWeight,
    slope,
    start: fit.start,
    level: fit.level,
    lagUnits: fit.lagUnits,
    length: y.length,
    sse: fit.sse,
    errorCount: fit.errorCount,
    estimated: 5 + (p1 > 0 ? p1 - 1 : 0),
  };
}

/** theta itself (1 / (1 - w)); Infinity when the line carries its whole slope. */
export const thetaOf = (fit: OptimizedThetaFit): number => 1 / (1 - fit.lineWeight);

function indexAhead(fit: OptimizedThetaFit, h: number): number {
  const p = fit.indices.length;
  return p === 0 ? 1 : fit.indices[(fit.length + h - 1) % p];
}

/** Point forecasts for the next `horizon` periods. */
export function optimizedThetaForecast(fit: OptimizedThetaFit, horizon: number): Float64Array {
  checkHorizon(horizon);
  const out = new Float64Array(horizon);
  for (let h = 1; h <= horizon; h++) {
    out[h - 1] = (fit.level + fit.lineWeight * fit.slope * (fit.lagUnits + h - 1)) * indexAhead(fit, h);
  }
  return out;
}

/**
 * Prediction interval as for the Theta method (see thetaInterval): simple exponential smoothing's
 * v_h = s^2 (1 + (h - 1) alpha^2) on the adjusted scale, Student's t on n - k degrees and s^2 times
 * 1 + k/n, then multiplied by the period's index.
 */
export function optimizedThetaInterval(fit: OptimizedThetaFit, horizon: number, coverage = 0.95): Interval {
  checkCoverage(coverage);
  const forecast = optimizedThetaForecast(fit, horizon);
  const k = fit.estimated;
  const dof = Math.max(1, fit.errorCount - k);
  const s2 = (fit.sse / dof) * (1 + k / Math.max(1, fit.errorCount));
  const t = studentQuantile(0.5 + coverage / 2, dof);
  const low = new Float64Array(horizon);
  const high = new Float64Array(horizon);
  for (let h = 1; h <= horizon; h++) {
    const half = t * Math.sqrt(s2 * (1 + (h - 1) * fit.alpha * fit.alpha)) * indexAhead(fit, h);
    low[h - 1] = forecast[h - 1] - half;
    high[h - 1] = forecast[h - 1] + half;
  }
  return { forecast, low, high };
}
