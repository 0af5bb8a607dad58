/**
 * Ebb and the two baselines on the M3 series with the competition's protocol: fit on the
 * training part, forecast the horizon, score against the held-out part. Ebb's fits are timed
 * one by one in CPU time (optimised constants, decomposition start unless said otherwise).
 */
import { fitModel, forecastModel, predictionInterval, type FittedModel, type ModelOptions } from "../../src/engine";
import { naive2, seasonalNaive } from "./baselines";
import type { M3Series } from "./m3";
import { Progress } from "./progress";
import { CoverageTally, Scoreboard } from "./scoring";
import { MemoryWatch } from "./timing";

export interface EbbMethod {
  key: string;
  options: Omit<ModelOptions, "period">;
}

export const AUTO: EbbMethod = { key: "ebb-auto", options: { seasonality: "auto", trend: "auto" } };

const SHORT = { multiplicative: "mult", additive: "add" } as const;

/** The fixed variants: multiplicative and additive seasonality x linear, damped and no trend. */
export const FIXED: EbbMethod[] = (["multiplicative", "additive"] as const).flatMap((seasonality) =>
  (["linear", "damped", "none"] as const).map((trend) => ({
    key: `ebb-${SHORT[seasonality]}-${trend}`,
    options: { seasonality, trend },
  })),
);

/** Same models as base R's HoltWinters: linear trend, the classic start, for the SSE comparison. */
export const CLASSIC: EbbMethod[] = (["multiplicative", "additive"] as const).map((seasonality) => ({
  key: `ebb-${SHORT[seasonality]}-classic`,
  options: { seasonality, trend: "linear", start: "classic" },
}));

export const EBB_METHODS: EbbMethod[] = [AUTO, ...FIXED, ...CLASSIC];
export const COVERAGES = [0.8, 0.95];

export interface AccuracyRun {
  /** Per method key: seconds per fit, one entry per series fitted (in series order, failures excluded). */
  fitSeconds: Map<string, { monthly: number[]; quarterly: number[] }>;
  /** Per method key: in-sample SSE per series id (for the comparison with base R). */
  sse: Map<string, Map<string, number>>;
  /** Per method key: error messages of fits that failed (the seasonal naive forecast stood in). */
  failures: Map<string, string[]>;
  /** Models chosen by the automatic fit: "seasonality/trend" -> count. */
  autoChoices: Map<string, number>;
  /** Series Naive2 treated as seasonal. */
  naive2Seasonal: number;
  intervalFailures: string[];
}

/** Process CPU time in seconds (user + system): other work sharing the machine is not counted. */
function cpuSeconds(): number {
  const u = process.cpuUsage();
  return (u.user + u.system) / 1e6;
}

function fitTimed(s: M3Series, m: EbbMethod): { model: FittedModel; seconds: number } {
  const t0 = cpuSeconds();
  const model = fitModel(s.train, { ...m.options, period: s.period });
  return { model, seconds: cpuSeconds() - t0 };
}

/** Fit every method on a few series first, untimed, so the timings are not those of cold code. */
function warmUp(series: M3Series[]): void {
  for (const s of series.slice(0, 20)) {
    for (const m of EBB_METHODS) {
      try {
        fitTimed(s, m);
      } catch {
        // failures are counted in the timed run
      }
    }
  }
}

export function runAccuracy(series: M3Series[], board: Scoreboard, coverage: CoverageTally, progress: Progress, memory: MemoryWatch): AccuracyRun {
  const run: AccuracyRun = {
    fitSeconds: new Map(EBB_METHODS.map((m) => [m.key, { monthly: [], quarterly: [] }])),
    sse: new Map(EBB_METHODS.map((m) => [m.key, new Map()])),
    failures: new Map(EBB_METHODS.map((m) => [m.key, []])),
    autoChoices: new Map(),
    naive2Seasonal: 0,
    intervalFailures: [],
  };
  warmUp(series);
  series.forEach((s, i) => {
    const fallback = seasonalNaive(s.train, s.period, s.horizon);
    board.add("snaive", s, fallback);
    const n2 = naive2(s.train, s.period, s.horizon);
    board.add("naive2", s, n2.forecast);
    if (n2.seasonal) run.naive2Seasonal++;

    for (const m of EBB_METHODS) {
      let fitted: { model: FittedModel; seconds: number };
      try {
        fitted = fitTimed(s, m);
      } catch (e) {
        run.failures.get(m.key)!.push(`${s.id}: ${(e as Error).message}`);
        board.add(m.key, s, fallback);
        board.noteStandIn(m.key);
        continue;
      }
      run.fitSeconds.get(m.key)![s.frequency].push(fitted.seconds);
      run.sse.get(m.key)!.set(s.id, fitted.model.sse);
      board.add(m.key, s, forecastModel(fitted.model, s.horizon));
      if (m === AUTO) {
        const choice = `${fitted.model.spec.seasonality}/${fitted.model.spec.trend}`;
        run.autoChoices.set(choice, (run.autoChoices.get(choice) ?? 0) + 1);
        for (const c of COVERAGES) {
          try {
            const band = predictionInterval(fitted.model, s.horizon, c);
            coverage.add(m.key, s, c, band.low, band.high);
            // Also by the chosen seasonality: the two use different interval methods.
            coverage.add(`${m.key}-${SHORT[fitted.model.spec.seasonality as keyof typeof SHORT] ?? "none"}-chosen`, s, c, band.low, band.high);
          } catch (e) {
            run.intervalFailures.push(`${s.id} (${c}): ${(e as Error).message}`);
          }
        }
      }
    }
    memory.sample();
    progress.step("Ebb and baselines on M3", i + 1, series.length);
  });
  return run;
}
