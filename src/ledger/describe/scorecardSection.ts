import { cellAddress } from "./addresses";
import { nm, type SectionContext } from "./context";
import { MAPE_UNDEFINED } from "./engineFigures";
import { SCORE_ROWS, SECTION } from "./labels";
import { FORMAT } from "./sheet";

type ScoreKey = "mad" | "rmse" | "mape" | "bias" | "tracking" | "outside" | "count";

/** Section 5: accuracy over the update rows, with the count of tracking-signal flags. */
export function scorecardSection(ctx: SectionContext): Record<ScoreKey, string> {
  const { g, cells, f } = ctx;
  const s = g.score;
  const errors = nm(ctx, "errors");
  const abs = nm(ctx, "abserrors");
  const pct = nm(ctx, "pcterrors");
  const tracking = nm(ctx, "tracking");
  const rows = ctx.refs.outlookRows!;
  cells.text(g.settings.heading, s.labelCol, SECTION.scorecard, "heading");
  cells.text(s.header, s.labelCol, SCORE_ROWS.header.label, "header");
  cells.text(s.header, s.valueCol, SCORE_ROWS.header.value, "header");
  const outside = Array.from(f.tracking).filter((v) => Math.abs(v) > 4).length;
  const rowsOut: [ScoreKey, string, number | string, string][] = [
    ["mad", `=AVERAGE(${abs})`, f.score.mad, FORMAT.units],
    ["rmse", `=SQRT(SUMSQ(${errors})/COUNT(${errors}))`, f.score.rmse, FORMAT.units],
    ["mape", `=IF(COUNT(${pct})<COUNT(${errors}),"${MAPE_UNDEFINED}",AVERAGE(${pct}))`, f.score.mape, FORMAT.percent],
    ["bias", `=AVERAGE(${errors})`, f.score.bias, FORMAT.units],
    ["tracking", `=INDEX(${tracking},${rows})`, f.tracking[f.tracking.length - 1], FORMAT.signal],
    ["outside", `=COUNTIF(${tracking},">4")+COUNTIF(${tracking},"<-4")`, outside, FORMAT.count],
    ["count", `=COUNT(${errors})`, f.score.count, FORMAT.count],
  ];
  const out = {} as Record<ScoreKey, string>;
  rowsOut.forEach(([key, formula, value, format], i) => {
    const r = s.first + i;
    cells.text(r, s.labelCol, SCORE_ROWS[key].label, "label", SCORE_ROWS[key].note);
    cells.formula(r, s.valueCol, formula, value, format, "result");
    out[key] = cellAddress(r, s.valueCol);
  });
  return out;
}
