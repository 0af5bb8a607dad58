import { join } from "path";
import { Worker } from "worker_threads";
import { CliError } from "../cliError";
import type { BatchCommand, RunContext, SeriesResult } from "../commands/batch";
import type { SeriesTable } from "../input/seriesTable";
import type { BatchRequest, WorkerSetup } from "./seriesWorker";

const ENTRY = join(__dirname, "workerEntry.js");

/** Batches each worker holds at once: one running, one waiting, so no worker idles between messages. */
const PER_WORKER = 2;

/**
 * Series per batch: about 20,000 cells, so a batch takes tens of milliseconds and the tail is
 * short, and at least eight batches per worker, so a small file is shared out too.
 */
export function seriesPerBatch(rows: number, series: number, workers: number): number {
  const bySize = Math.min(200, Math.max(1, Math.round(20000 / Math.max(1, rows))));
  return Math.max(1, Math.min(bySize, Math.ceil(series / (workers * 8))));
}

/**
 * The results of every series in file order, computed by `count` worker threads. Batches are
 * handed out only a few ahead of the one being written, so finished results waiting for an
 * earlier batch stay few: memory does not grow with the number of series.
 */
export async function* pooledResults(command: BatchCommand, table: SeriesTable, run: RunContext, count: number): AsyncGenerator<SeriesResult> {
  const size = seriesPerBatch(table.rows, table.seriesCount, count);
  const batches = Math.ceil(table.seriesCount / size);
  const window = count * PER_WORKER * 2;
  const setup: WorkerSetup = { command: command.name, run };
  const workers = Array.from({ length: Math.min(count, batches) }, () => new Worker(ENTRY, { workerData: setup }));
  const inFlight = new Map<Worker, number>(workers.map((w) => [w, 0]));
  const finished = new Map<number, SeriesResult[]>();
  let next = 0;
  let head = 0;
  let failure: Error | undefined;
  let wake: (() => void) | undefined;
  const signal = () => {
    const w = wake;
    wake = undefined;
    w?.();
  };
  const pump = () => {
    for (const w of workers) {
      while (inFlight.get(w)! < PER_WORKER && next < batches && next - head < window) {
        const id = next++;
        const columns = [];
        for (let k = id * size; k < Math.min(table.seriesCount, (id + 1) * size); k++) columns.push(table.column(k));
        const request: BatchRequest = { id, columns };
        w.postMessage(request, columns.map((c) => c.values.buffer as ArrayBuffer));
        inFlight.set(w, inFlight.get(w)! + 1);
      }
    }
  };
  for (const w of workers) {
    w.on("message", (m: { id: number; results: SeriesResult[] }) => {
      finished.set(m.id, m.results);
      inFlight.set(w, inFlight.get(w)! - 1);
      pump();
      signal();
    });
    w.on("error", (e) => {
      failure = failure ?? new CliError(`A worker thread failed (${e.message.split("\n")[0]}). Run again with --workers 1 to use the main thread only, and please report it.`);
      signal();
    });
  }
  try {
    pump();
    for (head = 0; head < batches; head++) {
      while (!finished.has(head)) {
        if (failure) throw failure;
        await new Promise<void>((res) => (wake = res));
      }
      const results = finished.get(head)!;
      finished.delete(head);
      pump();
      for (const r of results) yield r;
    }
  } finally {
    await Promise.all(workers.map((w) => w.terminate()));
  }
}
