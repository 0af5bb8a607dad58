/**
 * How the preview grid shows a value: numbers a planner reads at a glance, with thousands
 * separators and no exponents in the range sales, errors and sums of squares take (an SSE of
 * 1317600.4 shows as 1,317,600, not 1.3176e+6). Full precision stays in data-value.
 */

const grouped = (digits: number): Intl.NumberFormat =>
  new Intl.NumberFormat("en-US", { minimumFractionDigits: digits, maximumFractionDigits: digits, useGrouping: true });
const WHOLE = grouped(0);
const ONE = grouped(1);

export function numberText(v: number): string {
  if (!Number.isFinite(v)) return String(v);
  const a = Math.abs(v);
  // Exponents only where no planner's figure lives: beyond a thousand trillion, or a tiny non-zero.
  if (a >= 1e15) return v.toExponential(4);
  // Whole numbers below a million stay as typed (years, period labels such as 202101).
  if (Number.isInteger(v)) return a >= 1e6 ? WHOLE.format(v) : String(v);
  if (a >= 1e5) return WHOLE.format(v);
  if (a >= 100) return ONE.format(v);
  if (a >= 1) return v.toFixed(3);
  if (a >= 1e-4) return v.toFixed(4);
  return v.toExponential(3);
}
