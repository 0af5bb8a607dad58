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
