/**
 * A planning workbook on the embedded formula engine (the preview's HyperFormula): one column
 * per item holding an M3 monthly training part, and three formulas over the whole table,
 *   =EBB.AHEAD(Data!A1:.., 12, 18, "auto", "auto")
 *   =EBB.BAND(Data!A1:.., 12, 18, 0.95, "auto", "auto")
 *   =EBB.FIT(Data!A1:.., 12, "auto", "auto")
 * timed at the first calculation (building the workbook) and at the recalculation after one
 * typed actual (the next month's value of one item, typed below its column), with the model
 * cache on and off. Beyond the 1,428 M3 monthly series, items repeat a series scaled by a
 * factor (1.01, 1.02, ...), so every item has its own values and its own fit. Wall time.
 */
import type { HyperFormula } from "hyperformula";
import { specOf } from "../../src/functions/catalog";
import { createEbbWorkbook } from "../../src/functions/hyperformula";
import { invoke } from "../../src/functions/invoke";
import { clearModelCache, MAX_BYTES, MAX_ENTRIES, modelCacheStats, setModelCache } from "../../src/functions/modelCache";
import { columnLetters } from "../../src/ledger/describe/addresses";
import { aheadBlock } from "./ahead";
import type { M3Series } from "./m3";
import { now } from "./timing";

export interface WorkbookRow {
  items: number;
  cached: boolean;
  firstSeconds: number;
  recalcSeconds: number;
  /** Cells of the three results holding an error (series the formulas could not fit), a sanity figure. */
  errorCells: number;
}

/** One call through the functions layer (the path every host takes), timed with the cache emptied first. */
export interface CallRow {
  label: string;
  seconds: number;
  /** What the figure is compared with in the report. */
  note: string;
}

export interface WorkbookResult {
  rows: WorkbookRow[];
  rowsPerItem: number;
  calls: CallRow[];
  /** The cache after the largest cached workbook: entries and estimated bytes, and its bounds. */
  cache: { entries: number; bytes: number; maxEntries: number; maxBytes: number };
}

interface Table {
  columns: Float64Array[];
  /** The next actual of each item, typed into the row after its last value. */
  next: number[];
  rows: number;
}

function itemTable(monthly: M3Series[], items: number): Table {
  const columns: Float64Array[] = [];
  const next: number[] = [];
  for (let i = 0; i < items; i++) {
    const s = monthly[i % monthly.length];
    const scale = 1 + Math.floor(i / monthly.length) * 0.01;
    columns.push(s.train.map((v) => v * scale));
    next.push(s.test[0] * scale);
  }
  // One blank row below the longest column, so every item has room for its next actual.
  const rows = Math.max(...columns.map((c) => c.length)) + 1;
  return { columns, next, rows };
}

function dataSheet(t: Table): (number | null)[][] {
  return Array.from({ length: t.rows }, (_, r) => t.columns.map((c) => (r < c.length ? c[r] : null)));
}

function formulas(t: Table): Record<string, string[][]> {
  const range = `Data!A1:${columnLetters(t.columns.length - 1)}${t.rows}`;
  return {
    Ahead: [[`=EBB.AHEAD(${range}, 12, 18, "auto", "auto")`]],
    Band: [[`=EBB.BAND(${range}, 12, 18, 0.95, "auto", "auto")`]],
    Fit: [[`=EBB.FIT(${range}, 12, "auto", "auto")`]],
  };
}

function countErrors(hf: HyperFormula): number {
  let errors = 0;
  for (const name of ["Ahead", "Band", "Fit"]) {
    const values = hf.getSheetValues(hf.getSheetId(name)!);
    for (const row of values) for (const v of row) if (typeof v === "object" && v !== null) errors++;
  }
  return errors;
}

let lastCache = { entries: 0, bytes: 0 };

function measureOne(t: Table, cached: boolean): WorkbookRow {
  setModelCache(cached);
  clearModelCache();
  const t0 = now();
  const hf = createEbbWorkbook({ Data: dataSheet(t), ...formulas(t) });
  const firstSeconds = now() - t0;
  // The typed actual: the next month of the middle item, in the row after its last value.
  const item = Math.floor(t.columns.length / 2);
  const t1 = now();
  hf.setCellContents({ sheet: hf.getSheetId("Data")!, row: t.columns[item].length, col: item }, [[t.next[item]]]);
  const recalcSeconds = now() - t1;
  const errorCells = countErrors(hf);
  if (cached) lastCache = { entries: modelCacheStats().entries, bytes: modelCacheStats().bytes };
  hf.destroy();
  return { items: t.columns.length, cached, firstSeconds, recalcSeconds, errorCells };
}

function timedCall(label: string, note: string, name: string, args: unknown[]): CallRow {
  clearModelCache();
  const t0 = now();
  const outcome = invoke(specOf(name), args);
  const seconds = now() - t0;
  if (!outcome.ok) throw new Error(`${label} failed: ${outcome.error.message}`);
  return { label, seconds, note };
}

/** An invented 1,000-month seasonal series with a trend and deterministic noise (for the backtest call). */
function longSeries(n: number): number[][] {
  return Array.from({ length: n }, (_, t) => [(500 + 0.5 * t) * (1 + 0.3 * Math.sin((2 * Math.PI * t) / 12)) + 20 * Math.sin(5.7 * t)]);
}

/** The simulated intervals' pace and the worst single calls the issue names, one call each, cache emptied before each. */
function measureCalls(monthly: M3Series[]): CallRow[] {
  const block = aheadBlock(monthly, 1000, 120);
  timedCall("warm-up", "", "BAND", [aheadBlock(monthly, 5, 120), 12, 18]);
  const wide = aheadBlock(monthly, 28, 120);
  return [
    timedCall("EBB.AHEAD, 1000 series x 120 periods, horizon 18", "target < 0.3 s", "AHEAD", [block, 12, 18]),
    timedCall("EBB.BAND, 1000 series x 120 periods, horizon 18 (mult.: simulated)", "target: no more than AHEAD before (1.17 s)", "BAND", [block, 12, 18]),
    timedCall("EBB.BAND, 28 series, horizon 1000 (mult.: simulated)", "13 s before", "BAND", [wide, 12, 1000]),
    timedCall("EBB.BACKTEST, 1000 rows, horizon 12, 500 origins", "3.5 s before", "BACKTEST", [longSeries(1000), 12, 12, 500]),
  ];
}

/**
 * @param sizes item counts to measure
 * @param uncachedUpTo largest item count also measured with the cache off
 */
export function measureWorkbook(monthly: M3Series[], sizes: number[], uncachedUpTo: number, note: (m: string) => void): WorkbookResult {
  const rows: WorkbookRow[] = [];
  measureOne(itemTable(monthly, 20), true); // warm-up: load and compile the code paths
  for (const items of sizes) {
    const t = itemTable(monthly, items);
    for (const cached of [true, false]) {
      if (!cached && items > uncachedUpTo) continue;
      note(`workbook: ${items} items, cache ${cached ? "on" : "off"}`);
      rows.push(measureOne(t, cached));
    }
  }
  setModelCache(true);
  note("workbook: single calls (AHEAD, BAND, BACKTEST)");
  const calls = measureCalls(monthly);
  clearModelCache();
  return {
    rows,
    rowsPerItem: itemTable(monthly, Math.min(monthly.length, Math.max(...sizes))).rows,
    calls,
    cache: { ...lastCache, maxEntries: MAX_ENTRIES, maxBytes: MAX_BYTES },
  };
}
