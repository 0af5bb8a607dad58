/**
 * The accuracy functions: one number per measure, the tracking signal, and the whole
 * table. Actual and forecast are ranges of the same size, one forecast per actual; a period
 * where either cell is blank is skipped.
 */
import { accuracyTable, bias, cleanHistory, mad, mape, mase, mse, rmse, parseTrackingForm, smape, theilU, trackingSignal } from "../engine";
import { periodArg } from "./arguments";
import { type Block, finiteNumber, optionalNumber } from "./cells";
import { optionalWordArg, readOneSeries, toFloat64 } from "./coerce";

function pairOf(actual: unknown, forecast: unknown): [Float64Array, Float64Array] {
  return [toFloat64(readOneSeries(actual, "actual").values), toFloat64(readOneSeries(forecast, "forecast").values)];
}

type Measure = (a: Float64Array, f: Float64Array) => number;

function measureFn(measure: Measure, what: string): (actual: unknown, forecast: unknown) => number {
  return (actual, forecast) => finiteNumber(measure(...pairOf(actual, forecast)), what);
}

export const madFn = measureFn(mad, "MAD");
export const mseFn = measureFn(mse, "MSE");
export const rmseFn = measureFn(rmse, "RMSE");
export const mapeFn = measureFn(mape, "MAPE");
export const smapeFn = measureFn(smape, "sMAPE");
export const biasFn = measureFn(bias, "bias");
export const theilUFn = measureFn(theilU, "Theil's U2");

/** EBB.MASE: scaled by the history's in-sample seasonal naive MAE. */
export function maseFn(actual: unknown, forecast: unknown, history: unknown, period: unknown): number {
  const [a, f] = pairOf(actual, forecast);
  const h = cleanHistory(readOneSeries(history, "history").values);
  return finiteNumber(mase(a, f, h, periodArg(period)), "MASE");
}

/** EBB.TRACKING: the tracking signal per period (blank until defined), down to the last period with both values. */
export function trackingFn(actual: unknown, forecast: unknown, form: unknown): Block {
  const [a, f] = pairOf(actual, forecast);
  const signal = trackingSignal(a, f, parseTrackingForm(optionalWordArg(form, "form")));
  let last = Math.min(a.length, f.length) - 1;
  while (last > 0 && (Number.isNaN(a[last]) || Number.isNaN(f[last]))) last--;
  return Array.from(signal.subarray(0, last + 1), (v) => [optionalNumber(v, "tracking signal")]);
}

/** EBB.ACCURACY: a two-column table of measure names and values (an error cell where one is undefined). */
export function accuracyFn(actual: unknown, forecast: unknown, history: unknown, period: unknown): Block {
  const [a, f] = pairOf(actual, forecast);
  const p = periodArg(period);
  const h = history === undefined || history === null ? undefined : cleanHistory(readOneSeries(history, "history").values);
  return accuracyTable(a, f, h, p).map(([name, value]) => [name, typeof value === "number" ? finiteNumber(value, name) : value]);
}
