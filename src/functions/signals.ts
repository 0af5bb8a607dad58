/**
 * EBB.WATCH and EBB.FVA: which forecasts to look at this month, and whether the planner's
 * adjustments help.
 */
import { detectPeriod, EbbError, forecastValueAdded, parseFvaMeasure, watchSeries, type WatchRow } from "../engine";
import { periodArg } from "./arguments";
import { type Block, type OutCell, optionalNumber } from "./cells";
import { optionalWordArg, readOneSeries, readSeries, toFloat64 } from "./coerce";
import { asEbbError } from "./failures";
import { cachedFit } from "./modelCache";
import { optionWordsArg } from "./optionWords";

/** Columns of EBB.WATCH, one row per series. */
export const WATCH_COLUMNS = ["status", "tracking signal", "bias (% of mean)", "MASE", "outside 95% band"] as const;

function watchCells(r: WatchRow): OutCell[] {
  return [r.status, optionalNumber(r.signal, "tracking signal"), optionalNumber(r.biasPercent, "bias"), optionalNumber(r.mase, "MASE"), optionalNumber(r.outside, "count outside the band")];
}

/**
 * EBB.WATCH: one row per series of the history (status, signal, bias %, MASE, outside count).
 * A single series that fails fails the formula (its message shows); in a table the failing
 * series' row holds its error and the others still compute.
 */
export function watchFn(history: unknown, period: unknown, options: unknown): Block {
  const modelOptions = optionWordsArg(options, periodArg(period));
  const series = readSeries(history, "history");
  return series.map((s) => {
    try {
      if (s instanceof EbbError) throw s;
      return watchCells(watchSeries(s.values, modelOptions, cachedFit));
    } catch (e) {
      if (series.length === 1) throw e;
      return new Array(WATCH_COLUMNS.length).fill(asEbbError(e));
    }
  });
}

/** EBB.FVA: per step (seasonal naive, model, adjusted) the measure and the value added, 3 x 4. */
export function fvaFn(actual: unknown, modelForecast: unknown, adjustedForecast: unknown, measure: unknown, period: unknown): Block {
  const a = toFloat64(readOneSeries(actual, "actual").values);
  const m = toFloat64(readOneSeries(modelForecast, "model_forecast").values);
  const f = toFloat64(readOneSeries(adjustedForecast, "adjusted_forecast").values);
  const which = parseFvaMeasure(optionalWordArg(measure, "measure"));
  let p = periodArg(period);
  if (p === 0) p = Math.max(1, detectPeriod(a));
  const result = forecastValueAdded(a, m, f, which, p);
  return result.steps.map((s) => [s.step, optionalNumber(s.value, which), optionalNumber(s.overPrevious, "value added"), optionalNumber(s.overNaive, "value added")]);
}
