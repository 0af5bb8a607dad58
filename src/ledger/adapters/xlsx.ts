import type ExcelJS from "exceljs";
import { badInput } from "../../engine";
import { cellAddress, parseCell } from "../describe/addresses";
import { numberFlagFormula, textFlagFormula } from "../describe/flagFormulas";
import { FORMAT } from "../describe/sheet";
import { FLAG_STYLE, ROLE_STYLES } from "../describe/styles";
import type { CellValue, ConditionalFlag, LedgerCell, LedgerDescription } from "../describe/types";

/**
 * Write a ledger description into an exceljs workbook (for an .xlsx file): formulas with
 * their cached results from the engine, defined names, number formats, styles, notes, merges
 * and the tracking-signal flags. exceljs cannot write charts, so the chart's data is written
 * as a block where the chart would go, with a note saying so.
 */
export interface XlsxLedgerOptions {
  /** Store the engine's values as cached formula results (default true). */
  cachedResults?: boolean;
}

export const CHART_BLOCK_NOTE =
  "The library that writes this file (exceljs) cannot draw charts. This block holds the chart's data, linked to the ledger: select it and insert an XY (scatter) chart with lines. #N/A marks a missing actual so the line leaves a gap.";

export function addLedgerToWorkbook(workbook: ExcelJS.Workbook, desc: LedgerDescription, options: XlsxLedgerOptions = {}): ExcelJS.Worksheet {
  const cached = options.cachedResults ?? true;
  const sheet = workbook.getWorksheet(desc.sheet) ?? workbook.addWorksheet(desc.sheet);
  refuseOccupied(sheet, desc);
  for (const [col, width] of Object.entries(desc.columnWidths)) sheet.getColumn(Number(col) + 1).width = width;
  for (const [row, height] of Object.entries(desc.rowHeights)) sheet.getRow(Number(row) + 1).height = height;
  for (const cell of desc.cells) writeCell(sheet, cell, cached);
  for (const m of desc.merges) sheet.mergeCells(m);
  for (const n of desc.names) workbook.definedNames.add(n.refersTo, n.name);
  for (const flag of desc.flags) sheet.addConditionalFormatting({ ref: flag.range, rules: [flagRule(flag)] });
  writeChartBlock(sheet, desc, cached);
  sheet.pageSetup = { ...sheet.pageSetup, orientation: "landscape", fitToPage: true, fitToWidth: 1, fitToHeight: 0 };
  return sheet;
}

/** One flag as a conditional-format rule: numbers outside limits, or text holding a phrase. */
function flagRule(flag: ConditionalFlag): ExcelJS.ConditionalFormattingRule {
  const style: Partial<ExcelJS.Style> = { fill: { type: "pattern", pattern: "solid", bgColor: { argb: argb(FLAG_STYLE.fill) } }, font: { color: { argb: argb(FLAG_STYLE.color) } } };
  // Formula rules (relative to the range's top-left cell): exceljs writes its text rules without the
  // text attribute, and a value rule would shade the blank text of a signal not yet defined.
  const topLeft = flag.range.split(":")[0];
  const formula = "outside" in flag ? numberFlagFormula(flag.outside.low, flag.outside.high, topLeft) : textFlagFormula(flag.containsText, topLeft);
  return { type: "expression", formulae: [formula], priority: 1, style };
}

/** Cells the description writes (for callers that add rows later, e.g. an extension). */
export function writeCellsToWorksheet(sheet: ExcelJS.Worksheet, cells: LedgerCell[], cached = true): void {
  for (const cell of cells) writeCell(sheet, cell, cached);
}

function refuseOccupied(sheet: ExcelJS.Worksheet, desc: LedgerDescription): void {
  const [a, b] = desc.footprint[0].split(":").map(parseCell);
  const occupied: string[] = [];
  sheet.eachRow({ includeEmpty: false }, (row, rowNumber) => {
    if (rowNumber - 1 < a.row || rowNumber - 1 > b.row) return;
    row.eachCell({ includeEmpty: false }, (c, colNumber) => {
      if (colNumber - 1 >= a.col && colNumber - 1 <= b.col && c.value !== null && c.value !== undefined) occupied.push(cellAddress(rowNumber - 1, colNumber - 1));
    });
  });
  if (occupied.length > 0) {
    throw badInput("destination-occupied", `The sheet ${desc.sheet} already holds ${occupied.length} cell(s) where the ledger goes (${occupied.slice(0, 5).join(", ")}). Write to a new sheet or another place.`);
  }
}

function writeCell(sheet: ExcelJS.Worksheet, cell: LedgerCell, cached: boolean): void {
  const target = sheet.getCell(cell.address);
  if (cell.formula !== undefined) {
    const formula = fileFormula(cell.formula);
    target.value = cached && cell.value !== null ? ({ formula, result: resultOf(cell.value) } as ExcelJS.CellFormulaValue) : ({ formula } as ExcelJS.CellFormulaValue);
  } else if (cell.value !== null) {
    target.value = cell.value;
  }
  if (cell.format && cell.format !== FORMAT.actual) target.numFmt = cell.format;
  const style = ROLE_STYLES[cell.role];
  if (style.bold || style.italic || style.size || style.color) {
    target.font = { bold: style.bold, italic: style.italic, size: style.size, color: style.color ? { argb: argb(style.color) } : undefined };
  }
  if (style.fill) target.fill = { type: "pattern", pattern: "solid", fgColor: { argb: argb(style.fill) } };
  if (style.wrap) target.alignment = { wrapText: true, vertical: "top" };
  if (cell.note) target.note = cell.note;
}

/** In the file format, functions newer than Excel 2007 carry the _xlfn. prefix. */
export function fileFormula(formula: string): string {
  return formula.replace(/^=/, "").replace(/\bT\.INV\(/g, "_xlfn.T.INV(");
}

function resultOf(v: CellValue): number | string {
  return v === null ? "" : v;
}

function argb(hex: string): string {
  return `FF${hex.replace("#", "").toUpperCase()}`;
}

/** The chart's data, linked to the ledger, where the chart would be drawn. */
function writeChartBlock(sheet: ExcelJS.Worksheet, desc: LedgerDescription, cached: boolean): void {
  const { row: top, col: left } = parseCell(desc.chart.from);
  const heading = sheet.getCell(cellAddress(top, left));
  heading.value = `6  Chart data: ${desc.chart.title}`;
  heading.font = { bold: true, size: 12, color: { argb: argb(ROLE_STYLES.heading.color!) } };
  heading.note = CHART_BLOCK_NOTE;
  const labels = ["Period", ...desc.chart.series.map((s) => s.label)];
  labels.forEach((label, j) => {
    const c = sheet.getCell(cellAddress(top + 1, left + j));
    c.value = label;
    c.font = { bold: true };
    c.fill = { type: "pattern", pattern: "solid", fgColor: { argb: argb(ROLE_STYLES.header.fill!) } };
    c.alignment = { wrapText: true, vertical: "top" };
    sheet.getColumn(left + j + 1).width = Math.max(12, Math.min(24, label.length + 2));
  });
  const byAddress = new Map(desc.cells.map((c) => [c.address, c]));
  const u = desc.layout.updates;
  const col = (key: keyof typeof u.columns) => u.columns[key]!;
  let r = top + 2;
  const link = (row: number, j: number, source: string, formula?: string) => {
    const src = byAddress.get(source);
    const value = src?.value ?? null;
    const target = sheet.getCell(cellAddress(row, left + j));
    const f = formula ?? source;
    target.value = cached && value !== null && value !== "" ? ({ formula: f, result: value } as ExcelJS.CellFormulaValue) : ({ formula: f } as ExcelJS.CellFormulaValue);
    // The ledger's own number format (whole units, periods): not the file's default of every digit.
    if (src?.format) target.numFmt = src.format;
  };
  for (const { row, start } of u.rows) {
    link(r, 0, cellAddress(row, col("period")));
    const actual = cellAddress(row, col("actual"));
    link(r, 1, actual, `IF(ISNUMBER(${actual}),${actual},NA())`);
    if (!start) link(r, 2, cellAddress(row, col("forecast")));
    r++;
  }
  for (const o of desc.layout.outlook.rows) {
    link(r, 0, o.period);
    link(r, 3, o.forecast);
    link(r, 4, o.low);
    link(r, 5, o.high);
    r++;
  }
}
