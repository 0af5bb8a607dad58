import { columnLetters } from "../../ledger/describe/addresses";
import { CliError } from "../cliError";
import { delimiterName, numberReader, type Dialect } from "./dialect";
import { isLabelHeader, looksLikePeriodNumbers } from "./periodLabels";

/** One series of the file: its name, its column (0-based) and its values, NaN for a blank cell, trailing blanks removed. */
export interface SeriesColumn {
  name: string;
  position: number;
  values: Float64Array;
  /** Why the series cannot run (a cell that is not a number); the other series still run. */
  problem?: string;
}

export interface LabelColumn {
  name: string;
  position: number;
  values: string[];
}

/** The file as read: every series column in file order, the label column if any, and notes for standard error. */
export interface SeriesTable {
  source: string;
  seriesCount: number;
  rows: number;
  labels?: LabelColumn;
  /** The k-th series (0-based, label column left out). */
  column(k: number): SeriesColumn;
  /** Warnings about the file (duplicate names, a column of period numbers taken as labels). */
  notes: string[];
  dialect: Dialect;
}

/** How the label column is chosen: a column name, "none", or undefined to recognise it. */
export interface LabelChoice {
  labels?: string;
}

/**
 * Collects the records of a CSV file as they are parsed: the cells as numbers in one growing
 * row-major Float64Array (8 bytes a cell, whatever the file's width), the text of the one
 * column that may be labels, and the first bad cell of each column.
 */
export class TableBuilder {
  private names: string[] = [];
  private width = 0;
  private rows = 0;
  private cells = new Float64Array(0);
  private labelCandidate = 0;
  private labelText: string[] = [];
  private bad = new Map<number, { line: number; text: string; more: number }>();
  private readNumber: (s: string) => number | undefined;

  constructor(
    private readonly source: string,
    private readonly dialect: Dialect,
    private readonly choice: LabelChoice,
  ) {
    this.readNumber = numberReader(dialect);
  }

  /** One parsed record; `line` is the line of the file it starts on. */
  add(record: string[], line: number): void {
    if (this.width === 0) {
      this.header(record);
      return;
    }
    for (let c = this.width; c < record.length; c++) {
      if (record[c] !== "") {
        throw new CliError(
          `Line ${line} of ${this.source} has more cells than the first row has names (${this.width}). Name every column in the first row, or remove the extra cells.${this.separatorHint()}`,
        );
      }
    }
    if ((this.rows + 1) * this.width > this.cells.length) this.grow();
    const base = this.rows * this.width;
    for (let c = 0; c < this.width; c++) {
      const s = record[c] ?? "";
      if (c === this.labelCandidate) this.labelText.push(s);
      if (s === "") {
        this.cells[base + c] = NaN;
        continue;
      }
      const v = this.readNumber(s);
      if (v === undefined || !Number.isFinite(v)) {
        this.cells[base + c] = NaN;
        const seen = this.bad.get(c);
        if (seen) seen.more++;
        else this.bad.set(c, { line, text: s, more: 0 });
      } else this.cells[base + c] = v;
    }
    this.rows++;
  }

  private header(record: string[]): void {
    if (record.every((h) => this.readNumber(h) !== undefined)) {
      throw new CliError(`The first row of ${this.source} holds numbers; it must hold the series names. Add a row of names at the top.`);
    }
    this.names = record.map((h, c) => (h === "" ? `column ${columnLetters(c)}` : h));
    this.width = record.length;
    this.labelCandidate = this.chosenLabelPosition() ?? 0;
  }

  /** The column named by --labels, or undefined when it is to be recognised (or "none"). */
  private chosenLabelPosition(): number | undefined {
    const wanted = this.choice.labels;
    if (wanted === undefined || wanted.trim().toLowerCase() === "none") return undefined;
    let at = this.names.indexOf(wanted);
    if (at < 0) at = this.names.findIndex((n) => n.trim().toLowerCase() === wanted.trim().toLowerCase());
    if (at < 0) {
      throw new CliError(`--labels: ${this.source} has no column named "${wanted}". Its columns are: ${this.names.slice(0, 12).map((n) => `"${n}"`).join(", ")}${this.names.length > 12 ? ", ..." : ""}.`);
    }
    return at;
  }

  private grow(): void {
    const next = new Float64Array(Math.max(this.width * 64, this.cells.length * 2));
    next.set(this.cells);
    this.cells = next;
  }

  finish(): SeriesTable {
    if (this.width === 0) throw new CliError(`${this.source} is empty: it needs a first row of series names and then one row per period.`);
    if (this.rows === 0) {
      throw new CliError(`${this.source} has the names row only, no periods: add one row per period below the names (oldest first).`);
    }
    const notes: string[] = [];
    const labelAt = this.labelPosition(notes);
    const positions: number[] = [];
    for (let c = 0; c < this.width; c++) if (c !== labelAt) positions.push(c);
    if (positions.length === 0) throw new CliError(`${this.source} has no series column: add one column of numbers per series.`);
    notes.push(...duplicateNotes(this.names, positions));
    const { names, width, rows, cells, source } = this;
    const bad = this.bad;
    const problemOf = (c: number): string | undefined => {
      const b = bad.get(c);
      return b && this.cellProblem(c, b);
    };
    return {
      source,
      seriesCount: positions.length,
      rows,
      notes,
      dialect: this.dialect,
      labels: labelAt === undefined ? undefined : { name: names[labelAt], position: labelAt, values: this.labelText },
      column(k) {
        const c = positions[k];
        let end = rows;
        while (end > 0 && Number.isNaN(cells[(end - 1) * width + c])) end--;
        const values = new Float64Array(end);
        for (let i = 0; i < end; i++) values[i] = cells[i * width + c];
        return { name: names[c], position: c, values, problem: problemOf(c) };
      },
    };
  }

  /** Where the labels are: the --labels column, or a recognised first column (with a note when it holds numbers). */
  private labelPosition(notes: string[]): number | undefined {
    const wanted = this.choice.labels;
    if (wanted !== undefined) return wanted.trim().toLowerCase() === "none" ? undefined : this.labelCandidate;
    if (this.width < 2 || this.labelCandidate !== 0) return undefined;
    const present = this.labelText.filter((s) => s !== "");
    if (present.length === 0) return undefined;
    const text = present.filter((s) => this.readNumber(s) === undefined).length;
    if (text * 2 > present.length) return 0;
    if (isLabelHeader(this.names[0]) || looksLikePeriodNumbers(this.labelText)) {
      notes.push(
        `the first column "${this.names[0]}" holds period labels (${present.slice(0, 2).join(", ")}, ...), not a series: it is not forecast. Give --labels none to forecast it as a series.`,
      );
      return 0;
    }
    return undefined;
  }

  private cellProblem(c: number, b: { line: number; text: string; more: number }): string {
    const more = b.more > 0 ? ` (${b.more} more cell${b.more === 1 ? "" : "s"} of this column ${b.more === 1 ? "is" : "are"} not numbers either)` : "";
    const mark = this.dialect.decimal;
    return (
      `Cell ${columnLetters(c)}${b.line} of ${this.source} (series "${this.names[c]}", line ${b.line}, column ${c + 1}): "${b.text}" is not a number${more}. ` +
      `Type a plain number such as ${mark === "," ? "1234,5" : "1234.5"} or leave the cell blank for a missing value.${this.hint(b.text)}`
    );
  }

  /** A names row of one cell that holds another separator: the file was split on the wrong one. */
  private separatorHint(): string {
    if (this.width !== 1) return "";
    const other = [";", "\t", "|", ","].find((d) => d !== this.dialect.delimiter && this.names[0].includes(d));
    return other ? ` The names row holds ${delimiterName(other)}: give --delimiter ${other === "\t" ? "tab" : other}.` : "";
  }

  /** A cell that holds another separator or the other decimal mark: say which option reads it. */
  private hint(text: string): string {
    const other = [",", ";", "\t", "|"].find((d) => d !== this.dialect.delimiter && text.includes(d) && text.split(d).length > 2);
    if (other) return ` The file seems to separate columns with ${delimiterName(other)}, not ${delimiterName(this.dialect.delimiter)}: give --delimiter ${other === "\t" ? "tab" : other}.`;
    const otherMark = this.dialect.decimal === "." ? "," : ".";
    if (numberReader({ delimiter: ";", decimal: otherMark })(text) !== undefined) {
      return ` If the file writes decimals with "${otherMark}", give --decimal ${otherMark}.`;
    }
    return "";
  }
}

/** One note per name used by more than one series column. */
function duplicateNotes(names: string[], positions: number[]): string[] {
  const byName = new Map<string, number[]>();
  for (const c of positions) byName.set(names[c], [...(byName.get(names[c]) ?? []), c]);
  const notes: string[] = [];
  for (const [name, cols] of byName) {
    if (cols.length < 2) continue;
    notes.push(
      `columns ${cols.map(columnLetters).join(", ")} are all named "${name}": their results carry the same name and are told apart only by their order. Rename them in the first row.`,
    );
  }
  return notes;
}
