/**
 * Mutation test of the check: 288 random single changes (seeded), each on a ledger written
 * next to its history, of seven kinds: a formula replaced by its own value or by another
 * number, an actual or a correction in the ledger replaced by a number, a figure changed in
 * the source history or in its corrections column, text typed into an empty cell of the block, a settings cell out of range or not an
 * option word, a formula deleted. The check must report every one at the changed cell (for a
 * changed source figure: at the ledger's cell that refers to it, naming the source cell).
 * Expected values: the changes this test made. Untouched ledgers give no finding.
 */
import { mulberry32 } from "../../src/preview/demo/generate-demo";
import { hyperFormulaReader, verifyLedger, type LedgerCell, type LedgerInput } from "../../src/ledger";
import { cellAddress } from "../../src/ledger/describe/addresses";
import { correctionsAt, demoSeries, quarterlyMargin, workdays } from "./support/cases";
import { HISTORY_SHEET, sourcedLedger } from "./support/sourced";

const ledgers: Omit<LedgerInput, "source">[] = [
  { history: demoSeries("Seed trays"), name: "Seed", settings: { period: 12, seasonality: "multiplicative", trend: "linear" }, horizon: 6, coverage: 0.9, anchor: { sheet: "Mult", cell: "A1" } },
  { history: demoSeries("Flower bulbs"), name: "Bulbs", settings: { period: 12, seasonality: "multiplicative", trend: "damped" }, horizon: 6, coverage: 0.9, anchor: { sheet: "Gaps", cell: "C4" } },
  { history: quarterlyMargin(), name: "Margin", settings: { period: 4, seasonality: "additive", trend: "damped", start: "classic" }, horizon: 6, coverage: 0.9, anchor: { sheet: "Add", cell: "A1" } },
  { history: workdays(), name: "Days", settings: { period: 5, seasonality: "additive", trend: "none" }, horizon: 6, coverage: 0.9, anchor: { sheet: "Odd", cell: "B2" } },
  {
    history: demoSeries("Hose reels"),
    name: "Corrected",
    settings: { period: 12, seasonality: "multiplicative", trend: "linear" },
    corrections: correctionsAt(demoSeries("Hose reels").length, [[3, 180, "invented promotion"], [30, 260, "invented stock-out"], [60, 240, "invented one-off order"]]),
    horizon: 6,
    coverage: 0.9,
    anchor: { sheet: "Corrected", cell: "B3" },
  },
  { history: demoSeries("Hose reels").slice(0, 30), name: "Plain", settings: { period: 1, trend: "linear", start: "classic" }, horizon: 6, coverage: 0.9, anchor: { sheet: "Plain", cell: "A1" } },
];

const KINDS = ["formula-to-value", "formula-to-number", "actual-to-number", "history-changed", "text-in-empty", "setting-out-of-range", "formula-deleted"] as const;
const TRIALS_PER_LEDGER = 48;

describe("the check reports every single change at its cell", () => {
  it("finds nothing on the untouched ledgers", () => {
    for (const l of ledgers) {
      const { hf } = sourcedLedger(l);
      expect(verifyLedger(hyperFormulaReader(hf, l.anchor.sheet), l.anchor).problems).toEqual([]);
    }
  });

  for (const l of ledgers) {
    it(`${TRIALS_PER_LEDGER} random changes on ${l.anchor.sheet}`, () => {
      const { hf, desc, ledgerSheet, historySheet } = sourcedLedger(l);
      const rand = mulberry32(97 + l.anchor.sheet.length * 13);
      const pick = <T,>(list: T[]): T => list[Math.floor(rand() * list.length)];
      const formulas = desc.cells.filter((c) => c.kind === "formula" && typeof c.value === "number");
      const sources = desc.cells.filter((c) => c.kind === "source" && typeof c.value === "number");
      const described = new Set(desc.cells.map((c) => `${c.row},${c.col}`));
      const rows = desc.cells.map((c) => c.row);
      const cols = desc.cells.map((c) => c.col);
      const [top, bottom, left, right] = [Math.min(...rows), Math.max(...rows), Math.min(...cols), Math.max(...cols)];
      const byAddress = new Map(desc.cells.map((c) => [c.address, c]));
      const missed: string[] = [];
      for (let trial = 0; trial < TRIALS_PER_LEDGER; trial++) {
        const kind = KINDS[trial % KINDS.length];
        let at: { row: number; col: number };
        let expectIn: string;
        const put = (sheet: number, row: number, col: number, v: unknown) => hf.setCellContents({ sheet, row, col }, [[v as number]]);
        if (kind === "formula-to-value" || kind === "formula-to-number" || kind === "formula-deleted") {
          const c: LedgerCell = pick(formulas);
          const shown = hf.getCellValue({ sheet: ledgerSheet, row: c.row, col: c.col }) as number;
          put(ledgerSheet, c.row, c.col, kind === "formula-deleted" ? null : kind === "formula-to-value" ? shown : shown + 1 + Math.round(rand() * 100));
          at = c;
          expectIn = c.address;
        } else if (kind === "actual-to-number") {
          const c = pick(sources);
          put(ledgerSheet, c.row, c.col, rand() < 0.5 ? (c.value as number) : (c.value as number) + 3);
          at = c;
          expectIn = c.address;
        } else if (kind === "history-changed") {
          // An actual's history cell (column B) or a correction's cell (column C) changed.
          const c = pick(sources);
          const [, letter, row] = /\$([A-Z]+)\$(\d+)\)/.exec(c.formula!)!;
          put(historySheet, Number(row) - 1, letter.charCodeAt(0) - 65, (c.value as number) + 5 + Math.round(rand() * 50));
          at = c;
          expectIn = c.address;
          expect(c.source).toBe(`${HISTORY_SHEET}!${letter}${row}`);
        } else if (kind === "text-in-empty") {
          let r: number, k: number;
          do {
            r = top + Math.floor(rand() * (bottom - top + 1));
            k = left + Math.floor(rand() * (right - left + 1));
          } while (described.has(`${r},${k}`));
          put(ledgerSheet, r, k, "note to self");
          at = { row: r, col: k };
          expectIn = cellAddress(r, k);
        } else {
          const key = pick(["alpha", "beta", "gamma", "coverage", "seasonality", "trend"] as const);
          const cell = byAddress.get(desc.layout.settings[key])!;
          const bad = key === "seasonality" || key === "trend" ? "sideways" : key === "coverage" ? 140 : 1.5;
          put(ledgerSheet, cell.row, cell.col, bad);
          at = cell;
          expectIn = cell.address;
        }
        const report = verifyLedger(hyperFormulaReader(hf, l.anchor.sheet), l.anchor);
        const found = report.problems.find((p) => p.address === expectIn);
        if (!found || report.ok) missed.push(`${kind} at ${expectIn}: ${report.problems.map((p) => p.address).join(",") || "nothing"}`);
        if (kind === "history-changed" && found) expect(found.message).toContain(byAddress.get(expectIn)!.source!);
        hf.undo();
        void at;
      }
      expect(missed).toEqual([]);
      // After every undo the ledger is untouched again.
      expect(verifyLedger(hyperFormulaReader(hf, l.anchor.sheet), l.anchor).problems).toEqual([]);
    });
  }
  it(`makes at least 200 changes in all`, () => expect(ledgers.length * TRIALS_PER_LEDGER).toBeGreaterThanOrEqual(200));
});
