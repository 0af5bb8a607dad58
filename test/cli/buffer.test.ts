/**
 * The batch command's `buffer` run as a child process. Expected values: the engine's own
 * stockBuffer on the same series (the check is that the command reads, fits and reports without
 * changing a digit), base R's AirPassengers from the committed fixture as input, and the stock
 * caution (DESIGN.md's cautions) in every output.
 */
import { readFileSync, rmSync } from "fs";
import { join } from "path";
import { fitModel, stockBuffer } from "../../src/engine";
import { STOCK_CAUTION } from "../../src/taskpane/panel/cautions";
import { REPO, runEbb, tempDir, writeCsv } from "./runEbb";

const fixture = JSON.parse(readFileSync(join(REPO, "test/reference/fixtures/r-holtwinters.json"), "utf8"));
const air: number[] = fixture.series.AirPassengers.values;
const ukgas: number[] = fixture.series.UKgas.values;
const dir = tempDir();
afterAll(() => rmSync(dir, { recursive: true, force: true }));
const file = writeCsv(dir, "two.csv", ["air", "gas", "short"], [air, ukgas, [1, 2, 3]]);

test("json: per series the engine's figures, the model fields, and the caution", () => {
  const run = runEbb(["buffer", file, "--period", "12", "--seasonality", "additive", "--lead-time", "3", "--review-period", "1", "--service-level", "0.9"]);
  // Exit status 2: "short" failed, the others were written.
  expect(run.status).toBe(2);
  const doc = JSON.parse(run.stdout);
  expect(doc.caution).toBe(STOCK_CAUTION);
  expect(run.stderr).toContain(STOCK_CAUTION);
  const b = stockBuffer(fitModel(air, { period: 12, seasonality: "additive", trend: "linear" }), { leadTime: 3, reviewPeriod: 1, serviceLevel: 0.9 });
  expect(doc.series[0].name).toBe("air");
  expect(doc.series[0].seasonality).toBe("additive");
  expect(doc.series[0].buffer).toEqual({
    lead_time: 3,
    review_period: 1,
    service_level: 0.9,
    periods: 4,
    demand: b.forecast,
    sd: b.sd,
    shortcut_sd: b.rootPeriodsSd,
    method: "analytic",
    z: b.z,
    safety_stock: b.safetyStock,
    reorder_point: b.reorderPoint,
  });
  expect(doc.series[0].buffer.sd).toBeGreaterThan(doc.series[0].buffer.shortcut_sd);
  // a series too short to fit carries its reason; the others still run
  expect(doc.series[2].error).toMatch(/Needs \d+ values, has 3/);
  expect(run.stderr).toMatch(/series "short" failed/);
});

test("csv: one row per series", () => {
  const run = runEbb(["buffer", file, "--period", "4", "--lead-time", "2", "--format", "csv"]);
  expect(run.status).toBe(2);
  const lines = run.stdout.trim().split("\n");
  expect(lines[0]).toBe("series,lead_time,review_period,service_level,demand,sd,shortcut_sd,safety_stock,reorder_point,method,message");
  const gas = stockBuffer(fitModel(ukgas, { period: 4 }), { leadTime: 2, serviceLevel: 0.95 });
  const cells = lines[2].split(",");
  expect(cells[0]).toBe("gas");
  expect(Number(cells[8])).toBe(gas.reorderPoint);
  expect(cells[9]).toBe("simulated");
  expect(run.stderr).toContain(STOCK_CAUTION);
});

test("missing or wrong buffer options are refused with what to type", () => {
  expect(runEbb(["buffer", file, "--period", "12"]).stderr).toMatch(/--lead-time is required/);
  expect(runEbb(["buffer", file, "--lead-time", "2.5"]).stderr).toMatch(/--lead-time: .*Round a part period up/);
  expect(runEbb(["buffer", file, "--lead-time", "3", "--service-level", "0.2"]).stderr).toMatch(/--service-level: The service level must be from 0.5/);
  const help = runEbb(["buffer", "--help"]);
  expect(help.stdout).toMatch(/--lead-time <L>/);
  expect(help.stdout).toMatch(/supplier terms, shelf life/);
});
