/**
 * The rolling table on the embedded formula engine: =EBB.AHEAD(B2:B200, 12, 6) next to a sales
 * column that grows one actual at a time. Expected values come from the engine itself (this
 * checks that the worksheet layer reproduces it exactly), on the invented Larkmere demo data.
 */
import { fitModel, forecastModel } from "../../src/engine";
import { readDemo } from "./support/demo";
import { block, type Cell, errorIn, gridFromColumns, value, workbook } from "./support/workbook";

const demo = readDemo();
const seedTrays = demo.columns[0];

/** Column A month numbers, column B actuals from row 2 (row 1 headings), D2 the outlook formula. */
function rollingSheet(actuals: (number | null)[]): Cell[][] {
  const grid = gridFromColumns([["period", ...actuals.map((_, i) => i + 1)], ["units", ...actuals]], 200);
  grid[1][3] = "=EBB.AHEAD(B2:B200, 12, 6)"; // D2
  return grid;
}

const engineOutlook = (values: (number | null)[]) => Array.from(forecastModel(fitModel(values, { period: 12 }), 6));

describe("rolling outlook =EBB.AHEAD(B2:B200, 12, 6)", () => {
  test("36 actuals: the outlook is the engine's forecast for those 36 values", () => {
    const { hf, sheet } = workbook(rollingSheet(seedTrays.slice(0, 36)));
    const outlook = block(hf, sheet, "D2", 6, 1).map((r) => r[0]);
    expect(outlook).toEqual(engineOutlook(seedTrays.slice(0, 36)));
    // the spill is exactly the horizon: nothing below it
    expect(value(hf, sheet, "D8")).toBeNull();
  });

  test("typing the 37th actual rolls the outlook to the engine's forecast for 37 values", () => {
    const { hf, sheet } = workbook(rollingSheet(seedTrays.slice(0, 36)));
    const before = block(hf, sheet, "D2", 6, 1).map((r) => r[0]);
    hf.setCellContents(hf.simpleCellAddressFromString("B38", sheet)!, [[seedTrays[36]]]);
    const after = block(hf, sheet, "D2", 6, 1).map((r) => r[0]);
    expect(after).toEqual(engineOutlook(seedTrays.slice(0, 37)));
    expect(after).not.toEqual(before);
  });

  test("blank months inside the history are missing values, not errors (flower bulbs, 2023-05 to 2023-07)", () => {
    const bulbs = demo.columns[4].slice(0, 60);
    expect(bulbs.filter((v) => v === null).length).toBe(3); // the demo README's outage months
    const { hf, sheet } = workbook(rollingSheet(bulbs));
    expect(block(hf, sheet, "D2", 6, 1).map((r) => r[0])).toEqual(engineOutlook(bulbs));
  });

  test("the first rows of a rolling table say how much history is still needed (#N/A)", () => {
    const { hf, sheet } = workbook(rollingSheet(seedTrays.slice(0, 20)));
    const e = errorIn(hf, sheet, "D2");
    expect(e.type).toBe("NA");
    expect(e.message).toMatch(/^Needs \d+ values, has 20\b/);
  });
});

describe("product table: one formula, one outlook column per product", () => {
  // 20 invented products: the first 5 demo products at 4 scales (the demo data are invented too).
  const scales = [1, 0.5, 1.5, 2];
  const products = scales.flatMap((k) => demo.columns.slice(0, 5).map((col) => col.map((v) => (v === null ? null : v * k))));

  test("=EBB.AHEAD over 20 columns spills 20 columns, each the engine's forecast for its column", () => {
    expect(products).toHaveLength(20);
    const grid = gridFromColumns(products, 120); // rows 85..120 blank: room to grow
    grid[0][21] = "=EBB.AHEAD(A1:T120, 12, 6)"; // V1
    const { hf, sheet } = workbook(grid);
    const outlook = block(hf, sheet, "V1", 6, 21);
    products.forEach((col, c) => {
      expect(outlook.map((r) => r[c])).toEqual(Array.from(forecastModel(fitModel(col, { period: 12 }), 6)));
    });
    expect(outlook.map((r) => r[20])).toEqual([null, null, null, null, null, null]); // exactly 20 columns
  });

  test("a new product with too little history shows #N/A in its own column; the others still forecast", () => {
    const cols = products.map((c) => c.slice());
    cols[7] = cols[7].map((v, i) => (i < 20 ? v : null)); // product 8 launched recently: 20 months
    const grid = gridFromColumns(cols, 84);
    grid[0][21] = "=EBB.AHEAD(A1:T84, 12, 6)";
    const { hf, sheet } = workbook(grid);
    const outlook = block(hf, sheet, "V1", 6, 20);
    for (let r = 0; r < 6; r++) {
      const cell = outlook[r][7] as { type?: string; message?: string };
      expect(cell.type).toBe("NA");
      expect(cell.message).toMatch(/^Needs \d+ values, has 20\b/);
    }
    expect(outlook.map((r) => r[8])).toEqual(Array.from(forecastModel(fitModel(cols[8], { period: 12 }), 6)));
  });
});
