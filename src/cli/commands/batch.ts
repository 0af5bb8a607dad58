import { EbbError } from "../../engine";
import { CliError } from "../cliError";
import type { RunSettings } from "../options";
import { emit, toCsv, toJson } from "../output";
import { progressReporter } from "../progress";
import { parseSeriesCsv, readInputText, type SeriesColumn } from "../readCsv";

/** One entry of `{"series": [...]}`: the series name, then either the command's fields or `error`. */
export interface SeriesEntry {
  name: string;
  error?: string;
  [field: string]: unknown;
}

/** What a batch command (fit, states, ahead, backtest) adds to the shared run. */
export interface BatchCommand {
  /** The fields of one series' entry. May throw an EbbError: the series then carries `error`. */
  runSeries(column: SeriesColumn, settings: RunSettings): Record<string, unknown>;
  /** Columns of the --format csv table; "series" first, "message" last (the failure text). */
  csvColumns: readonly string[];
  /** Rows of the csv table for one successful series. */
  csvRows(entry: SeriesEntry): Record<string, unknown>[];
  /** Top-level fields beside "series" (the backtest's overall scores). */
  summarize?(entries: SeriesEntry[]): Record<string, unknown>;
}

/** Most failure lines printed on standard error; the rest are counted (all are in the output). */
const WARNING_LINES = 20;

/** Run a command over every series of a CSV file and write the result. Returns the exit status. */
export function runBatch(command: BatchCommand, file: string, settings: RunSettings): number {
  const source = file === "-" ? "standard input" : file;
  const { columns } = parseSeriesCsv(readInputText(file), source);
  const entries = runAll(command, columns, settings);
  const doc = { series: entries, ...(command.summarize ? command.summarize(entries) : {}) };
  emit(settings.format === "csv" ? csvText(command, entries) : toJson(doc), settings.out);
  return reportFailures(entries);
}

function runAll(command: BatchCommand, columns: SeriesColumn[], settings: RunSettings): SeriesEntry[] {
  const tick = progressReporter(columns.length, settings.progress);
  return columns.map((column, i) => {
    tick(i + 1);
    try {
      return { name: column.name, ...command.runSeries(column, settings) };
    } catch (e) {
      return { name: column.name, error: failureText(e) };
    }
  });
}

/** An engine error's message is written for the user; anything else is a defect, said so plainly. */
function failureText(e: unknown): string {
  if (e instanceof EbbError || e instanceof CliError) return e.message;
  return `Internal error, please report it: ${e instanceof Error ? e.message : String(e)}`;
}

function csvText(command: BatchCommand, entries: SeriesEntry[]): string {
  const rows: Record<string, unknown>[] = [];
  for (const entry of entries) {
    if (entry.error !== undefined) rows.push({ series: entry.name, message: entry.error });
    else for (const row of command.csvRows(entry)) rows.push({ series: entry.name, ...row });
  }
  return toCsv(command.csvColumns, rows);
}

/** Warn on standard error about failed series; exit status 1 only when no series ran at all. */
function reportFailures(entries: SeriesEntry[]): number {
  const failed = entries.filter((e) => e.error !== undefined);
  failed.slice(0, WARNING_LINES).forEach((e) => process.stderr.write(`ebb: warning: series "${e.name}" failed: ${e.error}\n`));
  if (failed.length > WARNING_LINES) {
    process.stderr.write(`ebb: warning: ${failed.length - WARNING_LINES} more series failed; see their "error" fields.\n`);
  }
  if (failed.length > 0 && failed.length === entries.length) {
    process.stderr.write(`ebb: no series could be run.\n`);
    return 1;
  }
  return 0;
}
