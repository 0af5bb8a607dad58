/**
 * The windowed tracking signal, the review list (EBB.WATCH's engine) and forecast value added,
 * against hand calculations from their published definitions.
 */
import { fitModel, forecastModel, forecastValueAdded, holdoutScore, parseFvaMeasure, parseTrackingForm, TRACKING_LIMIT, trackingSignal, watchSeries, windowSignal } from "../../src/engine";
import { EbbError } from "../../src/engine/errors";
import { seededNormal } from "../../src/engine/random";

const SQRT_HALF_PI = Math.sqrt(Math.PI / 2);

describe("windowed tracking signal (backward CUSUM over 6 periods, Harrison & Davies 1964)", () => {
  test("hand-computed case: errors +1, -1 alternating for six periods, then +2 for six", () => {
    // forecast 10 throughout; actuals give errors 1,-1,1,-1,1,-1, 2,2,2,2,2,2
    const errors = [1, -1, 1, -1, 1, -1, 2, 2, 2, 2, 2, 2];
    const actual = errors.map((e) => 10 + e);
    const forecast = errors.map(() => 10);
    const ts = trackingSignal(actual, forecast);
    // Periods 1-11: fewer than 6 errors precede the 6-period window: not yet defined.
    for (let t = 0; t < 11; t++) expect(ts[t]).toBeNaN();
    // Period 12: window = periods 7-12, sum 12; MAD of periods 1-6 = 1;
    // TS = 12 / (sqrt(pi/2) * 1 * sqrt(6)) = 12 / (1.253314 * 2.449490) = 3.9088
    expect(ts[11]).toBeCloseTo(12 / (SQRT_HALF_PI * Math.sqrt(6)), 12);
    expect(ts[11]).toBeCloseTo(3.9088, 4);
    expect(ts[11]).toBeGreaterThan(TRACKING_LIMIT);
  });

  test("one more period and a missing one: the window counts the errors present", () => {
    // errors 1,-1,1,-1,1,-1, 2,2,2,2,2,2, (missing), -3
    const errors = [1, -1, 1, -1, 1, -1, 2, 2, 2, 2, 2, 2, NaN, -3];
    const ts = windowSignal(errors);
    // Period 13 (missing): window 8-13 holds 5 errors, sum 10; MAD of periods 1-7 = (6 + 2) / 7
    expect(ts[12]).toBeCloseTo(10 / (SQRT_HALF_PI * (8 / 7) * Math.sqrt(5)), 12);
    // Period 14: window 9-14 holds 5 errors (2,2,2,2,-3), sum 5; MAD of periods 1-8 = (6 + 4) / 8
    expect(ts[13]).toBeCloseTo(5 / (SQRT_HALF_PI * (10 / 8) * Math.sqrt(5)), 12);
  });

  test("published property: on independent normal errors it is standard normal, so |TS| > 2.2 on about 2.78% of periods", () => {
    // 2 * (1 - Phi(2.2)) = 0.0278 from the normal table. Seeded draws; 40,000 periods.
    const z = seededNormal(12);
    const errors = Float64Array.from({ length: 40000 }, () => 5 * z());
    const ts = Array.from(windowSignal(errors)).filter((v) => !Number.isNaN(v));
    const mean = ts.reduce((s, v) => s + v, 0) / ts.length;
    const sd = Math.sqrt(ts.reduce((s, v) => s + (v - mean) ** 2, 0) / ts.length);
    const share = ts.filter((v) => Math.abs(v) > TRACKING_LIMIT).length / ts.length;
    expect(Math.abs(mean)).toBeLessThan(0.05);
    expect(sd).toBeGreaterThan(0.96);
    expect(sd).toBeLessThan(1.04);
    expect(share).toBeGreaterThan(0.02);
    expect(share).toBeLessThan(0.036);
  });

  test("unlike the running form, it does not grow with time on unbiased errors", () => {
    // The running sum over the running MAD is a random walk scaled by a constant: by period
    // 400 its typical size is about sqrt(400) / 1.25 = 16, far past +/-4; the window stays near 1.
    const z = seededNormal(3);
    const errors = Float64Array.from({ length: 400 }, () => z());
    const actual = Array.from(errors, (e) => 100 + e);
    const forecast = Array.from(errors, () => 100);
    let runningOutside = 0;
    let windowOutside = 0;
    for (let s = 0; s < 50; s++) {
      const shift = Array.from(errors, (_, i) => errors[(i + 7 * s) % 400]);
      const a = shift.map((e) => 100 + e);
      const run = trackingSignal(a, forecast, "running");
      const win = trackingSignal(a, forecast);
      if (Math.abs(run[399]) > 4) runningOutside++;
      if (Math.abs(win[399]) > TRACKING_LIMIT) windowOutside++;
    }
    expect(actual.length).toBe(400);
    expect(runningOutside).toBeGreaterThan(10);
    expect(windowOutside).toBeLessThan(6);
  });

  test("form words", () => {
    expect(parseTrackingForm(undefined)).toBe("window");
    expect(parseTrackingForm(" Running ")).toBe("running");
    expect(() => parseTrackingForm("cumulative")).toThrow(/window.*running/);
  });
});

describe("forecast value added (Gilliland 2002)", () => {
  // Hand case, period 3. Periods 4-6 are compared (the first season has no seasonal naive).
  //   actual   10 20 30 | 12 18 33
  //   naive     -  -  - | 10 20 30   errors  2 -2  3
  //   model    11 19 31 | 13 17 31   errors -1  1  2
  //   adjusted  -  -  - | 12 20 30   errors  0 -2  3
  const actual = [10, 20, 30, 12, 18, 33];
  const model = [11, 19, 31, 13, 17, 31];
  const adjusted = [NaN, NaN, NaN, 12, 20, 30];

  test("MAD: naive 7/3, model 4/3, adjusted 5/3; the model adds 1, the adjustment takes away 1/3", () => {
    const r = forecastValueAdded(actual, model, adjusted, "mad", 3);
    expect(r.count).toBe(3);
    expect(r.steps.map((s) => s.step)).toEqual(["seasonal naive", "model", "adjusted"]);
    expect(r.steps[0].value).toBeCloseTo(7 / 3, 14);
    expect(r.steps[1].value).toBeCloseTo(4 / 3, 14);
    expect(r.steps[2].value).toBeCloseTo(5 / 3, 14);
    expect(r.steps[0].overPrevious).toBeNaN();
    expect(r.steps[1].overPrevious).toBeCloseTo(1, 14);
    expect(r.steps[2].overPrevious).toBeCloseTo(-1 / 3, 14);
    expect(r.steps[2].overNaive).toBeCloseTo(2 / 3, 14);
  });

  test("MAPE in percent: naive 100*(2/12 + 2/18 + 3/33)/3", () => {
    const r = forecastValueAdded(actual, model, adjusted, "mape", 3);
    const naive = (100 * (2 / 12 + 2 / 18 + 3 / 33)) / 3;
    const fitted = (100 * (1 / 12 + 1 / 18 + 2 / 33)) / 3;
    const final = (100 * (0 / 12 + 2 / 18 + 3 / 33)) / 3;
    expect(r.steps[0].value).toBeCloseTo(naive, 12);
    expect(r.steps[1].overPrevious).toBeCloseTo(naive - fitted, 12);
    expect(r.steps[2].overPrevious).toBeCloseTo(fitted - final, 12);
  });

  test("bias: mean errors 1, 2/3, 1/3; value added is the drop in the size of the lean", () => {
    const r = forecastValueAdded(actual, model, adjusted, "bias", 3);
    expect(r.steps.map((s) => s.value).map((v) => +v.toFixed(12))).toEqual([1, +(2 / 3).toFixed(12), +(1 / 3).toFixed(12)]);
    expect(r.steps[1].overPrevious).toBeCloseTo(1 / 3, 14);
    expect(r.steps[2].overPrevious).toBeCloseTo(1 / 3, 14);
    // A lean the other way counts by its size: errors -1 for the model against +1 for naive adds nothing.
    const flip = forecastValueAdded([1, 1, 2], [0, 0, 3], [0, 0, 2], "bias", 2);
    // period 3 only: naive 1 (error 1), model 3 (error -1), adjusted 2 (error 0)
    expect(flip.steps[1].overPrevious).toBeCloseTo(0, 14);
    expect(flip.steps[2].overPrevious).toBeCloseTo(1, 14);
  });

  test("MASE: scaled by the actuals' in-sample seasonal naive MAE (7/3 here), so naive scores 1", () => {
    // Hyndman & Koehler (2006): scale = mean |y_t - y_{t-3}| over t = 4..6 = (2 + 2 + 3) / 3
    const r = forecastValueAdded(actual, model, adjusted, "mase", 3);
    expect(r.steps[0].value).toBeCloseTo(1, 14);
    expect(r.steps[1].value).toBeCloseTo(4 / 7, 14);
    expect(r.steps[2].value).toBeCloseTo(5 / 7, 14);
  });

  test("clear errors: sizes, no comparable period, zero actual with MAPE, unknown measure", () => {
    expect(() => forecastValueAdded([1, 2], [1], [1, 2], "mad", 1)).toThrow(/same number of cells/);
    const none = (() => {
      try {
        forecastValueAdded([1, 2, 3], [1, 2, 3], [1, 2, 3], "mad", 3);
      } catch (e) {
        return e;
      }
    })();
    expect(none).toBeInstanceOf(EbbError);
    expect((none as EbbError).kind).toBe("na");
    expect(() => forecastValueAdded([1, 0, 3], [1, 2, 3], [1, 2, 3], "mape", 1)).toThrow(/MAPE is undefined.*cell 2/);
    expect(parseFvaMeasure("MASE")).toBe("mase");
    expect(() => parseFvaMeasure("rmse")).toThrow(/MAD.*MAPE.*MASE.*bias/);
  });
});

describe("review list (EBB.WATCH's engine)", () => {
  // An invented seasonal series, 6 years monthly, mild noise; seeded.
  const z = seededNormal(77);
  const shape = [0.6, 0.7, 0.9, 1.2, 1.5, 1.6, 1.4, 1.2, 1.0, 0.8, 0.6, 0.5];
  const base = Array.from({ length: 72 }, (_, t) => 500 * shape[t % 12] * (1 + 0.04 * z()));

  test("a steady series is ok, with a small signal and a recent bias near 0", () => {
    const r = watchSeries(base, { period: 12 });
    expect(r.status).toBe("ok");
    expect(Math.abs(r.signal)).toBeLessThanOrEqual(TRACKING_LIMIT);
    expect(Math.abs(r.biasPercent)).toBeLessThan(5);
    expect(r.outside).toBeGreaterThanOrEqual(0);
    expect(r.outside).toBeLessThanOrEqual(6);
  });

  test("sales 30% above normal for the last five months: forecast too low", () => {
    const stepped = base.map((v, t) => (t >= 67 ? v * 1.3 : v));
    const r = watchSeries(stepped, { period: 12 });
    expect(r.status).toBe("forecast too low");
    expect(r.signal).toBeGreaterThan(TRACKING_LIMIT);
    expect(r.biasPercent).toBeGreaterThan(5);
  });

  test("sales 30% below: forecast too high", () => {
    const r = watchSeries(base.map((v, t) => (t >= 67 ? v * 0.7 : v)), { period: 12 });
    expect(r.status).toBe("forecast too high");
    expect(r.signal).toBeLessThan(-TRACKING_LIMIT);
  });

  test("too short for a fit, or for the signal", () => {
    expect(watchSeries(base.slice(0, 20), { period: 12 }).status).toBe("too short");
    // 30 values: the fit works (two seasons) but only 6 errors follow the start window.
    const r = watchSeries(base.slice(0, 30), { period: 12 });
    expect(r.status).toBe("too short");
    expect(r.signal).toBeNaN();
  });

  test("MASE is that of the last season forecast from the history before it (the engine's holdout score)", () => {
    const r = watchSeries(base, { period: 12 });
    expect(r.mase).toBeCloseTo(holdoutScore(base, { period: 12, seasonality: "multiplicative", trend: "linear" }, 12).mase, 10);
  });

  test("the naive test: up to three seasons, each forecast from a refit before it, against the same month a year earlier, also when the model finds no season", () => {
    // Invented: a level near 300 with noise and no seasonal pattern, 8 years monthly; the automatic model takes no season.
    const zz = seededNormal(5);
    const flat = Array.from({ length: 96 }, () => 300 + 20 * zz());
    const options = { period: 12, seasonality: "auto" as const, trend: "auto" as const };
    const spec = fitModel(flat, options).spec;
    expect(spec.seasonality).toBe("none");
    // By the definition: origins 84, 72 and 60; each season refitted (same form) on the values before it.
    let model = 0;
    let naive = 0;
    for (const origin of [84, 72, 60]) {
      const f = forecastModel(fitModel(flat.slice(0, origin), { period: spec.period, seasonality: spec.seasonality, trend: spec.trend }), 12);
      for (let i = 0; i < 12; i++) {
        model += Math.abs(flat[origin + i] - f[i]);
        naive += Math.abs(flat[origin + i] - flat[origin + i - 12]);
      }
    }
    expect(watchSeries(flat, options).naiveRatio).toBeCloseTo(model / naive, 12);
  });

  test("worse than seasonal naive: a jumpy model on a season that nearly repeats", () => {
    // Every year the same twelve values, give or take 15 units every seventh month. Seasonal naive
    // (one year back) is off by at most 15; a model told to chase every value (alpha 0.9, beta 0.3)
    // carries each small bump into its whole next season.
    const exact = Array.from({ length: 72 }, (_, t) => 500 * shape[t % 12] + (t % 7 === 0 ? 15 : 0));
    const r = watchSeries(exact, { period: 12, alpha: 0.9, beta: 0.3 });
    expect(Math.abs(r.signal)).toBeLessThanOrEqual(TRACKING_LIMIT);
    expect(r.naiveRatio).toBeGreaterThan(1.1);
    expect(r.status).toBe("worse than seasonal naive");
    // The fitted model on the same data is as good as seasonal naive: ok.
    expect(watchSeries(exact, { period: 12 }).status).toBe("ok");
  });
});
