import { classicalIndices, leastSquaresLine } from "../decompose";
import { badInput, notEnough } from "../errors";
import type { Seasonality, Start, TrendKind } from "../types";
import { modelShape } from "../shape";
import { fillStartGaps } from "./fillGaps";

/**
 * Ebb's default start: classical decomposition over the first `cycles` full seasons.
 * Indices: centered moving average, ratio (or difference) to it, averaged per season
 * position, normalised. Level and trend: an ordinary least-squares line through the
 * deseasonalised window; the level is the line's value at the window's last period and
 * the trend its slope (no trend: the window's deseasonalised mean). Updating begins with
 * period cycles*p + 1. Method: classical decomposition as described by Makridakis,
 * Wheelwright & Hyndman (1998), Forecasting: Methods and Applications, ch. 4.
 *
 * Blanks: leading blanks are skipped (an item launched mid-year), so the window begins with
 * the first value present and updating begins `skipped` periods later; blanks inside the
 * window are filled by seasonally adjusted linear interpolation ({@link fillStartGaps}) before
 * the decomposition. `detail.skipped` and `detail.filled` say what was done.
 */
export function decompositionStart(
  y: Float64Array,
  p: number,
  seasonality: Seasonality,
  trend: TrendKind,
  cycles = 2,
): Start {
  if (!Number.isInteger(cycles) || cycles < 2) {
    throw badInput("bad-cycles", `The start window needs at least 2 seasons; got ${cycles}. Use 2 or more.`);
  }
  const shape = modelShape({ period: p, seasonality, trend, start: "decomposition", cycles });
  const seasonal = shape.seasonal;
  const window = shape.startWindow;
  const skipped = leadingBlanks(y);
  if (y.length - skipped < window) throw notEnough(window, y.length - skipped, "values from the first value present");
  const gaps = fillStartGaps(y.subarray(skipped, skipped + window), p, seasonality, seasonal);
  const w = gaps.values;
  const x = new Float64Array(window);
  for (let t = 0; t < window; t++) x[t] = t + 1;

  let indices = new Float64Array(0);
  let detail: Start["detail"];
  const deseasonalised = new Float64Array(window);
  if (seasonal) {
    const dec = classicalIndices(w, p, seasonality);
    indices = dec.normal.slice();
    for (let t = 0; t < window; t++) {
      deseasonalised[t] = seasonality === "multiplicative" ? w[t] / indices[t % p] : w[t] - indices[t % p];
    }
    detail = {
      window,
      movingAverage: dec.movingAverage,
      detrended: dec.detrended,
      rawIndices: dec.raw,
      normalIndices: dec.normal,
      intercept: 0,
      slope: 0,
      regressionX: "period",
    };
  } else {
    deseasonalised.set(w);
  }
  let intercept: number;
  let slope: number;
  if (trend === "none") {
    let s = 0;
    let c = 0;
    for (let t = 0; t < window; t++) if (!Number.isNaN(deseasonalised[t])) { s += deseasonalised[t]; c++; }
    if (c === 0) throw notEnough(1, 0, "usable values in the start window");
    intercept = s / c;
    slope = 0;
  } else {
    ({ intercept, slope } = leastSquaresLine(x, deseasonalised));
  }
  const level = intercept + slope * window;
  const base = detail ?? {
    window,
    movingAverage: new Float64Array(window).fill(NaN),
    detrended: new Float64Array(window).fill(NaN),
    rawIndices: new Float64Array(0),
    normalIndices: new Float64Array(0),
    intercept: 0,
    slope: 0,
    regressionX: "period" as const,
  };
  base.intercept = intercept;
  base.slope = slope;
  base.adjusted = deseasonalised;
  if (skipped > 0) base.skipped = skipped;
  if (gaps.filled.length > 0) base.filled = { at: gaps.filled.map((t) => t + skipped), values: gaps.filled.map((t) => w[t]) };
  // Window length is a whole number of seasons, so the period after it has the window's first
  // position: indices[k] serves period firstUpdate + k.
  return { method: "decomposition", state: { level, trend: slope, indices }, firstUpdate: shape.firstUpdate + skipped, detail: base };
}

/** Blanks before the first value present. */
export function leadingBlanks(y: Float64Array): number {
  let k = 0;
  while (k < y.length && Number.isNaN(y[k])) k++;
  return k;
}
