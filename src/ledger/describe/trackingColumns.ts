import { runningErrorSum, runningMad, trackingSignal } from "../../engine";
import { cellAddress } from "./addresses";
import { nm, type SectionContext } from "./context";
import { FORMAT } from "./sheet";
import { RELATIVE_TOLERANCE } from "./tolerance";

/**
 * The tracking signal in the ledger, in one place: the engine's figures, the update table's
 * three columns (errors so far, MAD so far, tracking signal) with their formulas, and the
 * scorecard's two rows (latest signal, rows outside the limit). A change of the signal's form
 * changes this file (and the labels' notes) only.
 */
export const TRACKING_LIMIT = 4;

export interface TrackingFigures {
  /** Per update period (index t - firstUpdate). */
  errorSum: Float64Array;
  /** Running MAD; null before the first error. */
  runningMad: (number | null)[];
  signal: Float64Array;
  /** Update rows whose signal lies outside +/- TRACKING_LIMIT. */
  outside: number;
}

/** The engine's tracking figures over the update periods. */
export function trackingFigures(actual: Float64Array, forecast: Float64Array, errors: Float64Array): TrackingFigures {
  const signal = trackingSignal(actual, forecast, "running");
  return {
    errorSum: runningErrorSum(errors),
    runningMad: Array.from(runningMad(errors), (v) => (Number.isNaN(v) ? null : v)),
    signal,
    outside: Array.from(signal).filter((v) => Math.abs(v) > TRACKING_LIMIT).length,
  };
}

/**
 * The tolerance of a signal: errors carry rounding of about 1e-9 of the data's size, and the
 * signal divides their sum by the MAD; where the MAD is rounding noise itself, any signal
 * within its bounds (+/- the count of errors) passes (the formula is still checked as text).
 */
function signalTolerance(signal: number, mad: number | null, count: number, scale: number): number {
  const delta = RELATIVE_TOLERANCE * scale;
  if (mad === null) return 0;
  if (mad <= 10 * delta) return 2 * Math.max(1, count);
  return (2 * delta * (1 + Math.abs(signal))) / mad;
}

/** The three tracking cells of the update row r (period t), reading its error and absolute error columns. */
export function trackingCells(ctx: SectionContext, r: number, t: number): void {
  const { g, cells, f } = ctx;
  const u = g.updates;
  const cols = u.cols;
  const i = t - f.firstUpdate;
  const c = (key: keyof typeof cols) => cellAddress(r, cols[key]!);
  const first = (key: keyof typeof cols) => cellAddress(u.firstUpdate, cols[key]!, true, false);
  const absSpan = `${first("absError")}:${c("absError")}`;
  const tr = f.tracking;
  cells.formula(r, cols.errorSum!, `=SUM(${first("error")}:${c("error")})`, tr.errorSum[i], FORMAT.units);
  const mad = tr.runningMad[i];
  cells.formula(r, cols.mad!, `=IF(COUNT(${absSpan})=0,"",AVERAGE(${absSpan}))`, mad === null ? "" : mad, FORMAT.units);
  const signal = cells.formula(r, cols.tracking!, `=IF(COUNT(${absSpan})=0,0,IF(${c("mad")}>0,${c("errorSum")}/${c("mad")},0))`, tr.signal[i], FORMAT.signal);
  signal.tolerance = signalTolerance(tr.signal[i], mad, i + 1, f.scale);
}

/** The scorecard's tracking rows: [key, formula, engine value, format, tolerance]. */
export function trackingScoreRows(ctx: SectionContext, rowsCell: string): ["tracking" | "outside", string, number, string, number | undefined][] {
  const tracking = nm(ctx, "tracking");
  const tr = ctx.f.tracking;
  const last = tr.signal.length - 1;
  return [
    ["tracking", `=INDEX(${tracking},${rowsCell})`, tr.signal[last], FORMAT.signal, signalTolerance(tr.signal[last], tr.runningMad[last], last + 1, ctx.f.scale)],
    ["outside", `=COUNTIF(${tracking},">${TRACKING_LIMIT}")+COUNTIF(${tracking},"<-${TRACKING_LIMIT}")`, tr.outside, FORMAT.count, undefined],
  ];
}
