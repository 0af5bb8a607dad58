/**
 * The outlook's "Trend multiplier" note in a ledger without a trend says that the trend it
 * multiplies is 0, so a reader does not look for a trend that the model does not have. The
 * check that the note is true is made in the workbook itself: the "Trend then" cell evaluates
 * to 0 and every forecast equals the level then plus the seasonal index used (additive
 * seasonality, by the no-trend forecast formula: Hyndman, Koehler, Ord & Snyder 2008, table 2.1).
 */
import { demoSeries } from "./support/cases";
import { ledgerInHyperFormula } from "./support/hf";

function outlook(trend: "none" | "damped") {
  const input = {
    history: demoSeries("Bird feed"),
    name: "Bird feed",
    settings: { period: 12, seasonality: "additive" as const, trend },
    horizon: 6,
    coverage: 0.9,
    anchor: { sheet: "Outlook", cell: "A1" },
  };
  const { desc, value } = ledgerInHyperFormula(input);
  const header = (label: string) => desc.cells.find((c) => c.value === label && c.note !== undefined)!;
  const below = (label: string, k = 1) => desc.cells.find((c) => c.col === header(label).col && c.row === header(label).row + k)!;
  return { header, below, value };
}

test("without a trend the multiplier's note says the trend it multiplies is 0, and the workbook agrees", () => {
  const { header, below, value } = outlook("none");
  expect(header("Trend multiplier").note).toMatch(/no trend: the trend it multiplies is 0/);
  expect(value(below("Trend then").address)).toBe(0);
  const level = value(below("Level then").address) as number;
  for (let k = 1; k <= 6; k++) {
    const forecast = value(below("Forecast", k).address) as number;
    const index = value(below("Seasonal index used", k).address) as number;
    expect(forecast).toBeCloseTo(level + index, 6); // HyperFormula returns values rounded near the 10th digit
  }
});

test("with a trend the note keeps the general wording, without the no-trend remark", () => {
  const { header } = outlook("damped");
  expect(header("Trend multiplier").note).toMatch(/phi \+ phi\^2/);
  expect(header("Trend multiplier").note).not.toMatch(/no trend/);
});
