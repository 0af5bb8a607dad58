/**
 * Each spilling function on the embedded formula engine returns what the engine computes for
 * the same history and options (the worksheet layer only shapes the result), on the invented
 * Larkmere demo data; and the accuracy functions against hand calculations.
 */
import {
  decompositionStart,
  fitModel,
  modelStates,
  predictionInterval,
  rollingBacktest,
  cleanHistory,
} from "../../src/engine";
import { readDemo } from "./support/demo";
import { block, type Cell, gridFromColumns, value, workbook } from "./support/workbook";

const demo = readDemo();
const twoProducts = [demo.columns[0], demo.columns[2]]; // seed trays (multiplicative), bird feed (additive shape)
const nanToNull = (v: number) => (Number.isNaN(v) ? null : v);

function sheetWith(formula: string): { hf: ReturnType<typeof workbook>["hf"]; sheet: number } {
  const grid = gridFromColumns(twoProducts, 84);
  grid[0][3] = formula; // D1
  return workbook(grid);
}

test("EBB.FIT: words, constants and errors of each series' fitted model", () => {
  const { hf, sheet } = sheetWith('=EBB.FIT(A1:B84, 12, "additive", "damped")');
  const out = block(hf, sheet, "D1", 9, 2);
  twoProducts.forEach((col, c) => {
    const m = fitModel(col, { period: 12, seasonality: "additive", trend: "damped" });
    const expected = [m.spec.seasonality, m.spec.trend, m.constants.alpha, m.constants.beta, m.constants.gamma, m.constants.phi, m.sse, m.rmse, m.aicc];
    expect(out.map((r) => r[c])).toEqual(expected);
  });
});

test("EBB.FIT with trend none leaves beta and phi blank (they do not exist in that model)", () => {
  const { hf, sheet } = sheetWith('=EBB.FIT(A1:A84, 12, "multiplicative", "none")');
  const out = block(hf, sheet, "D1", 9, 1).map((r) => r[0]);
  expect(out[1]).toBe("none");
  expect(out[3]).toBeNull();
  expect(out[5]).toBeNull();
});

test("EBB.STATES: five columns per series, blank in the start window", () => {
  const { hf, sheet } = sheetWith("=EBB.STATES(A1:B84, 12)");
  const out = block(hf, sheet, "D1", 84, 10);
  twoProducts.forEach((col, c) => {
    const t = modelStates(fitModel(col, { period: 12 }));
    for (let i = 0; i < 84; i++) {
      expect(out[i].slice(5 * c, 5 * c + 5)).toEqual([t.level[i], t.trend[i], t.index[i], t.forecast[i], t.error[i]].map(nanToNull));
    }
  });
  expect(out[0]).toEqual(new Array(10).fill(null));
});

test("EBB.FITTED: the one-step forecasts of EBB.STATES, aligned with the history", () => {
  const { hf, sheet } = sheetWith("=EBB.FITTED(A1:B84, 12, 0.2, 0.05, 0.1)");
  const out = block(hf, sheet, "D1", 84, 2);
  twoProducts.forEach((col, c) => {
    const t = modelStates(fitModel(col, { period: 12, alpha: 0.2, beta: 0.05, gamma: 0.1 }));
    expect(out.map((r) => r[c])).toEqual(Array.from(t.forecast, nanToNull));
  });
});

test("EBB.BAND: low and high of the prediction interval, two columns per series", () => {
  const { hf, sheet } = sheetWith('=EBB.BAND(A1:B84, 12, 4, 0.8, "additive")');
  const out = block(hf, sheet, "D1", 4, 4);
  twoProducts.forEach((col, c) => {
    const band = predictionInterval(fitModel(col, { period: 12, seasonality: "additive" }), 4, 0.8);
    expect(out.map((r) => r[2 * c])).toEqual(Array.from(band.low));
    expect(out.map((r) => r[2 * c + 1])).toEqual(Array.from(band.high));
  });
});

test("EBB.BAND: coverage as a percentage (80) gives the same interval as the fraction (0.8)", () => {
  const fraction = sheetWith('=EBB.BAND(A1:B84, 12, 4, 0.8, "additive")');
  const percent = sheetWith('=EBB.BAND(A1:B84, 12, 4, 80, "additive")');
  expect(block(percent.hf, percent.sheet, "D1", 4, 4)).toEqual(block(fraction.hf, fraction.sheet, "D1", 4, 4));
});

test("EBB.BACKTEST: MAD, MAPE, MASE and origins per step ahead", () => {
  const { hf, sheet } = sheetWith("=EBB.BACKTEST(A1:A84, 12, 3, 4)");
  const out = block(hf, sheet, "D1", 3, 4);
  const rows = rollingBacktest(twoProducts[0], { period: 12 }, 3, 4);
  expect(out).toEqual(rows.map((r) => [r.mad, r.mape, r.mase, r.origins].map(nanToNull)));
});

test("EBB.INIT: the decomposition start's level, trend and indices", () => {
  const { hf, sheet } = sheetWith('=EBB.INIT(A1:A84, 12, "multiplicative", 3)');
  const out = block(hf, sheet, "D1", 15, 1).map((r) => r[0]);
  const s = decompositionStart(cleanHistory(twoProducts[0]), 12, "multiplicative", "linear", 3).state;
  expect(out).toEqual([s.level, s.trend, ...Array.from(s.indices), null]); // 2 + p rows, then nothing
});

test("EBB.PERIOD detects 12 months in each demo product", () => {
  const grid = gridFromColumns(demo.columns, 84);
  grid[0][6] = "=EBB.PERIOD(A1:E84)";
  const { hf, sheet } = workbook(grid);
  expect(block(hf, sheet, "G1", 1, 5)).toEqual([[12, 12, 12, 12, 12]]);
});

describe("accuracy functions, by hand", () => {
  // actual 10, 12, 8 and a blank; forecast 11, 10, 8, 9: errors -1, 2, 0 (the blank period is skipped)
  const grid: Cell[][] = [
    [10, 11, "=EBB.MAD(A1:A4, B1:B4)", "=EBB.MSE(A1:A4, B1:B4)", "=EBB.RMSE(A1:A4, B1:B4)", "=EBB.BIAS(A1:A4, B1:B4)"],
    [12, 10, "=EBB.MAPE(A1:A4, B1:B4)", "=EBB.SMAPE(A1:A4, B1:B4)", "=EBB.ACCURACY(A1:A4, B1:B4)", null],
    [8, 8, "=EBB.TRACKING(A1:A4, B1:B4, \"running\")", null, null, null],
    [null, 9, null, null, null, null],
  ];
  const { hf, sheet } = workbook(grid);

  test("MAD (1+2+0)/3 = 1, MSE 5/3, RMSE sqrt(5/3), bias 1/3", () => {
    expect(value(hf, sheet, "C1")).toBeCloseTo(1, 12);
    expect(value(hf, sheet, "D1")).toBeCloseTo(5 / 3, 12);
    expect(value(hf, sheet, "E1")).toBeCloseTo(Math.sqrt(5 / 3), 12);
    expect(value(hf, sheet, "F1")).toBeCloseTo(1 / 3, 12);
  });

  test("MAPE 100*(1/10 + 2/12 + 0)/3; sMAPE (M3) 200/3 * (1/21 + 2/22)", () => {
    expect(value(hf, sheet, "C2")).toBeCloseTo((100 * (0.1 + 2 / 12)) / 3, 10);
    expect(value(hf, sheet, "D2")).toBeCloseTo((200 / 3) * (1 / 21 + 2 / 22), 10);
  });

  test("tracking signal: running sum of errors over running MAD: -1/1, 1/1.5, 1/1", () => {
    const ts = block(hf, sheet, "C3", 3, 1).map((r) => r[0] as number);
    [-1, 1 / 1.5, 1].forEach((v, i) => expect(ts[i]).toBeCloseTo(v, 12));
    expect(value(hf, sheet, "C6")).toBeNull(); // ends at the last period with both values
  });

  test("ACCURACY lists measure names with values; MAD row equals EBB.MAD", () => {
    const table = block(hf, sheet, "E2", 8, 2);
    expect(table[0][0]).toBe("MAD");
    expect(table[0][1]).toBeCloseTo(1, 12);
    expect(table.map((r) => typeof r[0])).toEqual(new Array(8).fill("string"));
  });

  test("MASE: history 10, 20, 30, 20, 10 with season 2 scales by 40/3 (Hyndman & Koehler 2006)", () => {
    const g: Cell[][] = [[25, 20, 10, "=EBB.MASE(A1:A2, B1:B2, C1:C5, 2)"], [15, 20, 20, null], [null, null, 30, null], [null, null, 20, null], [null, null, 10, null]];
    const w = workbook(g);
    // MAE of forecasts (5 + 5)/2 = 5; scale (|30-10| + |20-20| + |10-30|)/3 = 40/3
    expect(value(w.hf, w.sheet, "D1")).toBeCloseTo(5 / (40 / 3), 12);
  });

  test("Theil's U2: actuals 100, 110, 99 and forecasts -, 105, 104.5 give 0.5", () => {
    const g: Cell[][] = [[100, null, "=EBB.THEILU(A1:A3, B1:B3)"], [110, 105, null], [99, 104.5, null]];
    const w = workbook(g);
    expect(value(w.hf, w.sheet, "C1")).toBeCloseTo(0.5, 12);
  });
});
