import { badInput } from "../errors";
import { errorQuantile } from "../intervals";
import type { FittedModel } from "../types";
import { leadTimeDemand, type LeadTimeDemand } from "./leadTime";

export interface BufferSettings {
  /** Periods from placing an order to receiving it (whole periods, 1 or more). */
  leadTime: number;
  /** Periods between reviews of the stock (0, the default, for continuous review). */
  reviewPeriod?: number;
  /** Cycle service level: the chance of no stock-out in a replenishment cycle, 0.5 to 0.9999 (or 50 to 99.99 as a percent). */
  serviceLevel: number;
}

/** Safety stock and reorder point of one item. */
export interface StockBuffer extends LeadTimeDemand {
  leadTime: number;
  reviewPeriod: number;
  serviceLevel: number;
  /** Quantile of the service level, the safety factor k: Student t on the variance's degrees of freedom (errorQuantile). */
  z: number;
  safetyStock: number;
  /** Forecast demand over the protection interval plus safety stock. */
  reorderPoint: number;
}

/**
 * Safety stock and reorder point for a cycle service level, from the model's own lead-time error
 * (Silver, Pyke & Thomas 2017, Inventory and Production Management in Supply Chains, 4th ed.,
 * the chapters on individual items with probabilistic demand, cited from memory: safety stock =
 * k * sigma_L, reorder point s = forecast over L + k * sigma_L, with k the quantile of the cycle
 * service level: Student's t on the variance's degrees of freedom, as the intervals take it
 * (intervalQuantile), which is the standard normal quantile once the history is long; for
 * periodic review the protection interval is R + L and the figure is the order-up-to level).
 * sigma_L comes from `leadTimeDemand`, which sums the h-step variances and their covariances
 * (Hyndman et al. 2008).
 *
 * Example (hand computation, common practice for k; the normal quantile, for a long history):
 * forecast 100 a period, L = 3, sigma_L = 20.98 (see leadTimeDemand), 95% cycle service level:
 * k = 1.6449, safety stock 34.50, reorder point 334.50.
 */
export function stockBuffer(model: FittedModel, settings: BufferSettings): StockBuffer {
  const leadTime = checkWholePeriods(settings.leadTime, "lead time", 1);
  const reviewPeriod = checkWholePeriods(settings.reviewPeriod ?? 0, "review period", 0);
  const serviceLevel = checkServiceLevel(settings.serviceLevel);
  if (leadTime + reviewPeriod > 1000) {
    throw badInput("bad-lead-time", `Lead time plus review period must be at most 1000 periods; got ${leadTime + reviewPeriod}.`);
  }
  const demand = leadTimeDemand(model, leadTime + reviewPeriod);
  const z = errorQuantile(model, serviceLevel);
  const safetyStock = z * demand.sd;
  return { ...demand, leadTime, reviewPeriod, serviceLevel, z, safetyStock, reorderPoint: demand.forecast + safetyStock };
}

export function checkWholePeriods(v: number, what: string, least: number): number {
  if (typeof v !== "number" || !Number.isInteger(v) || v < least || v > 1000) {
    const round = typeof v === "number" && Number.isFinite(v) && !Number.isInteger(v) ? " Round a part period up to whole periods." : "";
    throw badInput(
      `bad-${what.replace(/ /g, "-")}`,
      `The ${what} must be a whole number of periods from ${least} to 1000; got ${String(v)}.${round}`,
    );
  }
  return v;
}

export function checkServiceLevel(v: number): number {
  if (typeof v !== "number" || !Number.isFinite(v)) {
    throw badInput("bad-service-level", `The service level must be a fraction such as 0.95 (or a percent such as 95); got ${String(v)}.`);
  }
  // As coverage is read (parseCoverage): 0.95 and 95 both mean 95%.
  const level = v > 1 && v < 100 ? v / 100 : v;
  if (!(level >= 0.5 && level <= 0.9999)) {
    throw badInput("bad-service-level", `The service level must be from 0.5 to 0.9999, or 50 to 99.99 as a percent (for example 0.95: a stock-out in about 1 cycle in 20); got ${v}.`);
  }
  return level;
}
