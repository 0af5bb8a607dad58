/**
 * Ebb's benchmark: speed and accuracy on the M3 competition data, side by side with the
 * bare-loop limit and (with --references) base R and statsmodels, in one run.
 *
 *   npm run bench                      full run, writes test/bench/RESULTS.md
 *   npm run bench -- --quick           ~60 monthly + 40 quarterly series, under a minute (CI)
 *   npm run bench -- --references      also runs base R HoltWinters and statsmodels
 *   npm run bench -- --out FILE        write the markdown to FILE instead
 *   npm run bench -- --only a,b        only the named sections (core, order, batch, ...)
 *
 * The table goes to standard output, progress to standard error.
 */
import { writeFileSync } from "fs";
import { loadavg } from "os";
import { join } from "path";
import { CLASSIC, runAccuracy } from "./accuracy";
import { measureAhead } from "./ahead";
import { describeCode, describeMachine } from "./machine";
import { evenSample, loadM3 } from "./m3";
import { Progress } from "./progress";
import { compareSse, scoreForecastPackage, scoreReference } from "./referenceScoring";
import { runForecastPackage, runReferences } from "./references";
import { renderReport } from "./report";
import type { BenchResult } from "./result";
import { CoverageTally, Scoreboard } from "./scoring";
import { CORE, SECTIONS, type SectionContext } from "./sections";
import { measureThroughput } from "./throughput";
import { MemoryWatch, now } from "./timing";
import { measureWorkbook } from "./workbook";

const USAGE = `Usage: npm run bench -- [--quick] [--references] [--out FILE] [--only NAMES]
  --quick        a small sample (60 monthly + 40 quarterly series), under a minute; writes no file unless --out
  --references   also run base R stats::HoltWinters (/usr/bin/Rscript), statsmodels (/usr/bin/python3) and
                 R's forecast package (ets, thetaf; ~20 min on M3, cached under test/bench/references/cache)
  --out FILE     where to write the markdown (default test/bench/RESULTS.md for a full run of every section)
  --only NAMES   comma-separated sections to run: ${[CORE, ...SECTIONS.map((s) => s.name)].join(", ")}; writes no file unless --out`;

interface Args {
  quick: boolean;
  references: boolean;
  out?: string;
  only?: Set<string>;
}

function parseArgs(argv: string[]): Args {
  const args: Args = { quick: false, references: false };
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i];
    if (a === "--quick") args.quick = true;
    else if (a === "--references") args.references = true;
    else if (a === "--out" && i + 1 < argv.length) args.out = argv[++i];
    else if (a === "--only" && i + 1 < argv.length) args.only = new Set(argv[++i].split(",").map((w) => w.trim()));
    else if (a === "--help" || a === "-h") {
      console.log(USAGE);
      process.exit(0);
    } else {
      console.error(`Unknown option "${a}".\n${USAGE}`);
      process.exit(2);
    }
  }
  const known = new Set([CORE, ...SECTIONS.map((s) => s.name)]);
  for (const name of args.only ?? []) {
    if (!known.has(name)) {
      console.error(`Unknown section "${name}" after --only; the sections are ${[...known].join(", ")}.`);
      process.exit(2);
    }
  }
  if (!args.quick && !args.only && !args.out) args.out = join(__dirname, "RESULTS.md");
  return args;
}

async function main(): Promise<void> {
  const args = parseArgs(process.argv.slice(2));
  const progress = new Progress();
  const allMonthly = loadM3("monthly");
  const allQuarterly = loadM3("quarterly");
  const ctx: SectionContext = {
    quick: args.quick,
    references: args.references,
    monthly: args.quick ? evenSample(allMonthly, 60) : allMonthly,
    quarterly: args.quick ? evenSample(allQuarterly, 40) : allQuarterly,
    allMonthly,
    allQuarterly,
    progress,
  };
  const wanted = (name: string) => !args.only || args.only.has(name);
  const parts: string[] = [];
  if (wanted(CORE)) parts.push(await runCore(args, ctx));
  // Sections marked last start child processes, so they run after every in-process timing.
  for (const section of [...SECTIONS.filter((s) => !s.last), ...SECTIONS.filter((s) => s.last)]) {
    if (!wanted(section.name)) continue;
    progress.note(`section: ${section.name}`);
    parts.push(await section.run(ctx));
  }
  const report = parts.join("\n\n") + "\n";
  process.stdout.write(report);
  if (args.out) {
    writeFileSync(args.out, report);
    progress.note(`wrote ${args.out}`);
  }
}

/** Throughput, fit speed, the functions layer, the workbook, accuracy and coverage, with references. */
async function runCore(args: Args, ctx: SectionContext): Promise<string> {
  const started = now();
  const loadAtStart = loadavg()[0];
  const { progress, allMonthly, monthly, quarterly } = ctx;
  const memory = new MemoryWatch();
  const series = [...monthly, ...quarterly];

  progress.note(`throughput: engine vs bare loops (${monthly.length} monthly series)`);
  const throughput = measureThroughput(monthly, args.quick ? 0.15 : 0.5, args.quick ? 3 : 9);
  memory.sample();

  const board = new Scoreboard();
  const coverage = new CoverageTally();
  const accuracy = runAccuracy(series, board, coverage, progress, memory);

  progress.note("functions layer: one AHEAD call over 1000 series x 120 periods");
  const ahead = await measureAhead(allMonthly);
  memory.sample();

  const workbook = measureWorkbook(allMonthly, args.quick ? [100] : [100, 500, 2000], args.quick ? 100 : 2000, (m) => progress.note(m));
  memory.sample();

  const result: BenchResult = {
    date: new Date().toISOString().replace("T", " ").slice(0, 16) + " UTC",
    mode: args.quick ? "quick" : "full",
    machine: describeMachine(),
    monthlySeries: monthly.length,
    quarterlySeries: quarterly.length,
    throughput,
    accuracy,
    board,
    coverage,
    referenceNotes: [],
    ahead,
    workbook,
    maxRssBytes: 0,
    peakHeapBytes: 0,
    elapsedSeconds: 0,
    codeState: describeCode(),
    loadAverage: [0, 0],
  };

  if (args.references) {
    progress.note("references: base R HoltWinters, then statsmodels ExponentialSmoothing (each times its own fits)");
    const [r, sm] = runReferences(series);
    result.references = [scoreReference("r", r, series, board, coverage), scoreReference("sm", sm, series, board, coverage)];
    for (const run of [r, sm]) if (run.skipped) result.referenceNotes.push(`${run.name} skipped: ${run.skipped}`);
    progress.note("references: R forecast package (ets, thetaf), from its cache when the same script, series and versions ran before");
    const fc = runForecastPackage(series);
    result.forecastPackage = scoreForecastPackage(fc, series, board, coverage);
    if (fc.skipped) result.referenceNotes.push(`${fc.name} skipped: ${fc.skipped}`);
    else if (fc.cached) result.referenceNotes.push(`${fc.name}: outputs read from the cache (key ${fc.cached}); its timings are those of the run that filled it`);
    if (!r.skipped) {
      const [mult, add] = CLASSIC.map((m) => accuracy.sse.get(m.key)!);
      result.sse = compareSse(r, { multiplicative: mult, additive: add });
    }
  }
  if (ahead.seconds === undefined) result.referenceNotes.push(`the EBB.AHEAD row was ${ahead.note}`);

  memory.sample();
  result.maxRssBytes = memory.maxRssBytes();
  result.peakHeapBytes = memory.peakHeap;
  result.elapsedSeconds = now() - started;
  result.loadAverage = [loadAtStart, loadavg()[0]];
  return renderReport(result).trimEnd();
}

main().catch((e) => {
  console.error(`bench failed: ${(e as Error).stack ?? e}`);
  process.exit(1);
});
