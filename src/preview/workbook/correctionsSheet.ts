/**
 * The demo's "Corrections" sheet: the invented promotion and stock-out of one product, with the
 * corrections and reasons a planner typed beside the actuals, EBB.UNUSUAL's suggestions, and the
 * outlook and safety stock with and without the corrections. The actuals stay on the Sales sheet
 * as recorded; every formula here reads them from there, so a new month typed on Sales flows in.
 */
import type { RawCellContent } from "hyperformula";
import { DEMO_EVENTS } from "../demo/events";
import { columnLetters, quoteSheet } from "./addresses";
import { CAUTIONS, STOCK_CAUTION } from "../../taskpane/panel/cautions";

export const CORRECTIONS_SHEET = "Corrections";

/** The figures the (invented) planner typed: normal demand for the promoted month, demand incl. turned-away orders for the stock-out. */
export const DEMO_CORRECTIONS: Record<string, number> = { "2024-03": 400, "2025-06": 1360 };

/** Lead time and service level of the demo's buffer block. */
export const DEMO_LEAD_TIME = 2;
export const DEMO_SERVICE_LEVEL = 0.95;

/** 0-based columns of the sheet. */
export const CORRECTIONS_LAYOUT = {
  month: 0, // A
  actual: 1, // B
  correction: 2, // C
  reason: 3, // D
  flag: 5, // F (spill: flag, suggestion)
  label: 8, // I
  asRecorded: 9, // J
  corrected: 10, // K
} as const;

export interface CorrectionsSheet {
  cells: RawCellContent[][];
  widths: Record<number, number>;
}

/**
 * @param months "YYYY-MM" of every data row, oldest first
 * @param productColumn 0-based column of the product on the Sales sheet
 * @param salesSheet name of the sheet with the actuals
 * @param lastRow last row (1-based) the history ranges reach
 * @param period season length
 */
export function buildCorrectionsSheet(months: string[], productColumn: number, salesSheet: string, lastRow: number, period: number): CorrectionsSheet {
  const L = CORRECTIONS_LAYOUT;
  const cells: RawCellContent[][] = [];
  const put = (r: number, c: number, v: RawCellContent): void => {
    while (cells.length <= r) cells.push([]);
    while (cells[r].length < c) cells[r].push(null);
    cells[r][c] = v;
  };
  const sales = quoteSheet(salesSheet);
  const col = columnLetters(productColumn);
  const history = `${sales}!${col}2:${col}${lastRow}`;
  const corrections = `C2:C${lastRow}`;
  const corrected = `EBB.CORRECTED(${history}, ${corrections})`;

  put(0, L.month, "month");
  put(0, L.actual, `=${sales}!${col}1`);
  put(0, L.correction, "Correction (typed)");
  put(0, L.reason, "Reason (typed)");
  put(0, L.flag, "EBB.UNUSUAL: flag");
  put(0, L.flag + 1, "suggested value");
  months.forEach((m, i) => {
    put(i + 1, L.month, m);
    put(i + 1, L.actual, `=${sales}!${col}${i + 2}`);
    const event = DEMO_EVENTS.find((e) => e.month === m);
    if (event && DEMO_CORRECTIONS[m] !== undefined) {
      put(i + 1, L.correction, DEMO_CORRECTIONS[m]);
      put(i + 1, L.reason, event.reason);
    }
  });
  put(1, L.flag, `=EBB.UNUSUAL(${history}, ${period})`);

  const line = (r: number, label: string, recorded: RawCellContent, fixed: RawCellContent): void => {
    put(r, L.label, label);
    put(r, L.asRecorded, recorded);
    put(r, L.corrected, fixed);
  };
  put(0, L.label, "Invented demo: a spring promotion and a summer stock-out of hose reels, corrected with reasons. The actuals stay as recorded on Sales.");
  line(2, "Next 12 months", "as recorded", "with corrections");
  put(3, L.asRecorded, `=EBB.AHEAD(${history}, ${period}, 12)`);
  put(3, L.corrected, `=EBB.AHEAD(${corrected}, ${period}, 12)`);
  for (let h = 1; h <= 12; h++) put(2 + h, L.label, h);
  const b = 17;
  line(b, `Safety stock: lead time ${DEMO_LEAD_TIME} months, ${DEMO_SERVICE_LEVEL * 100}% cycle service level (EBB.BUFFER)`, "as recorded", "with corrections");
  put(b + 1, L.asRecorded, `=EBB.BUFFER(${history}, ${period}, ${DEMO_LEAD_TIME}, ${DEMO_SERVICE_LEVEL})`);
  put(b + 1, L.corrected, `=EBB.BUFFER(${corrected}, ${period}, ${DEMO_LEAD_TIME}, ${DEMO_SERVICE_LEVEL})`);
  ["Lead-time demand", "Std. deviation of its error", "Safety stock", "Reorder point"].forEach((label, i) => put(b + 1 + i, L.label, label));
  put(b + 6, L.label, "Corrected periods");
  put(b + 6, L.corrected, `=COUNT(${corrections})`);
  put(b + 8, L.label, STOCK_CAUTION);
  put(b + 9, L.label, CAUTIONS);
  const widths: Record<number, number> = { [L.month]: 66, [L.actual]: 110, [L.correction]: 118, [L.reason]: 330, [L.flag]: 110, [L.flag + 1]: 104, [L.label]: 300, [L.asRecorded]: 104, [L.corrected]: 116 };
  return { cells, widths };
}
