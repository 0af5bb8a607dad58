/**
 * Input coercion, as DESIGN.md describes a practitioner's sheet: a column or a row is one
 * series, a block one series per column; blank cells are missing; text, TRUE/FALSE and error
 * values are refused naming the cell; a blank scalar is "omitted".
 */
import { EbbError } from "../../src/engine";
import { InputError } from "../../src/functions/cells";
import { looksNumeric, optionalNumberArg, readOneSeries, readSeries } from "../../src/functions/coerce";

test("a column is one series, a row is one series, a block is one series per column", () => {
  expect(readSeries([[1], [2], [3]], "history")).toEqual([{ values: [1, 2, 3], label: "history" }]);
  expect(readSeries([[1, 2, 3]], "history")).toEqual([{ values: [1, 2, 3], label: "history" }]);
  expect(readSeries([[1, 4], [2, 5]], "history")).toEqual([
    { values: [1, 2], label: "column 1 of history" },
    { values: [4, 5], label: "column 2 of history" },
  ]);
  expect(readSeries(7, "history")).toEqual([{ values: [7], label: "history" }]);
});

test('blank cells ("", null, spaces) are missing values', () => {
  expect(readOneSeries([[1], [""], [null], ["  "], [5]], "history").values).toEqual([1, null, null, null, 5]);
});

test("a bad cell stops only its own series, with a message naming the cell and the column", () => {
  const [first, second] = readSeries([[1, 1], [2, true], [3, 3]], "history");
  expect(first).toEqual({ values: [1, 2, 3], label: "column 1 of history" });
  expect(second).toBeInstanceOf(EbbError);
  expect((second as EbbError).message).toBe("Cell 2 of column 2 of history holds TRUE, not a number. Use numbers only; leave a cell blank for a missing value.");
});

test("an error value keeps #N/A as #N/A and turns others into #VALUE!", () => {
  const [na] = readSeries([[1], [new InputError("#N/A")]], "history");
  const [div] = readSeries([[1], [new InputError("#DIV/0!")]], "history");
  expect((na as EbbError).kind).toBe("na");
  expect((div as EbbError).kind).toBe("value");
});

test("numbers stored as text are recognised as such", () => {
  for (const t of ["12", " 1,234 ", "$300", "7%", "-0.5", "1e3"]) expect(looksNumeric(t)).toBe(true);
  for (const t of ["n/a", "Seed trays", "", "12 units"]) expect(looksNumeric(t)).toBe(false);
});

test("scalars: blank means omitted, a one-cell range is its cell, text and TRUE are refused", () => {
  expect(optionalNumberArg(null, "alpha")).toBeUndefined();
  expect(optionalNumberArg("", "alpha")).toBeUndefined();
  expect(optionalNumberArg([[0.3]], "alpha")).toBe(0.3);
  expect(() => optionalNumberArg("0.3", "alpha")).toThrow('Alpha is text "0.3", a number stored as text. Type it as a number.');
  expect(() => optionalNumberArg(true, "alpha")).toThrow("Alpha must be a number; got TRUE.");
});
