import { availableParallelism } from "os";
import { csvColumnsFor, runOne, type BatchCommand, type RunContext, type SeriesResult } from "../commands/batch";
import { readSeriesTable } from "../input/readSeries";
import type { SeriesTable } from "../input/seriesTable";
import type { RunSettings } from "../options";
import { csvHeader, jsonText } from "../output";
import { checkOutPath } from "../output/outputFile";
import { openSink } from "../output/textSink";
import { progressReporter } from "../progress";
import { pooledResults } from "./workerPool";

/** Series count from which a file is split over worker threads when --workers is left out. */
export const WORKER_THRESHOLD = 500;

/** Most failure lines printed on standard error; the rest are counted (all are in the output). */
const WARNING_LINES = 20;

/** Exit status when some series failed and the others were written. */
export const SOME_FAILED = 2;

/** Print notes about the file on standard error. */
export function printNotes(table: SeriesTable): void {
  for (const note of table.notes) process.stderr.write(`ebb: warning: ${note}\n`);
}

/**
 * Run a command over every series of a CSV file, writing each result as soon as it and all
 * before it are done. Returns the exit status: 0 when every series ran, 2 when some failed
 * (their entries say why), 1 when none could run.
 */
export async function runBatch(command: BatchCommand, file: string, settings: RunSettings): Promise<number> {
  if (settings.out !== undefined) checkOutPath(settings.out, file, settings.force);
  const table = await readSeriesTable(file, settings.read);
  printNotes(table);
  const run: RunContext = { settings, labels: table.labels?.values };
  const workers = settings.workers ?? (table.seriesCount >= WORKER_THRESHOLD ? availableParallelism() : 1);
  const results = workers > 1 ? pooledResults(command, table, run, workers) : inlineResults(command, table, run);
  const sink = openSink(settings.out);
  const tick = progressReporter(table.seriesCount, settings.progress);
  const failed: SeriesResult[] = [];
  let failedCount = 0;
  const digests: unknown[] = [];
  try {
    const json = settings.format === "json";
    await sink.write(json ? '{\n  "series": [\n' : csvHeader(csvColumnsFor(command, run.labels !== undefined)));
    let k = 0;
    for await (const r of results) {
      await sink.write(json && k > 0 ? `,\n${r.text}` : r.text);
      if (command.digest) digests.push(r.digest);
      if (r.error !== undefined && failedCount++ < WARNING_LINES) failed.push(r);
      tick(++k);
    }
    if (json) {
      const summary = command.summarize ? command.summarize(digests) : {};
      const tail = Object.entries(summary).map(([key, value]) => `,\n  ${JSON.stringify(key)}: ${jsonText(value, "  ")}`);
      await sink.write(`\n  ]${tail.join("")}\n}\n`);
    }
    await sink.close();
  } catch (e) {
    sink.abort();
    throw e;
  } finally {
    await results.return(undefined);
  }
  const status = reportFailures(failed, failedCount, table.seriesCount);
  if (command.closingNote) process.stderr.write(`ebb: ${command.closingNote}\n`);
  return status;
}

async function* inlineResults(command: BatchCommand, table: SeriesTable, run: RunContext): AsyncGenerator<SeriesResult> {
  for (let k = 0; k < table.seriesCount; k++) yield runOne(command, table.column(k), run);
}

/** Warn on standard error about failed series, and say in the exit status that some failed. */
function reportFailures(shown: SeriesResult[], failed: number, total: number): number {
  for (const r of shown) process.stderr.write(`ebb: warning: series "${r.name}" failed: ${r.error}\n`);
  if (failed > shown.length) process.stderr.write(`ebb: warning: ${failed - shown.length} more series failed; see their "error" fields.\n`);
  if (failed === 0) return 0;
  if (failed === total) {
    process.stderr.write(`ebb: no series could be run.\n`);
    return 1;
  }
  process.stderr.write(`ebb: ${failed} of ${total} series failed; the other ${total - failed} were written (exit status ${SOME_FAILED}).\n`);
  return SOME_FAILED;
}
