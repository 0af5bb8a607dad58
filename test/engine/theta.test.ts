/**
 * Outside source: R 4.2.2 with the forecast package 8.20 (Debian r-cran-forecast), through the
 * committed fixture test/reference/fixtures/r-theta.json written by test/reference/r/theta.R
 * (this suite never runs R): forecast::thetaf, the Theta method as Hyndman & Billah (2003)
 * formulate it, on base R's public datasets.
 *
 * What must agree, and to how much: the seasonality decision exactly; the drift (a closed-form
 * least-squares slope on the same adjusted values) to 1e-9 relative; the point forecasts to
 * 1e-4 relative, because both fit alpha and the start level by an iterative search that stops
 * at slightly different points (R's Nelder-Mead; Ebb's quasi-Newton); and Ebb's search must
 * find a sum of squares no larger than R's, to 1e-9 relative.
 */
import { readFileSync } from "fs";
import { join } from "path";
import { fitTheta, thetaForecast, thetaInterval } from "../../src/engine";

interface Case {
  name: string;
  period: number;
  values: number[];
  seasonal: boolean;
  alpha: number;
  startLevel: number;
  smoothingSse: number;
  drift: number;
  forecast: number[];
}
const fixture: { source: string; cases: Case[] } = JSON.parse(readFileSync(join(__dirname, "..", "reference", "fixtures", "r-theta.json"), "utf8"));

const relative = (a: number, b: number) => Math.abs(a - b) / Math.max(Math.abs(b), 1e-300);

describe("Theta method against R's forecast::thetaf (fixture)", () => {
  it("covers seasonal and non-seasonal cases", () => {
    expect(fixture.cases.filter((c) => c.seasonal).length).toBeGreaterThan(3);
    expect(fixture.cases.filter((c) => !c.seasonal).length).toBeGreaterThan(0);
  });
  for (const c of fixture.cases) {
    it(`${c.name}: decision, drift, smoothing SSE and ${c.forecast.length} forecasts`, () => {
      const fit = fitTheta(Float64Array.from(c.values), c.period);
      expect(fit.indices.length > 0).toBe(c.seasonal);
      expect(relative(fit.drift, c.drift)).toBeLessThan(1e-9);
      expect(fit.smoothing.sse).toBeLessThanOrEqual(c.smoothingSse * (1 + 1e-9));
      const f = thetaForecast(fit, c.forecast.length);
      for (let h = 0; h < f.length; h++) expect(relative(f[h], c.forecast[h])).toBeLessThan(1e-4);
    });
  }
});

describe("Theta method: hand cases and bad input", () => {
  // A straight line y = 10 + 2t (t = 0..11), not seasonal: the smoothing follows the line with
  // alpha -> 1, so the level ends at the last value and the forecast is 32 + b (h - 1 + 1) with
  // b = 1 (half the slope 2): 33, 34, 35 (hand-computed from the formula in theta.ts).
  it("a straight line: half its slope as drift, forecasts 33, 34, 35", () => {
    const y = Float64Array.from({ length: 12 }, (_, t) => 10 + 2 * t);
    const fit = fitTheta(y, 1);
    expect(fit.drift).toBeCloseTo(1, 12);
    const f = thetaForecast(fit, 3);
    [33, 34, 35].forEach((v, i) => expect(f[i]).toBeCloseTo(v, 4));
  });

  it("leading blanks are left out, not counted in the drift term's n", () => {
    const y = Float64Array.from(fixture.cases[0].values);
    const padded = new Float64Array(y.length + 5).fill(NaN);
    padded.set(y, 5);
    const a = thetaForecast(fitTheta(y, 12), 6);
    const b = thetaForecast(fitTheta(padded, 12), 6);
    for (let h = 0; h < 6; h++) expect(b[h]).toBeCloseTo(a[h], 9);
  });

  it("the interval contains the forecast, widens with the horizon and with the coverage", () => {
    const fit = fitTheta(Float64Array.from(fixture.cases[0].values), 12);
    const i80 = thetaInterval(fit, 12, 0.8);
    const i95 = thetaInterval(fit, 12, 0.95);
    for (let h = 0; h < 12; h++) {
      expect(i95.low[h]).toBeLessThan(i80.low[h]);
      expect(i80.low[h]).toBeLessThan(i80.forecast[h]);
      expect(i95.high[h]).toBeGreaterThan(i80.high[h]);
    }
    // Divided by its index, the half-width grows as sqrt(1 + (h - 1) alpha^2): the variance of
    // simple exponential smoothing (Hyndman et al. 2008, ch. 6, class 1).
    const alpha = fit.smoothing.constants.alpha;
    const index = (h: number) => fit.indices[(fit.length + h - 1) % 12];
    const half = (h: number) => (i95.high[h - 1] - i95.forecast[h - 1]) / index(h);
    for (const h of [2, 6, 12]) expect(half(h) / half(1)).toBeCloseTo(Math.sqrt(1 + (h - 1) * alpha * alpha), 10);
  });

  it("too short a history says how many values are needed, and that many are enough", () => {
    // Simple exponential smoothing with a fitted start needs 5 values (shape.ts requiredLength).
    expect(() => fitTheta(Float64Array.from([5, 6, NaN, 7]), 1)).toThrow(/needs 5|5 values/);
    expect(() => fitTheta(Float64Array.from([5, 6, 8, 7, 9]), 1)).not.toThrow();
  });
});
