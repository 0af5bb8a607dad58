/**
 * Accuracy measures: worked cases checked by hand against the published definitions, the
 * error paths, and fast-check properties. error = actual - forecast throughout.
 */
import fc from "fast-check";
import {
  accuracyTable,
  bias,
  mad,
  mape,
  mase,
  maseScale,
  mse,
  rmse,
  smape,
  theilU,
  trackingSignal,
} from "../../src/engine/accuracy";
import { EbbError } from "../../src/engine/errors";

/** Runs fn and returns the EbbError it throws (fails the test if it throws nothing else). */
function thrown(fn: () => unknown): EbbError {
  try {
    fn();
  } catch (e) {
    if (e instanceof EbbError) return e;
    throw e;
  }
  throw new Error("expected an EbbError");
}

const FC = { seed: 20240611, numRuns: 300 };

describe("worked cases (hand calculations from the published definitions)", () => {
  // A small case used for several measures:
  //   actual   10, 12, 8
  //   forecast 11, 10, 8
  //   error    -1,  2, 0   (actual - forecast)
  const y = [10, 12, 8];
  const f = [11, 10, 8];

  test("MAD = mean |e|", () => {
    // (|-1| + |2| + |0|) / 3 = 3/3 = 1   (MAE, Hyndman & Koehler 2006)
    expect(mad(y, f)).toBe(1);
  });

  test("MSE = mean e^2 and RMSE = sqrt(MSE)", () => {
    // (1 + 4 + 0) / 3 = 5/3; RMSE = sqrt(5/3) = 1.2909944...
    expect(mse(y, f)).toBeCloseTo(5 / 3, 14);
    expect(rmse(y, f)).toBeCloseTo(Math.sqrt(5 / 3), 14);
  });

  test("bias = mean error, positive when forecasts run low", () => {
    // (-1 + 2 + 0) / 3 = 1/3   (mean error, ME, Hyndman & Koehler 2006)
    expect(bias(y, f)).toBeCloseTo(1 / 3, 14);
    // all under-forecasts -> positive bias
    expect(bias([10, 10], [8, 9])).toBe(1.5); // (2 + 1) / 2
  });

  test("MAPE in percent", () => {
    // 100/3 * (|-1/10| + |2/12| + 0) = 100/3 * (0.1 + 0.1666...) = 8.8888...
    expect(mape(y, f)).toBeCloseTo((100 / 3) * (0.1 + 2 / 12), 12);
    // 100 * mean(10/100, 20/200, 0/50) = 100 * 0.2/3 = 6.666...
    expect(mape([100, 200, 50], [110, 180, 50])).toBeCloseTo(20 / 3, 12);
  });

  test("sMAPE, M3 definition: mean of 200 |y - f| / (y + f)", () => {
    // Makridakis & Hibon (2000): sum |X - F| / ((X + F)/2) * 100, averaged.
    //   100 vs 110: 200 * 10 / 210 =  9.5238095...
    //   200 vs 180: 200 * 20 / 380 = 10.5263157...
    //    50 vs  50: 0
    //     0 vs   0: an exact forecast of zero, counted 0 (0/0 in the formula)
    //   mean = (9.5238095 + 10.5263157 + 0 + 0) / 4 = 5.0125313...
    const expected = ((200 * 10) / 210 + (200 * 20) / 380) / 4;
    expect(smape([100, 200, 50, 0], [110, 180, 50, 0])).toBeCloseTo(expected, 12);
    // Same case in the M3 paper's literal form |X - F| / ((X + F)/2) * 100 for the positive pairs:
    const m3 = ((10 / ((100 + 110) / 2)) * 100 + (20 / ((200 + 180) / 2)) * 100) / 4;
    expect(smape([100, 200, 50, 0], [110, 180, 50, 0])).toBeCloseTo(m3, 12);
    // (y, f) = (8, 10) and (10, 8) give the same term: 200 * 2 / 18 = 22.22...
    expect(smape([8], [10])).toBeCloseTo(400 / 18, 12);
    expect(smape([10], [8])).toBeCloseTo(400 / 18, 12);
    // A forecast of 0 for a positive actual is the 200% maximum.
    expect(smape([5], [0])).toBe(200);
    // Negative values: |y| + |f| in the denominator (M4 form), so the term stays in [0, 200]:
    // y = -10, f = 10: 200 * 20 / (10 + 10) = 200 (the M3 form would divide by 0 here).
    expect(smape([-10], [10])).toBe(200);
  });

  test("MASE, worked quarterly case (Hyndman & Koehler 2006, seasonal naive scale)", () => {
    // history (8 quarters) 20 30 40 25 | 22 33 44 27, p = 4
    // seasonal naive in-sample errors |h_t - h_{t-4}|: |22-20|=2, |33-30|=3, |44-40|=4, |27-25|=2
    // scale Q = (2 + 3 + 4 + 2) / (8 - 4) = 11/4 = 2.75
    // holdout actual 24 35 47 30, forecast 23 36 45 30 -> |e| = 1 1 2 0, MAE = 4/4 = 1
    // MASE = 1 / 2.75 = 0.363636...
    const history = [20, 30, 40, 25, 22, 33, 44, 27];
    const actual = [24, 35, 47, 30];
    const forecast = [23, 36, 45, 30];
    expect(maseScale(history, 4)).toBe(2.75);
    expect(mase(actual, forecast, history, 4)).toBeCloseTo(1 / 2.75, 14);
    // p = 1, the naive forecast: |30-20| + |40-30| + |25-40| + |22-25| + |33-22| + |44-33| + |27-44|
    //   = 10 + 10 + 15 + 3 + 11 + 11 + 17 = 77 over 7 pairs -> Q = 11; MASE = 1/11
    expect(maseScale(history, 1)).toBe(11);
    expect(mase(actual, forecast, history, 1)).toBeCloseTo(1 / 11, 14);
  });

  test("MASE skips missing values in the history pair by pair", () => {
    // history 10 20 30 NaN 10, p = 2: pairs (t=2: |30-10|=20), (t=3: missing), (t=4: |10-30|=20)
    // Q = 40/2 = 20; MAE of actual 25 vs forecast 20 = 5; MASE = 5/20 = 0.25
    expect(mase([25], [20], [10, 20, 30, NaN, 10], 2)).toBe(0.25);
  });

  test("MASE with period 0 detects the season length from the history", () => {
    // 6 repeats of the quarter pattern 10 20 30 40 plus +1 per season: period 4 is detected,
    // and every seasonal difference is exactly 1, so Q = 1 and MASE = MAE.
    const history: number[] = [];
    for (let s = 0; s < 6; s++) history.push(10 + s, 20 + s, 30 + s, 40 + s);
    expect(mase([17], [15], history, 0)).toBeCloseTo(2, 12);
    expect(mase([17], [15], history)).toBeCloseTo(2, 12);
  });

  test("tracking signal: running sum of errors over running MAD", () => {
    // errors -1, 2, 0
    // t1: sum -1, MAD 1/1     -> -1
    // t2: sum  1, MAD 3/2     -> 1/1.5 = 0.6667
    // t3: sum  1, MAD 3/3 = 1 -> 1
    const ts = trackingSignal(y, f, "running");
    expect(ts).toBeInstanceOf(Float64Array);
    expect(ts.length).toBe(3);
    expect(ts[0]).toBe(-1);
    expect(ts[1]).toBeCloseTo(2 / 3, 14);
    expect(ts[2]).toBe(1);
  });

  test("tracking signal: 0 while the running MAD is 0, held through missing periods", () => {
    // errors 0, 0, (missing), 3, -1
    // t1, t2: MAD 0 -> 0; t3: missing, keeps 0; t4: sum 3, MAD 3/3 = 1 -> 3;
    // t5: sum 2, MAD 4/4 = 1 -> 2
    const ts = trackingSignal([5, 5, NaN, 8, 4], [5, 5, 6, 5, 5], "running");
    expect(Array.from(ts)).toEqual([0, 0, 0, 3, 2]);
  });

  test("tracking signal of a steadily low forecast climbs to the number of periods", () => {
    // every error +2: sum 2k, MAD 2 -> k at period k (the +/-4 limit is passed at period 5)
    expect(Array.from(trackingSignal([12, 12, 12, 12, 12], [10, 10, 10, 10, 10], "running"))).toEqual([1, 2, 3, 4, 5]);
  });

  test("Theil's U2 (Makridakis, Wheelwright & Hyndman 1998)", () => {
    // actual 100 110 99, forecast - 105 104.5
    // t=1: ((105 - 110)/100)^2 = 0.0025, ((110 - 100)/100)^2 = 0.01
    // t=2: ((104.5 - 99)/110)^2 = 0.0025, ((99 - 110)/110)^2 = 0.01
    // U2 = sqrt(0.005 / 0.02) = 0.5
    expect(theilU([100, 110, 99], [NaN, 105, 104.5])).toBeCloseTo(0.5, 14);
    // With the small case: t=1: ((10-12)/10)^2 = 0.04 over ((12-10)/10)^2 = 0.04;
    // t=2: ((8-8)/12)^2 = 0 over ((8-12)/12)^2 = 1/9. U2 = sqrt(0.04 / (0.04 + 1/9)) = 0.51450
    expect(theilU(y, f)).toBeCloseTo(Math.sqrt(0.04 / (0.04 + 1 / 9)), 14);
    // The naive forecast itself (f_{t+1} = y_t) scores exactly 1.
    expect(theilU([100, 110, 99, 120], [NaN, 100, 110, 99])).toBeCloseTo(1, 14);
  });
});

describe("missing values", () => {
  test("pairs where either side is missing are skipped", () => {
    // only periods 1 and 4 have both values: errors 1 and -3
    const a = [5, NaN, 7, 9];
    const g = [4, 6, NaN, 12];
    expect(mad(a, g)).toBe(2); // (1 + 3) / 2
    expect(bias(a, g)).toBe(-1); // (1 - 3) / 2
    expect(mse(a, g)).toBe(5); // (1 + 9) / 2
  });

  test("no pair left -> #N/A (not enough)", () => {
    for (const fn of [mad, mse, rmse, mape, smape, bias, trackingSignal]) {
      const e = thrown(() => fn([NaN, 1], [2, NaN]));
      expect(e.kind).toBe("na");
    }
    expect(thrown(() => mad([], [])).kind).toBe("na");
    expect(thrown(() => theilU([1, NaN, 3], [1, 2, NaN])).kind).toBe("na");
    expect(thrown(() => accuracyTable([NaN], [NaN])).kind).toBe("na");
  });
});

describe("bad input", () => {
  test("ranges of different size", () => {
    for (const fn of [mad, mse, rmse, mape, smape, bias, trackingSignal, theilU]) {
      const e = thrown(() => fn([1, 2, 3], [1, 2]));
      expect(e.kind).toBe("value");
      expect(e.message).toMatch(/must have the same number of cells/);
      expect(e.message).toMatch(/actual has 3, forecast has 2/);
    }
    expect(thrown(() => mase([1, 2], [1], [1, 2, 3], 1)).message).toMatch(/same number of cells/);
  });

  test("MAPE with an actual of 0 says why and what to use instead", () => {
    const e = thrown(() => mape([10, 0, 5], [9, 1, 5]));
    expect(e.kind).toBe("value");
    expect(e.code).toBe("mape-zero-actual");
    expect(e.message).toMatch(/MAPE is undefined when an actual is 0/);
    expect(e.message).toMatch(/sMAPE or MAD/);
    // A zero actual whose forecast is missing is skipped, so MAPE is defined.
    expect(mape([10, 0], [9, NaN])).toBeCloseTo(10, 12);
  });

  test("MASE with a flat history (scale 0) is #VALUE!", () => {
    // every value equals the one a season earlier -> seasonal naive is exact -> Q = 0
    const e = thrown(() => mase([5], [4], [1, 2, 1, 2, 1, 2], 2));
    expect(e.kind).toBe("value");
    expect(e.code).toBe("mase-flat-history");
    expect(thrown(() => mase([5], [4], [7, 7, 7, 7], 1)).code).toBe("mase-flat-history");
  });

  test("MASE: history shorter than one season plus one is #N/A; a bad period is #VALUE!", () => {
    expect(thrown(() => mase([5], [4], [1, 2, 3, 4], 4)).kind).toBe("na");
    expect(thrown(() => mase([5], [4], [1, 2, 3, 4], 1.5)).kind).toBe("value");
    expect(thrown(() => mase([5], [4], [1, 2, 3, 4], -1)).kind).toBe("value");
  });

  test("Theil's U2 with a zero divisor or unchanging actuals is #VALUE!", () => {
    expect(thrown(() => theilU([0, 1, 2], [0, 1, 2])).code).toBe("theil-zero-actual");
    expect(thrown(() => theilU([3, 3, 3], [3, 2, 4])).code).toBe("theil-flat-actuals");
  });

  test("infinite values are refused", () => {
    expect(thrown(() => mad([1, Infinity], [1, 2])).kind).toBe("value");
    expect(thrown(() => smape([1, 2], [-Infinity, 2])).kind).toBe("value");
  });

  test("overflow is reported instead of returning Infinity", () => {
    // (1e200 - (-1e200))^2 overflows double precision
    const e = thrown(() => mse([1e200], [-1e200]));
    expect(e.kind).toBe("value");
    expect(e.code).toBe("overflow");
    // RMSE is computed on scaled errors, so it stays finite: sqrt(mean(4e400)) = 2e200
    expect(rmse([1e200], [-1e200])).toBeCloseTo(2e200, -190);
  });
});

describe("accuracyTable (EBB.ACCURACY)", () => {
  test("rows, order and values", () => {
    const rows = accuracyTable([10, 12, 8], [11, 10, 8]);
    expect(rows.map((r) => r[0])).toEqual(["MAD", "MSE", "RMSE", "MAPE (%)", "sMAPE (%)", "Bias", "Tracking signal", "Theil's U2"]);
    const v = Object.fromEntries(rows) as Record<string, number>;
    // the hand values of the worked cases above
    expect(v["MAD"]).toBe(1);
    expect(v["MSE"]).toBeCloseTo(5 / 3, 14);
    expect(v["RMSE"]).toBeCloseTo(Math.sqrt(5 / 3), 14);
    expect(v["MAPE (%)"]).toBeCloseTo((100 / 3) * (0.1 + 2 / 12), 12);
    // sMAPE: (200*1/21 + 200*2/22 + 0) / 3 = 9.2352...
    expect(v["sMAPE (%)"]).toBeCloseTo((200 / 21 + 400 / 22) / 3, 12);
    expect(v["Bias"]).toBeCloseTo(1 / 3, 14);
    // Three errors are too few for the windowed signal: its row says so (#N/A) instead of a number.
    expect((v["Tracking signal"] as unknown as EbbError).kind).toBe("na");
    expect(v["Theil's U2"]).toBeCloseTo(Math.sqrt(0.04 / (0.04 + 1 / 9)), 14);
  });

  test("the tracking signal row is the signal at the last period with both values, not at blank rows below it", () => {
    // Hand case of the windowed signal: errors 1, -1, 1, -1, 1, -1, then 2 six times; MAD before the window 1,
    // window sum 12, so 12 / (sqrt(pi/2) x 1 x sqrt(6)) = 3.9088 (the definition in tracking.ts, Harrison & Davies 1964).
    const errors = [1, -1, 1, -1, 1, -1, 2, 2, 2, 2, 2, 2];
    const forecast = errors.map(() => 100);
    const actual = errors.map((e) => 100 + e);
    const expected = 12 / (Math.sqrt(Math.PI / 2) * Math.sqrt(6));
    const at = (rows: ReturnType<typeof accuracyTable>) => rows.find((r) => r[0] === "Tracking signal")![1] as number;
    expect(at(accuracyTable(actual, forecast))).toBeCloseTo(expected, 12);
    // A rolling sheet's ranges reach below the data: six blank rows must not blank the signal.
    const pad = (v: number[]) => [...v, ...new Array(6).fill(NaN)];
    expect(at(accuracyTable(pad(actual), pad(forecast)))).toBeCloseTo(expected, 12);
  });

  test("MASE row when a history is given", () => {
    const rows = accuracyTable([24, 35, 47, 30], [23, 36, 45, 30], [20, 30, 40, 25, 22, 33, 44, 27], 4);
    expect(rows[rows.length - 1][0]).toBe("MASE");
    expect(rows[rows.length - 1][1]).toBeCloseTo(1 / 2.75, 14);
  });

  test("a measure undefined for these data shows its own error; the others still show", () => {
    const rows = accuracyTable([10, 0, 8], [11, 10, 8], [3, 3, 3, 3], 1);
    const byName = new Map(rows);
    expect(byName.get("MAD")).toBeCloseTo(11 / 3, 14);
    const mapeCell = byName.get("MAPE (%)");
    expect(mapeCell).toBeInstanceOf(EbbError);
    expect((mapeCell as EbbError).message).toMatch(/sMAPE or MAD/);
    expect(byName.get("Theil's U2")).toBeInstanceOf(EbbError);
    expect((byName.get("MASE") as EbbError).code).toBe("mase-flat-history");
    for (const [, value] of rows) {
      if (typeof value === "number") expect(Number.isFinite(value)).toBe(true);
    }
  });

  test("whole-table problems throw", () => {
    expect(thrown(() => accuracyTable([1, 2], [1])).message).toMatch(/same number of cells/);
  });
});

describe("properties (fast-check)", () => {
  const moderate = fc.double({ min: -1e9, max: 1e9, noNaN: true, noDefaultInfinity: true });
  const pairsArb = (value: fc.Arbitrary<number>) => fc.array(fc.tuple(value, value), { minLength: 1, maxLength: 40 });
  const split = (p: [number, number][]): [number[], number[]] => [p.map((x) => x[0]), p.map((x) => x[1])];

  test("every measure is finite for finite inputs of spreadsheet size", () => {
    fc.assert(
      fc.property(pairsArb(moderate), (p) => {
        const [a, g] = split(p);
        for (const v of [mad(a, g), mse(a, g), rmse(a, g), smape(a, g), bias(a, g), ...trackingSignal(a, g, "running"), ...trackingSignal(a, g).filter((v) => !Number.isNaN(v))]) {
          expect(Number.isFinite(v)).toBe(true);
        }
      }),
      FC,
    );
  });

  test("MAPE is finite when no actual is 0", () => {
    const nonZero = moderate.filter((x) => Math.abs(x) >= 1e-6);
    fc.assert(
      fc.property(fc.array(fc.tuple(nonZero, moderate), { minLength: 1, maxLength: 40 }), (p) => {
        const [a, g] = split(p);
        expect(Number.isFinite(mape(a, g))).toBe(true);
      }),
      FC,
    );
  });

  test("for any finite doubles at all, a measure returns a finite number or an EbbError, never NaN or Infinity", () => {
    const anyDouble = fc.double({ noNaN: true, noDefaultInfinity: true });
    const history = fc.array(anyDouble, { minLength: 0, maxLength: 30 });
    fc.assert(
      fc.property(pairsArb(anyDouble), history, fc.integer({ min: 1, max: 6 }), (p, h, period) => {
        const [a, g] = split(p);
        const measures: (() => number | Float64Array)[] = [
          () => mad(a, g),
          () => mse(a, g),
          () => rmse(a, g),
          () => mape(a, g),
          () => smape(a, g),
          () => bias(a, g),
          () => trackingSignal(a, g, "running"),
          // The windowed signal marks "not yet defined" with NaN (a blank cell); every defined value is finite.
          () => trackingSignal(a, g).filter((v) => !Number.isNaN(v)),
          () => theilU(a, g),
          () => mase(a, g, h, period),
        ];
        for (const m of measures) {
          let out: number | Float64Array;
          try {
            out = m();
          } catch (e) {
            expect(e).toBeInstanceOf(EbbError);
            continue;
          }
          for (const v of typeof out === "number" ? [out] : Array.from(out)) expect(Number.isFinite(v)).toBe(true);
        }
        for (const [, v] of accuracyTable(a, g, h, period)) {
          if (typeof v === "number") expect(Number.isFinite(v)).toBe(true);
          else expect(v).toBeInstanceOf(EbbError);
        }
      }),
      FC,
    );
  });

  test("MAD scales with the data: MAD(c*y, c*f) = c * MAD(y, f) for c > 0", () => {
    const c = fc.double({ min: 1e-3, max: 1e3, noNaN: true });
    fc.assert(
      fc.property(pairsArb(moderate), c, (p, k) => {
        const [a, g] = split(p);
        const scaled = mad(
          a.map((x) => k * x),
          g.map((x) => k * x),
        );
        const base = k * mad(a, g);
        expect(Math.abs(scaled - base)).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(base)));
      }),
      FC,
    );
  });

  test("MAPE is scale-invariant: MAPE(c*y, c*f) = MAPE(y, f)", () => {
    const nonZero = moderate.filter((x) => Math.abs(x) >= 1e-3);
    const c = fc.double({ min: 1e-3, max: 1e3, noNaN: true });
    fc.assert(
      fc.property(fc.array(fc.tuple(nonZero, moderate), { minLength: 1, maxLength: 40 }), c, (p, k) => {
        const [a, g] = split(p);
        const scaled = mape(
          a.map((x) => k * x),
          g.map((x) => k * x),
        );
        const base = mape(a, g);
        expect(Math.abs(scaled - base)).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(base)));
      }),
      FC,
    );
  });

  test("sMAPE lies in [0, 200]; RMSE >= MAD >= |bias|; |tracking signal| <= number of errors so far", () => {
    fc.assert(
      fc.property(pairsArb(moderate), (p) => {
        const [a, g] = split(p);
        const s = smape(a, g);
        expect(s).toBeGreaterThanOrEqual(0);
        expect(s).toBeLessThanOrEqual(200 + 1e-9);
        const m = mad(a, g);
        expect(rmse(a, g)).toBeGreaterThanOrEqual(m * (1 - 1e-12));
        expect(m).toBeGreaterThanOrEqual(Math.abs(bias(a, g)) * (1 - 1e-12));
        trackingSignal(a, g, "running").forEach((v, i) => expect(Math.abs(v)).toBeLessThanOrEqual(i + 1 + 1e-9));
      }),
      FC,
    );
  });

  test("Theil's U2 of the naive forecast is 1", () => {
    const positive = fc.double({ min: 1, max: 1e6, noNaN: true });
    fc.assert(
      fc.property(fc.array(positive, { minLength: 2, maxLength: 40 }), (a) => {
        fc.pre(a.some((x, i) => i > 0 && x !== a[i - 1]));
        const naive = [NaN, ...a.slice(0, -1)];
        expect(theilU(a, naive)).toBeCloseTo(1, 9);
      }),
      FC,
    );
  });
});
