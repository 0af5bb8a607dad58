/**
 * The panel's optional corrections and reasons columns: typed as a column (C, or Corrections!C),
 * read on the same rows as the history, so row for row each correction sits beside its actual.
 */
import { sourceAddress } from "../../ledger/describe/sourceCells";
import type { HistorySource, LedgerCorrections } from "../../ledger";
import type { PortValue, WorkbookPort } from "../port";
import type { HistoryPick } from "./historyPick";

export type ColumnText = { ok: true; column?: { sheet: string; col: number } } | { ok: false; message: string };

/** "C", "$C", "Corrections!C" or "'Hose reels'!C"; blank is no column. */
export function parseColumn(text: string, historySheet: string, what: string): ColumnText {
  const t = text.trim();
  if (t === "") return { ok: true };
  const m = /^(?:(?:'((?:[^']|'')+)'|([^'!]+))!\s*)?\$?([A-Za-z]{1,3})$/.exec(t);
  if (!m) return { ok: false, message: `${what}: type a column such as C, or a sheet and column such as Corrections!C (the rows are the history's).` };
  let col = 0;
  for (const ch of m[3].toUpperCase()) col = col * 26 + ch.charCodeAt(0) - 64;
  const sheet = (m[1] ?? m[2])?.replace(/''/g, "'").trim() ?? historySheet;
  return { ok: true, column: { sheet, col: col - 1 } };
}

export type CorrectionsRead = { ok: true; corrections?: LedgerCorrections } | { ok: false; message: string };

/**
 * Read the corrections (and reasons) beside a history, on its rows. A correction that is not a
 * number is refused with its address; nothing is guessed.
 */
export async function readCorrections(port: WorkbookPort, pick: Pick<HistoryPick, "sheet" | "firstRow" | "values">, correctionsText: string, reasonsText: string): Promise<CorrectionsRead> {
  const corr = parseColumn(correctionsText, pick.sheet, "Corrections column");
  if (!corr.ok) return corr;
  const why = parseColumn(reasonsText, pick.sheet, "Reasons column");
  if (!why.ok) return why;
  if (!corr.column) {
    return why.column ? { ok: false, message: "Reasons column: give the corrections column as well (the reasons explain the corrections)." } : { ok: true };
  }
  const rows = pick.values.length;
  const source: HistorySource = { sheet: corr.column.sheet, col: corr.column.col, firstRow: pick.firstRow };
  const reasonSource: HistorySource | undefined = why.column && { sheet: why.column.sheet, col: why.column.col, firstRow: pick.firstRow };
  return readCorrectionCells(port, source, reasonSource, 0, rows);
}

/** The corrections (and reasons) of periods from..from+rows-1 from the cells a ledger refers to. */
export async function readCorrectionCells(port: WorkbookPort, source: HistorySource, reasonSource: HistorySource | undefined, from: number, rows: number): Promise<CorrectionsRead> {
  const values: (number | null)[] = [];
  const block = await port.read(source.sheet, source.firstRow + from, source.col, rows, 1);
  for (let i = 0; i < rows; i++) {
    const v: PortValue = block.values[i]?.[0] ?? null;
    if (v === null || v === "") values.push(null);
    else if (typeof v === "number" && Number.isFinite(v)) values.push(v);
    else {
      const address = sourceAddress(source, from + i);
      const shown = typeof v === "object" ? v.error : JSON.stringify(v);
      return { ok: false, message: `The correction in ${address} is ${shown}, not a number. Type a figure there, or clear it to use the actual.` };
    }
  }
  const out: LedgerCorrections = { values, source };
  if (reasonSource) {
    const reasons = await port.read(reasonSource.sheet, reasonSource.firstRow + from, reasonSource.col, rows, 1);
    out.reasons = Array.from({ length: rows }, (_, i) => {
      const v = reasons.values[i]?.[0] ?? null;
      return v === null || typeof v === "object" ? "" : String(v);
    });
    out.reasonSource = reasonSource;
  }
  return { ok: true, corrections: out };
}
