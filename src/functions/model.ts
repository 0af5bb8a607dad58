/**
 * EBB.FIT, EBB.STATES, EBB.FITTED, EBB.AHEAD, EBB.BAND and EBB.BACKTEST: the functions that fit
 * a model to each series of a history and report on it.
 */
import { forecastModel, modelStates, predictionInterval, rollingBacktest, type FittedModel, type ModelOptions } from "../engine";
import { coverageArg, horizonArg, modelOptionsArg } from "./arguments";
import { type Block, column, finiteNumber, optionalNumber } from "./cells";
import { optionalNumberArg, readSeries, type SeriesInput } from "./coerce";
import { cachedDerived, cachedFit } from "./modelCache";
import { eachSeries } from "./series";

/** The fit of one series, shared through the model cache by every function over the same values. */
function fit(s: SeriesInput, options: ModelOptions): FittedModel {
  return cachedFit(s.values, options);
}

/** EBB.FIT: per series the seasonality and trend used, alpha, beta, gamma, phi, SSE, RMSE, AICc. */
export function fitFn(history: unknown, period: unknown, seasonality: unknown, trend: unknown, start: unknown): Block {
  const options = modelOptionsArg({ period, seasonality, trend, start });
  return eachSeries(readSeries(history, "history"), 1, (s) => {
    const m = fit(s, options);
    const { seasonal, hasTrend: trended } = m.shape;
    return column([
      m.spec.seasonality,
      m.spec.trend,
      finiteNumber(m.constants.alpha, "alpha"),
      trended ? finiteNumber(m.constants.beta, "beta") : null,
      seasonal ? finiteNumber(m.constants.gamma, "gamma") : null,
      trended ? finiteNumber(m.constants.phi, "phi") : null,
      finiteNumber(m.sse, "sum of squared errors"),
      optionalNumber(m.rmse, "RMSE"),
      optionalNumber(m.aicc, "AICc"),
    ]);
  });
}

interface StatesArgs {
  history: unknown;
  period: unknown;
  alpha: unknown;
  beta: unknown;
  gamma: unknown;
  seasonality: unknown;
  trend: unknown;
  phi: unknown;
  start: unknown;
}

function statesBlock(a: StatesArgs, width: number, row: (t: ReturnType<typeof modelStates>, i: number) => Block[number]): Block {
  const options = modelOptionsArg(a);
  return eachSeries(readSeries(a.history, "history"), width, (s) => {
    const table = cachedDerived(s.values, options, "states", modelStates, (t) => 5 * t.level.length);
    return Array.from({ length: table.level.length }, (_, i) => row(table, i));
  });
}

/** EBB.STATES: level, trend, index, one-step forecast and error per period (blank in the start window). */
export function statesFn(
  history: unknown,
  period: unknown,
  alpha: unknown,
  beta: unknown,
  gamma: unknown,
  seasonality: unknown,
  trend: unknown,
  phi: unknown,
  start: unknown,
): Block {
  return statesBlock({ history, period, alpha, beta, gamma, seasonality, trend, phi, start }, 5, (t, i) => [
    optionalNumber(t.level[i], "level"),
    optionalNumber(t.trend[i], "trend"),
    optionalNumber(t.index[i], "seasonal index"),
    optionalNumber(t.forecast[i], "forecast"),
    optionalNumber(t.error[i], "error"),
  ]);
}

/** EBB.FITTED: the one-step forecasts, aligned with the history. */
export function fittedFn(
  history: unknown,
  period: unknown,
  alpha: unknown,
  beta: unknown,
  gamma: unknown,
  seasonality: unknown,
  trend: unknown,
  phi: unknown,
  start: unknown,
): Block {
  return statesBlock({ history, period, alpha, beta, gamma, seasonality, trend, phi, start }, 1, (t, i) => [
    optionalNumber(t.forecast[i], "forecast"),
  ]);
}

/** EBB.AHEAD: forecasts for the next `horizon` periods, one column per series. */
export function aheadFn(
  history: unknown,
  period: unknown,
  horizon: unknown,
  seasonality: unknown,
  trend: unknown,
  alpha: unknown,
  beta: unknown,
  gamma: unknown,
  phi: unknown,
): Block {
  const options = modelOptionsArg({ period, seasonality, trend, alpha, beta, gamma, phi });
  const h = horizonArg(horizon);
  return eachSeries(readSeries(history, "history"), 1, (s) =>
    column(Array.from(forecastModel(fit(s, options), h), (v) => finiteNumber(v, "forecast"))),
  );
}

/** EBB.BAND: low and high ends of the prediction interval, two columns per series. */
export function bandFn(history: unknown, period: unknown, horizon: unknown, coverage: unknown, seasonality: unknown, trend: unknown): Block {
  const options = modelOptionsArg({ period, seasonality, trend });
  const h = horizonArg(horizon);
  const c = coverageArg(coverage);
  return eachSeries(readSeries(history, "history"), 2, (s) => {
    const band = cachedDerived(s.values, options, `band|${h}|${c}`, (m) => predictionInterval(m, h, c), () => 3 * h);
    return Array.from({ length: h }, (_, i) => [finiteNumber(band.low[i], "interval low"), finiteNumber(band.high[i], "interval high")]);
  });
}

/** EBB.BACKTEST: rolling-origin MAD, MAPE, MASE and origin count per step ahead, four columns per series. */
export function backtestFn(history: unknown, period: unknown, horizon: unknown, origins: unknown, seasonality: unknown, trend: unknown): Block {
  const options = modelOptionsArg({ period, seasonality, trend });
  const h = horizonArg(horizon);
  const count = optionalNumberArg(origins, "origins") ?? 12;
  return eachSeries(readSeries(history, "history"), 4, (s) =>
    rollingBacktest(s.values, options, h, count).map((r) => [
      optionalNumber(r.mad, "MAD"),
      optionalNumber(r.mape, "MAPE"),
      optionalNumber(r.mase, "MASE"),
      r.origins,
    ]),
  );
}
