/**
 * The README's worked EBB.BAND and EBB.BUFFER examples are what the functions give on the
 * preview's demo workbook (invented data): each figure the README prints, to the one decimal it
 * prints. The formulas are typed on a scratch sheet with the README's ranges on Sales (and the
 * Corrections sheet's correction column for EBB.CORRECTED). A change that moves a figure fails
 * here until the README is rerun.
 */
import { readFileSync } from "fs";
import { join } from "path";
import { DEMO_CSV_PATH, DEMO_NOTICE } from "../../src/preview/demo/generate-demo";
import { CORRECTIONS_LAYOUT, CORRECTIONS_SHEET } from "../../src/preview/workbook/correctionsSheet";
import { openDemoWorkbook } from "../../src/preview/workbook/openWorkbook";

const README = readFileSync(join(__dirname, "../../README.md"), "utf8").split(/\r?\n/);
const { workbook } = openDemoWorkbook(readFileSync(DEMO_CSV_PATH, "utf8"), DEMO_NOTICE);
const hf = workbook.hf;
hf.addSheet("Check");
const check = hf.getSheetId("Check")!;
const corrections = `${CORRECTIONS_SHEET}!${String.fromCharCode(65 + CORRECTIONS_LAYOUT.correction)}2:${String.fromCharCode(65 + CORRECTIONS_LAYOUT.correction)}200`;

/** The values a formula spills from A1 of the scratch sheet, column by column. */
function spill(formula: string, rows: number, cols: number): number[][] {
  hf.setSheetContent(check, [[formula]]);
  return Array.from({ length: cols }, (_, c) => Array.from({ length: rows }, (_, r) => hf.getCellValue({ sheet: check, row: r, col: c }) as number));
}

const numbers = (line: string) => (line.match(/-?\d[\d,]*\.\d+/g) ?? []).map((s) => Number(s.replace(/,/g, "")));
const lineAfter = (start: string) => {
  const i = README.findIndex((l) => l.startsWith(start));
  expect(i).toBeGreaterThan(0);
  return i;
};
const oneDecimal = (v: number) => Math.round(v * 10) / 10;

test("EBB.BAND(B2:B85, 12, 6): the six months' low and high, and January at 0.8", () => {
  const at = lineAfter("=EBB.BAND(B2:B85, 12, 6)");
  const shown = README.slice(at + 1, at + 7).map(numbers);
  const [low, high] = spill("=EBB.BAND(Sales!B2:B85, 12, 6)", 6, 2);
  shown.forEach(([l, h], i) => {
    expect(oneDecimal(low[i])).toBe(l);
    expect(oneDecimal(high[i])).toBe(h);
  });
  const narrowLine = README[lineAfter("=EBB.BAND(B2:B85, 12, 6, 0.8)")];
  const narrow = numbers(narrowLine.slice(narrowLine.indexOf("->")));
  const [l8, h8] = spill("=EBB.BAND(Sales!B2:B85, 12, 6, 0.8)", 1, 2);
  expect([oneDecimal(l8[0]), oneDecimal(h8[0])]).toEqual(narrow.slice(0, 2));
});

test("EBB.BUFFER: the bird-feed block and the three one-line examples", () => {
  const at = lineAfter('=EBB.BUFFER(D2:D200, 12, 3, 0.95, , "additive")');
  const block = README.slice(at + 1, at + 5).map((l) => numbers(l)[0]);
  expect(spill('=EBB.BUFFER(Sales!D2:D200, 12, 3, 0.95, , "additive")', 4, 1)[0].map(oneDecimal)).toEqual(block);
  const lines: [string, string][] = [
    ['=EBB.BUFFER(D2:D200, 12, 3, 0.95, 1, "additive")', '=EBB.BUFFER(Sales!D2:D200, 12, 3, 0.95, 1, "additive")'],
    ["=EBB.BUFFER(Sales!C2:C200, 12, 2, 0.95)", "=EBB.BUFFER(Sales!C2:C200, 12, 2, 0.95)"],
    ["=EBB.BUFFER(EBB.CORRECTED(Sales!C2:C200, C2:C200), 12, 2, 0.95)", `=EBB.BUFFER(EBB.CORRECTED(Sales!C2:C200, ${corrections}), 12, 2, 0.95)`],
  ];
  for (const [shownFormula, typed] of lines) {
    const line = README[lineAfter(shownFormula)];
    const shown = numbers(line.slice(line.indexOf("->"))).slice(0, 4);
    expect(spill(typed, 4, 1)[0].map(oneDecimal)).toEqual(shown);
  }
});
