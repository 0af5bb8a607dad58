import { cellAddress } from "./addresses";
import { nm, type SectionContext } from "./context";
import { CHART } from "./labels";
import type { ChartSpec } from "./types";

/** Section 6: a chart of actuals, one-step forecasts and the outlook with its interval. */
export function chartSpec(ctx: SectionContext, lastUpdateRow: number): ChartSpec {
  const { g } = ctx;
  const u = g.updates;
  const o = g.outlook;
  const col = (key: keyof typeof u.cols) => u.cols[key]!;
  const span = (r1: number, r2: number, c: number) => `${cellAddress(r1, c)}:${cellAddress(r2, c)}`;
  const oLast = o.first + ctx.horizon - 1;
  return {
    name: nm(ctx, "chart"),
    title: CHART.title(ctx.name),
    kind: "scatter-lines",
    series: [
      { label: CHART.actual, x: span(u.first, lastUpdateRow, col("period")), y: span(u.first, lastUpdateRow, col("actual")) },
      { label: CHART.forecast, x: span(u.firstUpdate, lastUpdateRow, col("period")), y: span(u.firstUpdate, lastUpdateRow, col("forecast")) },
      { label: CHART.outlook, x: span(o.first, oLast, o.cols.period!), y: span(o.first, oLast, o.cols.forecast!) },
      { label: CHART.low, x: span(o.first, oLast, o.cols.period!), y: span(o.first, oLast, o.cols.low!) },
      { label: CHART.high, x: span(o.first, oLast, o.cols.period!), y: span(o.first, oLast, o.cols.high!) },
    ],
    from: cellAddress(g.chart.row, g.chart.col),
    to: cellAddress(g.chart.lastRow, g.chart.lastCol),
  };
}
