import {
  badInput,
  bias,
  checkCoverage,
  checkHorizon,
  cleanHistory,
  EbbError,
  fitModel,
  forecastModel,
  mad,
  mape,
  modelStates,
  parseSeasonality,
  parseStart,
  parseTrend,
  predictionInterval,
  rmse,
  type FittedModel,
  type ModelShape,
  type Interval,
  type StateTable,
} from "../../engine";
import { dataScale } from "./tolerance";
import { trackingFigures, type TrackingFigures } from "./trackingColumns";
import type { LedgerSettings } from "./types";

/** Everything the ledger shows that the engine computes, for one history and its settings. */
export interface EngineFigures {
  model: FittedModel;
  y: Float64Array;
  /** Season length used by the layout (1 without seasonality). */
  p: number;
  seasonal: boolean;
  mult: boolean;
  states: StateTable;
  interval: Interval;
  forecast: Float64Array;
  /** 0-based index of the first updated period. */
  firstUpdate: number;
  /** Periods in the start table (the start window). */
  window: number;
  /** The tracking-signal columns' figures, per update period (index t - firstUpdate). */
  tracking: TrackingFigures;
  /** Typical size of the actuals, for the check's tolerances. */
  scale: number;
  score: { mad: number; rmse: number; mape: number | string; bias: number; count: number };
}

/** The "Start seasons" setting as the ledger shows it: seasons in the start window (periods without seasons). */
export function shownCycles(shape: ModelShape): number {
  return shape.seasonal ? shape.startWindow / shape.period : shape.startWindow;
}

export const MAPE_UNDEFINED = "not defined (an actual is 0)";

/** Fit (or take) the model and gather the engine's figures. Throws EbbError with advice on bad input. */
export function engineFigures(history: ArrayLike<number | null | undefined>, settings: LedgerSettings, horizon: number, coverage: number): EngineFigures {
  checkHorizon(horizon);
  checkCoverage(coverage);
  const start = parseStart(settings.start);
  if (start === "optimized") {
    throw badInput(
      "ledger-start",
      "A ledger writes its start as formulas, which the optimized start cannot be. Choose the decomposition or the classic start.",
    );
  }
  const y = cleanHistory(history);
  const model = fitModel(y, {
    period: settings.period,
    // "none" is what a ledger without seasons records in its settings block.
    seasonality: settings.seasonality === "none" ? "none" : parseSeasonality(settings.seasonality),
    trend: parseTrend(settings.trend),
    start,
    cycles: settings.cycles,
    alpha: settings.alpha,
    beta: settings.beta,
    gamma: settings.gamma,
    phi: settings.phi,
  });
  refuseUnwrittenStart(model.start.detail);
  const { seasonal, period: p, startWindow: window } = model.shape;
  const firstUpdate = model.start.firstUpdate;
  const states = modelStates(model);
  const interval = predictionInterval(model, horizon, coverage);
  const forecast = forecastModel(model, horizon);
  const actual = y.subarray(firstUpdate);
  const fc = states.forecast.subarray(firstUpdate);
  const tracking = trackingFigures(states.error.subarray(firstUpdate));
  let mapeValue: number | string;
  try {
    mapeValue = mape(actual, fc);
  } catch (e) {
    if (e instanceof EbbError && e.code === "mape-zero-actual") mapeValue = MAPE_UNDEFINED;
    else throw e;
  }
  return {
    model,
    y,
    p,
    seasonal,
    mult: model.spec.seasonality === "multiplicative",
    states,
    interval,
    forecast,
    firstUpdate,
    window,
    tracking,
    scale: dataScale(y),
    score: { mad: mad(actual, fc), rmse: rmse(actual, fc), mape: mapeValue, bias: bias(actual, fc), count: model.errorCount },
  };
}

/**
 * The engine may skip leading blanks and fill blanks inside the start window (seasonally
 * adjusted interpolation); the ledger's start formulas read the first rows as they stand, so it
 * refuses such a history with what to do rather than write a start no formula can redo.
 */
function refuseUnwrittenStart(detail: { skipped?: number; filled?: { at: number[]; values: number[] } } | undefined): void {
  if (detail?.skipped) {
    throw badInput(
      "ledger-leading-blanks",
      `The history begins with ${detail.skipped} blank period${detail.skipped === 1 ? "" : "s"}. A ledger writes its start from the first rows: select the history from its first actual (period ${detail.skipped + 1}).`,
    );
  }
  if (detail?.filled && detail.filled.at.length > 0) {
    const where = detail.filled.at.map((t, i) => `period ${t + 1} (the engine would use ${detail.filled!.values[i].toFixed(2)})`).join(", ");
    throw badInput(
      "ledger-start-blanks",
      `The start window has blanks: ${where}. A ledger writes its start as formulas over complete values: type the missing actuals (or the engine's fill shown) into the history, then write the ledger.`,
    );
  }
}
