/**
 * Corrected Akaike information criterion from a Gaussian likelihood of the one-step errors
 * (Hurvich & Tsai 1989; used for exponential smoothing by Hyndman, Koehler, Ord & Snyder
 * 2008, section 7.1): AIC = n log(SSE/n) + 2k, AICc = AIC + 2k(k+1)/(n-k-1), with k the
 * estimated parameters plus one for the error variance. NaN when n <= k+1 (the model has
 * too many parameters for the history); callers treat that candidate as not comparable.
 */
export function aicc(sse: number, n: number, estimated: number): number {
  const k = estimated + 1;
  if (n - k - 1 <= 0 || !(sse >= 0)) return NaN;
  // an exact fit (SSE 0) gets the smallest positive SSE rather than minus infinity
  const aic = n * Math.log(Math.max(sse, 1e-300) / n) + 2 * k;
  return aic + (2 * k * (k + 1)) / (n - k - 1);
}

/**
 * Akaike information criterion, n log(SSE/n) + 2k with k as for AICc: the choice falls back on
 * it when the history is too short for AICc's small-sample correction in every candidate.
 */
export function aic(sse: number, n: number, estimated: number): number {
  if (!(n > 0) || !(sse >= 0)) return NaN;
  return n * Math.log(Math.max(sse, 1e-300) / n) + 2 * (estimated + 1);
}
