/**
 * Conversions between the embedded formula engine's values and the neutral cells of the
 * worksheet functions (../cells.ts).
 */
import { CellError, EmptyValue, ErrorType, SimpleRangeValue } from "hyperformula";
import { EbbError } from "../../engine";
import { type Block, type OutCell, InputError } from "../cells";

/** How each error type is written in a cell. */
const ERROR_TEXT: Record<string, string> = {
  DIV_BY_ZERO: "#DIV/0!",
  NAME: "#NAME?",
  VALUE: "#VALUE!",
  NUM: "#NUM!",
  NA: "#N/A",
  CYCLE: "#CYCLE!",
  REF: "#REF!",
  SPILL: "#SPILL!",
  LIC: "#LIC!",
  ERROR: "#ERROR!",
};

function scalarIn(v: unknown): unknown {
  if (v === EmptyValue || v === undefined) return null;
  if (v instanceof CellError) return new InputError(ERROR_TEXT[v.type] ?? `#${v.type}`);
  // Dates, currencies and percentages arrive as rich numbers carrying their value.
  if (typeof v === "object" && v !== null && typeof (v as { val?: unknown }).val === "number") return (v as { val: number }).val;
  return v;
}

/** One argument as a host hands it over: a rectangle of cells for a range, else a single value. */
export function argumentIn(v: unknown): unknown {
  if (v === undefined) return undefined; // left out, unlike a blank cell
  if (v instanceof SimpleRangeValue) return v.data.map((row) => row.map(scalarIn));
  return scalarIn(v);
}

export function errorOut(e: EbbError): CellError {
  return new CellError(e.kind === "na" ? ErrorType.NA : ErrorType.VALUE, e.message);
}

function cellOut(c: OutCell): number | string | CellError | typeof EmptyValue {
  if (c === null) return EmptyValue;
  if (c instanceof EbbError) return errorOut(c);
  return c;
}

/** A result block as a spilled range, padded with blanks to the size reserved for it. */
export function blockOut(block: Block, rows: number, cols: number): SimpleRangeValue {
  const data = Array.from({ length: rows }, (_, r) => Array.from({ length: cols }, (_, c) => cellOut(block[r]?.[c] ?? null)));
  return SimpleRangeValue.onlyValues(data);
}
