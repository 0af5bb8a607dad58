/**
 * The preview workbook in a real browser: the page `npm start` serves, driven through Debian's
 * Chromium. Expected numbers come from Ebb's engine (src/engine) run here in the test on the
 * committed demo CSV: these checks prove the page (grid, worksheet functions, ledger, panel)
 * reproduces the engine, not the engine itself.
 */
import AxeBuilder from "@axe-core/playwright";
import { join } from "path";
import type { Page } from "playwright-core";
import { fitModel, forecastModel, modelStates, predictionInterval } from "../../src/engine";
import { GUARD_TEXT } from "../../src/ledger/describe/settingsGuard";
import { describeWithChromium } from "./support/chromium";
import { demoColumns } from "./support/demoSeries";
import { ARTIFACTS, previewSession } from "./support/session";

const PERIOD = 12; // the demo formulas type the season length 12 (monthly data)
const HORIZON = 12;

/** Relative agreement to 1e-9: the grid shows the engine's numbers, not rounded copies. */
function expectClose(found: number, expected: number, where: string): void {
  const tolerance = 1e-9 * Math.max(1, Math.abs(expected));
  if (!(Math.abs(found - expected) <= tolerance)) {
    throw new Error(`${where}: the page shows ${found}, the engine gives ${expected}`);
  }
}

/** Full-precision numbers of some grid cells of the sheet on show (data-value holds them). */
async function cellNumbers(page: Page, addresses: string[]): Promise<Record<string, number>> {
  const found = await page.$$eval(
    "td[data-cell]",
    (tds, wanted) => {
      const want = new Set(wanted as string[]);
      const out: Record<string, string | null> = {};
      for (const td of tds as HTMLElement[]) if (want.has(td.dataset.cell!)) out[td.dataset.cell!] = td.dataset.value ?? null;
      return out;
    },
    addresses,
  );
  const out: Record<string, number> = {};
  for (const a of addresses) {
    const v = found[a];
    if (v === undefined || v === null) throw new Error(`Cell ${a} shows no number.`);
    out[a] = Number(v);
  }
  return out;
}

const col = (c: number): string => String.fromCharCode(65 + c);

async function panelMessage(page: Page): Promise<string> {
  await page.waitForFunction(() => !document.querySelector(".ebb-panel")!.hasAttribute("aria-busy"));
  return (await page.textContent("#ebb-message")) ?? "";
}

interface LedgerLayoutSeen {
  sheet: string;
  settings: Record<string, string>;
  outlook: { rows: { forecast: string }[] };
  updates: { columns: Record<string, number>; rows: { period: number; row: number; start: boolean }[] };
}

/** Writes a ledger for the Seed trays column through the panel, as a person would. */
async function writeSeedTraysLedger(page: Page): Promise<LedgerLayoutSeen> {
  await page.click('th.col-head[data-col="1"]'); // column B: Seed trays
  await page.click("#ebb-pick");
  await page.click("#ebb-write");
  const message = await panelMessage(page);
  expect(message).toMatch(/^Wrote the ledger for "Seed trays \(units\)"/);
  return page.evaluate(() => {
    const d = (window as unknown as { ebbPreview: { port: { lastLedger: { sheet: string; layout: unknown } } } }).ebbPreview.port.lastLedger;
    return { sheet: d.sheet, ...(d.layout as object) } as never;
  });
}

describeWithChromium("preview workbook in Chromium", () => {
  const session = previewSession();
  const columns = demoColumns();

  test("spilled EBB.AHEAD and EBB.BAND results in the grid equal the engine's", async () => {
    const page = await session.open();
    // The demo puts EBB.AHEAD(B2:G200, 12, 12) at I5 (12 x 6) and EBB.BAND(..., 0.95) at I20 (12 x 12).
    const ahead: string[] = [];
    const band: string[] = [];
    for (let h = 0; h < HORIZON; h++) {
      for (let k = 0; k < columns.length; k++) ahead.push(`${col(8 + k)}${5 + h}`);
      for (let k = 0; k < 2 * columns.length; k++) band.push(`${col(8 + k)}${20 + h}`);
    }
    const shown = await cellNumbers(page, [...ahead, ...band]);
    columns.forEach((series, k) => {
      // Source: Ebb's engine on the same CSV column, with the demo formula's settings (period 12, defaults).
      const model = fitModel(series.values, { period: PERIOD });
      const forecast = forecastModel(model, HORIZON);
      const interval = predictionInterval(model, HORIZON, 0.95);
      for (let h = 0; h < HORIZON; h++) {
        expectClose(shown[`${col(8 + k)}${5 + h}`], forecast[h], `${series.name} forecast ${h + 1} ahead`);
        expectClose(shown[`${col(8 + 2 * k)}${20 + h}`], interval.low[h], `${series.name} interval low ${h + 1} ahead`);
        expectClose(shown[`${col(9 + 2 * k)}${20 + h}`], interval.high[h], `${series.name} interval high ${h + 1} ahead`);
      }
    });
    // Spilled cells look spilled, and a spilled cell's formula bar shows the formula it came from.
    expect(await page.getAttribute('td[data-cell="I5"]', "class")).toContain("spill-anchor");
    expect(await page.getAttribute('td[data-cell="M16"]', "class")).toContain("spill-part");
    await page.click('td[data-cell="K9"]');
    expect(await page.inputValue("#cell-contents")).toBe("=EBB.AHEAD(B2:G200, 12, 12)");
    expect(await page.textContent("#cell-note")).toContain("Spilled from the formula in I5");
  });

  test("a new actual typed under a sales column rolls the forecast to the engine's new values", async () => {
    const page = await session.open();
    const cells = Array.from({ length: HORIZON }, (_, h) => `I${5 + h}`);
    const before = await cellNumbers(page, cells);
    // Keyboard: select B85 (December 2025), step down, type a January 2026 figure, Enter.
    await page.click('td[data-cell="B85"]');
    await page.keyboard.press("ArrowDown");
    expect(await page.textContent("#cell-name")).toBe("Sales!B86");
    await page.keyboard.type("700");
    await page.keyboard.press("Enter");
    expect(await page.textContent("#cell-name")).toBe("Sales!B87"); // Enter commits and moves down
    const after = await cellNumbers(page, cells);
    // Source: the engine on the Seed trays history with 700 appended.
    const model = fitModel([...columns[0].values, 700], { period: PERIOD });
    const forecast = forecastModel(model, HORIZON);
    cells.forEach((a, h) => expectClose(after[a], forecast[h], `Seed trays forecast ${h + 1} ahead after the new actual`));
    expect(cells.some((a) => Math.abs(after[a] - before[a]) > 1e-6 * Math.abs(before[a]))).toBe(true);
    // F2 opens the cell for editing; Escape leaves it unchanged.
    await page.keyboard.press("ArrowUp");
    await page.keyboard.press("F2");
    await page.keyboard.press("Backspace");
    await page.keyboard.press("Escape");
    expect(await page.getAttribute('td[data-cell="B86"]', "data-value")).toBe("700");
  });

  test("an error shows its message on hover and in the formula bar's note", async () => {
    const page = await session.open();
    await page.click('td[data-cell="T2"]');
    await page.keyboard.type("=EBB.AHEAD(B2:B10, 12, 3)");
    await page.keyboard.press("Enter");
    // Source: the engine's own error for 9 months of history with a 12-month season.
    let expected = "";
    try {
      fitModel(columns[0].values.slice(0, 9), { period: PERIOD });
    } catch (e) {
      expected = (e as Error).message;
    }
    expect(expected).not.toBe("");
    expect(await page.textContent('td[data-cell="T2"]')).toBe("#N/A");
    expect(await page.getAttribute('td[data-cell="T2"]', "title")).toBe(`#N/A ${expected}`);
    await page.click('td[data-cell="T2"]');
    expect(await page.textContent("#cell-note")).toBe(`#N/A ${expected}`);
  });

  test("a ledger written from the panel recomputes when alpha changes in its settings cell", async () => {
    const page = await session.open();
    const layout = await writeSeedTraysLedger(page);
    expect(await page.getAttribute(".sheet-tab[aria-selected=true]", "id")).toBeTruthy();
    const settingCells = [layout.settings.beta, layout.settings.gamma];
    const kept = await cellNumbers(page, settingCells);
    // Type a new alpha into the ledger's alpha cell.
    await page.click(`td[data-cell="${layout.settings.alpha}"]`);
    await page.keyboard.type("0.3");
    await page.keyboard.press("Enter");
    const outlook = layout.outlook.rows.map((r) => r.forecast);
    const last = layout.updates.rows[layout.updates.rows.length - 1];
    const levelCell = `${col(layout.updates.columns.level)}${last.row + 1}`;
    const shown = await cellNumbers(page, [...outlook, levelCell]);
    // Source: the engine with alpha 0.3 and the ledger's beta and gamma (as shown in its settings).
    const model = fitModel(columns[0].values, { period: PERIOD, alpha: 0.3, beta: kept[layout.settings.beta], gamma: kept[layout.settings.gamma] });
    const forecast = forecastModel(model, outlook.length);
    outlook.forEach((a, h) => expectClose(shown[a], forecast[h], `ledger outlook ${h + 1} ahead at alpha 0.3`));
    const states = modelStates(model);
    expectClose(shown[levelCell], states.level[states.level.length - 1], "ledger level of the last period at alpha 0.3");
  });

  test("a setting typed out of range, or a word typed over a fixed setting, is flagged beside it at once", async () => {
    const page = await session.open();
    const layout = await writeSeedTraysLedger(page);
    const beside = (address: string) => `${String.fromCharCode(address.charCodeAt(0) + 2)}${address.slice(1)}`; // the explanation column
    for (const [setting, typed] of [["alpha", "1.5"], ["seasonality", "additive"]] as const) {
      await page.click(`td[data-cell="${layout.settings[setting]}"]`);
      await page.keyboard.type(typed);
      await page.keyboard.press("Enter");
    }
    // Expected texts: the guard's own words (src/ledger/describe/settingsGuard.ts); the ledger was written multiplicative.
    expect(await page.textContent(`td[data-cell="${beside(layout.settings.alpha)}"]`)).toBe(GUARD_TEXT.constant);
    expect(await page.textContent(`td[data-cell="${beside(layout.settings.seasonality)}"]`)).toBe(`${GUARD_TEXT.fixedHead}multiplicative${GUARD_TEXT.fixedTail}`);
    // The warnings are shaded like every other flag; the untouched explanations beside them are not.
    const flagged = async (address: string) => (await page.getAttribute(`td[data-cell="${beside(address)}"]`, "class"))?.split(" ").includes("flagged");
    expect(await flagged(layout.settings.alpha)).toBe(true);
    expect(await flagged(layout.settings.seasonality)).toBe(true);
    expect(await flagged(layout.settings.gamma)).toBe(false);
    await page.setViewportSize({ width: 1280, height: 760 });
    await page.screenshot({ path: join(ARTIFACTS, "preview-ledger-guard.png") });
  });

  test("a ledger formula overwritten by a number is reported by the check, and the report selects it", async () => {
    const page = await session.open();
    const layout = await writeSeedTraysLedger(page);
    const row = layout.updates.rows.find((r) => !r.start && r.period === 40)!;
    const target = `${col(layout.updates.columns.level)}${row.row + 1}`;
    await page.click(`td[data-cell="${target}"]`);
    expect(await page.inputValue("#cell-contents")).toMatch(/^=/); // a formula before
    await page.keyboard.type("1234.5");
    await page.keyboard.press("Enter");
    await page.click("#ebb-verify");
    expect(await panelMessage(page)).toMatch(/differs? from the engine/);
    const reported = await page.$$eval(".ebb-finding", (b) => (b as HTMLElement[]).map((x) => x.dataset.address));
    expect(reported).toContain(target);
    await page.click(`.ebb-finding[data-address="${target}"]`);
    expect(await page.textContent("#cell-name")).toBe(`${layout.sheet}!${target}`);
  });

  test("the panel and the grid have no serious or critical accessibility violations (axe-core)", async () => {
    const page = await session.open();
    const serious = async (): Promise<string[]> => {
      const result = await new AxeBuilder({ page }).analyze();
      return result.violations
        .filter((v) => v.impact === "serious" || v.impact === "critical")
        .map((v) => `${v.id} (${v.impact}): ${v.help} at ${v.nodes.slice(0, 3).map((n) => n.target.join(" ")).join("; ")}`);
    };
    expect(await serious()).toEqual([]);
    await writeSeedTraysLedger(page); // the ledger sheet, its chart and the filled-in panel
    expect(await serious()).toEqual([]);
  });

  test("screenshots of the workbook and of a ledger are saved", async () => {
    const page = session.page();
    await page.setViewportSize({ width: 1280, height: 760 }); // keeps the screenshot small
    await session.open();
    await page.click('td[data-cell="I5"]'); // a spilled forecast, its formula in the formula bar
    const workbook = join(ARTIFACTS, "preview-workbook.png");
    await page.screenshot({ path: workbook }); // tests write only here; `npm run picture` refreshes the README's
    await writeSeedTraysLedger(page);
    await page.screenshot({ path: join(ARTIFACTS, "preview-ledger.png"), fullPage: true });
  });
});
