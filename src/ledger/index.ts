/**
 * Ebb ledger: one pure description of an audited, formula-driven update ledger, and the
 * adapters that write it (spreadsheet host, HyperFormula preview, .xlsx file).
 * Adapters with heavy or host-only dependencies are imported from their own files:
 * ./adapters/excelHost (Office runtime), ./adapters/xlsx and ./xlsx/writeLedgerWorkbook (exceljs).
 */
export { describeLedger } from "./describe/describeLedger";
export type * from "./describe/types";
export { defaultTag, uniqueTag } from "./describe/names";
export { ACTIONS } from "./actions";
export { ROLE_STYLES, FLAG_STYLE } from "./describe/styles";
export { extendLedger, type LedgerExtension } from "./extend";
export { fitLedgerConstants, refreshEngineCells, type LedgerFit } from "./fit";
export { verifyLedger, type VerifyProblem, type VerifyReport, type VerifyNotice, type ProblemKind } from "./verify/verifyLedger";
export { readLedger, type ReadLedger } from "./verify/readLedger";
export { gridReader, type LedgerReader, type ReadCell } from "./verify/reader";
export { writeLedgerToHyperFormula, writeCellsToHyperFormula, hyperFormulaReader } from "./adapters/hyperformula";
