import { classicalIndices } from "./decompose";
import { passesSeasonalityTest } from "./seasonalityTest";
import { leadingBlanks } from "./start/decompositionStart";

/**
 * The Theta methods' seasonal adjustment (Makridakis & Hibon 2000, as forecast::thetaf applies
 * it): leading blanks left out, then, when the 90% autocorrelation test finds a season of length
 * p, the history divided by its whole-history classical multiplicative indices.
 */
export function thetaAdjusted(history: Float64Array, p: number): { y: Float64Array; indices: Float64Array; adjusted: Float64Array } {
  const y = history.subarray(leadingBlanks(history));
  const seasonal = p >= 2 && passesSeasonalityTest(y, p);
  const indices = seasonal ? classicalIndices(y, p, "multiplicative").normal : new Float64Array(0);
  const adjusted = new Float64Array(y.length);
  for (let t = 0; t < y.length; t++) adjusted[t] = seasonal ? y[t] / indices[t % p] : y[t];
  return { y, indices, adjusted };
}
