/** Forecast accuracy measures. error = actual - forecast throughout; NaN marks a missing value. */
export { mad } from "./mad";
export { mse } from "./mse";
export { rmse } from "./rmse";
export { mape } from "./mape";
export { smape } from "./smape";
export { mase, maseScale } from "./mase";
export { bias } from "./bias";
export {
  trackingSignal,
  windowSignal,
  windowFigures,
  type WindowFigures,
  parseTrackingForm,
  trackingLimit,
  TRACKING_WINDOW,
  TRACKING_LIMIT,
  TRACKING_BASELINE,
  RUNNING_LIMIT,
  MEAN_ABS_TO_SD,
  TRACKING_FORMS,
  type TrackingForm,
} from "./tracking";
export { theilU } from "./theilU";
export { accuracyTable, type AccuracyRow } from "./table";
export { forecastValueAdded, parseFvaMeasure, FVA_MEASURES, type FvaMeasure, type FvaResult, type FvaStep } from "./fva";
