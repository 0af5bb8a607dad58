import { cellAddress } from "./addresses";
import { abs, nm, type SectionContext } from "./context";
import { MAPE_UNDEFINED } from "./engineFigures";
import { SCORE_ROWS, SECTION } from "./labels";
import { FORMAT } from "./sheet";
import { RELATIVE_TOLERANCE } from "./tolerance";
import { trackingScoreRows } from "./trackingColumns";

type ScoreKey = "mad" | "rmse" | "mape" | "bias" | "tracking" | "outside" | "count" | "corrected";

/** Section 5: accuracy over the update rows, with the count of tracking-signal flags. */
export function scorecardSection(ctx: SectionContext): Record<Exclude<ScoreKey, "corrected">, string> & { corrected?: string } {
  const { g, cells, f } = ctx;
  const s = g.score;
  const errors = nm(ctx, "errors");
  const abs = nm(ctx, "abserrors");
  const pct = nm(ctx, "pcterrors");
  const rows = ctx.refs.outlookRows!;
  cells.text(g.settings.heading, s.labelCol, SECTION.scorecard, "heading");
  cells.text(s.header, s.labelCol, SCORE_ROWS.header.label, "header");
  cells.text(s.header, s.valueCol, SCORE_ROWS.header.value, "header");
  // MAPE averages percent errors: its rounding is at most that of the smallest actual's.
  let smallest = Infinity;
  for (const v of f.y.subarray(f.firstUpdate)) if (!Number.isNaN(v) && v !== 0) smallest = Math.min(smallest, Math.abs(v));
  const mapeTolerance = Number.isFinite(smallest) ? (100 * RELATIVE_TOLERANCE * f.scale) / smallest : undefined;
  const [tracking, outside] = trackingScoreRows(ctx, rows);
  const rowsOut: [ScoreKey, string, number | string, string, number | undefined][] = [
    ["mad", `=AVERAGE(${abs})`, f.score.mad, FORMAT.units, undefined],
    ["rmse", `=SQRT(SUMSQ(${errors})/COUNT(${errors}))`, f.score.rmse, FORMAT.units, undefined],
    ["mape", `=IF(COUNT(${pct})<COUNT(${errors}),"${MAPE_UNDEFINED}",AVERAGE(${pct}))`, f.score.mape, FORMAT.percent, mapeTolerance],
    ["bias", `=AVERAGE(${errors})`, f.score.bias, FORMAT.units, undefined],
    tracking,
    outside,
    ["count", `=COUNT(${errors})`, f.score.count, FORMAT.count, undefined],
  ];
  const corrected = correctedRow(ctx);
  if (corrected) rowsOut.push(corrected);
  const out = {} as Record<ScoreKey, string>;
  rowsOut.forEach(([key, formula, value, format, tolerance], i) => {
    const r = s.first + i;
    cells.text(r, s.labelCol, SCORE_ROWS[key].label, "label", SCORE_ROWS[key].note);
    const cell = cells.formula(r, s.valueCol, formula, value, format, "result");
    if (tolerance !== undefined) cell.tolerance = tolerance;
    out[key] = cellAddress(r, s.valueCol);
  });
  return out;
}

/** Periods corrected: the corrections of the start table plus those of the update rows after it. */
function correctedRow(ctx: SectionContext): [ScoreKey, string, number, string, undefined] | undefined {
  const { g, f } = ctx;
  const sc = g.start.cols.correction;
  const uc = g.updates.cols.correction;
  if (!ctx.corrections || sc === undefined || uc === undefined) return undefined;
  const startRange = `${abs(g.start.first, sc)}:${abs(g.start.first + f.window - 1, sc)}`;
  const firstOwn = g.updates.firstUpdate + (Math.max(f.window, f.firstUpdate) - f.firstUpdate);
  const updateRange = `${abs(firstOwn, uc)}:${abs(g.updates.reachLast, uc)}`;
  return ["corrected", `=COUNT(${startRange})+COUNT(${updateRange})`, ctx.corrections.count, FORMAT.count, undefined];
}
