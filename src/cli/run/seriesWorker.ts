/**
 * A batch worker thread: runs the series it is sent with the same code as the main thread
 * (commands/batch.ts runOne) and sends back their rendered text, batch by batch.
 */
import { parentPort, workerData } from "worker_threads";
import { runOne, type RunContext } from "../commands/batch";
import { findCommand } from "../commands";
import type { SeriesColumn } from "../input/seriesTable";

export interface WorkerSetup {
  command: string;
  run: RunContext;
}

export interface BatchRequest {
  id: number;
  columns: SeriesColumn[];
}

const setup = workerData as WorkerSetup;
const command = findCommand(setup.command);

parentPort!.on("message", (batch: BatchRequest) => {
  const results = batch.columns.map((column) => runOne(command, column, setup.run));
  parentPort!.postMessage({ id: batch.id, results });
});
