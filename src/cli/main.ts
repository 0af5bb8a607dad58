/**
 * Ebb's batch command: the engine over CSV files of many series.
 *   npm run --silent ebb -- <fit|states|ahead|backtest|buffer|ledger|demo> <file.csv|-> [options]
 * Parsing only: the work is in commands/ and run/, the mathematics in the engine.
 */
import { Command } from "commander";
import { EbbError } from "../engine";
import { CliError } from "./cliError";
import { BATCH_COMMANDS } from "./commands";
import type { BatchCommand } from "./commands/batch";
import { DEMO_DEFAULTS, runDemo } from "./commands/demo";
import { runLedger } from "./commands/ledger";
import { DEMO_HELP, LEDGER_HELP, PROGRAM_HELP } from "./help";
import { DEFAULT_HOLDOUT, DEFAULT_HORIZON, toRunSettings, type Defaults, type OptionGroup, type RawOptions } from "./options";
import { writeFailure } from "./output/outputFile";
import { runBatch } from "./run/runBatch";

function modelOptions(cmd: Command, groups: OptionGroup[], defaults: Defaults = {}): Command {
  cmd
    .option("--period <N>", "season length; 0 detects it (default: 0)")
    .option("--seasonality <word>", `multiplicative | additive | auto (default: ${defaults.seasonality ?? "multiplicative"})`)
    .option("--trend <word>", `linear | damped | none | auto (default: ${defaults.trend ?? "linear"})`)
    .option("--start <word>", "decomposition | classic | optimized (default: decomposition)")
    .option("--cycles <N>", "seasons in the decomposition start window, 2 or more (default: 2)")
    .option("--alpha <A>", "level smoothing constant in [0, 1]; fitted when left out")
    .option("--beta <B>", "trend smoothing constant in [0, 1]; fitted when left out")
    .option("--gamma <G>", "seasonal smoothing constant in [0, 1]; fitted when left out")
    .option("--phi <P>", "trend damping in [0, 1] (damped trend); fitted when left out");
  if (groups.includes("horizon")) cmd.option("--horizon <H>", `periods to forecast (default: ${DEFAULT_HORIZON})`);
  if (groups.includes("holdout")) cmd.option("--holdout <H>", `last values held out and forecast (default: ${DEFAULT_HOLDOUT})`);
  if (groups.includes("coverage")) {
    const d = defaults.coverage === undefined ? "" : ` (default: ${defaults.coverage})`;
    cmd.option("--coverage <C>", `prediction interval coverage as a fraction (0.95) or a percentage (95)${d}`);
  }
  return cmd;
}

/** How the CSV file is read: every command that reads one takes these. */
function inputOptions(cmd: Command): Command {
  return cmd
    .option("--delimiter <C>", "column separator: , ; tab or | (default: detected from the first lines)")
    .option("--decimal <C>", "decimal mark: . or , (default: detected; , is usual with ; separators)")
    .option("--labels <NAME>", 'the column of period labels (dates, months), not forecast; "none" forecasts every column (default: a first column of dates, months or period numbers)');
}

function outputOptions(cmd: Command): Command {
  return cmd
    .option("--format <word>", "json | csv (default: json)")
    .option("--out <FILE>", "write to FILE instead of standard output (never the input file)")
    .option("--force", "replace --out FILE if it already exists")
    .option("--workers <N>", "worker threads; 1 runs on the main thread only (default: every core from 500 series on)")
    .option("--progress", "show progress with the rate and time left on standard error (shown anyway on a terminal above 20 series)");
}

/** Run an action, turning expected errors into a one-line message on standard error and exit status 1. */
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

function batch(program: Command, command: BatchCommand): void {
  const cmd = program.command(command.name).description(command.summary).argument("<file>", "CSV file of series, or - for standard input");
  outputOptions(inputOptions(modelOptions(cmd, command.options)));
  command.addOptions?.(cmd);
  cmd.addHelpText("after", command.help);
  cmd.action((file: string, raw: RawOptions) =>
    guarded(() => {
      const settings = toRunSettings(raw);
      if (command.readOptions) settings.extra = command.readOptions(raw);
      return runBatch(command, file, settings);
    }),
  );
}

export function buildProgram(): Command {
  const program = new Command("ebb")
    .description("Ebb batch command: Holt-Winters seasonal forecasting for CSV files of many series.")
    .showHelpAfterError("(add --help for usage)")
    .addHelpText("after", PROGRAM_HELP);
  for (const command of BATCH_COMMANDS) batch(program, command);

  const ledger = program.command("ledger").description("an .xlsx workbook (--out) with the data and one ledger per series").argument("<file>", "CSV file of series, or - for standard input");
  inputOptions(modelOptions(ledger, ["horizon", "coverage"], { coverage: 0.95 }))
    .option("--out <FILE>", "the .xlsx workbook to write (required; never the input file)")
    .option("--force", "replace --out FILE if it already exists")
    .addHelpText("after", LEDGER_HELP);
  ledger.action((file: string, raw: RawOptions) => guarded(() => runLedger(file, toRunSettings(raw))));

  const demo = program.command("demo").description("forecast the invented Larkmere demo data and print a table with intervals");
  modelOptions(demo, ["horizon", "coverage"], DEMO_DEFAULTS).addHelpText("after", DEMO_HELP);
  demo.action((raw: RawOptions) => guarded(() => runDemo(toRunSettings(raw, DEMO_DEFAULTS))));
  return program;
}

// A reader that closes early (| head) is not an error; any other failure of standard output is one line.
process.stdout.on("error", (e: NodeJS.ErrnoException) => {
  if (e.code === "EPIPE") process.exit(0);
  process.stderr.write(`ebb: ${writeFailure(e, "standard output").message}\n`);
  process.exit(1);
});

buildProgram().parseAsync(process.argv);
