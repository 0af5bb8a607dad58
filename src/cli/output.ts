import { writeFileSync } from "fs";
import { CliError } from "./cliError";

/**
 * JSON text. Typed arrays become plain arrays; NaN and Infinity become null (JSON.stringify's
 * own rule), so a blank or undefined value never shows as a number.
 */
export function toJson(doc: unknown): string {
  return JSON.stringify(doc, (_key, value) => (ArrayBuffer.isView(value) ? Array.from(value as Float64Array) : value), 2) + "\n";
}

/** A tidy CSV table: the given columns in order, empty cells for missing, NaN or absent values. */
export function toCsv(columns: readonly string[], rows: Record<string, unknown>[]): string {
  const lines = [columns.map(csvField).join(",")];
  for (const row of rows) lines.push(columns.map((c) => csvField(cellText(row[c]))).join(","));
  return lines.join("\n") + "\n";
}

function cellText(v: unknown): string {
  if (v === undefined || v === null) return "";
  if (typeof v === "number") return Number.isFinite(v) ? String(v) : "";
  return String(v);
}

function csvField(s: string): string {
  return /[",\r\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

/** Write the result to --out, or to standard output. */
export function emit(text: string, out?: string): void {
  if (out === undefined) {
    process.stdout.write(text);
    return;
  }
  try {
    writeFileSync(out, text, "utf8");
  } catch (e) {
    throw new CliError(`Cannot write "${out}": ${(e as Error).message}`);
  }
}
