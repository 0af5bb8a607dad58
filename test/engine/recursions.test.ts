/**
 * The one-step recursion is written out more than once for speed: the fitting objective
 * (sumSquaredErrors), the state table (runRecursion), the two exact-gradient routines
 * (sseWithGradient for the constants, sseWithStateGradient for the constants and the start
 * state) and the interval simulation (simulateFuture). Here every copy is checked against the
 * others on every model form (multiplicative, additive and no seasons x linear, damped and no
 * trend), each gradient against central finite differences of the objective (the definition
 * of a derivative), and the bounded quasi-Newton fit against finite differences at its answer:
 * no small feasible move of one constant lowers the SSE (the first-order optimality
 * conditions on a box, Nocedal & Wright 2006, ch. 12 / 16.6).
 * Data: an invented monthly series (trend, season, deterministic noise, one blank period).
 */
import { decompositionStart, fitConstants, projectState, runRecursion, sumSquaredErrors, RecursionWorkspace, type FittedModel, type Seasonality, type State, type TrendKind } from "../../src/engine";
import { GradientWorkspace, sseWithGradient } from "../../src/engine/gradient";
import { freeAxes, PHI_LOWER, PHI_UPPER } from "../../src/engine/fit";
import { simulateFuture } from "../../src/engine/simulate";
import { StateGradientWorkspace, sseWithStateGradient } from "../../src/engine/stateGradient";

const P = 12;
/** Invented demand: 60 months, rising, seasonal, with a little deterministic noise and one blank. */
const Y = Float64Array.from({ length: 60 }, (_, t) =>
  t === 29 ? NaN : (300 + 3 * t) * (1 + 0.25 * Math.sin((2 * Math.PI * t) / P)) + 15 * Math.sin(7.3 * t),
);
const FORMS: [Seasonality, TrendKind][] = (["multiplicative", "additive", "none"] as Seasonality[]).flatMap((s) =>
  (["linear", "damped", "none"] as TrendKind[]).map((t) => [s, t] as [Seasonality, TrendKind]),
);
const THETA = [0.3, 0.2, 0.15, 0.9];

const periodOf = (s: Seasonality) => (s === "none" ? 1 : P);
const startOf = (s: Seasonality, t: TrendKind) => decompositionStart(Y, periodOf(s), s, t);

function relative(a: number, b: number, floor = 1e-300): number {
  return Math.abs(a - b) / Math.max(Math.abs(a), Math.abs(b), floor);
}

describe.each(FORMS)("%s seasonality, %s trend", (seasonality, trend) => {
  const p = periodOf(seasonality);
  const start = startOf(seasonality, trend);
  const phi = trend === "damped" ? THETA[3] : 1;
  const sse = (theta: ArrayLike<number>, state: State = start.state, first = start.firstUpdate) =>
    sumSquaredErrors(Y, state, first, p, seasonality, trend, theta[0], theta[1], theta[2], trend === "damped" ? theta[3] : 1, new RecursionWorkspace(p));

  test("the objective, the state table and both gradient routines compute the same SSE", () => {
    const c = { alpha: THETA[0], beta: THETA[1], gamma: THETA[2], phi };
    const run = runRecursion(Y, start.state, start.firstUpdate, p, seasonality, trend, c);
    const g = new Float64Array(4);
    const withGradient = sseWithGradient(Y, start.state, start.firstUpdate, p, seasonality, trend, THETA, g, new GradientWorkspace(p));
    expect(relative(sse(THETA), run.sse)).toBeLessThan(1e-12);
    expect(relative(withGradient, run.sse)).toBeLessThan(1e-12);
    // The state gradient updates from the first period: compare with a run updating from there.
    const ws = new StateGradientWorkspace(p);
    const gs = new Float64Array(ws.m);
    const fromFirst = sseWithStateGradient(Y, p, seasonality, trend, THETA, start.state, gs, ws);
    const runFromFirst = runRecursion(Y, start.state, 0, p, seasonality, trend, c);
    expect(relative(fromFirst, runFromFirst.sse)).toBeLessThan(1e-12);
    expect(relative(fromFirst, sse(THETA, start.state, 0))).toBeLessThan(1e-12);
  });

  test("sseWithGradient matches central differences of the objective in every constant", () => {
    const g = new Float64Array(4);
    sseWithGradient(Y, start.state, start.firstUpdate, p, seasonality, trend, THETA, g, new GradientWorkspace(p));
    const used = [true, trend !== "none", seasonality !== "none", trend === "damped"];
    for (let k = 0; k < 4; k++) {
      if (!used[k]) {
        expect(g[k]).toBe(0);
        continue;
      }
      const h = 1e-6;
      const up = [...THETA];
      const down = [...THETA];
      up[k] += h;
      down[k] -= h;
      const fd = (sse(up) - sse(down)) / (2 * h);
      expect(relative(g[k], fd, 1e-6 * sse(THETA))).toBeLessThan(1e-5);
    }
  });

  test("sseWithStateGradient matches central differences in every constant and every start value", () => {
    const ws = new StateGradientWorkspace(p);
    const g = new Float64Array(ws.m);
    sseWithStateGradient(Y, p, seasonality, trend, THETA, start.state, g, ws);
    const at = (theta: number[], state: State) => sse(theta, state, 0);
    const f0 = at(THETA, start.state);
    const shifted = (k: number, h: number): number => {
      const theta = [...THETA];
      const state: State = { level: start.state.level, trend: start.state.trend, indices: Float64Array.from(start.state.indices) };
      if (k < 4) theta[k] += h;
      else if (k === 4) state.level += h;
      else if (k === 5) state.trend += h;
      else state.indices[k - 6] += h;
      return at(theta, state);
    };
    const used = (k: number) =>
      k === 0 || k === 4 || (k === 1 && trend !== "none") || (k === 2 && seasonality !== "none") || (k === 3 && trend === "damped") || (k === 5 && trend !== "none") || k >= 6;
    for (let k = 0; k < ws.m; k++) {
      if (!used(k)) {
        expect(g[k]).toBe(0);
        continue;
      }
      // Step relative to the quantity's size: constants are O(1), the level O(300), indices O(1) or O(100).
      const size = k < 4 ? 1 : k === 4 ? Math.abs(start.state.level) : k === 5 ? 1 : Math.max(1, Math.abs(start.state.indices[k - 6]));
      const h = 1e-6 * size;
      const fd = (shifted(k, h) - shifted(k, -h)) / (2 * h);
      expect(relative(g[k], fd, (1e-6 * f0) / size)).toBeLessThan(1e-5);
    }
  });

  test("the bounded quasi-Newton fit ends where no small feasible move of a constant lowers the SSE", () => {
    const fit = fitConstants(Y, start.state, start.firstUpdate, p, seasonality, trend, {});
    const axes = freeAxes(seasonality, trend, p, {});
    const x = [fit.constants.alpha, fit.constants.beta, fit.constants.gamma, fit.constants.phi];
    const f0 = sse(x);
    expect(relative(f0, fit.sse)).toBeLessThan(1e-12);
    for (const a of axes) {
      for (const step of [1e-4, -1e-4, 1e-6, -1e-6]) {
        const moved = [...x];
        moved[a.slot] = Math.min(a.upper, Math.max(a.lower, moved[a.slot] + step));
        if (moved[a.slot] === x[a.slot]) continue; // at a bound, moving outward is not allowed
        expect(sse(moved)).toBeGreaterThanOrEqual(f0 * (1 - 1e-10));
      }
    }
    if (trend === "damped") expect(fit.constants.phi).toBeGreaterThanOrEqual(PHI_LOWER);
    if (trend === "damped") expect(fit.constants.phi).toBeLessThanOrEqual(PHI_UPPER);
  });

  if (seasonality === "multiplicative") {
    test("the simulation with no error follows the point forecasts", () => {
      const c = { alpha: THETA[0], beta: THETA[1], gamma: THETA[2], phi };
      const run = runRecursion(Y, start.state, start.firstUpdate, p, seasonality, trend, c);
      const model = { spec: { period: p, seasonality, trend }, constants: c, final: run.final } as unknown as FittedModel;
      const forecast = projectState(run.final, 30, p, seasonality, trend, phi);
      simulateFuture(model, 0, 30, 8, (h, values) => {
        for (const v of values) expect(relative(v, forecast[h - 1])).toBeLessThan(1e-12);
      });
    });
  }
});
