/// <reference types="office-js" />
import { cellAddress, MAX_COLS, MAX_ROWS, parseCell, rangeAddress, sheetReference } from "../describe/addresses";
import { FLAG_STYLE, ROLE_STYLES, roleRectangles } from "../describe/styles";
import { numberFlagFormula } from "../describe/flagFormulas";
import type { ChartSpec, ConditionalFlag, LedgerCell, LedgerDescription } from "../describe/types";
import type { LedgerExtension } from "../extend";
import { gridReader, type LedgerReader } from "../verify/reader";

/**
 * Write a ledger into the spreadsheet host through the Excel JavaScript API, in one
 * Excel.run: a first sync looks at the destination, then the writes (names, formulas,
 * number formats, styles, merges, notes, conditional formats, chart) go in batches of rows,
 * each request well under the host's request size limit (5 MB on the web; we keep each under
 * REQUEST_BUDGET), with calculation and screen updating suspended for each batch.
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
  /** Called after each batch with the rows written so far and the rows in all. */
  onProgress?: (done: number, total: number) => void;
}

const MAX_LISTED = 50;
/** Characters of cell content (formulas and formats) queued before a sync: well under the web host's 5 MB. */
export const REQUEST_BUDGET = 1_000_000;
/** Rows read per sync when reading a ledger back (20 columns of formulas and values: about 1.6 MB). */
export const READ_ROWS = 1000;

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

    // The writes, in batches of rows that each stay under the request budget.
    const suspend = () => suspendUntilSync(context);
    suspend();
    if (!sheetExists) sheet = workbook.worksheets.add(desc.sheet);
    if (options.confirmed) {
      if (occupiedCount > 0) sheet.getRange(desc.footprint[0]).clear("All");
      for (const n of existingNames) names.getItem(n).delete();
      oldChart?.delete();
    }
    for (const n of desc.names) names.add(n.name, `=${n.refersTo}`, n.comment);
    const target = sheet;
    await writeCellBatches(target, desc.cells, async () => {
      await sync();
      suspend();
    }, options.onProgress);
    for (const m of desc.merges) sheet.getRange(m).merge(false);
    for (const [col, width] of Object.entries(desc.columnWidths)) {
      const letters = cellAddress(0, Number(col)).replace(/\d+$/, "");
      sheet.getRange(`${letters}:${letters}`).format.columnWidth = width * 7;
    }
    for (const [row, height] of Object.entries(desc.rowHeights)) sheet.getRange(`${Number(row) + 1}:${Number(row) + 1}`).format.rowHeight = height;
    const noteMode = options.notes ?? detectNoteApi();
    addNotes(workbook, sheet, desc.sheet, desc.cells, noteMode);
    for (const flag of desc.flags) addFlag(sheet, flag);
    addChart(sheet, desc.chart);
    await sync();
    return { status: "written", sheet: desc.sheet, range: desc.footprint[0], syncs, notes: noteMode };
  });
}

/**
 * Append the rows of an extension (and refresh the engine's numbers and the chart): one look,
 * then batches of rows. A ledger name that was deleted in the workbook is defined again (the
 * null-object lookup finds it missing instead of failing the whole batch).
 */
export async function writeExtensionToExcel(ext: LedgerExtension, onProgress?: (done: number, total: number) => void): Promise<{ syncs: number }> {
  return Excel.run(async (context) => {
    let syncs = 0;
    const sync = async () => {
      syncs++;
      await context.sync();
    };
    const sheet = context.workbook.worksheets.getItem(ext.sheet);
    const oldChart = sheet.charts.getItemOrNullObject(ext.chart.name);
    oldChart.load("isNullObject");
    const redefine = new Set(ext.names.map((n) => n.name));
    const wanted = ext.description.names;
    const found = wanted.map((n) => {
      const item = context.workbook.names.getItemOrNullObject(n.name);
      item.load("isNullObject");
      return item;
    });
    await sync();
    const suspend = () => suspendUntilSync(context);
    suspend();
    wanted.forEach((n, i) => {
      const missing = found[i].isNullObject;
      if (!missing && !redefine.has(n.name)) return;
      if (!missing) found[i].delete();
      context.workbook.names.add(n.name, `=${n.refersTo}`, n.comment);
    });
    await writeCellBatches(sheet, [...ext.append, ...ext.refresh], async () => {
      await sync();
      suspend();
    }, onProgress);
    if (!oldChart.isNullObject) oldChart.delete();
    addChart(sheet, ext.chart);
    await sync();
    return { syncs };
  });
}

/** Write some cells (e.g. fitted constants) in one batch. */
export async function writeCellsToExcel(sheetName: string, cells: LedgerCell[]): Promise<void> {
  await Excel.run(async (context) => {
    const sheet = context.workbook.worksheets.getItem(sheetName);
    context.application.suspendApiCalculationUntilNextSync();
    await writeCellBatches(sheet, cells, async () => {
      await context.sync();
      context.application.suspendApiCalculationUntilNextSync();
    });
    await context.sync();
  });
}

/**
 * Read a ledger's area (formulas and values) for verify, extend and fit. The first sync asks
 * how far the ledger's columns are used (however long the ledger), then rows are read in
 * slices of READ_ROWS, one sync each, so no response grows past the host's limit.
 */
export async function readLedgerFromExcel(sheetName: string, anchorCell: string, cols = 20): Promise<LedgerReader> {
  return Excel.run(async (context) => {
    const sheet = context.workbook.worksheets.getItem(sheetName);
    const { row, col } = parseCell(anchorCell);
    const used = sheet.getRange(rangeAddress(row, col, MAX_ROWS - 1, Math.min(MAX_COLS - 1, col + cols - 1))).getUsedRangeOrNullObject(true);
    used.load(["isNullObject", "rowIndex", "columnIndex", "rowCount", "columnCount"]);
    await context.sync();
    if (used.isNullObject) return gridReader(0, 0, [], []);
    const formulas: unknown[][] = [];
    const values: unknown[][] = [];
    for (let r = 0; r < used.rowCount; r += READ_ROWS) {
      const rows = Math.min(READ_ROWS, used.rowCount - r);
      const slice = sheet.getRange(rangeAddress(used.rowIndex + r, used.columnIndex, used.rowIndex + r + rows - 1, used.columnIndex + used.columnCount - 1));
      slice.load(["formulas", "values"]);
      await context.sync();
      formulas.push(...slice.formulas);
      values.push(...slice.values);
    }
    return gridReader(used.rowIndex, used.columnIndex, formulas, values);
  });
}

/** Cells split into bands of whole rows whose formulas and formats stay under the request budget. */
export function cellBatches(cells: LedgerCell[], budget = REQUEST_BUDGET): LedgerCell[][] {
  const sorted = [...cells].sort((a, b) => a.row - b.row || a.col - b.col);
  const batches: LedgerCell[][] = [];
  let current: LedgerCell[] = [];
  let size = 0;
  for (let i = 0; i < sorted.length; ) {
    let j = i;
    let rowSize = 0;
    while (j < sorted.length && sorted[j].row === sorted[i].row) {
      const c = sorted[j];
      rowSize += String(c.formula ?? c.value ?? "").length + (c.format?.length ?? 0) + 8;
      j++;
    }
    if (current.length > 0 && size + rowSize > budget) {
      batches.push(current);
      current = [];
      size = 0;
    }
    current.push(...sorted.slice(i, j));
    size += rowSize;
    i = j;
  }
  if (current.length > 0) batches.push(current);
  return batches;
}

async function writeCellBatches(sheet: Excel.Worksheet, cells: LedgerCell[], flush: () => Promise<void>, onProgress?: (done: number, total: number) => void): Promise<void> {
  const batches = cellBatches(cells);
  let done = 0;
  for (let i = 0; i < batches.length; i++) {
    writeCellBlock(sheet, batches[i]);
    done += batches[i].length;
    if (i < batches.length - 1) {
      await flush();
      onProgress?.(done, cells.length);
    }
  }
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


/** Calculation and screen updating wait until the next sync: each batch of writes lands at once. */
function suspendUntilSync(context: Excel.RequestContext): void {
  context.application.suspendApiCalculationUntilNextSync();
  context.application.suspendScreenUpdatingUntilNextSync();
}

/** One flag as the host's conditional format: numbers outside limits, or text holding a phrase. */
function addFlag(sheet: Excel.Worksheet, flag: ConditionalFlag): void {
  const range = sheet.getRange(flag.range);
  if ("outside" in flag) {
    // A formula rule: a value rule would shade the blank text of a signal not yet defined.
    const cf = range.conditionalFormats.add("Custom" as Excel.ConditionalFormatType);
    cf.custom.format.fill.color = FLAG_STYLE.fill;
    cf.custom.format.font.color = FLAG_STYLE.color;
    cf.custom.rule.formula = `=${numberFlagFormula(flag.outside.low, flag.outside.high, flag.range.split(":")[0])}`;
  } else {
    const cf = range.conditionalFormats.add("ContainsText" as Excel.ConditionalFormatType);
    cf.textComparison.format.fill.color = FLAG_STYLE.fill;
    cf.textComparison.format.font.color = FLAG_STYLE.color;
    cf.textComparison.rule = { operator: "Contains" as Excel.ConditionalTextOperator, text: flag.containsText };
  }
}
