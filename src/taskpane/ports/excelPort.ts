/// <reference types="office-js" />
/**
 * The panel's workbook port in the spreadsheet host, through the Excel JavaScript API and the
 * ledger's host adapter (src/ledger/adapters/excelHost.ts). Each call is one Excel.run with as
 * few syncs as it needs.
 */
import { readLedgerFromExcel, writeCellsToExcel, writeExtensionToExcel, writeLedgerToExcel } from "../../ledger/adapters/excelHost";
import { cellAddress, rangeAddress } from "../../ledger/describe/addresses";
import type { LedgerCell, LedgerDescription, LedgerExtension, LedgerReader } from "../../ledger";
import type { LedgerLocation, PortValue, ProgressReport, SheetBlock, WorkbookPort, WriteOutcome } from "../port";

const LEDGER_NAME = /^ebb_([A-Za-z0-9]+)_ledger$/i;

/** Host values with their types as the panel's values: errors keep their code, empty cells are null. */
function portValues(values: unknown[][], types: string[][]): PortValue[][] {
  return values.map((row, r) =>
    row.map((v, c) => {
      const type = types[r]?.[c];
      if (type === "Error") return { error: String(v) };
      if (type === "Empty" || v === "" || v === null || v === undefined) return null;
      if (typeof v === "number" || typeof v === "string" || typeof v === "boolean") return v;
      return String(v);
    }),
  );
}

export class ExcelPort implements WorkbookPort {
  readonly kind = "host" as const;

  selection(): Promise<SheetBlock> {
    return Excel.run(async (context) => {
      const range = context.workbook.getSelectedRange();
      range.load(["values", "valueTypes", "rowIndex", "columnIndex"]);
      range.worksheet.load("name");
      await context.sync();
      return { sheet: range.worksheet.name, top: range.rowIndex, left: range.columnIndex, values: portValues(range.values, range.valueTypes) };
    });
  }

  read(sheet: string, top: number, left: number, rows: number, cols: number): Promise<SheetBlock> {
    return Excel.run(async (context) => {
      const range = context.workbook.worksheets.getItem(sheet).getRange(rangeAddress(top, left, top + rows - 1, left + cols - 1));
      range.load(["values", "valueTypes"]);
      await context.sync();
      return { sheet, top, left, values: portValues(range.values, range.valueTypes) };
    });
  }

  lastUsedRow(sheet: string): Promise<number> {
    return Excel.run(async (context) => {
      const used = context.workbook.worksheets.getItem(sheet).getUsedRangeOrNullObject(true);
      used.load(["isNullObject", "rowIndex", "rowCount"]);
      await context.sync();
      return used.isNullObject ? -1 : used.rowIndex + used.rowCount - 1;
    });
  }

  sheetNames(): Promise<string[]> {
    return Excel.run(async (context) => {
      const sheets = context.workbook.worksheets;
      sheets.load("items/name");
      await context.sync();
      return sheets.items.map((s) => s.name);
    });
  }

  firstUsedCell(sheet: string, ranges: string[]): Promise<string | undefined> {
    return Excel.run(async (context) => {
      const ws = context.workbook.worksheets.getItemOrNullObject(sheet);
      ws.load("isNullObject");
      await context.sync();
      if (ws.isNullObject) return undefined;
      const used = ranges.map((r) => {
        const u = ws.getRange(r).getUsedRangeOrNullObject(true);
        u.load(["isNullObject", "formulas", "rowIndex", "columnIndex"]);
        return u;
      });
      await context.sync();
      for (const u of used) {
        if (u.isNullObject) continue;
        for (let i = 0; i < u.formulas.length; i++) {
          for (let j = 0; j < u.formulas[i].length; j++) {
            const v = u.formulas[i][j];
            if (v !== "" && v !== null) return `${sheet}!${cellAddress(u.rowIndex + i, u.columnIndex + j)}`;
          }
        }
      }
      return undefined;
    });
  }

  async writeLedger(ledger: LedgerDescription, confirmed: boolean, onProgress?: ProgressReport): Promise<WriteOutcome> {
    const result = await writeLedgerToExcel(ledger, { confirmed, onProgress });
    return result.status === "written" ? { status: "written" } : { status: "needs-confirmation", message: result.message };
  }

  async writeExtension(extension: LedgerExtension, onProgress?: ProgressReport): Promise<void> {
    await writeExtensionToExcel(extension, onProgress);
  }

  writeCells(sheet: string, cells: LedgerCell[]): Promise<void> {
    return writeCellsToExcel(sheet, cells);
  }

  reader(sheet: string, anchorCell: string): Promise<LedgerReader> {
    return readLedgerFromExcel(sheet, anchorCell);
  }

  select(sheet: string, address: string): Promise<void> {
    return Excel.run(async (context) => {
      const ws = context.workbook.worksheets.getItem(sheet);
      ws.activate();
      ws.getRange(address).select();
      await context.sync();
    });
  }

  ledgers(): Promise<LedgerLocation[]> {
    return Excel.run(async (context) => {
      const names = context.workbook.names;
      names.load("items/name,items/formula");
      await context.sync();
      const found: LedgerLocation[] = [];
      for (const n of names.items) {
        const m = LEDGER_NAME.exec(n.name);
        const ref = /^=?(?:'((?:[^']|'')+)'|([^'!]+))!\$?([A-Z]{1,3})\$?(\d+)$/i.exec(String(n.formula ?? "").trim());
        if (m && ref) found.push({ sheet: (ref[1] ?? ref[2]).replace(/''/g, "'"), cell: `${ref[3].toUpperCase()}${ref[4]}`, tag: m[1] });
      }
      return found;
    });
  }
}
