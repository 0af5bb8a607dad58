import type { LedgerWorkbookSettings } from "../../ledger/describe/types";
import { CliError } from "../cliError";
import type { RunSettings } from "../options";
import { parseSeriesCsv, readInputText, type SeriesColumn } from "../readCsv";

/** The settings the .xlsx ledger writer takes (src/ledger/xlsx/writeLedgerWorkbook.ts). */
export type LedgerSettings = LedgerWorkbookSettings;

type WriteLedgerWorkbook = (columns: SeriesColumn[], settings: LedgerSettings, outPath: string) => Promise<void>;

/** The ledger's interval coverage when --coverage is left out (DESIGN: coverage default 0.95). */
export const LEDGER_COVERAGE = 0.95;

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

/**
 * The writer is loaded when the command runs: it brings in the xlsx library, which the other
 * commands do not need, so they start faster.
 */
function loadWriter(): WriteLedgerWorkbook {
  // eslint-disable-next-line @typescript-eslint/no-require-imports
  return (require("../../ledger/xlsx/writeLedgerWorkbook") as { writeLedgerWorkbook: WriteLedgerWorkbook }).writeLedgerWorkbook;
}
