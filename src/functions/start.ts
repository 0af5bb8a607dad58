/**
 * EBB.PERIOD, EBB.INDICES and EBB.INIT: what the history says before any smoothing
 * (season length, classical seasonal indices, the start state).
 */
import {
  badInput,
  classicalIndices,
  cleanHistory,
  countPresent,
  decompositionStart,
  EbbError,
  isSeasonal,
  requirePositive,
  resolvePeriod,
} from "../engine";
import { fixedSeasonalityArg, periodArg } from "./arguments";
import { type Block, column, finiteNumber } from "./cells";
import { optionalNumberArg, readSeries, type SeriesInput } from "./coerce";
import { eachSeries } from "./series";

function historyOf(s: SeriesInput): Float64Array {
  const y = cleanHistory(s.values);
  if (countPresent(y) === 0) {
    throw new EbbError("na", "no-history", `The ${s.label} range has no values yet. Type some actuals, oldest first.`);
  }
  return y;
}

/** The season length to use: the typed one, or the detected one (the engine must call it seasonal). */
function seasonLength(y: Float64Array, typed: number, label: string, kind: "multiplicative" | "additive"): number {
  const p = resolvePeriod(y, typed);
  if (isSeasonal(kind, p)) return p;
  if (typed === 0) {
    throw badInput(
      "no-season-found",
      `No season length was found in ${label} (finding one needs at least 3 full seasons of history with a clear pattern). Type the season length, for example 12 for monthly data.`,
    );
  }
  throw badInput("period-too-short", `Seasonal indices need a season length of 2 or more; got ${p}.`);
}

/** EBB.PERIOD: the detected season length of each series (1 when none is found). */
export function periodFn(history: unknown): Block {
  return eachSeries(readSeries(history, "history"), 1, (s) => [[resolvePeriod(historyOf(s), 0)]]);
}

/** EBB.INDICES: classical-decomposition seasonal indices over all full seasons, position 1 = first row. */
export function indicesFn(history: unknown, period: unknown, seasonality: unknown): Block {
  const typed = periodArg(period);
  const kind = fixedSeasonalityArg(seasonality);
  return eachSeries(readSeries(history, "history"), 1, (s) => {
    const y = historyOf(s);
    const p = seasonLength(y, typed, s.label, kind);
    const full = y.subarray(0, Math.floor(y.length / p) * p);
    if (kind === "multiplicative") requirePositive(full);
    const indices = classicalIndices(full.length >= 2 * p ? full : y, p, kind).normal;
    return column(Array.from(indices, (v) => finiteNumber(v, "seasonal index")));
  });
}

/** EBB.INIT: start level, start trend and the p start indices of the decomposition start. */
export function initFn(history: unknown, period: unknown, seasonality: unknown, cycles: unknown): Block {
  const typed = periodArg(period);
  const kind = fixedSeasonalityArg(seasonality);
  const seasons = optionalNumberArg(cycles, "cycles") ?? 2;
  return eachSeries(readSeries(history, "history"), 1, (s) => {
    const y = historyOf(s);
    const p = seasonLength(y, typed, s.label, kind);
    if (kind === "multiplicative") requirePositive(y.subarray(0, Math.min(y.length, seasons * p)));
    const start = decompositionStart(y, p, kind, "linear", seasons);
    const { level, trend, indices } = start.state;
    return column([
      finiteNumber(level, "start level"),
      finiteNumber(trend, "start trend"),
      ...Array.from(indices, (v) => finiteNumber(v, "start index")),
    ]);
  });
}
