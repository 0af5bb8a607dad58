import { classicalIndices, leastSquaresLine } from "../decompose";
import { badInput, notEnough } from "../errors";
import type { Seasonality, Start, TrendKind } from "../types";
import { modelShape } from "../shape";

/**
 * The start of the classic general-purpose statistical implementation of Holt-Winters
 * (base R's `stats::HoltWinters`, R Core Team), reproduced so results can be checked
 * against it to many digits:
 * - seasonal: decomposition of the first two seasons; the k existing moving-average values
 *   regressed on 1..k; level = intercept (the line at rank 0), trend = slope; indices the
 *   normalised decomposition figure; updating from period p+1;
 * - no seasonality: level = y2, trend = y2 - y1, updating from period 3.
 */
export function classicStart(y: Float64Array, p: number, seasonality: Seasonality, trend: TrendKind): Start {
  const shape = modelShape({ period: p, seasonality, trend, start: "classic" });
  const seasonal = shape.seasonal;
  if (!seasonal) {
    if (y.length < shape.firstUpdate + 1) throw notEnough(shape.firstUpdate + 1, y.length);
    if (Number.isNaN(y[0]) || Number.isNaN(y[1])) {
      throw badInput("start-gap", "The classic start needs the first two values; fill them or use the decomposition start.");
    }
    const slope = trend === "none" ? 0 : y[1] - y[0];
    return { method: "classic", state: { level: y[1], trend: slope, indices: new Float64Array(0) }, firstUpdate: shape.firstUpdate };
  }
  const window = shape.startWindow;
  if (y.length < window + 1) throw notEnough(window + 1, y.length);
  for (let t = 0; t < window; t++) {
    if (Number.isNaN(y[t])) {
      throw badInput("start-gap", `The classic start needs the first ${window} values complete; value ${t + 1} is blank. Fill it or use the decomposition start.`, { index: t });
    }
  }
  const dec = classicalIndices(y.subarray(0, window), p, seasonality);
  const ma: number[] = [];
  for (let t = 0; t < window; t++) if (!Number.isNaN(dec.movingAverage[t])) ma.push(dec.movingAverage[t]);
  const ranks = ma.map((_, i) => i + 1);
  const { intercept, slope } = leastSquaresLine(ranks, ma);
  return {
    method: "classic",
    state: { level: intercept, trend: trend === "none" ? 0 : slope, indices: dec.normal.slice() },
    firstUpdate: shape.firstUpdate,
    detail: {
      window,
      movingAverage: dec.movingAverage,
      detrended: dec.detrended,
      rawIndices: dec.raw,
      normalIndices: dec.normal,
      intercept,
      slope,
      regressionX: "ma-rank",
    },
  };
}
