/**
 * The demo's outlook rows are labelled with the months they cover, and roll on when a new actual
 * is typed below the history. Expected labels: the month after the CSV's last month, counted by
 * this test with the JavaScript Date type (independent of the sheet's formulas).
 */
import { readFileSync } from "fs";
import { DEMO_CSV_PATH, DEMO_NOTICE } from "../../src/preview/demo/generate-demo";
import { LAYOUT } from "../../src/preview/workbook/demoWorkbook";
import { openDemoWorkbook } from "../../src/preview/workbook/openWorkbook";

const csv = readFileSync(DEMO_CSV_PATH, "utf8").trim().split(/\r?\n/);
const lastMonth = csv[csv.length - 1].split(",")[0];

/** "YYYY-MM" k months after a "YYYY-MM" label. */
function monthsAfter(label: string, k: number): string {
  const d = new Date(Date.UTC(Number(label.slice(0, 4)), Number(label.slice(5, 7)) - 1 + k, 1));
  return `${d.getUTCFullYear()}-${String(d.getUTCMonth() + 1).padStart(2, "0")}`;
}

function labels(wb: ReturnType<typeof openDemoWorkbook>["workbook"], firstRow: number): string[] {
  return Array.from({ length: 12 }, (_, h) => String(wb.cell("Sales", firstRow + h, LAYOUT.labelCol).value));
}

test("the forecast and interval rows are labelled with the twelve months after the last actual", () => {
  const { workbook } = openDemoWorkbook(readFileSync(DEMO_CSV_PATH, "utf8"), DEMO_NOTICE);
  const expected = Array.from({ length: 12 }, (_, h) => monthsAfter(lastMonth, h + 1));
  expect(labels(workbook, LAYOUT.aheadFirstRow)).toEqual(expected);
  expect(labels(workbook, LAYOUT.bandFirstRow)).toEqual(expected);
  expect(workbook.cell("Sales", LAYOUT.aheadHeadRow, LAYOUT.labelCol).value).toBe("Month");
});

test("a new actual typed under one product moves the labels on by a month; undo moves them back", () => {
  const { workbook } = openDemoWorkbook(readFileSync(DEMO_CSV_PATH, "utf8"), DEMO_NOTICE);
  const rows = csv.length; // header + months: the next data row (0-based) is csv.length
  workbook.setInput("Sales", rows, 2, "700");
  expect(labels(workbook, LAYOUT.aheadFirstRow)[0]).toBe(monthsAfter(lastMonth, 2));
  expect(labels(workbook, LAYOUT.aheadFirstRow)[11]).toBe(monthsAfter(lastMonth, 13));
  workbook.undo();
  expect(labels(workbook, LAYOUT.aheadFirstRow)[0]).toBe(monthsAfter(lastMonth, 1));
});
