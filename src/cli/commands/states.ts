import { cleanHistory, fitModel, modelStates } from "../../engine";
import { STATES_HELP } from "../help";
import type { BatchCommand } from "./batch";
import { modelSummary } from "./modelSummary";

export type StateRow = {
  t: number;
  label?: string;
  actual: number;
  level: number;
  trend: number;
  index: number;
  forecast: number;
  error: number;
};

/**
 * `states`: one row per period, t = 1 at the first data row of the file, with the row's label
 * when the file has a label column. level, trend and index are the values after that period's
 * update; forecast is the one-step forecast made before it.
 */
export const statesCommand: BatchCommand = {
  name: "states",
  summary: "per series: one row per period (level, trend, index, forecast, error)",
  help: STATES_HELP,
  options: [],
  runSeries(column, run) {
    const history = cleanHistory(column.values);
    const model = fitModel(history, run.settings.model);
    const table = modelStates(model);
    const labels = run.labels;
    const states: StateRow[] = Array.from(history, (actual, i) => ({
      t: i + 1,
      ...(labels ? { label: labels[i] ?? "" } : {}),
      actual,
      level: table.level[i],
      trend: table.trend[i],
      index: table.index[i],
      forecast: table.forecast[i],
      error: table.error[i],
    }));
    return { ...modelSummary(model), states };
  },
  csvColumns: ["series", "t", "label", "actual", "level", "trend", "index", "forecast", "error", "message"],
  csvRows: (entry) => entry.states as StateRow[],
};
