/**
 * The start with blanks. Check value hand-computed (common practice: classical decomposition,
 * Makridakis, Wheelwright & Hyndman 1998, ch. 4; seasonally adjusted linear interpolation as in
 * R forecast's na.interp, Hyndman & Athanasopoulos, FPP 2nd ed., section 12.9):
 * window 10 20 30 20 14 _ 36 24 (p = 4, additive). Straight-line fill 25; 2x4 moving averages
 * 20.5, 21.625, 23, 24.25; differences 9.5, -1.625, -9, 0.75 at positions 3, 4, 1, 2; their mean
 * -0.09375; indices -8.90625, 0.84375, 9.59375, -1.53125; adjusted neighbours 14 + 8.90625 =
 * 22.90625 and 36 - 9.59375 = 26.40625, midpoint 24.65625, plus the index 0.84375: 25.5.
 */
import { decompositionStart, fitModel, forecastModel } from "../../src/engine";

describe("start with blanks", () => {
  it("fills a blank in the start window by seasonally adjusted interpolation (hand-computed 25.5)", () => {
    const y = Float64Array.from([10, 20, 30, 20, 14, NaN, 36, 24, 12, 23, 33, 22]);
    const s = decompositionStart(y, 4, "additive", "linear", 2);
    expect(s.detail!.filled!.at).toEqual([5]);
    expect(s.detail!.filled!.values[0]).toBeCloseTo(25.5, 12);
    const complete = decompositionStart(Float64Array.from([10, 20, 30, 20, 14, 25.5, 36, 24, 12, 23, 33, 22]), 4, "additive", "linear", 2);
    expect(s.state.level).toBeCloseTo(complete.state.level, 12);
    expect(Array.from(s.state.indices)).toEqual(Array.from(complete.state.indices));
  });

  const monthly = (n: number) => Float64Array.from({ length: n }, (_, t) => 100 + t + 20 * Math.sin((2 * Math.PI * t) / 12) + ((t * 7) % 5));

  it("trims leading blanks (an item launched mid-year) and forecasts", () => {
    const y = monthly(48);
    for (let t = 0; t < 7; t++) y[t] = NaN;
    const m = fitModel(y, { period: 12, seasonality: "additive", trend: "damped" });
    expect(m.start.detail!.skipped).toBe(7);
    expect(m.start.firstUpdate).toBe(7 + 24);
    expect(forecastModel(m, 12).every(Number.isFinite)).toBe(true);
    expect(forecastModel(fitModel(y, { period: 12, seasonality: "auto", trend: "auto" }), 12).every(Number.isFinite)).toBe(true);
  });

  it("forecasts with two blank months in one year of the start window", () => {
    const y = monthly(48);
    y[4] = NaN;
    y[5] = NaN;
    for (const seasonality of ["multiplicative", "additive"] as const) {
      const m = fitModel(y, { period: 12, seasonality, trend: "linear" });
      expect(m.start.detail!.filled!.at).toEqual([4, 5]);
      expect(forecastModel(m, 18).every(Number.isFinite)).toBe(true);
    }
  });

  it("forecasts when one season position is blank in every year", () => {
    const y = monthly(48);
    for (let t = 2; t < 48; t += 12) y[t] = NaN;
    const m = fitModel(y, { period: 12, seasonality: "multiplicative", trend: "damped" });
    expect(m.start.detail!.filled!.at).toEqual([2, 14]);
    expect(forecastModel(m, 12).every(Number.isFinite)).toBe(true);
    expect(forecastModel(fitModel(y, { period: 12, seasonality: "auto", trend: "auto" }), 12).every(Number.isFinite)).toBe(true);
  });

  it("forecasts a quarterly history with a blank in its first year", () => {
    const y = Float64Array.from([50, NaN, 70, 55, 54, 62, 75, 58, 57, 66, 79, 61, 60, 69, 83, 64]);
    expect(forecastModel(fitModel(y, { period: 4, seasonality: "auto", trend: "auto" }), 8).every(Number.isFinite)).toBe(true);
  });
});
