import { aic, aicc } from "./aicc";
import { runRecursion } from "./recursion";
import type { FittedModel } from "./types";

/**
 * Like-for-like comparison of candidate models. Candidates may start updating at different
 * periods (a model without seasons needs a shorter start window than a seasonal one), so each
 * is scored on the same one-step errors: those from the latest first update among the
 * candidates on. AICc (Hurvich & Tsai 1989; Hyndman et al. 2008, section 7.1) then counts,
 * for every candidate, those errors and the parameters it estimates (fitted constants and free
 * start values, {@link FittedModel.parameterCount}).
 */
export interface Scored {
  model: FittedModel;
  /** AICc over the common errors; NaN when too few errors for its correction. */
  aicc: number;
  aic: number;
}

/** SSE and count of the model's one-step errors from period `from` (0-based) on. */
export function errorsFrom(model: FittedModel, from: number): { sse: number; count: number } {
  if (from <= model.start.firstUpdate) return { sse: model.sse, count: model.errorCount };
  const { spec, start, constants, history } = model;
  const { error } = runRecursion(history, start.state, start.firstUpdate, spec.period, spec.seasonality, spec.trend, constants).table;
  let sse = 0;
  let count = 0;
  for (let t = from; t < error.length; t++) {
    const e = error[t];
    if (e === e) {
      sse += e * e;
      count++;
    }
  }
  return { sse, count };
}

/** Score every candidate on the errors they all have. */
export function scoreAlike(models: FittedModel[]): Scored[] {
  const from = Math.max(...models.map((m) => m.start.firstUpdate));
  return models.map((model) => {
    const { sse, count } = errorsFrom(model, from);
    return { model, aicc: aicc(sse, count, model.parameterCount), aic: aic(sse, count, model.parameterCount) };
  });
}

/**
 * The criterion candidates are compared on: AICc, or AIC when none has enough errors for AICc's
 * correction. Candidates without a finite value under the chosen criterion are left out.
 */
export function comparable(scored: Scored[]): { pool: Scored[]; value: (s: Scored) => number } {
  const withAicc = scored.filter((s) => Number.isFinite(s.aicc));
  if (withAicc.length > 0) return { pool: withAicc, value: (s) => s.aicc };
  return { pool: scored.filter((s) => Number.isFinite(s.aic)), value: (s) => s.aic };
}

/** The candidate with the lowest AICc; AIC when none has enough errors for AICc's correction. */
export function lowestAicc(scored: Scored[]): FittedModel {
  const { pool, value } = comparable(scored);
  if (pool.length === 0) return scored[0].model;
  let best = pool[0];
  for (const s of pool) if (value(s) < value(best)) best = s;
  return best.model;
}
