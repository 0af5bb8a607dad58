import { fitModel } from "../../engine";
import { FIT_HELP } from "../help";
import type { BatchCommand } from "./batch";
import { MODEL_COLUMNS, modelSummary } from "./modelSummary";

/** `fit`: per series, the model and its fitted constants and errors. */
export const fitCommand: BatchCommand = {
  name: "fit",
  summary: "per series: the model, its fitted constants and errors",
  help: FIT_HELP,
  options: [],
  runSeries: (column, run) => modelSummary(fitModel(column.values, run.settings.model)),
  csvColumns: ["series", ...MODEL_COLUMNS, "message"],
  csvRows: (entry) => [entry],
};
