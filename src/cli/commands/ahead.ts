import { fitModel, forecastModel, predictionInterval } from "../../engine";
import type { BatchCommand } from "./batch";
import { modelSummary } from "./modelSummary";

export type AheadRow = {
  h: number;
  forecast: number;
  low?: number;
  high?: number;
};

/** `ahead`: the next --horizon forecasts, with low/high only when --coverage is given. */
export const aheadCommand: BatchCommand = {
  runSeries(column, settings) {
    const model = fitModel(column.values, settings.model);
    const { horizon, coverage } = settings;
    let ahead: AheadRow[];
    if (coverage === undefined) {
      ahead = Array.from(forecastModel(model, horizon), (forecast, i) => ({ h: i + 1, forecast }));
    } else {
      const band = predictionInterval(model, horizon, coverage);
      ahead = Array.from(band.forecast, (forecast, i) => ({ h: i + 1, forecast, low: band.low[i], high: band.high[i] }));
    }
    return { ...modelSummary(model), ahead };
  },
  csvColumns: ["series", "h", "forecast", "low", "high", "message"],
  csvRows: (entry) => entry.ahead as AheadRow[],
};
