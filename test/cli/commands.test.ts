import ExcelJS from "exceljs";
/**
 * The batch command run as a child process on small CSV files, as DESIGN.md "Batch command"
 * describes it. Sources of expected values, named beside each check:
 *  - base R stats::HoltWinters, the committed fixture test/reference/fixtures/r-holtwinters.json;
 *  - the engine itself, where the check is that the command layer reproduces the engine
 *    (reading, option handling, alignment, output) without changing a digit;
 *  - DESIGN.md for the JSON shape, option words and the caution text.
 */
import { readFileSync, rmSync } from "fs";
import { join } from "path";
import {
  fitModel,
  forecastModel,
  holdoutScore,
  predictionInterval,
  type ModelOptions,
} from "../../src/engine";
import { REPO, runEbb, spawnCommand, tempDir, writeCsv } from "./runEbb";

const fixture = JSON.parse(readFileSync(join(REPO, "test/reference/fixtures/r-holtwinters.json"), "utf8"));
const air: number[] = fixture.series.AirPassengers.values;
const ukgas: number[] = fixture.series.UKgas.values;

const MODEL_KEYS = ["name", "period", "seasonality", "trend", "start", "alpha", "beta", "gamma", "phi", "sse", "rmse", "aicc"];

/** The command's defaults when an option is left out (DESIGN.md: multiplicative, linear, decomposition). */
const DEFAULTS: ModelOptions = { seasonality: "multiplicative", trend: "linear", start: "decomposition" };

/** The model fields of an entry, as the engine's own fitted model gives them (null for what the model does not use). */
function engineSummary(values: number[], options: ModelOptions) {
  const m = fitModel(values, { ...DEFAULTS, ...options });
  const hasTrend = m.spec.trend !== "none";
  return {
    period: m.spec.period,
    seasonality: m.spec.seasonality,
    trend: m.spec.trend,
    start: m.spec.start,
    alpha: m.constants.alpha,
    beta: hasTrend ? m.constants.beta : null,
    gamma: m.spec.seasonality === "none" ? null : m.constants.gamma,
    phi: hasTrend ? m.constants.phi : null,
    sse: m.sse,
    rmse: m.rmse,
    aicc: Number.isFinite(m.aicc) ? m.aicc : null,
  };
}

function closeRel(a: number, b: number, tol: number): boolean {
  return Math.abs(a - b) <= tol * Math.max(1, Math.abs(b));
}

let dir: string;
let twoColumns: string;
beforeAll(() => {
  dir = tempDir();
  // UKgas (108 quarters) is padded with trailing blanks to AirPassengers' 144 rows.
  twoColumns = writeCsv(dir, "two.csv", ["AirPassengers", "UKgas"], [air, ukgas]);
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe("fit", () => {
  it("prints DESIGN's JSON for two columns, one padded with trailing blanks (source: the engine)", () => {
    const r = runEbb(["fit", twoColumns, "--period", "0", "--seasonality", "multiplicative", "--trend", "linear"]);
    expect(r.stderr).toBe("");
    expect(r.status).toBe(0);
    const doc = JSON.parse(r.stdout);
    expect(Object.keys(doc)).toEqual(["series"]);
    expect(doc.series.map((s: { name: string }) => s.name)).toEqual(["AirPassengers", "UKgas"]);
    const options: ModelOptions = { period: 0, seasonality: "multiplicative", trend: "linear", start: "decomposition" };
    for (const [entry, values] of [[doc.series[0], air], [doc.series[1], ukgas]] as const) {
      expect(Object.keys(entry)).toEqual(MODEL_KEYS);
      expect(entry).toEqual({ name: entry.name, ...engineSummary(values, options) });
    }
  });
});

describe("states", () => {
  it("reproduces R's HoltWinters one-step forecasts and states with fixed constants (source: R fixture)", () => {
    const single = writeCsv(dir, "air.csv", ["AirPassengers"], [air]);
    const r = runEbb(["states", single, "--period", "12", "--start", "classic", "--seasonality", "multiplicative", "--alpha", "0.3", "--beta", "0.1", "--gamma", "0.2"]);
    expect(r.status).toBe(0);
    const entry = JSON.parse(r.stdout).series[0];
    expect(Object.keys(entry)).toEqual([...MODEL_KEYS, "states"]);
    expect(entry).toMatchObject({ period: 12, seasonality: "multiplicative", trend: "linear", start: "classic", alpha: 0.3, beta: 0.1, gamma: 0.2 });
    const states = entry.states as Record<string, number | null>[];
    expect(states).toHaveLength(144);
    states.forEach((row, i) => {
      expect(Object.keys(row)).toEqual(["t", "actual", "level", "trend", "index", "forecast", "error"]);
      expect(row.t).toBe(i + 1);
      expect(row.actual).toBe(air[i]);
    });
    // The first season is the start window: nothing is forecast there.
    for (let t = 1; t <= 12; t++) expect(states[t - 1].forecast).toBeNull();
    const r0 = fixture.series.AirPassengers.holtwinters.multiplicative.fixed.fitted;
    // R's xhat[k] is the one-step forecast of period t = 13 + k.
    let worst = 0;
    for (let t = 13; t <= 144; t++) {
      const ours = states[t - 1].forecast as number;
      const rs = r0.xhat[t - 13];
      worst = Math.max(worst, Math.abs(ours / rs - 1));
      expect(closeRel(states[t - 1].error as number, air[t - 1] - rs, 1e-9)).toBe(true);
    }
    expect(worst).toBeLessThanOrEqual(1e-9);
    // R's fitted level/trend of row k are the ones its forecast for t = 13 + k used, i.e. those
    // after the update of t - 1: so ours at t (after its update) equals R's row t - 12.
    for (let t = 13; t <= 143; t++) {
      expect(closeRel(states[t - 1].level as number, r0.level[t - 12], 1e-9)).toBe(true);
      expect(closeRel(states[t - 1].trend as number, r0.trend[t - 12], 1e-9)).toBe(true);
    }
    // R's season of row k serves t = 13 + k and was updated one season earlier, at t - 12.
    for (let t = 13; t <= 132; t++) expect(closeRel(states[t - 1].index as number, r0.season[t - 1], 1e-9)).toBe(true);
  });
});

describe("ahead", () => {
  it("skips a label column, gives low/high with --coverage and the months forecast (source: the engine; months: the calendar)", () => {
    const months = air.map((_, i) => `${1949 + Math.floor(i / 12)}-${String((i % 12) + 1).padStart(2, "0")}`);
    const file = writeCsv(dir, "labelled.csv", ["month", "AirPassengers"], [months, air]);
    const r = runEbb(["ahead", file, "--period", "12", "--horizon", "5", "--coverage", "0.8", "--trend", "damped"]);
    expect(r.status).toBe(0);
    const doc = JSON.parse(r.stdout);
    expect(doc.series).toHaveLength(1);
    const entry = doc.series[0];
    expect(Object.keys(entry)).toEqual([...MODEL_KEYS, "ahead"]);
    const model = fitModel(air, { period: 12, trend: "damped", seasonality: "multiplicative", start: "decomposition" });
    const band = predictionInterval(model, 5, 0.8);
    // The data end in 1960-12 (1949-01 plus 143 months).
    const next = ["1961-01", "1961-02", "1961-03", "1961-04", "1961-05"];
    expect(entry.ahead).toEqual(Array.from(band.forecast, (f, i) => ({ h: i + 1, label: next[i], forecast: f, low: band.low[i], high: band.high[i] })));
  });

  it("reads standard input and writes the tidy CSV table, without low/high when no coverage (source: the engine)", () => {
    const csv = readFileSync(twoColumns, "utf8");
    const r = runEbb(["ahead", "-", "--period", "0", "--horizon", "3", "--format", "csv"], csv);
    expect(r.status).toBe(0);
    const lines = r.stdout.trim().split("\n");
    expect(lines[0]).toBe("series,h,forecast,low,high,message");
    expect(lines).toHaveLength(1 + 2 * 3);
    const expected = [["AirPassengers", air], ["UKgas", ukgas]] as const;
    expected.forEach(([name, values], s) => {
      const f = forecastModel(fitModel(values, { ...DEFAULTS, period: 0 }), 3);
      for (let h = 1; h <= 3; h++) {
        const cells = lines[1 + s * 3 + (h - 1)].split(",");
        expect(cells).toEqual([name, String(h), String(f[h - 1]), "", "", ""]);
      }
    });
  });
});

describe("backtest", () => {
  it("scores the holdout per series, reports a failing series in its entry and still runs the others (source: the engine)", () => {
    const short = [5, 6, 7];
    const file = writeCsv(dir, "three.csv", ["AirPassengers", "Too short", "UKgas"], [air, short, ukgas]);
    const r = runEbb(["backtest", file, "--period", "0", "--holdout", "6", "--coverage", "0.9"]);
    // Exit status 2: some series failed, the others were written.
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/warning: series "Too short" failed/);
    expect(r.stderr).not.toMatch(/AirPassengers|UKgas/);
    const doc = JSON.parse(r.stdout);
    expect(Object.keys(doc)).toEqual(["series", "overall"]);
    const [first, failed, third] = doc.series;
    expect(Object.keys(failed)).toEqual(["name", "error"]);
    expect(failed.error).toMatch(/Needs \d+ values/);
    const scores = [first, third].map((entry, k) => {
      const values = k === 0 ? air : ukgas;
      expect(Object.keys(entry)).toEqual([...MODEL_KEYS, "backtest"]);
      const h = holdoutScore(values, { ...DEFAULTS, period: 0 }, 6, 0.9);
      const b = entry.backtest;
      expect(Object.keys(b)).toEqual(["holdout", "forecast", "actual", "mad", "mape", "smape", "mase", "rmse", "bias", "coverage"]);
      expect(b).toEqual({
        holdout: 6, forecast: Array.from(h.forecast), actual: Array.from(h.actual),
        mad: h.mad, mape: h.mape, smape: h.smape, mase: h.mase, rmse: h.rmse, bias: h.bias, coverage: h.coverage,
      });
      // The model fields describe the model fitted on the values kept (all but the last 6).
      expect(entry).toMatchObject(engineSummary(values.slice(0, values.length - 6), { period: 0 }));
      return h;
    });
    expect(doc.overall.series).toBe(2);
    expect(doc.overall.failed).toBe(1);
    expect(doc.overall.smape).toBeCloseTo((scores[0].smape + scores[1].smape) / 2, 12);
  });
});

describe("bad input", () => {
  it("reports a cell that is not a number by its address and still runs the other series", () => {
    const file = writeCsv(dir, "bad.csv", ["month", "North", "South"], [air.map((_, i) => `m${i}`), air, [4, "n/a", 6]]);
    const r = runEbb(["fit", file, "--period", "12"]);
    expect(r.status).toBe(2);
    // "n/a" is in the second data row, line 3 of the file (line 1 holds the names), column C.
    expect(r.stderr).toMatch(/series "South" failed: Cell C3 of .*bad\.csv \(series "South", line 3, column 3\): "n\/a" is not a number/);
    const [north, south] = JSON.parse(r.stdout).series;
    expect(north).toEqual({ name: "North", ...engineSummary(air, { period: 12 }) });
    expect(Object.keys(south)).toEqual(["name", "error"]);
  });

  it("lists the accepted words for an unknown option word (words: DESIGN.md)", () => {
    const r = runEbb(["states", twoColumns, "--seasonality", "sideways"]);
    expect(r.status).not.toBe(0);
    expect(r.stdout).toBe("");
    expect(r.stderr).toMatch(/sideways.*multiplicative, additive, auto/);
  });
});

describe("progress", () => {
  it("shows 'fitting series k of N' on standard error only", () => {
    // 21 short seasonal series (period 4): series k is a repeating 4-value pattern scaled by k.
    const names = Array.from({ length: 21 }, (_, k) => `item ${k + 1}`);
    const columns = names.map((_, k) => Array.from({ length: 16 }, (_, t) => (k + 1) * [10, 20, 30, 15][t % 4] + t));
    const file = writeCsv(dir, "many.csv", names, columns);
    const r = runEbb(["fit", file, "--period", "4", "--progress"]);
    expect(r.status).toBe(0);
    expect(r.stderr).toMatch(/fitting series 1 of 21/);
    expect(r.stderr).toMatch(/fitting series 21 of 21/);
    expect(r.stdout).not.toMatch(/fitting/);
    expect(JSON.parse(r.stdout).series).toHaveLength(21);
  });
});

describe("ledger", () => {
  it("writes an .xlsx workbook with the data sheet and one ledger sheet per series", async () => {
    const out = join(dir, "ledger.xlsx");
    const r = runEbb(["ledger", twoColumns, "--period", "12", "--out", out]);
    expect(r.stderr).toBe("");
    expect(r.status).toBe(0);
    const workbook = new ExcelJS.Workbook();
    await workbook.xlsx.readFile(out);
    // two series in the CSV: the data sheet plus two ledgers
    expect(workbook.worksheets).toHaveLength(3);
  });
});

describe("demo and help", () => {
  it("prints the demo outlook with intervals, the invented-data notice and DESIGN's caution", () => {
    const r = runEbb(["demo"]);
    expect(r.status).toBe(0);
    const header = readFileSync(join(REPO, "src/preview/demo/larkmere-demo.csv"), "utf8").split("\n")[0].split(",");
    for (const product of header.slice(1)) expect(r.stdout).toContain(product);
    expect(r.stdout).not.toMatch(/^month$/m);
    expect(r.stdout).toMatch(/month\s+forecast\s+low\s+high/);
    expect(r.stdout).toContain("2026-01"); // the month after the data's last, 2025-12
    expect(r.stdout).toContain("Invented demo data");
    expect(r.stdout.replace(/\s+/g, " ")).toContain(
      "stock-outs, promotions, price changes and one-off events in the history distort them; review forecasts and intervals before committing orders, stock or budgets, and follow your organisation's planning and approval rules.",
    );
  });

  it("explains a command's options, output columns and an example in --help", () => {
    const r = runEbb(["states", "--help"]);
    expect(r.status).toBe(0);
    for (const option of ["--period", "--seasonality", "--trend", "--start", "--cycles", "--alpha", "--beta", "--gamma", "--phi", "--format", "--out"]) {
      expect(r.stdout).toContain(option);
    }
    expect(r.stdout).toContain("series, t, actual, level, trend, index, forecast, error, message");
    expect(r.stdout).toMatch(/Example[^\n]*:\n\s+npm run --silent ebb -- states /);
  });
});

describe("installed launcher", () => {
  it("bin/ebb.js runs the command from any folder (source: the engine)", () => {
    const r = spawnCommand(process.execPath, [join(REPO, "bin", "ebb.js"), "fit", twoColumns, "--period", "0", "--format", "csv"], dir);
    expect(r.stderr).toBe("");
    expect(r.status).toBe(0);
    const lines = r.stdout.trim().split("\n");
    expect(lines[0]).toBe("series,period,seasonality,trend,start,alpha,beta,gamma,phi,sse,rmse,aicc,message");
    const air0 = engineSummary(air, { period: 0 });
    expect(lines[1].split(",")).toEqual(["AirPassengers", ...Object.values(air0).map((v) => (v === null ? "" : String(v))), ""]);
  });
});
