/**
 * One EBB.AHEAD call over a block of 1,000 series x 120 periods through the functions layer
 * (src/functions), the way one worksheet formula over a product table would run. The
 * functions layer is found by its exported AHEAD implementation; without one the row is skipped.
 */
import { readdirSync, readFileSync, statSync } from "fs";
import { join, relative } from "path";
import { clearModelCache } from "../../src/functions/modelCache";
import type { M3Series } from "./m3";
import { now } from "./timing";

export interface AheadRow {
  series: number;
  periods: number;
  horizon: number;
  seconds?: number;
  /** Where the implementation was found, e.g. "src/functions/ahead.ts: ahead". */
  source?: string;
  /** Number cells returned (should be horizon x series). */
  cells?: number;
  /** Cells returned that are not numbers (error cells of series that could not be fitted). */
  otherCells?: number;
  note?: string;
}

const ROOT = join(__dirname, "..", "..");
const FUNCTIONS_DIR = join(ROOT, "src", "functions");

function sourceFiles(dir: string): string[] {
  let out: string[] = [];
  for (const name of readdirSync(dir)) {
    const path = join(dir, name);
    if (statSync(path).isDirectory()) out = out.concat(sourceFiles(path));
    else if (/\.ts$/.test(name) && !/\.(test|d)\.ts$/.test(name)) out.push(path);
  }
  return out;
}

type AheadFn = (...args: unknown[]) => unknown;

/**
 * The functions layer's AHEAD, found at run time so the bench still runs while that layer is
 * being written. Preferred: the path every host adapter takes, `invoke(specOf("AHEAD"), args)`
 * (argument coercion, the implementation, the final no-NaN check). Else an exported
 * implementation named like aheadFn, ebbAhead or ahead, outside host-specific wrappers.
 */
export function findAhead(): { fn: AheadFn; source: string } | undefined {
  const viaInvoke = invokePath();
  if (viaInvoke) return viaInvoke;
  let files: string[];
  try {
    files = sourceFiles(FUNCTIONS_DIR);
  } catch {
    return undefined;
  }
  const pattern = /export\s+(?:async\s+)?(?:function\s+|const\s+)(\w*ahead\w*)/gi;
  const found: { file: string; name: string; rank: number }[] = [];
  for (const file of files) {
    const text = readFileSync(file, "utf8");
    if (/from\s+["']\.\/host["']/.test(text)) continue; // host wrappers need the host's globals
    for (const match of text.matchAll(pattern)) {
      const rank = ["aheadfn", "ebbahead", "ahead"].indexOf(match[1].toLowerCase());
      found.push({ file, name: match[1], rank: rank < 0 ? 99 : rank });
    }
  }
  found.sort((a, b) => a.rank - b.rank);
  for (const { file, name } of found) {
    const fn = (require(file) as Record<string, unknown>)[name];
    if (typeof fn === "function") return { fn: fn as AheadFn, source: `${relative(ROOT, file)}: ${name}` };
  }
  return undefined;
}

function invokePath(): { fn: AheadFn; source: string } | undefined {
  try {
    const { invoke } = require(join(FUNCTIONS_DIR, "invoke")) as { invoke?: (spec: unknown, args: unknown[]) => { ok: boolean; value?: unknown; error?: Error } };
    const { specOf } = require(join(FUNCTIONS_DIR, "catalog")) as { specOf?: (name: string) => unknown };
    if (typeof invoke !== "function" || typeof specOf !== "function") return undefined;
    const spec = specOf("AHEAD");
    const fn: AheadFn = (...args) => {
      const outcome = invoke(spec, args);
      if (!outcome.ok) throw outcome.error ?? new Error("EBB.AHEAD failed");
      return outcome.value;
    };
    return { fn, source: 'invoke(specOf("AHEAD")) in src/functions' };
  } catch {
    return undefined;
  }
}

/** A block of `count` monthly series x `periods` rows (row = period, column = series), as a worksheet range arrives. */
export function aheadBlock(monthly: M3Series[], count: number, periods: number): number[][] {
  const long = monthly.filter((s) => s.train.length + s.test.length >= periods);
  const cols: Float64Array[] = [];
  for (let i = 0; i < count; i++) {
    const s = long[i % long.length];
    cols.push(Float64Array.from([...s.train, ...s.test].slice(0, periods)));
  }
  return Array.from({ length: periods }, (_, t) => cols.map((c) => c[t]));
}

/** Cells of a returned block: finite numbers, and everything else (errors, blanks, words). */
function countCells(result: unknown): { numbers: number; other: number } {
  if (!Array.isArray(result)) return typeof result === "number" && Number.isFinite(result) ? { numbers: 1, other: 0 } : { numbers: 0, other: 1 };
  return result.reduce(
    (sum: { numbers: number; other: number }, v) => {
      const c = countCells(v);
      return { numbers: sum.numbers + c.numbers, other: sum.other + c.other };
    },
    { numbers: 0, other: 0 },
  );
}

export async function measureAhead(monthly: M3Series[], count = 1000, periods = 120, horizon = 18): Promise<AheadRow> {
  const row: AheadRow = { series: count, periods, horizon };
  const found = findAhead();
  if (!found) {
    row.note = "skipped: no exported AHEAD implementation in src/functions yet";
    return row;
  }
  row.source = found.source;
  const block = aheadBlock(monthly, count, periods);
  try {
    await found.fn(aheadBlock(monthly, 5, periods), 12, horizon); // warm-up on a small block
    clearModelCache(); // every series is fitted in the timed call
    const t0 = now();
    const result = await found.fn(block, 12, horizon);
    row.seconds = now() - t0;
    const cells = countCells(result);
    row.cells = cells.numbers;
    row.otherCells = cells.other;
  } catch (e) {
    row.note = `skipped: the call failed: ${(e as Error).message}`;
  }
  return row;
}
