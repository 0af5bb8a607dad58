/**
 * Bad input never yields NaN, Infinity or an uncaught exception (DESIGN.md, "Worksheet
 * functions"): random ranges of numbers, blanks, text, booleans, error values, huge and tiny
 * values, zeros and negatives, with random scalar arguments, go to every function, through the
 * shared layer, the spreadsheet host's wrappers and the embedded formula engine. Every result
 * is a finite number, a word, a blank, or a host error (#VALUE! / #N/A) with a message.
 */
import { DetailedCellError } from "hyperformula";
import * as fc from "fast-check";
import { EbbError } from "../../src/engine";
import { CATALOG, type FunctionSpec, type ParamSpec } from "../../src/functions/catalog";
import { InputError } from "../../src/functions/cells";
import { callHost } from "../../src/functions/host";
import { invoke } from "../../src/functions/invoke";
import { setModelCache } from "../../src/functions/modelCache";
import { FakeHostError, installFakeCustomFunctions } from "./support/fakeCustomFunctions";
import { columnName, workbook } from "./support/workbook";

installFakeCustomFunctions();

const EXTREMES = [0, -0, -1, -250, 1e300, -1e300, 1e-300, 5e-324, Number.MAX_VALUE, 1e15];
const JUNK = ["abc", "12", "1,234", " ", "", true, false, null, new InputError("#N/A"), new InputError("#DIV/0!")];

const cell: fc.Arbitrary<unknown> = fc.oneof(
  { weight: 6, arbitrary: fc.integer({ min: 1, max: 5000 }) },
  { weight: 2, arbitrary: fc.double({ min: -1e6, max: 1e6, noNaN: true }) },
  { weight: 1, arbitrary: fc.constantFrom(...EXTREMES) },
  { weight: 2, arbitrary: fc.constantFrom(...JUNK) },
);

/** Positive seasonal data of n rows with a few cells replaced by anything: the fitting paths run too. */
const seasonalColumn = (n: number) =>
  fc
    .record({
      p: fc.integer({ min: 2, max: 6 }),
      base: fc.oneof(fc.double({ min: 1, max: 1e4, noNaN: true }), fc.constantFrom(1e-300, 1e300)),
      swaps: fc.array(fc.tuple(fc.nat(Math.max(0, n - 1)), cell), { maxLength: 3 }),
    })
    .map(({ p, base, swaps }) => {
      const col: unknown[] = Array.from({ length: n }, (_, t) => base * (1 + 0.5 * Math.sin((2 * Math.PI * t) / p)) + t);
      for (const [i, v] of swaps) col[i] = v;
      return col;
    });

/** A range of n rows: mostly one or two seasonal columns, sometimes a block of random cells. */
const range = (n: number): fc.Arbitrary<unknown[][]> =>
  fc.oneof(
    { weight: 3, arbitrary: fc.array(seasonalColumn(n), { minLength: 1, maxLength: 2 }) },
    { weight: 1, arbitrary: fc.integer({ min: 1, max: 3 }).chain((cols) => fc.array(fc.array(cell, { minLength: n, maxLength: n }), { minLength: cols, maxLength: cols })) },
  ).map((cols) => Array.from({ length: n }, (_, r) => cols.map((c) => c[r])));

/** Mostly a sensible value for the parameter, sometimes anything at all. */
const plausibleOrJunk = (plausible: unknown[]) =>
  fc.oneof(
    { weight: 4, arbitrary: fc.constantFrom(...plausible) },
    { weight: 1, arbitrary: fc.constantFrom(0, -1, 1.5, 2.5, 1e300, 1001, ...JUNK) },
  );

const PLAUSIBLE: Record<string, unknown[]> = {
  period: [0, null, 2, 3, 4, 12],
  horizon: [1, 2, 3, 6],
  alpha: [null, null, 0.3, 0, 1],
  beta: [null, null, 0.1, 0],
  gamma: [null, null, 0.2, 1],
  phi: [null, null, 0.9],
  coverage: [null, 0.8, 0.95],
  cycles: [null, 2, 3],
  origins: [null, 1, 3],
  level: [100, 0, -5, 1e-300],
  trend: [0, 2, -1],
  index: [1.1, 0.9, 0, -0.5],
  actual: [121, null, 0, -3],
  seasonality: [undefined, "multiplicative", "additive", "auto", "ADDITIVE"],
  trendWord: [undefined, "linear", "damped", "none", "auto"],
  start: [undefined, "decomposition", "classic", "optimized"],
};
const WORD_JUNK = ["bogus", 5, true, "", "multiplicitive"];

function argFor(p: ParamSpec, n: number): fc.Arbitrary<unknown> {
  if (p.kind === "range") return range(n);
  if (p.kind === "word") {
    const words = PLAUSIBLE[p.name === "trend" ? "trendWord" : p.name] ?? [undefined];
    return fc.oneof({ weight: 4, arbitrary: fc.constantFrom(...words) }, { weight: 1, arbitrary: fc.constantFrom(...WORD_JUNK) });
  }
  const plausible = PLAUSIBLE[p.name] ?? [null, 1];
  return plausibleOrJunk(p.optional ? plausible : plausible.filter((v) => v !== null));
}

/** Arguments for one call; the ranges share a row count (actual and forecast must match). */
const argsFor = (spec: FunctionSpec) =>
  fc.integer({ min: 1, max: 40 }).chain((n) => fc.tuple(...spec.params.map((p) => argFor(p, n))));

function checkEbbError(e: unknown): void {
  expect(e).toBeInstanceOf(EbbError);
  const err = e as EbbError;
  expect(["value", "na"]).toContain(err.kind);
  expect(err.message.length).toBeGreaterThan(10);
}

function checkCell(c: unknown): void {
  if (c === null || typeof c === "string") return;
  if (typeof c === "number") {
    expect(Number.isFinite(c)).toBe(true);
    return;
  }
  checkEbbError(c);
}

const RUNS = 25;

describe.each(CATALOG.map((spec) => [spec.name, spec] as const))("EBB.%s with random input", (_name, spec) => {
  test("the shared layer: a finite result or an error with a message", () => {
    fc.assert(
      fc.property(argsFor(spec), (args) => {
        const outcome = invoke(spec, args);
        if (!outcome.ok) return checkEbbError(outcome.error);
        if (typeof outcome.value === "number") expect(Number.isFinite(outcome.value)).toBe(true);
        else outcome.value.forEach((row) => row.forEach(checkCell));
      }),
      { numRuns: RUNS, seed: 20260101 },
    );
  });

  test("the model cache changes nothing: uncached, first cached and repeated cached outcomes are equal", () => {
    fc.assert(
      fc.property(argsFor(spec), (args) => {
        setModelCache(false);
        const uncached = invoke(spec, args);
        setModelCache(true);
        const first = invoke(spec, args);
        const again = invoke(spec, args);
        expect(first).toEqual(uncached);
        expect(again).toEqual(uncached);
      }),
      { numRuns: RUNS, seed: 20260102 },
    );
  });

  test("the host's wrappers: finite values, blanks as empty text, or host errors with a message", () => {
    fc.assert(
      fc.property(argsFor(spec), (args) => {
        let out: unknown;
        try {
          out = callHost(spec.name, args);
        } catch (e) {
          expect(e).toBeInstanceOf(FakeHostError);
          expect(["#VALUE!", "#N/A"]).toContain((e as FakeHostError).code);
          expect((e as FakeHostError).message?.length).toBeGreaterThan(10);
          return;
        }
        const cells = typeof out === "number" ? [out] : (out as unknown[][]).flat();
        for (const c of cells) {
          if (c instanceof FakeHostError) expect(c.message?.length).toBeGreaterThan(10);
          else if (typeof c === "number") expect(Number.isFinite(c)).toBe(true);
          else expect(typeof c).toBe("string");
        }
      }),
      { numRuns: RUNS, seed: 20260102 },
    );
  });
});

/** A random value written into a formula: numbers, words, blanks (empty argument), TRUE/FALSE, errors. */
function formulaText(v: unknown): string {
  if (v === null || v === undefined) return "";
  if (typeof v === "number") return Object.is(v, -0) ? "0" : String(v);
  if (typeof v === "boolean") return v ? "TRUE()" : "FALSE()";
  if (v instanceof InputError) return v.code === "#N/A" ? "NA()" : "1/0";
  return JSON.stringify(String(v));
}

/** A random cell written into a sheet. */
function sheetCell(v: unknown): unknown {
  if (v instanceof InputError) return v.code === "#N/A" ? "=NA()" : "=1/0";
  if (typeof v === "string" && v.trim() !== "" && Number.isFinite(Number(v.replace(/,/g, "")))) return `'${v}`;
  return v === undefined ? null : v;
}

test.each(CATALOG.map((spec) => [spec.name, spec] as const))("EBB.%s on the formula engine with random sheets", (_name, spec) => {
  fc.assert(
    fc.property(argsFor(spec), (args) => {
      // each range argument gets its own block of columns, the formula sits to the right of them
      const grid: unknown[][] = Array.from({ length: 40 }, () => []);
      let col = 0;
      const parts = args.map((a, i) => {
        if (spec.params[i].kind !== "range") return formulaText(a);
        const r = a as unknown[][];
        r.forEach((row, y) => row.forEach((v, x) => (grid[y][col + x] = sheetCell(v))));
        const ref = `${columnName(col)}1:${columnName(col + r[0].length - 1)}${r.length}`;
        col += r[0].length;
        return ref;
      });
      const formulaCol = col + 1;
      grid[0][formulaCol] = `=EBB.${spec.name}(${parts.join(", ")})`;
      const width = Math.max(...grid.map((r) => r.length));
      const { hf, sheet } = workbook(grid.map((r) => Array.from({ length: width }, (_, i) => (r[i] ?? null) as never)));
      const values = hf.getSheetValues(sheet);
      for (const row of values) {
        for (const v of row.slice(formulaCol)) {
          if (v instanceof DetailedCellError) {
            expect(["VALUE", "NA"]).toContain(v.type);
            expect(v.message.length).toBeGreaterThan(10);
          } else if (typeof v === "number") expect(Number.isFinite(v)).toBe(true);
          else expect(v === null || typeof v === "string").toBe(true);
        }
      }
      hf.destroy();
    }),
    { numRuns: 12, seed: 20260103 },
  );
});
