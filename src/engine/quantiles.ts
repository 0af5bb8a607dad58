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
  const fast = bracketed(v, q);
  if (fast) return fast;
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

const SAMPLE = 128;
const MARGIN = 4;
const kept1 = new Float64Array(4096);
const kept2 = new Float64Array(4096);

/**
 * The same order statistics in one pass (after Floyd & Rivest 1975, CACM 18(3)): a fixed
 * sample of the values, sorted, brackets each wanted rank; one pass counts the values below
 * each bracket and keeps those inside it; the few kept are sorted. Undefined when a rank falls
 * outside its bracket (the caller then selects).
 */
function bracketed(v: Float64Array, q: number): [number, number] | undefined {
  const n = v.length;
  if (n < 4 * SAMPLE) return undefined;
  const sample = new Float64Array(SAMPLE);
  const stride = Math.floor(n / SAMPLE);
  for (let i = 0; i < SAMPLE; i++) sample[i] = v[i * stride];
  sample.sort();
  const posLow = (n - 1) * q;
  const posHigh = (n - 1) * (1 - q);
  const bracket = (pos: number): [number, number] => {
    const r = Math.floor((pos / (n - 1)) * (SAMPLE - 1));
    return [r - MARGIN < 0 ? -Infinity : sample[r - MARGIN], r + 1 + MARGIN >= SAMPLE ? Infinity : sample[r + 1 + MARGIN]];
  };
  const [lo1, hi1] = bracket(posLow);
  const [lo2, hi2] = bracket(posHigh);
  let below1 = 0;
  let below2 = 0;
  let count1 = 0;
  let count2 = 0;
  const room = kept1.length;
  for (let i = 0; i < n; i++) {
    const x = v[i];
    if (x < lo1) below1++;
    else if (x <= hi1 && count1 < room) kept1[count1++] = x;
    if (x < lo2) below2++;
    else if (x <= hi2 && count2 < room) kept2[count2++] = x;
  }
  if (count1 === room || count2 === room) return undefined;
  const pick = (pos: number, below: number, kept: Float64Array, count: number): number | undefined => {
    const k = Math.floor(pos) - below;
    const k2 = Math.min(Math.floor(pos) + 1, n - 1) - below;
    if (k < 0 || k2 >= count) return undefined;
    const inside = kept.subarray(0, count).sort();
    return inside[k] + (pos - Math.floor(pos)) * (inside[k2] - inside[k]);
  };
  const low = pick(posLow, below1, kept1, count1);
  const high = pick(posHigh, below2, kept2, count2);
  return low === undefined || high === undefined ? undefined : [low, high];
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
