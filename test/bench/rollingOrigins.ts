/** The origins, the cuts, the sample and the options of the rolling-origin evaluations over the M3 training parts (rolling.ts, rollingIntervals.ts, rollingBlend.ts). */
import type { M3Series } from "./m3";

/**
 * Where a training part is cut: the last `horizon` values held back, then one and two further
 * half-horizons back (Tashman 2000), keeping at least 3 seasons before each cut.
 */
export function rollingOrigins(s: M3Series): number[] {
  const h = s.horizon;
  return [h, h + Math.ceil(h / 2), h + 2 * Math.ceil(h / 2)].map((back) => s.train.length - back).filter((origin) => origin >= 3 * s.period);
}

/** One forecast to score: the history it is made from and the actuals that follow it. */
export interface Cut {
  history: Float64Array;
  actual: Float64Array;
  period: number;
}

/** Every rolling origin of every series' training part, each followed by up to one horizon of actuals. */
export function rollingCuts(series: M3Series[]): Cut[] {
  return series.flatMap((s) => rollingOrigins(s).map((o) => ({ history: s.train.subarray(0, o), actual: s.train.subarray(o, o + s.horizon), period: s.period })));
}

/** The competition's own cut: the whole training part, then the holdout. */
export function holdoutCuts(series: M3Series[]): Cut[] {
  return series.map((s) => ({ history: s.train, actual: s.test, period: s.period }));
}

/** Deterministic sample (mulberry32 shuffle with a fixed seed). */
export function sample<T>(all: T[], count: number, seed: number): T[] {
  let a = seed >>> 0;
  const next = () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = Math.imul(a ^ (a >>> 15), a | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  const copy = all.slice();
  for (let i = copy.length - 1; i > 0; i--) {
    const j = Math.floor(next() * (i + 1));
    [copy[i], copy[j]] = [copy[j], copy[i]];
  }
  return copy.slice(0, Math.min(count, copy.length));
}

/** A numeric option of the command line (--series 200), or the fallback when it is not given. */
export function numberArg(name: string, fallback: number): number {
  const i = process.argv.indexOf(name);
  return i >= 0 ? Number(process.argv[i + 1]) : fallback;
}
