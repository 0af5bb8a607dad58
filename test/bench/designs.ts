/**
 * The bench's "designs" section: the combination designs of combinationDesigns.ts on the M3
 * training parts (rolling origins, the ground designs are chosen on; Tashman 2000), on the M3
 * holdouts, and on public seasonal series no design was chosen on (publicSeries.ts), the last
 * beside R forecast's ets and thetaf holdout forecasts from the committed fixture. The automatic
 * model stays the single lowest-AICc model until the ledger can write a combination's members
 * (the audit promise of item 3); this section is what a change of design is decided on.
 */
import { maseScale, smape } from "../../src/engine";
import { COVERAGES, evaluateDesigns, meanAbsoluteError, METHODS, type Tally } from "./combinationDesigns";
import type { M3Series } from "./m3";
import type { Progress } from "./progress";
import { loadPublic, publicSource, type PublicSeries } from "./publicSeries";
import { holdoutCuts, rollingCuts } from "./rollingOrigins";
import { fixed, markdownTable, percent } from "./table";

interface DesignRow {
  data: string;
  cuts: string;
  tallies: Tally[];
}

interface ReferenceRow {
  data: string;
  name: string;
  smape: number;
  mase: number;
  n: number;
}

export interface DesignBench {
  rows: DesignRow[];
  references: ReferenceRow[];
  source: string;
}

function referenceScores(data: string, series: PublicSeries[]): ReferenceRow[] {
  return (["ets", "thetaf"] as const).map((name) => {
    let s = 0;
    let m = 0;
    for (const x of series) {
      s += smape(x.test, x.reference[name]);
      m += meanAbsoluteError(x.test, x.reference[name]) / maseScale(x.train, x.period);
    }
    return { data, name: `R forecast ${name}`, smape: s / series.length, mase: m / series.length, n: series.length };
  });
}

export function runDesignBench(monthly: M3Series[], quarterly: M3Series[], progress: Progress): DesignBench {
  const rows: DesignRow[] = [];
  const references: ReferenceRow[] = [];
  for (const [label, series] of [
    ["M3 monthly", monthly],
    ["M3 quarterly", quarterly],
    ["public monthly", loadPublic("monthly")],
    ["public quarterly", loadPublic("quarterly")],
  ] as const) {
    progress.note(`designs: ${label}, ${series.length} series`);
    rows.push({ data: label, cuts: "rolling origins", tallies: evaluateDesigns(rollingCuts(series)) });
    rows.push({ data: label, cuts: "holdout", tallies: evaluateDesigns(holdoutCuts(series)) });
    if (label.startsWith("public")) references.push(...referenceScores(label, series as PublicSeries[]));
  }
  return { rows, references, source: publicSource() };
}

export function renderDesignBench(r: DesignBench): string {
  const body = r.rows.flatMap((row) =>
    row.tallies.map((t, i) => [
      row.data,
      row.cuts,
      METHODS[i],
      fixed(t.smape / t.n, 2),
      fixed(t.mase / t.nMase, 3),
      ...COVERAGES.map((_, ci) => percent(t.inside[ci] / t.steps)),
      String(t.n) + (t.skipped > 0 ? ` (${t.skipped} left out)` : ""),
    ]),
  );
  const refs = r.references.map((x) => [x.data, "holdout", x.name, fixed(x.smape, 2), fixed(x.mase, 3), "-", "-", String(x.n)]);
  return [
    "## Combination designs",
    "",
    "The automatic model beside combinations that could replace it (test/bench/combinationDesigns.ts, each with its",
    "published source): scored on rolling origins over the M3 training parts (what a design is chosen on), on the M3",
    "holdouts, and on 20 public seasonal series that no design was chosen on (R's datasets, forecast and AER packages,",
    `split as M3 is; test/reference/fixtures/r-public-seasonal.json, ${r.source}), where R forecast's ets and thetaf`,
    "holdout forecasts are the references. Mean sMAPE and MASE over forecasts; coverage is the share of actuals inside",
    "the interval. `auto` stays the single lowest-AICc model until the ledger writes a combination's members.",
    "",
    markdownTable(["data", "cuts", "method", "sMAPE", "MASE", "80% inside", "95% inside", "forecasts"], [...body, ...refs], [false, false, false, true, true, true, true, true]),
  ].join("\n");
}
