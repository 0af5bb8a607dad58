import type { Seasonality, State, TrendKind } from "./types";
import { isSeasonal } from "./shape";

/**
 * Sum of squared one-step errors and its exact gradient with respect to
 * (alpha, beta, gamma, phi), by forward-mode differentiation of the recursions in
 * recursion.ts: every state value carries its four partial derivatives through each update.
 * Used by the bounded quasi-Newton fit; the start state does not depend on the constants.
 * `grad` receives the four partials (those of constants a model does not use are 0).
 */
export class GradientWorkspace {
  ring: Float64Array;
  dRing: Float64Array;
  constructor(p: number) {
    this.ring = new Float64Array(Math.max(1, p));
    this.dRing = new Float64Array(4 * Math.max(1, p));
  }
}

export function sseWithGradient(
  y: Float64Array,
  start: State,
  firstUpdate: number,
  p: number,
  seasonality: Seasonality,
  trendKind: TrendKind,
  theta: ArrayLike<number>,
  grad: Float64Array,
  ws: GradientWorkspace,
): number {
  const mult = seasonality === "multiplicative" && p >= 2;
  const seasonal = isSeasonal(seasonality, p);
  const period = seasonal ? p : 1;
  const ring = ws.ring;
  const dRing = ws.dRing;
  dRing.fill(0);
  if (seasonal) for (let k = 0; k < p; k++) ring[(firstUpdate + k) % p] = start.indices[k];
  else ring[0] = 0;
  const hasTrend = trendKind !== "none";
  const damped = trendKind === "damped";
  const alpha = theta[0];
  const beta = hasTrend ? theta[1] : 0;
  const gamma = seasonal ? theta[2] : 0;
  const phi = damped ? theta[3] : 1;
  let level = start.level;
  let trend = hasTrend ? start.trend : 0;
  // partials of level and trend: index 0 alpha, 1 beta, 2 gamma, 3 phi
  let dL0 = 0, dL1 = 0, dL2 = 0, dL3 = 0;
  let dB0 = 0, dB1 = 0, dB2 = 0, dB3 = 0;
  let sse = 0;
  let g0 = 0, g1 = 0, g2 = 0, g3 = 0;
  let pos = firstUpdate % period;
  for (let t = firstUpdate; t < y.length; t++) {
    const s = seasonal ? ring[pos] : 0;
    const o = 4 * pos;
    const ds0 = dRing[o], ds1 = dRing[o + 1], ds2 = dRing[o + 2], ds3 = dRing[o + 3];
    const base = level + phi * trend;
    const db0 = dL0 + phi * dB0;
    const db1 = dL1 + phi * dB1;
    const db2 = dL2 + phi * dB2;
    // the phi partials stay 0 without a damped trend: skip their arithmetic
    const db3 = damped ? dL3 + phi * dB3 + trend : 0;
    const yt = y[t];
    if (yt !== yt) {
      level = base;
      dL0 = db0; dL1 = db1; dL2 = db2; dL3 = db3;
      dB0 = phi * dB0; dB1 = phi * dB1; dB2 = phi * dB2;
      if (damped) dB3 = phi * dB3 + trend;
      trend = phi * trend;
    } else {
      let fc: number, df0: number, df1: number, df2: number, df3: number;
      let nl: number, dn0: number, dn1: number, dn2: number, dn3: number;
      if (mult) {
        fc = base * s;
        df0 = db0 * s + base * ds0; df1 = db1 * s + base * ds1; df2 = db2 * s + base * ds2; df3 = damped ? db3 * s + base * ds3 : 0;
        const ys = yt / s;
        const ys2 = (alpha * ys) / s;
        nl = alpha * ys + (1 - alpha) * base;
        dn0 = ys - base - ys2 * ds0 + (1 - alpha) * db0;
        dn1 = -ys2 * ds1 + (1 - alpha) * db1;
        dn2 = -ys2 * ds2 + (1 - alpha) * db2;
        dn3 = damped ? -ys2 * ds3 + (1 - alpha) * db3 : 0;
        const yl = yt / nl;
        const yl2 = (gamma * yl) / nl;
        ring[pos] = gamma * yl + (1 - gamma) * s;
        dRing[o] = -yl2 * dn0 + (1 - gamma) * ds0;
        dRing[o + 1] = -yl2 * dn1 + (1 - gamma) * ds1;
        dRing[o + 2] = yl - s - yl2 * dn2 + (1 - gamma) * ds2;
        if (damped) dRing[o + 3] = -yl2 * dn3 + (1 - gamma) * ds3;
      } else {
        fc = base + s;
        df0 = db0 + ds0; df1 = db1 + ds1; df2 = db2 + ds2; df3 = damped ? db3 + ds3 : 0;
        const ya = yt - s;
        nl = alpha * ya + (1 - alpha) * base;
        dn0 = ya - base - alpha * ds0 + (1 - alpha) * db0;
        dn1 = -alpha * ds1 + (1 - alpha) * db1;
        dn2 = -alpha * ds2 + (1 - alpha) * db2;
        dn3 = damped ? -alpha * ds3 + (1 - alpha) * db3 : 0;
        if (seasonal) {
          ring[pos] = gamma * (yt - nl) + (1 - gamma) * s;
          dRing[o] = -gamma * dn0 + (1 - gamma) * ds0;
          dRing[o + 1] = -gamma * dn1 + (1 - gamma) * ds1;
          dRing[o + 2] = yt - nl - s - gamma * dn2 + (1 - gamma) * ds2;
          if (damped) dRing[o + 3] = -gamma * dn3 + (1 - gamma) * ds3;
        }
      }
      const e = yt - fc;
      sse += e * e;
      g0 -= 2 * e * df0; g1 -= 2 * e * df1; g2 -= 2 * e * df2;
      if (damped) g3 -= 2 * e * df3;
      if (hasTrend) {
        const rise = nl - level;
        const nb = beta * rise + (1 - beta) * phi * trend;
        const nb0 = beta * (dn0 - dL0) + (1 - beta) * phi * dB0;
        const nb1 = rise - phi * trend + beta * (dn1 - dL1) + (1 - beta) * phi * dB1;
        const nb2 = beta * (dn2 - dL2) + (1 - beta) * phi * dB2;
        const nb3 = damped ? beta * (dn3 - dL3) + (1 - beta) * (phi * dB3 + trend) : 0;
        trend = nb;
        dB0 = nb0; dB1 = nb1; dB2 = nb2; dB3 = nb3;
      }
      level = nl;
      dL0 = dn0; dL1 = dn1; dL2 = dn2; dL3 = dn3;
    }
    if (++pos === period) pos = 0;
  }
  grad[0] = g0;
  grad[1] = hasTrend ? g1 : 0;
  grad[2] = seasonal ? g2 : 0;
  grad[3] = damped ? g3 : 0;
  const ok = sse === sse && sse !== Infinity && level === level && Math.abs(level) !== Infinity;
  return ok && Number.isFinite(g0 + g1 + g2 + g3) ? sse : Infinity;
}
