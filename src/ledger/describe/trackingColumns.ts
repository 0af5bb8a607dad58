import { TRACKING_BASELINE, TRACKING_LIMIT, TRACKING_WINDOW, windowFigures } from "../../engine";
import { cellAddress } from "./addresses";
import { nm, type SectionContext } from "./context";
import { FORMAT } from "./sheet";
import { RELATIVE_TOLERANCE } from "./tolerance";

/**
 * The tracking signal in the ledger, in one place: the engine's windowed signal (its window,
 * baseline and limit come from the engine), the update table's three columns (errors in the
 * window, MAD before the window, tracking signal) with their formulas, and the scorecard's two
 * rows (latest signal, rows flagged). A change of the signal's form changes this file (and the
 * labels' notes) only.
 */
export { TRACKING_LIMIT };

export interface TrackingFigures {
  /** Per update period (index t - firstUpdate): the sum of the errors in the window ending there. */
  windowSum: Float64Array;
  /** MAD of the errors before the window; null while fewer than the baseline's count precede it. */
  baselineMad: (number | null)[];
  /** The signal; NaN where it is not yet defined (the cell is blank). */
  signal: Float64Array;
  /** Update rows whose signal lies outside +/- TRACKING_LIMIT. */
  outside: number;
}

/** The engine's tracking figures over the update periods (errors NaN where the actual is missing). */
export function trackingFigures(errors: Float64Array): TrackingFigures {
  const w = windowFigures(errors);
  return {
    windowSum: w.windowSum,
    baselineMad: Array.from(w.baselineMad, (v) => (Number.isNaN(v) ? null : v)),
    signal: w.signal,
    outside: Array.from(w.signal).filter((v) => Math.abs(v) > TRACKING_LIMIT).length,
  };
}

/** A signal's value in a cell: blank text where the engine leaves it undefined. */
const shown = (v: number): number | string => (Number.isNaN(v) ? "" : v);

/**
 * The tolerance of a signal: each error carries rounding of about 1e-9 of the data's size, and
 * the signal divides the window's sum by the MAD; where the MAD is rounding noise itself, the
 * signal is noise too, and only its formula is held to (it is still checked as text).
 */
function signalTolerance(signal: number, mad: number | null, scale: number): number {
  const delta = RELATIVE_TOLERANCE * scale;
  if (mad === null || Number.isNaN(signal)) return 0;
  if (mad <= 10 * delta) return Infinity;
  return (2 * delta * (TRACKING_WINDOW + Math.abs(signal))) / mad;
}

/** The three tracking cells of the update row r (period t), reading its error and absolute error columns. */
export function trackingCells(ctx: SectionContext, r: number, t: number): void {
  const { g, cells, f } = ctx;
  const u = g.updates;
  const cols = u.cols;
  const i = t - f.firstUpdate;
  const c = (key: keyof typeof cols, row = r) => cellAddress(row, cols[key]!);
  const first = (key: keyof typeof cols) => cellAddress(u.firstUpdate, cols[key]!, true, false);
  const tr = f.tracking;
  // The window: this row and the rows above it, at most TRACKING_WINDOW of them.
  const top = u.firstUpdate + Math.max(0, i - TRACKING_WINDOW + 1);
  const windowErrors = `${c("error", top)}:${c("error")}`;
  cells.formula(r, cols.errorSum!, `=SUM(${windowErrors})`, tr.windowSum[i], FORMAT.units);
  const mad = tr.baselineMad[i];
  // The baseline: every absolute error above the window (none on the first rows, whose cell stays empty).
  if (i >= TRACKING_WINDOW) {
    const before = `${first("absError")}:${c("absError", r - TRACKING_WINDOW)}`;
    cells.formula(r, cols.mad!, `=IF(COUNT(${before})<${TRACKING_BASELINE},"",AVERAGE(${before}))`, mad === null ? "" : mad, FORMAT.units);
  }
  const M = c("mad");
  const k = `COUNT(${windowErrors})`;
  const formula = `=IF(ISNUMBER(${M}),IF(${k}=0,"",IF(${M}>0,${c("errorSum")}/(SQRT(PI()/2)*${M}*SQRT(${k})),0)),"")`;
  const signal = cells.formula(r, cols.tracking!, formula, shown(tr.signal[i]), FORMAT.signal);
  signal.tolerance = signalTolerance(tr.signal[i], mad, f.scale);
}

/** The scorecard's tracking rows: [key, formula, engine value, format, tolerance]. */
export function trackingScoreRows(ctx: SectionContext, rowsCell: string): ["tracking" | "outside", string, number | string, string, number | undefined][] {
  const tracking = nm(ctx, "tracking");
  const tr = ctx.f.tracking;
  const last = tr.signal.length - 1;
  return [
    ["tracking", `=INDEX(${tracking},${rowsCell})`, shown(tr.signal[last]), FORMAT.signal, signalTolerance(tr.signal[last], tr.baselineMad[last], ctx.f.scale)],
    ["outside", `=COUNTIF(${tracking},">${TRACKING_LIMIT}")+COUNTIF(${tracking},"<-${TRACKING_LIMIT}")`, tr.outside, FORMAT.count, undefined],
  ];
}

/** The signal as the panel reports it after writing: latest value, rows flagged, limit. */
export function trackingSummary(tr: TrackingFigures): { latest: number | null; flagged: number; limit: number } {
  const latest = tr.signal[tr.signal.length - 1];
  return { latest: Number.isNaN(latest) ? null : latest, flagged: tr.outside, limit: TRACKING_LIMIT };
}
