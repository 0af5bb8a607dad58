import { cellAddress, quoteSheet, shownAddress } from "./addresses";
import type { SectionContext } from "./context";
import { FORMAT } from "./sheet";
import type { HistorySource } from "./types";

/**
 * The ledger's actuals as references to the history cells they came from, so a corrected
 * history recomputes the ledger; the "Actual when written" copy beside each keeps the figure
 * the ledger was written from, and the check reports every actual whose source differs from
 * it. Without a source (a history given as numbers) the actuals are typed in.
 */
export function sourceReference(source: HistorySource, t: number): string {
  return `${quoteSheet(source.sheet)}!${cellAddress(source.firstRow + t, source.col, true, true)}`;
}

/** The source's cell for period t, as the check's messages name it (Sales!B50). */
export function sourceAddress(source: HistorySource, t: number): string {
  return shownAddress(source.sheet, source.firstRow + t, source.col);
}

/** The actual of period t at (row, col): a reference to its source cell, or the typed value. */
export function putActual(ctx: SectionContext, row: number, col: number, t: number): void {
  putFigure(ctx, row, col, t, ctx.actuals[t] ?? null, ctx.source);
}

/** The correction of period t: a reference to the corrections' cell, or the typed figure. */
export function putCorrection(ctx: SectionContext, row: number, col: number, t: number): void {
  const c = ctx.corrections!;
  putFigure(ctx, row, col, t, c.values[t] ?? null, c.source);
}

/** The reason of period t: a reference to the reasons' cell (T() keeps text, blank otherwise), or the typed text. */
export function putReason(ctx: SectionContext, row: number, col: number, t: number): void {
  const c = ctx.corrections!;
  const text = c.reasons[t] ?? "";
  if (!c.reasonSource) {
    ctx.cells.put(row, col, "reason", "input", text === "" ? null : text);
    return;
  }
  const cell = ctx.cells.put(row, col, "reason", "actual", text, { formula: `=T(${sourceReference(c.reasonSource, t)})` });
  cell.source = sourceAddress(c.reasonSource, t);
}

function putFigure(ctx: SectionContext, row: number, col: number, t: number, value: number | null, source: HistorySource | undefined): void {
  if (!source) {
    ctx.cells.put(row, col, "actual", "actual", value, { format: FORMAT.actual });
    return;
  }
  const ref = sourceReference(source, t);
  const cell = ctx.cells.put(row, col, "source", "actual", value ?? "", { formula: `=IF(ISNUMBER(${ref}),${ref},"")`, format: FORMAT.actual });
  cell.source = sourceAddress(source, t);
}

/** The source of a ledger's reasons read back from the formula of one of its reason cells (period t). */
export function parseReasonFormula(formula: string | undefined, t: number): HistorySource | undefined {
  const m = formula ? /^=?\s*T\(\s*(.+?)\s*\)\s*$/i.exec(formula) : null;
  return m ? parseSourceFormula(`=IF(ISNUMBER(${m[1]}),`, t) : undefined;
}

/** The source of a ledger read back from the formula of one of its actuals (period t), if it is a reference. */
export function parseSourceFormula(formula: string | undefined, t: number): HistorySource | undefined {
  if (!formula) return undefined;
  const m = /^=?\s*IF\(\s*ISNUMBER\(\s*(?:'((?:[^']|'')+)'|([A-Za-z_][A-Za-z0-9_.]*))!\$?([A-Za-z]{1,3})\$?(\d+)\s*\)/i.exec(formula);
  if (!m) return undefined;
  let col = 0;
  for (const ch of m[3].toUpperCase()) col = col * 26 + ch.charCodeAt(0) - 64;
  const row = Number(m[4]) - 1;
  if (row - t < 0) return undefined;
  return { sheet: (m[1] ?? m[2]).replace(/''/g, "'"), col: col - 1, firstRow: row - t };
}
