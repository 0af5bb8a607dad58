/**
 * EBB.CORRECTED, EBB.UNUSUAL and EBB.BUFFER: from forecast to order. Corrected history kept
 * beside the actuals, suggested corrections, and safety stock from the model's lead-time error.
 */
import { applyCorrections, badInput, checkServiceLevel, checkThreshold, checkWholePeriods, fitModel, stockBuffer, unusualPeriods, UNUSUAL_THRESHOLD } from "../engine";
import { periodArg } from "./arguments";
import { type Block, column, finiteNumber } from "./cells";
import { optionalNumberArg, readRange, readSeries, requiredNumberArg, type SeriesInput } from "./coerce";
import { optionWordsArg } from "./optionWords";
import { eachSeries } from "./series";

/** EBB.CORRECTED: the history with every non-blank correction used in place of its actual, same shape. */
export function correctedFn(history: unknown, corrections: unknown): Block {
  const h = readRange(history, "history");
  const c = readRange(corrections, "corrections");
  if (h.length !== c.length || h[0].length !== c[0].length) {
    throw badInput(
      "corrections-shape",
      `The corrections range is ${c.length} x ${c[0].length} cells and the history ${h.length} x ${h[0].length}. Select corrections of the same size as the history, row for row and column for column.`,
    );
  }
  const fixes = readSeries(c, "corrections", true);
  const rows = h.length === 1 && h[0].length > 1;
  const block = eachSeries(readSeries(h, "history"), 1, (s, i) => {
    const fix = fixes[i];
    if (!(fix && "values" in fix)) throw fix;
    return column(applyCorrections(s.values, fix.values).values);
  });
  // A single row of history comes back as a single row.
  return rows ? [block.map((r) => r[0])] : block;
}

/** EBB.UNUSUAL: per period, a flag ("high" or "low") and the suggested replacement, two columns per series. */
export function unusualFn(history: unknown, period: unknown, threshold: unknown): Block {
  const p = periodArg(period);
  const t = checkThreshold(optionalNumberArg(threshold, "threshold") ?? UNUSUAL_THRESHOLD);
  return eachSeries(readSeries(history, "history"), 2, (s) => {
    const u = unusualPeriods(s.values, { period: p, seasonality: "auto", trend: "auto" }, t);
    return s.values.map((_, i) => {
      const f = i < u.flag.length ? u.flag[i] : 0;
      return f === 0 ? [null, null] : [f > 0 ? "high" : "low", finiteNumber(u.suggestion[i], "suggested value")];
    });
  });
}

/** EBB.BUFFER: per series lead-time demand, the standard deviation of its error, safety stock, reorder point. */
export function bufferFn(history: unknown, period: unknown, leadTime: unknown, serviceLevel: unknown, reviewPeriod: unknown, options: unknown): Block {
  const settings = {
    leadTime: checkWholePeriods(requiredNumberArg(leadTime, "lead_time", "Type the lead time in periods, for example 3."), "lead time", 1),
    serviceLevel: checkServiceLevel(requiredNumberArg(serviceLevel, "service_level", "Type the cycle service level, for example 0.95.")),
    reviewPeriod: checkWholePeriods(optionalNumberArg(reviewPeriod, "review_period") ?? 0, "review period", 0),
  };
  const modelOptions = optionWordsArg(options, periodArg(period));
  return eachSeries(readSeries(history, "history"), 1, (s: SeriesInput) => {
    const b = stockBuffer(fitModel(s.values, modelOptions), settings);
    return column([
      finiteNumber(b.forecast, "lead-time demand"),
      finiteNumber(b.sd, "standard deviation of the lead-time error"),
      finiteNumber(b.safetyStock, "safety stock"),
      finiteNumber(b.reorderPoint, "reorder point"),
    ]);
  });
}
