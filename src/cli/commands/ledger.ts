import { CliError } from "../cliError";
import type { RunSettings } from "../options";
import { parseSeriesCsv, readInputText, type SeriesColumn } from "../readCsv";

/** The settings the .xlsx ledger writer takes (src/ledger/xlsx/writeLedgerWorkbook.ts). */
export interface LedgerSettings {
  period?: number;
  seasonality?: string;
  trend?: string;
  start?: string;
  cycles?: number;
  alpha?: number;
  beta?: number;
  gamma?: number;
  phi?: number;
  horizon: number;
  coverage: number;
}

type WriteLedgerWorkbook = (columns: SeriesColumn[], settings: LedgerSettings, outPath: string) => Promise<void>;

/** The ledger's interval coverage when --coverage is left out (DESIGN: coverage default 0.95). */
export const LEDGER_COVERAGE = 0.95;

// Loaded on demand, so the other commands work while the ledger writer is absent. A path held
// in a variable keeps the type checker from requiring the module to exist. require() rather than
// import(): the installed launcher (bin/ebb.js) registers tsx for require only, and Node's own
// import() cannot load a .ts file.
const WRITER_MODULE = "../../ledger/xlsx/writeLedgerWorkbook";

/** `ledger`: an .xlsx workbook with the data and one ledger per series. */
export async function runLedger(file: string, settings: RunSettings): Promise<number> {
  const out = settings.out;
  if (out === undefined || out.trim() === "") throw new CliError("ledger writes a workbook: give its file name with --out, for example --out ledger.xlsx.");
  if (!/\.xlsx$/i.test(out)) throw new CliError(`--out: the ledger is an .xlsx workbook; give a file name ending in .xlsx (got "${out}").`);
  const write = loadWriter();
  const source = file === "-" ? "standard input" : file;
  const { columns } = parseSeriesCsv(readInputText(file), source);
  const m = settings.model;
  const ledgerSettings: LedgerSettings = {
    period: m.period,
    seasonality: m.seasonality,
    trend: m.trend,
    start: m.start,
    cycles: m.cycles,
    alpha: m.alpha,
    beta: m.beta,
    gamma: m.gamma,
    phi: m.phi,
    horizon: settings.horizon,
    coverage: settings.coverage ?? LEDGER_COVERAGE,
  };
  await write(columns, ledgerSettings, out);
  process.stdout.write(`Wrote ${out}: ${columns.length} series.\n`);
  return 0;
}

function loadWriter(): WriteLedgerWorkbook {
  try {
    require.resolve(WRITER_MODULE);
  } catch {
    throw new CliError("The .xlsx ledger writer (src/ledger/xlsx/writeLedgerWorkbook.ts) is not part of this installation, so the ledger command cannot run. The other commands work without it.");
  }
  // eslint-disable-next-line @typescript-eslint/no-require-imports
  const mod: { writeLedgerWorkbook?: WriteLedgerWorkbook } = require(WRITER_MODULE);
  if (typeof mod.writeLedgerWorkbook !== "function") {
    throw new CliError("src/ledger/xlsx/writeLedgerWorkbook.ts does not export a function writeLedgerWorkbook; the ledger command cannot run.");
  }
  return mod.writeLedgerWorkbook;
}
