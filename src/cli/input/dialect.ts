import { CliError } from "../cliError";

/**
 * The column separator and the decimal mark of a CSV file. European exports commonly use
 * semicolons with decimal commas ("2021-01;525,5;76"); the rest of the world commas with
 * decimal points. Either is detected from the first lines, or given with --delimiter / --decimal.
 */
export interface Dialect {
  delimiter: string;
  decimal: "." | ",";
}

export const DELIMITER_WORDS: Record<string, string> = { ",": ",", ";": ";", tab: "\t", "\\t": "\t", "\t": "\t", "|": "|" };
const CANDIDATES = [",", ";", "\t", "|"];

/** The separator typed after --delimiter: , ; tab or |. */
export function parseDelimiter(text: string | undefined): string | undefined {
  if (text === undefined) return undefined;
  const d = DELIMITER_WORDS[text.trim().toLowerCase()] ?? DELIMITER_WORDS[text];
  if (d === undefined) throw new CliError(`--delimiter: give the column separator as , or ; or tab or | (got "${text}").`);
  return d;
}

export function parseDecimal(text: string | undefined): "." | "," | undefined {
  if (text === undefined) return undefined;
  const d = text.trim();
  if (d !== "." && d !== ",") throw new CliError(`--decimal: give the decimal mark as . or , (got "${text}").`);
  return d;
}

export function delimiterName(d: string): string {
  return d === "\t" ? "tab" : `"${d}"`;
}

/** Split one line on a separator outside double quotes (enough for a sample; the real parse is csv-parse's). */
function splitLine(line: string, delimiter: string): string[] {
  const cells: string[] = [];
  let cell = "";
  let quoted = false;
  for (let i = 0; i < line.length; i++) {
    const ch = line[i];
    if (ch === '"') quoted = !quoted;
    else if (ch === delimiter && !quoted) {
      cells.push(cell);
      cell = "";
    } else cell += ch;
  }
  cells.push(cell);
  return cells.map((c) => c.trim());
}

/** The first complete lines of a sample (the last may be cut off mid-way). */
function sampleLines(sample: string, complete: boolean): string[] {
  const lines = sample.replace(/^\uFEFF/, "").split(/\r?\n/);
  if (!complete) lines.pop();
  return lines.filter((l) => l.trim() !== "").slice(0, 50);
}

/**
 * The separator that splits every sample line into the same number of cells (more than one).
 * A one-column file has no separator: "," is as good as any. Undefined when no candidate fits.
 */
function detectDelimiter(lines: string[]): string | undefined {
  const fits = CANDIDATES.filter((d) => {
    const widths = lines.map((l) => splitLine(l, d).length);
    return widths[0] > 1 && widths.every((w) => w === widths[0]);
  });
  if (fits.length === 1) return fits[0];
  if (fits.length > 1) {
    // "1,5;2,5" splits evenly on both: the separator is the one the names row uses too and that gives more cells.
    return fits.sort((a, b) => splitLine(lines[0], b).length - splitLine(lines[0], a).length)[0];
  }
  // A names row without any separator: a file of one column.
  if (CANDIDATES.every((d) => !lines[0].includes(d))) return ",";
  // Short rows (trailing blanks left out) are common: take the separator that splits the names row most, if it splits every row.
  const loose = CANDIDATES.filter((d) => splitLine(lines[0], d).length > 1 && lines.every((l) => splitLine(l, d).length <= splitLine(lines[0], d).length));
  return loose.length === 1 ? loose[0] : undefined;
}

const POINT_NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;
const COMMA_NUMBER = /^[+-]?(\d+,?\d*|,\d+)([eE][+-]?\d+)?$/;
const COMMA_GROUPED = /^[+-]?\d{1,3}(\.\d{3})+(,\d*)?$/;
const POINT_GROUPED = /^[+-]?\d{1,3}(,\d{3})+(\.\d*)?$/;

/**
 * The decimal mark the cells of the sample use; undefined when they use both. "1,234" and
 * "1.234" could be either (a decimal or a digit group) and only decide when nothing else does.
 */
function detectDecimal(lines: string[], delimiter: string): "." | "," | undefined {
  if (delimiter === ",") return ".";
  const seen = { comma: 0, point: 0, maybeComma: 0, maybePoint: 0 };
  for (const line of lines.slice(1)) {
    for (const cell of splitLine(line, delimiter)) {
      const s = cell.replace(/^"|"$/g, "");
      if (/^[+-]?\d{1,3}[,]\d{3}$/.test(s)) seen.maybeComma++;
      else if (/^[+-]?\d{1,3}[.]\d{3}$/.test(s)) seen.maybePoint++;
      else if (COMMA_NUMBER.test(s) || COMMA_GROUPED.test(s)) seen.comma += /[,.]/.test(s) ? 1 : 0;
      else if (POINT_NUMBER.test(s) || POINT_GROUPED.test(s)) seen.point += /[,.]/.test(s) ? 1 : 0;
    }
  }
  const comma = seen.comma || (seen.point === 0 ? seen.maybeComma : 0);
  const point = seen.point || (seen.comma === 0 ? seen.maybePoint : 0);
  if (comma > 0 && point > 0) return undefined;
  return comma > 0 ? "," : ".";
}

/**
 * The dialect of a file from its first bytes, unless given. `complete` says the sample is the
 * whole file. Throws a CliError that says what to type when the sample does not tell.
 */
export function detectDialect(sample: string, complete: boolean, source: string, given: Partial<Dialect> = {}): Dialect {
  const lines = sampleLines(sample, complete);
  let delimiter = given.delimiter;
  if (delimiter === undefined) {
    delimiter = lines.length === 0 ? "," : detectDelimiter(lines);
    if (delimiter === undefined) {
      throw new CliError(
        `Cannot tell the column separator of ${source}: its first lines split into different numbers of cells on , ; tab and |. Give it with --delimiter (for example --delimiter ";").`,
      );
    }
  }
  let decimal = given.decimal;
  if (decimal === undefined) {
    decimal = detectDecimal(lines, delimiter);
    if (decimal === undefined) {
      throw new CliError(
        `Cannot tell the decimal mark of ${source}: its numbers use both "," and "." (such as 1,5 and 1.5). Give it with --decimal , or --decimal .`,
      );
    }
  }
  if (decimal === delimiter) throw new CliError(`The decimal mark and the column separator are both ${delimiterName(delimiter)}; give --delimiter ; with --decimal ,`);
  return { delimiter, decimal };
}

/**
 * A parser of number text in the dialect: plain decimal numbers, optionally with digit groups
 * (1.234,5 with a decimal comma; 1,234.5 with a decimal point when commas do not separate
 * columns). No hex, no "Infinity". Returns undefined for text that is not a number.
 */
export function numberReader(dialect: Dialect): (s: string) => number | undefined {
  if (dialect.decimal === ",") {
    return (s) => {
      if (COMMA_NUMBER.test(s)) return Number(s.replace(",", "."));
      if (COMMA_GROUPED.test(s)) return Number(s.replace(/\./g, "").replace(",", "."));
      return undefined;
    };
  }
  const grouped = dialect.delimiter !== ",";
  return (s) => {
    if (POINT_NUMBER.test(s)) return Number(s);
    if (grouped && POINT_GROUPED.test(s)) return Number(s.replace(/,/g, ""));
    return undefined;
  };
}
