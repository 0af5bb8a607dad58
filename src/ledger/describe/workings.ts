/**
 * Bookkeeping figures the ledger shows as intermediate steps and the engine does not expose:
 * seasonally adjusted actuals, running sums of errors, the trend multipliers and the
 * variance weights of the additive interval. Each is one line of arithmetic on engine
 * outputs, kept here so the expected (cached) value of every formula cell is known.
 * The interval weights follow the engine's own definition (src/engine/intervals.ts).
 */
import type { EngineFigures } from "./engineFigures";

/** Actual divided by (or minus) the start index of its position; null for a missing actual. */
export function seasonallyAdjusted(f: EngineFigures): (number | null)[] {
  const idx = f.model.start.detail!.normalIndices;
  const out: (number | null)[] = [];
  for (let t = 0; t < f.window; t++) {
    const v = f.y[t];
    if (Number.isNaN(v)) out.push(null);
    else if (!f.seasonal) out.push(v);
    else out.push(f.mult ? v / idx[t % f.p] : v - idx[t % f.p]);
  }
  return out;
}

/** Running sum of the one-step errors over the update window (missing errors add nothing). */
export function runningErrorSums(f: EngineFigures): number[] {
  const out: number[] = [];
  let s = 0;
  for (let t = f.firstUpdate; t < f.y.length; t++) {
    const e = f.states.error[t];
    if (!Number.isNaN(e)) s += e;
    out.push(s);
  }
  return out;
}

/** phi + phi^2 + ... + phi^h for h = 1..horizon (h for an undamped trend, whose phi is 1). */
export function trendMultipliers(phi: number, horizon: number): number[] {
  const out: number[] = [];
  let sum = 0;
  for (let h = 1; h <= horizon; h++) {
    sum += Math.pow(phi, h);
    out.push(sum);
  }
  return out;
}

/**
 * Additive interval: weight c_j for j = h-1 (0 for h = 1) and the running sum of squared
 * weights, as in Hyndman, Koehler, Ord & Snyder (2008), ch. 6, with the engine's mapping
 * beta* = alpha*beta, gamma* = gamma*(1-alpha).
 */
export function spreadWeights(f: EngineFigures, horizon: number): { weight: number[]; sumSquares: number[] } {
  const { alpha, beta, gamma, phi } = f.model.constants;
  const hasTrend = f.model.spec.trend !== "none";
  const multipliers = trendMultipliers(phi, horizon);
  const weight: number[] = [];
  const sumSquares: number[] = [];
  let sum = 0;
  for (let h = 1; h <= horizon; h++) {
    if (h === 1) {
      weight.push(0);
    } else {
      const j = h - 1;
      let c = alpha;
      if (hasTrend) c += alpha * beta * multipliers[j - 1];
      if (f.seasonal && j % f.p === 0) c += gamma * (1 - alpha);
      weight.push(c);
      sum += c * c;
    }
    sumSquares.push(sum);
  }
  return { weight, sumSquares };
}
