/**
 * Input coercion: turns what a spreadsheet host hands a worksheet function into the engine's
 * terms, as a practitioner's sheet really looks. A range is a column, a row, or a block of
 * several columns (one series per column). Blank cells are missing values; trailing blanks
 * are dropped later by the engine, so a formula over B2:B200 rolls forward as actuals arrive.
 * Text (including numbers stored as text), TRUE/FALSE and error values are refused with a
 * message that names the cell.
 */
import { badInput, EbbError } from "../engine";
import { InputError } from "./cells";
import { basicValueOf } from "./dataTypes";
import { addressIn } from "./places";

/** Longest history (values up to the last one present) a worksheet function takes per series. */
export const MAX_SERIES_LENGTH = 20000;

/** One series read from a range: values oldest first (null = blank) and how to name it. */
export interface SeriesInput {
  values: (number | null)[];
  /** "history" for a single series, "column 3 of history" in a block. */
  label: string;
}

/** A range argument as a rectangle of cells (a single value counts as one cell). */
export function readRange(value: unknown, name: string): unknown[][] {
  if (value === undefined) throw badInput("missing-range", `The ${name} range is missing. Select the cells that hold it.`);
  // A one-cell range over a blank cell arrives as a blank value: the first state of a rolling table.
  if (value === null) return [[null]];
  if (!Array.isArray(value)) return [[value]];
  if (value.length === 0) throw badInput("missing-range", `The ${name} range is empty. Select the cells that hold it.`);
  const rows = value.map((row) => (Array.isArray(row) ? row : [row]));
  const width = rows[0].length;
  if (width === 0 || rows.some((row) => row.length !== width)) {
    throw badInput("ragged-range", `The ${name} range is not a rectangle of cells. Select one block of cells.`);
  }
  return rows;
}

/**
 * Every series of a range: a single row is one series, otherwise one series per column.
 * A series whose cells cannot be read comes back as the EbbError that says why, so the
 * other series of a block still compute.
 */
export function readSeries(value: unknown, name: string, blanksAllowed = false): (SeriesInput | EbbError)[] {
  const range = readRange(value, name);
  const rows = range.length;
  const cols = range[0].length;
  const read = (cells: unknown[], label: string, column: number): SeriesInput | EbbError => {
    const s = seriesOf(cells, label, (i) => addressIn(name, i, column) ?? `cell ${i + 1} of ${label}`);
    return blanksAllowed || s instanceof EbbError || s.values.some((v) => v !== null) ? s : noValuesYet(label);
  };
  if (rows === 1 && cols > 1) return [read(range[0], name, 0)];
  const out: (SeriesInput | EbbError)[] = [];
  for (let c = 0; c < cols; c++) out.push(read(range.map((row) => row[c]), cols > 1 ? `column ${c + 1} of ${name}` : name, c));
  return out;
}

/**
 * A range with no numbers yet is #N/A, not a mistake: a rolling table's formulas are typed
 * before the first actual arrives, and #N/A is what a planner's own lookups show for "not yet".
 */
function noValuesYet(label: string): EbbError {
  const what = /forecast/.test(label) ? "the forecasts" : "some actuals";
  return new EbbError("na", "no-values-yet", `The ${label} range has no values yet. Type ${what}, oldest first.`);
}

/** The one series of a range that must hold exactly one (a column or a row). */
export function readOneSeries(value: unknown, name: string): SeriesInput {
  const all = readSeries(value, name);
  if (all.length !== 1) {
    throw badInput("one-series-only", `The ${name} range must be a single column or a single row; it has ${all.length} columns.`);
  }
  const s = all[0];
  if (s instanceof EbbError) throw s;
  return s;
}

function seriesOf(cells: unknown[], label: string, where: (i: number) => string): SeriesInput | EbbError {
  try {
    // The common cells (numbers, blanks) are read here; only others need the cell's name.
    const values = cells.map((v, i) => (typeof v === "number" && Number.isFinite(v) ? v : v === null || v === undefined ? null : numberCell(v, where(i), i === 0)));
    let end = values.length;
    while (end > 0 && values[end - 1] === null) end--;
    if (end > MAX_SERIES_LENGTH) {
      throw badInput(
        "series-too-long",
        `The ${label} range holds ${end} periods; worksheet functions take up to ${MAX_SERIES_LENGTH} per series. Use the batch command (npm run ebb) for longer series.`,
      );
    }
    return { values, label };
  } catch (e) {
    if (e instanceof EbbError) return e;
    throw e;
  }
}

/** Blank-looking cells: nothing, an empty string, or only spaces. */
export function isBlank(v: unknown): boolean {
  return v === null || v === undefined || (typeof v === "string" && v.trim() === "");
}

/** Text that a person would read as a number: "1,234", " 12.5 ", "$300", "7%". */
export function looksNumeric(text: string): boolean {
  const t = text.trim().replace(/[,\s$€£]/g, "").replace(/%$/, "");
  return t !== "" && Number.isFinite(Number(t));
}

function quote(text: string): string {
  const t = text.length > 30 ? `${text.slice(0, 27)}...` : text;
  return `"${t}"`;
}

/** Names an error value from a host: "#N/A", "#DIV/0!", or "an error". */
function errorCode(v: unknown): string | undefined {
  if (v instanceof InputError) return v.code;
  if (v instanceof Error) return (v as { code?: unknown }).code !== undefined ? String((v as { code?: unknown }).code) : "an error";
  if (typeof v === "object" && v !== null) {
    const code = (v as { code?: unknown; type?: unknown }).code ?? (v as { type?: unknown }).type;
    return typeof code === "string" ? code : "an error";
  }
  return undefined;
}

/** An error value in an input: #N/A stays #N/A (an upstream "not yet"), anything else is #VALUE!. */
function inputError(code: string, where: string): EbbError {
  const na = /^#?N\/?A$/i.test(code);
  const message = `${capital(where)} holds the error ${code}. Fix that cell (or clear it for a missing value).`;
  return new EbbError(na ? "na" : "value", "error-in-input", message);
}

/** An argument's name as a message begins it: "service_level" reads "Service level". */
function capital(s: string): string {
  const words = s.replace(/_/g, " ");
  return words.charAt(0).toUpperCase() + words.slice(1);
}

/** One cell of a numeric range: a finite number, or null for a blank. */
function numberCell(cell: unknown, where: string, first: boolean): number | null {
  const v = basicValueOf(cell, () => capital(where));
  if (isBlank(v)) return null;
  if (typeof v === "number") {
    if (Number.isFinite(v)) return v;
    throw badInput("not-finite", `${capital(where)} is not a finite number. Use finite numbers, or leave the cell blank.`);
  }
  if (typeof v === "string") {
    if (looksNumeric(v)) {
      throw badInput(
        "number-as-text",
        `${capital(where)} is text ${quote(v)}, a number stored as text. Retype it as a number (or convert it with VALUE), or clear the cell.`,
      );
    }
    const heading = first ? " If it is a heading, start the range one cell later." : "";
    throw badInput("text-in-range", `${capital(where)} holds text ${quote(v)}. Use numbers only; leave a cell blank for a missing value.${heading}`);
  }
  if (typeof v === "boolean") {
    throw badInput("boolean-in-range", `${capital(where)} holds ${v ? "TRUE" : "FALSE"}, not a number. Use numbers only; leave a cell blank for a missing value.`);
  }
  const code = errorCode(v);
  if (code !== undefined) throw inputError(code, where);
  throw badInput("not-a-number", `${capital(where)} is not a number. Use numbers only; leave a cell blank for a missing value.`);
}

/** A scalar argument: a one-cell range counts as its cell; a larger range is refused. */
function scalar(v: unknown, name: string): unknown {
  if (!Array.isArray(v)) return basicValueOf(v, () => capital(name));
  const range = readRange(v, name);
  if (range.length === 1 && range[0].length === 1) return basicValueOf(range[0][0], () => capital(name));
  throw badInput("range-for-scalar", `${capital(name)} must be a single value, not a range of ${range.length} x ${range[0].length} cells.`);
}

/** An optional number: blank or omitted gives undefined. `advice` (what to type) ends a message about a wrong type. */
export function optionalNumberArg(v: unknown, name: string, advice?: string): number | undefined {
  const then = advice ? ` ${advice}` : "";
  const s = scalar(v, name);
  if (isBlank(s)) return undefined;
  if (typeof s === "number") {
    if (Number.isFinite(s)) return s;
    throw badInput("not-finite", `${capital(name)} is not a finite number.`);
  }
  if (typeof s === "string") {
    if (looksNumeric(s)) throw badInput("number-as-text", `${capital(name)} is text ${quote(s)}, a number stored as text. Type it as a number.`);
    throw badInput("text-for-number", `${capital(name)} must be a number; got the text ${quote(s)}.${then}`);
  }
  if (typeof s === "boolean") throw badInput("boolean-for-number", `${capital(name)} must be a number; got ${s ? "TRUE" : "FALSE"}.${then}`);
  const code = errorCode(s);
  if (code !== undefined) throw inputError(code, name);
  throw badInput("not-a-number", `${capital(name)} must be a number.`);
}

/** A number the function cannot do without. */
export function requiredNumberArg(v: unknown, name: string, advice: string): number {
  const n = optionalNumberArg(v, name, advice);
  if (n === undefined) throw badInput("missing-argument", `${capital(name)} is missing. ${advice}`);
  return n;
}

/** An option word argument as typed (blank gives undefined); the engine's parsers check the word. */
export function optionalWordArg(v: unknown, name: string): unknown {
  const s = scalar(v, name);
  if (isBlank(s)) return undefined;
  const code = typeof s === "object" && s !== null ? errorCode(s) : undefined;
  if (code !== undefined) throw inputError(code, name);
  return s;
}

/** The values of a series as the engine wants them (NaN for blanks). */
export function toFloat64(values: (number | null)[]): Float64Array {
  return Float64Array.from(values, (v) => (v === null ? NaN : v));
}
