import { GradientWorkspace, sseWithGradient } from "./gradient";
import { projectedBfgs, type Minimum } from "./optimize/projectedBfgs";
import { RecursionWorkspace, sumSquaredErrors } from "./recursion";
import type { Constants, Seasonality, State, TrendKind } from "./types";
import { isSeasonal } from "./shape";

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
  /** Position in (alpha, beta, gamma, phi). */
  slot: number;
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
  if (fixed.alpha === undefined) axes.push({ name: "alpha", slot: 0, lower: 0, upper: 1, grid: unit, usual: 0.3 });
  if (trend !== "none" && fixed.beta === undefined) axes.push({ name: "beta", slot: 1, lower: 0, upper: 1, grid: unit, usual: 0.1 });
  if (isSeasonal(seasonality, p) && fixed.gamma === undefined) {
    axes.push({ name: "gamma", slot: 2, lower: 0, upper: 1, grid: unit, usual: 0.1 });
  }
  if (trend === "damped" && fixed.phi === undefined) {
    axes.push({ name: "phi", slot: 3, lower: PHI_LOWER, upper: PHI_UPPER, grid: [0.85, 0.95], usual: 0.9 });
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
 * Search: a bounded quasi-Newton descent with exact gradients from the usual starting point
 * (alpha 0.3, beta 0.1, gamma 0.1) and from the best START_POINTS (5) points of a coarse grid; the best
 * result wins. Several starts guard against the local stops a single descent makes on the
 * flat, bounded surfaces these errors have; everything is deterministic.
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
  // (alpha, beta, gamma, phi) with the fixed values in place; each evaluation writes the free
  // ones into their slots, so no evaluation allocates.
  const base = constantsFrom(axes, axes.map((a) => a.usual), fixed, trend);
  const theta = Float64Array.of(base.alpha, base.beta, base.gamma, base.phi);
  const slots = Int32Array.from(axes, (a) => a.slot);
  const place = (x: ArrayLike<number>): void => {
    for (let i = 0; i < slots.length; i++) theta[slots[i]] = x[i];
  };
  const objective = (x: ArrayLike<number>): number => {
    place(x);
    return sumSquaredErrors(y, start, firstUpdate, p, seasonality, trend, theta[0], theta[1], theta[2], theta[3], ws);
  };
  if (axes.length === 0) {
    const c = constantsFrom(axes, [], fixed, trend);
    return { constants: c, sse: objective([]) };
  }
  const gws = new GradientWorkspace(p);
  const full = new Float64Array(4);
  const withGradient = (x: Float64Array, g: Float64Array): number => {
    place(x);
    const f = sseWithGradient(y, start, firstUpdate, p, seasonality, trend, theta, full, gws);
    for (let i = 0; i < slots.length; i++) g[i] = full[slots[i]];
    return f;
  };
  const best = minimiseWithGradient(objective, withGradient, axes);
  return { constants: constantsFrom(axes, best.x, fixed, trend), sse: best.fx };
}

/** Coarse grid over the box plus the usual starting point, best first. */
function gridCandidates(objective: (x: ArrayLike<number>) => number, axes: Axis[]): { x: Float64Array; fx: number; usual?: boolean }[] {
  const d = axes.length;
  const candidates: { x: Float64Array; fx: number; usual?: boolean }[] = [];
  const usual = Float64Array.from(axes.map((a) => a.usual));
  candidates.push({ x: usual, fx: objective(usual), usual: true });
  const counter = new Array<number>(d).fill(0);
  for (;;) {
    const x = Float64Array.from(axes.map((a, i) => a.grid[counter[i]]));
    candidates.push({ x, fx: objective(x) });
    let i = 0;
    while (i < d && ++counter[i] === axes[i].grid.length) counter[i++] = 0;
    if (i === d) break;
  }
  return candidates.sort((a, b) => a.fx - b.fx);
}

export function minimiseWithGradient(
  objective: (x: ArrayLike<number>) => number,
  withGradient: (x: Float64Array, g: Float64Array) => number,
  axes: Axis[],
): Minimum {
  const lower = axes.map((a) => a.lower);
  const upper = axes.map((a) => a.upper);
  const usual = Float64Array.from(axes.map((a) => a.usual));
  // The usual point competes among the grid's candidates; when it ranks, its descent is the one
  // already started (a second would retrace it step for step).
  const ranked = gridCandidates(objective, axes).slice(0, START_POINTS);
  const starts = [usual, ...ranked.filter((c) => !c.usual).map((c) => c.x)];
  const found: Minimum[] = [];
  // A descent that walks into the basin of an optimum already found is stopped early:
  // it would only find the same point again.
  const known = (x: Float64Array, f: number): boolean => {
    for (const m of found) {
      if (f < m.fx) continue;
      let near = true;
      for (let i = 0; i < x.length && near; i++) near = Math.abs(x[i] - m.x[i]) <= 0.01 * (upper[i] - lower[i]);
      if (near) return true;
    }
    return false;
  };
  for (const x0 of starts) found.push(projectedBfgs(withGradient, x0, { lower, upper, maxIter: 200, fTol: 1e-12, abandon: known, f: objective }));
  let best = found.reduce((a, b) => (b.fx < a.fx ? b : a));
  // Fresh descents from the best point (new curvature estimates) finish a stalled one in a
  // long, narrow valley; they stop as soon as one no longer helps.
  for (let k = 0; k < 4; k++) {
    const polished = projectedBfgs(withGradient, best.x, { lower, upper, maxIter: 200, fTol: 1e-13, f: objective });
    const gain = (best.fx - polished.fx) / Math.max(Math.abs(best.fx), 1e-300);
    if (polished.fx < best.fx) best = polished;
    if (!(gain > 1e-12)) break;
  }
  return best;
}

/** Grid points, besides the usual start, from which a descent is run. */
const START_POINTS = 5;
