import { checkServiceLevel, checkWholePeriods, EbbError, fitModel, stockBuffer, type BufferSettings } from "../../engine";
import { STOCK_CAUTION } from "../../taskpane/panel/cautions";
import { CliError } from "../cliError";
import { BUFFER_HELP } from "../help";
import { isNumberText } from "../options";
import type { BatchCommand } from "./batch";
import { modelSummary } from "./modelSummary";

/** The buffer command's own options, as commander hands them over. */
export interface BufferOptions {
  leadTime?: string;
  serviceLevel?: string;
  reviewPeriod?: string;
}

export const DEFAULT_SERVICE_LEVEL = 0.95;

/** Check the typed buffer options with the engine's own checks and messages. */
export function bufferSettings(raw: BufferOptions): BufferSettings {
  if (raw.leadTime === undefined) throw new CliError("--lead-time is required: the periods from placing an order to receiving it, for example --lead-time 3.");
  return {
    leadTime: option("--lead-time", raw.leadTime, (v) => checkWholePeriods(v, "lead time", 1)),
    reviewPeriod: raw.reviewPeriod === undefined ? 0 : option("--review-period", raw.reviewPeriod, (v) => checkWholePeriods(v, "review period", 0)),
    serviceLevel: raw.serviceLevel === undefined ? DEFAULT_SERVICE_LEVEL : option("--service-level", raw.serviceLevel, checkServiceLevel),
  };
}

function option(name: string, text: string, check: (v: number) => number): number {
  const s = text.trim();
  if (!isNumberText(s)) throw new CliError(`${name} expects a number; got "${text}".`);
  try {
    return check(Number(s));
  } catch (e) {
    if (e instanceof EbbError) throw new CliError(`${name}: ${e.message}`);
    throw e;
  }
}

/**
 * `buffer`: per series the demand forecast over the lead time (plus review period), the standard
 * deviation of its error from the model's h-step variances and their covariances, the safety
 * stock for the cycle service level and the reorder point (the engine's stockBuffer). The shortcut
 * sd, one-step sd x sqrt(periods), is shown beside it for comparison. Every output carries the
 * stock caution.
 */
export const bufferCommand: BatchCommand = {
  name: "buffer",
  summary: "per series: lead-time demand, its error's standard deviation, safety stock, reorder point",
  help: BUFFER_HELP,
  options: [],
  addOptions(cmd) {
    cmd
      .option("--lead-time <L>", "periods from placing an order to receiving it (required)")
      .option("--service-level <S>", `cycle service level, such as 0.95 or 95 (default: ${DEFAULT_SERVICE_LEVEL})`)
      .option("--review-period <R>", "periods between stock reviews; 0 for continuous review (default: 0)");
  },
  readOptions: (raw) => ({ ...bufferSettings(raw as BufferOptions) }),
  runSeries(column, run) {
    const model = fitModel(column.values, run.settings.model);
    const b = stockBuffer(model, run.settings.extra as unknown as BufferSettings);
    return {
      ...modelSummary(model),
      buffer: {
        lead_time: b.leadTime,
        review_period: b.reviewPeriod,
        service_level: b.serviceLevel,
        periods: b.periods,
        demand: b.forecast,
        sd: b.sd,
        shortcut_sd: b.rootPeriodsSd,
        method: b.method,
        z: b.z,
        safety_stock: b.safetyStock,
        reorder_point: b.reorderPoint,
      },
    };
  },
  csvColumns: ["series", "lead_time", "review_period", "service_level", "demand", "sd", "shortcut_sd", "safety_stock", "reorder_point", "method", "message"],
  csvRows: (entry) => [entry.buffer as Record<string, unknown>],
  summarize: () => ({ caution: STOCK_CAUTION }),
  closingNote: STOCK_CAUTION,
};
