/**
 * The spreadsheet host's side: the generated wrappers in src/functions/functions.ts, called the
 * way the host calls them (ranges as any[][], blank cells as "" or null, omitted optional
 * arguments as null), with a stand-in for the host's CustomFunctions global. Expected values
 * come from the engine (the wrapper must reproduce it) or from DESIGN.md's error rules.
 */
import { fitModel, forecastModel, modelStates } from "../../src/engine";
import { CATALOG } from "../../src/functions/catalog";
import * as host from "../../src/functions/functions";
import { wrapperName } from "../../src/functions/generateHostFunctions";
import { readDemo } from "./support/demo";
import { FakeHostError, installFakeCustomFunctions } from "./support/fakeCustomFunctions";

installFakeCustomFunctions();

const demo = readDemo();
/** A column as the host hands it over: one cell per row, "" for a blank. */
const asColumn = (values: (number | null)[]) => values.map((v) => [v === null ? "" : v]);
const thrown = (f: () => unknown): FakeHostError => {
  try {
    f();
  } catch (e) {
    return e as FakeHostError;
  }
  throw new Error("expected the wrapper to throw a host error");
};

test("functions.ts exports one wrapper per catalog function, and nothing else", () => {
  expect(Object.keys(host).sort()).toEqual(CATALOG.map(wrapperName).sort());
});

test("EBB.AHEAD with trailing blanks and an omitted option returns the engine's forecasts", () => {
  const history = [...asColumn(demo.columns[1].slice(0, 40)), [""], [null]];
  const out = host.ahead(history, 12, 4, null as never, null as never);
  const expected = Array.from(forecastModel(fitModel(demo.columns[1].slice(0, 40), { period: 12 }), 4));
  expect(out).toEqual(expected.map((v) => [v]));
});

test("EBB.STATES writes a blank start window as empty strings", () => {
  const history = asColumn(demo.columns[0].slice(0, 36));
  const out = host.states(history, 12, 0.3, 0.1, 0.2);
  const t = modelStates(fitModel(demo.columns[0].slice(0, 36), { period: 12, alpha: 0.3, beta: 0.1, gamma: 0.2 }));
  expect(out[0]).toEqual(["", "", "", "", ""]);
  expect(out[30]).toEqual([t.level[30], t.trend[30], t.index[30], t.forecast[30], t.error[30]]);
});

test("not enough history: the formula fails with #N/A and says how many values are needed", () => {
  const e = thrown(() => host.ahead(asColumn(demo.columns[0].slice(0, 12)), 12, 6));
  expect(e).toBeInstanceOf(FakeHostError);
  expect(e.code).toBe("#N/A");
  expect(e.message).toMatch(/^Needs \d+ values, has 12\./);
});

test("a number stored as text fails the formula with #VALUE! naming the cell", () => {
  const history = asColumn(demo.columns[0].slice(0, 36));
  history[4] = ["123"];
  const e = thrown(() => host.fit(history, 12));
  expect(e.code).toBe("#VALUE!");
  expect(e.message).toMatch(/^Cell 5 of history is text "123"/);
});

test("in a product block, a failing series returns host errors in its own column only", () => {
  const rows = 36;
  const block = Array.from({ length: rows }, (_, r) => [demo.columns[0][r] as number, r < 10 ? (demo.columns[1][r] as number) : ""]);
  const out = host.ahead(block, 12, 3);
  expect(out.map((r) => typeof r[0])).toEqual(["number", "number", "number"]);
  for (const r of out) {
    expect(r[1]).toBeInstanceOf(FakeHostError);
    expect((r[1] as FakeHostError).code).toBe("#N/A");
  }
});

test("a scalar measure returns a plain number", () => {
  expect(host.mad([[10], [12], [8], [""]], [[11], [10], [8], [9]])).toBeCloseTo(1, 12); // (1 + 2 + 0) / 3
});

test("an unexpected failure inside becomes #VALUE! with a message, never a raw exception", () => {
  const exploding = new Proxy([], {
    get() {
      throw new Error("boom");
    },
  });
  const e = thrown(() => host.period([exploding as never]));
  expect(e).toBeInstanceOf(FakeHostError);
  expect(e.code).toBe("#VALUE!");
  expect(e.message).toMatch(/^Ebb could not compute this result \(boom\)\./);
});

describe("cells holding data types (objects, as the platform's data types page describes them)", () => {
  const history = () => asColumn(demo.columns[1].slice(0, 40));

  test("a formatted number or a double counts as its basic value", () => {
    const plain = host.ahead(history(), 12, 3);
    const typed = history();
    typed[5] = [{ type: "FormattedNumber", basicValue: typed[5][0], numberFormat: "#,##0" } as never];
    typed[6] = [{ type: "Double", basicValue: typed[6][0] } as never];
    expect(host.ahead(typed, 12, 3)).toEqual(plain);
    expect(host.ahead(history(), { type: "Double", basicValue: 12 }, 3)).toEqual(plain);
  });

  test("an entity gets a plain message naming the cell, not 'holds the error Entity'", () => {
    const typed = history();
    typed[7] = [{ type: "Entity", text: "Seed trays", properties: {} } as never];
    const e = thrown(() => host.fit(typed, 12));
    expect(e.code).toBe("#VALUE!");
    expect(e.message).toBe(
      "Cell 8 of history holds a data type (Entity), not a number. Put the number itself in the cell (or a formula that takes the number from it).",
    );
  });

  test("an error data type is named by its code", () => {
    const typed = history();
    typed[2] = [{ type: "Error", errorType: "Div0", basicValue: "#DIV/0!" } as never];
    const e = thrown(() => host.fit(typed, 12));
    expect(e.message).toMatch(/^Cell 3 of history holds the error #DIV\/0!\./);
  });
});
