/**
 * The outlook's "Quantities estimated" cell of an additive ledger: the count both interval
 * formulas read (the variance's divisor and factor, the t quantile's degrees of freedom), with a
 * note naming them. Expected count, by the definition in the README (alpha and the start level;
 * beta and the start trend with a trend; phi when damped; gamma and p - 1 start indices): Bird
 * feed, additive, damped, p = 12: 2 + 2 + 1 + 12 = 17. Changing the cell must be caught by the check.
 */
import { verifyLedger } from "../../src/ledger";
import { demoSeries } from "./support/cases";
import { hyperFormulaReader, ledgerInHyperFormula } from "./support/hf";

const input = {
  history: demoSeries("Bird feed"),
  name: "Bird feed",
  settings: { period: 12, seasonality: "additive" as const, trend: "damped" as const },
  horizon: 6,
  coverage: 0.9,
  anchor: { sheet: "Quantities", cell: "A1" },
};

test("the count is its own cell, read by the variance and t formulas, with the quantities named", () => {
  const { hf, desc, sheetId } = ledgerInHyperFormula(input);
  const label = desc.cells.find((c) => c.value === "Quantities estimated")!;
  expect(label.note).toBe("What this model estimates from the history: alpha, the start level, beta, the start trend, phi, gamma and 11 start indices (the last follows from the others).");
  const count = desc.cells.find((c) => c.row === label.row + 1 && c.col === label.col)!;
  expect(count.value).toBe(17);
  const readers = desc.cells.filter((c) => typeof c.formula === "string" && c.formula.includes(count.address.replace(/^([A-Z]+)(\d+)$/, "$$$1$$$2")));
  expect(readers.map((c) => (c.formula!.includes("T.INV(") ? "T.INV" : c.formula!.slice(0, 7))).sort()).toEqual(["=SUMSQ(", "T.INV"]);
  // A changed count is a finding of the check, named by its address.
  expect(verifyLedger(hyperFormulaReader(hf, "Quantities"), input.anchor).ok).toBe(true);
  hf.setCellContents({ sheet: sheetId, row: count.row, col: count.col }, [[5]]);
  const report = verifyLedger(hyperFormulaReader(hf, "Quantities"), input.anchor);
  expect(report.ok).toBe(false);
  expect(report.problems.map((p) => p.address)).toContain(count.address);
});
