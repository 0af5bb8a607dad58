/**
 * Signals in the preview, as a planner meets them in Chromium: the review list on the Sales sheet
 * (EBB.WATCH over the whole invented Larkmere table) picks out rain barrels, whose demand steps up
 * 40% from July 2025 in the demo's recipe; its ledger shades the last tracking-signal rows rose
 * and the panel says the signal is beyond its limit. Expected statuses: Ebb's engine on the
 * committed demo CSV; the flagged rows: the +/-2.2 limit of the windowed signal (Harrison &
 * Davies 1964). Screenshots go to test-artifacts/.
 */
import { join } from "path";
import { watchSeries } from "../../src/engine";
import { DEMO_STEP_PRODUCT } from "../../src/preview/demo/generate-demo";
import { LAYOUT } from "../../src/preview/workbook/demoWorkbook";
import { describeWithChromium } from "./support/chromium";
import { demoColumns } from "./support/demoSeries";
import { ARTIFACTS, previewSession } from "./support/session";

const letter = (c: number) => String.fromCharCode(65 + c);

describeWithChromium("signals in the preview (Chromium)", () => {
  const session = previewSession();

  test("the review list on Sales flags the step product and at most one other", async () => {
    await session.page().setViewportSize({ width: 1400, height: 900 });
    const page = await session.open();
    const columns = demoColumns();
    const statusCol = letter(LAYOUT.firstValueCol);
    const shown: string[] = [];
    for (let k = 0; k < columns.length; k++) {
      const row = LAYOUT.watchFirstRow + 1 + k;
      shown.push((await page.textContent(`td[data-cell="${statusCol}${row}"]`)) ?? "");
      expect(await page.textContent(`td[data-cell="${letter(LAYOUT.labelCol)}${row}"]`)).toBe(columns[k].name);
    }
    columns.forEach((c, k) => expect(shown[k]).toBe(watchSeries(c.values, { period: 12, seasonality: "auto", trend: "auto" }).status));
    const step = columns.findIndex((c) => c.name === DEMO_STEP_PRODUCT);
    expect(shown[step]).toBe("forecast too low");
    expect(shown.filter((s, k) => k !== step && s.startsWith("forecast too")).length).toBeLessThanOrEqual(1);
    await page.click(`td[data-cell="${statusCol}${LAYOUT.watchFirstRow + 1 + step}"]`);
    await page.screenshot({ path: join(ARTIFACTS, "preview-review-list.png") });
  });

  test("the step product's ledger shades its last signal rows and the panel says to review it", async () => {
    await session.page().setViewportSize({ width: 1400, height: 900 });
    const page = await session.open();
    const k = demoColumns().findIndex((c) => c.name === DEMO_STEP_PRODUCT);
    await page.click(`th.col-head[data-col="${1 + k}"]`);
    await page.click("#ebb-pick");
    await page.selectOption("#ebb-seasonality", "auto");
    await page.selectOption("#ebb-trend", "auto");
    await page.click("#ebb-write");
    await page.waitForFunction(() => !document.querySelector(".ebb-panel")!.hasAttribute("aria-busy"));
    expect(await page.textContent("#ebb-message")).toMatch(/Tracking signal \d+\.\d\d, beyond \+\/-2\.2: the latest forecasts ran low .*review this item; \d+ update rows flagged\./);
    const layout = await page.evaluate(() => {
      const d = (window as unknown as { ebbPreview: { port: { lastLedger: { layout: unknown } } } }).ebbPreview.port.lastLedger;
      return d.layout as { scorecard: Record<string, string>; updates: { headerRow: number; columns: Record<string, number>; rows: { period: number; row: number; start: boolean }[] } };
    });
    const col = letter(layout.updates.columns.tracking);
    const rows = layout.updates.rows.filter((r) => !r.start);
    // Every shown signal beyond +/-2.2 is shaded, every other cell (a blank one too) is not.
    let flagged = 0;
    for (const r of rows) {
      const address = `${col}${r.row + 1}`;
      const { value, cls } = await page.$eval(`td[data-cell="${address}"]`, (td) => ({ value: (td as HTMLElement).dataset.value ?? "", cls: td.className }));
      const beyond = value !== "" && Math.abs(Number(value)) > 2.2;
      expect({ address, shaded: cls.includes("flagged") }).toEqual({ address, shaded: beyond });
      if (beyond) flagged++;
    }
    const lastRows = rows.slice(-5).map((r) => `${col}${r.row + 1}`);
    for (const a of lastRows) expect(await page.getAttribute(`td[data-cell="${a}"]`, "class")).toContain("flagged");
    expect(Number(await page.getAttribute(`td[data-cell="${layout.scorecard.outside}"]`, "data-value"))).toBe(flagged);
    await page.click(`td[data-cell="${lastRows[lastRows.length - 1]}"]`);
    await page.screenshot({ path: join(ARTIFACTS, "preview-ledger-signal.png") });
    // The update table's headings over the three signal columns, with the first rows where the signal is still blank.
    await page.click(`td[data-cell="${col}${layout.updates.headerRow + 1}"]`);
    expect(await page.textContent(`td[data-cell="${col}${layout.updates.headerRow + 1}"]`)).toBe("Tracking signal");
    await page.screenshot({ path: join(ARTIFACTS, "preview-ledger-signal-header.png") });
  });
});
