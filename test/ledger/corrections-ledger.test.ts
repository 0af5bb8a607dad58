/**
 * A ledger written with planner corrections beside the history (issue: corrected history with
 * reasons): each period shows the actual, the correction, its reason and the value used; the
 * updates run on the values used; the scorecard counts the corrected periods; the check reports
 * a changed correction like a changed actual, naming its cell; adding actuals carries the
 * corrections on. Expected values: the figures this test typed, and the definition of a
 * correction (the correction where there is one, else the actual) computed here, run through
 * the engine's fit (src/engine) for the states. All data invented (the Larkmere demo).
 */
import { fitModel, modelStates } from "../../src/engine";
import { describeLedger, extendLedger, hyperFormulaReader, readLedger, verifyLedger, writeCellsToHyperFormula } from "../../src/ledger";
import { cellAddress } from "../../src/ledger/describe/addresses";
import { correctionsAt, demoSeries, usedValues } from "./support/cases";
import { HISTORY_SHEET, sourcedLedger } from "./support/sourced";

const history = demoSeries("Hose reels");
const settings = { period: 12, seasonality: "multiplicative", trend: "damped" };
// An invented promotion in period 3 (inside the start window) and a stock-out in period 42.
const corrections = correctionsAt(history.length, [[2, 150, "invented promotion: normal demand"], [41, 330, "invented stock-out: turned-away orders added"]]);
const anchor = { sheet: "Ledger", cell: "A1" };

function written() {
  const l = sourcedLedger({ history, name: "Hose reels", settings, corrections, horizon: 6, coverage: 0.9, anchor });
  const value = (address: string) => l.hf.getCellValue(l.hf.simpleCellAddressFromString(address, l.ledgerSheet)!);
  return { ...l, value, read: () => hyperFormulaReader(l.hf, anchor.sheet) };
}

describe("a ledger with corrections", () => {
  it("shows actual, correction, reason and value used, and runs the updates on the values used", () => {
    const { desc, value } = written();
    const cols = desc.layout.updates.columns;
    const row = desc.layout.updates.rows.find((r) => r.period === 42)!;
    expect(value(cellAddress(row.row, cols.actual!))).toBe(history[41]);
    expect(value(cellAddress(row.row, cols.correction!))).toBe(330);
    expect(value(cellAddress(row.row, cols.reason!))).toBe("invented stock-out: turned-away orders added");
    expect(value(cellAddress(row.row, cols.used!))).toBe(330);
    const startRow = desc.layout.start.windowFirstRow + 2;
    expect(value(cellAddress(startRow, desc.layout.start.columns.used!))).toBe(150);
    expect(value(cellAddress(startRow, desc.layout.start.columns.actual!))).toBe(history[2]);
    // The states are the engine's on the corrected values, not on the actuals.
    const model = fitModel(usedValues({ label: "", history, settings, corrections }), settings as Parameters<typeof fitModel>[1]);
    expect(desc.constants).toEqual(model.constants);
    const states = modelStates(model);
    for (const r of desc.layout.updates.rows.filter((r) => !r.start)) {
      const level = value(cellAddress(r.row, cols.level!)) as number;
      expect(Math.abs(level - states.level[r.period - 1])).toBeLessThanOrEqual(1e-9 * Math.abs(level));
    }
    const uncorrected = fitModel(history, { ...settings, ...model.constants } as Parameters<typeof fitModel>[1]);
    expect(modelStates(uncorrected).level[41]).not.toBeCloseTo(states.level[41], 3);
    expect(value(desc.layout.scorecard.corrected!)).toBe(2);
  });

  it("checks clean, then reports a changed correction at the ledger's cell, naming the corrections cell", () => {
    const { hf, desc, historySheet, read, value } = written();
    expect(verifyLedger(read(), anchor).problems).toEqual([]);
    const row = desc.layout.updates.rows.find((r) => r.period === 42)!;
    const forecastCell = cellAddress(row.row + 1, desc.layout.updates.columns.forecast!);
    const before = value(forecastCell);
    hf.setCellContents({ sheet: historySheet, row: 42, col: 2 }, [[300]]);
    const report = verifyLedger(read(), anchor);
    const at = cellAddress(row.row, desc.layout.updates.columns.correction!);
    expect(report.problems.map((p) => [p.address, p.kind])).toEqual([[at, "source-changed"]]);
    expect(report.problems[0].message).toContain(`${HISTORY_SHEET}!C43`);
    expect(report.problems[0].message).toContain("correction");
    // The ledger computes with the new figure at once.
    expect(value(forecastCell)).not.toBe(before);
  });

  it("reports a reason whose reference was typed over, and a correction typed over in the ledger", () => {
    const { hf, desc, ledgerSheet, read } = written();
    const row = desc.layout.updates.rows.find((r) => r.period === 42)!;
    const cols = desc.layout.updates.columns;
    hf.setCellContents({ sheet: ledgerSheet, row: row.row, col: cols.reason! }, [["made up"]]);
    hf.setCellContents({ sheet: ledgerSheet, row: row.row, col: cols.correction! }, [[330]]);
    const found = verifyLedger(read(), anchor).problems.map((p) => [p.address, p.kind]);
    expect(found).toEqual([
      [cellAddress(row.row, cols.correction!), "actual-changed"],
      [cellAddress(row.row, cols.reason!), "formula-changed"],
    ]);
  });

  it("reads back its corrections and reasons, and adding actuals carries them on", () => {
    const cut = history.length - 3;
    const shortCorr = { values: Array.from(corrections.values).slice(0, cut), reasons: Array.from(corrections.reasons!).slice(0, cut) };
    const l = sourcedLedger({ history: history.slice(0, cut), name: "Hose reels", settings, corrections: shortCorr, horizon: 6, coverage: 0.9, anchor });
    const read = () => hyperFormulaReader(l.hf, anchor.sheet);
    const back = readLedger(read(), anchor).input.corrections!;
    expect(Array.from(back.values)).toEqual(shortCorr.values.map((v) => v ?? null));
    expect(Array.from(back.reasons!)).toEqual(shortCorr.reasons.map((r) => r ?? ""));
    // Three new actuals, the middle one corrected in the corrections column.
    l.hf.setCellContents({ sheet: l.historySheet, row: 1 + cut, col: 1 }, history.slice(cut).map((v) => [v]));
    l.hf.setCellContents({ sheet: l.historySheet, row: 2 + cut, col: 2 }, [[222, "invented one-off order"]]);
    const ext = extendLedger(read(), anchor, history.slice(cut), { values: [null, 222, null], reasons: [null, "invented one-off order", null] });
    writeCellsToHyperFormula(l.hf, anchor.sheet, [...ext.append, ...ext.refresh], ext.names);
    const after = readLedger(read(), anchor).input;
    expect(after.history.length).toBe(history.length);
    expect(Array.from(after.corrections!.values).filter((v) => v !== null)).toEqual([150, 330, 222]);
    expect(verifyLedger(read(), anchor).problems).toEqual([]);
  });

  it("refuses a correction that is not a number, naming the period", () => {
    const bad = { values: [null, null, "about 150" as unknown as number], reasons: [] };
    expect(() => describeLedger({ history, settings, corrections: bad, horizon: 6, coverage: 0.9, anchor })).toThrow(/correction of period 3 is not a number/);
  });
});
