/** Forecast accuracy measures. error = actual - forecast throughout; NaN marks a missing value. */
export { mad } from "./mad";
export { mse } from "./mse";
export { rmse } from "./rmse";
export { mape } from "./mape";
export { smape } from "./smape";
export { mase, maseScale } from "./mase";
export { bias } from "./bias";
export { trackingSignal, runningErrorSum } from "./tracking";
export { runningMad } from "./runningMad";
export { theilU } from "./theilU";
export { accuracyTable, type AccuracyRow } from "./table";
