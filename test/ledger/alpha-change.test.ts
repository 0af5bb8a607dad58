/**
 * Typing a new alpha into the ledger's settings recomputes the whole ledger: after the
 * change, HyperFormula's values equal the engine run with the new alpha (and the other
 * constants as written). Source of truth: the engine, run here with fixed constants.
 */
import { fitModel, modelStates, predictionInterval } from "../../src/engine";
import { parseCell } from "../../src/ledger/describe/addresses";
import { demoSeries, quarterlyMargin } from "./support/cases";
import { ledgerInHyperFormula } from "./support/hf";

function close(found: unknown, expected: number, what: string): void {
  if (typeof found !== "number" || !(Math.abs(found - expected) <= 1e-9 * Math.max(Math.abs(found), Math.abs(expected)) + 1e-12)) {
    throw new Error(`${what}: ledger ${String(found)}, engine ${expected}`);
  }
}

const cases = [
  { label: "multiplicative damped", history: demoSeries("Seed trays"), settings: { period: 12, seasonality: "multiplicative", trend: "damped" } },
  { label: "additive linear with a gap", history: quarterlyMargin(), settings: { period: 4, seasonality: "additive", trend: "linear" } },
];

describe("changing the alpha cell recomputes the ledger", () => {
  for (const c of cases) {
    it(c.label, () => {
      const { hf, desc, sheetId, value } = ledgerInHyperFormula({ history: c.history, settings: c.settings, horizon: 8, coverage: 0.95, anchor: { sheet: "Alpha", cell: "A1" } });
      const newAlpha = desc.constants.alpha > 0.5 ? desc.constants.alpha / 2 : desc.constants.alpha + 0.3;
      const { row, col } = parseCell(desc.layout.settings.alpha);
      const before = value(desc.layout.start.level);
      hf.setCellContents({ sheet: sheetId, row, col }, [[newAlpha]]);
      expect(value(desc.layout.start.level)).toBe(before); // the start does not depend on alpha

      const model = fitModel(c.history, { ...c.settings, ...desc.constants, alpha: newAlpha } as Parameters<typeof fitModel>[1]);
      const states = modelStates(model);
      const cols = desc.layout.updates.columns;
      let changed = 0;
      for (const r of desc.layout.updates.rows) {
        if (r.start) continue;
        const t = r.period - 1;
        const level = hf.getCellValue({ sheet: sheetId, row: r.row, col: cols.level! });
        close(level, states.level[t], `level of period ${r.period}`);
        close(hf.getCellValue({ sheet: sheetId, row: r.row, col: cols.forecast! }), states.forecast[t], `forecast of period ${r.period}`);
        const old = desc.cells.find((x) => x.row === r.row && x.col === cols.level!)!.value as number;
        if (Math.abs(old - (level as number)) > 1e-6 * Math.abs(old)) changed++;
      }
      expect(changed).toBeGreaterThan(10);
      const interval = predictionInterval(model, 8, 0.95);
      desc.layout.outlook.rows.forEach((o, i) => {
        close(value(o.forecast), interval.forecast[i], `outlook h=${o.h}`);
        // Additive intervals are formulas and follow; multiplicative gaps are the engine's numbers (refreshed by Fit).
        if (desc.intervalMethod === "formula") {
          close(value(o.low), interval.low[i], `low h=${o.h}`);
          close(value(o.high), interval.high[i], `high h=${o.h}`);
        }
      });
    });
  }
});
