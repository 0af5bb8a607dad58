/**
 * One preview server and one Chromium for a browser suite: started before its tests (failing
 * under CI=true when Chromium is missing), stopped after them. Screenshots go to test-artifacts/.
 */
import { mkdirSync } from "fs";
import { join } from "path";
import type { Page } from "playwright-core";
import { launchChromium, requireChromium, type Browser } from "./chromium";
import { REPO, startPreviewServer, type PreviewServer } from "./previewServer";

export const ARTIFACTS = join(REPO, "test-artifacts");

export interface PreviewSession {
  page(): Page;
  /** Loads the preview afresh and waits until it is ready. */
  open(): Promise<Page>;
}

/** Call inside a describe block: registers the beforeAll/afterAll that start and stop both. */
export function previewSession(): PreviewSession {
  let server: PreviewServer | undefined;
  let browser: Browser | undefined;
  beforeAll(async () => {
    requireChromium();
    mkdirSync(ARTIFACTS, { recursive: true });
    server = await startPreviewServer();
    browser = await launchChromium();
  }, 300_000);
  afterAll(async () => {
    await browser?.close();
    await server?.stop();
  });
  return {
    page: () => browser!.page,
    async open() {
      const page = browser!.page;
      await page.goto(server!.url);
      await page.waitForSelector("body[data-ready=true]");
      return page;
    },
  };
}
