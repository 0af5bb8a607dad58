import { aicc } from "./aicc";
import { badInput, notEnough } from "./errors";
import { fitConstants, freeAxes, type ConstantChoice } from "./fit";
import { checkConstant, checkPeriod, parseSeasonality, parseStart, parseTrend, type SeasonalityChoice, type TrendChoice } from "./options";
import { detectPeriod } from "./period";
import { projectState, runRecursion } from "./recursion";
import { allPositive, cleanHistory, countPresent, requirePositive } from "./series";
import { classicStart } from "./start/classicStart";
import { decompositionStart, leadingBlanks } from "./start/decompositionStart";
import { passesSeasonalityTest } from "./seasonalityTest";
import { lowestAicc, scoreAlike, type Scored } from "./selection";
import { optimizedStart } from "./start/optimizedStart";
import { isSeasonal, modelShape, parameterCount, requiredLength } from "./shape";
import type { FittedModel, Seasonality, Start, StartMethod, StateTable, TrendKind } from "./types";

/** What a caller may say about a model; anything left out is detected, fitted or defaulted. */
export interface ModelOptions {
  /** Season length; 0 or undefined detects it. */
  period?: number;
  seasonality?: SeasonalityChoice;
  trend?: TrendChoice;
  start?: StartMethod;
  cycles?: number;
  alpha?: number;
  beta?: number;
  gamma?: number;
  phi?: number;
}

/**
 * How `auto` chooses. The whole family of exponential smoothing without error distinction:
 * seasonality none, additive or multiplicative x trend none, linear or damped (the taxonomy of
 * Pegels 1969, extended by Gardner 1985 and Hyndman et al. 2002, 2008), every candidate scored
 * on the same one-step errors with its parameters counted ({@link scoreAlike}) and the lowest
 * AICc taken. Seasonal candidates are considered only when the history passes the 90%
 * autocorrelation test at the seasonal lag ({@link passesSeasonalityTest}); a series that does
 * not is given the non-seasonal candidates only, as the M3/M4 benchmarks and the Theta method do.
 */
export interface AutoDesign {
  trends: TrendKind[];
  /** Apply the seasonality test before considering seasonal candidates. */
  seasonalityTest: boolean;
  /** Keep the non-seasonal candidates beside the seasonal ones when the test finds a season. */
  noneWhenSeasonal: boolean;
  /** Non-seasonal candidates start from the same window as seasonal ones (cycles x p periods). */
  noneSeasonalWindow?: boolean;
}

/**
 * The design in use, chosen by rolling-origin evaluation over the M3 training parts
 * (test/bench/rolling.ts; README "Automatic model"): the test decides between the seasonal
 * candidates and the non-seasonal ones; the trend is damped or none. Adding the linear trend
 * or the non-seasonal candidates beside seasonal ones made the monthly forecasts less accurate
 * there (an undamped trend carried a year or more ahead over-forecasts turning series; the
 * damped trend was introduced for exactly that, Gardner & McKenzie 1985). A linear trend is
 * used when asked for by name.
 */
export const AUTO_DESIGN: AutoDesign = { trends: ["damped", "none"], seasonalityTest: true, noneWhenSeasonal: false };

/** The trends `auto` chooses between. */
export const AUTO_TRENDS: TrendKind[] = AUTO_DESIGN.trends;

/** Resolve the season length: a typed one, or detected from the history. */
export function resolvePeriod(y: Float64Array, period: number | undefined): number {
  const p = checkPeriod(period);
  return p === 0 ? detectPeriod(y) : p;
}

/**
 * Fit a model to a history. With seasonality or trend "auto", every candidate is fitted on
 * the same update window and the one with the lowest AICc is returned.
 */
export function fitModel(history: ArrayLike<number | null | undefined>, options: ModelOptions = {}, design: AutoDesign = AUTO_DESIGN): FittedModel {
  const candidates = fitCandidates(history, options, design);
  return candidates.length === 1 ? candidates[0].model : lowestAicc(candidates);
}

/**
 * Every candidate the options allow, fitted and scored alike ({@link scoreAlike}); one when
 * seasonality and trend are both named. Candidates that cannot be fitted (too short a history
 * for their start window) are left out; when none can, the first one's error is thrown.
 */
export function fitCandidates(history: ArrayLike<number | null | undefined>, options: ModelOptions = {}, design: AutoDesign = AUTO_DESIGN): Scored[] {
  const y = history instanceof Float64Array ? history : cleanHistory(history);
  if (countPresent(y) === 0) throw notEnough(1, 0);
  const p = resolvePeriod(y, options.period);
  const fixed: ConstantChoice = {
    alpha: checkConstant("alpha", options.alpha),
    beta: checkConstant("beta", options.beta),
    gamma: checkConstant("gamma", options.gamma),
    phi: checkConstant("phi", options.phi),
  };
  // Option words are checked here too, so a caller that passes a typed word gets the same
  // answer as one that parsed it first.
  const start = parseStart(options.start);
  const cycles = options.cycles ?? 2;
  const seasonalities =
    options.seasonality === "none" ? (["none"] as Seasonality[]) : seasonalityCandidates(y, p, parseSeasonality(options.seasonality), design);
  const trendChoice = parseTrend(options.trend);
  const trends: TrendKind[] = trendChoice === "auto" ? design.trends : [trendChoice];
  if (seasonalities.length * trends.length === 1) return scoreAlike([fitOne(y, p, seasonalities[0], trends[0], start, cycles, fixed)]);
  const fitted: FittedModel[] = [];
  let firstError: unknown;
  for (const s of seasonalities) {
    for (const t of trends) {
      try {
        const c = design.noneSeasonalWindow && s === "none" && p >= 2 && start === "decomposition" ? cycles * p : cycles;
        fitted.push(fitOne(y, p, s, t, start, c, fixed));
      } catch (e) {
        firstError ??= e;
      }
    }
  }
  if (fitted.length === 0) throw firstError;
  return scoreAlike(fitted);
}

function seasonalityCandidates(y: Float64Array, p: number, choice: SeasonalityChoice, design: AutoDesign): Seasonality[] {
  if (!isSeasonal("additive", p)) return ["none"];
  if (choice === "auto") {
    if (design.seasonalityTest && !passesSeasonalityTest(y, p)) return ["none"];
    const seasonal: Seasonality[] = allPositive(y) ? ["multiplicative", "additive"] : ["additive"];
    return design.noneWhenSeasonal ? [...seasonal, "none"] : seasonal;
  }
  if (choice === "multiplicative") requirePositive(y);
  return [choice];
}

/** Fit one fully specified model (seasonality and trend known). */
export function fitOne(
  y: Float64Array,
  p: number,
  seasonality: Seasonality,
  trend: TrendKind,
  startMethod: StartMethod,
  cycles: number,
  fixed: ConstantChoice,
): FittedModel {
  if (seasonality === "multiplicative") requirePositive(y);
  const shape = modelShape({ period: p, seasonality, trend, start: startMethod, cycles });
  const free = freeAxes(seasonality, trend, p, fixed).length;
  const needed = requiredLength(shape, free);
  const usable = startMethod === "decomposition" ? y.length - leadingBlanks(y) : y.length;
  if (usable < needed) {
    const advice =
      startMethod === "classic"
        ? "The classic start uses two full seasons before the first update; add more history."
        : `${!shape.seasonal ? "The start" : `The start window (${cycles} seasons of ${p})`} comes first${free > 0 ? ", and fitting the constants needs a few periods after it" : ""}; add more history.`;
    throw notEnough(needed, usable, usable < y.length ? "values from the first value present" : "values", advice);
  }
  let start: Start;
  let constants;
  if (startMethod === "optimized") {
    const seed = decompositionStart(y, p, seasonality, trend, cycles);
    const guess = fitConstants(y, seed.state, seed.firstUpdate, p, seasonality, trend, fixed).constants;
    ({ start, constants } = optimizedStart(y, p, seasonality, trend, seed, fixed, guess));
  } else {
    start = startMethod === "classic" ? classicStart(y, p, seasonality, trend) : decompositionStart(y, p, seasonality, trend, cycles);
    constants = fitConstants(y, start.state, start.firstUpdate, p, seasonality, trend, fixed).constants;
  }
  const run = runRecursion(y, start.state, start.firstUpdate, p, seasonality, trend, constants);
  const count = parameterCount(shape, free);
  return {
    spec: shape.spec,
    shape,
    constants,
    start,
    final: run.final,
    sse: run.sse,
    errorCount: run.errorCount,
    rmse: run.errorCount > 0 ? Math.sqrt(run.sse / run.errorCount) : NaN,
    aicc: aicc(run.sse, run.errorCount, count),
    parameterCount: count,
    relativeSse: run.relativeSse,
    history: y,
  };
}

/** The state table of a fitted model over its own history. */
export function modelStates(model: FittedModel): StateTable {
  const { spec, start, constants, history } = model;
  return runRecursion(history, start.state, start.firstUpdate, spec.period, spec.seasonality, spec.trend, constants).table;
}

/** Point forecasts for the next `horizon` periods after the history. */
export function forecastModel(model: FittedModel, horizon: number): Float64Array {
  checkHorizon(horizon);
  const { spec, constants } = model;
  return projectState(model.final, horizon, spec.period, spec.seasonality, spec.trend, constants.phi);
}

export function checkHorizon(horizon: number): number {
  if (!Number.isInteger(horizon) || horizon < 1 || horizon > 1000) {
    throw badInput("bad-horizon", `The horizon must be a whole number of periods from 1 to 1000; got ${String(horizon)}.`);
  }
  return horizon;
}
