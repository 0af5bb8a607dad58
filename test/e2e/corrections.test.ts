/**
 * The preview's Corrections sheet in Chromium: the invented hose-reel promotion and stock-out,
 * their typed corrections and reasons, EBB.UNUSUAL's flags and the corrected outlook and safety
 * stock as the page shows them. Expected numbers: Ebb's engine run here on the committed demo CSV
 * with the sheet's corrections applied. A screenshot goes to test-artifacts/.
 */
import { join } from "path";
import { applyCorrections, fitModel, forecastModel, stockBuffer } from "../../src/engine";
import { DEMO_EVENTS, demoMonths } from "../../src/preview/demo/generate-demo";
import { CORRECTIONS_SHEET, DEMO_CORRECTIONS, DEMO_LEAD_TIME, DEMO_SERVICE_LEVEL } from "../../src/preview/workbook/correctionsSheet";
import { describeWithChromium } from "./support/chromium";
import { demoColumns } from "./support/demoSeries";
import { ARTIFACTS, previewSession } from "./support/session";

describeWithChromium("preview Corrections sheet in Chromium", () => {
  const session = previewSession();

  test("flags, corrections, reasons and the corrected figures are the engine's", async () => {
    await session.page().setViewportSize({ width: 1400, height: 800 });
    const page = await session.open();
    await page.click(`button.sheet-tab:has-text("${CORRECTIONS_SHEET}")`);
    await page.waitForSelector('td[data-cell="K4"]');
    const cell = (a: string) => page.$eval(`td[data-cell="${a}"]`, (td) => ({ text: td.textContent ?? "", value: (td as HTMLElement).dataset.value ?? null }));

    const hose = demoColumns().find((c) => c.name === DEMO_EVENTS[0].product)!.values;
    const months = demoMonths();
    for (const e of DEMO_EVENTS) {
      const row = months.indexOf(e.month) + 2;
      expect((await cell(`C${row}`)).value).toBe(String(DEMO_CORRECTIONS[e.month]));
      expect((await cell(`D${row}`)).text).toBe(e.reason);
      expect((await cell(`F${row}`)).text).toBe(e.kind === "promotion" ? "high" : "low");
    }
    const fixes = months.map((m) => DEMO_CORRECTIONS[m] ?? null);
    const model = fitModel(applyCorrections(hose, fixes).values, { period: 12 });
    const first = forecastModel(model, 1)[0];
    expect(Math.abs(Number((await cell("K4")).value) - first)).toBeLessThanOrEqual(1e-9 * first);
    const b = stockBuffer(model, { leadTime: DEMO_LEAD_TIME, serviceLevel: DEMO_SERVICE_LEVEL });
    expect(Math.abs(Number((await cell("K22")).value) - b.reorderPoint)).toBeLessThanOrEqual(1e-9 * b.reorderPoint);

    const row = months.indexOf(DEMO_EVENTS[1].month) + 2;
    await page.click(`td[data-cell="C${row}"]`);
    await page.screenshot({ path: join(ARTIFACTS, "preview-corrections.png") });
  });

  test("a ledger written with the corrections and reasons columns shows and uses them, and checks clean", async () => {
    await session.page().setViewportSize({ width: 1400, height: 900 });
    const page = await session.open();
    const product = DEMO_EVENTS[0].product;
    const k = demoColumns().findIndex((c) => c.name === product);
    await page.click(`th.col-head[data-col="${1 + k}"]`);
    await page.click("#ebb-pick");
    await page.fill("#ebb-corrections-column", `${CORRECTIONS_SHEET}!C`);
    await page.fill("#ebb-reasons-column", `${CORRECTIONS_SHEET}!D`);
    await page.click("#ebb-write");
    await page.waitForFunction(() => !document.querySelector(".ebb-panel")!.hasAttribute("aria-busy"));
    expect(await page.textContent("#ebb-message")).toMatch(/^Wrote the ledger for/);
    const layout = await page.evaluate(() => {
      const d = (window as unknown as { ebbPreview: { port: { lastLedger: { layout: unknown } } } }).ebbPreview.port.lastLedger;
      return d.layout as { scorecard: Record<string, string>; updates: { columns: Record<string, number>; rows: { period: number; row: number }[] } };
    });
    const cell = (a: string) => page.$eval(`td[data-cell="${a}"]`, (td) => ({ text: td.textContent ?? "", value: (td as HTMLElement).dataset.value ?? null }));
    const letter = (c: number) => String.fromCharCode(65 + c);
    const months = demoMonths();
    const hose = demoColumns()[k].values;
    const stockOut = DEMO_EVENTS.find((e) => e.kind !== "promotion")!;
    const t = months.indexOf(stockOut.month);
    const r = layout.updates.rows.find((x) => x.period === t + 1)!.row + 1;
    const c = layout.updates.columns;
    expect(Number((await cell(`${letter(c.actual)}${r}`)).value)).toBe(hose[t]);
    expect(Number((await cell(`${letter(c.correction)}${r}`)).value)).toBe(DEMO_CORRECTIONS[stockOut.month]);
    expect((await cell(`${letter(c.reason)}${r}`)).text).toBe(stockOut.reason);
    expect(Number((await cell(`${letter(c.used)}${r}`)).value)).toBe(DEMO_CORRECTIONS[stockOut.month]);
    expect(Number((await cell(layout.scorecard.corrected)).value)).toBe(Object.keys(DEMO_CORRECTIONS).length);
    await page.click(`td[data-cell="${letter(c.used)}${r}"]`);
    await page.screenshot({ path: join(ARTIFACTS, "preview-ledger-corrections.png") });
    // The top of the ledger: settings, the scorecard's "Periods corrected" and the start table's correction columns.
    await page.click(`td[data-cell="${layout.scorecard.corrected}"]`);
    await page.screenshot({ path: join(ARTIFACTS, "preview-ledger-corrections-top.png") });
    await page.click("#ebb-verify");
    await page.waitForFunction(() => !document.querySelector(".ebb-panel")!.hasAttribute("aria-busy"));
    expect(await page.textContent("#ebb-message")).toMatch(/^All \d+ cells of the ledger on .* match the engine\./);
  });
});
