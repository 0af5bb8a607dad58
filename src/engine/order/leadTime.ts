import { badInput } from "../errors";
import { checkHorizon, forecastModel } from "../model";
import { additiveIntervalWeights, forecastRelativeSd, forecastVariance, simulationBreakdown } from "../intervals";
import { simulateFuture } from "../simulate";
import type { FittedModel } from "../types";

/** Demand over the next few periods (a lead time, plus a review period) and the spread of its error. */
export interface LeadTimeDemand {
  /** Periods summed: lead time plus review period. */
  periods: number;
  /** Sum of the point forecasts over those periods. */
  forecast: number;
  /** Variance of the error of that sum: every h-step variance and every covariance between steps. */
  variance: number;
  sd: number;
  /** "analytic" (additive or no seasonality) or "simulated" (multiplicative seasonality). */
  method: "analytic" | "simulated";
  /**
   * The common shortcut, one-step standard deviation times the square root of the periods, for
   * comparison only. It equals `sd` only when no error carries forward (see leadTimeDemand).
   */
  rootPeriodsSd: number;
}

/** Paths of the lead-time simulation (multiplicative seasonality); more than the intervals use, as a sum's spread is wanted. */
export const LEAD_TIME_PATHS = 20000;

/**
 * Forecast of the total over the next `periods` periods and the standard deviation of its error,
 * from the same error model as the prediction intervals, with the same widening for the
 * estimated constants (sigma^2 below is the intervals' forecastVariance).
 *
 * Additive or no seasonality (Hyndman, Koehler, Ord & Snyder 2008, Forecasting with Exponential
 * Smoothing, ch. 6, the class 1 variance, applied to the sum as their aggregated, lead-time
 * forecast): the h-step error is e_h = eps_h + sum_{j=1}^{h-1} c_j eps_{h-j}, with the same c_j
 * as the intervals. Summing e_1..e_L, the shock eps_k carries weight 1 + C_{L-k}, with
 * C_m = c_1 + ... + c_m, so
 *   Var(sum) = sigma^2 * sum_{k=1}^{L} (1 + C_{L-k})^2,
 * which is the sum of the h-step variances plus twice every covariance between steps.
 * Every c_j is 0 or more, so this is never below sigma^2 * L; it equals it (the shortcut
 * sigma * sqrt(L) is right) only when every c_j with j < L is 0: alpha = 0, and gamma = 0 or a
 * lead time within one season, that is a model whose level, trend and indices never learn from
 * new errors. For any alpha > 0 the errors of successive periods move together and the
 * shortcut understates the spread.
 *
 * Multiplicative seasonality: no such closed form is used; a seeded simulation of the fitted
 * recursions (the intervals' simulation, `LEAD_TIME_PATHS` paths) gives the sum per path and
 * its sample variance. Deterministic: same model, same digits.
 *
 * Example: simple smoothing (no trend, no seasons), alpha 0.2, sigma 10, L = 3: c_j = 0.2,
 * weights 1.4, 1.2, 1; variance 100 * (1.96 + 1.44 + 1) = 440, sd 20.98 (the shortcut gives 17.32).
 */
export function leadTimeDemand(model: FittedModel, periods: number): LeadTimeDemand {
  checkHorizon(periods);
  if (model.errorCount < 2) {
    throw badInput("no-errors", "The lead-time error needs at least 2 one-step errors; add history beyond the start window.");
  }
  const forecast = forecastModel(model, periods).reduce((s, v) => s + v, 0);
  if (model.shape.multiplicative) {
    const sigma = forecastRelativeSd(model);
    const sums = new Float64Array(LEAD_TIME_PATHS);
    simulateFuture(model, sigma, periods, LEAD_TIME_PATHS, (_, step) => {
      for (let i = 0; i < step.length; i++) sums[i] += step[i];
    });
    if (!sums.every(Number.isFinite)) throw simulationBreakdown("lead-time demand");
    const variance = sampleVariance(sums);
    return { periods, forecast, variance, sd: Math.sqrt(variance), method: "simulated", rootPeriodsSd: sigma * (forecast / periods) * Math.sqrt(periods) };
  }
  const sigma2 = forecastVariance(model);
  const { weight } = additiveIntervalWeights(model, periods);
  // weight[j] = c_j for j = 1..periods-1; cumulative[m] = C_m.
  const cumulative = new Float64Array(periods);
  for (let m = 1; m < periods; m++) cumulative[m] = cumulative[m - 1] + weight[m];
  let sum = 0;
  for (let k = 1; k <= periods; k++) sum += (1 + cumulative[periods - k]) ** 2;
  const variance = sigma2 * sum;
  return { periods, forecast, variance, sd: Math.sqrt(variance), method: "analytic", rootPeriodsSd: Math.sqrt(sigma2 * periods) };
}

function sampleVariance(x: Float64Array): number {
  let mean = 0;
  for (let i = 0; i < x.length; i++) mean += x[i];
  mean /= x.length;
  let ss = 0;
  for (let i = 0; i < x.length; i++) ss += (x[i] - mean) ** 2;
  return ss / (x.length - 1);
}
