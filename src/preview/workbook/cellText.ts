/** How the preview grid shows a value: short, readable numbers (full precision stays in data-value). */

export function numberText(v: number): string {
  if (!Number.isFinite(v)) return String(v);
  if (Number.isInteger(v)) return String(v);
  const a = Math.abs(v);
  if (a >= 1e6) return v.toExponential(4);
  if (a >= 100) return v.toFixed(1);
  if (a >= 1) return v.toFixed(3);
  if (a >= 1e-4) return v.toFixed(4);
  return v.toExponential(3);
}
