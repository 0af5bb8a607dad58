import { FORMAT } from "../describe/sheet";
import { RELATIVE_TOLERANCE } from "../describe/tolerance";
import type { CellValue, LedgerCell } from "../describe/types";

/**
 * How verify compares what it reads back with what it expects, with a tolerance that fits
 * each quantity:
 * - constants (labels, period numbers, positions, words, layout settings, typed actuals and
 *   the written record) must match exactly;
 * - formulas that count (period and count formats) must match exactly;
 * - other formulas match to a relative 1e-9 of their own size, plus the rounding their inputs
 *   can carry: unitless figures (indices as ratios, multipliers, weights, z) a tiny floor;
 *   figures in the data's units 1e-9 of the data's size; the cells whose rounding is larger
 *   (percent errors, tracking signals) carry their own floor from the description.
 */
export { RELATIVE_TOLERANCE };

const EXACT_FORMATS = new Set<string>([FORMAT.period, FORMAT.count]);
const UNITLESS_FORMATS = new Set<string>([FORMAT.ratio, FORMAT.constant, FORMAT.coverage]);

/** Absolute floor of the tolerance for a formula cell, in its own units. */
export function toleranceFloor(cell: LedgerCell, dataScale: number): number {
  if (cell.tolerance !== undefined) return cell.tolerance;
  if (cell.format && EXACT_FORMATS.has(cell.format)) return 0;
  if (cell.format && UNITLESS_FORMATS.has(cell.format)) return 1e-12;
  return RELATIVE_TOLERANCE * dataScale;
}

function blankToNull(v: CellValue | undefined): CellValue {
  return v === "" || v === undefined ? null : v;
}

/** A constant: the same number or the same text (outer spaces aside). */
export function sameConstant(found: CellValue, expected: CellValue): boolean {
  const f = blankToNull(found);
  const e = blankToNull(expected);
  if (typeof f === "string" && typeof e === "string") return f.trim() === e.trim();
  return f === e;
}

/** A formula's value against the engine's, within the cell's tolerance. */
export function sameComputed(found: CellValue, cell: LedgerCell, dataScale: number): boolean {
  const f = blankToNull(found);
  const e = blankToNull(cell.value);
  if (typeof f === "number" && typeof e === "number") {
    const floor = toleranceFloor(cell, dataScale);
    if (floor === 0 && cell.tolerance === undefined) return f === e;
    return Math.abs(f - e) <= RELATIVE_TOLERANCE * Math.max(Math.abs(f), Math.abs(e)) + floor;
  }
  return sameConstant(f, e);
}

/**
 * Formula text compared without the "=", spaces outside quotes, letter case, "_xlfn." prefixes
 * and the quotes around sheet names (hosts drop them where a name needs none).
 */
export function normaliseFormula(formula: string): string {
  const text = formula.trim().replace(/^=/, "");
  let out = "";
  let inString = false;
  for (const ch of text) {
    if (ch === '"') inString = !inString;
    if (!inString && (/\s/.test(ch) || ch === "'")) continue;
    out += inString ? ch : ch.toUpperCase();
  }
  return out.replace(/_XLFN\./g, "").replace(/_XLWS\./g, "");
}
