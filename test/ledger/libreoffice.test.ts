/**
 * An independent spreadsheet program recomputes the .xlsx ledger: LibreOffice Calc, headless,
 * loads the file with "always recalculate" and saves it again; the values it computed equal
 * the engine's to a relative 1e-9. The file is written WITHOUT cached results, so every
 * number read back is LibreOffice's own. One sheet also has a typed alpha, so LibreOffice
 * must follow the settings cell. Fails in CI (CI=true) when LibreOffice is missing.
 * Expected values: the engine (src/engine), through the description's engine values, and
 * directly for the states, outlook and scorecard of every sheet.
 */
import ExcelJS from "exceljs";
import { mkdtempSync } from "fs";
import { tmpdir } from "os";
import { join } from "path";
import { fitModel, mad, modelStates, predictionInterval, rmse } from "../../src/engine";
import { describeLedger, type LedgerDescription, type LedgerInput } from "../../src/ledger";
import { addLedgerToWorkbook } from "../../src/ledger/adapters/xlsx";
import { writeLedgerWorkbook } from "../../src/ledger/xlsx/writeLedgerWorkbook";
import { demoColumns, ledgerCases, usedValues } from "./support/cases";
import { convertWithLibreOffice, findSoffice, requireProgram } from "./support/libreoffice";

const soffice = findSoffice();
const run = requireProgram(soffice, "LibreOffice (soffice)");
const maybe = run ? it : it.skip;
const TOL = 1e-9;

/** A cell's value, or for a formula its computed result (read from the model: exceljs's value drops a result of 0). */
function resultOf(cell: ExcelJS.Cell): unknown {
  const model = cell.model as { formula?: string; result?: unknown; value?: unknown };
  if (model.formula !== undefined) return model.result ?? "";
  return cell.value;
}

function compareSheet(ws: ExcelJS.Worksheet, desc: LedgerDescription): { checked: number; worst: number } {
  let worst = 0;
  let checked = 0;
  for (const cell of desc.cells) {
    if (cell.kind !== "formula") continue;
    const found = resultOf(ws.getCell(cell.address));
    checked++;
    if (typeof cell.value === "number") {
      if (typeof found !== "number") throw new Error(`${ws.name}!${cell.address} ${cell.formula}: LibreOffice gave ${JSON.stringify(found)}, engine ${cell.value}`);
      const gap = Math.abs(found - cell.value);
      const rel = gap / Math.max(Math.abs(found), Math.abs(cell.value));
      if (!(gap <= TOL * Math.max(Math.abs(found), Math.abs(cell.value)) + 1e-12)) {
        throw new Error(`${ws.name}!${cell.address} ${cell.formula}: LibreOffice ${found}, engine ${cell.value}`);
      }
      if (rel > worst) worst = rel;
    } else {
      expect([cell.address, found ?? ""]).toEqual([cell.address, cell.value ?? ""]);
    }
  }
  return { checked, worst };
}

/** The engine run by the test itself, compared with what LibreOffice computed. */
function compareWithEngine(ws: ExcelJS.Worksheet, desc: LedgerDescription, input: LedgerInput): void {
  // A corrected ledger's models run on the values used (the correction where there is one).
  const used = usedValues({ label: "", history: Array.from(input.history, (v) => v ?? null), settings: input.settings, corrections: input.corrections });
  const model = fitModel(used, { ...input.settings, ...desc.constants } as Parameters<typeof fitModel>[1]);
  const states = modelStates(model);
  const interval = predictionInterval(model, input.horizon, input.coverage);
  const num = (a: string) => resultOf(ws.getCell(a)) as number;
  const near = (a: number, b: number, what: string) => {
    if (!(Math.abs(a - b) <= TOL * Math.max(Math.abs(a), Math.abs(b)) + 1e-12)) throw new Error(`${ws.name} ${what}: LibreOffice ${a}, engine ${b}`);
  };
  const col = desc.layout.updates.columns;
  for (const r of desc.layout.updates.rows) {
    if (r.start) continue;
    const t = r.period - 1;
    near(resultOf(ws.getCell(r.row + 1, col.level! + 1)) as number, states.level[t], `level ${r.period}`);
    near(resultOf(ws.getCell(r.row + 1, col.forecast! + 1)) as number, states.forecast[t], `forecast ${r.period}`);
  }
  desc.layout.outlook.rows.forEach((o, i) => {
    near(num(o.forecast), interval.forecast[i], `outlook ${o.h}`);
    near(num(o.low), interval.low[i], `low ${o.h}`);
    near(num(o.high), interval.high[i], `high ${o.h}`);
  });
  const fu = model.start.firstUpdate;
  near(num(desc.layout.scorecard.mad), mad(model.history.subarray(fu), states.forecast.subarray(fu)), "MAD");
  near(num(desc.layout.scorecard.rmse), rmse(model.history.subarray(fu), states.forecast.subarray(fu)), "RMSE");
}

describe("LibreOffice recomputes the .xlsx ledger", () => {
  maybe("every formula of every ledger sheet, and a typed alpha", async () => {
    const dir = mkdtempSync(join(tmpdir(), "ebb-ledger-lo-"));
    const workbook = new ExcelJS.Workbook();
    const sheets: { desc: LedgerDescription; input: LedgerInput }[] = [];
    ledgerCases().forEach((c, i) => {
      const input: LedgerInput = { history: c.history, name: c.label, settings: c.settings, corrections: c.corrections, horizon: 12, coverage: 0.9, anchor: { sheet: `Case ${i + 1}`, cell: i % 3 === 0 ? "A1" : "C3" }, tag: `Case${i + 1}` };
      const desc = describeLedger(input);
      addLedgerToWorkbook(workbook, desc, { cachedResults: false });
      sheets.push({ desc, input });
    });
    // A sheet whose alpha was typed: written with the fitted alpha in the file's formulas'
    // settings cell replaced, so the expected values are the engine's at the typed alpha.
    const base = ledgerCases().find((c) => c.settings.seasonality === "additive" && c.settings.trend === "damped")!;
    const fitted = describeLedger({ history: base.history, settings: base.settings, horizon: 12, coverage: 0.9, anchor: { sheet: "Typed alpha", cell: "A1" } });
    const typed: LedgerInput = { history: base.history, name: "typed alpha", settings: { ...base.settings, ...fitted.constants, alpha: 0.61 }, horizon: 12, coverage: 0.9, anchor: { sheet: "Typed alpha", cell: "A1" } };
    const expectedTyped = describeLedger(typed);
    const writtenWithFitted = { ...fitted, name: "typed alpha", cells: fitted.cells.map((c) => (c.address === fitted.layout.settings.alpha ? { ...c, value: 0.61 } : c)) };
    addLedgerToWorkbook(workbook, writtenWithFitted, { cachedResults: false });
    sheets.push({ desc: expectedTyped, input: typed });
    const file = join(dir, "ledgers.xlsx");
    await workbook.xlsx.writeFile(file);

    const out = convertWithLibreOffice(soffice!, file, "xlsx", join(dir, "recomputed"));
    const back = new ExcelJS.Workbook();
    await back.xlsx.readFile(out);
    let worst = 0;
    let checked = 0;
    for (const { desc, input } of sheets) {
      const ws = back.getWorksheet(desc.sheet)!;
      expect(ws).toBeDefined();
      const r = compareSheet(ws, desc);
      compareWithEngine(ws, desc, input);
      worst = Math.max(worst, r.worst);
      checked += r.checked;
    }
    console.log(`LibreOffice recomputed ${checked} formula cells on ${sheets.length} ledger sheets; largest relative gap to the engine ${worst.toExponential(2)}`);
    expect(checked).toBeGreaterThan(10000);
  });

  maybe("the workbook of `ebb ledger` (data sheet and one ledger per series)", async () => {
    const dir = mkdtempSync(join(tmpdir(), "ebb-ledger-cli-"));
    const columns = demoColumns();
    const settings = { period: 12, seasonality: "multiplicative", trend: "damped", horizon: 12, coverage: 0.95 };
    const file = join(dir, "ledger.xlsx");
    await writeLedgerWorkbook(columns, settings, file);
    const out = convertWithLibreOffice(soffice!, file, "xlsx", join(dir, "recomputed"));
    const back = new ExcelJS.Workbook();
    await back.xlsx.readFile(out);
    // Sheet names are cut to the 31 characters the hosts allow.
    expect(back.worksheets.map((w) => w.name)).toEqual(["Data", ...columns.map((c) => `Ledger ${c.name}`.slice(0, 31))]);
    const data = back.getWorksheet("Data")!;
    columns.forEach((c, j) => {
      expect(data.getCell(1, j + 1).value).toBe(c.name);
      c.values.forEach((v, i) => expect(data.getCell(i + 2, j + 1).value ?? null).toBe(v));
    });
    for (const c of columns) {
      const { horizon, coverage, ...model } = settings;
      const ws = back.getWorksheet(`Ledger ${c.name}`.slice(0, 31))!;
      const desc = describeLedger({ history: c.values, name: c.name, settings: model, horizon, coverage, anchor: { sheet: ws.name, cell: "A1" } });
      compareSheet(ws, desc);
    }
  });
});
