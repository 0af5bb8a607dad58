import type { Command } from "commander";
import { EbbError } from "../../engine";
import { CliError } from "../cliError";
import type { SeriesColumn } from "../input/seriesTable";
import type { OptionGroup, RunSettings } from "../options";
import { csvLine, jsonText } from "../output";

/** One entry of `{"series": [...]}`: the series name, then either the command's fields or `error`. */
export interface SeriesEntry {
  name: string;
  error?: string;
  [field: string]: unknown;
}

/** What a series is run with: the settings, and the file's period labels when it has a label column. */
export interface RunContext {
  settings: RunSettings;
  labels?: readonly string[];
}

/**
 * A batch command (fit, states, ahead, backtest, ...): its name and help, what it adds to the
 * shared run, and how its results are written. A new command is one file exporting one of
 * these, listed in commands/index.ts; main.ts and the worker threads find it there.
 */
export interface BatchCommand {
  name: string;
  /** One line for the program's command list. */
  summary: string;
  /** Text shown after the option list of `<command> --help`. */
  help: string;
  /** Shared options the command takes beyond the model options. */
  options: OptionGroup[];
  /** Options of its own: added to the command line, and read into `settings.extra` (plain data: it goes to worker threads). */
  addOptions?(cmd: Command): void;
  readOptions?(raw: Record<string, unknown>): Record<string, unknown>;
  /** The fields of one series' entry. May throw an EbbError: the series then carries `error`. */
  runSeries(column: SeriesColumn, run: RunContext): Record<string, unknown>;
  /** Columns of the --format csv table; "series" first, "message" last; "label" is left out when the file has no labels. */
  csvColumns: readonly string[];
  /** Rows of the csv table for one successful series. */
  csvRows(entry: SeriesEntry): Record<string, unknown>[];
  /** A small record per entry (failed ones too) for `summarize`, kept instead of the entries. */
  digest?(entry: SeriesEntry): unknown;
  /** Top-level fields written after "series" (the backtest's overall scores). */
  summarize?(digests: unknown[]): Record<string, unknown>;
  /** A line printed on standard error after every run (a caution). */
  closingNote?: string;
}

/** One series run and written: its text in the chosen format, its digest, and its failure if any. */
export interface SeriesResult {
  name: string;
  text: string;
  digest?: unknown;
  error?: string;
}

/** The csv columns for this file: "label" only when it has a label column. */
export function csvColumnsFor(command: BatchCommand, labelled: boolean): readonly string[] {
  return labelled ? command.csvColumns : command.csvColumns.filter((c) => c !== "label");
}

/** Run one series and render it; a failure becomes the entry's `error`, never an exception. */
export function runOne(command: BatchCommand, column: SeriesColumn, run: RunContext): SeriesResult {
  let entry: SeriesEntry;
  try {
    if (column.problem !== undefined) throw new CliError(column.problem);
    entry = { name: column.name, ...command.runSeries(column, run) };
  } catch (e) {
    entry = { name: column.name, error: failureText(e) };
  }
  const digest = command.digest?.(entry);
  if (run.settings.format === "json") return { name: entry.name, text: `    ${jsonText(entry, "    ")}`, digest, error: entry.error };
  const columns = csvColumnsFor(command, run.labels !== undefined);
  const rows = entry.error !== undefined ? [{ series: entry.name, message: entry.error }] : command.csvRows(entry).map((row) => ({ series: entry.name, ...row }));
  return { name: entry.name, text: rows.map((row) => csvLine(columns, row)).join(""), digest, error: entry.error };
}

/** An engine error's message is written for the user; anything else is a defect, said so plainly. */
function failureText(e: unknown): string {
  if (e instanceof EbbError || e instanceof CliError) return e.message;
  return `Internal error, please report it: ${e instanceof Error ? e.message : String(e)}`;
}
