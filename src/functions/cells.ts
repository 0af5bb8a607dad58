/**
 * The neutral cell vocabulary shared by every worksheet-function host (the spreadsheet host
 * and the embedded formula engine). Implementations take plain JavaScript values and return
 * these cells; each host adapter maps them to its own blank and error values.
 */
import { badInput, EbbError } from "../engine";

/** One output cell: a number, a word, a blank (null) or an error with its message. */
export type OutCell = number | string | null | EbbError;

/** A rectangular block of output cells, row by row. */
export type Block = OutCell[][];

/** What an implementation returns: one number (scalar functions) or a block (spilling functions). */
export type Output = number | Block;

/** An error value found in an input range, as a host reports it (for example "#N/A"). */
export class InputError {
  constructor(readonly code: string) {}
}

/**
 * A number that must exist and be finite; anything else means the arithmetic overflowed.
 * @param what what the number is, for the message
 */
export function finiteNumber(v: number, what: string): number {
  if (typeof v !== "number" || !Number.isFinite(v)) {
    throw badInput(
      "not-finite-result",
      `The ${what} is not a finite number: the values are too large or too small for double precision. Rescale the data (for example to thousands of units).`,
    );
  }
  return v === 0 ? 0 : v; // -0 reads as 0
}

/** A number that may legitimately be absent (NaN): blank then; infinite is still an error. */
export function optionalNumber(v: number, what: string): number | null {
  if (Number.isNaN(v)) return null;
  return finiteNumber(v, what);
}

/** A column of cells as a block of one column. */
export function column(cells: OutCell[]): Block {
  return cells.map((c) => [c]);
}

/** Pads every row with blanks to `width` and the block with blank rows to `height`. */
export function pad(block: Block, height: number, width: number): Block {
  const out: Block = [];
  for (let r = 0; r < height; r++) {
    const row = block[r] ?? [];
    const padded: OutCell[] = [];
    for (let c = 0; c < width; c++) padded.push(c < row.length ? row[c] : null);
    out.push(padded);
  }
  return out;
}

/** Blocks placed side by side, shorter ones padded with blanks below. */
export function sideBySide(blocks: Block[]): Block {
  const height = Math.max(1, ...blocks.map((b) => b.length));
  const out: Block = Array.from({ length: height }, () => []);
  for (const b of blocks) {
    const width = Math.max(1, ...b.map((row) => row.length));
    const padded = pad(b, height, width);
    for (let r = 0; r < height; r++) out[r].push(...padded[r]);
  }
  return out;
}

/**
 * Last line of defence before a host sees a result: no NaN or Infinity ever reaches a cell.
 * NaN becomes a blank, an infinite number an error cell with advice.
 */
export function safeBlock(block: Block): Block {
  return block.map((row) =>
    row.map((c) => {
      if (typeof c !== "number") return c;
      if (Number.isNaN(c)) return null;
      if (!Number.isFinite(c)) {
        return badInput("not-finite-result", "This result is too large for double precision. Rescale the data (for example to thousands of units).");
      }
      return c === 0 ? 0 : c;
    }),
  );
}

export function isEbbError(v: unknown): v is EbbError {
  return v instanceof EbbError;
}
