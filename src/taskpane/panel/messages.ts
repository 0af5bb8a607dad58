import { EbbError } from "../../engine";
import { shownAddress } from "../../ledger/describe/addresses";

/** Where a history's period 1 lies on the sheet, so a message about period t can name its cell. */
export interface HistoryCells {
  sheet: string;
  col: number;
  firstRow: number;
}

/**
 * A message for anything thrown: Ebb's own messages as they are (with the cell in front when
 * the engine said which value of the history it is about), others with a plain lead-in.
 */
export function messageOf(e: unknown, history?: HistoryCells): string {
  if (e instanceof EbbError) {
    if (!history || !e.at || (e.at.argument ?? "history") !== "history") return e.message;
    return `${shownAddress(history.sheet, history.firstRow + e.at.index, history.col)}: ${e.message}`;
  }
  if (e instanceof Error) return `Something went wrong: ${e.message}`;
  return `Something went wrong: ${String(e)}`;
}
