/**
 * Every numeric cell of a ledger, evaluated by HyperFormula (default settings, as the preview
 * uses), equals the engine to a relative 1e-9: states, outlook, interval, scorecard and start,
 * for both seasonalities (and none), all trends, the decomposition and classic starts, gaps,
 * an odd season length and three start seasons.
 * Expected values: the engine (src/engine) run by this test on the same history and options,
 * since the check is that a non-engine layer (the ledger's formulas) reproduces the engine.
 */
import { bias, fitModel, mad, mape, modelStates, predictionInterval, rmse, trackingSignal, type FittedModel } from "../../src/engine";
import { ledgerCases, usedValues } from "./support/cases";
import { ledgerInHyperFormula, relativeGap } from "./support/hf";

const TOL = 1e-9;
const HORIZON = 14;
const COVERAGE = 0.9;

function close(found: unknown, expected: number, what: string): void {
  if (typeof found !== "number" || !(Math.abs(found - expected) <= TOL * Math.max(Math.abs(found), Math.abs(expected)) + 1e-12)) {
    throw new Error(`${what}: ledger ${String(found)}, engine ${expected} (relative gap ${typeof found === "number" ? relativeGap(found, expected).toExponential(2) : "n/a"})`);
  }
}

function engineModel(history: (number | null)[], settings: object): FittedModel {
  return fitModel(history, settings as Parameters<typeof fitModel>[1]);
}

describe("ledger formulas in HyperFormula equal the engine", () => {
  for (const c of ledgerCases()) {
    it(c.label, () => {
      const { desc, value } = ledgerInHyperFormula({ history: c.history, name: c.label, settings: c.settings, corrections: c.corrections, horizon: HORIZON, coverage: COVERAGE, anchor: { sheet: "Ledger test", cell: "B3" } });
      // Source of truth: the engine, run here.
      const model = engineModel(usedValues(c), c.settings);
      const states = modelStates(model);
      const interval = predictionInterval(model, HORIZON, COVERAGE);
      const L = desc.layout;
      const col = L.updates.columns;
      const at = (row: number, key: keyof typeof col) => value(`${colLetters(col[key]!)}${row + 1}`);
      expect(desc.constants).toEqual(model.constants);

      close(value(L.start.level), model.start.state.level, "start level");
      close(value(L.start.trend), model.start.state.trend, "start trend");
      L.start.indexCells.forEach((a, k) => close(value(a), model.start.state.indices[k], `start index ${k + 1}`));

      const fu = model.start.firstUpdate;
      const updates = L.updates.rows.filter((r) => !r.start);
      expect(updates.map((r) => r.period - 1)).toEqual(Array.from({ length: model.history.length - fu }, (_, i) => fu + i));
      for (const { period, row } of updates) {
        const t = period - 1;
        close(at(row, "forecast"), states.forecast[t], `forecast of period ${period}`);
        close(at(row, "level"), states.level[t], `level of period ${period}`);
        close(at(row, "trend"), states.trend[t], `trend of period ${period}`);
        if (col.index !== undefined) close(at(row, "index"), states.index[t], `index of period ${period}`);
        if (Number.isNaN(states.error[t])) expect(at(row, "error")).toBe("");
        else close(at(row, "error"), states.error[t], `error of period ${period}`);
      }
      const y = model.history.subarray(fu);
      const f = states.forecast.subarray(fu);
      const ts = trackingSignal(y, f);
      // The windowed signal (blank while the engine leaves it undefined); at least one row reads a number.
      updates.forEach(({ row, period }, i) => {
        if (Number.isNaN(ts[i])) expect(at(row, "tracking")).toBe("");
        else close(at(row, "tracking"), ts[i], `tracking signal of period ${period}`);
      });
      expect(ts.some((v) => !Number.isNaN(v))).toBe(true);

      L.outlook.rows.forEach((o, i) => {
        close(value(o.forecast), interval.forecast[i], `outlook forecast h=${o.h}`);
        close(value(o.low), interval.low[i], `interval low h=${o.h}`);
        close(value(o.high), interval.high[i], `interval high h=${o.h}`);
      });

      const s = L.scorecard;
      close(value(s.mad), mad(y, f), "MAD");
      close(value(s.rmse), rmse(y, f), "RMSE");
      close(value(s.mape), mape(y, f), "MAPE");
      close(value(s.bias), bias(y, f), "bias");
      if (Number.isNaN(ts[ts.length - 1])) expect(value(s.tracking)).toBe("");
      else close(value(s.tracking), ts[ts.length - 1], "tracking signal");
      // The windowed signal's limit, +/-2.2 (Harrison & Davies 1964 backward CUSUM arm; about 2.8% false alarms for normal errors).
      expect(value(s.outside)).toBe(Array.from(ts).filter((v) => Math.abs(v) > 2.2).length);
      expect(value(s.count)).toBe(model.errorCount);
      // Corrected ledgers: each value used is the correction where there is one, and the scorecard counts them.
      if (c.corrections) {
        const used = usedValues(c);
        L.updates.rows.filter((r) => !r.start).forEach(({ row, period }) => expect(at(row, "used")).toBe(used[period - 1] ?? ""));
        expect(value(s.corrected!)).toBe(Array.from(c.corrections.values).filter((v) => v !== null && v !== undefined).length);
      }

      // Every other formula cell equals the value the description expects (the engine's, or
      // for bookkeeping steps such as running sums, arithmetic on the engine's figures).
      for (const cell of desc.cells) {
        if (cell.kind !== "formula") continue;
        const v = value(cell.address);
        if (typeof cell.value === "number") close(v, cell.value, `${cell.address} ${cell.formula}`);
        else expect([cell.address, v ?? ""]).toEqual([cell.address, cell.value ?? ""]);
      }
    });
  }
});

function colLetters(col: number): string {
  let n = col + 1;
  let s = "";
  while (n > 0) {
    s = String.fromCharCode(65 + ((n - 1) % 26)) + s;
    n = Math.floor((n - 1) / 26);
  }
  return s;
}
