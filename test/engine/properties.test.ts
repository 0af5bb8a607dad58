/**
 * Property tests (fast-check, fixed seed) of identities that follow from the published
 * recursions (Holt 1957, Winters 1960, Gardner & McKenzie 1985, as written in DESIGN "The model
 * family"), not from Ebb's outputs:
 * - multiplying the series by c > 0 multiplies level, trend and forecasts by c and leaves
 *   multiplicative indices unchanged (every update is homogeneous of degree 1 in y, the
 *   indices of degree 0, and both starts are built from averages and least squares, which
 *   are homogeneous too);
 * - adding c to an additive series adds c to level and forecasts and leaves trend and indices
 *   unchanged (y - level and level differences do not see c);
 * - gamma = 0 never changes an index (index_t = 0 * ... + 1 * index_{t-p});
 * - alpha = beta = gamma = 0 leaves only level_t = level + phi*trend, trend_t = phi*trend: the
 *   run is the projection of the start state (projectState);
 * - any positive series gives finite outputs with fitted constants, every start and trend;
 * - fitting is deterministic, and the fitted SSE is not above the SSE at the usual starting
 *   point (alpha 0.3, beta 0.1, gamma 0.1) nor at random points of the box.
 */
import fc from "fast-check";
import {
  EbbError,
  fitModel,
  forecastModel,
  modelStates,
  predictionInterval,
  projectState,
  type FittedModel,
  type Seasonality,
  type StartMethod,
  type TrendKind,
} from "../../src/engine";

const SEED = 20260409;
const RUNS = 60;
const TRENDS: TrendKind[] = ["linear", "damped", "none"];
const STARTS: StartMethod[] = ["decomposition", "classic"];

/** A positive seasonal series with trend and noise: level * (1 + slope t) * (1 + amp sin) * (1 + noise). */
const seasonalSeries = fc
  .record({
    p: fc.constantFrom(3, 4, 6, 12),
    seasons: fc.integer({ min: 4, max: 6 }),
    level: fc.double({ min: 5, max: 1e4, noNaN: true }),
    slope: fc.double({ min: -0.01, max: 0.02, noNaN: true }),
    amp: fc.double({ min: 0, max: 0.5, noNaN: true }),
    phase: fc.double({ min: 0, max: 6.28, noNaN: true }),
    noise: fc.array(fc.double({ min: -0.15, max: 0.15, noNaN: true }), { minLength: 72, maxLength: 72 }),
  })
  .map(({ p, seasons, level, slope, amp, phase, noise }) => {
    const n = p * seasons + (seasons % 2); // some histories end inside a season
    const y = Array.from({ length: n }, (_, t) => level * (1 + slope * t) * (1 + amp * Math.sin((2 * Math.PI * t) / p + phase)) * (1 + noise[t % 72]));
    return { p, y };
  });

const unit = fc.double({ min: 0, max: 1, noNaN: true });
const constants = fc.record({ alpha: unit, beta: unit, gamma: unit, phi: fc.double({ min: 0.8, max: 0.98, noNaN: true }) });
const trendKind = fc.constantFrom(...TRENDS);
const startKind = fc.constantFrom(...STARTS);

function meanAbs(y: ArrayLike<number>): number {
  let s = 0;
  for (let i = 0; i < y.length; i++) s += Math.abs(y[i]);
  return s / y.length;
}

/** |a - b| <= tol * max(|b|, floor), reporting the values on failure. */
function expectClose(a: number, b: number, floor: number, what: string, tol = 1e-9): void {
  const ok = Number.isFinite(a) && Math.abs(a - b) <= tol * Math.max(Math.abs(b), floor);
  if (!ok) throw new Error(`${what}: ${a} vs ${b} (floor ${floor})`);
}

function fixedFit(y: number[], p: number, seasonality: Seasonality, trend: TrendKind, start: StartMethod, c: { alpha: number; beta: number; gamma: number; phi: number }): FittedModel {
  return fitModel(y, { period: p, seasonality, trend, start, alpha: c.alpha, beta: c.beta, gamma: c.gamma, phi: c.phi });
}

describe("properties of the recursions (fast-check, seed " + SEED + ")", () => {
  it("scaling the series by c > 0 scales level, trend and forecasts by c; multiplicative indices unchanged", () => {
    fc.assert(
      fc.property(seasonalSeries, fc.double({ min: 1e-3, max: 1e3, noNaN: true }), constants, trendKind, startKind, ({ p, y }, c, k, trend, start) => {
        const a = fixedFit(y, p, "multiplicative", trend, start, k);
        const b = fixedFit(y.map((v) => v * c), p, "multiplicative", trend, start, k);
        const ta = modelStates(a);
        const tb = modelStates(b);
        const floor = 1e-3 * c * meanAbs(y); // trend may pass through zero
        for (let t = a.start.firstUpdate; t < y.length; t++) {
          expectClose(tb.level[t], c * ta.level[t], floor, `level ${t}`);
          expectClose(tb.trend[t], c * ta.trend[t], floor, `trend ${t}`);
          expectClose(tb.forecast[t], c * ta.forecast[t], floor, `one-step forecast ${t}`);
          expectClose(tb.index[t], ta.index[t], 0, `index ${t}`);
        }
        a.start.state.indices.forEach((v, j) => expectClose(b.start.state.indices[j], v, 0, `start index ${j}`));
        const fa = forecastModel(a, 2 * p);
        const fb = forecastModel(b, 2 * p);
        fa.forEach((v, h) => expectClose(fb[h], c * v, floor, `forecast h=${h + 1}`));
      }),
      { seed: SEED, numRuns: RUNS },
    );
  });

  it("adding c to an additive series shifts level and forecasts by c; trend and indices unchanged", () => {
    fc.assert(
      fc.property(seasonalSeries, fc.double({ min: -1e4, max: 1e4, noNaN: true }), constants, trendKind, startKind, ({ p, y }, c, k, trend, start) => {
        const a = fixedFit(y, p, "additive", trend, start, k);
        const b = fixedFit(y.map((v) => v + c), p, "additive", trend, start, k);
        const ta = modelStates(a);
        const tb = modelStates(b);
        // Absolute tolerance on the scale of the shifted values.
        const scale = meanAbs(y) + Math.abs(c);
        for (let t = a.start.firstUpdate; t < y.length; t++) {
          expectClose(tb.level[t] - c, ta.level[t], scale, `level ${t}`);
          expectClose(tb.forecast[t] - c, ta.forecast[t], scale, `one-step forecast ${t}`);
          expectClose(tb.trend[t], ta.trend[t], scale, `trend ${t}`);
          expectClose(tb.index[t], ta.index[t], scale, `index ${t}`);
        }
        const fa = forecastModel(a, 2 * p);
        const fb = forecastModel(b, 2 * p);
        fa.forEach((v, h) => expectClose(fb[h] - c, v, scale, `forecast h=${h + 1}`));
      }),
      { seed: SEED, numRuns: RUNS },
    );
  });

  it("gamma = 0 never changes an index", () => {
    fc.assert(
      fc.property(seasonalSeries, constants, trendKind, startKind, fc.constantFrom<Seasonality>("multiplicative", "additive"), ({ p, y }, k, trend, start, seasonality) => {
        const m = fixedFit(y, p, seasonality, trend, start, { ...k, gamma: 0 });
        const table = modelStates(m);
        const first = m.start.firstUpdate;
        const initial = m.start.state.indices; // initial[j] serves period first + j (and every p after)
        for (let t = first; t < y.length; t++) expect(table.index[t]).toBe(initial[(t - first) % p]);
        for (let j = 0; j < p; j++) expect(m.final.indices[j]).toBe(initial[(y.length + j - first) % p]);
      }),
      { seed: SEED, numRuns: RUNS },
    );
  });

  it("alpha = beta = gamma = 0 reproduces the projection of the start state", () => {
    fc.assert(
      fc.property(seasonalSeries, fc.double({ min: 0.8, max: 1, noNaN: true }), trendKind, startKind, fc.constantFrom<Seasonality>("multiplicative", "additive"), ({ p, y }, phi, trend, start, seasonality) => {
        const m = fixedFit(y, p, seasonality, trend, start, { alpha: 0, beta: 0, gamma: 0, phi });
        const first = m.start.firstUpdate;
        const steps = y.length - first;
        const horizon = 2 * p;
        const projected = projectState(m.start.state, steps + horizon, p, seasonality, trend, phi);
        const table = modelStates(m);
        const floor = 1e-3 * meanAbs(y);
        for (let t = first; t < y.length; t++) expectClose(table.forecast[t], projected[t - first], floor, `one-step forecast ${t}`);
        const ahead = forecastModel(m, horizon);
        ahead.forEach((v, h) => expectClose(v, projected[steps + h], floor, `forecast h=${h + 1}`));
      }),
      { seed: SEED, numRuns: RUNS },
    );
  });

  it("any positive series gives finite outputs with fitted constants, every start, trend and seasonality", () => {
    const positiveSeries = fc.constantFrom(2, 3, 4, 7).chain((p) =>
      fc.record({
        p: fc.constant(p),
        y: fc.array(fc.double({ min: 1e-3, max: 1e6, noNaN: true }), { minLength: 2 * p + 6, maxLength: 5 * p + 6 }),
      }),
    );
    fc.assert(
      fc.property(
        positiveSeries,
        fc.constantFrom<StartMethod>("decomposition", "classic", "optimized"),
        trendKind,
        fc.constantFrom<Seasonality>("multiplicative", "additive"),
        ({ p, y }, start, trend, seasonality) => {
          const m = fitModel(y, { period: p, seasonality, trend, start });
          const { alpha, beta, gamma, phi } = m.constants;
          for (const v of [alpha, beta, gamma]) expect(v >= 0 && v <= 1).toBe(true);
          expect(phi >= 0.8 && phi <= 1).toBe(true);
          for (const v of [m.sse, m.rmse, m.relativeSse, m.final.level, m.final.trend, ...m.final.indices]) expect(Number.isFinite(v)).toBe(true);
          if (m.errorCount > m.parameterCount + 2) expect(Number.isFinite(m.aicc)).toBe(true);
          const table = modelStates(m);
          for (let t = m.start.firstUpdate; t < y.length; t++) {
            for (const v of [table.level[t], table.trend[t], table.index[t], table.forecast[t], table.error[t]]) expect(Number.isFinite(v)).toBe(true);
          }
          for (const v of forecastModel(m, 2 * p)) expect(Number.isFinite(v)).toBe(true);
          const band = predictionInterval(m, 2 * p, 0.9);
          band.low.forEach((lo, h) => {
            expect(Number.isFinite(lo) && Number.isFinite(band.high[h])).toBe(true);
            expect(lo).toBeLessThanOrEqual(band.high[h]);
          });
        },
      ),
      { seed: SEED, numRuns: 100 },
    );
  });

  it("fitting is deterministic: the same inputs give the same digits", () => {
    fc.assert(
      fc.property(seasonalSeries, fc.constantFrom<StartMethod>("decomposition", "classic", "optimized"), trendKind, fc.constantFrom<Seasonality>("multiplicative", "additive"), ({ p, y }, start, trend, seasonality) => {
        const digits = (m: FittedModel) =>
          [m.constants.alpha, m.constants.beta, m.constants.gamma, m.constants.phi, m.sse, m.start.state.level, m.start.state.trend, ...m.start.state.indices, ...forecastModel(m, p)].map((v) => v.toString());
        const options = { period: p, seasonality, trend, start };
        expect(digits(fitModel(y, options))).toEqual(digits(fitModel(y.slice(), options)));
      }),
      { seed: SEED, numRuns: 40 },
    );
  });

  it("the fitted SSE is not above the SSE at the usual starting point (0.3, 0.1, 0.1) nor at random points of the box", () => {
    const point = fc.record({ alpha: unit, beta: unit, gamma: unit, phi: fc.double({ min: 0.8, max: 0.98, noNaN: true }) });
    fc.assert(
      fc.property(seasonalSeries, startKind, trendKind, fc.constantFrom<Seasonality>("multiplicative", "additive"), fc.array(point, { minLength: 3, maxLength: 3 }), ({ p, y }, start, trend, seasonality, randomPoints) => {
        const fitted = fitModel(y, { period: p, seasonality, trend, start });
        const usual = { alpha: 0.3, beta: 0.1, gamma: 0.1, phi: 0.9 };
        // An SSE at rounding level (a series the model fits exactly) is noise: one part in 1e12
        // of the series' scale per value is allowed on top of the relative 1e-9.
        const roundingFloor = y.length * (1e-12 * meanAbs(y)) ** 2;
        for (const c of [usual, ...randomPoints]) {
          let sse: number;
          try {
            sse = fixedFit(y, p, seasonality, trend, start, c).sse;
          } catch (e) {
            if (e instanceof EbbError) continue; // a point where the recursion breaks down is no competitor
            throw e;
          }
          if (!(fitted.sse <= sse * (1 + 1e-9) + roundingFloor)) {
            throw new Error(`fitted SSE ${fitted.sse} (constants ${JSON.stringify(fitted.constants)}) above SSE ${sse} at ${JSON.stringify(c)}`);
          }
        }
      }),
      { seed: SEED, numRuns: RUNS },
    );
  });

  it("hard case found by the property search: a flat rising series with three outliers, damped additive", () => {
    // 61 monthly values 10000 + 0.1 t (t = 0..60), values 47 and 48 raised 15%, value 60 lowered
    // 15%. On this start the SSE is smallest at the corner alpha = beta = gamma = 0, phi = 0.98.
    // Outside check: base R's optim(c(0.3, 0.1, 0.1, 0.9), method = "L-BFGS-B", bounds [0,1]^3 x
    // [0.8, 0.98]) on the same objective (the recursion re-implemented in R from Ebb's start
    // state, reproducing Ebb's SSE at Ebb's point to 15 digits) converges to that corner with
    // SSE 6756637.509246; DESIGN requires the fit never to return more than that.
    const y = Array.from({ length: 61 }, (_, t) => 10000 + 0.1 * t);
    y[46] *= 1.15;
    y[47] *= 1.15;
    y[59] *= 0.85;
    const options = { period: 12, seasonality: "additive" as const, trend: "damped" as const, start: "decomposition" as const };
    const corner = fitModel(y, { ...options, alpha: 0, beta: 0, gamma: 0, phi: 0.98 }).sse;
    const fitted = fitModel(y, options);
    expect(fitted.sse).toBeLessThanOrEqual(corner * (1 + 1e-9));
  });
});
