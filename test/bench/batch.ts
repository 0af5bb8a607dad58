/**
 * The batch command on large files (issue: "the batch command uses every core"): series per
 * second on one core (--workers 1) and on every core, and peak resident memory at 10,000 and at
 * 100,000 series of 120 months, so the growth with the file can be read off. The command runs as
 * a user runs it (node bin/ebb.js, a child process); its peak memory is the kernel's high-water
 * mark (VmHWM in /proc/PID/status, Linux), read until it exits. The files are invented:
 * seeded seasonal series with trend and noise, written to a temporary folder.
 */
import { spawn } from "child_process";
import { createWriteStream, mkdtempSync, readFileSync, rmSync } from "fs";
import { availableParallelism, loadavg, tmpdir } from "os";
import { join, resolve } from "path";
import type { Progress } from "./progress";
import { now } from "./timing";

const REPO = resolve(__dirname, "..", "..");
const MONTHS = 120;

export interface BatchRun {
  series: number;
  workers: number;
  seconds: number;
  seriesPerSecond: number;
  peakRssBytes?: number;
  status: number | null;
}

export interface BatchBench {
  cores: number;
  /** The machine's one-minute load average before and after (other work shares the cores). */
  load: [number, number];
  runs: { label: string; run: BatchRun }[];
  note?: string;
}

/** A seeded linear congruential generator (Numerical Recipes constants): the same file every run. */
function lcg(seed: number): () => number {
  let s = seed >>> 0;
  return () => {
    s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
    return s / 4294967296;
  };
}

/** Write `series` invented monthly series of 120 months, one per column, a month label first. */
async function writeFile(path: string, series: number): Promise<void> {
  const random = lcg(20260101 + series);
  const base = Array.from({ length: series }, () => 50 + 950 * random());
  const phase = Array.from({ length: series }, () => Math.floor(12 * random()));
  const growth = Array.from({ length: series }, () => (random() - 0.3) * 0.004);
  const out = createWriteStream(path);
  const write = (text: string) => new Promise<void>((res) => (out.write(text) ? res() : out.once("drain", () => res())));
  await write("month," + Array.from({ length: series }, (_, k) => `item ${k + 1}`).join(",") + "\n");
  for (let t = 0; t < MONTHS; t++) {
    const cells = new Array<string>(series);
    for (let k = 0; k < series; k++) {
      const season = 1 + 0.35 * Math.sin((2 * Math.PI * (t + phase[k])) / 12);
      cells[k] = (base[k] * (1 + growth[k] * t) * season * (0.92 + 0.16 * random())).toFixed(1);
    }
    await write(`${2015 + Math.floor(t / 12)}-${String((t % 12) + 1).padStart(2, "0")},${cells.join(",")}\n`);
  }
  await new Promise<void>((res) => out.end(() => res()));
}

function highWaterMark(pid: number): number | undefined {
  try {
    const m = /VmHWM:\s+(\d+) kB/.exec(readFileSync(`/proc/${pid}/status`, "utf8"));
    return m ? Number(m[1]) * 1024 : undefined;
  } catch {
    return undefined;
  }
}

/** `ebb fit FILE --period 12 --format csv` to a file, timed, with its peak memory. */
function runFit(file: string, series: number, workers: number, out: string): Promise<BatchRun> {
  return new Promise((res, rej) => {
    const started = now();
    const child = spawn(process.execPath, [join(REPO, "bin", "ebb.js"), "fit", file, "--period", "12", "--format", "csv", "--workers", String(workers), "--out", out, "--force"], {
      stdio: ["ignore", "ignore", "pipe"],
    });
    let peak: number | undefined;
    let stderr = "";
    child.stderr.on("data", (d) => (stderr += String(d)));
    const poll = setInterval(() => {
      const hwm = highWaterMark(child.pid!);
      if (hwm !== undefined) peak = Math.max(peak ?? 0, hwm);
    }, 50);
    child.on("error", rej);
    child.on("exit", (status) => {
      clearInterval(poll);
      const seconds = now() - started;
      if (status !== 0) return rej(new Error(`ebb fit exited with ${status}: ${stderr.slice(0, 500)}`));
      res({ series, workers, seconds, seriesPerSecond: series / seconds, peakRssBytes: peak, status });
    });
  });
}

/**
 * Quick mode: 1,000 series for speed and memory, 5,000 for memory. Full: 10,000 and 100,000
 * (about six minutes of two cores). One core and every core take turns twice on the same file
 * and each keeps its faster run, so load from other work on the machine falls on both alike.
 */
export async function batchBenchmark(quick: boolean, progress: Progress): Promise<BatchBench> {
  const cores = availableParallelism();
  const dir = mkdtempSync(join(tmpdir(), "ebb-bench-batch-"));
  const [small, large] = quick ? [1000, 5000] : [10000, 100000];
  const runs: BatchBench["runs"] = [];
  const loadBefore = loadavg()[0];
  const fit = async (file: string, series: number, workers: number) => {
    progress.note(`batch command: fit ${series.toLocaleString("en-US")} series, ${workers} worker${workers === 1 ? "" : "s"}`);
    return runFit(file, series, workers, join(dir, "out.csv"));
  };
  const faster = (a: BatchRun, b: BatchRun) => (a.seconds <= b.seconds ? a : b);
  try {
    const smallFile = join(dir, `items-${small}.csv`);
    progress.note(`batch command: writing ${small.toLocaleString("en-US")} invented series of ${MONTHS} months`);
    await writeFile(smallFile, small);
    let one = await fit(smallFile, small, 1);
    let all = await fit(smallFile, small, cores);
    one = faster(one, await fit(smallFile, small, 1));
    all = faster(all, await fit(smallFile, small, cores));
    runs.push({ label: "one core", run: one }, { label: "every core", run: all });
    rmSync(smallFile);
    const largeFile = join(dir, `items-${large}.csv`);
    progress.note(`batch command: writing ${large.toLocaleString("en-US")} invented series of ${MONTHS} months`);
    await writeFile(largeFile, large);
    runs.push({ label: "every core", run: await fit(largeFile, large, cores) });
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
  const note = process.platform === "linux" ? undefined : "peak memory is read from /proc (Linux only)";
  return { cores, load: [loadBefore, loadavg()[0]], runs, note };
}

const mb = (b?: number) => (b === undefined ? "n/a" : `${(b / 1024 / 1024).toFixed(0)} MB`);

export function renderBatchSection(b: BatchBench): string {
  const rows = b.runs.map(
    ({ label, run }) =>
      `| ${label} | ${run.series.toLocaleString("en-US")} | ${run.workers} | ${run.seconds.toFixed(1)} | ${Math.round(run.seriesPerSecond).toLocaleString("en-US")} | ${mb(run.peakRssBytes)} |`,
  );
  const [one, all, large] = b.runs;
  const small = all;
  const perSeries =
    small.run.peakRssBytes !== undefined && large.run.peakRssBytes !== undefined
      ? (large.run.peakRssBytes - small.run.peakRssBytes) / (large.run.series - small.run.series)
      : undefined;
  return [
    "## Batch command on large files",
    "",
    `\`ebb fit FILE --period 12 --format csv --out ...\` (multiplicative seasonality, linear trend, every constant fitted) on invented files of monthly series (120 months each), run as a child process on this machine's ${b.cores} cores.`,
    "Series per second include starting the program and reading the file; peak memory is the process's resident high-water mark.",
    `One-minute load average ${b.load[0].toFixed(1)} before and ${b.load[1].toFixed(1)} after (above ${b.cores} means other work was sharing the cores and the times are longer than on an idle machine).`,
    "",
    "| run | series | workers | seconds | series/s | peak memory |",
    "| --- | ---: | ---: | ---: | ---: | ---: |",
    ...rows,
    "",
    `Every core against one: ${(all.run.seriesPerSecond / one.run.seriesPerSecond).toFixed(2)}x the series per second on ${b.cores} cores, each the faster of two runs taken in turns (worker threads start in about half a second each, so small files gain less; on a shared machine this is a lower bound).`,
    perSeries === undefined
      ? ""
      : `Memory grows by ${(perSeries / 1024).toFixed(1)} KB per series between ${small.run.series.toLocaleString("en-US")} and ${large.run.series.toLocaleString("en-US")} series: the input held as numbers (${MONTHS} x 8 bytes = ${((MONTHS * 8) / 1024).toFixed(1)} KB a series), its name and the heap's own slack; results are written as they are done and never collected, so memory does not grow with the output.`,
    b.note ?? "",
  ]
    .filter((l, i, all) => l !== "" || all[i - 1] !== "")
    .join("\n");
}
