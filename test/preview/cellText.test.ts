/**
 * The preview grid's number text: readable figures with thousands separators, never an exponent
 * for sums of squares or sales (common practice in planners' spreadsheets: #,##0 formats).
 */
import { numberText } from "../../src/preview/workbook/cellText";

test.each([
  [1317600.4, "1,317,600"], // an SSE from EBB.FIT, once shown as 1.3176e+6
  [1317600, "1,317,600"],
  [-2500000.75, "-2,500,001"],
  [123456.7, "123,457"],
  [4523.68, "4,523.7"],
  [312.04, "312.0"],
  [0.30612, "0.3061"],
  [1.5, "1.500"],
  [0.0123, "0.0123"],
  [202101, "202101"], // a period label stays as typed
  [2024, "2024"],
  [0, "0"],
])("%d shows as %s", (v, text) => {
  expect(numberText(v)).toBe(text);
});

test("no exponent for any value a planner's sheet holds (up to a thousand trillion)", () => {
  for (const v of [1e6 + 0.5, 3.2e9 + 0.1, 7.7e12, 9.99e14]) expect(numberText(v)).not.toMatch(/e/i);
});
