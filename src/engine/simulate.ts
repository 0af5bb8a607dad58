import { seededNormal } from "./random";
import type { FittedModel } from "./types";

/** Fixed seed: simulated figures (intervals, lead-time variance) give the same digits every time. */
export const SIMULATION_SEED = 20260101;

/**
 * Seeded simulation of a multiplicative-seasonal model's future: every path runs the fitted
 * recursions from the final state, with Gaussian relative errors of standard deviation `sigma`. All paths advance one step at a time
 * and `visit(h, values)` sees the simulated actuals of step h (1-based) across all paths, so a
 * figure for a given step does not depend on how many steps were asked for. `values` is reused
 * between steps (copy what must be kept) and may hold non-finite values when a path breaks down:
 * the caller decides what that means for its figure.
 */
export function simulateFuture(
  model: FittedModel,
  sigma: number,
  horizon: number,
  paths: number,
  visit: (h: number, values: Float64Array) => void,
  seed = SIMULATION_SEED,
): void {
  const p = model.spec.period;
  const { alpha, beta, gamma } = model.constants;
  const trendKind = model.spec.trend;
  const ph = trendKind === "damped" ? model.constants.phi : 1;
  const draw = seededNormal(seed);
  const level = new Float64Array(paths).fill(model.final.level);
  const trend = new Float64Array(paths).fill(trendKind === "none" ? 0 : model.final.trend);
  const ring = new Float64Array(paths * p);
  for (let path = 0; path < paths; path++) ring.set(model.final.indices, path * p);
  const step = new Float64Array(paths);
  for (let h = 0; h < horizon; h++) {
    const pos = h % p;
    for (let path = 0; path < paths; path++) {
      const at = path * p + pos;
      const s = ring[at];
      const base = level[path] + ph * trend[path];
      const y = base * s * (1 + sigma * draw());
      const newLevel = alpha * (y / s) + (1 - alpha) * base;
      const newIndex = gamma * (y / newLevel) + (1 - gamma) * s;
      if (trendKind !== "none") trend[path] = beta * (newLevel - level[path]) + (1 - beta) * ph * trend[path];
      level[path] = newLevel;
      ring[at] = Number.isFinite(newIndex) ? newIndex : s;
      step[path] = y;
    }
    visit(h + 1, step);
  }
}
