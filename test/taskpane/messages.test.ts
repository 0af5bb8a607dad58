/**
 * The panel names the cell a planner sees when the engine says which value of the history a
 * message is about (Sales!C86, not "value 85"). Expected text: the address this test computes
 * from where it put the history.
 */
import { describeLedger } from "../../src/ledger";
import { messageOf } from "../../src/taskpane/panel/messages";
import { demoSeries } from "../ledger/support/cases";

test("a zero in a multiplicative history is named by its cell on the history's sheet", () => {
  const history = demoSeries("Hose reels").slice();
  history[84 - 1] = 0; // period 84, in row 85 below the header row
  let thrown: unknown;
  try {
    describeLedger({ history, settings: { period: 12, seasonality: "multiplicative" }, horizon: 6, coverage: 0.9, anchor: { sheet: "L", cell: "A1" } });
  } catch (e) {
    thrown = e;
  }
  expect(messageOf(thrown, { sheet: "Sales", col: 2, firstRow: 1 })).toMatch(/^Sales!C85: Value 84 of the history is 0: multiplicative/);
  // Without the history's place the message keeps its position.
  expect(messageOf(thrown)).toMatch(/^Value 84 of the history is 0/);
});
