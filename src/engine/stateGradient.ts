import type { Seasonality, State, TrendKind } from "./types";
import { isSeasonal } from "./shape";

/**
 * Sum of squared one-step errors over the whole history (updating from the first period)
 * with its exact gradient with respect to the four constants AND the initial state (level,
 * trend, the p indices), by forward-mode differentiation of the recursions. Used by the
 * `optimized` start. Parameter order of `grad`: alpha, beta, gamma, phi, level, trend,
 * index_0 .. index_{p-1}.
 */
export class StateGradientWorkspace {
  readonly m: number;
  readonly ring: Float64Array;
  readonly dRing: Float64Array;
  readonly dL: Float64Array;
  readonly dB: Float64Array;
  readonly db: Float64Array;
  readonly dn: Float64Array;
  constructor(readonly p: number) {
    const seasons = Math.max(1, p);
    this.m = 6 + (p >= 2 ? p : 0);
    this.ring = new Float64Array(seasons);
    this.dRing = new Float64Array(seasons * this.m);
    this.dL = new Float64Array(this.m);
    this.dB = new Float64Array(this.m);
    this.db = new Float64Array(this.m);
    this.dn = new Float64Array(this.m);
  }
}

export function sseWithStateGradient(
  y: Float64Array,
  p: number,
  seasonality: Seasonality,
  trendKind: TrendKind,
  theta: ArrayLike<number>,
  start: State,
  grad: Float64Array,
  ws: StateGradientWorkspace,
): number {
  const { m, ring, dRing, dL, dB, db, dn } = ws;
  const seasonal = isSeasonal(seasonality, p);
  const mult = seasonal && seasonality === "multiplicative";
  const period = seasonal ? p : 1;
  const hasTrend = trendKind !== "none";
  const damped = trendKind === "damped";
  const alpha = theta[0];
  const beta = hasTrend ? theta[1] : 0;
  const gamma = seasonal ? theta[2] : 0;
  const phi = damped ? theta[3] : 1;
  dRing.fill(0);
  dL.fill(0);
  dB.fill(0);
  grad.fill(0);
  dL[4] = 1;
  if (hasTrend) dB[5] = 1;
  ring[0] = 0;
  if (seasonal) {
    for (let k = 0; k < p; k++) {
      ring[k] = start.indices[k];
      dRing[k * m + 6 + k] = 1;
    }
  }
  let level = start.level;
  let trend = hasTrend ? start.trend : 0;
  let sse = 0;
  let pos = 0;
  for (let t = 0; t < y.length; t++) {
    const s = seasonal ? ring[pos] : 0;
    const o = pos * m;
    const base = level + phi * trend;
    for (let k = 0; k < m; k++) db[k] = dL[k] + phi * dB[k];
    if (damped) db[3] += trend;
    const yt = y[t];
    if (yt !== yt) {
      for (let k = 0; k < m; k++) {
        dL[k] = db[k];
        dB[k] *= phi;
      }
      if (damped) dB[3] += trend;
      level = base;
      trend *= phi;
    } else {
      const fc = mult ? base * s : base + s;
      const e = yt - fc;
      sse += e * e;
      let nl: number;
      if (mult) {
        const ys = yt / s;
        const c = (alpha * ys) / s;
        nl = alpha * ys + (1 - alpha) * base;
        for (let k = 0; k < m; k++) {
          const ds = dRing[o + k];
          grad[k] -= 2 * e * (db[k] * s + base * ds);
          dn[k] = -c * ds + (1 - alpha) * db[k];
        }
        dn[0] += ys - base;
        const yl = yt / nl;
        const c2 = (gamma * yl) / nl;
        for (let k = 0; k < m; k++) dRing[o + k] = -c2 * dn[k] + (1 - gamma) * dRing[o + k];
        dRing[o + 2] += yl - s;
        ring[pos] = gamma * yl + (1 - gamma) * s;
      } else {
        const ya = yt - s;
        nl = alpha * ya + (1 - alpha) * base;
        for (let k = 0; k < m; k++) {
          const ds = seasonal ? dRing[o + k] : 0;
          grad[k] -= 2 * e * (db[k] + ds);
          dn[k] = -alpha * ds + (1 - alpha) * db[k];
        }
        dn[0] += ya - base;
        if (seasonal) {
          for (let k = 0; k < m; k++) dRing[o + k] = -gamma * dn[k] + (1 - gamma) * dRing[o + k];
          dRing[o + 2] += yt - nl - s;
          ring[pos] = gamma * (yt - nl) + (1 - gamma) * s;
        }
      }
      if (hasTrend) {
        const rise = nl - level;
        for (let k = 0; k < m; k++) dB[k] = beta * (dn[k] - dL[k]) + (1 - beta) * phi * dB[k];
        dB[1] += rise - phi * trend;
        if (damped) dB[3] += (1 - beta) * trend;
        trend = beta * rise + (1 - beta) * phi * trend;
      }
      for (let k = 0; k < m; k++) dL[k] = dn[k];
      level = nl;
    }
    if (++pos === period) pos = 0;
  }
  if (!hasTrend) grad[1] = grad[5] = 0;
  if (!seasonal) grad[2] = 0;
  if (!damped) grad[3] = 0;
  let finite = Number.isFinite(sse) && Number.isFinite(level);
  for (let k = 0; k < m && finite; k++) finite = Number.isFinite(grad[k]);
  return finite ? sse : Infinity;
}
