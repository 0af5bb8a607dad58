import { cleanHistory, fitModel, modelStates } from "../../engine";
import type { BatchCommand } from "./batch";
import { modelSummary } from "./modelSummary";

export type StateRow = {
  t: number;
  actual: number;
  level: number;
  trend: number;
  index: number;
  forecast: number;
  error: number;
};

/**
 * `states`: one row per period, t = 1 at the first data row of the file. level, trend and index
 * are the values after that period's update; forecast is the one-step forecast made before it.
 */
export const statesCommand: BatchCommand = {
  runSeries(column, settings) {
    const history = cleanHistory(column.values);
    const model = fitModel(history, settings.model);
    const table = modelStates(model);
    const states: StateRow[] = Array.from(history, (actual, i) => ({
      t: i + 1,
      actual,
      level: table.level[i],
      trend: table.trend[i],
      index: table.index[i],
      forecast: table.forecast[i],
      error: table.error[i],
    }));
    return { ...modelSummary(model), states };
  },
  csvColumns: ["series", "t", "actual", "level", "trend", "index", "forecast", "error", "message"],
  csvRows: (entry) => entry.states as StateRow[],
};
