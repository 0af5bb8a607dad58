import studentQuantile from "@stdlib/stats-base-dists-t-quantile";
import { leastSquaresLine } from "./decompose";
import { notEnough } from "./errors";
import type { Interval } from "./intervals";
import { checkCoverage } from "./intervals";
import { checkHorizon, fitOne, forecastModel } from "./model";
import { countPresent } from "./series";
import { modelShape, requiredLength } from "./shape";
import { thetaAdjusted } from "./thetaAdjusted";
import type { FittedModel } from "./types";

/**
 * The Theta method (Assimakopoulos & Nikolopoulos 2000, "The theta model: a decomposition
 * approach to forecasting", IJF 16(4)) in the form Hyndman & Billah (2003, "Unmasking the Theta
 * method", IJF 19(2)) showed it to take: simple exponential smoothing with drift, on data
 * deseasonalised by classical multiplicative decomposition of the whole history when the 90%
 * autocorrelation test finds a season (the M3 competition's procedure, Makridakis & Hibon 2000).
 *
 *   a_t = y_t / s_t                     (s: whole-history classical indices; 1 when not seasonal)
 *   l_t = alpha a_t + (1 - alpha) l_{t-1}   (level and alpha fitted together, least squares)
 *   b   = half the least-squares slope of a_t on t
 *   forecast_{n+h} = (l_n + b ((h - 1) + (1 - (1 - alpha)^n) / alpha)) s_{n+h}
 *
 * The drift term is the long-run trend of the theta = 2 line carried at half weight, with the
 * (1 - (1 - alpha)^n) / alpha correction for the lag of the smoothed level (Hyndman & Billah,
 * section 3). Leading blanks are left out; blanks inside are skipped by the smoothing.
 */
export interface ThetaFit {
  /** Seasonal indices, position 0 = the first period kept; empty when the test finds no season. */
  indices: Float64Array;
  /** Simple exponential smoothing of the adjusted history (optimized start: the start level fitted). */
  smoothing: FittedModel;
  /** Half the least-squares slope of the adjusted history, per period. */
  drift: number;
  /** Periods from the first value present to the last: the n of the drift term. */
  length: number;
  /** Quantities estimated: alpha, the start level, the drift and the p - 1 free indices. */
  estimated: number;
}

/** Fit the Theta method to a history with season length p (1 or less: not seasonal). */
export function fitTheta(history: Float64Array, p: number): ThetaFit {
  const { y, indices, adjusted } = thetaAdjusted(history, p);
  const needed = requiredLength(modelShape({ period: 1, seasonality: "none", trend: "none", start: "optimized", cycles: 2 }), 1);
  if (countPresent(y) < needed) throw notEnough(needed, countPresent(y), "values", "The Theta method fits a level, its smoothing constant and a drift; add more history.");
  const smoothing = fitOne(adjusted, 1, "none", "none", "optimized", 2, {});
  const x = new Float64Array(y.length);
  for (let t = 0; t < y.length; t++) x[t] = t;
  const drift = leastSquaresLine(x, adjusted).slope / 2;
  return { indices, smoothing, drift, length: y.length, estimated: 3 + (indices.length > 0 ? indices.length - 1 : 0) };
}

/** The drift carried h periods ahead (h from 1): b ((h - 1) + (1 - (1 - alpha)^n) / alpha). */
function driftAhead(fit: ThetaFit, h: number): number {
  const alpha = Math.max(1e-10, fit.smoothing.constants.alpha);
  // (1 - (1 - alpha)^n) / alpha, accurate for alpha near 0 (where it tends to n).
  const lag = -Math.expm1(fit.length * Math.log1p(-Math.min(alpha, 1 - 1e-16))) / alpha;
  return fit.drift * (h - 1 + lag);
}

function indexAhead(fit: ThetaFit, h: number): number {
  const p = fit.indices.length;
  return p === 0 ? 1 : fit.indices[(fit.length + h - 1) % p];
}

/** Point forecasts for the next `horizon` periods. */
export function thetaForecast(fit: ThetaFit, horizon: number): Float64Array {
  checkHorizon(horizon);
  const level = forecastModel(fit.smoothing, 1)[0];
  const out = new Float64Array(horizon);
  for (let h = 1; h <= horizon; h++) out[h - 1] = (level + driftAhead(fit, h)) * indexAhead(fit, h);
  return out;
}

/**
 * Prediction interval: that of simple exponential smoothing on the adjusted scale,
 * v_h = s^2 (1 + (h - 1) alpha^2) (Hyndman et al. 2008, ch. 6, class 1), around the forecast
 * and then multiplied by the index of the period, with the same allowance for estimated
 * quantities as the engine's other intervals (Student's t on n - k degrees, s^2 times 1 + k/n;
 * see `estimationFactor`), k counting alpha, the start level, the drift and the free indices.
 */
export function thetaInterval(fit: ThetaFit, horizon: number, coverage = 0.95): Interval {
  checkCoverage(coverage);
  const forecast = thetaForecast(fit, horizon);
  const { sse, errorCount } = fit.smoothing;
  const k = fit.estimated;
  const dof = Math.max(1, errorCount - k);
  const s2 = (sse / dof) * (1 + k / Math.max(1, errorCount));
  const t = studentQuantile(0.5 + coverage / 2, dof);
  const alpha = fit.smoothing.constants.alpha;
  const low = new Float64Array(horizon);
  const high = new Float64Array(horizon);
  for (let h = 1; h <= horizon; h++) {
    const half = t * Math.sqrt(s2 * (1 + (h - 1) * alpha * alpha)) * indexAhead(fit, h);
    low[h - 1] = forecast[h - 1] - half;
    high[h - 1] = forecast[h - 1] + half;
  }
  return { forecast, low, high };
}
