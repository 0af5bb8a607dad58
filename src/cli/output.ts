/**
 * Text of the results: JSON values and CSV lines. Typed arrays become plain arrays; NaN and
 * Infinity become null in JSON (JSON.stringify's own rule) and empty cells in CSV, so a blank
 * or undefined value never shows as a number.
 */

const replacer = (_key: string, value: unknown) => (ArrayBuffer.isView(value) ? Array.from(value as Float64Array) : value);

/** A JSON value, pretty-printed, every line after the first indented by `indent`. */
export function jsonText(value: unknown, indent = ""): string {
  const text = JSON.stringify(value, replacer, 2);
  return indent === "" ? text : text.replace(/\n/g, `\n${indent}`);
}

/** One line of a tidy CSV table: the given columns in order, empty cells for missing, NaN or absent values. */
export function csvLine(columns: readonly string[], row: Record<string, unknown>): string {
  return columns.map((c) => csvCell(row[c])).join(",") + "\n";
}

export function csvHeader(columns: readonly string[]): string {
  return columns.map((c) => quoteField(c)).join(",") + "\n";
}

function csvCell(v: unknown): string {
  if (v === undefined || v === null) return "";
  if (typeof v === "number") return Number.isFinite(v) ? String(v) : "";
  return quoteField(guardFormula(String(v)));
}

/**
 * Text that a spreadsheet would run as a formula when it opens the file (=, +, -, @, or a tab
 * or carriage return in front of one) gets a leading apostrophe: the usual CSV-injection guard.
 * Numbers are written as numbers and never changed.
 */
export function guardFormula(s: string): string {
  return /^[=+\-@\t\r]/.test(s) ? `'${s}` : s;
}

function quoteField(s: string): string {
  return /[",\r\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}
