/**
 * Turning the selected cells into histories: one per column, a text first cell taken as the
 * header, numbers and blanks below it. Anything else gets a message naming the cell.
 */
import { cleanHistory, detectPeriod, modelShape, requiredLength, shapeConstants } from "../../engine";
import { columnLetters } from "../../ledger/describe/addresses";
import type { PortValue, SheetBlock } from "../port";

export interface HistoryPick {
  sheet: string;
  /** 0-based column of the history. */
  col: number;
  /** 0-based row of the header, when the first cell holds one. */
  headerRow?: number;
  /** 0-based row of the first value. */
  firstRow: number;
  /** Header text; without one, the column's heading in row 1 (when text) or "Sales column B". */
  name: string;
  /** Values oldest first; null for a blank cell; trailing blanks dropped. */
  values: (number | null)[];
}

export type PickResult = { ok: true; picks: HistoryPick[] } | { ok: false; message: string };

const isBlank = (v: PortValue): boolean => v === null || (typeof v === "string" && v.trim() === "");
const isError = (v: PortValue): v is { error: string } => typeof v === "object" && v !== null;

/** Reads each column of a block as one history. */
export function pickHistories(block: SheetBlock): PickResult {
  const rows = block.values.length;
  const cols = rows > 0 ? block.values[0].length : 0;
  if (rows === 0 || cols === 0) return { ok: false, message: "Nothing is selected. Select a column of actuals, oldest at the top." };
  if (rows === 1 && cols > 1) {
    return { ok: false, message: "The ledger reads a history down a column. Select the actuals in one column (a header in the first cell is fine)." };
  }
  const picks: HistoryPick[] = [];
  for (let c = 0; c < cols; c++) {
    const result = pickColumn(block, c);
    if (!result.ok) return result;
    picks.push(result.pick);
  }
  return { ok: true, picks };
}

function pickColumn(block: SheetBlock, c: number): { ok: true; pick: HistoryPick } | { ok: false; message: string } {
  const col = block.left + c;
  const cell = (r: number): string => `${block.sheet}!${columnLetters(col)}${block.top + r + 1}`;
  const first = block.values[0][c];
  const hasHeader = typeof first === "string" && first.trim() !== "" && !Number.isFinite(Number(first));
  const values: (number | null)[] = [];
  for (let r = hasHeader ? 1 : 0; r < block.values.length; r++) {
    const v = block.values[r][c];
    if (isBlank(v)) values.push(null);
    else if (typeof v === "number" && Number.isFinite(v)) values.push(v);
    else if (isError(v)) return { ok: false, message: `${cell(r)} shows ${v.error}. Fix that cell or clear it (a blank counts as a missing value).` };
    else {
      return {
        ok: false,
        message: `${cell(r)} holds ${JSON.stringify(String(v))}, which is not a number. The history must be numbers, with blank cells for missing values.`,
      };
    }
  }
  while (values.length > 0 && values[values.length - 1] === null) values.pop();
  if (!values.some((v) => v !== null)) {
    return { ok: false, message: `The column ${columnLetters(col)} of the selection holds no numbers. Select the actuals, oldest at the top.` };
  }
  const firstRow = block.top + (hasHeader ? 1 : 0);
  const name = hasHeader ? String(first).trim() : `${block.sheet} column ${columnLetters(col)}`;
  return { ok: true, pick: { sheet: block.sheet, col, headerRow: hasHeader ? block.top : undefined, firstRow, name, values } };
}

/** Season length found in a history by the engine (1 when none is found). */
export function foundPeriod(values: (number | null)[]): number {
  try {
    return detectPeriod(cleanHistory(values));
  } catch {
    return 1;
  }
}

/**
 * A warning when a history is too short for a trustworthy ledger, saying what is needed: a
 * seasonal model of season p needs what the engine's model shape asks for (two full seasons and
 * the periods to fit the constants); finding a season at all needs three full seasons (common
 * practice for seasonal decomposition). Undefined when the history is long enough.
 */
export function shortHistoryWarning(p: HistoryPick, period: number): string | undefined {
  const present = p.values.filter((v) => v !== null).length;
  const seasonal = modelShape({ period: Math.max(period, 2), seasonality: "multiplicative", trend: "linear", start: "decomposition" });
  const needed = requiredLength(seasonal, shapeConstants(seasonal).length);
  if (period > 1 && present >= needed) return undefined;
  if (period > 1) {
    return `Only ${present} values: a seasonal ledger with season length ${period} needs at least ${needed} (two full seasons for the start, then enough periods to fit the constants). Select more history, or treat its forecasts with great care.`;
  }
  const monthly = modelShape({ period: 12, seasonality: "multiplicative", trend: "linear", start: "decomposition" });
  const monthlyNeeded = requiredLength(monthly, shapeConstants(monthly).length);
  if (present >= 3 * 12) return undefined;
  return `Only ${present} values and no season found: finding a yearly season in monthly data needs at least 36 values (three full years), and a seasonal ledger at least ${monthlyNeeded}. Without a season the ledger smooths level and trend only and its constants may run to their limits. Select more history, or type the season length if you know it.`;
}

/** Short description for the panel: "Seed trays (units): 84 values in Sales!B2:B85, 1 blank". */
export function describePick(p: HistoryPick): string {
  const blanks = p.values.filter((v) => v === null).length;
  const range = `${p.sheet}!${columnLetters(p.col)}${p.firstRow + 1}:${columnLetters(p.col)}${p.firstRow + p.values.length}`;
  const header = p.headerRow !== undefined ? `"${p.name}"` : "no header";
  return `${header}, ${p.values.length} periods in ${range}${blanks ? `, ${blanks} blank` : ""}`;
}
