/**
 * A cache of reference programs' outputs, keyed by what determines them: the runner script,
 * the input series and the program's version. R's automatic exponential smoothing takes
 * ~20 minutes on M3, so a repeated full run reads its outputs instead of redoing them.
 * Entries are gzipped text under test/bench/references/cache (committed: a few hundred kB).
 */
import { createHash } from "crypto";
import { existsSync, mkdirSync, readFileSync, writeFileSync } from "fs";
import { join } from "path";
import { gunzipSync, gzipSync } from "zlib";

export const CACHE_DIR = join(__dirname, "references", "cache");

export function cacheKey(script: string, input: string, version: string): string {
  const h = createHash("sha256");
  h.update(readFileSync(join(__dirname, "references", script)));
  h.update("\0");
  h.update(input);
  h.update("\0");
  h.update(version);
  return h.digest("hex").slice(0, 16);
}

function entryPath(name: string, key: string): string {
  return join(CACHE_DIR, `${name.replace(/\W+/g, "-")}-${key}.csv.gz`);
}

export function readCached(name: string, key: string): string | undefined {
  const path = entryPath(name, key);
  return existsSync(path) ? gunzipSync(readFileSync(path)).toString("utf8") : undefined;
}

export function writeCached(name: string, key: string, text: string): string {
  mkdirSync(CACHE_DIR, { recursive: true });
  const path = entryPath(name, key);
  writeFileSync(path, gzipSync(text, { level: 9 }));
  return path;
}
