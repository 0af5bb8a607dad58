import { estimatedQuantities, varianceIsThin } from "../../engine";
import type { EngineFigures } from "./engineFigures";

/**
 * Plain cautions about a ledger's outlook that a planner should read before it feeds orders:
 * an outlook that falls below zero on a history of positive figures (usually a trend fitted on
 * little history, its constants at their bounds), and an interval whose variance rests on no
 * more one-step errors than the model estimates quantities. The ledger itself is written as asked.
 */
export function outlookCautions(f: EngineFigures): string[] {
  return [...belowZeroCaution(f), ...fewErrorsCaution(f)];
}

/** The engine's varianceIsThin: no more one-step errors than estimated quantities. */
function fewErrorsCaution(f: EngineFigures): string[] {
  if (!varianceIsThin(f.model)) return [];
  const k = estimatedQuantities(f.model.shape);
  const n = f.model.errorCount;
  return [
    `Caution: the interval rests on ${n} one-step errors for the ${k} quantities this model estimates (constants, start level${f.model.shape.hasTrend ? ", trend" : ""}${f.model.shape.seasonal ? " and seasonal indices" : ""}), so its variance is barely estimated and the interval is very wide. Add history, or choose a simpler model (trend none, or seasonality none), before the interval feeds orders or stock.`,
  ];
}

function belowZeroCaution(f: EngineFigures): string[] {
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
