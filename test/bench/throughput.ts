/**
 * Engine throughput (one-step updates per second) against the bare-loop limit, measured in
 * the same run on the same series, start states and constants: the engine's fitting
 * objective (sumSquaredErrors) and full state run (runRecursion), a plain JavaScript loop,
 * and a plain C loop compiled with the machine's `cc -O2`. Each is timed by its process's CPU
 * clock, so that other work sharing the machine is not counted; the loops take turns trial by
 * trial so that what remains of such load (caches, clock speed) falls on all alike; each keeps
 * its best trial.
 */
import { spawnSync } from "child_process";
import { mkdtempSync, rmSync, writeFileSync } from "fs";
import { tmpdir } from "os";
import { join } from "path";
import { decompositionStart, RecursionWorkspace, runRecursion, sumSquaredErrors, type State } from "../../src/engine";
import { bareLoopSse } from "./bareLoop";
import type { M3Series } from "./m3";
import { now } from "./timing";

const ALPHA = 0.3;
const BETA = 0.1;
const GAMMA = 0.2;

export interface ThroughputRow {
  name: string;
  /** Updates per second (best trial), or undefined when skipped. */
  rate?: number;
  /** Summed SSE of one pass: equal across loops when they do the same arithmetic. */
  checksum?: number;
  note?: string;
}

export interface ThroughputResult {
  series: number;
  updatesPerPass: number;
  rows: ThroughputRow[];
  compiler?: string;
  /** Mean time of one engine objective evaluation over one series (one pass / series). */
  secondsPerEvaluation: number;
}

interface Case {
  y: Float64Array;
  p: number;
  state: State;
  first: number;
}

/** One loop under test: a trial returns the best seconds per pass it saw. */
interface Contender {
  row: ThroughputRow;
  trial?: () => number;
  best: number;
}

/** Process CPU time in seconds (user + system), so other work on the machine is not counted. */
function cpuSeconds(): number {
  const u = process.cpuUsage();
  return (u.user + u.system) / 1e6;
}

/** CPU seconds per pass of `pass` over a trial of at least `seconds` of wall time. */
function jsTrial(pass: () => number, seconds: number): number {
  let passes = 0;
  let sink = 0;
  const w0 = now();
  const c0 = cpuSeconds();
  do {
    sink += pass();
    passes++;
  } while (now() - w0 < seconds);
  const perPass = (cpuSeconds() - c0) / passes;
  if (sink === -1) console.log(sink); // keeps the passes observable
  return perPass;
}

function jsContender(name: string, pass: () => number, seconds: number): Contender {
  const checksum = pass(); // also warms up the JIT
  return { row: { name, checksum }, trial: () => jsTrial(pass, seconds), best: Infinity };
}

export function measureThroughput(monthly: M3Series[], seconds: number, trials: number): ThroughputResult {
  const cases: Case[] = monthly.map((s) => {
    const start = decompositionStart(s.train, s.period, "multiplicative", "linear");
    return { y: s.train, p: s.period, state: start.state, first: start.firstUpdate };
  });
  const updatesPerPass = cases.reduce((sum, c) => sum + c.y.length - c.first, 0);
  const ws = new RecursionWorkspace(12);
  const constants = { alpha: ALPHA, beta: BETA, gamma: GAMMA, phi: 1 };
  const ring = new Float64Array(12);
  const dir = mkdtempSync(join(tmpdir(), "ebb-bench-"));
  try {
    const c = prepareCLoop(cases, dir, seconds);
    const contenders: Contender[] = [
      jsContender("engine fitting objective (sumSquaredErrors)", () => {
        let total = 0;
        for (const k of cases) total += sumSquaredErrors(k.y, k.state, k.first, k.p, "multiplicative", "linear", ALPHA, BETA, GAMMA, 1, ws);
        return total;
      }, seconds),
      jsContender("engine state table (runRecursion)", () => {
        let total = 0;
        for (const k of cases) total += runRecursion(k.y, k.state, k.first, k.p, "multiplicative", "linear", constants).sse;
        return total;
      }, seconds),
      jsContender("bare loop, JavaScript Float64Array", () => {
        let total = 0;
        for (const k of cases) total += bareLoopSse(k.y, k.state.level, k.state.trend, k.state.indices, k.first, k.p, ALPHA, BETA, GAMMA, ring);
        return total;
      }, seconds),
      c,
    ];
    for (let trial = 0; trial < trials; trial++) {
      for (const k of contenders) if (k.trial) k.best = Math.min(k.best, k.trial());
    }
    const rows = contenders.map((k) => (Number.isFinite(k.best) ? { ...k.row, rate: updatesPerPass / k.best } : k.row));
    return { series: cases.length, updatesPerPass, rows, compiler: c.compiler, secondsPerEvaluation: contenders[0].best / cases.length };
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

/** Compile bare-loop.c with `cc -O2` in `dir`; each trial runs it once on the same cases. */
function prepareCLoop(cases: Case[], dir: string, seconds: number): Contender & { compiler?: string } {
  const name = "bare loop, C (cc -O2)";
  const skipped = (note: string, compiler?: string) => ({ row: { name, note: `skipped: ${note}` }, best: Infinity, compiler });
  const version = spawnSync("cc", ["--version"], { encoding: "utf8" });
  if (version.error || version.status !== 0) return skipped("no C compiler (cc) on this machine");
  const compiler = version.stdout.split("\n")[0].trim();
  const exe = join(dir, "bare-loop");
  const build = spawnSync("cc", ["-O2", "-o", exe, join(__dirname, "bare-loop.c")], { encoding: "utf8" });
  if (build.status !== 0) return skipped(`cc failed: ${build.stderr.trim().split("\n")[0]}`, compiler);
  const lines = [`${cases.length} ${ALPHA} ${BETA} ${GAMMA}`];
  for (const k of cases) {
    lines.push(`${k.y.length} ${k.p} ${k.first} ${k.state.level} ${k.state.trend}`);
    lines.push(Array.from(k.state.indices, String).join(" "));
    lines.push(Array.from(k.y, String).join(" "));
  }
  const input = join(dir, "cases.txt");
  writeFileSync(input, lines.join("\n") + "\n"); // String(x) round-trips every double exactly
  const row: ThroughputRow = { name };
  const trial = (): number => {
    const run = spawnSync(exe, [input, String(seconds), "1"], { encoding: "utf8" });
    if (run.status !== 0) throw new Error(`the C loop failed: ${run.stderr.trim()}`);
    const [, perPass, checksum] = run.stdout.trim().split(/\s+/).map(Number);
    row.checksum = checksum;
    return perPass;
  };
  return { row, trial, best: Infinity, compiler };
}
