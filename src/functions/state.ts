/**
 * EBB.STEP and EBB.PROJECT: one update of a state, and the forecasts from a state. They let a
 * planner build the recursion cell by cell and check every number.
 */
import { badInput, projectState, runRecursion, type State } from "../engine";
import { constantArg, fixedSeasonalityArg, horizonArg, requiredConstantArg } from "./arguments";
import { type Block, column, finiteNumber, optionalNumber } from "./cells";
import { optionalNumberArg, readOneSeries, requiredNumberArg } from "./coerce";

function positiveForMultiplicative(kind: string, value: number, what: string): void {
  if (kind === "multiplicative" && !(value > 0)) {
    throw badInput(
      "non-positive",
      `The ${what} is ${value}: multiplicative seasonality needs it above 0. Use additive seasonality, or correct the value.`,
    );
  }
}

/**
 * EBB.STEP: one period of the Holt-Winters recursions. A blank actual skips the update: the
 * state carries forward on its own forecast and the index stays, as in EBB.STATES.
 */
export function stepFn(
  level: unknown,
  trend: unknown,
  index: unknown,
  actual: unknown,
  alpha: unknown,
  beta: unknown,
  gamma: unknown,
  seasonality: unknown,
  phi: unknown,
): Block {
  const l = requiredNumberArg(level, "level", "Point it at the level of the period before (or the start level from EBB.INIT).");
  const b = requiredNumberArg(trend, "trend", "Point it at the trend of the period before (0 for no trend).");
  const s = requiredNumberArg(index, "index", "Point it at the seasonal index of the same season one season back.");
  const y = optionalNumberArg(actual, "actual");
  const a = requiredConstantArg(alpha, "alpha");
  const be = requiredConstantArg(beta, "beta");
  const g = requiredConstantArg(gamma, "gamma");
  const kind = fixedSeasonalityArg(seasonality);
  const damping = constantArg(phi, "phi") ?? 1;
  positiveForMultiplicative(kind, s, "index");
  if (y !== undefined) positiveForMultiplicative(kind, y, "actual");
  // A one-period run of the engine's recursion. The season ring needs p >= 2, so the index is
  // given twice; only the first copy serves this period.
  const start: State = { level: l, trend: b, indices: Float64Array.of(s, s) };
  const run = runRecursion(Float64Array.of(y ?? NaN), start, 0, 2, kind, "damped", { alpha: a, beta: be, gamma: g, phi: damping });
  const t = run.table;
  return [
    [
      finiteNumber(t.level[0], "new level"),
      finiteNumber(t.trend[0], "new trend"),
      finiteNumber(t.index[0], "new index"),
      finiteNumber(t.forecast[0], "forecast"),
      optionalNumber(t.error[0], "error"),
    ],
  ];
}

/** EBB.PROJECT: forecasts 1..horizon periods ahead of a state whose last p indices are given oldest first. */
export function projectFn(level: unknown, trend: unknown, indices: unknown, horizon: unknown, seasonality: unknown, phi: unknown): Block {
  const l = requiredNumberArg(level, "level", "Point it at the last level (for example the last row of EBB.STATES).");
  const b = requiredNumberArg(trend, "trend", "Point it at the last trend (0 for no trend).");
  const series = readOneSeries(indices, "indices");
  const h = horizonArg(horizon);
  const kind = fixedSeasonalityArg(seasonality);
  const damping = constantArg(phi, "phi") ?? 1;
  series.values.forEach((v, i) => {
    if (v === null) throw badInput("blank-index", `Cell ${i + 1} of indices is blank. Give all of the last p seasonal indices, oldest first.`);
    positiveForMultiplicative(kind, v, `index in cell ${i + 1} of indices`);
  });
  const values = series.values as number[];
  // One index is a season of length 1: the ring needs p >= 2, so it is given twice.
  const ring = Float64Array.from(values.length === 1 ? [values[0], values[0]] : values);
  const forecasts = projectState({ level: l, trend: b, indices: ring }, h, ring.length, kind, "damped", damping);
  return column(Array.from(forecasts, (v) => finiteNumber(v, "forecast")));
}
