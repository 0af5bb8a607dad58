/// <reference types="office-js" />
import { cellAddress, parseCell, rangeAddress, sheetReference } from "../describe/addresses";
import { FLAG_STYLE, ROLE_STYLES, roleRectangles } from "../describe/styles";
import type { ChartSpec, LedgerCell, LedgerDescription } from "../describe/types";
import type { LedgerExtension } from "../extend";
import { gridReader, type LedgerReader } from "../verify/reader";

/**
 * Write a ledger into the spreadsheet host through the Excel JavaScript API, in one
 * Excel.run: a first sync looks at the destination, and all writes (names, formulas,
 * number formats, styles, merges, notes, conditional formats, chart) go in one batch with
 * calculation and screen updating suspended until that batch's sync.
 * It never writes over anything without being told the user agreed: when the destination
 * holds anything it returns "needs-confirmation" with the occupied cells and existing names.
 */

export type HostWriteResult =
  | { status: "written"; sheet: string; range: string; syncs: number; notes: "notes" | "comments" | "none" }
  | { status: "needs-confirmation"; sheet: string; occupied: string[]; occupiedCount: number; existingNames: string[]; message: string };

export interface HostWriteOptions {
  /** The user agreed to clear the destination. */
  confirmed?: boolean;
  /** How to attach notes; detected from the host's API sets when omitted. */
  notes?: "notes" | "comments" | "none";
}

const MAX_LISTED = 50;

export async function writeLedgerToExcel(desc: LedgerDescription, options: HostWriteOptions = {}): Promise<HostWriteResult> {
  return Excel.run(async (context) => {
    let syncs = 0;
    const sync = async () => {
      syncs++;
      await context.sync();
    };
    const workbook = context.workbook;
    let sheet = workbook.worksheets.getItemOrNullObject(desc.sheet);
    sheet.load("isNullObject");
    const names = workbook.names;
    names.load("items/name");
    await sync();

    // Look at the destination: any content in the footprint, names and chart of the same ledger.
    const occupied: string[] = [];
    let occupiedCount = 0;
    let oldChart: Excel.Chart | undefined;
    const sheetExists = !sheet.isNullObject;
    if (sheetExists) {
      const used = sheet.getRange(desc.footprint[0]).getUsedRangeOrNullObject(true);
      used.load(["isNullObject", "formulas", "rowIndex", "columnIndex"]);
      oldChart = sheet.charts.getItemOrNullObject(desc.chart.name);
      oldChart.load("isNullObject");
      await sync();
      if (!used.isNullObject) {
        used.formulas.forEach((row, i) =>
          row.forEach((v, j) => {
            if (v === "" || v === null) return;
            occupiedCount++;
            if (occupied.length < MAX_LISTED) occupied.push(cellAddress(used.rowIndex + i, used.columnIndex + j));
          }),
        );
      }
      if (oldChart.isNullObject) oldChart = undefined;
    }
    const prefix = `ebb_${desc.tag}_`.toLowerCase();
    const existingNames = names.items.map((n) => n.name).filter((n) => n.toLowerCase().startsWith(prefix));
    if ((occupiedCount > 0 || existingNames.length > 0 || oldChart) && !options.confirmed) {
      const parts: string[] = [];
      if (occupiedCount > 0) parts.push(`${occupiedCount} cell${occupiedCount === 1 ? "" : "s"} in ${desc.sheet}!${desc.footprint[0]} already hold something (${occupied.slice(0, 5).join(", ")}${occupiedCount > 5 ? ", ..." : ""})`);
      if (existingNames.length > 0) parts.push(`the names ${existingNames.slice(0, 3).join(", ")}${existingNames.length > 3 ? ", ..." : ""} already exist`);
      if (oldChart) parts.push(`a chart named ${desc.chart.name} already exists`);
      return {
        status: "needs-confirmation",
        sheet: desc.sheet,
        occupied,
        occupiedCount,
        existingNames,
        message: `The ledger would write over existing content: ${parts.join("; ")}. Choose another place, or confirm to clear it and write the ledger.`,
      };
    }

    // One batch of writes.
    context.application.suspendApiCalculationUntilNextSync();
    context.application.suspendScreenUpdatingUntilNextSync();
    if (!sheetExists) sheet = workbook.worksheets.add(desc.sheet);
    if (options.confirmed) {
      if (occupiedCount > 0) sheet.getRange(desc.footprint[0]).clear("All");
      for (const n of existingNames) names.getItem(n).delete();
      oldChart?.delete();
    }
    for (const n of desc.names) names.add(n.name, `=${n.refersTo}`, n.comment);
    writeCellBlock(sheet, desc.cells);
    for (const m of desc.merges) sheet.getRange(m).merge(false);
    for (const [col, width] of Object.entries(desc.columnWidths)) {
      const letters = cellAddress(0, Number(col)).replace(/\d+$/, "");
      sheet.getRange(`${letters}:${letters}`).format.columnWidth = width * 7;
    }
    for (const [row, height] of Object.entries(desc.rowHeights)) sheet.getRange(`${Number(row) + 1}:${Number(row) + 1}`).format.rowHeight = height;
    const noteMode = options.notes ?? detectNoteApi();
    addNotes(workbook, sheet, desc.sheet, desc.cells, noteMode);
    for (const flag of desc.flags) {
      const cf = sheet.getRange(flag.range).conditionalFormats.add("CellValue" as Excel.ConditionalFormatType);
      cf.cellValue.format.fill.color = FLAG_STYLE.fill;
      cf.cellValue.format.font.color = FLAG_STYLE.color;
      cf.cellValue.rule = { formula1: `=${flag.outside.low}`, formula2: `=${flag.outside.high}`, operator: "NotBetween" };
    }
    addChart(sheet, desc.chart);
    await sync();
    return { status: "written", sheet: desc.sheet, range: desc.footprint[0], syncs, notes: noteMode };
  });
}

/** Append the rows of an extension (and refresh the engine's numbers and the chart): one look, one batch. */
export async function writeExtensionToExcel(ext: LedgerExtension): Promise<{ syncs: number }> {
  return Excel.run(async (context) => {
    const sheet = context.workbook.worksheets.getItem(ext.sheet);
    const oldChart = sheet.charts.getItemOrNullObject(ext.chart.name);
    oldChart.load("isNullObject");
    await context.sync();
    context.application.suspendApiCalculationUntilNextSync();
    context.application.suspendScreenUpdatingUntilNextSync();
    for (const n of ext.names) {
      context.workbook.names.getItem(n.name).delete();
      context.workbook.names.add(n.name, `=${n.refersTo}`, n.comment);
    }
    writeCellBlock(sheet, [...ext.append, ...ext.refresh]);
    if (!oldChart.isNullObject) oldChart.delete();
    addChart(sheet, ext.chart);
    await context.sync();
    return { syncs: 2 };
  });
}

/** Write some cells (e.g. fitted constants) in one batch. */
export async function writeCellsToExcel(sheetName: string, cells: LedgerCell[]): Promise<void> {
  await Excel.run(async (context) => {
    const sheet = context.workbook.worksheets.getItem(sheetName);
    context.application.suspendApiCalculationUntilNextSync();
    writeCellBlock(sheet, cells);
    await context.sync();
  });
}

/** Read a ledger's area (formulas and values) for verify, extend and fit: one sync. */
export async function readLedgerFromExcel(sheetName: string, anchorCell: string, rows = 4000, cols = 20): Promise<LedgerReader> {
  return Excel.run(async (context) => {
    const sheet = context.workbook.worksheets.getItem(sheetName);
    const { row, col } = parseCell(anchorCell);
    const used = sheet.getRange(rangeAddress(row, col, row + rows - 1, col + cols - 1)).getUsedRangeOrNullObject(true);
    used.load(["isNullObject", "formulas", "values", "rowIndex", "columnIndex"]);
    await context.sync();
    if (used.isNullObject) return gridReader(0, 0, [], []);
    return gridReader(used.rowIndex, used.columnIndex, used.formulas, used.values);
  });
}

/** Formulas, values and number formats of all cells as one rectangle (null leaves a cell alone). */
function writeCellBlock(sheet: Excel.Worksheet, cells: LedgerCell[]): void {
  if (cells.length === 0) return;
  let r1 = Infinity, c1 = Infinity, r2 = -1, c2 = -1;
  for (const c of cells) {
    r1 = Math.min(r1, c.row);
    c1 = Math.min(c1, c.col);
    r2 = Math.max(r2, c.row);
    c2 = Math.max(c2, c.col);
  }
  const formulas: (string | number | null)[][] = Array.from({ length: r2 - r1 + 1 }, () => new Array(c2 - c1 + 1).fill(null));
  const formats: (string | null)[][] = Array.from({ length: r2 - r1 + 1 }, () => new Array(c2 - c1 + 1).fill(null));
  for (const c of cells) {
    formulas[c.row - r1][c.col - c1] = c.formula ?? hostValue(c.value);
    if (c.format) formats[c.row - r1][c.col - c1] = c.format;
  }
  const block = sheet.getRange(rangeAddress(r1, c1, r2, c2));
  block.numberFormat = formats as string[][];
  block.formulas = formulas as string[][];
  for (const rect of roleRectangles(cells)) {
    const style = ROLE_STYLES[rect.role];
    if (Object.keys(style).length === 0) continue;
    const format = sheet.getRange(rangeAddress(rect.r1, rect.c1, rect.r2, rect.c2)).format;
    if (style.fill) format.fill.color = style.fill;
    if (style.bold) format.font.bold = true;
    if (style.italic) format.font.italic = true;
    if (style.color) format.font.color = style.color;
    if (style.size) format.font.size = style.size;
    if (style.wrap) format.wrapText = true;
  }
}

/** Text the host would read as a number, date, formula or boolean is written with a leading apostrophe. */
function hostValue(v: string | number | null): string | number {
  if (v === null) return "";
  if (typeof v === "string" && (/^[=+\-\d.]/.test(v) || /^(true|false)$/i.test(v))) return `'${v}`;
  return v;
}

function detectNoteApi(): "notes" | "comments" | "none" {
  const req = typeof Office !== "undefined" ? Office.context?.requirements : undefined;
  if (!req) return "none";
  if (req.isSetSupported("ExcelApi", "1.18")) return "notes";
  if (req.isSetSupported("ExcelApi", "1.10")) return "comments";
  return "none";
}

function addNotes(workbook: Excel.Workbook, sheet: Excel.Worksheet, sheetName: string, cells: LedgerCell[], mode: "notes" | "comments" | "none"): void {
  if (mode === "none") return;
  for (const c of cells) {
    if (!c.note) continue;
    if (mode === "notes") (sheet as unknown as { notes: { add(cell: string, text: string): void } }).notes.add(c.address, c.note);
    else workbook.comments.add(sheetReference(sheetName, c.address), c.note);
  }
}

function addChart(sheet: Excel.Worksheet, spec: ChartSpec): void {
  const [first, ...rest] = spec.series;
  const chart = sheet.charts.add("XYScatterLinesNoMarkers" as Excel.ChartType, sheet.getRange(first.y), "Columns" as Excel.ChartSeriesBy);
  chart.name = spec.name;
  chart.title.text = spec.title;
  const s0 = chart.series.getItemAt(0);
  s0.name = first.label;
  s0.setXAxisValues(sheet.getRange(first.x));
  s0.setValues(sheet.getRange(first.y));
  for (const s of rest) {
    const series = chart.series.add(s.label);
    series.setXAxisValues(sheet.getRange(s.x));
    series.setValues(sheet.getRange(s.y));
  }
  chart.setPosition(spec.from, spec.to);
}

