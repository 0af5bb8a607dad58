import { execFileSync } from "child_process";
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from "fs";
import { tmpdir } from "os";
import { join } from "path";

/**
 * LibreOffice Calc, headless, as an independent spreadsheet program. Each call uses a fresh
 * temporary profile set to recalculate every formula when a file is loaded, so the values we
 * read back are LibreOffice's own, not the cached results in the file.
 */
export function findSoffice(): string | undefined {
  // EBB_SOFFICE names the program, or "none" to run as if it were missing.
  const chosen = process.env.EBB_SOFFICE;
  if (chosen) return chosen === "none" ? undefined : chosen;
  for (const p of ["/usr/bin/soffice", "/usr/local/bin/soffice", "/usr/lib/libreoffice/program/soffice"]) if (existsSync(p)) return p;
  try {
    return execFileSync("sh", ["-c", "command -v soffice"], { encoding: "utf8" }).trim() || undefined;
  } catch {
    return undefined;
  }
}

/** Fail in CI, skip loudly elsewhere, when a program is missing. */
export function requireProgram(found: string | undefined, what: string): boolean {
  if (found) return true;
  if (process.env.CI === "true") throw new Error(`${what} is missing: CI must install it (.ci/run installs libreoffice-calc).`);
  console.warn(`\n*** SKIPPING: ${what} is not installed, so this check did not run. Install it (Debian: libreoffice-calc) to run it. ***\n`);
  return false;
}

function recalculatingProfile(soffice: string): { url: string; dir: string } {
  const dir = mkdtempSync(join(tmpdir(), "ebb-lo-profile-"));
  const url = `file://${dir}`;
  execFileSync(soffice, [`-env:UserInstallation=${url}`, "--headless", "--terminate_after_init"], { stdio: "ignore", timeout: 120_000 });
  const xcu = join(dir, "user", "registrymodifications.xcu");
  const always =
    '<item oor:path="/org.openoffice.Office.Calc/Formula/Load"><prop oor:name="OOXMLRecalcMode" oor:op="fuse"><value>0</value></prop></item>\n' +
    '<item oor:path="/org.openoffice.Office.Calc/Formula/Load"><prop oor:name="ODFRecalcMode" oor:op="fuse"><value>0</value></prop></item>\n';
  const text = existsSync(xcu)
    ? readFileSync(xcu, "utf8")
    : '<?xml version="1.0" encoding="UTF-8"?>\n<oor:items xmlns:oor="http://openoffice.org/2001/registry" xmlns:xs="http://www.w3.org/2001/XMLSchema" xmlns:xsi="http://www.w3.org/2001/XMLSchema-instance">\n</oor:items>\n';
  writeFileSync(xcu, text.replace("</oor:items>", `${always}</oor:items>`));
  return { url, dir };
}

/** Convert `input` with LibreOffice (recalculating on load) to `format` ("xlsx", "pdf", ...) in `outDir`. */
export function convertWithLibreOffice(soffice: string, input: string, format: string, outDir: string): string {
  const profile = recalculatingProfile(soffice);
  try {
    execFileSync(soffice, [`-env:UserInstallation=${profile.url}`, "--headless", "--convert-to", format, "--outdir", outDir, input], { stdio: "pipe", timeout: 300_000 });
  } finally {
    rmSync(profile.dir, { recursive: true, force: true });
  }
  const base = input.replace(/^.*\//, "").replace(/\.[^.]+$/, "");
  const out = join(outDir, `${base}.${format.split(":")[0]}`);
  if (!existsSync(out)) throw new Error(`LibreOffice did not write ${out}`);
  return out;
}
