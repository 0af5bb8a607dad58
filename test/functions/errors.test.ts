/**
 * Every bad-input case of DESIGN.md's "Worksheet functions" shows the intended error and a
 * message that says what is wrong and what to do, on the embedded formula engine: #VALUE! for
 * text or booleans in a numeric range, unknown option words, non-positive values with
 * multiplicative seasonality, constants outside [0, 1]; #N/A for "not enough history yet".
 */
import { readDemo } from "./support/demo";
import { createEbbWorkbook } from "../../src/functions/hyperformula";
import { block, type Cell, errorIn, gridFromColumns, workbook } from "./support/workbook";

const seed = readDemo().columns[0].slice(0, 36) as Cell[];

/** A sheet with the history in column A (36 demo values unless given) and the formula in C1. */
function evaluate(formula: string, history: Cell[] = seed, extra: Cell[][] = []): ReturnType<typeof workbook> {
  const grid = gridFromColumns([history, ...extra], Math.max(history.length, ...extra.map((c) => c.length)));
  grid[0][1 + extra.length + 1] = formula;
  return workbook(grid);
}

const withCell = (i: number, v: Cell): Cell[] => seed.map((x, j) => (j === i ? v : x));
const at = (formula: string, history?: Cell[]) => {
  const w = evaluate(formula, history);
  return errorIn(w.hf, w.sheet, "C1");
};

interface Case {
  what: string;
  formula: string;
  history?: Cell[];
  type: "VALUE" | "NA";
  message: RegExp;
}

const cases: Case[] = [
  {
    what: "a number stored as text, named by its cell",
    formula: "=EBB.AHEAD(A1:A36, 12, 6)",
    history: withCell(4, "'123"),
    type: "VALUE",
    message: /^A5 is text "123", a number stored as text\. Retype it as a number/,
  },
  {
    what: "a word in the history",
    formula: "=EBB.FIT(A1:A36, 12)",
    history: withCell(6, "n/a"),
    type: "VALUE",
    message: /^A7 holds text "n\/a"\. Use numbers only; leave a cell blank for a missing value\.$/,
  },
  {
    what: "a heading inside the range",
    formula: "=EBB.AHEAD(A1:A36, 12, 6)",
    history: withCell(0, "Seed trays"),
    type: "VALUE",
    message: /If it is a heading, start the range one cell later\./,
  },
  {
    what: "TRUE in the history",
    formula: "=EBB.STATES(A1:A36, 12)",
    history: withCell(2, true),
    type: "VALUE",
    message: /^A3 holds TRUE, not a number\./,
  },
  {
    what: "an error value in the history",
    formula: "=EBB.AHEAD(A1:A36, 12, 6)",
    history: withCell(3, "=1/0"),
    type: "VALUE",
    message: /^A4 holds the error #DIV\/0!\. Fix that cell/,
  },
  {
    what: "#N/A in the history stays #N/A",
    formula: "=EBB.AHEAD(A1:A36, 12, 6)",
    history: withCell(3, "=NA()"),
    type: "NA",
    message: /^A4 holds the error #N\/A\./,
  },
  {
    what: "an unknown seasonality word lists the accepted words",
    formula: '=EBB.AHEAD(A1:A36, 12, 6, "multiplicitive")',
    type: "VALUE",
    message: /^Unknown seasonality "multiplicitive"\. Use one of: multiplicative, additive, auto\.$/,
  },
  {
    what: "an unknown trend word",
    formula: '=EBB.FIT(A1:A36, 12, , "straight")',
    type: "VALUE",
    message: /^Unknown trend "straight"\. Use one of: linear, damped, none, auto\.$/,
  },
  {
    what: "an unknown start word",
    formula: '=EBB.STATES(A1:A36, 12, , , , , , , "best")',
    type: "VALUE",
    message: /^Unknown start "best"\. Use one of: decomposition, classic, optimized\.$/,
  },
  {
    what: "a zero with multiplicative seasonality",
    formula: "=EBB.AHEAD(A1:A36, 12, 6)",
    history: withCell(9, 0),
    type: "VALUE",
    // The engine says which value; the formula engine knows the range, so the message names the cell.
    message: /^A10: Value 10 of the history is 0: multiplicative seasonality needs every actual above 0\. Use additive seasonality, or correct the value\./,
  },
  {
    what: "a smoothing constant above 1",
    formula: "=EBB.STATES(A1:A36, 12, 1.5)",
    type: "VALUE",
    message: /^alpha must be a number from 0 to 1; got 1\.5\. Leave it blank to fit it\.$/,
  },
  {
    what: "a negative smoothing constant in EBB.STEP",
    formula: "=EBB.STEP(100, 2, 1.1, 121, 0.5, -0.2, 0.3)",
    type: "VALUE",
    message: /^beta must be a number from 0 to 1; got -0\.2/,
  },
  {
    what: "a coverage typed as text",
    formula: '=EBB.BAND(A1:A36, 12, 6, "abc")',
    type: "VALUE",
    message: /^Coverage must be a number; got the text "abc"\. Type a fraction such as 0\.95 or a percent such as 95, or leave it blank for 95%\.$/,
  },
  {
    what: "a service level typed as text (the argument named in words)",
    formula: '=EBB.BUFFER(A1:A36, 12, 3, "high")',
    type: "VALUE",
    message: /^Service level must be a number; got the text "high"\. Type the cycle service level, for example 0\.95\.$/,
  },
  {
    what: "not enough history yet",
    formula: "=EBB.AHEAD(A1:A36, 12, 6)",
    history: seed.slice(0, 15),
    type: "NA",
    message: /^Needs \d+ values, has 15\./,
  },
  {
    what: "a horizon of 0",
    formula: "=EBB.AHEAD(A1:A36, 12, 0)",
    type: "VALUE",
    message: /^The horizon must be a whole number of periods from 1 to 1000; got 0\.$/,
  },
  {
    what: "a missing horizon",
    formula: "=EBB.AHEAD(A1:A36, 12)",
    type: "VALUE",
    message: /^Horizon is missing\. Type how many periods ahead to forecast/,
  },
  {
    what: "a season length stored as text",
    formula: '=EBB.AHEAD(A1:A36, "12", 6)',
    type: "VALUE",
    message: /^Period is text "12", a number stored as text\. Type it as a number\.$/,
  },
  {
    what: "a fractional season length",
    formula: "=EBB.FIT(A1:A36, 2.5)",
    type: "VALUE",
    message: /^The season length must be a whole number from 1 to 366 \(0 to detect it\); got 2\.5\.$/,
  },
  {
    what: "a range where one value belongs",
    formula: "=EBB.AHEAD(A1:A36, A1:A2, 6)",
    type: "VALUE",
    message: /^Period must be a single value, not a range of 2 x 1 cells\.$/,
  },
  {
    what: "phi with a linear trend",
    formula: '=EBB.AHEAD(A1:A36, 12, 6, , "linear", , , , 0.9)',
    type: "VALUE",
    message: /^phi applies only to a damped trend; the trend is linear\./,
  },
  {
    what: "coverage of 100 percent (an unbounded interval)",
    formula: "=EBB.BAND(A1:A36, 12, 6, 100)",
    type: "VALUE",
    message: /^Coverage must be a fraction above 0 and below 1 \(such as 0\.95\) or a percentage above 1 and below 100 \(such as 95\); got 100\.$/,
  },
  {
    what: '"auto" where one given state is updated',
    formula: '=EBB.STEP(100, 2, 1.1, 121, 0.5, 0.2, 0.3, "auto")',
    type: "VALUE",
    message: /^Seasonality "auto" chooses between fitted models; here type multiplicative or additive\.$/,
  },
  {
    what: "a missing smoothing constant in EBB.STEP",
    formula: "=EBB.STEP(100, 2, 1.1, 121, , 0.2, 0.3)",
    type: "VALUE",
    message: /^alpha is missing\. Type the smoothing constant, a number from 0 to 1\.$/,
  },
  {
    what: "a zero index with multiplicative seasonality in EBB.STEP",
    formula: "=EBB.STEP(100, 2, 0, 121, 0.5, 0.2, 0.3)",
    type: "VALUE",
    message: /^The index is 0: multiplicative seasonality needs it above 0\./,
  },
  {
    what: "a blank seasonal index in EBB.PROJECT",
    formula: "=EBB.PROJECT(100, 2, A1:A3, 3)",
    history: [0.9, null, 1.1],
    type: "VALUE",
    message: /^Cell 2 of indices is blank\. Give all of the last p seasonal indices, oldest first\.$/,
  },
  {
    what: "no season found for EBB.INDICES",
    formula: "=EBB.INDICES(A1:A36, 0)",
    history: seed.map((_, i) => 100 + 2 * i),
    type: "VALUE",
    message: /^No season length was found in history .* Type the season length, for example 12 for monthly data\.$/,
  },
  {
    what: "an empty history",
    formula: "=EBB.PERIOD(A1:A36)",
    history: seed.map(() => null),
    type: "NA",
    message: /^The history range has no values yet\. Type some actuals, oldest first\.$/,
  },
  {
    what: "MAPE with an actual of 0",
    formula: "=EBB.MAPE(A1:A3, A1:A3)",
    history: [5, 0, 7],
    type: "VALUE",
    message: /^A2: MAPE is undefined when an actual is 0 \(cell 2 of the actual range\)/,
  },
  {
    what: "actual and forecast of different sizes",
    formula: "=EBB.MAD(A1:A3, A1:A2)",
    history: [5, 6, 7],
    type: "VALUE",
    message: /the actual and forecast ranges must have the same number of cells \(actual has 3, forecast has 2\)/,
  },
  {
    what: "a block where one series belongs",
    formula: "=EBB.MAD(A1:B3, A1:B3)",
    history: [5, 6, 7],
    type: "VALUE",
    message: /^The actual range must be a single column or a single row; it has 2 columns\.$/,
  },
  {
    what: "an error typed as an argument",
    formula: "=EBB.AHEAD(A1:A36, 1/0, 6)",
    type: "VALUE",
    message: /^Period holds the error #DIV\/0!\. Fix that cell/,
  },
  {
    what: "too many arguments",
    formula: "=EBB.MAD(A1:A3, A1:A3, 1)",
    history: [5, 6, 7],
    type: "VALUE",
    message: /^EBB\.MAD takes at most 2 arguments \(actual, forecast\); it was given 3\.$/,
  },
  {
    what: "a horizon from a cell in a workbook that reserves the spill on entry",
    formula: "=EBB.AHEAD(A1:A36, 12, A1)",
    history: withCell(0, 6),
    type: "VALUE",
    message: /Type the horizon \(and the season length\) as plain numbers in the formula, not as cell references\.$/,
  },
];

describe.each(cases)("$what", ({ formula, history, type, message }) => {
  test(`${formula} -> #${type === "NA" ? "N/A" : "VALUE!"}`, () => {
    const e = at(formula, history);
    expect(e.type).toBe(type);
    expect(e.message).toMatch(message);
  });
});

test("option words are case-insensitive", () => {
  const w = evaluate('=EBB.AHEAD(A1:A36, 12, 3, "ADDITIVE", " Damped ")');
  expect(block(w.hf, w.sheet, "C1", 3, 1).every(([v]) => typeof v === "number")).toBe(true);
});

test("in a block, a bad cell fails only its own column, and the message names the column", () => {
  const bad = withCell(4, "'123");
  const w = evaluate("=EBB.AHEAD(A1:B36, 12, 6)", seed, [bad]);
  const out = block(w.hf, w.sheet, "D1", 6, 2);
  expect(out.every((r) => typeof r[0] === "number")).toBe(true);
  const e = errorIn(w.hf, w.sheet, "E1");
  expect(e.type).toBe("VALUE");
  expect(e.message).toMatch(/^B5 is text "123", a number stored as text\./);
});

test("EBB.ACCURACY shows an undefined measure as that cell's error and keeps the others", () => {
  const w = evaluate("=EBB.ACCURACY(A1:A3, B1:B3)", [5, 0, 7], [[6, 1, 7]]);
  const rows = block(w.hf, w.sheet, "D1", 8, 2);
  const mape = rows.findIndex((r) => r[0] === "MAPE (%)");
  expect(mape).toBeGreaterThan(0);
  expect(errorIn(w.hf, w.sheet, `E${mape + 1}`).message).toMatch(/^MAPE is undefined when an actual is 0/);
  expect(typeof rows[0][1]).toBe("number");
});

test("a history on another sheet is named with its sheet: Sales!B86", () => {
  const hf = createEbbWorkbook({ Sales: gridFromColumns([[], [...seed.slice(0, 30), "oops", ...seed.slice(31)]], 36) as never, Plan: [["=EBB.AHEAD(Sales!B1:B36, 12, 6)"]] }, { smartRounding: false });
  const e = errorIn(hf, hf.getSheetId("Plan")!, "A1");
  expect(e.type).toBe("VALUE");
  expect(e.message).toMatch(/^Sales!B31 holds text "oops"\./);
});
