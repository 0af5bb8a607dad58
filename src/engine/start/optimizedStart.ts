import { constantsFrom, freeAxes, type ConstantChoice } from "../fit";
import { nelderMead, type Minimum } from "../optimize/nelderMead";
import { RecursionWorkspace, sumSquaredErrors } from "../recursion";
import type { Constants, Seasonality, Start, State, TrendKind } from "../types";
import { decompositionStart } from "./decompositionStart";

/**
 * The `optimized` start: initial level, trend and indices estimated together with the
 * smoothing constants by minimising the sum of squared one-step errors over the whole
 * history (state-space style, Hyndman, Koehler, Ord & Snyder 2008, ch. 2.6). The search
 * begins from the decomposition start moved back to before the first period; indices are
 * kept normalised (mean 1 or sum 0), so p-1 of them are free.
 */
export function optimizedStart(
  y: Float64Array,
  p: number,
  seasonality: Seasonality,
  trend: TrendKind,
  cycles: number,
  fixed: ConstantChoice,
  guess: Constants,
): { start: Start; constants: Constants; sse: number } {
  const seed = decompositionStart(y, p, seasonality, trend, cycles);
  const seasonal = seasonality !== "none" && p >= 2;
  const mult = seasonality === "multiplicative";
  const slope = seed.detail ? seed.detail.slope : seed.state.trend;
  const intercept = seed.detail ? seed.detail.intercept : seed.state.level;
  const axes = freeAxes(seasonality, trend, p, fixed);
  const nc = axes.length;
  const hasTrend = trend !== "none";
  const ni = seasonal ? p - 1 : 0;
  const dim = nc + 1 + (hasTrend ? 1 : 0) + ni;
  const scale = Math.max(Math.abs(intercept), Math.abs(slope) * y.length, 1e-9);

  const state: State = { level: 0, trend: 0, indices: new Float64Array(seasonal ? p : 0) };
  const unpack = (x: ArrayLike<number>): void => {
    state.level = x[nc];
    state.trend = hasTrend ? x[nc + 1] : 0;
    if (seasonal) {
      let sum = 0;
      for (let k = 0; k < ni; k++) {
        state.indices[k] = x[nc + 1 + (hasTrend ? 1 : 0) + k];
        sum += state.indices[k];
      }
      state.indices[p - 1] = mult ? p - sum : -sum;
    }
  };
  const ws = new RecursionWorkspace(p);
  const objective = (x: Float64Array): number => {
    unpack(x);
    if (mult) for (let k = 0; k < p; k++) if (!(state.indices[k] > 0)) return Infinity;
    const c = constantsFrom(axes, x, fixed, trend);
    return sumSquaredErrors(y, state, 0, p, seasonality, trend, c.alpha, c.beta, c.gamma, c.phi, ws);
  };
  const x0 = new Float64Array(dim);
  axes.forEach((a, i) => (x0[i] = Math.min(a.upper, Math.max(a.lower, guess[a.name]))));
  x0[nc] = intercept; // line value at period 0, i.e. just before the first period
  if (hasTrend) x0[nc + 1] = slope;
  for (let k = 0; k < ni; k++) x0[nc + 1 + (hasTrend ? 1 : 0) + k] = seed.detail!.normalIndices[k];
  const lower = new Float64Array(dim).fill(-Infinity);
  const upper = new Float64Array(dim).fill(Infinity);
  const step = new Float64Array(dim);
  axes.forEach((a, i) => {
    lower[i] = a.lower;
    upper[i] = a.upper;
    step[i] = 0.1 * (a.upper - a.lower);
  });
  step[nc] = 0.05 * scale;
  if (hasTrend) step[nc + 1] = (0.05 * scale) / Math.max(y.length, 1);
  for (let k = 0; k < ni; k++) step[nc + 1 + (hasTrend ? 1 : 0) + k] = mult ? 0.05 : 0.05 * scale;

  let best: Minimum = { x: x0, fx: objective(x0), evals: 1 };
  for (let r = 0; r < 8; r++) {
    const shrink = r === 0 ? 1 : 0.3;
    const m = nelderMead(objective, best.x, {
      step: step.map((s) => s * shrink),
      lower,
      upper,
      maxEvals: 300 * dim,
      fTol: 1e-11,
      xTol: 1e-9 * scale,
    });
    const improved = m.fx < best.fx * (1 - 1e-10);
    if (m.fx < best.fx) best = m;
    if (!improved && r > 0) break;
  }
  unpack(best.x);
  const start: Start = {
    method: "optimized",
    state: { level: state.level, trend: state.trend, indices: state.indices.slice() },
    firstUpdate: 0,
  };
  return { start, constants: constantsFrom(axes, best.x, fixed, trend), sse: best.fx };
}
