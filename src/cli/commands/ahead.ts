import { fitModel, forecastModel, predictionInterval } from "../../engine";
import { AHEAD_HELP } from "../help";
import { nextLabels } from "../input/periodLabels";
import type { BatchCommand } from "./batch";
import { modelSummary } from "./modelSummary";

export type AheadRow = {
  h: number;
  label?: string;
  forecast: number;
  low?: number;
  high?: number;
};

/**
 * `ahead`: the next --horizon forecasts, with low/high only when --coverage is given, and the
 * labels of the periods forecast when the file's labels are dates, months or quarters that
 * run evenly up to the series' last value.
 */
export const aheadCommand: BatchCommand = {
  name: "ahead",
  summary: "per series: the next --horizon forecasts, with low/high when --coverage is given",
  help: AHEAD_HELP,
  options: ["horizon", "coverage"],
  runSeries(column, run) {
    const model = fitModel(column.values, run.settings.model);
    const { horizon, coverage } = run.settings;
    const labels = run.labels && nextLabels(run.labels, column.values.length - 1, horizon);
    const label = (i: number) => (labels ? { label: labels[i] } : {});
    let ahead: AheadRow[];
    if (coverage === undefined) {
      ahead = Array.from(forecastModel(model, horizon), (forecast, i) => ({ h: i + 1, ...label(i), forecast }));
    } else {
      const band = predictionInterval(model, horizon, coverage);
      ahead = Array.from(band.forecast, (forecast, i) => ({ h: i + 1, ...label(i), forecast, low: band.low[i], high: band.high[i] }));
    }
    return { ...modelSummary(model), ahead };
  },
  csvColumns: ["series", "h", "label", "forecast", "low", "high", "message"],
  csvRows: (entry) => entry.ahead as AheadRow[],
};
