import type { LedgerWorkbookSettings } from "../../ledger/describe/types";
import type { LeftOut } from "../../ledger/xlsx/writeLedgerWorkbook";
import { CliError } from "../cliError";
import { readSeriesTable } from "../input/readSeries";
import type { RunSettings } from "../options";
import { checkOutPath, writeFailure } from "../output/outputFile";
import { printNotes, SOME_FAILED } from "../run/runBatch";

/** The settings the .xlsx ledger writer takes (src/ledger/xlsx/writeLedgerWorkbook.ts). */
export type LedgerSettings = LedgerWorkbookSettings;

type WriteLedgerWorkbook = (
  columns: { name: string; values: (number | null)[]; problem?: string }[],
  settings: LedgerSettings,
  outPath: string,
  labels?: { name: string; values: string[] },
) => Promise<LeftOut[]>;

/** The ledger's interval coverage when --coverage is left out (DESIGN: coverage default 0.95). */
export const LEDGER_COVERAGE = 0.95;

/**
 * `ledger`: an .xlsx workbook with the data and one ledger per series. A series without a
 * ledger (too short, a bad cell) gets a warning on standard error and exit status 2.
 */
export async function runLedger(file: string, settings: RunSettings): Promise<number> {
  const out = settings.out;
  if (out === undefined || out.trim() === "") throw new CliError("ledger writes a workbook: give its file name with --out, for example --out ledger.xlsx.");
  if (!/\.xlsx$/i.test(out)) throw new CliError(`--out: the ledger is an .xlsx workbook; give a file name ending in .xlsx (got "${out}").`);
  checkOutPath(out, file, settings.force);
  const write = loadWriter();
  const table = await readSeriesTable(file, settings.read);
  printNotes(table);
  const columns = Array.from({ length: table.seriesCount }, (_, k) => table.column(k));
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
  // A column with a cell that is not a number is written as data (that cell blank) but gets no ledger.
  const readable = columns.map((c) => ({ name: c.name, values: Array.from(c.values, (v) => (Number.isNaN(v) ? null : v)), problem: c.problem }));
  let leftOut: LeftOut[];
  try {
    leftOut = await write(readable, ledgerSettings, out, table.labels);
  } catch (e) {
    throw writeFailure(e, `"${out}"`);
  }
  for (const l of leftOut) process.stderr.write(`ebb: warning: series "${l.name}" has no ledger: ${l.reason}\n`);
  const written = columns.length - leftOut.length;
  process.stdout.write(`Wrote ${out}: ${written} ledger${written === 1 ? "" : "s"} of ${columns.length} series${leftOut.length > 0 ? `; ${leftOut.length} left out (see the warnings)` : ""}.\n`);
  if (written === 0) return 1;
  return leftOut.length > 0 ? SOME_FAILED : 0;
}

/**
 * The writer is loaded when the command runs: it brings in the xlsx library, which the other
 * commands do not need, so they start faster.
 */
function loadWriter(): WriteLedgerWorkbook {
  // eslint-disable-next-line @typescript-eslint/no-require-imports
  return (require("../../ledger/xlsx/writeLedgerWorkbook") as { writeLedgerWorkbook: WriteLedgerWorkbook }).writeLedgerWorkbook;
}
