/**
 * Round trip of every ledger case the tests build (both seasonalities and none, every trend,
 * both starts, gaps, an odd season, three start seasons) and of 3,100- and 10,000-period
 * ledgers, each written next to its history (actuals referring to it): write, read back (the
 * history as written), check (no finding), add two actuals (nothing dropped, check clean),
 * fit (check clean). Expected values: the history the test wrote, and the engine's own fit
 * of that history (src/engine, run here).
 */
import { cleanHistory, fitModel } from "../../src/engine";
import { extendLedger, fitLedgerConstants, hyperFormulaReader, readLedger, verifyLedger, writeCellsToHyperFormula, type LedgerCorrections, type LedgerInput } from "../../src/ledger";
import { ledgerCases, longSeries } from "./support/cases";
import { HISTORY_SHEET, sourcedLedger } from "./support/sourced";

const asList = (h: ArrayLike<number | null | undefined>) => Array.from(cleanHistory(h), (v) => (Number.isNaN(v) ? null : v));

function roundTrip(label: string, history: (number | null)[], settings: LedgerInput["settings"], corrections?: LedgerCorrections): void {
  const cut = history.length - 2;
  const anchor = { sheet: "Ledger", cell: label.length % 2 ? "A1" : "C4" };
  const cutCorrections = corrections && { values: Array.from(corrections.values).slice(0, cut), reasons: Array.from(corrections.reasons ?? []).slice(0, cut) };
  const { hf, input, historySheet } = sourcedLedger({ history: history.slice(0, cut), name: label, settings, horizon: 8, coverage: 0.9, anchor, ...(cutCorrections ? { corrections: cutCorrections } : {}) });
  const read = () => hyperFormulaReader(hf, anchor.sheet);
  // Read back: the history as written, with its source.
  const back = readLedger(read(), anchor);
  expect(back.input.history).toEqual(asList(history.slice(0, cut)));
  expect(back.input.source).toEqual({ sheet: HISTORY_SHEET, col: 1, firstRow: 1 });
  const first = verifyLedger(read(), anchor);
  expect(first.problems).toEqual([]);
  // Two new actuals typed under the history, then added.
  hf.setCellContents({ sheet: historySheet, row: 1 + cut, col: 1 }, history.slice(cut).map((v) => [v]));
  const ext = extendLedger(read(), anchor, history.slice(cut));
  if (corrections) {
    // The corrections read back as written, from the cells they refer to.
    const readBack = readLedger(read(), anchor).input.corrections!;
    expect(Array.from(readBack.values)).toEqual(Array.from(cutCorrections!.values, (v) => v ?? null));
    expect(readBack.source).toEqual({ sheet: HISTORY_SHEET, col: 2, firstRow: 1 });
  }
  writeCellsToHyperFormula(hf, anchor.sheet, [...ext.append, ...ext.refresh], ext.names);
  expect(readLedger(read(), anchor).input.history).toEqual(asList(history));
  expect(verifyLedger(read(), anchor).problems).toEqual([]);
  // Fit: the engine's constants for the whole history, and still nothing to report.
  const fit = fitLedgerConstants(read(), anchor);
  const used = corrections ? Array.from({ length: history.length }, (_, i) => (i < cut ? (corrections.values[i] ?? history[i]) : history[i])) : history;
  const reference = fitModel(used, { ...settings, alpha: undefined, beta: undefined, gamma: undefined, phi: undefined } as Parameters<typeof fitModel>[1]);
  expect(fit.constants).toEqual(reference.constants);
  writeCellsToHyperFormula(hf, anchor.sheet, fit.cells);
  const last = verifyLedger(read(), anchor);
  expect(last.problems).toEqual([]);
  expect(last.checked).toBeGreaterThan(100);
  void input;
}

describe("ledger round trip: write, read back, check, add two actuals, fit", () => {
  const cases = ledgerCases();
  it(`covers ${cases.length} cases`, () => expect(cases.length).toBeGreaterThanOrEqual(25));
  for (const c of cases) it(c.label, () => roundTrip(c.label, c.history, c.settings, c.corrections));
  for (const n of [3100, 10_000]) {
    it(`${n.toLocaleString("en-US")} periods (past the 3,000 rows the names first reach)`, () => {
      roundTrip(`long ${n}`, longSeries(n), { period: 12, seasonality: "multiplicative", trend: "damped" });
    });
  }
});
