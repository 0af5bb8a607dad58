/**
 * The optimised Theta model (src/engine/optimizedTheta.ts; Fiorucci et al. 2016, IJF 32(4)).
 *
 * The forecasts are checked against the Theta method's own definition (Assimakopoulos &
 * Nikolopoulos 2000, IJF 16(4), section 2): the theta line Z = theta a + (1 - theta) L of the
 * adjusted history a and its least-squares line L, extrapolated by simple exponential smoothing,
 * and the forecast (1/theta) Z-forecast + (1 - 1/theta) L-extrapolation. The test builds Z and
 * smooths it itself, from the fitted alpha, theta and start, so the engine's closed form (the
 * linearity of smoothing, no theta line built) is checked against the construction it replaces.
 */
import { fitOptimizedTheta, optimizedThetaForecast, optimizedThetaInterval, thetaOf, type OptimizedThetaFit } from "../../src/engine";

/** A seeded walk with drift and noise (an invented history, not data). */
function walk(n: number, drift: number, seed: number, season: number[] = []): Float64Array {
  let s = seed;
  const next = () => ((s = (s * 16807) % 2147483647) / 2147483647) - 0.5;
  const y = new Float64Array(n);
  let level = 200;
  for (let t = 0; t < n; t++) {
    level += drift + 4 * next();
    y[t] = (level + 6 * next()) * (season.length ? season[t % season.length] : 1);
  }
  return y;
}

/** Forecast by the definition: smooth the theta line and mix it with the line. */
function byDefinition(history: Float64Array, fit: OptimizedThetaFit, horizon: number): number[] {
  const p = fit.indices.length;
  const a = Array.from(history, (v, t) => (p ? v / fit.indices[t % p] : v));
  const present = a.map((v, t) => [t, v]).filter(([, v]) => !Number.isNaN(v));
  const mt = present.reduce((s, [t]) => s + t, 0) / present.length;
  const ma = present.reduce((s, [, v]) => s + v, 0) / present.length;
  const slope = present.reduce((s, [t, v]) => s + (t - mt) * (v - ma), 0) / present.reduce((s, [t]) => s + (t - mt) ** 2, 0);
  const line = (t: number) => ma + slope * (t - mt);
  const theta = thetaOf(fit);
  let z = theta * fit.start + (1 - theta) * line(-1); // the smoothing of Z starts where those of a and L start
  a.forEach((v, t) => {
    if (!Number.isNaN(v)) z = fit.alpha * (theta * v + (1 - theta) * line(t)) + (1 - fit.alpha) * z;
  });
  const n = a.length;
  return Array.from({ length: horizon }, (_, k) => (z / theta + (1 - 1 / theta) * line(n + k)) * (p ? fit.indices[(n + k) % p] : 1));
}

const histories: [string, Float64Array, number][] = [
  ["a walk with a mild drift", walk(60, 0.4, 11), 1],
  ["a walk with a steep drift", walk(48, 2.5, 23), 1],
  ["a seasonal walk (quarterly)", walk(40, 1, 11, [0.8, 1.1, 1.3, 0.8]), 4],
  ["a seasonal walk (monthly)", walk(96, 0.3, 5, [0.9, 0.85, 1, 1.05, 1.1, 1.2, 1.25, 1.15, 1, 0.95, 0.8, 0.75]), 12],
];

describe.each([false, true])("dynamic %s", (dynamic) => {
  test.each(histories)("%s: forecasts equal the theta-line construction to 1e-9 relative", (_name, y, p) => {
    const fit = fitOptimizedTheta(y, p, { dynamic });
    // The construction needs a finite theta other than 1 (these invented histories were picked so).
    expect(fit.lineWeight > 0 && fit.lineWeight < 1).toBe(true);
    const ours = optimizedThetaForecast(fit, 8);
    const defined = byDefinition(y, fit, 8);
    for (let h = 0; h < 8; h++) expect(Math.abs(ours[h] - defined[h]) / Math.abs(defined[h])).toBeLessThan(1e-9);
  });

  test("a blank inside the history is skipped by both smoothings alike", () => {
    const y = walk(60, 0.8, 7);
    y[20] = NaN;
    y[41] = NaN;
    const fit = fitOptimizedTheta(y, 1, { dynamic });
    expect(fit.lineWeight > 0 && fit.lineWeight < 1).toBe(true);
    const ours = optimizedThetaForecast(fit, 6);
    const defined = byDefinition(y, fit, 6);
    for (let h = 0; h < 6; h++) expect(Math.abs(ours[h] - defined[h]) / Math.abs(defined[h])).toBeLessThan(1e-9);
  });
});

test("static: an exact straight line is carried on exactly (theta without bound; hand-computed: 100 + 3t)", () => {
  const y = Float64Array.from({ length: 30 }, (_, t) => 100 + 3 * t);
  const fit = fitOptimizedTheta(y, 1, { dynamic: false });
  expect(fit.lineWeight).toBeCloseTo(1, 9);
  expect(Array.from(optimizedThetaForecast(fit, 3)).map((v) => +v.toFixed(6))).toEqual([190, 193, 196]);
});

test("dynamic: a straight line is carried on within 0.1% (its slope is unknown for the first two periods, so the fit is not exact)", () => {
  const y = Float64Array.from({ length: 30 }, (_, t) => 100 + 3 * t);
  const forecast = optimizedThetaForecast(fitOptimizedTheta(y, 1, { dynamic: true }), 3);
  [190, 193, 196].forEach((v, h) => expect(Math.abs(forecast[h] - v) / v).toBeLessThan(1e-3));
});

test("theta stays at 1 or more (the line's weight in [0, 1]) and at least one history uses a finite theta", () => {
  const fits = histories.map(([, y, p]) => fitOptimizedTheta(y, p));
  for (const f of fits) expect(f.lineWeight >= 0 && f.lineWeight <= 1).toBe(true);
  expect(fits.some((f) => f.lineWeight > 0 && f.lineWeight < 1)).toBe(true);
});

test("leading blanks are left out: the forecast is that of the history without them", () => {
  const y = walk(50, 0.5, 41);
  const padded = Float64Array.from([NaN, NaN, NaN, ...y]);
  expect(Array.from(optimizedThetaForecast(fitOptimizedTheta(padded, 1), 4))).toEqual(Array.from(optimizedThetaForecast(fitOptimizedTheta(y, 1), 4)));
});

test("too short a history is a clear error, not a number", () => {
  expect(() => fitOptimizedTheta(Float64Array.from([5, 6, 7]), 1)).toThrow(/add more history/);
});

test("intervals hold the forecast, widen with the horizon and with the coverage", () => {
  const fit = fitOptimizedTheta(histories[2][1], 4);
  const i80 = optimizedThetaInterval(fit, 8, 0.8);
  const i95 = optimizedThetaInterval(fit, 8, 0.95);
  for (let h = 0; h < 8; h++) {
    expect(i95.low[h]).toBeLessThan(i80.low[h]);
    expect(i80.low[h]).toBeLessThan(i80.forecast[h]);
    expect(i95.high[h]).toBeGreaterThan(i80.high[h]);
  }
  // Same season position a year apart: the later one is wider relative to its index.
  const width = (h: number) => (i95.high[h] - i95.low[h]) / fit.indices[(fit.length + h) % 4];
  expect(width(4)).toBeGreaterThan(width(0));
});
