/**
 * The first state of a rolling table and periods that do not fit the history.
 * An empty history is "not yet" (#N/A, as a planner's own lookups show it), never #VALUE!;
 * a period longer than half the history (two full seasons are needed, common practice for
 * classical decomposition) is refused before any spill area is reserved for it.
 */
import { block, errorIn, workbook } from "./support/workbook";

const blank = (rows: number) => Array.from({ length: rows }, () => [null, null, null] as (number | string | null)[]);

describe("an empty history", () => {
  const formulas = [
    "=EBB.AHEAD(S!A1:A1, 12, 6)",
    "=EBB.AHEAD(A1:A24, 12, 6)",
    "=EBB.FIT(A1:A24)",
    "=EBB.INDICES(A1:A24, 12)",
    "=EBB.MAD(A1:A24, B1:B24)",
    "=EBB.RMSE(A1:A1, B1:B1)",
    "=EBB.MAPE(A1:A24, B1:B24)",
    "=EBB.BIAS(A1:A24, B1:B24)",
    "=EBB.MASE(A1:A24, B1:B24, A1:A24, 12)",
    "=EBB.TRACKING(A1:A24, B1:B24)",
    "=EBB.BAND(A1:A24, 12, 6)",
  ];
  it.each(formulas)("%s is #N/A: no values yet", (formula) => {
    const grid = blank(30);
    grid[0][2] = formula;
    const { hf, sheet } = workbook(grid);
    const e = errorIn(hf, sheet, "C1");
    expect(e.type).toBe("NA");
    expect(e.message).toMatch(/no values yet/);
  });

  it("still says a range is missing when it is left out", () => {
    const grid = blank(3);
    grid[0][2] = "=EBB.MAD(, B1:B2)";
    const { hf, sheet } = workbook(grid);
    expect(errorIn(hf, sheet, "C1")).toEqual({ type: "VALUE", message: expect.stringMatching(/actual range is missing/) });
  });
});

describe("a period that does not fit the history", () => {
  const history = Array.from({ length: 48 }, (_, i) => 100 + 10 * Math.sin((2 * Math.PI * i) / 12));

  it.each(["400", "1e9", "25"])("EBB.INDICES(A1:A48, %s) shows its message, not #SPILL!, with something typed below it", (p) => {
    const grid = history.map((v) => [v, null, null] as (number | string | null)[]);
    grid[0][2] = `=EBB.INDICES(A1:A48, ${p})`;
    grid[30][2] = "a note typed below"; // C31, inside a 400-row spill area
    const { hf, sheet } = workbook(grid);
    const e = errorIn(hf, sheet, "C1");
    expect(e.type).not.toBe("SPILL");
    expect(e.message).toMatch(/period|season|history/i);
    expect(hf.getSheetDimensions(sheet).height).toBeLessThanOrEqual(48);
  });

  it("a period that fits still spills its indices", () => {
    const grid = history.map((v) => [v, null, null] as (number | string | null)[]);
    grid[0][2] = "=EBB.INDICES(A1:A48, 12)";
    const { hf, sheet } = workbook(grid);
    const indices = block(hf, sheet, "C1", 12, 1).map((r) => r[0] as number);
    // Multiplicative indices average 1 over a season (definition of the normalised index).
    expect(indices.reduce((a, b) => a + b, 0) / 12).toBeCloseTo(1, 9);
  });

  it("EBB.INIT with a period of 1e9 does not grow the sheet", () => {
    const grid = history.map((v) => [v, null, null] as (number | string | null)[]);
    grid[0][2] = "=EBB.INIT(A1:A48, 1e9)";
    const { hf, sheet } = workbook(grid);
    expect(errorIn(hf, sheet, "C1").type).toBe("VALUE");
    expect(hf.getSheetDimensions(sheet).height).toBeLessThanOrEqual(48);
  });
});
