import { fitModel } from "../../engine";
import type { BatchCommand } from "./batch";
import { MODEL_COLUMNS, modelSummary } from "./modelSummary";

/** `fit`: per series, the model and its fitted constants and errors. */
export const fitCommand: BatchCommand = {
  runSeries: (column, settings) => modelSummary(fitModel(column.values, settings.model)),
  csvColumns: ["series", ...MODEL_COLUMNS, "message"],
  csvRows: (entry) => [entry],
};
