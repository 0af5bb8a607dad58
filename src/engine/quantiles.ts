/** Quantiles of simulated values by selection (linear time) rather than a full sort. */

/**
 * Quantiles q and 1 - q of the values (type 7: linear interpolation between order statistics,
 * Hyndman & Fan 1996), by selection; reorders the array. NaN sorts last, as in a typed sort.
 */
export function quantilePair(v: Float64Array, q: number): [number, number] {
  const n = v.length;
  for (let i = 0; i < n; i++) {
    if (v[i] !== v[i]) {
      // A path that broke down (rare): the sorted order, NaN last, as before selection was used.
      v.sort();
      return [sortedQuantile(v, q), sortedQuantile(v, 1 - q)];
    }
  }
  const at = (k: number, from: number): [number, number] => {
    select(v, k, from, n - 1);
    let next = Infinity;
    for (let i = k + 1; i < n; i++) if (v[i] < next) next = v[i];
    return [v[k], k + 1 < n ? next : v[k]];
  };
  const interpolate = (pos: number, from: number): number => {
    const k = Math.floor(pos);
    const [a, b] = at(k, from);
    return pos === k ? a : a + (pos - k) * (b - a);
  };
  const posLow = (n - 1) * q;
  const posHigh = (n - 1) * (1 - q);
  const lowValue = interpolate(posLow, 0);
  // Everything after the low order statistic is at least as large: the high one is found there.
  const highValue = interpolate(posHigh, Math.floor(posLow) + 1 <= Math.floor(posHigh) ? Math.floor(posLow) + 1 : 0);
  return [lowValue, highValue];
}

function sortedQuantile(sorted: Float64Array, q: number): number {
  const pos = (sorted.length - 1) * q;
  const lo = Math.floor(pos);
  const hi = Math.min(lo + 1, sorted.length - 1);
  return sorted[lo] + (pos - lo) * (sorted[hi] - sorted[lo]);
}

/** Hoare-style quickselect (median-of-three pivot): puts the k-th smallest of v[lo..hi] at k. */
function select(v: Float64Array, k: number, lo: number, hi: number): void {
  while (hi > lo) {
    const mid = (lo + hi) >>> 1;
    // median of three as the pivot, deterministic
    const a = v[lo], b = v[mid], c = v[hi];
    const pivot = a < b ? (b < c ? b : a < c ? c : a) : a < c ? a : b < c ? c : b;
    let i = lo;
    let j = hi;
    while (i <= j) {
      while (v[i] < pivot) i++;
      while (v[j] > pivot) j--;
      if (i <= j) {
        const t = v[i];
        v[i] = v[j];
        v[j] = t;
        i++;
        j--;
      }
    }
    if (k <= j) hi = j;
    else if (k >= i) lo = i;
    else return;
  }
}
