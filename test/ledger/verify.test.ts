/**
 * Verify, extend and fit on ledgers written into HyperFormula.
 * Mutation test: random ledger formulas are replaced by constants (equal to the shown value,
 * or off by a little) and random actuals by other numbers; verify must list every mutated
 * cell and nothing else. The expected list is the set of cells this test mutated.
 */
import { fitModel } from "../../src/engine";
import { mulberry32 } from "../../src/preview/demo/generate-demo";
import { extendLedger, fitLedgerConstants, describeLedger, verifyLedger, writeCellsToHyperFormula, type LedgerInput } from "../../src/ledger";
import { demoSeries, quarterlyMargin, workdays } from "./support/cases";
import { hyperFormulaReader, ledgerInHyperFormula } from "./support/hf";

const base = (history: (number | null)[], settings: LedgerInput["settings"], sheet: string, cell = "A1"): LedgerInput => ({
  history,
  name: sheet,
  settings,
  horizon: 6,
  coverage: 0.9,
  anchor: { sheet, cell },
});

const mutationCases: LedgerInput[] = [
  base(demoSeries("Seed trays"), { period: 12, seasonality: "multiplicative", trend: "linear" }, "Mult"),
  base(demoSeries("Flower bulbs"), { period: 12, seasonality: "multiplicative", trend: "damped" }, "Gaps", "C4"),
  base(quarterlyMargin(), { period: 4, seasonality: "additive", trend: "damped", start: "classic" }, "Add"),
  base(workdays(), { period: 5, seasonality: "additive", trend: "none" }, "Odd"),
  base(demoSeries("Hose reels").slice(0, 30), { period: 1, trend: "linear" }, "Plain"),
];

describe("verify", () => {
  it("finds nothing wrong in a ledger as written, and says so", () => {
    for (const input of mutationCases) {
      const { hf } = ledgerInHyperFormula(input);
      const report = verifyLedger(hyperFormulaReader(hf, input.anchor.sheet), input.anchor);
      expect(report.problems).toEqual([]);
      expect(report.ok).toBe(true);
      expect(report.checked).toBeGreaterThan(200);
    }
  });

  for (const input of mutationCases) {
    for (let trial = 0; trial < 3; trial++) {
      it(`lists exactly the mutated cells: ${input.anchor.sheet} trial ${trial + 1}`, () => {
        const { hf, desc, sheetId } = ledgerInHyperFormula(input);
        const rand = mulberry32(1000 * trial + input.anchor.sheet.length);
        const formulas = desc.cells.filter((c) => c.kind === "formula" && typeof c.value === "number");
        const actuals = desc.cells.filter((c) => c.kind === "actual" && typeof c.value === "number");
        const mutated = new Set<string>();
        for (let k = 0; k < 4; k++) {
          const cell = formulas[Math.floor(rand() * formulas.length)];
          const shown = hf.getCellValue({ sheet: sheetId, row: cell.row, col: cell.col }) as number;
          // Equal to the shown value, or off by a little (0.1%, or 0.5 for a value near 0).
          const constant = rand() < 0.5 ? shown : shown + (Math.abs(shown) > 1 ? shown * 0.001 : 0.5);
          hf.setCellContents({ sheet: sheetId, row: cell.row, col: cell.col }, [[constant]]);
          mutated.add(cell.address);
        }
        for (let k = 0; k < 2; k++) {
          const cell = actuals[Math.floor(rand() * actuals.length)];
          hf.setCellContents({ sheet: sheetId, row: cell.row, col: cell.col }, [[(cell.value as number) + 7 + Math.round(rand() * 50)]]);
          mutated.add(cell.address);
        }
        const report = verifyLedger(hyperFormulaReader(hf, input.anchor.sheet), input.anchor);
        const listed = report.problems.map((p) => p.address);
        expect(new Set(listed).size).toBe(listed.length);
        expect([...listed].sort()).toEqual([...mutated].sort());
        for (const p of report.problems) {
          const kind = desc.cells.find((c) => c.address === p.address)!.kind;
          expect(p.kind).toBe(kind === "actual" ? "actual-changed" : "formula-replaced");
          expect(p.message.length).toBeGreaterThan(20);
        }
      });
    }
  }

  it("reports a changed formula, a damaged layout setting and a value typed below the table", () => {
    const input = mutationCases[2];
    const { hf, desc, sheetId } = ledgerInHyperFormula(input);
    const level = desc.cells.find((c) => c.kind === "formula" && c.formula!.includes("ISNUMBER") && c.col === desc.layout.updates.columns.level)!;
    hf.setCellContents({ sheet: sheetId, row: level.row, col: level.col }, [["=1+1"]]);
    const season = desc.cells.find((c) => c.address === desc.layout.settings.season)!;
    hf.setCellContents({ sheet: sheetId, row: season.row, col: season.col }, [[6]]);
    const last = desc.layout.updates.rows[desc.layout.updates.rows.length - 1].row;
    hf.setCellContents({ sheet: sheetId, row: last + 3, col: desc.layout.updates.columns.actual! }, [[99]]);
    const report = verifyLedger(hyperFormulaReader(hf, input.anchor.sheet), input.anchor);
    expect(report.problems.map((p) => [p.address, p.kind])).toEqual(
      [
        [season.address, "setting-changed"],
        [level.address, "formula-changed"],
        [`${desc.cells.find((c) => c.row === last && c.col === desc.layout.updates.columns.actual!)!.address.replace(/\d+$/, "")}${last + 4}`, "unexpected-content"],
      ].sort((a, b) => Number(a[0].replace(/\D/g, "")) - Number(b[0].replace(/\D/g, ""))),
    );
  });

  it("reports a number typed into a cell of the ledger block that Ebb left empty", () => {
    const input = mutationCases[1];
    const { hf, desc, sheetId } = ledgerInHyperFormula(input);
    const described = new Set(desc.cells.map((c) => `${c.row}:${c.col}`));
    const rows = desc.cells.map((c) => c.row);
    const cols = desc.cells.map((c) => c.col);
    // the first empty cell of the block's middle row, scanning from the left
    const row = Math.round((Math.min(...rows) + Math.max(...rows)) / 2);
    let col = Math.min(...cols);
    while (described.has(`${row}:${col}`)) col++;
    expect(col).toBeLessThanOrEqual(Math.max(...cols));
    hf.setCellContents({ sheet: sheetId, row, col }, [[5]]);
    const report = verifyLedger(hyperFormulaReader(hf, input.anchor.sheet), input.anchor);
    expect(report.problems.map((p) => [p.row, p.col, p.kind])).toEqual([[row, col, "unexpected-content"]]);
  });

  it("accepts a typed alpha; the multiplicative gaps due for a refresh are one notice after the problems", () => {
    for (const input of [mutationCases[0], mutationCases[2]]) {
      const { hf, desc, sheetId } = ledgerInHyperFormula(input);
      const alpha = desc.cells.find((c) => c.address === desc.layout.settings.alpha)!;
      hf.setCellContents({ sheet: sheetId, row: alpha.row, col: alpha.col }, [[0.37]]);
      const report = verifyLedger(hyperFormulaReader(hf, input.anchor.sheet), input.anchor);
      const engineCells = desc.cells.filter((c) => c.kind === "engine").map((c) => c.address);
      expect(report.problems).toEqual([]);
      expect(report.notices.flatMap((n) => n.addresses).sort()).toEqual(engineCells.sort());
      expect(report.notices.length).toBe(engineCells.length ? 1 : 0);
    }
  });

  it("reports an alpha outside 0 to 1", () => {
    const input = mutationCases[2];
    const { hf, desc, sheetId } = ledgerInHyperFormula(input);
    const alpha = desc.cells.find((c) => c.address === desc.layout.settings.alpha)!;
    hf.setCellContents({ sheet: sheetId, row: alpha.row, col: alpha.col }, [[1.4]]);
    const report = verifyLedger(hyperFormulaReader(hf, input.anchor.sheet), input.anchor);
    expect(report.problems.map((p) => [p.address, p.kind])).toEqual([[alpha.address, "setting-invalid"]]);
  });

  it("says clearly when there is no ledger at the anchor", () => {
    const { hf } = ledgerInHyperFormula(mutationCases[2]);
    const report = verifyLedger(hyperFormulaReader(hf, "Add"), { sheet: "Add", cell: "D9" });
    expect(report.ok).toBe(false);
    expect(report.problems[0].message).toMatch(/No Ebb ledger starts at Add!D9/);
  });
});

describe("extend", () => {
  for (const input of mutationCases) {
    it(`appends rows only, and the result equals a ledger written from the longer history: ${input.anchor.sheet}`, () => {
      const full = Array.from(input.history);
      const cut = full.length - 9;
      const first = { ...input, history: full.slice(0, cut) };
      const { hf, desc, sheetId } = ledgerInHyperFormula(first);
      const before = new Map(desc.cells.map((c) => [c.address, c]));
      const ext = extendLedger(hyperFormulaReader(hf, input.anchor.sheet), input.anchor, full.slice(cut));
      for (const c of ext.append) expect(before.has(c.address)).toBe(false);
      const lastOld = desc.layout.updates.rows[desc.layout.updates.rows.length - 1].row;
      expect(Math.min(...ext.append.map((c) => c.row))).toBe(lastOld + 1);
      expect(ext.refresh.every((c) => c.kind === "engine")).toBe(true);
      writeCellsToHyperFormula(hf, input.anchor.sheet, [...ext.append, ...ext.refresh]);
      // Reference: a ledger written directly from the whole history with the same constants.
      const direct = describeLedger({ ...input, settings: { ...input.settings, ...desc.constants } });
      for (const cell of direct.cells) {
        const v = hf.getCellValue({ sheet: sheetId, row: cell.row, col: cell.col });
        if (typeof cell.value === "number") {
          expect(Math.abs((v as number) - cell.value)).toBeLessThanOrEqual(1e-9 * Math.max(Math.abs(cell.value), 1) );
        }
      }
      expect(verifyLedger(hyperFormulaReader(hf, input.anchor.sheet), input.anchor).problems).toEqual([]);
    });
  }

  it("refuses when there is nothing new", () => {
    const input = mutationCases[0];
    const { hf } = ledgerInHyperFormula(input);
    expect(() => extendLedger(hyperFormulaReader(hf, "Mult"), input.anchor, [null, null])).toThrow(/no new actuals/);
  });
});

describe("fit", () => {
  it("puts the engine's fitted constants into the settings cells", () => {
    const input = { ...mutationCases[0], settings: { ...mutationCases[0].settings, alpha: 0.9, beta: 0.4, gamma: 0.6 } };
    const { hf } = ledgerInHyperFormula(input);
    const fit = fitLedgerConstants(hyperFormulaReader(hf, "Mult"), input.anchor);
    const reference = fitModel(input.history, { period: 12, seasonality: "multiplicative", trend: "linear" });
    expect(fit.constants).toEqual(reference.constants);
    writeCellsToHyperFormula(hf, "Mult", fit.cells);
    const report = verifyLedger(hyperFormulaReader(hf, "Mult"), input.anchor);
    expect(report.problems).toEqual([]);
  });
});
