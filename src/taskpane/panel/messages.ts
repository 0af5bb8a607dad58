import { EbbError } from "../../engine";
import type { HistorySource } from "../../ledger";
import { sourceAddress } from "../../ledger/describe/sourceCells";

/**
 * A message for anything thrown: Ebb's own messages as they are (with the cell in front when
 * the engine said which value of the history it is about), others with a plain lead-in.
 */
export function messageOf(e: unknown, history?: HistorySource): string {
  if (e instanceof EbbError) {
    if (!history || !e.at || (e.at.argument ?? "history") !== "history") return e.message;
    return `${sourceAddress(history, e.at.index)}: ${e.message}`;
  }
  if (e instanceof Error) return `Something went wrong: ${e.message}`;
  return `Something went wrong: ${String(e)}`;
}
