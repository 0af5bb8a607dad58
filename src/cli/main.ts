/**
 * Ebb's batch command: the engine over CSV files of many series.
 *   npm run --silent ebb -- <fit|states|ahead|backtest|buffer|ledger|demo> <file.csv|-> [options]
 * Parsing only: the work is in commands/, the mathematics in the engine.
 */
import { Command } from "commander";
import { EbbError } from "../engine";
import { CliError } from "./cliError";
import { aheadCommand } from "./commands/ahead";
import { backtestCommand } from "./commands/backtest";
import { DEFAULT_SERVICE_LEVEL, runBuffer, type BufferOptions } from "./commands/buffer";
import { runBatch, type BatchCommand } from "./commands/batch";
import { runDemo } from "./commands/demo";
import { fitCommand } from "./commands/fit";
import { runLedger } from "./commands/ledger";
import { statesCommand } from "./commands/states";
import { AHEAD_HELP, BACKTEST_HELP, BUFFER_HELP, DEMO_HELP, FIT_HELP, LEDGER_HELP, PROGRAM_HELP, STATES_HELP } from "./help";
import { DEFAULT_HOLDOUT, DEFAULT_HORIZON, toRunSettings, type RawOptions } from "./options";

type Extra = "horizon" | "coverage" | "holdout" | "output" | "out";

function modelOptions(cmd: Command, extras: Extra[]): Command {
  cmd
    .option("--period <N>", "season length; 0 detects it (default: 0)")
    .option("--seasonality <word>", "multiplicative | additive | auto (default: multiplicative)")
    .option("--trend <word>", "linear | damped | none | auto (default: linear)")
    .option("--start <word>", "decomposition | classic | optimized (default: decomposition)")
    .option("--cycles <N>", "seasons in the decomposition start window, 2 or more (default: 2)")
    .option("--alpha <A>", "level smoothing constant in [0, 1]; fitted when left out")
    .option("--beta <B>", "trend smoothing constant in [0, 1]; fitted when left out")
    .option("--gamma <G>", "seasonal smoothing constant in [0, 1]; fitted when left out")
    .option("--phi <P>", "trend damping in [0, 1] (damped trend); fitted when left out");
  if (extras.includes("horizon")) cmd.option("--horizon <H>", `periods to forecast (default: ${DEFAULT_HORIZON})`);
  if (extras.includes("holdout")) cmd.option("--holdout <H>", `last values held out and forecast (default: ${DEFAULT_HOLDOUT})`);
  if (extras.includes("coverage")) cmd.option("--coverage <C>", "prediction interval coverage, such as 0.95");
  if (extras.includes("output")) {
    cmd
      .option("--format <word>", "json | csv (default: json)")
      .option("--out <FILE>", "write to FILE instead of standard output")
      .option("--progress", 'show "fitting series k of N" on standard error (shown anyway on a terminal above 20 series)');
  }
  if (extras.includes("out")) cmd.option("--out <FILE>", "the .xlsx workbook to write (required)");
  return cmd;
}

/** Run an action, turning expected errors into a message on standard error and exit status 1. */
async function guarded(action: () => number | Promise<number>): Promise<void> {
  try {
    process.exitCode = await action();
  } catch (e) {
    if (e instanceof CliError || e instanceof EbbError) {
      process.stderr.write(`ebb: ${e.message}\n`);
    } else {
      process.stderr.write(`ebb: internal error, please report it: ${e instanceof Error ? (e.stack ?? e.message) : String(e)}\n`);
    }
    process.exitCode = 1;
  }
}

function batch(program: Command, name: string, summary: string, help: string, command: BatchCommand, extras: Extra[]): void {
  const cmd = program.command(name).description(summary).argument("<file>", "CSV file of series, or - for standard input");
  modelOptions(cmd, [...extras, "output"]).addHelpText("after", help);
  cmd.action((file: string, raw: RawOptions) => guarded(() => runBatch(command, file, toRunSettings(raw))));
}

export function buildProgram(): Command {
  const program = new Command("ebb")
    .description("Ebb batch command: Holt-Winters seasonal forecasting for CSV files of many series.")
    .showHelpAfterError('(add --help for usage)')
    .addHelpText("after", PROGRAM_HELP);
  batch(program, "fit", "per series: the model, its fitted constants and errors", FIT_HELP, fitCommand, []);
  batch(program, "states", "per series: one row per period (level, trend, index, forecast, error)", STATES_HELP, statesCommand, []);
  batch(program, "ahead", "per series: the next --horizon forecasts, with low/high when --coverage is given", AHEAD_HELP, aheadCommand, ["horizon", "coverage"]);
  batch(program, "backtest", "per series and overall: accuracy on the last --holdout values, fitted on the rest", BACKTEST_HELP, backtestCommand, ["holdout", "coverage"]);

  const buffer = program.command("buffer").description("per series: lead-time demand, its error's standard deviation, safety stock, reorder point").argument("<file>", "CSV file of series, or - for standard input");
  modelOptions(buffer, ["output"])
    .option("--lead-time <L>", "periods from placing an order to receiving it (required)")
    .option("--service-level <S>", `cycle service level, such as 0.95 (default: ${DEFAULT_SERVICE_LEVEL})`)
    .option("--review-period <R>", "periods between stock reviews; 0 for continuous review (default: 0)")
    .addHelpText("after", BUFFER_HELP);
  buffer.action((file: string, raw: RawOptions & BufferOptions) => guarded(() => runBuffer(file, toRunSettings(raw), raw)));

  const ledger = program.command("ledger").description("an .xlsx workbook (--out) with the data and one ledger per series").argument("<file>", "CSV file of series, or - for standard input");
  modelOptions(ledger, ["horizon", "coverage", "out"]).addHelpText("after", LEDGER_HELP);
  ledger.action((file: string, raw: RawOptions) => guarded(() => runLedger(file, toRunSettings(raw))));

  const demo = program.command("demo").description("forecast the invented Larkmere demo data and print a table with intervals");
  modelOptions(demo, ["horizon", "coverage"]).addHelpText("after", DEMO_HELP);
  demo.action((raw: RawOptions) => guarded(() => runDemo(toRunSettings(raw, { seasonality: "auto", trend: "auto", coverage: 0.95 }))));
  return program;
}

// A reader that closes early (| head) is not an error.
process.stdout.on("error", (e: NodeJS.ErrnoException) => {
  if (e.code === "EPIPE") process.exit(0);
  throw e;
});

buildProgram().parseAsync(process.argv);
