import type { ModelShape } from "./shape";

/**
 * Shared vocabulary of the engine. Every other part of Ebb speaks these types.
 * Series are Float64Array with NaN marking a missing period (a blank cell).
 */

/** How the seasonal index combines with level and trend. "none" means no seasonal index (period 1). */
export type Seasonality = "multiplicative" | "additive" | "none";
/** Trend form: linear (Holt), damped (Gardner & McKenzie 1985) or none. */
export type TrendKind = "linear" | "damped" | "none";
/** How the initial state is obtained. */
export type StartMethod = "decomposition" | "classic" | "optimized";

/** Smoothing constants. beta is ignored without trend, gamma without seasonality; phi is 1 unless damped. */
export interface Constants {
  alpha: number;
  beta: number;
  gamma: number;
  phi: number;
}

/**
 * A model state at the end of some period t.
 * `indices[k]` is the seasonal index to use for period t+1+k (k = 0..p-1), i.e. the last p
 * indices, oldest first. For seasonality "none" it is an empty array.
 */
export interface State {
  level: number;
  trend: number;
  indices: Float64Array;
}

/** The starting state plus what a person needs to see how it was obtained. */
export interface Start {
  method: StartMethod;
  /** State at the end of period `origin` (0-based index of the last period of the start window, or -1 before the first). */
  state: State;
  /** 0-based index of the first period that is updated (and forecast one step ahead). */
  firstUpdate: number;
  /** Decomposition details for display (the ledger); absent for the optimized start. */
  detail?: StartDetail;
}

export interface StartDetail {
  /** Number of values in the start window. */
  window: number;
  /** Centered moving average over the window (NaN where it does not exist). */
  movingAverage: Float64Array;
  /** Ratio (multiplicative) or difference (additive) to the moving average (NaN where absent). */
  detrended: Float64Array;
  /** Raw per-position averages before normalising, position 0 = first period of the series. */
  rawIndices: Float64Array;
  /** Normalised indices, position 0 = first period of the series. */
  normalIndices: Float64Array;
  /** Seasonally adjusted window values the line is fitted to (decomposition start; NaN where missing). */
  adjusted?: Float64Array;
  /** Regression line: value = intercept + slope * x, x as documented by `regressionX`. */
  intercept: number;
  slope: number;
  /** What the regression's x counts: "period" (1-based period of the series) or "ma-rank" (1..k over existing moving-average values). */
  regressionX: "period" | "ma-rank";
  /** Leading blanks skipped: the window begins with period skipped + 1 (absent when none). */
  skipped?: number;
  /** Blanks of the window filled before the decomposition: 0-based periods and the values used (absent when none). */
  filled?: { at: number[]; values: number[] };
}

/** Everything that identifies a model specification. */
export interface ModelSpec {
  period: number;
  seasonality: Seasonality;
  trend: TrendKind;
  start: StartMethod;
  /** Seasons in the start window of the decomposition start (default 2, at least 2). */
  cycles: number;
}

/** Result of running the recursion over a history. All arrays have length n (the history length). */
export interface StateTable {
  level: Float64Array;
  trend: Float64Array;
  /** Seasonal index after the update of period t (the one that will serve period t+p). */
  index: Float64Array;
  /** One-step forecast made for period t before its update (NaN in the start window). */
  forecast: Float64Array;
  /** actual - forecast (NaN in the start window and for missing actuals). */
  error: Float64Array;
}

/** A fitted (or fully specified) model over one history. */
export interface FittedModel {
  spec: ModelSpec;
  /** The model's shape: the rules of its form and start (start window, first update, counts). */
  shape: ModelShape;
  constants: Constants;
  start: Start;
  /** State after the last period of the history. */
  final: State;
  /** Sum of squared one-step errors over the update window (missing periods excluded). */
  sse: number;
  /** Number of one-step errors in sse. */
  errorCount: number;
  rmse: number;
  aicc: number;
  /** Number of estimated parameters counted in AICc. */
  parameterCount: number;
  /** Sum of squared relative one-step errors (error / forecast), for multiplicative intervals. */
  relativeSse: number;
  /** The history the model was fitted on (trailing blanks removed, NaN = missing). */
  history: Float64Array;
}
