/**
 * The preview's number formats: what a spreadsheet shows for the codes the ledger writes
 * (common practice of spreadsheet number format codes: a % multiplies by 100, a quoted text is
 * shown as typed, [<=1]A;B uses A when the value is at most 1, otherwise B).
 */
import { formatNumber } from "../../src/preview/workbook/cellDecor";
import { FORMAT } from "../../src/ledger/describe/sheet";

test.each([
  [0.95, FORMAT.coverage, "95.0%"],
  [95, FORMAT.coverage, "95.0%"],
  [80, FORMAT.coverage, "80.0%"],
  [1, FORMAT.coverage, "100.0%"],
  [1234.5, "#,##0.00", "1,234.50"],
  [0.5, "0.0%", "50.0%"],
  [12.3456, "0.0000", "12.3456"],
  [7, '0" units"', "7 units"],
])("%p with %p shows %p", (v, format, shown) => {
  expect(formatNumber(v, format)).toBe(shown);
});
