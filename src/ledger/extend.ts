import { badInput } from "../engine";
import { padded } from "./describe/correctedInput";
import { describeLedger } from "./describe/describeLedger";
import type { ChartSpec, LedgerAnchor, LedgerCell, LedgerDescription, LedgerName } from "./describe/types";
import { readLedger } from "./verify/readLedger";
import type { LedgerReader } from "./verify/reader";

export interface LedgerExtension {
  sheet: string;
  /** New update rows (with their "Actual when written" copies): cells that were empty. */
  append: LedgerCell[];
  /**
   * Numbers the engine must refresh because the outlook now starts later: the simulated gaps
   * of a multiplicative ledger (empty otherwise). Formulas elsewhere follow by themselves.
   */
  refresh: LedgerCell[];
  /** Names to redefine when the table outgrows the rows its names reach (rare; else empty). */
  names: LedgerName[];
  /** The chart with its series lengthened. */
  chart: ChartSpec;
  /** The ledger as it will be after the extension. */
  description: LedgerDescription;
}

/**
 * Extend a ledger when new actuals arrive below its history: rebuild it from what it was
 * written from plus the new actuals (with the settings in use) and return only the cells
 * that are new. The outlook and scorecard find the last row by themselves, so nothing else
 * is rewritten, except the engine-simulated gaps of a multiplicative outlook.
 */
export function extendLedger(
  read: LedgerReader,
  anchor: LedgerAnchor,
  newActuals: ArrayLike<number | null | undefined>,
  /** On a corrected ledger: the corrections (and reasons) beside the new actuals, if any. */
  newCorrections?: { values: ArrayLike<number | null | undefined>; reasons?: ArrayLike<string | null | undefined> },
): LedgerExtension {
  const { input } = readLedger(read, anchor);
  const added = Array.from(newActuals, (v) => (v === undefined ? null : v));
  const corr = input.corrections;
  const addedCorrections = corr && newCorrections ? Array.from(newCorrections.values, (v) => v ?? null) : [];
  // A correction may stand for a new period with no recorded actual; blanks at the end of both are dropped.
  while (added.length < addedCorrections.length) added.push(null);
  while (added.length > 0 && added[added.length - 1] === null && (addedCorrections[added.length - 1] ?? null) === null) added.pop();
  if (added.length === 0) throw badInput("no-new-actuals", "There are no new actuals below the history. Type them under the last actual, then extend.");
  const before = describeLedger(input);
  const history = [...Array.from(input.history, (v) => v ?? null), ...added];
  const corrections = corr && {
    ...corr,
    values: [...padded(corr.values, input.history.length, null), ...padded(addedCorrections, added.length, null)],
    reasons: [...padded(corr.reasons ?? [], input.history.length, ""), ...padded(Array.from(newCorrections?.reasons ?? [], (r) => r ?? ""), added.length, "")],
  };
  const after = describeLedger({ ...input, history, ...(corrections ? { corrections } : {}) });
  const old = new Map(before.cells.map((c) => [c.address, c]));
  const append: LedgerCell[] = [];
  const refresh: LedgerCell[] = [];
  for (const cell of after.cells) {
    const was = old.get(cell.address);
    if (!was) append.push(cell);
    else if (cell.kind === "engine" && cell.value !== was.value) refresh.push(cell);
    else if (was.formula !== cell.formula || (cell.kind !== "formula" && cell.kind !== "engine" && cell.kind !== "setting" && !sameConstant(was.value, cell.value))) {
      // The layout guarantees this never happens; fail loudly rather than overwrite a cell.
      throw new Error(`Ledger extension would change ${cell.address}; this is a bug in Ebb.`);
    }
  }
  const oldNames = new Map(before.names.map((n) => [n.name, n.refersTo]));
  const names = after.names.filter((n) => oldNames.get(n.name) !== n.refersTo);
  return { sheet: after.sheet, append, refresh, names, chart: after.chart, description: after };
}

function sameConstant(a: unknown, b: unknown): boolean {
  return a === b || (typeof a === "number" && typeof b === "number" && Math.abs(a - b) <= 1e-12 * Math.max(Math.abs(a), Math.abs(b)));
}
