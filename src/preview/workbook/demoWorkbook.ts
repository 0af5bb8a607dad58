/**
 * The demo workbook the preview opens with: the invented Larkmere Garden Supply sales (from the
 * committed CSV) on "Sales", a rolling forecast table built from EBB functions beside them, and
 * a "Corrections" sheet (corrected history with reasons, suggestions, safety stock), and a
 * "Read me" sheet with the notice and the cautions.
 */
import { ACTIONS } from "../../ledger/actions";
import type { RawCellContent } from "hyperformula";
import { columnLetters } from "./addresses";
import { parseCsv } from "./csvText";
import { CAUTIONS } from "../../taskpane/panel/cautions";
import { DEMO_EVENTS } from "../demo/events";
import { firstOutlookMonth, nextMonth } from "./outlookMonths";
import { buildCorrectionsSheet, CORRECTIONS_SHEET } from "./correctionsSheet";

export const SALES_SHEET = "Sales";
export const README_SHEET = "Read me";

/** Season length of the monthly demo data, typed into every formula so nothing is guessed. */
export const DEMO_PERIOD = 12;
export const DEMO_HORIZON = 12;
/** History ranges reach well below the data, so a typed new month is picked up at once. */
export const HISTORY_LAST_ROW = 200;

/** Where the forecast blocks sit on the Sales sheet (0-based rows; column H onwards). */
export const LAYOUT = {
  labelCol: 7, // H
  firstValueCol: 8, // I
  noticeRow: 0,
  aheadTitleRow: 2,
  aheadHeadRow: 3,
  aheadFirstRow: 4,
  bandTitleRow: 17,
  bandHeadRow: 18,
  bandFirstRow: 19,
  fitTitleRow: 32,
  fitHeadRow: 33,
  fitFirstRow: 34,
  periodRow: 44,
  accuracyTitleRow: 46,
  accuracyHeadRow: 47,
  accuracyFirstRow: 48,
  watchTitleRow: 58,
  watchHeadRow: 59,
  watchFirstRow: 60,
} as const;

/** Column heads of the review list (EBB.WATCH returns these five columns, one row per product). */
export const WATCH_HEADS = ["Status", "Tracking signal (last 6)", "Bias, last 6 (% of mean)", "MASE, last season", "Last 6 outside 95% band"];

export const FIT_LABELS = ["Seasonality", "Trend", "alpha", "beta", "gamma", "phi", "SSE", "RMSE", "AICc"];

export { CAUTIONS };

export interface DemoWorkbook {
  sheets: Record<string, RawCellContent[][]>;
  productCount: number;
  /** Column widths (pixels) per sheet, by column index. */
  widths: Record<string, Record<number, number>>;
  /** Header cells per sheet: shown in full (wrapped), so "...: low" and "...: high" can be told apart. */
  headers: Record<string, { row: number; col: number }[]>;
}

/** The history range of product k (0-based), e.g. B2:B200. */
export function historyRange(k: number): string {
  const col = columnLetters(1 + k);
  return `${col}2:${col}${HISTORY_LAST_ROW}`;
}

/** All products' histories as one block, e.g. B2:F200: one formula serves the whole table. */
export function allHistoriesRange(productCount: number): string {
  return `B2:${columnLetters(productCount)}${HISTORY_LAST_ROW}`;
}

export function buildDemoWorkbook(csvText: string, notice: string): DemoWorkbook {
  const rows = parseCsv(csvText).filter((r) => r.some((f) => f.trim() !== ""));
  const [header, ...data] = rows;
  const productCount = header.length - 1;
  const sales: RawCellContent[][] = [];
  const put = (r: number, c: number, v: RawCellContent): void => {
    while (sales.length <= r) sales.push([]);
    while (sales[r].length < c) sales[r].push(null);
    sales[r][c] = v;
  };
  header.forEach((h, c) => put(0, c, h));
  data.forEach((line, i) => {
    put(i + 1, 0, line[0]);
    for (let c = 1; c <= productCount; c++) {
      const t = (line[c] ?? "").trim();
      put(i + 1, c, t === "" ? null : Number(t));
    }
  });

  const L = LAYOUT;
  const all = allHistoriesRange(productCount);
  const nameRef = (k: number): string => `=${columnLetters(1 + k)}1`;
  const v = (k: number): number => L.firstValueCol + k;

  // The outlook's rows are labelled with the months they cover, rolling on with each new actual.
  const putMonths = (firstRow: number): void => {
    put(firstRow, L.labelCol, firstOutlookMonth(productCount, HISTORY_LAST_ROW));
    for (let h = 2; h <= DEMO_HORIZON; h++) put(firstRow + h - 1, L.labelCol, nextMonth(`${columnLetters(L.labelCol)}${firstRow + h - 1}`));
  };

  // The page's header says "invented data" once for the whole preview; the sheet carries the cautions.
  put(L.noticeRow, L.labelCol, CAUTIONS);

  put(L.aheadTitleRow, L.labelCol, `Next ${DEMO_HORIZON} months: forecast from the latest actuals (EBB.AHEAD, one formula for all products)`);
  put(L.aheadHeadRow, L.labelCol, "Month");
  for (let k = 0; k < productCount; k++) put(L.aheadHeadRow, v(k), nameRef(k));
  putMonths(L.aheadFirstRow);
  put(L.aheadFirstRow, L.firstValueCol, `=EBB.AHEAD(${all}, ${DEMO_PERIOD}, ${DEMO_HORIZON})`);

  put(L.bandTitleRow, L.labelCol, "95% prediction interval: low and high for each product (EBB.BAND, one formula)");
  put(L.bandHeadRow, L.labelCol, "Month");
  putMonths(L.bandFirstRow);
  for (let k = 0; k < productCount; k++) {
    const col = columnLetters(1 + k);
    put(L.bandHeadRow, v(2 * k), `=${col}1&": low"`);
    put(L.bandHeadRow, v(2 * k + 1), `=${col}1&": high"`);
  }
  put(L.bandFirstRow, L.firstValueCol, `=EBB.BAND(${all}, ${DEMO_PERIOD}, ${DEMO_HORIZON}, 0.95)`);

  put(L.fitTitleRow, L.labelCol, "The model fitted to each product (EBB.FIT): smoothing constants and errors");
  put(L.fitHeadRow, L.labelCol, "Model");
  for (let k = 0; k < productCount; k++) put(L.fitHeadRow, v(k), nameRef(k));
  FIT_LABELS.forEach((label, i) => put(L.fitFirstRow + i, L.labelCol, label));
  put(L.fitFirstRow, L.firstValueCol, `=EBB.FIT(${all}, ${DEMO_PERIOD})`);
  put(L.periodRow, L.labelCol, "Season length found (EBB.PERIOD)");
  put(L.periodRow, L.firstValueCol, `=EBB.PERIOD(${all})`);

  put(L.accuracyTitleRow, L.labelCol, "How well the one-step forecasts matched the actuals so far (EBB.ACCURACY of EBB.FITTED)");
  put(L.accuracyHeadRow, L.labelCol, "Measure and value");
  for (let k = 0; k < productCount; k++) {
    const hist = historyRange(k);
    put(L.accuracyHeadRow, v(2 * k), nameRef(k));
    put(L.accuracyFirstRow, v(2 * k), `=EBB.ACCURACY(${hist}, EBB.FITTED(${hist}, ${DEMO_PERIOD}), ${hist}, ${DEMO_PERIOD})`);
  }

  put(L.watchTitleRow, L.labelCol, 'Which forecasts to look at this month (EBB.WATCH with the automatic model, one formula for all products)');
  WATCH_HEADS.forEach((head, i) => put(L.watchHeadRow, v(i), head));
  for (let k = 0; k < productCount; k++) put(L.watchFirstRow + k, L.labelCol, nameRef(k));
  put(L.watchFirstRow, L.firstValueCol, `=EBB.WATCH(${all}, ${DEMO_PERIOD}, "auto")`);

  const corrections = buildCorrectionsSheet(
    data.map((line) => line[0]),
    header.indexOf(DEMO_EVENTS[0].product),
    SALES_SHEET,
    HISTORY_LAST_ROW,
    DEMO_PERIOD,
  );
  const readme: RawCellContent[][] = readmeLines(notice).map((line) => [line]);
  const widths: Record<number, number> = { 0: 66, [L.labelCol - 1]: 18, [L.labelCol]: 130 };
  for (let c = 1; c <= productCount; c++) widths[c] = 84;
  for (let k = 0; k < 2 * productCount; k++) widths[L.firstValueCol + k] = 92;
  // The review list's status words ("forecast too low") read in full; product names beside them.
  widths[L.firstValueCol] = 118;
  return {
    sheets: { [SALES_SHEET]: sales, [CORRECTIONS_SHEET]: corrections.cells, [README_SHEET]: readme },
    productCount,
    widths: { [SALES_SHEET]: widths, [CORRECTIONS_SHEET]: corrections.widths, [README_SHEET]: { 0: 900 } },
    headers: {
      [SALES_SHEET]: [
        ...headerCells(sales, [0], 0, productCount), // the product names above the actuals
        ...headerCells(sales, [L.aheadHeadRow, L.bandHeadRow, L.fitHeadRow, L.accuracyHeadRow, L.watchHeadRow], L.labelCol, Infinity),
      ],
    },
  };
}

/** Every filled cell of the given rows from column `first` to `last`. */
function headerCells(cells: RawCellContent[][], rows: number[], first: number, last: number): { row: number; col: number }[] {
  return rows.flatMap((row) =>
    (cells[row] ?? []).flatMap((v, col) => (v === null || v === undefined || col < first || col > last ? [] : [{ row, col }])),
  );
}

function readmeLines(notice: string): string[] {
  return [
    "Ebb preview: seasonal forecasting functions and the Ebb ledger, without a spreadsheet program",
    "",
    notice,
    "",
    "Please read first",
    CAUTIONS,
    "",
    "What the Sales sheet shows",
    "Columns A to G: the month and monthly unit sales, January 2019 to December 2025, one column per product (Flower bulbs has three missing months; Rain barrels sells about 40% more for good from July 2025).",
    "Column H onwards: a rolling forecast built from EBB worksheet functions; every number is a live formula (select a cell to see it in the formula bar).",
    "Cells with a tinted background are spilled results: one formula in the first cell fills the whole block.",
    "",
    "Try it",
    "1. On Sales, type a new month's figure in row 86 under a product (for example 700 in B86): the forecast, ranges and scores recompute.",
    "2. Select one product's column (click its letter), then use the Ebb ledger panel to write a ledger: plain formulas, one row per month.",
    `3. On the ledger sheet, change alpha in its settings and watch every row recompute; press "${ACTIONS.verify}" to check the ledger (and the Sales figures it refers to) against Ebb's engine.`,
    "4. On Corrections: hose reels had an (invented) promotion in March 2024 and a stock-out in June 2025. EBB.UNUSUAL flags both and suggests a value; the planner typed a correction and a reason beside each actual. The outlook and safety stock are shown as recorded and with the corrections (EBB.CORRECTED). Clear a correction to see its effect; the actuals on Sales never change.",
    "5. The review list at the foot of Sales (EBB.WATCH) flags the items to look at: rain barrels, whose demand stepped up, reads forecast too low. Write its ledger to see the rose tracking-signal rows, and the panel says the signal is beyond its limit.",
    "",
    "Errors: #N/A means more history is needed (the message says how much); #VALUE! means an input must be changed. Hover over an error or select it to read why.",
  ];
}
