import { badInput } from "../errors";

/** A history with planner corrections: the values the models use, and which periods were corrected. */
export interface CorrectedHistory {
  /** The values the models use: the correction where one is given, else the actual (null = blank). */
  values: (number | null)[];
  /** True where a correction replaced the actual (including a correction typed into a blank period). */
  corrected: boolean[];
}

/**
 * The history with each given correction used in place of its actual. `corrections` has the same
 * length as `actuals`; null (a blank cell) keeps the actual. A correction may fill a blank
 * period (a month with no recorded figure). Nothing is changed in place: the actuals stay as typed
 * and the caller keeps both, so the ledger can show the actual, the correction and the value used.
 */
export function applyCorrections(actuals: readonly (number | null)[], corrections: readonly (number | null)[]): CorrectedHistory {
  if (corrections.length !== actuals.length) {
    throw badInput(
      "corrections-shape",
      `The corrections range has ${corrections.length} cells per series and the history ${actuals.length}. Select a corrections range of the same size as the history, row for row.`,
    );
  }
  const corrected = corrections.map((c) => c !== null);
  const values = actuals.map((a, i) => (corrected[i] ? corrections[i] : a));
  return { values, corrected };
}

/** Number of corrected periods, for the ledger's scorecard. */
export function correctedCount(history: CorrectedHistory): number {
  return history.corrected.filter(Boolean).length;
}
