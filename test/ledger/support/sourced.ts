import { HyperFormula } from "hyperformula";
import { registerStudentQuantile } from "../../../src/functions/hyperformula";
import { describeLedger, writeLedgerToHyperFormula, type LedgerDescription, type LedgerInput } from "../../../src/ledger";

export const HISTORY_SHEET = "History";

/**
 * A ledger written into a fresh HyperFormula workbook next to its history: the history on a
 * sheet of its own (header in B1, values from B2), the ledger's actuals referring to it. With
 * corrections, they go in column C and their reasons in D, and the ledger refers to those too.
 */
export function sourcedLedger(input: Omit<LedgerInput, "source">): { hf: HyperFormula; desc: LedgerDescription; historySheet: number; ledgerSheet: number; input: LedgerInput } {
  registerStudentQuantile(); // as the preview does: T.INV to full precision
  const hf = HyperFormula.buildEmpty({ licenseKey: "gpl-v3" });
  hf.addSheet(HISTORY_SHEET);
  const historySheet = hf.getSheetId(HISTORY_SHEET)!;
  const values = Array.from(input.history, (v) => [v ?? null]);
  hf.setCellContents({ sheet: historySheet, row: 0, col: 1 }, [[input.name ?? "Series"], ...values]);
  const full: LedgerInput = { ...input, source: { sheet: HISTORY_SHEET, col: 1, firstRow: 1 } };
  if (input.corrections) {
    const c = input.corrections;
    const rows = Array.from(c.values, (v, i) => [v ?? null, c.reasons?.[i] ?? null]);
    hf.setCellContents({ sheet: historySheet, row: 0, col: 2 }, [["Correction", "Reason"], ...rows]);
    full.corrections = { ...c, source: { sheet: HISTORY_SHEET, col: 2, firstRow: 1 }, reasonSource: { sheet: HISTORY_SHEET, col: 3, firstRow: 1 } };
  }
  const desc = describeLedger(full);
  const ledgerSheet = writeLedgerToHyperFormula(hf, desc);
  return { hf, desc, historySheet, ledgerSheet, input: full };
}
