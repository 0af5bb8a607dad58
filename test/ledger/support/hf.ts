import { HyperFormula } from "hyperformula";
import { registerStudentQuantile } from "../../../src/functions/hyperformula";
import { describeLedger, hyperFormulaReader, writeLedgerToHyperFormula, type LedgerDescription, type LedgerInput } from "../../../src/ledger";
import { parseCell } from "../../../src/ledger/describe/addresses";

/** A ledger written into a fresh HyperFormula workbook with its default settings (as the preview uses). */
export function ledgerInHyperFormula(input: LedgerInput): { hf: HyperFormula; desc: LedgerDescription; sheetId: number; value: (address: string) => unknown } {
  const desc = describeLedger(input);
  registerStudentQuantile(); // as the preview does: T.INV to full precision
  const hf = HyperFormula.buildEmpty({ licenseKey: "gpl-v3" });
  const sheetId = writeLedgerToHyperFormula(hf, desc);
  const value = (address: string) => {
    const { row, col } = parseCell(address);
    return hf.getCellValue({ sheet: sheetId, row, col });
  };
  return { hf, desc, sheetId, value };
}

export { hyperFormulaReader };

/** Relative difference, for reporting. */
export function relativeGap(found: number, expected: number): number {
  return Math.abs(found - expected) / Math.max(Math.abs(found), Math.abs(expected), 1e-300);
}
