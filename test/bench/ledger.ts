/**
 * The ledger at length: describing, writing, checking and extending a long ledger on the
 * preview's formula engine (HyperFormula), beside its history as the panel writes it, and the
 * host adapter's largest request for the same ledger (against the mock Excel API the tests use).
 * Goal from the ledger-integrity issue: the check stays interactive, under 10 s at 3,100 periods.
 */
import { describeLedger, extendLedger, hyperFormulaReader, verifyLedger, writeCellsToHyperFormula } from "../../src/ledger";
import { writeLedgerToExcel } from "../../src/ledger/adapters/excelHost";
import { fakeExcel } from "../ledger/support/fakeExcel";
import { longSeries } from "../ledger/support/cases";
import { sourcedLedger } from "../ledger/support/sourced";
import type { Progress } from "./progress";
import { markdownTable } from "./table";
import { now } from "./timing";

const CHECK_GOAL_SECONDS = 10;
const GOAL_PERIODS = 3100;
const SETTINGS = { period: 12, seasonality: "multiplicative", trend: "damped" } as const;

interface LedgerRow {
  periods: number;
  cells: number;
  /** Seconds: describe plus write, the check, adding two actuals (with their write), a second check. */
  write: number;
  check: number;
  extend: number;
  recheck: number;
  findings: number;
  requests?: number;
  largestRequestMB?: number;
}

async function hostRequests(history: (number | null)[]): Promise<{ requests: number; largestMB: number }> {
  const desc = describeLedger({ history, name: "Long", settings: SETTINGS, horizon: 12, coverage: 0.95, anchor: { sheet: "Long", cell: "A1" } });
  const fake = fakeExcel({ sheetExists: false });
  (globalThis as unknown as { Excel: unknown }).Excel = fake.Excel;
  await writeLedgerToExcel(desc, { notes: "notes" });
  const sizes = fake.requestSizes();
  return { requests: sizes.length, largestMB: Math.max(...sizes) / 1e6 };
}

async function measure(periods: number, progress: Progress): Promise<LedgerRow> {
  progress.note(`ledger: ${periods.toLocaleString("en-US")} periods on the preview's formula engine`);
  const history = longSeries(periods);
  const cut = periods - 2;
  const anchor = { sheet: "Ledger", cell: "A1" };
  let t = now();
  const { hf, desc, historySheet } = sourcedLedger({ history: history.slice(0, cut), name: "Long", settings: SETTINGS, horizon: 12, coverage: 0.95, anchor });
  const write = now() - t;
  const read = () => hyperFormulaReader(hf, anchor.sheet);
  t = now();
  const first = verifyLedger(read(), anchor);
  const check = now() - t;
  hf.setCellContents({ sheet: historySheet, row: 1 + cut, col: 1 }, history.slice(cut).map((v) => [v]));
  t = now();
  const ext = extendLedger(read(), anchor, history.slice(cut));
  writeCellsToHyperFormula(hf, anchor.sheet, [...ext.append, ...ext.refresh], ext.names);
  const extend = now() - t;
  t = now();
  const second = verifyLedger(read(), anchor);
  const recheck = now() - t;
  const host = await hostRequests(history);
  return { periods, cells: desc.cells.length, write, check, extend, recheck, findings: first.problems.length + second.problems.length, requests: host.requests, largestRequestMB: host.largestMB };
}

export async function runLedgerBench(quick: boolean, progress: Progress): Promise<LedgerRow[]> {
  const rows: LedgerRow[] = [];
  for (const n of quick ? [GOAL_PERIODS] : [GOAL_PERIODS, 10_000]) rows.push(await measure(n, progress));
  return rows;
}

export function renderLedgerBench(rows: LedgerRow[]): string {
  const s = (x: number) => x.toFixed(2);
  const goal = rows.find((r) => r.periods === GOAL_PERIODS);
  const targets = markdownTable(
    ["target", "result", "figures"],
    [[
      `Ledger check of a ${GOAL_PERIODS.toLocaleString("en-US")}-period ledger under ${CHECK_GOAL_SECONDS} s on the preview's formula engine`,
      !goal ? "NOT MEASURED" : goal.check < CHECK_GOAL_SECONDS && goal.findings === 0 ? "MET" : "MISSED",
      goal ? `check ${s(goal.check)} s; describe and write ${s(goal.write)} s; ${goal.findings} findings on the untouched ledger` : "-",
    ]],
  );
  const table = markdownTable(
    ["periods", "cells", "describe + write s", "check s", "add two actuals s", "check again s", "findings", "host requests", "largest request MB"],
    rows.map((r) => [r.periods.toLocaleString("en-US"), r.cells.toLocaleString("en-US"), s(r.write), s(r.check), s(r.extend), s(r.recheck), String(r.findings), String(r.requests ?? "-"), r.largestRequestMB?.toFixed(2) ?? "-"]),
    [false, true, true, true, true, true, true, true, true],
  );
  return [
    "## Ledger at length",
    "",
    targets,
    "",
    "A multiplicative damped ledger (monthly, horizon 12, invented series from test/ledger/support/cases.ts with three blanks)",
    "written beside its history on HyperFormula, as the preview's panel writes it: wall time of each step on this machine.",
    "Host requests: the same ledger through the host adapter against the mock Excel API (the web host refuses a request over 5 MB).",
    "",
    table,
  ].join("\n");
}
