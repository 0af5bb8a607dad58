/** Everything one bench run measured, as the report and the target check read it. */
import type { AccuracyRun } from "./accuracy";
import type { AheadRow } from "./ahead";
import type { WorkbookResult } from "./workbook";
import type { Machine } from "./machine";
import type { ForecastPackageSummary, ReferenceSummary, SseComparison } from "./referenceScoring";
import type { CoverageTally, Scoreboard } from "./scoring";
import type { ThroughputResult } from "./throughput";

export interface BenchResult {
  date: string;
  mode: "full" | "quick";
  machine: Machine;
  monthlySeries: number;
  quarterlySeries: number;
  throughput: ThroughputResult;
  accuracy: AccuracyRun;
  board: Scoreboard;
  coverage: CoverageTally;
  /** Absent when the run was not asked for references. */
  references?: ReferenceSummary[];
  /** R's forecast package (ets, thetaf); absent without --references. */
  forecastPackage?: ForecastPackageSummary;
  /** Absent when base R was not run. */
  sse?: SseComparison[];
  /** Why a reference program was skipped, when it was. */
  referenceNotes: string[];
  ahead: AheadRow;
  /** The planning workbook on the embedded formula engine (absent in runs from before it existed). */
  workbook?: WorkbookResult;
  maxRssBytes: number;
  peakHeapBytes: number;
  elapsedSeconds: number;
  /** The code measured: commit and whether src/engine had uncommitted changes. */
  codeState: string;
  /** One-minute load average of the machine at the start and at the end of the run. */
  loadAverage: [number, number];
}

/** Display names of every scored method, in table order. */
export const METHOD_LABELS: [string, string][] = [
  ["ebb-auto", "Ebb auto (lowest AICc)"],
  ["ebb-mult-linear", "Ebb mult. linear"],
  ["ebb-mult-damped", "Ebb mult. damped"],
  ["ebb-mult-none", "Ebb mult. no trend"],
  ["ebb-add-linear", "Ebb add. linear"],
  ["ebb-add-damped", "Ebb add. damped"],
  ["ebb-add-none", "Ebb add. no trend"],
  ["ebb-mult-classic", "Ebb mult. linear, classic start"],
  ["ebb-add-classic", "Ebb add. linear, classic start"],
  ["r-mult", "base R HoltWinters mult."],
  ["r-add", "base R HoltWinters add."],
  ["r-best", "base R HoltWinters, better SSE"],
  ["sm-mult", "statsmodels ES mult."],
  ["sm-add", "statsmodels ES add."],
  ["sm-best", "statsmodels ES, better SSE"],
  ["fc-ets", "R forecast ets (automatic ETS, AICc)"],
  ["fc-theta", "R forecast thetaf (Theta method)"],
  ["snaive", "Seasonal naive"],
  ["naive2", "Naive2"],
];

/** Coverage-only rows: Ebb auto's intervals split by the seasonality it chose. */
export const COVERAGE_SPLIT_LABELS: [string, string][] = [
  ["ebb-auto-mult-chosen", "Ebb auto, where it chose mult. (simulated interval)"],
  ["ebb-auto-add-chosen", "Ebb auto, where it chose add. (analytic interval)"],
];

export const labelOf = (key: string): string => [...METHOD_LABELS, ...COVERAGE_SPLIT_LABELS].find(([k]) => k === key)?.[1] ?? key;
