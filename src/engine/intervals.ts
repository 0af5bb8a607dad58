import normalQuantile from "@stdlib/stats-base-dists-normal-quantile";
import studentQuantile from "@stdlib/stats-base-dists-t-quantile";
import { badInput } from "./errors";
import { checkHorizon, forecastModel } from "./model";
import { trendMultipliers } from "./recursion";
import { quantilePair } from "./quantiles";
import { simulateFuture } from "./simulate";
import { estimatedQuantities } from "./shape";
import type { FittedModel } from "./types";

export interface Interval {
  forecast: Float64Array;
  low: Float64Array;
  high: Float64Array;
}

export function checkCoverage(coverage: number): number {
  if (typeof coverage !== "number" || !(coverage > 0 && coverage < 1)) {
    throw badInput("bad-coverage", `Coverage must be a fraction between 0 and 1, such as 0.95; got ${String(coverage)}.`);
  }
  return coverage;
}

/** Standard normal quantile for a two-sided coverage: z with P(|Z| <= z) = coverage (1.959964 for 0.95). */
export function coverageZ(coverage: number): number {
  return normalQuantile(0.5 + checkCoverage(coverage) / 2, 0, 1);
}

/**
 * Prediction intervals for the next `horizon` periods.
 * Additive or no seasonality: the analytic variance of Hyndman, Koehler, Ord & Snyder (2008),
 * Forecasting with Exponential Smoothing, ch. 6 (class 1 models):
 *   v_h = s^2 * (1 + sum_{j=1}^{h-1} c_j^2),  c_j = alpha + beta* phi_j + gamma* d_{j,p},
 * with phi_j = phi + ... + phi^j (j for an undamped trend), d_{j,p} = 1 when p divides j, and
 * the classic recursions mapped to their error-correction form: beta* = alpha*beta,
 * gamma* = gamma*(1-alpha) (the seasonal update on the new level).
 * That formula takes the constants and states as known. They are estimated, so the interval is
 * widened as a regression's prediction interval is (see `forecastVariance` and
 * `intervalQuantile`): s^2 is the forecast variance, the one-step variance times 1 + k/n, and
 * the half-width is a Student t quantile on n - k degrees of freedom times sqrt(v_h).
 * Multiplicative seasonality: a seeded simulation of the fitted recursions with Gaussian
 * relative errors, 2000 Latin hypercube paths (simulate.ts), empirical quantiles; the relative
 * sd is widened by the same two factors, sqrt(1 + k/n) and t / z.
 */
export function predictionInterval(model: FittedModel, horizon: number, coverage = 0.95): Interval {
  checkHorizon(horizon);
  checkCoverage(coverage);
  if (model.errorCount < 2) {
    throw badInput("no-errors", "A prediction interval needs at least 2 one-step errors; add history beyond the start window.");
  }
  const forecast = forecastModel(model, horizon);
  if (model.spec.seasonality === "multiplicative") return simulated(model, forecast, coverage);
  const { sumSquares } = additiveIntervalWeights(model, horizon);
  const sigma2 = forecastVariance(model);
  const z = intervalQuantile(model, coverage);
  const low = new Float64Array(horizon);
  const high = new Float64Array(horizon);
  for (let h = 1; h <= horizon; h++) {
    const half = z * Math.sqrt(sigma2 * (1 + sumSquares[h - 1]));
    low[h - 1] = forecast[h - 1] - half;
    high[h - 1] = forecast[h - 1] + half;
  }
  return { forecast, low, high };
}

/**
 * The weights of the analytic variance, c_j for j = h-1 (0 for h = 1), and their running sums
 * of squares sum_{j<h} c_j^2, so that v_h = sigma^2 * (1 + sumSquares[h-1]).
 */
export function additiveIntervalWeights(model: FittedModel, horizon: number): { weight: Float64Array; sumSquares: Float64Array } {
  const { alpha, beta, gamma, phi } = model.constants;
  const p = model.spec.period;
  const trend = model.spec.trend;
  const betaStar = trend === "none" ? 0 : alpha * beta;
  const gammaStar = model.spec.seasonality === "none" ? 0 : gamma * (1 - alpha);
  const multipliers = trendMultipliers(trend, phi, horizon);
  const weight = new Float64Array(horizon);
  const sumSquares = new Float64Array(horizon);
  let sum = 0;
  for (let h = 2; h <= horizon; h++) {
    const j = h - 1;
    const c = alpha + betaStar * multipliers[j - 1] + (p >= 2 && j % p === 0 ? gammaStar : 0);
    weight[h - 1] = c;
    sum += c * c;
    sumSquares[h - 1] = sum;
  }
  return { weight, sumSquares };
}

/** Variance of the one-step error in the additive (class 1) models: sigma^2 = SSE / varianceDivisor. */
export function oneStepVariance(model: FittedModel): number {
  return model.sse / varianceDivisor(model);
}

/** Standard deviation of the one-step relative error (error / forecast) in multiplicative models. */
export function oneStepRelativeSd(model: FittedModel): number {
  return Math.sqrt(model.relativeSse / varianceDivisor(model));
}

/**
 * The one-step variance widened for the estimated constants and starting states: times
 * 1 + k/n, with n one-step errors and k estimated quantities (varianceDivisor). k/n is the mean
 * leverage of a least-squares fit with k parameters on n points, so this is the mean of the
 * regression prediction variance s^2 (1 + x'(X'X)^-1 x) over the fitted points, and s^2 (n+k)/(n-k)
 * over n is Akaike's final prediction error (Akaike 1970, "Statistical predictor identification",
 * Ann. Inst. Stat. Math. 22). Short histories with many parameters get the wider interval they need.
 */
export function estimationFactor(model: FittedModel): number {
  return 1 + estimatedQuantities(model.shape) / Math.max(1, model.errorCount);
}

/** Variance of a new one-step error (additive models): sigma^2 * estimationFactor. */
export function forecastVariance(model: FittedModel): number {
  return oneStepVariance(model) * estimationFactor(model);
}

/** Sd of a new one-step relative error (multiplicative models): the relative sd * sqrt(estimationFactor). */
export function forecastRelativeSd(model: FittedModel): number {
  return oneStepRelativeSd(model) * Math.sqrt(estimationFactor(model));
}

/**
 * Quantile for a two-sided interval: Student's t at 0.5 + coverage/2 on the variance's degrees
 * of freedom (varianceDivisor), as the variance is itself estimated (common practice for
 * regression prediction intervals). 2.0518 for 0.95 on 27 degrees (qt(0.975, 27) in base R);
 * it approaches coverageZ as the history grows.
 */
export function intervalQuantile(model: FittedModel, coverage: number): number {
  return errorQuantile(model, 0.5 + checkCoverage(coverage) / 2);
}

/** The one-sided quantile of a new error in sds: Student's t at `probability` on varianceDivisor(model) degrees. */
export function errorQuantile(model: FittedModel, probability: number): number {
  return studentQuantile(probability, varianceDivisor(model));
}

/**
 * True when the model has no more one-step errors than it estimates quantities: the variance is
 * then taken over 1 and the quantile on 1 degree of freedom (varianceDivisor's floor), so the
 * interval is many times wider than the errors suggest (t = 12.7 at 95%). Panels caution on it.
 */
export function varianceIsThin(model: FittedModel): boolean {
  return model.errorCount <= estimatedQuantities(model.shape);
}

/**
 * Divisor of the error variance: the number of one-step errors less the quantities the model
 * estimates (as the forecast package for R does for its state-space models, Hyndman &
 * Khandakar 2008, J. Stat. Software 27(3)), so that short histories with many parameters do
 * not get intervals that are too narrow. At least 1.
 */
export function varianceDivisor(model: FittedModel): number {
  return Math.max(1, model.errorCount - estimatedQuantities(model.shape));
}

/**
 * Paths of the multiplicative interval's simulation. With Latin hypercube draws (simulate.ts),
 * 2000 paths put the interval ends within about 1.2% of the interval's width (root mean
 * square) of a 200,000-path run on M3 monthly series, against 0.9% for the 5000 plain
 * Gaussian paths used before, at about a tenth of the cost.
 */
export const INTERVAL_PATHS = 2000;

function simulated(model: FittedModel, forecast: Float64Array, coverage: number): Interval {
  const horizon = forecast.length;
  const low = new Float64Array(horizon);
  const high = new Float64Array(horizon);
  const q = (1 - coverage) / 2;
  const sigma = forecastRelativeSd(model) * (intervalQuantile(model, coverage) / coverageZ(coverage));
  simulateFuture(model, sigma, horizon, INTERVAL_PATHS, (h, step) => {
    [low[h - 1], high[h - 1]] = quantilePair(step, q);
    if (!Number.isFinite(low[h - 1]) || !Number.isFinite(high[h - 1])) throw simulationBreakdown("interval");
  });
  return { forecast, low, high };
}

/** The error for a simulated figure that broke down (a path's level reached zero). */
export function simulationBreakdown(what: string): Error {
  return badInput(`${what.replace(/ /g, "-")}-breakdown`, `The simulated ${what} broke down (the level reached zero); use additive seasonality for this series.`);
}
