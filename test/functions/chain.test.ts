/**
 * The recursion cell by cell: a column of =EBB.STEP(...) formulas started from =EBB.INIT(...)
 * reproduces =EBB.STATES(...) for the same constants; and single steps and projections checked
 * against hand calculations from DESIGN.md's formulas (Holt 1957 / Winters 1960 recursions).
 */
import { readDemo } from "./support/demo";
import { block, type Cell, gridFromColumns, workbook } from "./support/workbook";

const ALPHA = 0.25;
const BETA = 0.05;
const GAMMA = 0.3;
const P = 12;
const N = 60;
const WINDOW = 2 * P; // the decomposition start's default window: two seasons (DESIGN.md, Starts)

function close(a: unknown, b: unknown): boolean {
  if (a === null || b === null) return a === b;
  return typeof a === "number" && typeof b === "number" && Math.abs(a - b) <= 1e-9 * Math.max(1, Math.abs(b));
}

test("a chain of EBB.STEP from EBB.INIT reproduces EBB.STATES to 1e-9, blank months included", () => {
  // Flower bulbs (invented demo data): months 53-55 are blank, inside the update window.
  const bulbs = readDemo().columns[4].slice(0, N);
  expect(bulbs.slice(52, 55)).toEqual([null, null, null]);
  const grid: Cell[][] = gridFromColumns([bulbs], N);
  const k = `${ALPHA}, ${BETA}, ${GAMMA}`;
  grid[0][2] = `=EBB.INIT(A1:A${N}, ${P})`; // C1: level, C2: trend, C3:C14 indices
  grid[0][12] = `=EBB.STATES(A1:A${N}, ${P}, ${k})`; // M1:Q60
  for (let t = WINDOW + 1; t <= N; t++) {
    const level = t === WINDOW + 1 ? "C1" : `E${t - 1}`;
    const trend = t === WINDOW + 1 ? "C2" : `F${t - 1}`;
    // the index of the same season one season back: from INIT for the first season, then from the chain
    const index = t <= WINDOW + P ? `C${2 + (t - WINDOW)}` : `G${t - P}`;
    grid[t - 1][4] = `=EBB.STEP(${level}, ${trend}, ${index}, A${t}, ${k})`; // E:I
  }
  const { hf, sheet } = workbook(grid);
  const chain = block(hf, sheet, "E1", N, 5);
  const states = block(hf, sheet, "M1", N, 5);
  for (let t = 1; t <= N; t++) {
    for (let c = 0; c < 5; c++) {
      const expected = states[t - 1][c];
      if (t <= WINDOW) expect(expected).toBeNull(); // blank in the start window
      else if (!close(chain[t - 1][c], expected)) {
        throw new Error(`period ${t}, column ${c + 1}: STEP ${chain[t - 1][c]} vs STATES ${expected}`);
      }
    }
  }
  // the blank months: forecast present, error blank, on both sides
  expect(states[53][3]).not.toBeNull();
  expect(states[53][4]).toBeNull();
  expect(chain[53][4]).toBeNull();
});

describe("hand calculations", () => {
  test("EBB.STEP, multiplicative: level 100, trend 2, index 1.1, actual 121, alpha .5, beta .2, gamma .3", () => {
    // forecast = (100 + 2) * 1.1 = 112.2; error = 121 - 112.2 = 8.8
    // level = .5 * 121 / 1.1 + .5 * 102 = 55 + 51 = 106
    // trend = .2 * (106 - 100) + .8 * 2 = 2.8
    // index = .3 * 121 / 106 + .7 * 1.1 = 1.112452830188679
    const { hf, sheet } = workbook([["=EBB.STEP(100, 2, 1.1, 121, 0.5, 0.2, 0.3)"]]);
    const [row] = block(hf, sheet, "A1", 1, 5) as number[][];
    const expected = [106, 2.8, (0.3 * 121) / 106 + 0.77, 112.2, 8.8];
    row.forEach((v, i) => expect(v).toBeCloseTo(expected[i], 12));
  });

  test("EBB.STEP, additive with damping phi .9 and a blank actual: the state carries forward", () => {
    // no actual: level = 100 + .9 * 2 = 101.8; trend = .9 * 2 = 1.8; index unchanged 5;
    // forecast = 101.8 + 5 = 106.8; error blank
    const { hf, sheet } = workbook([[null, '=EBB.STEP(100, 2, 5, A1, 0.5, 0.2, 0.3, "additive", 0.9)']]);
    const [row] = block(hf, sheet, "B1", 1, 5);
    expect(row[0]).toBeCloseTo(101.8, 12);
    expect(row[1]).toBeCloseTo(1.8, 12);
    expect(row[2]).toBe(5);
    expect(row[3]).toBeCloseTo(106.8, 12);
    expect(row[4]).toBeNull();
  });

  test("EBB.PROJECT: level 106, trend 2.8, indices .9 and 1.1", () => {
    // h1 = (106 + 2.8) * .9 = 97.92; h2 = (106 + 5.6) * 1.1 = 122.76; h3 = (106 + 8.4) * .9 = 102.96
    const { hf, sheet } = workbook([[0.9, "=EBB.PROJECT(106, 2.8, A1:A2, 3)"], [1.1, null]]);
    const out = block(hf, sheet, "B1", 3, 1).map((r) => r[0] as number);
    [97.92, 122.76, 102.96].forEach((v, i) => expect(out[i]).toBeCloseTo(v, 10));
  });

  test("EBB.PROJECT with damping phi .8 (Gardner & McKenzie 1985): trend weights .8, .8+.64", () => {
    // h1 = (106 + .8 * 2.8) * .9 = 97.416; h2 = (106 + 1.44 * 2.8) * 1.1 = 121.0352
    const { hf, sheet } = workbook([[0.9, '=EBB.PROJECT(106, 2.8, A1:A2, 2, "multiplicative", 0.8)'], [1.1, null]]);
    const out = block(hf, sheet, "B1", 2, 1).map((r) => r[0] as number);
    expect(out[0]).toBeCloseTo(97.416, 10);
    expect(out[1]).toBeCloseTo(121.0352, 10);
  });

  test("EBB.INDICES by classical decomposition: 1,2,3,1,2,3 with season 3 gives .5, 1, 1.5", () => {
    // centred moving average of order 3 is 2 at periods 2..5; ratios y/MA: period 2: 1, 3: 1.5,
    // 4: .5, 5: 1; per position (1st, 2nd, 3rd of the season): .5, 1, 1.5; mean 1, so normalised as is.
    const { hf, sheet } = workbook([[1, 2, 3, 1, 2, 3, "=EBB.INDICES(A1:F1, 3)"]]);
    const out = block(hf, sheet, "G1", 3, 1).map((r) => r[0] as number);
    [0.5, 1, 1.5].forEach((v, i) => expect(out[i]).toBeCloseTo(v, 12));
  });

  test("EBB.PERIOD finds the length of a repeating pattern, and 1 for a straight line", () => {
    const pattern = Array.from({ length: 24 }, (_, i) => [5, 9, 2, 7][i % 4]);
    const line = Array.from({ length: 24 }, (_, i) => 10 + 3 * i);
    const grid = gridFromColumns([pattern, line], 24);
    grid[0][3] = "=EBB.PERIOD(A1:B24)";
    const { hf, sheet } = workbook(grid);
    expect(block(hf, sheet, "D1", 1, 2)).toEqual([[4, 1]]);
  });
});
