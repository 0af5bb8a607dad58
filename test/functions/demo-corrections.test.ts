/**
 * The preview's demo workbook, Corrections sheet: the invented promotion and stock-out of hose
 * reels are flagged by its EBB.UNUSUAL formula, the typed corrections and reasons sit beside the
 * actuals (which stay as recorded on Sales), and the corrected outlook and safety stock are the
 * engine's figures on the corrected values. Expected values: the demo recipe (DEMO_EVENTS) and
 * the engine itself on the same values.
 */
import { readFileSync } from "fs";
import { applyCorrections, fitModel, forecastModel, stockBuffer } from "../../src/engine";
import { DEMO_CSV_PATH, DEMO_EVENTS, DEMO_NOTICE } from "../../src/preview/demo/generate-demo";
import { CORRECTIONS_LAYOUT as L, CORRECTIONS_SHEET, DEMO_CORRECTIONS, DEMO_LEAD_TIME, DEMO_SERVICE_LEVEL } from "../../src/preview/workbook/correctionsSheet";
import { openDemoWorkbook } from "../../src/preview/workbook/openWorkbook";
import { STOCK_CAUTION } from "../../src/taskpane/panel/cautions";
import { readDemo } from "./support/demo";

const { workbook } = openDemoWorkbook(readFileSync(DEMO_CSV_PATH, "utf8"), DEMO_NOTICE);
const hf = workbook.hf;
const sheet = hf.getSheetId(CORRECTIONS_SHEET)!;
const at = (row: number, col: number) => hf.getCellValue({ sheet, row, col });
const demo = readDemo();
const hose = demo.columns[demo.names.indexOf(DEMO_EVENTS[0].product)];
const months = Array.from({ length: hose.length }, (_, i) => at(i + 1, L.month));

test("each event month carries its typed correction and reason; the actual beside it is the recorded one", () => {
  const corrected = months.flatMap((m, i) => (at(i + 1, L.correction) === null ? [] : [m]));
  expect(corrected).toEqual(DEMO_EVENTS.map((e) => e.month));
  for (const e of DEMO_EVENTS) {
    const r = months.indexOf(e.month) + 1;
    expect(at(r, L.actual)).toBe(hose[r - 1]);
    expect(at(r, L.correction)).toBe(DEMO_CORRECTIONS[e.month]);
    expect(at(r, L.reason)).toBe(e.reason);
  }
});

test("EBB.UNUSUAL on the sheet flags exactly the promotion (high) and the stock-out (low)", () => {
  const flags = months.flatMap((m, i) => (at(i + 1, L.flag) === null ? [] : [`${m} ${at(i + 1, L.flag)}`]));
  expect(flags).toEqual(DEMO_EVENTS.map((e) => `${e.month} ${e.kind === "promotion" ? "high" : "low"}`));
});

test("outlook and safety stock with corrections are the engine's on the corrected values; the caution is on the sheet", () => {
  const fixes = months.map((m) => DEMO_CORRECTIONS[m as string] ?? null);
  const values = applyCorrections(hose, fixes).values;
  const model = fitModel(values, { period: 12 });
  const ahead = forecastModel(model, 12);
  for (let h = 0; h < 12; h++) expect(at(3 + h, L.corrected)).toBe(ahead[h]);
  const b = stockBuffer(model, { leadTime: DEMO_LEAD_TIME, serviceLevel: DEMO_SERVICE_LEVEL });
  expect([18, 19, 20, 21].map((r) => at(r, L.corrected))).toEqual([b.forecast, b.sd, b.safetyStock, b.reorderPoint]);
  const raw = stockBuffer(fitModel(hose, { period: 12 }), { leadTime: DEMO_LEAD_TIME, serviceLevel: DEMO_SERVICE_LEVEL });
  expect([18, 19, 20, 21].map((r) => at(r, L.asRecorded))).toEqual([raw.forecast, raw.sd, raw.safetyStock, raw.reorderPoint]);
  expect(at(23, L.corrected)).toBe(2); // corrected periods
  expect(at(25, L.label)).toBe(STOCK_CAUTION);
});
