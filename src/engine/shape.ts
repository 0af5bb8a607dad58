import type { ModelSpec, Seasonality, StartMethod, TrendKind } from "./types";

/**
 * The shape of a model: its form (season length, seasonality, trend) and its start, resolved
 * once, with every rule that depends on them. The engine, the worksheet functions, the ledger
 * (description, read-back, extend, fit, check) and the batch command all ask a shape instead of
 * restating a rule such as "seasonal when the seasonality is not none and p >= 2".
 */
export interface ModelShape {
  /** Season length in use: the typed or detected p when seasonal, else 1. */
  readonly period: number;
  readonly seasonal: boolean;
  /** "none" whenever the model is not seasonal (also for p < 2). */
  readonly seasonality: Seasonality;
  readonly multiplicative: boolean;
  readonly trend: TrendKind;
  readonly hasTrend: boolean;
  readonly damped: boolean;
  readonly start: StartMethod;
  /** Seasons (or, without seasons, periods) in the decomposition start window. */
  readonly cycles: number;
  /** Periods shown in the start table (the start window); 0 for the optimized start. */
  readonly startWindow: number;
  /** 0-based index of the first period that is updated and forecast one step ahead. */
  readonly firstUpdate: number;
  /** Values of the initial state: level, the trend when there is one, p indices when seasonal. */
  readonly stateSize: number;
  /** The specification this shape resolves (period 1 and seasonality "none" when not seasonal). */
  readonly spec: ModelSpec;
}

/** The one rule for "is this model seasonal": a seasonality other than none and a season of 2 or more. */
export function isSeasonal(seasonality: Seasonality, period: number): boolean {
  return seasonality !== "none" && period >= 2;
}

/** Resolve the shape of a model from its specification. */
export function modelShape(spec: { period: number; seasonality: Seasonality; trend: TrendKind; start: StartMethod; cycles?: number }): ModelShape {
  const seasonal = isSeasonal(spec.seasonality, spec.period);
  const period = seasonal ? spec.period : 1;
  const seasonality: Seasonality = seasonal ? spec.seasonality : "none";
  const cycles = spec.cycles ?? 2;
  const hasTrend = spec.trend !== "none";
  let startWindow: number;
  let firstUpdate: number;
  if (spec.start === "classic") {
    // base R's HoltWinters: two seasons decomposed, updating from period p+1; without seasons
    // level y2 and trend y2 - y1, updating from period 3.
    startWindow = seasonal ? 2 * period : 2;
    firstUpdate = seasonal ? period : 2;
  } else if (spec.start === "optimized") {
    startWindow = 0;
    firstUpdate = 0;
  } else {
    startWindow = seasonal ? cycles * period : Math.max(2, cycles);
    firstUpdate = startWindow;
  }
  const resolved: ModelSpec = { period, seasonality, trend: spec.trend, start: spec.start, cycles };
  return {
    period,
    seasonal,
    seasonality,
    multiplicative: seasonality === "multiplicative",
    trend: spec.trend,
    hasTrend,
    damped: spec.trend === "damped",
    start: spec.start,
    cycles,
    startWindow,
    firstUpdate,
    stateSize: 1 + (hasTrend ? 1 : 0) + (seasonal ? period : 0),
    spec: resolved,
  };
}

/** Names of the smoothing constants a shape uses (alpha always; beta with a trend; gamma with seasons; phi when damped). */
export function shapeConstants(shape: ModelShape): ("alpha" | "beta" | "gamma" | "phi")[] {
  const names: ("alpha" | "beta" | "gamma" | "phi")[] = ["alpha"];
  if (shape.hasTrend) names.push("beta");
  if (shape.seasonal) names.push("gamma");
  if (shape.damped) names.push("phi");
  return names;
}

/**
 * Parameters counted in AICc for a fit with `free` fitted constants: those constants and the
 * start state's free values (level; trend; p-1 indices, the last fixed by normalisation).
 */
export function parameterCount(shape: ModelShape, free: number): number {
  return free + 1 + (shape.hasTrend ? 1 : 0) + (shape.seasonal ? shape.period - 1 : 0);
}

/**
 * Quantities a model estimates from its history, whether its constants were fitted or typed:
 * alpha and the start level; beta and the start trend with a trend; phi when damped; gamma and
 * p-1 free start indices with seasons.
 */
export function estimatedQuantities(shape: ModelShape): number {
  return 2 + (shape.hasTrend ? 2 : 0) + (shape.damped ? 1 : 0) + (shape.seasonal ? shape.period : 0);
}

/** The quantities estimatedQuantities counts, in words, for a ledger's note: "alpha, the start level, ...". */
export function estimatedQuantityWords(shape: ModelShape): string {
  const words = ["alpha", "the start level"];
  if (shape.hasTrend) words.push("beta", "the start trend");
  if (shape.damped) words.push("phi");
  if (shape.seasonal) words.push("gamma", `${shape.period - 1} start indices (the last follows from the others)`);
  return `${words.slice(0, -1).join(", ")} and ${words[words.length - 1]}`;
}

/** History needed before a model of this shape can be used, with `free` constants to fit. */
export function requiredLength(shape: ModelShape, free: number): number {
  if (shape.start === "classic") return shape.seasonal ? 2 * shape.period + 1 : 3;
  if (shape.start === "optimized") return Math.max(shape.seasonal ? shape.cycles * shape.period : Math.max(2, shape.cycles), free + (shape.seasonal ? shape.period + 1 : 2) + 2);
  return shape.startWindow + (free > 0 ? free + 1 : 0);
}

/** Season position (0-based) of period t (0-based): the index one season back serves it. */
export function seasonPosition(shape: ModelShape, t: number): number {
  return shape.seasonal ? t % shape.period : 0;
}
