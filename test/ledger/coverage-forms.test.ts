/**
 * The ledger's coverage cell takes a percentage (95) as well as a fraction (0.95), like the
 * rest of Ebb: the interval recomputes to the engine's interval at that coverage, and verify
 * accepts both forms. Source of truth: the engine's predictionInterval at the same coverage.
 */
import { fitModel, predictionInterval } from "../../src/engine";
import { verifyLedger } from "../../src/ledger";
import { parseCell } from "../../src/ledger/describe/addresses";
import { quarterlyMargin } from "./support/cases";
import { hyperFormulaReader, ledgerInHyperFormula } from "./support/hf";

describe("the ledger's coverage cell", () => {
  const settings = { period: 4, seasonality: "additive", trend: "linear" } as const;
  const history = quarterlyMargin();

  it.each([80, 0.8])("typed as %p gives the engine's 80%% interval and verifies clean", (typed) => {
    const anchor = { sheet: "Cover", cell: "A1" };
    const { hf, desc, sheetId, value } = ledgerInHyperFormula({ history, settings, horizon: 4, coverage: 0.95, anchor });
    const { row, col } = parseCell(desc.layout.settings.coverage);
    hf.setCellContents({ sheet: sheetId, row, col }, [[typed]]);
    const band = predictionInterval(fitModel(history, { ...settings, ...desc.constants }), 4, 0.8);
    desc.layout.outlook.rows.forEach((o, i) => {
      expect(value(o.low) as number).toBeCloseTo(band.low[i], 8);
      expect(value(o.high) as number).toBeCloseTo(band.high[i], 8);
    });
    const report = verifyLedger(hyperFormulaReader(hf, anchor.sheet), anchor);
    expect(report.problems.filter((p) => p.kind === "setting-invalid")).toEqual([]);
  });

  it.each([0, null, 1, 100, "high"])("a coverage of %p gives #N/A interval ends, not a zero-width interval", (typed) => {
    const anchor = { sheet: "Cover", cell: "A1" };
    const { hf, desc, sheetId, value } = ledgerInHyperFormula({ history, settings, horizon: 4, coverage: 0.95, anchor });
    const { row, col } = parseCell(desc.layout.settings.coverage);
    hf.setCellContents({ sheet: sheetId, row, col }, [[typed]]);
    desc.layout.outlook.rows.forEach((o) => {
      for (const end of [value(o.low), value(o.high)]) expect(end).toMatchObject({ type: "NA" });
      expect(typeof value(o.forecast)).toBe("number"); // the point forecast stays
    });
  });

  it("says which forms it expects for a coverage of 100", () => {
    const anchor = { sheet: "Cover", cell: "A1" };
    const { hf, desc, sheetId } = ledgerInHyperFormula({ history, settings, horizon: 4, coverage: 0.95, anchor });
    const { row, col } = parseCell(desc.layout.settings.coverage);
    hf.setCellContents({ sheet: sheetId, row, col }, [[100]]);
    const report = verifyLedger(hyperFormulaReader(hf, anchor.sheet), anchor);
    expect(report.problems.find((p) => p.kind === "setting-invalid")?.message).toMatch(/a fraction above 0 and below 1 \(such as 0\.95\) or a percentage above 1 and below 100/);
  });
});
