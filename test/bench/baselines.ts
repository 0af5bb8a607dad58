/**
 * The two benchmark forecasts the M3 competition scores every method against
 * (Makridakis & Hibon 2000). They are the bench's own, not Ebb's model; the seasonality test
 * and the classical decomposition they use are the engine's.
 */
import { classicalIndices, seasonalityTest90 } from "../../src/engine";

/** Seasonal naive: each step repeats the value one season before it. */
export function seasonalNaive(train: Float64Array, p: number, horizon: number): Float64Array {
  const n = train.length;
  const out = new Float64Array(horizon);
  for (let h = 1; h <= horizon; h++) out[h - 1] = train[n - p + ((h - 1) % p)];
  return out;
}

/**
 * Naive2: the last value, deseasonalised by classical multiplicative decomposition when the
 * series passes the 90% autocorrelation test at the seasonal lag, reseasonalised for each
 * step. As in the M4 competition's published benchmark code, the test is applied only to
 * series with at least three full seasons (every M3 training part has four or more).
 */
export function naive2(train: Float64Array, p: number, horizon: number): { forecast: Float64Array; seasonal: boolean } {
  const n = train.length;
  const seasonal = n >= 3 * p && seasonalityTest90(train, p);
  const out = new Float64Array(horizon);
  if (!seasonal) {
    out.fill(train[n - 1]);
    return { forecast: out, seasonal };
  }
  // normal[j] is the index of every period t with t % p === j (t 0-based from the first value).
  const { normal } = classicalIndices(train, p, "multiplicative");
  const level = train[n - 1] / normal[(n - 1) % p];
  for (let h = 1; h <= horizon; h++) out[h - 1] = level * normal[(n - 1 + h) % p];
  return { forecast: out, seasonal };
}
