/** How verify compares what it reads back with what it expects. */

/** Relative tolerance of a numeric match, with a tiny floor (in data units) for values near 0. */
export const RELATIVE_TOLERANCE = 1e-9;

export function numbersMatch(found: number, expected: number, scale: number): boolean {
  const diff = Math.abs(found - expected);
  return diff <= RELATIVE_TOLERANCE * Math.max(Math.abs(found), Math.abs(expected)) + 1e-12 * scale;
}

export function valuesMatch(found: number | string | null, expected: number | string | null, scale: number): boolean {
  const f = found === "" ? null : found;
  const e = expected === "" ? null : expected;
  if (typeof f === "number" && typeof e === "number") return numbersMatch(f, e, scale);
  if (typeof f === "string" && typeof e === "string") return f.trim() === e.trim();
  return f === e;
}

/** Formula text compared without the "=", spaces outside quotes, letter case and "_xlfn." prefixes. */
export function normaliseFormula(formula: string): string {
  const text = formula.trim().replace(/^=/, "");
  let out = "";
  let inString = false;
  for (const ch of text) {
    if (ch === '"') inString = !inString;
    if (!inString && /\s/.test(ch)) continue;
    out += inString ? ch : ch.toUpperCase();
  }
  return out.replace(/_XLFN\./g, "").replace(/_XLWS\./g, "");
}
