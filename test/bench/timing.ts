/** Clock and order statistics for the bench. */

/** Seconds since an arbitrary origin, from the monotonic high-resolution clock. */
export function now(): number {
  return Number(process.hrtime.bigint()) / 1e9;
}

/** Quantile q of a sample (linear interpolation between order statistics, type 7). */
export function quantile(values: number[], q: number): number {
  if (values.length === 0) return NaN;
  const s = [...values].sort((a, b) => a - b);
  const pos = (s.length - 1) * q;
  const lo = Math.floor(pos);
  const hi = Math.min(lo + 1, s.length - 1);
  return s[lo] + (pos - lo) * (s[hi] - s[lo]);
}

export const median = (values: number[]): number => quantile(values, 0.5);
export const p95 = (values: number[]): number => quantile(values, 0.95);
export const mean = (values: number[]): number => (values.length ? values.reduce((a, b) => a + b, 0) / values.length : NaN);

/** Peak memory of this process so far: resident set (maxRSS) and the largest heap seen. */
export class MemoryWatch {
  peakHeap = 0;
  sample(): void {
    const h = process.memoryUsage().heapUsed;
    if (h > this.peakHeap) this.peakHeap = h;
  }
  maxRssBytes(): number {
    return process.resourceUsage().maxRSS * 1024; // reported in kilobytes
  }
}
