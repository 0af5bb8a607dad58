/**
 * Debian's Chromium for the browser tests, driven by playwright-core. When it is missing the
 * suite fails under CI=true (install it: apt-get install -y chromium) and is skipped loudly
 * elsewhere.
 */
import { existsSync, mkdtempSync, rmSync } from "fs";
import { tmpdir } from "os";
import { join } from "path";
import { chromium, type BrowserContext, type Page } from "playwright-core";

export const CHROMIUM = "/usr/bin/chromium";
export const CHROMIUM_ARGS = [
  "--no-sandbox",
  "--disable-gpu",
  "--disable-quic",
  "--no-first-run",
  "--disable-background-networking",
  "--disable-component-update",
  "--disable-sync",
];

export const chromiumPresent = existsSync(CHROMIUM);
export const inCI = process.env.CI === "true";

/** describe, or describe.skip with a loud message when Chromium is missing outside CI. */
export function describeWithChromium(name: string, body: () => void): void {
  if (chromiumPresent || inCI) {
    describe(name, body);
    return;
  }
  console.warn(
    `\n**********************************************************************\n` +
      `  SKIPPED: ${name}\n  ${CHROMIUM} is not installed. Install it with: apt-get install -y chromium\n` +
      `  (With CI=true this suite fails instead of skipping.)\n` +
      `**********************************************************************\n`,
  );
  describe.skip(name, body);
}

/** Throws the CI failure when Chromium is missing. */
export function requireChromium(): void {
  if (!chromiumPresent) {
    throw new Error(`${CHROMIUM} is missing, so the browser tests cannot run. Install it with: apt-get install -y chromium`);
  }
}

export interface Browser {
  context: BrowserContext;
  page: Page;
  close(): Promise<void>;
}

/** A headless Chromium with a fresh profile and HOME in temporary folders. */
export async function launchChromium(viewport = { width: 1440, height: 900 }): Promise<Browser> {
  requireChromium();
  const home = mkdtempSync(join(tmpdir(), "ebb-e2e-home-"));
  const profile = mkdtempSync(join(tmpdir(), "ebb-e2e-profile-"));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: CHROMIUM,
    headless: true,
    args: CHROMIUM_ARGS,
    env: { ...process.env, HOME: home } as Record<string, string>,
    viewport,
  });
  const page = context.pages()[0] ?? (await context.newPage());
  return {
    context,
    page,
    async close() {
      await context.close();
      rmSync(profile, { recursive: true, force: true });
      rmSync(home, { recursive: true, force: true });
    },
  };
}
