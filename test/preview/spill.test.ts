/**
 * The preview workbook's #SPILL! behaves as a spreadsheet's does: the message names the cell in
 * the way, and the block comes back as soon as that cell is cleared (common practice in
 * spreadsheets with dynamic arrays). The formula engine alone keeps #SPILL! until the formula is
 * entered again, so this checks the preview's own layer (src/preview/workbook/previewWorkbook.ts).
 */
import { aheadBook } from "./support/aheadBook";

const book = () => aheadBook(40);

test("a number typed inside a spilled block: #SPILL! naming that cell", () => {
  const wb = book();
  expect(wb.cell("S", 0, 2).kind).toBe("number");
  expect(wb.setInput("S", 3, 2, "5")).toEqual({ ok: true }); // C4
  const blocked = wb.cell("S", 0, 2);
  expect(blocked.text).toBe("#SPILL!");
  expect(blocked.error?.message).toBe(
    "The result needs C1:C6, and C4 is in the way. Clear that cell (or move the formula) and the result appears.",
  );
});

test("clearing the cell in the way brings the block back at once", () => {
  const wb = book();
  const before = [0, 1, 2, 3, 4, 5].map((r) => wb.cell("S", r, 2).value);
  wb.setInput("S", 3, 2, "5");
  wb.setInput("S", 3, 2, "");
  expect([0, 1, 2, 3, 4, 5].map((r) => wb.cell("S", r, 2).value)).toEqual(before);
  expect(wb.cell("S", 0, 2).spill).toBe("anchor");
});

test("with two cells in the way both are named, and the block waits until both are clear", () => {
  const wb = book();
  wb.setInput("S", 2, 2, "x");
  wb.setInput("S", 5, 2, "7");
  expect(wb.cell("S", 0, 2).error?.message).toMatch(/^The result needs C1:C6, and C3, C6 are in the way\. Clear those cells/);
  wb.setInput("S", 2, 2, "");
  expect(wb.cell("S", 0, 2).error?.message).toMatch(/and C6 is in the way/);
  wb.setInput("S", 5, 2, "");
  expect(typeof wb.cell("S", 0, 2).value).toBe("number");
});

test("a new actual while blocked keeps #SPILL! (still in the way), then the block rolls forward once clear", () => {
  const wb = book();
  wb.setInput("S", 1, 2, "1");
  wb.setInput("S", 40, 0, "500"); // A41: a new actual, outside the formula's range A1:A40
  expect(wb.cell("S", 0, 2).text).toBe("#SPILL!");
  wb.setInput("S", 1, 2, "");
  expect(wb.cell("S", 0, 2).kind).toBe("number");
});
