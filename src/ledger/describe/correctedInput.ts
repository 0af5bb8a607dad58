import { applyCorrections, badInput, correctedCount } from "../../engine";
import { isMissing } from "../../engine/series";
import type { HistorySource, LedgerInput } from "./types";

/** A ledger's input in the form the sections need: the actuals as recorded and the values the engine runs on. */
export interface LedgerFigures {
  /** The actuals as recorded (null = blank). */
  actuals: (number | null)[];
  /** The values used: the engine's applyCorrections rule, or the actuals without corrections. */
  used: (number | null)[];
  corrections?: CorrectionFigures;
}

/** The corrections per period, and how many periods they correct (the engine's count). */
export interface CorrectionFigures {
  values: (number | null)[];
  reasons: string[];
  count: number;
  source?: HistorySource;
  reasonSource?: HistorySource;
}

/**
 * Split the input into actuals and values used. The corrections are padded (or cut) to the
 * history's length here, so a corrections column of another length only needs blanks; a
 * correction that is not a number is refused with its period, never silently dropped.
 */
export function ledgerFigures(input: LedgerInput): LedgerFigures {
  const actuals = Array.from(input.history, (v) => (isMissing(v) ? null : (v as number)));
  const given = input.corrections;
  if (!given) return { actuals, used: actuals };
  const n = Math.max(actuals.length, lastPresent(given.values) + 1);
  const hist = padded(actuals, n, null);
  const values = padded(Array.from(given.values, (v, i) => checkedCorrection(v, i)), n, null);
  const reasons = padded(Array.from(given.reasons ?? [], (r) => (r === null || r === undefined ? "" : String(r))), n, "");
  const applied = applyCorrections(hist, values);
  return {
    actuals: hist,
    used: applied.values,
    corrections: { values, reasons, count: correctedCount(applied), ...(given.source ? { source: given.source } : {}), ...(given.reasonSource ? { reasonSource: given.reasonSource } : {}) },
  };
}

/** The array cut or filled to n entries. */
export function padded<T>(values: ArrayLike<T>, n: number, fill: T): T[] {
  const out = Array.from(values).slice(0, n);
  while (out.length < n) out.push(fill);
  return out;
}

function lastPresent(values: ArrayLike<number | null | undefined>): number {
  for (let i = values.length - 1; i >= 0; i--) if (!isMissing(values[i])) return i;
  return -1;
}

function checkedCorrection(v: unknown, i: number): number | null {
  if (isMissing(v) || v === "") return null;
  if (typeof v !== "number" || !Number.isFinite(v)) {
    throw badInput("not-a-number", `The correction of period ${i + 1} is not a number. Type a figure or leave the cell blank to use the actual.`);
  }
  return v;
}
