/**
 * Undo and redo in the preview workbook, as in a spreadsheet (common practice: Ctrl+Z takes back
 * the last edit, Ctrl+Y puts it back; a command that changes many cells is one step). Checked
 * on the preview's own layer (src/preview/workbook/previewWorkbook.ts) over the formula engine;
 * expected values are the cells as this test typed them.
 */
import { describeLedger, writeLedgerToHyperFormula } from "../../src/ledger";
import { readDemo } from "../functions/support/demo";
import { aheadBook } from "./support/aheadBook";

const seed = readDemo().columns[0].slice(0, 48);
const book = () => aheadBook(48);

test("nothing to undo in the workbook as opened", () => {
  const wb = book();
  expect(wb.undo()).toBe(false);
  expect(wb.redo()).toBe(false);
});

test("an edit is undone and redone, and the forecast follows", () => {
  const wb = book();
  const forecast = wb.cell("S", 0, 2).value;
  wb.setInput("S", 47, 0, "9999");
  expect(wb.cell("S", 0, 2).value).not.toBe(forecast);
  expect(wb.undo()).toBe(true);
  expect(wb.cell("S", 47, 0).value).toBe(seed[47]);
  expect(wb.cell("S", 0, 2).value).toBe(forecast);
  expect(wb.redo()).toBe(true);
  expect(wb.cell("S", 47, 0).value).toBe(9999);
  expect(wb.redo()).toBe(false);
});

test("steps come back one at a time, newest first; a new edit ends the redo list", () => {
  const wb = book();
  wb.setInput("S", 0, 4, "1");
  wb.setInput("S", 1, 4, "2");
  wb.setInput("S", 2, 4, "3");
  wb.undo();
  expect([0, 1, 2].map((r) => wb.cell("S", r, 4).value)).toEqual([1, 2, null]);
  wb.undo();
  expect([0, 1, 2].map((r) => wb.cell("S", r, 4).value)).toEqual([1, null, null]);
  wb.setInput("S", 5, 4, "6");
  expect(wb.redo()).toBe(false);
  wb.undo();
  wb.undo();
  expect(wb.cell("S", 0, 4).value).toBe(null);
});

test("clearing a cell in a spilled block's way, which spills it again, is one step", () => {
  const wb = book();
  wb.setInput("S", 3, 2, "5"); // blocks C1:C6
  expect(wb.cell("S", 0, 2).text).toBe("#SPILL!");
  wb.setInput("S", 3, 2, ""); // clears the way: the block spills again in the same step
  expect(wb.cell("S", 0, 2).spill).toBe("anchor");
  wb.undo();
  expect(wb.cell("S", 3, 2).value).toBe(5);
  expect(wb.cell("S", 0, 2).text).toBe("#SPILL!");
  wb.undo();
  expect(wb.cell("S", 3, 2).value).not.toBe(5);
  expect(wb.cell("S", 0, 2).spill).toBe("anchor");
});

test("a ledger written as one step (sheet, names and cells) goes with one undo and comes back with one redo", () => {
  const wb = book();
  const desc = describeLedger({ history: seed, name: "Seed", settings: { period: 12 }, horizon: 6, coverage: 0.9, anchor: { sheet: "Ledger", cell: "A1" } });
  wb.step(() => writeLedgerToHyperFormula(wb.hf, desc));
  expect(wb.sheetNames()).toContain("Ledger");
  const names = wb.hf.listNamedExpressions().length;
  expect(names).toBeGreaterThan(5);
  expect(wb.undo()).toBe(true);
  expect(wb.sheetNames()).toEqual(["S"]);
  expect(wb.hf.listNamedExpressions()).toEqual([]);
  expect(wb.redo()).toBe(true);
  expect(wb.sheetNames()).toContain("Ledger");
  expect(wb.hf.listNamedExpressions().length).toBe(names);
});
