/**
 * The preview grid behaves like a spreadsheet where a planner expects it to, in Debian's
 * Chromium: shift-click on column headers selects every column between (common practice in
 * spreadsheets), and a spilled block blocked by a typed cell names that cell and comes back
 * as soon as the cell is cleared; Ctrl+Z and Ctrl+Y undo and redo edits, a cleared selection
 * and a ledger written by the panel, each as one step (common practice in spreadsheets).
 */
import { join } from "path";
import type { Page } from "playwright-core";
import { describeWithChromium } from "./support/chromium";
import { ARTIFACTS, previewSession } from "./support/session";

async function typeInto(page: Page, address: string, text: string): Promise<void> {
  await page.click(`td[data-cell="${address}"]`);
  if (text === "") await page.keyboard.press("Delete");
  else {
    await page.keyboard.type(text);
    await page.keyboard.press("Enter");
  }
}

const shown = (page: Page, address: string) => page.textContent(`td[data-cell="${address}"]`);

describeWithChromium("the preview grid as a spreadsheet", () => {
  const session = previewSession();

  test("header B, then shift-click header F: B1:F85 (the used rows of columns B to F)", async () => {
    const page = await session.open();
    await page.click('th.col-head[data-col="1"]');
    await page.click('th.col-head[data-col="5"]', { modifiers: ["Shift"] });
    const selected = await page.$$eval('td[aria-selected="true"]', (tds) => (tds as HTMLElement[]).map((t) => t.dataset.cell!));
    const cols = new Set(selected.map((a) => a.replace(/\d+$/, "")));
    const rows = selected.map((a) => Number(a.replace(/^[A-Z]+/, "")));
    expect([...cols].sort()).toEqual(["B", "C", "D", "E", "F"]);
    expect([Math.min(...rows), Math.max(...rows)]).toEqual([1, 85]); // the demo's heading row and 84 months
    expect(selected.length).toBe(5 * 85);
  });

  test('"Invented demo data" is said once on the first screen; the fitted SSE reads as a planner\'s number', async () => {
    const page = await session.open();
    const text = await page.evaluate(() => document.body.innerText);
    expect(text.match(/invented demo data/gi)?.length).toBe(1);
    // EBB.FIT at I35 spills 9 rows per product; the 7th is the SSE (demo layout, FIT_LABELS).
    const sse = await page.$$eval('td[data-cell^="I41"], td[data-cell^="J41"], td[data-cell^="K41"]', (tds) =>
      (tds as HTMLElement[]).map((t) => [t.dataset.value, t.textContent]),
    );
    expect(sse.length).toBe(3);
    for (const [value, shown] of sse) {
      expect(shown).not.toMatch(/e[+-]/i);
      expect(Number(shown!.replace(/,/g, ""))).toBeCloseTo(Number(value), -1); // the same figure, rounded for reading
    }
  });

  test("interval headers wrap in full, so low can be told from high (I19, J19)", async () => {
    const page = await session.open();
    for (const [address, end] of [["I19", ": low"], ["J19", ": high"], ["H4", "Month"]]) {
      const seen = await page.$eval(`td[data-cell="${address}"]`, (td) => ({
        text: td.textContent ?? "",
        cut: td.scrollWidth > td.clientWidth + 1 || td.scrollHeight > td.clientHeight + 1,
      }));
      expect(seen.text.endsWith(end)).toBe(true);
      expect(seen.cut).toBe(false);
    }
    await page.screenshot({ path: join(ARTIFACTS, "preview-headers.png") });
  });

  test("a short selection (B2:B15) is warned with what is needed, and its ledger sheet is named after the series", async () => {
    const page = await session.open();
    await page.click('td[data-cell="B2"]');
    await page.click('td[data-cell="B15"]', { modifiers: ["Shift"] });
    await page.click("#ebb-pick");
    await page.waitForFunction(() => !document.querySelector(".ebb-panel")!.hasAttribute("aria-busy"));
    expect(await page.textContent("#ebb-message")).toMatch(/^Only 14 values and no season found: .*needs at least 36 values/);
    await page.click("#ebb-write");
    await page.waitForFunction(() => !document.querySelector(".ebb-panel")!.hasAttribute("aria-busy"));
    const sheet = await page.evaluate(
      () => (window as unknown as { ebbPreview: { port: { lastLedger: { sheet: string } } } }).ebbPreview.port.lastLedger.sheet,
    );
    expect(sheet).toBe("Ledger Seed trays (units)");
  });

  test("J6 typed inside the I5 block: #SPILL! names J6; clearing J6 brings the block back", async () => {
    const page = await session.open();
    const before = await page.getAttribute('td[data-cell="I5"]', "data-value");
    expect(Number(before)).toBeGreaterThan(0);
    await typeInto(page, "J6", "5");
    expect(await shown(page, "I5")).toBe("#SPILL!");
    await page.click('td[data-cell="I5"]');
    expect(await page.textContent("#cell-note")).toMatch(/needs I5:N16, and J6 is in the way\. Clear that cell/);
    await page.screenshot({ path: join(ARTIFACTS, "preview-spill-blocked.png") });
    await typeInto(page, "J6", "");
    expect(await shown(page, "I5")).not.toBe("#SPILL!");
    expect(await page.getAttribute('td[data-cell="I5"]', "data-value")).toBe(before);
  });

  test("Ctrl+Z undoes an edit, a cleared selection and a ledger write, one step each; Ctrl+Y redoes", async () => {
    const page = await session.open();
    const before = await shown(page, "B85");
    const forecast = await shown(page, "I5");
    await typeInto(page, "B85", "9999");
    expect(await shown(page, "B85")).toMatch(/9,?999/);
    expect(await shown(page, "I5")).not.toBe(forecast);
    await page.click('td[data-cell="B85"]');
    await page.keyboard.press("Control+z");
    expect(await shown(page, "B85")).toBe(before);
    expect(await shown(page, "I5")).toBe(forecast);
    await page.keyboard.press("Control+y");
    expect(await shown(page, "B85")).toMatch(/9,?999/);
    await page.keyboard.press("Control+z");
    // A selection of three rows cleared with Delete comes back with one Ctrl+Z.
    const rows = await Promise.all(["B83", "B84", "B85"].map((a) => shown(page, a)));
    await page.click('td[data-cell="B83"]');
    await page.click('td[data-cell="B85"]', { modifiers: ["Shift"] });
    await page.keyboard.press("Delete");
    expect(await shown(page, "B84")).toBe("");
    await page.keyboard.press("Control+z");
    expect(await Promise.all(["B83", "B84", "B85"].map((a) => shown(page, a)))).toEqual(rows);
    // A ledger written by the panel: one Ctrl+Z takes its sheet away, Ctrl+Y brings it back.
    await page.click('th.col-head[data-col="1"]');
    await page.click("#ebb-pick");
    await page.click("#ebb-write");
    await page.waitForFunction(() => !document.querySelector(".ebb-panel")!.hasAttribute("aria-busy"));
    const tabs = () => page.$$eval("button.sheet-tab", (b) => b.map((x) => x.textContent ?? ""));
    expect((await tabs()).some((t) => t.startsWith("Ledger"))).toBe(true);
    await page.click('td[data-cell="A1"]');
    await page.keyboard.press("Control+z");
    await page.waitForFunction(() => !Array.from(document.querySelectorAll("button.sheet-tab")).some((b) => (b.textContent ?? "").startsWith("Ledger")));
    await page.click('td[data-cell="A1"]');
    await page.keyboard.press("Control+Shift+z");
    await page.waitForFunction(() => Array.from(document.querySelectorAll("button.sheet-tab")).some((b) => (b.textContent ?? "").startsWith("Ledger")));
    await page.screenshot({ path: join(ARTIFACTS, "preview-undo-redo.png") });
  });
});
