import { constantsFrom, freeAxes, type ConstantChoice } from "../fit";
import { projectedBfgs } from "../optimize/projectedBfgs";
import { StateGradientWorkspace, sseWithStateGradient } from "../stateGradient";
import type { Constants, Seasonality, Start, State, TrendKind } from "../types";
import { isSeasonal } from "../shape";

/**
 * The `optimized` start: initial level, trend and indices estimated together with the
 * smoothing constants by minimising the sum of squared one-step errors over the whole
 * history (state-space style, Hyndman, Koehler, Ord & Snyder 2008, section 2.6). The search
 * is the bounded quasi-Newton descent with exact gradients, begun from the decomposition
 * start (`seed`, computed by the caller) moved back to before the first period, once with
 * the constants fitted on that start and once with the usual starting constants. Indices stay
 * normalised (mean 1 or sum 0), so p-1 of them are free; state variables are searched in
 * units of the series' scale.
 */
export function optimizedStart(
  y: Float64Array,
  p: number,
  seasonality: Seasonality,
  trend: TrendKind,
  seed: Start,
  fixed: ConstantChoice,
  guess: Constants,
): { start: Start; constants: Constants; sse: number } {
  const seasonal = isSeasonal(seasonality, p);
  const mult = seasonal && seasonality === "multiplicative";
  const slope = seed.detail!.slope;
  const intercept = seed.detail!.intercept;
  const axes = freeAxes(seasonality, trend, p, fixed);
  const nc = axes.length;
  const hasTrend = trend !== "none";
  const iTrend = nc + 1;
  const iIdx = nc + 1 + (hasTrend ? 1 : 0);
  const ni = seasonal ? p - 1 : 0;
  const dim = iIdx + ni;
  const scale = Math.max(Math.abs(intercept), Math.abs(slope) * y.length, 1e-9);
  const trendScale = scale / Math.max(1, y.length);
  const idxScale = mult ? 1 : scale;

  const state: State = { level: 0, trend: 0, indices: new Float64Array(seasonal ? p : 0) };
  const theta = new Float64Array(4);
  const unpack = (x: ArrayLike<number>): void => {
    const c = constantsFrom(axes, x, fixed, trend);
    theta[0] = c.alpha;
    theta[1] = c.beta;
    theta[2] = c.gamma;
    theta[3] = c.phi;
    state.level = scale * x[nc];
    state.trend = hasTrend ? trendScale * x[iTrend] : 0;
    if (seasonal) {
      let sum = 0;
      for (let k = 0; k < ni; k++) {
        state.indices[k] = idxScale * x[iIdx + k];
        sum += state.indices[k];
      }
      state.indices[p - 1] = mult ? p - sum : -sum;
    }
  };
  const ws = new StateGradientWorkspace(p);
  const full = new Float64Array(ws.m);
  const objective = (x: Float64Array, g: Float64Array): number => {
    unpack(x);
    if (mult) for (let k = 0; k < p; k++) if (!(state.indices[k] > 0)) return Infinity;
    const f = sseWithStateGradient(y, p, seasonality, trend, theta, state, full, ws);
    axes.forEach((a, i) => (g[i] = full[a.slot]));
    g[nc] = full[4] * scale;
    if (hasTrend) g[iTrend] = full[5] * trendScale;
    for (let k = 0; k < ni; k++) g[iIdx + k] = (full[6 + k] - full[6 + p - 1]) * idxScale;
    return f;
  };
  const lower = new Float64Array(dim).fill(-Infinity);
  const upper = new Float64Array(dim).fill(Infinity);
  axes.forEach((a, i) => {
    lower[i] = a.lower;
    upper[i] = a.upper;
  });
  const startingPoint = (constants: (a: (typeof axes)[number]) => number): Float64Array => {
    const x0 = new Float64Array(dim);
    axes.forEach((a, i) => (x0[i] = Math.min(a.upper, Math.max(a.lower, constants(a)))));
    x0[nc] = intercept / scale; // the line's value at period 0, just before the first period
    if (hasTrend) x0[iTrend] = slope / trendScale;
    for (let k = 0; k < ni; k++) x0[iIdx + k] = seed.detail!.normalIndices[k] / idxScale;
    return x0;
  };
  const options = { lower, upper, maxIter: 500, fTol: 1e-12 };
  let best = projectedBfgs(objective, startingPoint((a) => guess[a.name]), options);
  const other = projectedBfgs(objective, startingPoint((a) => a.usual), options);
  if (other.fx < best.fx) best = other;
  const polished = projectedBfgs(objective, best.x, { ...options, fTol: 1e-13 });
  if (polished.fx < best.fx) best = polished;
  unpack(best.x);
  const start: Start = {
    method: "optimized",
    state: { level: state.level, trend: state.trend, indices: state.indices.slice() },
    firstUpdate: 0,
  };
  return { start, constants: constantsFrom(axes, best.x, fixed, trend), sse: best.fx };
}
