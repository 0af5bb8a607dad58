import { badInput } from "./errors";
import type { Constants, Seasonality, State, StateTable, TrendKind } from "./types";

/**
 * The Holt (1957) / Winters (1960) recursions with the seasonal update on the new level and
 * the damped trend of Gardner & McKenzie (1985):
 *   level_t = alpha*(y_t / s) + (1-alpha)*(level + phi*trend)      (s = index one season back)
 *   trend_t = beta*(level_t - level) + (1-beta)*phi*trend
 *   index_t = gamma*(y_t / level_t) + (1-gamma)*s
 * Additive seasonality uses differences instead of ratios. A missing actual skips the
 * update: the state carries forward on its own forecast and the index stays as it was.
 */

const MULT = 0;
const ADD = 1;
const NONE = 2;

function seasonCode(s: Seasonality, p: number): number {
  if (s === "none" || p < 2) return NONE;
  return s === "multiplicative" ? MULT : ADD;
}

/** Reusable scratch buffer for the seasonal ring, so fitting allocates nothing per call. */
export class RecursionWorkspace {
  ring: Float64Array;
  constructor(p: number) {
    this.ring = new Float64Array(Math.max(1, p));
  }
}

/**
 * Sum of squared one-step errors from `firstUpdate` on. Allocation-free inner loop; returns
 * Infinity when the state breaks down (a level or index reaching a non-finite value), which
 * the fitter treats as a bad point.
 */
export function sumSquaredErrors(
  y: Float64Array,
  start: State,
  firstUpdate: number,
  p: number,
  seasonality: Seasonality,
  trendKind: TrendKind,
  alpha: number,
  beta: number,
  gamma: number,
  phi: number,
  ws: RecursionWorkspace,
): number {
  const code = seasonCode(seasonality, p);
  const ring = ws.ring;
  const period = code === NONE ? 1 : p;
  if (code !== NONE) for (let k = 0; k < p; k++) ring[(firstUpdate + k) % p] = start.indices[k];
  const hasTrend = trendKind !== "none";
  const ph = trendKind === "damped" ? phi : 1;
  const b1 = hasTrend ? beta : 0;
  const a1 = 1 - alpha;
  const g1 = 1 - gamma;
  const bc = (1 - b1) * ph;
  let level = start.level;
  let trend = hasTrend ? start.trend : 0;
  let sse = 0;
  const n = y.length;
  // One loop per seasonality, with the season position kept as a counter (no modulo per period).
  let pos = firstUpdate % period;
  if (code === MULT) {
    for (let t = firstUpdate; t < n; t++) {
      const s = ring[pos];
      const base = level + ph * trend;
      const yt = y[t];
      if (yt === yt) {
        const e = yt - base * s;
        sse += e * e;
        const nl = (alpha * yt) / s + a1 * base;
        ring[pos] = (gamma * yt) / nl + g1 * s;
        trend = b1 * (nl - level) + bc * trend;
        level = nl;
      } else {
        level = base;
        trend = ph * trend;
      }
      if (++pos === period) pos = 0;
    }
  } else if (code === ADD) {
    for (let t = firstUpdate; t < n; t++) {
      const s = ring[pos];
      const base = level + ph * trend;
      const yt = y[t];
      if (yt === yt) {
        const e = yt - base - s;
        sse += e * e;
        const nl = alpha * (yt - s) + a1 * base;
        ring[pos] = gamma * (yt - nl) + g1 * s;
        trend = b1 * (nl - level) + bc * trend;
        level = nl;
      } else {
        level = base;
        trend = ph * trend;
      }
      if (++pos === period) pos = 0;
    }
  } else {
    for (let t = firstUpdate; t < n; t++) {
      const base = level + ph * trend;
      const yt = y[t];
      if (yt === yt) {
        const e = yt - base;
        sse += e * e;
        const nl = alpha * yt + a1 * base;
        trend = b1 * (nl - level) + bc * trend;
        level = nl;
      } else {
        level = base;
        trend = ph * trend;
      }
    }
  }
  return sse === sse && sse !== Infinity && level === level && Math.abs(level) !== Infinity ? sse : Infinity;
}

export interface RunResult {
  table: StateTable;
  final: State;
  sse: number;
  errorCount: number;
  /** Sum of squared relative errors (error / forecast), used by the multiplicative interval. */
  relativeSse: number;
}

/**
 * Full run with the state table (values after each update; forecast made before it).
 * Throws a #VALUE!-class error when the state breaks down (e.g. a multiplicative level
 * reaching zero), with advice, rather than letting NaN or Infinity reach a cell.
 */
export function runRecursion(
  y: Float64Array,
  start: State,
  firstUpdate: number,
  p: number,
  seasonality: Seasonality,
  trendKind: TrendKind,
  c: Constants,
): RunResult {
  const n = y.length;
  const code = seasonCode(seasonality, p);
  const period = code === NONE ? 1 : p;
  const ring = new Float64Array(period);
  if (code !== NONE) for (let k = 0; k < p; k++) ring[(firstUpdate + k) % p] = start.indices[k];
  const hasTrend = trendKind !== "none";
  const ph = trendKind === "damped" ? c.phi : 1;
  const { alpha, beta, gamma } = c;
  const table: StateTable = {
    level: new Float64Array(n).fill(NaN),
    trend: new Float64Array(n).fill(NaN),
    index: new Float64Array(n).fill(NaN),
    forecast: new Float64Array(n).fill(NaN),
    error: new Float64Array(n).fill(NaN),
  };
  let level = start.level;
  let trend = hasTrend ? start.trend : 0;
  let sse = 0;
  let rel = 0;
  let count = 0;
  for (let t = firstUpdate; t < n; t++) {
    const pos = t % period;
    const s = code === NONE ? 0 : ring[pos];
    const base = level + ph * trend;
    const fc = code === MULT ? base * s : code === ADD ? base + s : base;
    table.forecast[t] = fc;
    const yt = y[t];
    if (Number.isNaN(yt)) {
      level = base;
      trend = ph * trend;
    } else {
      const e = yt - fc;
      table.error[t] = e;
      sse += e * e;
      rel += fc !== 0 ? (e / fc) * (e / fc) : 0;
      count++;
      let newLevel: number;
      if (code === MULT) {
        newLevel = alpha * (yt / s) + (1 - alpha) * base;
        ring[pos] = gamma * (yt / newLevel) + (1 - gamma) * s;
      } else if (code === ADD) {
        newLevel = alpha * (yt - s) + (1 - alpha) * base;
        ring[pos] = gamma * (yt - newLevel) + (1 - gamma) * s;
      } else {
        newLevel = alpha * yt + (1 - alpha) * base;
      }
      if (hasTrend) trend = beta * (newLevel - level) + (1 - beta) * ph * trend;
      level = newLevel;
    }
    table.level[t] = level;
    table.trend[t] = trend;
    table.index[t] = code === NONE ? NaN : ring[pos];
    if (!Number.isFinite(level) || !Number.isFinite(trend) || (code !== NONE && !Number.isFinite(ring[pos]))) {
      throw badInput(
        "state-breakdown",
        `The model broke down at period ${t + 1} (the level or an index is no longer a finite number). Use additive seasonality or smaller smoothing constants.`,
      );
    }
  }
  const indices = new Float64Array(code === NONE ? 0 : p);
  if (code !== NONE) for (let k = 0; k < p; k++) indices[k] = ring[(n + k) % p];
  return { table, final: { level, trend, indices }, sse, errorCount: count, relativeSse: rel };
}

/**
 * Trend multipliers phi + phi^2 + ... + phi^h for h = 1..horizon (h for an undamped trend,
 * 0 without a trend): how many periods of trend a forecast h steps ahead carries
 * (Gardner & McKenzie 1985).
 */
export function trendMultipliers(trendKind: TrendKind, phi: number, horizon: number): Float64Array {
  const out = new Float64Array(horizon);
  if (trendKind === "none") return out;
  const ph = trendKind === "damped" ? phi : 1;
  let sum = 0;
  let power = 1;
  for (let h = 1; h <= horizon; h++) {
    power *= ph;
    sum += power;
    out[h - 1] = sum;
  }
  return out;
}

/**
 * Point forecasts h = 1..horizon from a state:
 * (level + (phi + ... + phi^h) * trend) combined with the index for that period.
 */
export function projectState(
  state: State,
  horizon: number,
  p: number,
  seasonality: Seasonality,
  trendKind: TrendKind,
  phi: number,
): Float64Array {
  const code = seasonCode(seasonality, p);
  const out = new Float64Array(horizon);
  const multipliers = trendMultipliers(trendKind, phi, horizon);
  for (let h = 1; h <= horizon; h++) {
    const base = state.level + multipliers[h - 1] * state.trend;
    const s = code === NONE ? 0 : state.indices[(h - 1) % p];
    out[h - 1] = code === MULT ? base * s : code === ADD ? base + s : base;
  }
  return out;
}
