/**
 * The one table of Ebb's worksheet functions: name, description, parameters with their help,
 * the shape of the result, and the shared implementation. Every host reads this table: the
 * spreadsheet host's JSDoc wrappers are generated from it (generateHostFunctions.ts), and the
 * embedded formula engine's plugin registers from it. Adding a function touches this file
 * (plus its implementation) and a re-run of the generator.
 */
import { accuracyFn, biasFn, madFn, mapeFn, maseFn, mseFn, rmseFn, smapeFn, theilUFn, trackingFn } from "./accuracy";
import type { Output } from "./cells";
import { aheadFn, backtestFn, bandFn, fitFn, fittedFn, statesFn } from "./model";
import { OPTION_WORDS_HELP } from "./optionWords";
import { bufferFn, correctedFn, unusualFn } from "./order";
import { fvaFn, watchFn } from "./signals";
import { indicesFn, initFn, periodFn } from "./start";
import { projectFn, stepFn } from "./state";

/** Worksheet namespace: the manifest declares it, so AHEAD is typed EBB.AHEAD. */
export const NAMESPACE = "EBB";

/**
 * How a parameter reaches the function: a range of cells, a number, an option word, or any
 * single value (used where a blank cell must mean "omitted" and text must get Ebb's message).
 */
export type ParamKind = "range" | "number" | "word" | "value";

export interface ParamSpec {
  name: string;
  help: string;
  kind: ParamKind;
  optional?: boolean;
}

/** Size of one argument as written in a formula, for hosts that reserve a spill area on entry. */
export interface ArgShape {
  rows: number;
  cols: number;
  /** The number itself when the argument is typed as a plain number. */
  literal?: number;
  /** True when the argument is left out or empty. */
  omitted: boolean;
}

/** Rows and columns of a spilled result, or undefined when they depend on a value not typed in the formula. */
export type SizeRule = (args: ArgShape[]) => { rows: number; cols: number } | undefined;

export interface FunctionSpec {
  /** Name inside the namespace: "AHEAD" is typed EBB.AHEAD. */
  name: string;
  description: string;
  params: ParamSpec[];
  /** "scalar": one number; "matrix": a block that spills. */
  result: "scalar" | "matrix";
  /** Largest block the function can return for these arguments (matrix results only). */
  size?: SizeRule;
  /** The shared implementation; throws EbbError for bad input. */
  run: (...args: unknown[]) => Output;
}

/** An implementation taking one `unknown` per parameter (it coerces its own inputs). */
type RunFor<P extends readonly ParamSpec[]> = (...args: { [K in keyof P]: unknown }) => Output;
/** F itself when it takes exactly as many arguments as P lists, otherwise never. */
type SameArity<P extends readonly ParamSpec[], F extends RunFor<P>> = Parameters<F>["length"] extends P["length"]
  ? P["length"] extends Parameters<F>["length"]
    ? F
    : never
  : never;

/**
 * One catalog entry, checked by the compiler: the implementation must take one argument per
 * parameter, no more and no fewer, each `unknown`. A parameter list and an implementation that
 * disagree fail to compile (the `run` property becomes `never`).
 */
export function defineFunction<const P extends readonly ParamSpec[], F extends RunFor<P>>(
  spec: Omit<FunctionSpec, "params" | "run"> & { params: P; run: F & SameArity<P, F> },
): FunctionSpec {
  // The one widening cast: callers pass exactly params.length arguments (invoke.ts pads them).
  return { ...spec, params: [...spec.params], run: spec.run as unknown as FunctionSpec["run"] };
}

// ---- sizes of spilled results -------------------------------------------------------------

const NONE: ArgShape = { rows: 1, cols: 1, omitted: true };
const arg = (a: ArgShape[], i: number): ArgShape => a[i] ?? NONE;
/** Series in a range: a single row is one series, otherwise one per column. */
const seriesCount = (a: ArgShape): number => (a.rows === 1 && a.cols > 1 ? 1 : a.cols);
/** Cells per series. */
const seriesLength = (a: ArgShape): number => (a.rows === 1 ? a.cols : a.rows);
const typedWhole = (a: ArgShape): number | undefined =>
  a.literal !== undefined && Number.isInteger(a.literal) && a.literal >= 1 ? a.literal : undefined;

/**
 * Rows needed for p seasonal indices, checked against the history before anything is
 * reserved: when p is detected, at most a third of the history (a season must repeat three
 * times to be found); otherwise at most half of it (two full seasons are needed), so a typed
 * period longer than that reserves one cell for its message instead of a block of p rows.
 */
function indexRows(history: ArgShape, period: ArgShape): number {
  const n = seriesLength(history);
  if (period.omitted || period.literal === 0) return Math.max(1, Math.floor(n / 3));
  const mostIndices = Math.max(1, Math.floor(n / 2));
  const typed = typedWhole(period);
  return typed !== undefined && typed <= mostIndices ? typed : typed !== undefined ? 1 : mostIndices;
}

function horizonRows(horizon: ArgShape): number | undefined {
  const h = typedWhole(horizon);
  return h !== undefined && h <= 1000 ? h : undefined;
}

const perSeries = (rows: (a: ArgShape[]) => number | undefined, width: number): SizeRule => (a) => {
  const r = rows(a);
  return r === undefined ? undefined : { rows: r, cols: width * seriesCount(arg(a, 0)) };
};

// ---- parameter help shared by several functions ------------------------------------------

const HISTORY: ParamSpec = {
  name: "history",
  kind: "range",
  help: "Actuals, oldest first: a column (or row), or a block with one product per column. Blank cells are missing; trailing blanks are ignored.",
};
const PERIOD: ParamSpec = {
  name: "period",
  kind: "value",
  help: "Season length, for example 12 for monthly data with a yearly pattern; 0 or blank detects it.",
};
const HORIZON: ParamSpec = { name: "horizon", kind: "number", help: "How many periods ahead to forecast (1 to 1000)." };
const SEASONALITY: ParamSpec = {
  name: "seasonality",
  kind: "word",
  optional: true,
  help: "multiplicative (default), additive, or auto (the better of the two by AICc).",
};
const FIXED_SEASONALITY: ParamSpec = { ...SEASONALITY, help: "multiplicative (default) or additive." };
const TREND: ParamSpec = {
  name: "trend",
  kind: "word",
  optional: true,
  help: "linear (default), damped, none, or auto (the best by AICc).",
};
const START: ParamSpec = {
  name: "start",
  kind: "word",
  optional: true,
  help: "How the start state is found: decomposition (default), classic, or optimized.",
};
const constant = (name: string, what: string): ParamSpec => ({
  name,
  kind: "value",
  optional: true,
  help: `Smoothing constant for the ${what}, 0 to 1; blank fits it.`,
});
const ALPHA = constant("alpha", "level");
const BETA = constant("beta", "trend");
const GAMMA = constant("gamma", "seasonal indices");
const PHI: ParamSpec = {
  name: "phi",
  kind: "value",
  optional: true,
  help: "Trend damping, 0 to 1 (typing it asks for a damped trend); blank fits it when the trend is damped.",
};
const ACTUAL: ParamSpec = { name: "actual", kind: "range", help: "Actuals, oldest first (a column or a row). Blank cells are skipped." };
const FORECAST: ParamSpec = {
  name: "forecast",
  kind: "range",
  help: "Forecasts for the same periods, the same size as actual. Blank cells are skipped.",
};

const measure = (name: string, description: string, run: (actual: unknown, forecast: unknown) => number): FunctionSpec =>
  defineFunction({ name, description, params: [ACTUAL, FORECAST], result: "scalar", run });

// ---- the table ---------------------------------------------------------------------------

export const CATALOG: FunctionSpec[] = [
  defineFunction({
    name: "PERIOD",
    description: "Detected season length of each series (1 when no season is found).",
    params: [HISTORY],
    result: "matrix",
    size: perSeries(() => 1, 1),
    run: periodFn,
  }),
  defineFunction({
    name: "INDICES",
    description: "Seasonal indices by classical decomposition over all full seasons; the first index belongs to the first row of the history.",
    params: [HISTORY, PERIOD, FIXED_SEASONALITY],
    result: "matrix",
    size: perSeries((a) => indexRows(arg(a, 0), arg(a, 1)), 1),
    run: indicesFn,
  }),
  defineFunction({
    name: "INIT",
    description: "Start state from the first seasons: start level, start trend, then the p start indices.",
    params: [
      HISTORY,
      PERIOD,
      FIXED_SEASONALITY,
      { name: "cycles", kind: "value", optional: true, help: "Seasons in the start window, 2 or more (default 2)." },
    ],
    result: "matrix",
    size: perSeries((a) => 2 + indexRows(arg(a, 0), arg(a, 1)), 1),
    run: initFn,
  }),
  defineFunction({
    name: "STEP",
    description: "One Holt-Winters update: new level, new trend, new index, the forecast made for this period, and its error.",
    params: [
      { name: "level", kind: "value", help: "Level after the period before (or the start level)." },
      { name: "trend", kind: "value", help: "Trend after the period before (or the start trend; 0 for none)." },
      { name: "index", kind: "value", help: "Seasonal index of the same season, one season back." },
      { name: "actual", kind: "value", help: "This period's actual; blank skips the update." },
      { ...ALPHA, optional: false, help: "Smoothing constant for the level, 0 to 1." },
      { ...BETA, optional: false, help: "Smoothing constant for the trend, 0 to 1." },
      { ...GAMMA, optional: false, help: "Smoothing constant for the seasonal indices, 0 to 1." },
      FIXED_SEASONALITY,
      { ...PHI, help: "Trend damping, 0 to 1 (default 1, no damping)." },
    ],
    result: "matrix",
    size: () => ({ rows: 1, cols: 5 }),
    run: stepFn,
  }),
  defineFunction({
    name: "PROJECT",
    description: "Forecasts for the next periods from a state: level, trend and the last p seasonal indices.",
    params: [
      { name: "level", kind: "value", help: "Level at the last period." },
      { name: "trend", kind: "value", help: "Trend at the last period (0 for none)." },
      { name: "indices", kind: "range", help: "The last p seasonal indices, oldest first." },
      HORIZON,
      FIXED_SEASONALITY,
      { ...PHI, help: "Trend damping, 0 to 1 (default 1, no damping)." },
    ],
    result: "matrix",
    size: (a) => {
      const h = horizonRows(arg(a, 3));
      return h === undefined ? undefined : { rows: h, cols: 1 };
    },
    run: projectFn,
  }),
  defineFunction({
    name: "FIT",
    description:
      "Fitted model of each series: seasonality and trend used, alpha, beta, gamma, phi, sum of squared errors, RMSE and AICc (one column per series).",
    params: [HISTORY, PERIOD, SEASONALITY, TREND, START],
    result: "matrix",
    size: perSeries(() => 9, 1),
    run: fitFn,
  }),
  defineFunction({
    name: "STATES",
    description:
      "Level, trend, seasonal index, one-step forecast and error for every period (five columns per series; blank in the start window).",
    params: [HISTORY, PERIOD, ALPHA, BETA, GAMMA, SEASONALITY, TREND, PHI, START],
    result: "matrix",
    size: perSeries((a) => seriesLength(arg(a, 0)), 5),
    run: statesFn,
  }),
  defineFunction({
    name: "FITTED",
    description: "One-step forecasts aligned with the history (blank in the start window), one column per series.",
    params: [HISTORY, PERIOD, ALPHA, BETA, GAMMA, SEASONALITY, TREND, PHI, START],
    result: "matrix",
    size: perSeries((a) => seriesLength(arg(a, 0)), 1),
    run: fittedFn,
  }),
  defineFunction({
    name: "AHEAD",
    description: "Forecasts for the next periods after the history, one column per series.",
    params: [HISTORY, PERIOD, HORIZON, SEASONALITY, TREND, ALPHA, BETA, GAMMA, PHI],
    result: "matrix",
    size: perSeries((a) => horizonRows(arg(a, 2)), 1),
    run: aheadFn,
  }),
  defineFunction({
    name: "BAND",
    description: "Prediction interval for the next periods: low and high, two columns per series.",
    params: [
      HISTORY,
      PERIOD,
      HORIZON,
      { name: "coverage", kind: "value", optional: true, help: "Share of future actuals the interval should hold, for example 0.95 (default)." },
      SEASONALITY,
      TREND,
    ],
    result: "matrix",
    size: perSeries((a) => horizonRows(arg(a, 2)), 2),
    run: bandFn,
  }),
  defineFunction({
    name: "BACKTEST",
    description: "Rolling-origin test: per step ahead, MAD, MAPE, MASE and the number of origins scored (four columns per series).",
    params: [
      HISTORY,
      PERIOD,
      HORIZON,
      { name: "origins", kind: "value", optional: true, help: "How many forecast origins to refit from, ending horizon periods before the last actual (default 12)." },
      SEASONALITY,
      TREND,
    ],
    result: "matrix",
    size: perSeries((a) => horizonRows(arg(a, 2)), 4),
    run: backtestFn,
  }),
  measure("MAD", "Mean absolute deviation of the forecast errors (error = actual - forecast).", madFn),
  measure("MSE", "Mean squared forecast error.", mseFn),
  measure("RMSE", "Root mean squared forecast error.", rmseFn),
  measure("MAPE", "Mean absolute percentage error, in percent.", mapeFn),
  measure("SMAPE", "Symmetric mean absolute percentage error (M3 competition form), in percent.", smapeFn),
  measure("BIAS", "Mean forecast error (actual - forecast); positive means forecasts ran low.", biasFn),
  measure("THEILU", "Theil's U2: below 1 the forecasts beat the no-change forecast.", theilUFn),
  defineFunction({
    name: "MASE",
    description: "Mean absolute scaled error: MAD divided by the in-sample MAD of the seasonal naive forecast on the history.",
    params: [ACTUAL, FORECAST, { ...HISTORY, help: "In-sample history the forecasts were made from, oldest first." }, PERIOD],
    result: "scalar",
    run: maseFn,
  }),
  defineFunction({
    name: "TRACKING",
    description:
      "Tracking signal per period: the sum of the last 6 errors over their expected spread (sqrt(pi/2) x the MAD of the errors before them, x sqrt(6)); beyond +/-2.2 the forecasts have leaned one way (about 3% false alarms on an unbiased forecast). Blank until 6 errors precede the window.",
    params: [
      ACTUAL,
      FORECAST,
      {
        name: "form",
        kind: "word",
        optional: true,
        help: "window (default, limit +/-2.2) or running: the running sum of all errors over the running MAD (limit +/-4), which grows with time and alarms on most long series.",
      },
    ],
    result: "matrix",
    size: (a) => ({ rows: arg(a, 0).rows * arg(a, 0).cols, cols: 1 }),
    run: trackingFn,
  }),
  defineFunction({
    name: "ACCURACY",
    description: "Table of accuracy measures: measure name and value (MASE too when a history is given).",
    params: [
      ACTUAL,
      FORECAST,
      { ...HISTORY, optional: true, help: "Optional in-sample history, for MASE." },
      { ...PERIOD, optional: true, help: "Season length for MASE; 0 or blank detects it." },
    ],
    result: "matrix",
    size: (a) => ({ rows: arg(a, 2).omitted ? 8 : 9, cols: 2 }),
    run: accuracyFn,
  }),
  defineFunction({
    name: "WATCH",
    description:
      'Review list, one row per series: status ("too short", "forecast too low", "forecast too high", "worse than seasonal naive" or "ok"), tracking signal, bias over the last 6 periods as % of their mean, MASE of the last season forecast from the history before it, and how many of the last 6 actuals fell outside the one-step 95% band.',
    params: [HISTORY, PERIOD, { name: "options", kind: "word", optional: true, help: OPTION_WORDS_HELP }],
    result: "matrix",
    size: (a) => ({ rows: seriesCount(arg(a, 0)), cols: 5 }),
    run: watchFn,
  }),
  defineFunction({
    name: "FVA",
    description:
      "Forecast value added (Gilliland): the measure for the seasonal naive forecast, the model forecast and the adjusted forecast (rows), and the value added over the step before and over seasonal naive (positive: the step made the forecast better).",
    params: [
      ACTUAL,
      { name: "model_forecast", kind: "range", help: "The model's forecasts for the same periods, the same size as actual." },
      { name: "adjusted_forecast", kind: "range", help: "The forecasts after the planner's adjustments, the same size as actual." },
      { name: "measure", kind: "word", optional: true, help: "MAD (default), MAPE, MASE or bias." },
      { ...PERIOD, optional: true, help: "Season length of the seasonal naive forecast, for example 12; 1 for the plain naive; 0 or blank detects it." },
    ],
    result: "matrix",
    size: () => ({ rows: 3, cols: 4 }),
    run: fvaFn,
  }),
  defineFunction({
    name: "CORRECTED",
    description:
      "The history with each non-blank correction used in place of its actual (same size as the history); nest it in any function that takes a history. The actuals stay as typed.",
    params: [
      HISTORY,
      {
        name: "corrections",
        kind: "range",
        help: "Corrected values beside the actuals, the same size as history: a number replaces the actual in its row, a blank keeps the actual.",
      },
    ],
    result: "matrix",
    size: (a) => ({ rows: arg(a, 0).rows, cols: arg(a, 0).cols }),
    run: correctedFn,
  }),
  defineFunction({
    name: "UNUSUAL",
    description:
      'Periods whose one-step error is unusually large for the automatic model: a flag ("high" or "low") and a suggested replacement (the one-step forecast), two columns per series. It suggests; it never changes the history.',
    params: [
      HISTORY,
      PERIOD,
      {
        name: "threshold",
        kind: "value",
        optional: true,
        help: "How many robust standard deviations (1.4826 x the median absolute deviation of the one-step errors) count as unusual; default 4.",
      },
    ],
    result: "matrix",
    size: perSeries((a) => seriesLength(arg(a, 0)), 2),
    run: unusualFn,
  }),
  defineFunction({
    name: "BUFFER",
    description:
      "Safety stock from the model's own error growth, per series: demand forecast over the lead time (plus review period), the standard deviation of its error, the safety stock and the reorder point (four rows, one column per series). Review stock levels against supplier terms, shelf life and your own policy.",
    params: [
      HISTORY,
      PERIOD,
      { name: "lead_time", kind: "value", help: "Periods from placing an order to receiving it, a whole number such as 3." },
      { name: "service_level", kind: "value", help: "Cycle service level: the chance of no stock-out before the order arrives, such as 0.95 (or 95)." },
      {
        name: "review_period",
        kind: "value",
        optional: true,
        help: "Periods between stock reviews (0 or blank: continuous review). With a review period the last row is the order-up-to level.",
      },
      { name: "options", kind: "word", optional: true, help: OPTION_WORDS_HELP },
    ],
    result: "matrix",
    size: perSeries(() => 4, 1),
    run: bufferFn,
  }),
];

/** A function's spec by its name inside the namespace. */
export function specOf(name: string): FunctionSpec {
  const spec = CATALOG.find((f) => f.name === name);
  if (!spec) throw new Error(`No EBB function is named ${name}.`);
  return spec;
}
