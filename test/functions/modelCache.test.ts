/**
 * The model cache (src/functions/modelCache.ts): a workbook computes the same digits with the
 * cache on and off, before and after a typed actual; the fitting functions over one range
 * share one fit per series; a typed actual refits that series alone; the cache stays bounded.
 * Data: invented monthly demand of a few products (labelled so), common practice for shape.
 */
import { clearModelCache, modelCacheStats, setModelCache, setModelCacheLimits } from "../../src/functions/modelCache";
import { invoke } from "../../src/functions/invoke";
import { specOf } from "../../src/functions/catalog";
import { gridFromColumns, workbook } from "./support/workbook";

/** Invented demand: four products over 40 months, seasonal with a trend, one with a gap. */
function inventedColumns(): (number | null)[][] {
  const demand = (k: number, t: number): number | null =>
    k === 2 && t === 17 ? null : Math.round((200 + 40 * k + 2 * t) * (1 + 0.3 * Math.sin((2 * Math.PI * (t + k)) / 12)));
  return [0, 1, 2, 3].map((k) => Array.from({ length: 40 }, (_, t) => demand(k, t)));
}

const FORMULAS = [
  '=EBB.AHEAD(S!A1:D41, 12, 6, "auto", "auto")',
  '=EBB.BAND(S!A1:D41, 12, 6, 0.9, "auto", "auto")',
  '=EBB.FIT(S!A1:D41, 12, "auto", "auto")',
  "=EBB.FITTED(S!A1:D41, 12)",
  '=EBB.STATES(S!A1:D41, 12, , , , "additive", "damped")',
  '=EBB.AHEAD(S!A1:D41, 12, 6, "multiplicative", "linear", 0.3)',
];

/** Every formula's result, each on its own sheet, as the engine reports them. */
function computeAll(typed?: { row: number; col: number; value: number }): unknown[][][] {
  const { hf, sheet } = workbook(gridFromColumns(inventedColumns(), 41));
  const sheets = FORMULAS.map((f, i) => {
    const name = `F${i}`;
    hf.addSheet(name);
    const id = hf.getSheetId(name)!;
    hf.setCellContents({ sheet: id, row: 0, col: 0 }, [[f]]);
    return id;
  });
  if (typed) hf.setCellContents({ sheet, row: typed.row, col: typed.col }, [[typed.value]]);
  const values = sheets.map((id) => hf.getSheetValues(id) as unknown[][]);
  hf.destroy();
  return values;
}

afterEach(() => {
  setModelCache(true);
  setModelCacheLimits();
  clearModelCache();
});

describe("model cache", () => {
  test("a workbook gives the same digits with the cache on and off, before and after a typed actual", () => {
    const typed = { row: 40, col: 1, value: 321 };
    setModelCache(false);
    const uncached = computeAll();
    const uncachedTyped = computeAll(typed);
    setModelCache(true);
    clearModelCache();
    const cached = computeAll();
    // The same workbook again: every fit now comes from the cache.
    const fromCache = computeAll();
    const cachedTyped = computeAll(typed);
    expect(cached).toEqual(uncached);
    expect(fromCache).toEqual(uncached);
    expect(cachedTyped).toEqual(uncachedTyped);
    expect(cachedTyped).not.toEqual(cached); // the typed actual did change the results
    const cells = uncached.flat(2);
    expect(cells.filter((c) => typeof c === "number").length).toBeGreaterThan(200);
  });

  test("AHEAD, BAND, FIT, FITTED and STATES over one range with the same options share one fit per series", () => {
    const range = gridFromColumns(inventedColumns(), 40);
    const run = (name: string, args: unknown[]) => {
      const outcome = invoke(specOf(name), args);
      expect(outcome.ok).toBe(true);
    };
    clearModelCache();
    run("AHEAD", [range, 12, 6, "auto", "auto"]);
    run("BAND", [range, 12, 6, 0.95, "auto", "auto"]);
    run("FIT", [range, 12, "auto", "auto"]);
    run("FITTED", [range, 12, null, null, null, "auto", "auto"]);
    run("STATES", [range, 12, null, null, null, "auto", "auto"]);
    const stats = modelCacheStats();
    expect(stats.misses).toBe(4); // one fit per product
    expect(stats.hits).toBe(16);
  });

  test("a typed actual refits that series alone", () => {
    const columns = inventedColumns();
    const range = (cols: (number | null)[][]) => gridFromColumns(cols, 41);
    clearModelCache();
    invoke(specOf("AHEAD"), [range(columns), 12, 6, "auto", "auto"]);
    const before = modelCacheStats().misses;
    columns[3].push(400); // next month's actual of the last product
    invoke(specOf("AHEAD"), [range(columns), 12, 6, "auto", "auto"]);
    expect(modelCacheStats().misses - before).toBe(1);
  });

  test("stays within its bounds, dropping the least recently used series first", () => {
    setModelCacheLimits(3, 1e9);
    const series = (k: number) => Array.from({ length: 30 }, (_, t) => [100 + k + 10 * Math.sin(t)]);
    for (let k = 0; k < 5; k++) invoke(specOf("FIT"), [series(k), 1, null, "none"]);
    expect(modelCacheStats().entries).toBe(3);
    const misses = modelCacheStats().misses;
    invoke(specOf("FIT"), [series(4), 1, null, "none"]); // still kept
    expect(modelCacheStats().misses).toBe(misses);
    invoke(specOf("FIT"), [series(0), 1, null, "none"]); // dropped earlier: refitted
    expect(modelCacheStats().misses).toBe(misses + 1);
    setModelCacheLimits(100, 5000); // a byte bound below two entries' estimate keeps one
    invoke(specOf("FIT"), [series(7), 1, null, "none"]);
    expect(modelCacheStats().entries).toBe(1);
    expect(modelCacheStats().bytes).toBeLessThanOrEqual(5000);
  });
});
