/**
 * The worksheet functions' shared arguments (season length, horizon, option words, smoothing
 * constants), read from host values and checked by the engine's own option parsers.
 */
import {
  badInput,
  checkConstant,
  checkHorizon,
  checkPeriod,
  parseCoverage,
  parseSeasonality,
  parseStart,
  parseTrend,
  type ModelOptions,
  type SeasonalityChoice,
} from "../engine";
import { optionalNumberArg, optionalWordArg, requiredNumberArg } from "./coerce";

/** Season length; blank or 0 means "detect it" (0 is returned). */
export function periodArg(v: unknown): number {
  return checkPeriod(optionalNumberArg(v, "period"));
}

/** Number of periods to forecast (1 to 1000). */
export function horizonArg(v: unknown): number {
  return checkHorizon(requiredNumberArg(v, "horizon", "Type how many periods ahead to forecast, for example 12."));
}

/** Interval coverage, a fraction such as 0.95 (the default) or a percentage such as 95. */
export function coverageArg(v: unknown): number {
  return parseCoverage(optionalNumberArg(v, "coverage", "Type a fraction such as 0.95 or a percent such as 95, or leave it blank for 95%.") ?? 0.95);
}

export function seasonalityArg(v: unknown): SeasonalityChoice {
  return parseSeasonality(optionalWordArg(v, "seasonality"));
}

/** Seasonality for functions that work on one given state, where "auto" has nothing to compare. */
export function fixedSeasonalityArg(v: unknown): "multiplicative" | "additive" {
  const s = seasonalityArg(v);
  if (s === "auto") {
    throw badInput("auto-not-here", 'Seasonality "auto" chooses between fitted models; here type multiplicative or additive.');
  }
  return s as "multiplicative" | "additive";
}

/** A smoothing constant typed by the user (blank: fitted). */
export function constantArg(v: unknown, name: "alpha" | "beta" | "gamma" | "phi"): number | undefined {
  return checkConstant(name, optionalNumberArg(v, name));
}

/** A smoothing constant the function cannot do without (EBB.STEP). */
export function requiredConstantArg(v: unknown, name: "alpha" | "beta" | "gamma"): number {
  const c = constantArg(v, name);
  if (c === undefined) throw badInput("missing-argument", `${name} is missing. Type the smoothing constant, a number from 0 to 1.`);
  return c;
}

/** The model options shared by the fitting functions. */
export function modelOptionsArg(a: {
  period: unknown;
  seasonality?: unknown;
  trend?: unknown;
  start?: unknown;
  alpha?: unknown;
  beta?: unknown;
  gamma?: unknown;
  phi?: unknown;
}): ModelOptions {
  const phi = constantArg(a.phi, "phi");
  const typedTrend = optionalWordArg(a.trend, "trend");
  // A damping constant only means something with a damped trend: typing phi alone asks for one.
  const trend = typedTrend === undefined && phi !== undefined ? "damped" : parseTrend(typedTrend);
  if (phi !== undefined && (trend === "linear" || trend === "none")) {
    throw badInput("phi-without-damping", `phi applies only to a damped trend; the trend is ${trend}. Set the trend to damped, or clear phi.`);
  }
  return {
    period: periodArg(a.period),
    seasonality: seasonalityArg(a.seasonality),
    trend,
    start: parseStart(optionalWordArg(a.start, "start")),
    alpha: constantArg(a.alpha, "alpha"),
    beta: constantArg(a.beta, "beta"),
    gamma: constantArg(a.gamma, "gamma"),
    phi,
  };
}
