import { readFileSync } from "fs";
import { parse } from "csv-parse/sync";
import { CliError } from "./cliError";

/** One input column: its name and its values, null for a blank cell, trailing blanks removed. */
export interface SeriesColumn {
  name: string;
  values: (number | null)[];
}

export interface CsvSeries {
  /** The series, one per numeric column, in file order. */
  columns: SeriesColumn[];
  /** The first column when it holds labels (dates, months) rather than numbers. */
  labels?: { name: string; values: string[] };
}

/** Plain decimal numbers only: no hex, no "Infinity", no thousands separators. */
const DECIMAL = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

export function isNumberText(s: string): boolean {
  return DECIMAL.test(s);
}

/** Read a file, or standard input when the name is "-". */
export function readInputText(file: string): string {
  if (file === "-" && process.stdin.isTTY) process.stderr.write("ebb: reading CSV from standard input; end it with Ctrl-D.\n");
  try {
    return readFileSync(file === "-" ? 0 : file, "utf8");
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    const what = file === "-" ? "standard input" : `"${file}"`;
    if (code === "ENOENT") throw new CliError(`Cannot find the file ${what}. Check the path, or use - to read standard input.`);
    if (code === "EISDIR") throw new CliError(`${what} is a folder; give a CSV file.`);
    throw new CliError(`Cannot read ${what}: ${(e as Error).message}`);
  }
}

/**
 * Parse CSV text: the first row holds the series names, then one row per period. Blank cells are
 * missing values; trailing blanks of each column are dropped. A first column whose cells are
 * mostly not numbers (such as "2019-01") is taken as labels and not as a series. Any other cell
 * that is not a number stops the run with a message naming the series and the line of the file.
 */
export function parseSeriesCsv(text: string, source = "the input"): CsvSeries {
  let records: { record: string[]; info: { lines: number } }[];
  try {
    // With info: true each record comes with its position in the file (csv-parse's typing does not say so).
    records = parse(text, { info: true, bom: true, trim: true, relax_column_count: true, skip_empty_lines: false }) as unknown as typeof records;
  } catch (e) {
    throw new CliError(`${source} is not readable as CSV: ${(e as Error).message}`);
  }
  if (records.length === 0) throw new CliError(`${source} is empty: it needs a first row of series names and then one row per period.`);
  // A record may span several lines (a quoted cell with a line break): its first line is one after the previous record's last.
  const firstLine = records.map((_, i) => (i === 0 ? 1 : records[i - 1].info.lines + 1));
  const header = records[0].record;
  if (header.every((h) => isNumberText(h))) {
    throw new CliError(`The first row of ${source} holds numbers; it must hold the series names. Add a row of names at the top.`);
  }
  const rows = records.slice(1);
  const width = header.length;
  rows.forEach((r, i) => {
    for (let c = width; c < r.record.length; c++) {
      if (r.record[c] !== "") {
        throw new CliError(`Line ${firstLine[i + 1]} of ${source} has more cells than the first row has names (${width}). Name every column in the first row, or remove the extra cells.`);
      }
    }
  });
  const cell = (r: { record: string[] }, c: number): string => r.record[c] ?? "";
  const names = header.map((h, c) => (h === "" ? `column ${c + 1}` : h));
  const firstIsLabels = width > 1 && looksLikeLabels(rows.map((r) => cell(r, 0)));
  const from = firstIsLabels ? 1 : 0;
  if (from >= width) throw new CliError(`${source} has no series column: add one column of numbers per series.`);
  const columns: SeriesColumn[] = [];
  for (let c = from; c < width; c++) {
    const values: (number | null)[] = rows.map((r, i) => {
      const s = cell(r, c);
      if (s === "") return null;
      if (!isNumberText(s)) {
        throw new CliError(
          `Series "${names[c]}", row ${firstLine[i + 1]} of ${source}: "${s}" is not a number. Type a plain number (such as 1234.5) or leave the cell blank for a missing value.`,
        );
      }
      return Number(s);
    });
    while (values.length > 0 && values[values.length - 1] === null) values.pop();
    columns.push({ name: names[c], values });
  }
  const labels = firstIsLabels ? { name: names[0], values: rows.map((r) => cell(r, 0)) } : undefined;
  return { columns, labels };
}

/** More than half of the non-blank cells are not numbers: a column of dates or names, not a series. */
function looksLikeLabels(cells: string[]): boolean {
  const present = cells.filter((s) => s !== "");
  if (present.length === 0) return false;
  const text = present.filter((s) => !isNumberText(s)).length;
  return text * 2 > present.length;
}
