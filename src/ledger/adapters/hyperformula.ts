import type { HyperFormula, RawCellContent } from "hyperformula";
import type { LedgerCell, LedgerDescription, LedgerName } from "../describe/types";
import type { LedgerReader, ReadCell } from "../verify/reader";

/**
 * Write a ledger description into a HyperFormula instance (the preview workbook): the sheet
 * (added when missing), the defined names (workbook scope, as named expressions) and every
 * cell, in one batch so the ledger is computed once.
 */
export function writeLedgerToHyperFormula(hf: HyperFormula, desc: Pick<LedgerDescription, "sheet" | "cells" | "names">): number {
  const sheetId = ensureSheet(hf, desc.sheet);
  hf.batch(() => {
    defineNames(hf, desc.names);
    writeCells(hf, sheetId, desc.cells);
  });
  return sheetId;
}

/** Write cells only (extend and refresh use this). */
export function writeCellsToHyperFormula(hf: HyperFormula, sheet: string, cells: LedgerCell[], names: LedgerName[] = []): void {
  const sheetId = ensureSheet(hf, sheet);
  hf.batch(() => {
    defineNames(hf, names);
    writeCells(hf, sheetId, cells);
  });
}

function ensureSheet(hf: HyperFormula, sheet: string): number {
  let id = hf.getSheetId(sheet);
  if (id === undefined) {
    hf.addSheet(sheet);
    id = hf.getSheetId(sheet)!;
  }
  return id;
}

function defineNames(hf: HyperFormula, names: LedgerName[]): void {
  for (const n of names) {
    const expression = `=${n.refersTo}`;
    if (hf.isItPossibleToAddNamedExpression(n.name, expression)) hf.addNamedExpression(n.name, expression);
    else hf.changeNamedExpression(n.name, expression);
  }
}

function writeCells(hf: HyperFormula, sheetId: number, cells: LedgerCell[]): void {
  for (const c of cells) hf.setCellContents({ sheet: sheetId, row: c.row, col: c.col }, [[content(c)]]);
}

/** Formula text, a number, or text kept as text (an apostrophe stops "2019-01" becoming a date). */
function content(c: LedgerCell): RawCellContent {
  if (c.formula !== undefined) return c.formula;
  if (typeof c.value === "string") return `'${c.value}`;
  return c.value;
}

/** A reader over a HyperFormula sheet, for verify and extend. */
export function hyperFormulaReader(hf: HyperFormula, sheet: string): LedgerReader {
  const sheetId = hf.getSheetId(sheet);
  return (row: number, col: number): ReadCell => {
    if (sheetId === undefined) return { value: null };
    const address = { sheet: sheetId, row, col };
    const formula = hf.doesCellHaveFormula(address) ? hf.getCellFormula(address) : undefined;
    // Typed numbers are read as typed: the displayed value may be rounded (smartRounding).
    const typed = formula === undefined ? hf.getCellSerialized(address) : undefined;
    const raw = typeof typed === "number" ? typed : hf.getCellValue(address);
    const value = raw === null || typeof raw === "number" || typeof raw === "string" ? raw : typeof raw === "boolean" ? String(raw) : `#${String((raw as { type?: string }).type ?? "ERROR")}`;
    return formula === undefined ? { value } : { formula, value };
  };
}
