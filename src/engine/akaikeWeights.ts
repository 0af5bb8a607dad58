import { comparable, type Scored } from "./selection";
import type { FittedModel } from "./types";

/**
 * Akaike weights of scored candidates (Burnham & Anderson 2002, "Model Selection and Multimodel
 * Inference", 2nd ed., section 2.9): w_i = exp(-D_i / 2) / sum_r exp(-D_r / 2), with D_i the
 * candidate's criterion above the lowest; proposed for combining exponential smoothing forecasts
 * by Kolassa (2011, "Combining exponential smoothing forecasts using Akaike weights", IJF 27(2)).
 * The criterion is the one the choice of a single model uses ({@link comparable}: AICc, or AIC
 * when the history is too short for AICc in every candidate), so the candidate with the largest
 * weight is the one `lowestAicc` picks. Candidates without a value under it get weight 0.
 *
 * @example akaikeWeights(scored) // D = 0, 2, 4 gives 0.6652, 0.2447, 0.0900
 */
export function akaikeWeights(scored: Scored[]): { model: FittedModel; weight: number }[] {
  const { pool, value } = comparable(scored);
  if (pool.length === 0) return scored.map((s, i) => ({ model: s.model, weight: i === 0 ? 1 : 0 }));
  const lowest = Math.min(...pool.map(value));
  const raw = scored.map((s) => (pool.includes(s) ? Math.exp(-(value(s) - lowest) / 2) : 0));
  const total = raw.reduce((a, v) => a + v, 0); // at least 1: the lowest candidate's own term
  return scored.map((s, i) => ({ model: s.model, weight: raw[i] / total }));
}
