/**
 * Refreshes the README's picture (assets/preview-screenshot.png): the preview workbook in
 * Debian's Chromium with the spilled forecast at I5 selected. Run with `npm run picture`; the
 * tests never write it (they save their screenshots under test-artifacts/).
 */
import { mkdirSync } from "fs";
import { join } from "path";
import { launchChromium } from "../e2e/support/chromium";
import { REPO, startPreviewServer } from "../e2e/support/previewServer";

const PICTURE = join(REPO, "assets/preview-screenshot.png");

async function main(): Promise<void> {
  const server = await startPreviewServer();
  const browser = await launchChromium({ width: 1480, height: 760 }); // keeps the picture small
  try {
    const page = browser.page;
    await page.goto(server.url);
    await page.waitForSelector("body[data-ready=true]");
    await page.click('td[data-cell="I5"]'); // a spilled forecast, its formula in the formula bar
    mkdirSync(join(REPO, "assets"), { recursive: true });
    await page.screenshot({ path: PICTURE });
    console.log(`Wrote ${PICTURE}`);
  } finally {
    await browser.close();
    await server.stop();
  }
}

main().catch((e: unknown) => {
  console.error(e instanceof Error ? e.message : String(e));
  process.exit(1);
});
