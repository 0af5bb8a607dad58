import ExcelJS from "exceljs";
import { EbbError } from "../../engine";
import { addLedgerToWorkbook } from "../adapters/xlsx";
import { describeLedger } from "../describe/describeLedger";
import { defaultTag, uniqueTag } from "../describe/names";
import type { LedgerWorkbookSettings } from "../describe/types";

/** A series the workbook holds no ledger for, and why. */
export interface LeftOut {
  name: string;
  reason: string;
}

/** The sheet of the .xlsx workbook that holds every series, one column each. */
export const DATA_SHEET = "Data";

/**
 * The .xlsx workbook of `ebb ledger`: a data sheet with the label column (when given) and every
 * series, then one ledger sheet per series. A series that cannot be written gets a sheet with
 * the reason instead, the others are still written, and the ones left out are returned.
 */
export async function writeLedgerWorkbook(
  columns: { name: string; values: (number | null)[]; problem?: string }[],
  settings: LedgerWorkbookSettings,
  outPath: string,
  labels?: { name: string; values: string[] },
): Promise<LeftOut[]> {
  const workbook = new ExcelJS.Workbook();
  workbook.creator = "Ebb";
  workbook.calcProperties.fullCalcOnLoad = true;
  const used = new Set<string>(["data"]);
  const usedTags = new Set<string>();
  const data = workbook.addWorksheet(DATA_SHEET);
  const first = labels ? 1 : 0;
  if (labels) {
    data.getCell(1, 1).value = labels.name;
    data.getCell(1, 1).font = { bold: true };
    data.getColumn(1).width = Math.max(10, Math.min(30, Math.max(labels.name.length, ...labels.values.slice(0, 50).map((v) => v.length)) + 2));
    labels.values.forEach((v, i) => {
      if (v !== "") data.getCell(i + 2, 1).value = v;
    });
  }
  columns.forEach((c, k) => {
    const j = k + first;
    data.getCell(1, j + 1).value = c.name;
    data.getCell(1, j + 1).font = { bold: true };
    data.getColumn(j + 1).width = Math.max(10, Math.min(30, c.name.length + 2));
    c.values.forEach((v, i) => {
      if (v !== null && v !== undefined) data.getCell(i + 2, j + 1).value = v;
    });
  });
  const { horizon, coverage, ...model } = settings;
  const leftOut: LeftOut[] = [];
  columns.forEach((column, k) => {
    const sheet = uniqueSheetName(`Ledger ${column.name}`, used);
    const tag = uniqueTag(defaultTag(sheet, "A1"), usedTags);
    usedTags.add(tag);
    try {
      // The actuals refer to the data sheet (row 1 holds the names), so a corrected figure there recomputes the ledger.
      if (column.problem !== undefined) throw new EbbError("value", "bad-cell", column.problem);
      const desc = describeLedger({ history: column.values, name: column.name, settings: model, horizon, coverage, anchor: { sheet, cell: "A1" }, tag, source: { sheet: DATA_SHEET, col: k + first, firstRow: 1 } });
      addLedgerToWorkbook(workbook, desc);
    } catch (e) {
      if (!(e instanceof EbbError)) throw e;
      const ws = workbook.getWorksheet(sheet) ?? workbook.addWorksheet(sheet);
      ws.getCell("A1").value = `Ebb ledger: ${column.name}`;
      ws.getCell("A1").font = { bold: true, size: 14 };
      ws.getCell("A3").value = `This series has no ledger: ${e.message}`;
      leftOut.push({ name: column.name, reason: e.message });
    }
  });
  await workbook.xlsx.writeFile(outPath);
  return leftOut;
}

/** A sheet name the hosts accept (31 characters, no : \ / ? * [ ]) and not yet used. */
function uniqueSheetName(wanted: string, used: Set<string>): string {
  const base = wanted.replace(/[:\\/?*[\]]/g, " ").replace(/^'+|'+$/g, "").trim().slice(0, 31) || "Ledger";
  let name = base;
  for (let k = 2; used.has(name.toLowerCase()); k++) name = `${base.slice(0, 31 - String(k).length - 1)} ${k}`;
  used.add(name.toLowerCase());
  return name;
}
