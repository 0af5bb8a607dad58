/**
 * Scores the reference programs' forecasts with the bench's own scorer, and compares their
 * in-sample SSE with Ebb's on the same start (base R's classic start).
 */
import { seasonalNaive } from "./baselines";
import type { M3Series } from "./m3";
import type { ReferenceFit, ReferenceRun } from "./references";
import { CoverageTally, Scoreboard } from "./scoring";

export interface ReferenceSummary {
  /** Method key prefix: "r" or "sm". */
  prefix: string;
  run: ReferenceRun;
  /** Seconds per successful fit, by seasonality and frequency. */
  seconds: Record<"multiplicative" | "additive", { monthly: number[]; quarterly: number[] }>;
  failures: number;
  warnings: number;
  /** Series whose best-by-SSE choice was multiplicative. */
  bestMultiplicative: number;
}

const SUFFIX = { multiplicative: "mult", additive: "add" } as const;

function usable(f: ReferenceFit | undefined, horizon: number): f is ReferenceFit & { forecast: Float64Array } {
  return !!f && Number.isFinite(f.sse) && !!f.forecast && f.forecast.length === horizon && f.forecast.every(Number.isFinite);
}

function tallyIntervals(coverage: CoverageTally, key: string, s: M3Series, f: ReferenceFit): void {
  if (f.low80 && f.high80) coverage.add(key, s, 0.8, f.low80, f.high80);
  if (f.low95 && f.high95) coverage.add(key, s, 0.95, f.low95, f.high95);
}

export function scoreReference(
  prefix: string,
  run: ReferenceRun,
  series: M3Series[],
  board: Scoreboard,
  coverage: CoverageTally,
): ReferenceSummary {
  const summary: ReferenceSummary = {
    prefix,
    run,
    seconds: { multiplicative: { monthly: [], quarterly: [] }, additive: { monthly: [], quarterly: [] } },
    failures: 0,
    warnings: 0,
    bestMultiplicative: 0,
  };
  if (run.skipped) return summary; // nothing to score: its rows stay out of the tables
  const byId = new Map<string, Partial<Record<ReferenceFit["seasonality"], ReferenceFit>>>();
  for (const f of run.fits) {
    const entry = byId.get(f.id) ?? {};
    entry[f.seasonality] = f;
    byId.set(f.id, entry);
  }
  for (const s of series) {
    const fits = byId.get(s.id) ?? {};
    const fallback = seasonalNaive(s.train, s.period, s.horizon);
    let best: ReferenceFit | undefined;
    for (const seasonality of ["multiplicative", "additive"] as const) {
      const key = `${prefix}-${SUFFIX[seasonality]}`;
      const f = fits[seasonality];
      if (f?.warning) summary.warnings++;
      if (!usable(f, s.horizon)) {
        summary.failures++;
        board.add(key, s, fallback);
        board.noteStandIn(key);
        continue;
      }
      summary.seconds[seasonality][s.frequency].push(f.seconds);
      board.add(key, s, f.forecast);
      tallyIntervals(coverage, key, s, f);
      if (!best || f.sse < best.sse) best = f;
    }
    const bestKey = `${prefix}-best`;
    if (best?.forecast) {
      board.add(bestKey, s, best.forecast);
      tallyIntervals(coverage, bestKey, s, best);
      if (best.seasonality === "multiplicative") summary.bestMultiplicative++;
    } else {
      board.add(bestKey, s, fallback);
      board.noteStandIn(bestKey);
    }
  }
  return summary;
}

export interface SseComparison {
  seasonality: "multiplicative" | "additive";
  compared: number;
  /** Series where Ebb's SSE is at most R's (relative tolerance 1e-9). */
  notHigher: number;
  /** Median and largest of (Ebb SSE - R SSE) / R SSE. */
  medianRelative: number;
  worstRelative: number;
  worstId: string;
}

/** Ebb's classic-start SSE against base R's, series by series (same start, same update window). */
export function compareSse(rRun: ReferenceRun, ebbSse: Record<"multiplicative" | "additive", Map<string, number>>): SseComparison[] {
  return (["multiplicative", "additive"] as const).map((seasonality) => {
    const rel: { id: string; value: number }[] = [];
    for (const f of rRun.fits) {
      if (f.seasonality !== seasonality || !Number.isFinite(f.sse)) continue;
      const mine = ebbSse[seasonality].get(f.id);
      if (mine === undefined) continue;
      rel.push({ id: f.id, value: f.sse > 0 ? (mine - f.sse) / f.sse : mine - f.sse });
    }
    rel.sort((a, b) => a.value - b.value);
    const worst = rel[rel.length - 1];
    return {
      seasonality,
      compared: rel.length,
      notHigher: rel.filter((r) => r.value <= 1e-9).length,
      medianRelative: rel.length ? rel[Math.floor((rel.length - 1) / 2)].value : NaN,
      worstRelative: worst?.value ?? NaN,
      worstId: worst?.id ?? "",
    };
  });
}

export interface ForecastPackageSummary {
  run: ReferenceRun;
  seconds: Record<"ets" | "theta", { monthly: number[]; quarterly: number[] }>;
  failures: number;
}

/** R's forecast package (ets, thetaf): scored as "fc-ets" and "fc-theta" by the same code. */
export function scoreForecastPackage(run: ReferenceRun, series: M3Series[], board: Scoreboard, coverage: CoverageTally): ForecastPackageSummary {
  const summary: ForecastPackageSummary = { run, seconds: { ets: { monthly: [], quarterly: [] }, theta: { monthly: [], quarterly: [] } }, failures: 0 };
  if (run.skipped) return summary;
  const byKey = new Map(run.fits.map((f) => [`${f.id}|${f.seasonality}`, f]));
  for (const s of series) {
    for (const method of ["ets", "theta"] as const) {
      const f = byKey.get(`${s.id}|${method}`);
      const key = `fc-${method}`;
      // thetaf reports no in-sample SSE: only the forecast must be complete.
      if (!f?.forecast || f.forecast.length !== s.horizon || !f.forecast.every(Number.isFinite)) {
        summary.failures++;
        board.add(key, s, seasonalNaive(s.train, s.period, s.horizon));
        board.noteStandIn(key);
        continue;
      }
      summary.seconds[method][s.frequency].push(f.seconds);
      board.add(key, s, f.forecast);
      tallyIntervals(coverage, key, s, f as ReferenceFit);
    }
  }
  return summary;
}
