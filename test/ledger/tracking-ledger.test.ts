/**
 * The ledger's tracking signal is the windowed one (Harrison & Davies 1964, the fixed-length arm
 * of the backward CUSUM; Gardner 1983): each update row sums the errors of its own row and the
 * five above, divides by sqrt(pi/2) x the mean absolute error of every row above that window and
 * by sqrt(errors in the window), and is blank until six errors precede the window. The expected
 * figures are computed here from the ledger's own Error column by that published definition,
 * not by the engine. On the invented Larkmere demo, the product whose demand steps up (rain
 * barrels, +40% from July 2025) is flagged in its last rows; a steady product keeps the rose
 * shading rare; the panel's sentence says which.
 */
import { describeLedger, extendLedger, hyperFormulaReader, verifyLedger } from "../../src/ledger";
import { signalNote } from "../../src/taskpane/panel/signalNote";
import { demoSeries } from "./support/cases";
import { sourcedLedger } from "./support/sourced";

const settings = { period: 12, seasonality: "auto", trend: "auto" };
const anchor = { sheet: "Ledger", cell: "A1" };

function ledgerOf(name: string) {
  const history = demoSeries(name);
  const l = sourcedLedger({ history, name, settings, horizon: 6, coverage: 0.95, anchor });
  const at = (row: number, col: number) => l.hf.getCellValue({ sheet: l.ledgerSheet, row, col });
  const cols = l.desc.layout.updates.columns;
  const rows = l.desc.layout.updates.rows.filter((r) => !r.start);
  const errors = rows.map((r) => at(r.row, cols.error!));
  const signals = rows.map((r) => at(r.row, cols.tracking!));
  return { ...l, at, cols, rows, errors, signals };
}

/** The published definition, from the ledger's errors ("" = missing). */
function definition(errors: unknown[]): (number | "")[] {
  return errors.map((_, t) => {
    const win = errors.slice(Math.max(0, t - 5), t + 1).filter((e): e is number => typeof e === "number");
    const before = errors.slice(0, Math.max(0, t - 5)).filter((e): e is number => typeof e === "number");
    if (before.length < 6 || win.length === 0) return "";
    const mad = before.reduce((s, e) => s + Math.abs(e), 0) / before.length;
    const sum = win.reduce((s, e) => s + e, 0);
    return mad > 0 ? sum / (Math.sqrt(Math.PI / 2) * mad * Math.sqrt(win.length)) : 0;
  });
}

describe("the ledger's tracking signal", () => {
  it.each(["Seed trays", "Flower bulbs", "Rain barrels"])("%s: every row equals the windowed definition, blank until six errors precede the window", (name) => {
    const l = ledgerOf(name);
    const expected = definition(l.errors);
    expect(expected.slice(0, 11)).toEqual(new Array(11).fill(""));
    l.signals.forEach((v, i) => {
      if (expected[i] === "") expect(v).toBe("");
      else expect(Math.abs((v as number) - (expected[i] as number))).toBeLessThan(1e-9);
    });
    // The scorecard's count is of the rows beyond +/-2.2 (the limit's published false-alarm rate: about 2.8%).
    const flagged = expected.filter((v) => typeof v === "number" && Math.abs(v) > 2.2).length;
    expect(l.hf.getCellValue(l.hf.simpleCellAddressFromString(l.desc.layout.scorecard.outside, l.ledgerSheet)!)).toBe(flagged);
    expect(l.desc.tracking.flagged).toBe(flagged);
  });

  it("flags the step product's last rows, and the panel says to review it", () => {
    const l = ledgerOf("Rain barrels");
    const last = l.signals.slice(-5) as number[];
    for (const v of last) expect(v).toBeGreaterThan(2.2);
    expect(signalNote(l.desc)).toMatch(/beyond \+\/-2\.2: the latest forecasts ran low .*review this item/);
  });

  it("keeps the shading rare on a steady product: at most 1 row in 10", () => {
    for (const name of ["Seed trays", "Bird feed", "Flower bulbs"]) {
      const l = ledgerOf(name);
      const defined = l.signals.filter((v) => typeof v === "number").length;
      expect(l.desc.tracking.flagged).toBeLessThanOrEqual(Math.ceil(defined / 10));
      expect(signalNote(l.desc)).toMatch(/within \+\/-2\.2/);
    }
  });

  it("says 'not yet defined' on a history too short for the signal", () => {
    const history = demoSeries("Seed trays").slice(0, 30); // 6 update rows: no baseline yet
    const d = describeLedger({ history, name: "Seed trays", settings: { period: 12 }, horizon: 3, coverage: 0.9, anchor });
    expect(d.tracking.latest).toBeNull();
    expect(signalNote(d)).toMatch(/not yet defined/);
  });

  it("says once, with what to do, when a ledger holds the earlier running-sum signal columns", () => {
    const l = ledgerOf("Seed trays");
    // An earlier Ebb headed the first signal column "Errors so far" (the running sum since the first update).
    l.hf.setCellContents({ sheet: l.ledgerSheet, row: l.desc.layout.updates.headerRow, col: l.cols.errorSum! }, [["Errors so far"]]);
    const report = verifyLedger(hyperFormulaReader(l.hf, anchor.sheet), anchor);
    expect(report.ok).toBe(false);
    expect(report.problems).toHaveLength(1);
    expect(report.problems[0].message).toMatch(/written by an earlier Ebb: its tracking signal is the running sum .*Write the ledger again/);
    expect(() => extendLedger(hyperFormulaReader(l.hf, anchor.sheet), anchor, [1000])).toThrow(/written by an earlier Ebb/);
  });

  it("a history cell that now holds text is reported as no longer a number, the period treated as missing", () => {
    const l = ledgerOf("Seed trays");
    const t = 60; // an update period
    l.hf.setCellContents({ sheet: l.historySheet, row: 1 + t, col: 1 }, [["n/a"]]);
    const report = verifyLedger(hyperFormulaReader(l.hf, anchor.sheet), anchor);
    const p = report.problems.find((x) => x.kind === "source-changed")!;
    expect(p.message).toMatch(/^The history cell History!B62 no longer holds a number \(it is blank or text\), so the ledger now treats the period as missing; it was written from \d+\./);
    expect(p.message).toMatch(/type the figure back there\.$/);
  });
});
