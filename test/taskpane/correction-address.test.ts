/**
 * A correction that is not a number is refused with the address a planner sees: the sheet
 * (quoted when its name needs quotes, as spreadsheet references do), the column letter and the
 * 1-based row of that period (common practice of spreadsheet addresses).
 */
import { readCorrectionCells } from "../../src/taskpane/panel/correctionColumns";
import type { WorkbookPort } from "../../src/taskpane/port";

/** A port whose cells below the first row hold 5, blank and then the given text. */
function portWith(text: string): WorkbookPort {
  return { read: async () => ({ values: [[5], [null], [text]] }) } as unknown as WorkbookPort;
}

test.each([
  ["Corrections", "Corrections!C6"],
  ["Hose reels", "'Hose reels'!C6"],
])("on sheet %p the third period's text is named at %p", async (sheet, address) => {
  // Period 1 on row 2 (firstRow 1, 0-based), column C (2); read from period 3 (from = 2), the third cell read is period 5: C6.
  const read = await readCorrectionCells(portWith("n/a"), { sheet, col: 2, firstRow: 1 }, undefined, 2, 3);
  expect(read).toEqual({ ok: false, message: `The correction in ${address} is "n/a", not a number. Type a figure there, or clear it to use the actual.` });
});
