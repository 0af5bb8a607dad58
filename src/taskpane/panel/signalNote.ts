import type { LedgerDescription } from "../../ledger";

/**
 * The panel's sentence on a ledger's tracking signal after writing or adding actuals: its latest
 * value against the limit, and how many update rows it flags (the rose cells), so a planner
 * knows at once whether this item needs a look.
 */
export function signalNote(d: Pick<LedgerDescription, "tracking">): string {
  const { latest, flagged, limit } = d.tracking;
  const rows = `${flagged} update row${flagged === 1 ? "" : "s"} flagged`;
  if (latest === null) return ` Tracking signal: not yet defined (too few errors so far); ${rows}.`;
  const shown = latest.toFixed(2);
  if (Math.abs(latest) <= limit) return ` Tracking signal ${shown}, within +/-${limit}; ${rows}.`;
  const way = latest > 0 ? "low (actuals above them)" : "high (actuals below them)";
  return ` Tracking signal ${shown}, beyond +/-${limit}: the latest forecasts ran ${way}, so review this item; ${rows}.`;
}
