import type { EngineFigures } from "./engineFigures";

/**
 * Plain cautions about a ledger's outlook that a planner should read before it feeds orders:
 * an outlook that falls below zero on a history of positive figures (usually a trend fitted on
 * little history, its constants at their bounds). The ledger itself is written as asked.
 */
export function outlookCautions(f: EngineFigures): string[] {
  let positive = true;
  for (const v of f.y) if (v === v && !(v > 0)) positive = false;
  if (!positive) return [];
  const below = Array.from(f.forecast).findIndex((v) => v < 0);
  if (below < 0) return [];
  const k = f.model.constants;
  const trend = f.model.spec.trend !== "none" ? `, beta ${k.beta.toFixed(4)}` : "";
  return [
    `Caution: the outlook falls below zero from ${below + 1} period${below === 0 ? "" : "s"} ahead although every actual is positive (alpha ${k.alpha.toFixed(4)}${trend}, fitted on ${f.model.errorCount} errors). Review it before it feeds orders; a longer history or trend none gives a steadier outlook.`,
  ];
}
