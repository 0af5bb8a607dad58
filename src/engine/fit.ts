import { nelderMead, type Minimum } from "./optimize/nelderMead";
import { RecursionWorkspace, sumSquaredErrors } from "./recursion";
import type { Constants, Seasonality, State, TrendKind } from "./types";

/** Which constants are free, and their fixed values otherwise. */
export interface ConstantChoice {
  alpha?: number;
  beta?: number;
  gamma?: number;
  phi?: number;
}

export const PHI_LOWER = 0.8;
export const PHI_UPPER = 0.98;

interface Axis {
  name: keyof Constants;
  lower: number;
  upper: number;
  grid: number[];
  /** Starting value of the usual quasi-Newton fit (alpha 0.3, beta 0.1, gamma 0.1). */
  usual: number;
}

/** The free smoothing constants of a model, each with its bounds. */
export function freeAxes(seasonality: Seasonality, trend: TrendKind, p: number, fixed: ConstantChoice): Axis[] {
  const axes: Axis[] = [];
  const unit = [0.1, 0.5, 0.9];
  if (fixed.alpha === undefined) axes.push({ name: "alpha", lower: 0, upper: 1, grid: unit, usual: 0.3 });
  if (trend !== "none" && fixed.beta === undefined) axes.push({ name: "beta", lower: 0, upper: 1, grid: unit, usual: 0.1 });
  if (seasonality !== "none" && p >= 2 && fixed.gamma === undefined) {
    axes.push({ name: "gamma", lower: 0, upper: 1, grid: unit, usual: 0.1 });
  }
  if (trend === "damped" && fixed.phi === undefined) {
    axes.push({ name: "phi", lower: PHI_LOWER, upper: PHI_UPPER, grid: [0.85, 0.95], usual: 0.9 });
  }
  return axes;
}

export function constantsFrom(axes: Axis[], x: ArrayLike<number>, fixed: ConstantChoice, trend: TrendKind): Constants {
  const c: Constants = {
    alpha: fixed.alpha ?? 0,
    beta: fixed.beta ?? 0,
    gamma: fixed.gamma ?? 0,
    phi: trend === "damped" ? (fixed.phi ?? 0.9) : 1,
  };
  axes.forEach((a, i) => (c[a.name] = x[i]));
  return c;
}

/**
 * Smoothing constants minimising the sum of squared one-step errors from a given start.
 * Search: every point of a coarse grid and the usual quasi-Newton starting point are
 * evaluated; bounded Nelder-Mead runs from the three best, then restarts from the best
 * with a small simplex until it no longer improves. Several starts guard against the local
 * stops a single-start method makes on flat surfaces; everything is deterministic.
 */
export function fitConstants(
  y: Float64Array,
  start: State,
  firstUpdate: number,
  p: number,
  seasonality: Seasonality,
  trend: TrendKind,
  fixed: ConstantChoice,
): { constants: Constants; sse: number } {
  const axes = freeAxes(seasonality, trend, p, fixed);
  const ws = new RecursionWorkspace(p);
  const objective = (x: ArrayLike<number>): number => {
    const c = constantsFrom(axes, x, fixed, trend);
    return sumSquaredErrors(y, start, firstUpdate, p, seasonality, trend, c.alpha, c.beta, c.gamma, c.phi, ws);
  };
  if (axes.length === 0) {
    const c = constantsFrom(axes, [], fixed, trend);
    return { constants: c, sse: objective([]) };
  }
  const best = minimiseOverBox(objective, axes);
  return { constants: constantsFrom(axes, best.x, fixed, trend), sse: best.fx };
}

/** Multi-start bounded Nelder-Mead over the axes' box. */
export function minimiseOverBox(objective: (x: ArrayLike<number>) => number, axes: Axis[]): Minimum {
  const d = axes.length;
  const lower = axes.map((a) => a.lower);
  const upper = axes.map((a) => a.upper);
  const candidates: { x: Float64Array; fx: number }[] = [];
  const usual = Float64Array.from(axes.map((a) => a.usual));
  candidates.push({ x: usual, fx: objective(usual) });
  const counter = new Array<number>(d).fill(0);
  for (;;) {
    const x = Float64Array.from(axes.map((a, i) => a.grid[counter[i]]));
    candidates.push({ x, fx: objective(x) });
    let i = 0;
    while (i < d && ++counter[i] === axes[i].grid.length) counter[i++] = 0;
    if (i === d) break;
  }
  candidates.sort((a, b) => a.fx - b.fx);
  const options = (step: number, tight: boolean) => ({
    step: axes.map((a) => step * (a.upper - a.lower)),
    lower,
    upper,
    maxEvals: 400 * d,
    fTol: tight ? 1e-11 : 1e-7,
    xTol: tight ? 1e-7 : 1e-3,
  });
  let best: Minimum = { x: candidates[0].x, fx: candidates[0].fx, evals: 0 };
  // A quick descent from the three best points finds the basin...
  for (const c of candidates.slice(0, 3)) {
    const m = nelderMead(objective, c.x, options(0.1, false));
    if (m.fx < best.fx) best = m;
  }
  // Polish the best with tight tolerances, restarting with a fresh small simplex: Nelder-Mead
  // can stall on a bound or a ridge.
  for (let r = 0; r < 6; r++) {
    const m = nelderMead(objective, best.x, options(r % 2 === 0 ? 0.02 : 0.002, true));
    const improved = m.fx < best.fx * (1 - 1e-13);
    if (m.fx < best.fx) best = m;
    if (!improved) break;
  }
  return best;
}
