/**
 * EBB.CORRECTED, EBB.UNUSUAL and EBB.BUFFER as formulas in a workbook (the embedded formula
 * engine, the same catalog as the spreadsheet host), on the invented Larkmere demo data.
 * A corrected history must give exactly (to the last digit) what the engine gives on the
 * corrected values typed as plain actuals.
 */
import { fitModel, stockBuffer } from "../../src/engine";
import { DEMO_EVENTS, demoMonths } from "../../src/preview/demo/generate-demo";
import { readDemo } from "./support/demo";
import { block, type Cell, errorIn, gridFromColumns, workbook } from "./support/workbook";

const demo = readDemo();
const months = demoMonths();
const N = 84;
const ROWS = 100; // ranges reach below the data, as a rolling sheet's do
const hose = demo.columns[demo.names.indexOf("Hose reels (units)")];
const seeds = demo.columns[0];

/** Corrections column: blank except the demo's two distorted months, set to a planner's figure. */
const fixes: (number | null)[] = hose.map(() => null);
fixes[months.indexOf(DEMO_EVENTS[0].month)] = 400;
fixes[months.indexOf(DEMO_EVENTS[1].month)] = 1300;
const correctedValues = hose.map((v, i) => fixes[i] ?? v);

function sheet(): Cell[][] {
  // A: hose reels, B: corrections, C: seed trays, D: seed-tray corrections (none), E: corrected values typed
  return gridFromColumns([hose, fixes, seeds, [], correctedValues], ROWS);
}

test("EBB.AHEAD, EBB.FIT and EBB.BUFFER on EBB.CORRECTED equal the same functions on the corrected values, exactly", () => {
  const grid = sheet();
  grid[0][6] = `=EBB.AHEAD(EBB.CORRECTED(A1:A${ROWS}, B1:B${ROWS}), 12, 6)`; // G1:G6
  grid[0][7] = `=EBB.AHEAD(E1:E${ROWS}, 12, 6)`; // H1:H6
  grid[0][8] = `=EBB.AHEAD(A1:A${ROWS}, 12, 6)`; // I1:I6, the uncorrected history
  grid[10][6] = `=EBB.FIT(EBB.CORRECTED(A1:A${ROWS}, B1:B${ROWS}), 12, "auto", "auto")`; // G11:G19
  grid[10][7] = `=EBB.FIT(E1:E${ROWS}, 12, "auto", "auto")`;
  grid[20][6] = `=EBB.BUFFER(EBB.CORRECTED(A1:A${ROWS}, B1:B${ROWS}), 12, 3, 0.95)`; // G21:G24
  grid[20][7] = `=EBB.BUFFER(E1:E${ROWS}, 12, 3, 0.95)`;
  const { hf, sheet: s } = workbook(grid);
  for (const [a, b, rows] of [["G1", "H1", 6], ["G11", "H11", 9], ["G21", "H21", 4]] as const) {
    const viaCorrected = block(hf, s, a, rows, 1);
    expect(viaCorrected.flat().filter((v) => typeof v === "number").length).toBeGreaterThanOrEqual(4);
    expect(viaCorrected.flat().filter((v) => typeof v === "object" && v !== null)).toEqual([]); // no error values
    expect(viaCorrected).toEqual(block(hf, s, b, rows, 1));
  }
  // and the engine on the corrected values, directly
  const engine = stockBuffer(fitModel(correctedValues, { period: 12 }), { leadTime: 3, serviceLevel: 0.95 });
  expect(block(hf, s, "H21", 4, 1).flat()).toEqual([engine.forecast, engine.sd, engine.safetyStock, engine.reorderPoint]);
  // the corrections changed the outlook: the stock-out June no longer drags next June down
  const corrected = block(hf, s, "G1", 6, 1).flat() as number[];
  const raw = block(hf, s, "I1", 6, 1).flat() as number[];
  expect(corrected[5]).toBeGreaterThan(raw[5] * 1.1);
});

test("EBB.CORRECTED spills the history with corrections in place, blanks kept; many columns as one table", () => {
  const grid = sheet();
  grid[0][6] = `=EBB.CORRECTED(A1:C${ROWS}, B1:D${ROWS})`; // two-column... see below
  grid[0][10] = `=EBB.CORRECTED(A1:A${N}, B1:B${N})`;
  const { hf, sheet: s } = workbook(grid);
  const single = block(hf, s, "K1", N, 1).flat();
  expect(single).toEqual(correctedValues);
  // a block: history A:C, corrections B:D. Column 1 = hose corrected by B, column 2 = B by C
  // (every C cell is a number, so all replaced), column 3 = seed trays kept (D is blank).
  const table = block(hf, s, "G1", N, 3);
  expect(table.map((r) => r[0])).toEqual(correctedValues);
  expect(table.map((r) => r[1])).toEqual(seeds.slice(0, N));
  expect(table.map((r) => r[2])).toEqual(seeds.slice(0, N));
});

test("EBB.CORRECTED refuses a corrections range of another size, and text in a correction", () => {
  const grid = sheet();
  grid[0][6] = `=EBB.CORRECTED(A1:A${ROWS}, B1:B${ROWS - 1})`;
  grid[5][1] = "promo"; // a reason typed in the corrections column by mistake
  grid[0][7] = `=EBB.CORRECTED(A1:A${ROWS}, B1:B${ROWS})`;
  const { hf, sheet: s } = workbook(grid);
  expect(errorIn(hf, s, "G1")).toEqual({ type: "VALUE", message: expect.stringMatching(/same size as the history/) });
  expect(errorIn(hf, s, "H1")).toEqual({ type: "VALUE", message: expect.stringMatching(/^B6 holds text "promo"/) });
});

test("EBB.UNUSUAL flags the promotion high and the stock-out low, with the one-step forecast as suggestion", () => {
  const grid = sheet();
  grid[0][6] = `=EBB.UNUSUAL(A1:A${ROWS}, 12)`; // G:H
  const { hf, sheet: s } = workbook(grid);
  const out = block(hf, s, "G1", ROWS, 2);
  const flagged = out.flatMap((r, i) => (r[0] === null ? [] : [`${months[i]} ${r[0]}`]));
  expect(flagged).toEqual([`${DEMO_EVENTS[0].month} high`, `${DEMO_EVENTS[1].month} low`]);
  for (const r of out) expect(r[0] === null).toBe(r[1] === null);
  const promo = out[months.indexOf(DEMO_EVENTS[0].month)];
  expect(promo[1] as number).toBeLessThan(hose[months.indexOf(DEMO_EVENTS[0].month)]!);
});

test("EBB.BUFFER: four rows per series, one column per product, options as words", () => {
  const grid = sheet();
  grid[0][6] = `=EBB.BUFFER(A1:C${ROWS}, 12, 3, 0.95, 1, "auto")`; // G1:I4
  grid[10][6] = `=EBB.BUFFER(A1:A${ROWS}, 12, 3, 0.95, , "additive damped")`;
  grid[20][6] = `=EBB.BUFFER(A1:A${ROWS}, 12, 3, 100)`;
  grid[30][6] = `=EBB.BUFFER(A1:A${ROWS}, 12, 3, 0.95, 0, "additive sideways")`;
  const { hf, sheet: s } = workbook(grid);
  const table = block(hf, s, "G1", 4, 3);
  const engine = stockBuffer(fitModel(hose, { period: 12, seasonality: "auto", trend: "auto" }), { leadTime: 3, reviewPeriod: 1, serviceLevel: 0.95 });
  expect(table.map((r) => r[0])).toEqual([engine.forecast, engine.sd, engine.safetyStock, engine.reorderPoint]);
  const damped = stockBuffer(fitModel(hose, { period: 12, seasonality: "additive", trend: "damped" }), { leadTime: 3, serviceLevel: 0.95 });
  expect(block(hf, s, "G11", 4, 1).flat()).toEqual([damped.forecast, damped.sd, damped.safetyStock, damped.reorderPoint]);
  expect(errorIn(hf, s, "G21").message).toMatch(/service level must be from 0.5 to 0.9999, or 50 to 99.99 as a percent/);
  expect(errorIn(hf, s, "G31").message).toMatch(/Unknown option word "sideways"/);
});
