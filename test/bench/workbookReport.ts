/** The workbook section of the report and its targets (issue: a planning workbook at typing speed). */
import type { TargetCheck } from "./targets";
import { fixed, markdownTable } from "./table";
import type { WorkbookResult, WorkbookRow } from "./workbook";

const find = (w: WorkbookResult, items: number, cached: boolean): WorkbookRow | undefined =>
  w.rows.find((r) => r.items === items && r.cached === cached);

export function workbookSection(w: WorkbookResult | undefined): string {
  if (!w) return "## Workbook\n\nNot run.";
  const sizes = [...new Set(w.rows.map((r) => r.items))];
  const cell = (r: WorkbookRow | undefined, key: "firstSeconds" | "recalcSeconds") => (r ? `${fixed(r[key], r[key] < 1 ? 3 : 2)} s` : "not run");
  const table = markdownTable(
    ["items", "first calculation, cached", "recalculation, cached", "first calculation, uncached", "recalculation, uncached", "error cells"],
    sizes.map((n) => {
      const c = find(w, n, true);
      const u = find(w, n, false);
      return [String(n), cell(c, "firstSeconds"), cell(c, "recalcSeconds"), cell(u, "firstSeconds"), cell(u, "recalcSeconds"), String(c?.errorCells ?? u?.errorCells ?? "-")];
    }),
    [true, true, true, true, true, true],
  );
  const calls = markdownTable(
    ["call", "seconds", "compare"],
    w.calls.map((c) => [c.label, fixed(c.seconds, 3), c.note]),
    [false, true, false],
  );
  return [
    "## Workbook",
    "",
    "The embedded formula engine (the preview's HyperFormula) with one column per item holding an M3 monthly training part",
    `(${w.rowsPerItem} rows: the longest part and a blank row for the next actual; beyond 1,428 items a series repeats scaled by 1.01, 1.02, ...)`,
    'and three formulas over the whole table: `=EBB.AHEAD(Data!A1:.., 12, 18, "auto", "auto")`, `=EBB.BAND(.., 12, 18, 0.95, "auto", "auto")`',
    'and `=EBB.FIT(.., 12, "auto", "auto")`. First calculation: building the workbook. Recalculation: after typing the next month\'s actual',
    "of one item below its column. Wall time, so other work on the machine counts. Cached: the model cache of the worksheet functions",
    "(one fit per series and options, shared by the three formulas); uncached: every formula fits every series.",
    "",
    table,
    "",
    `The model cache after the largest cached workbook: ${w.cache.entries} series, about ${fixed(w.cache.bytes / 2 ** 20, 1)} MiB estimated` +
      ` (bounds: ${w.cache.maxEntries} series, ${fixed(w.cache.maxBytes / 2 ** 20, 0)} MiB).`,
    "",
    "Single calls through the functions layer (cache emptied before each; M3 monthly series of at least 120 values, and for the",
    "backtest an invented 1,000-month seasonal series):",
    "",
    calls,
  ].join("\n");
}

export function workbookTargets(w: WorkbookResult | undefined): TargetCheck[] {
  const checks: TargetCheck[] = [];
  const row = (target: string, items: number, key: "firstSeconds" | "recalcSeconds", limit: number) => {
    const r = w && find(w, items, true);
    checks.push(
      r
        ? { target, figure: `${fixed(r[key], 3)} s (model cache on)`, status: r[key] < limit ? "met" : "missed" }
        : { target, figure: "not run", status: "not measured" },
    );
  };
  row("Workbook: recalculation after one typed actual under 0.1 s at 500 items", 500, "recalcSeconds", 0.1);
  row("Workbook: recalculation after one typed actual under 0.3 s at 2,000 items", 2000, "recalcSeconds", 0.3);
  row("Workbook: first calculation under 2 s at 500 items", 500, "firstSeconds", 2);
  const ahead = w?.calls.find((c) => c.label.startsWith("EBB.AHEAD"));
  const band = w?.calls.find((c) => c.label.startsWith("EBB.BAND, 1000"));
  checks.push(
    ahead
      ? { target: "One EBB.AHEAD over 1,000 series x 120 periods under 0.3 s", figure: `${fixed(ahead.seconds, 3)} s`, status: ahead.seconds < 0.3 ? "met" : "missed" }
      : { target: "One EBB.AHEAD over 1,000 series x 120 periods under 0.3 s", figure: "not run", status: "not measured" },
  );
  checks.push(
    band
      ? {
          target: "EBB.BAND (simulated) over 1,000 series x 120 periods costs no more than AHEAD did before (1.17 s)",
          figure: `${fixed(band.seconds, 3)} s, fit included`,
          status: band.seconds <= 1.17 ? "met" : "missed",
        }
      : { target: "EBB.BAND over 1,000 series costs no more than AHEAD did before", figure: "not run", status: "not measured" },
  );
  return checks;
}
