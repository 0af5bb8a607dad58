/**
 * A ledger whose outlook falls below zero on a history of positive figures carries a caution the
 * panel shows after writing (the ledger is still written as asked). Invented data: the first nine
 * months of the demo's rain barrels, a rising spring, with a linear trend and no season; and the
 * whole of seed trays, whose outlook stays positive. Expected: the sign of the engine's outlook,
 * read from the ledger's own outlook cells here.
 */
import { describeLedger } from "../../src/ledger";
import { demoSeries } from "./support/cases";

const anchor = { sheet: "Ledger", cell: "A1" };
const outlookOf = (d: ReturnType<typeof describeLedger>) =>
  d.layout.outlook.rows.map((r) => d.cells.find((c) => c.address === r.forecast)!.value as number);

test("an outlook below zero on positive actuals is cautioned, naming when and the fitted constants", () => {
  const d = describeLedger({ history: demoSeries("Rain barrels").slice(0, 9), name: "Rain barrels", settings: { period: 1, trend: "linear" }, horizon: 12, coverage: 0.95, anchor });
  const outlook = outlookOf(d);
  const first = outlook.findIndex((v) => v < 0) + 1;
  expect(first).toBeGreaterThan(0);
  expect(d.cautions).toHaveLength(1);
  expect(d.cautions[0]).toContain(`below zero from ${first} periods ahead`);
  expect(d.cautions[0]).toMatch(/alpha \d\.\d{4}, beta \d\.\d{4}, fitted on \d+ errors\). Review it before it feeds orders/);
});

test("a steady outlook carries no caution", () => {
  const d = describeLedger({ history: demoSeries("Seed trays"), name: "Seed trays", settings: { period: 12 }, horizon: 12, coverage: 0.95, anchor });
  expect(outlookOf(d).every((v) => v > 0)).toBe(true);
  expect(d.cautions).toEqual([]);
});

test("an interval on no more errors than estimated quantities is cautioned; its t cell is qt(0.975, 1)", () => {
  // 36 months with additive seasonality and a linear trend: the first two seasons start
  // the model, leaving 12 one-step errors for 2 + 2 + 12 = 16 estimated quantities.
  const short = describeLedger({ history: demoSeries("Seed trays").slice(0, 36), name: "Seed trays", settings: { period: 12, seasonality: "additive", trend: "linear" }, horizon: 12, coverage: 0.95, anchor });
  expect(short.cautions.filter((c) => c.includes("interval rests on 12 one-step errors for the 16 quantities"))).toHaveLength(1);
  expect(short.cautions.join(" ")).toContain("Add history, or choose a simpler model");
  // The quantile the ledger writes: Student t on max(1, 12 - 16) = 1 degree; base R 4.2: qt(0.975, 1) = 12.7062047361747.
  const tCell = short.cells.find((c) => typeof c.formula === "string" && c.formula.includes("T.INV("))!;
  expect(tCell.value as number).toBeCloseTo(12.7062047361747, 10);
  // Two more years: 36 errors for 16 quantities, no caution.
  const longer = describeLedger({ history: demoSeries("Seed trays").slice(0, 60), name: "Seed trays", settings: { period: 12, seasonality: "additive", trend: "linear" }, horizon: 12, coverage: 0.95, anchor });
  expect(longer.cautions).toEqual([]);
});
