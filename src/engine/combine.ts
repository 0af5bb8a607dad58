import { badInput } from "./errors";
import type { Interval } from "./intervals";

/**
 * The weighted mean of several forecasts with their intervals: point forecasts and interval ends
 * alike, step by step. Averaging the members' quantiles (here the interval ends at one coverage)
 * is the combination Lichtendahl, Grushka-Cockayne & Winkler (2013, "Is it better to average
 * probabilities or quantiles?", Management Science 59(7)) recommend: the result is as wide as the
 * members on average, where averaging probabilities would widen it. Weights need not sum to 1.
 */
export function combineIntervals(members: Interval[], weights: number[]): Interval {
  if (members.length === 0 || members.length !== weights.length) {
    throw badInput("bad-combination", `A combination needs one weight per member; got ${members.length} members and ${weights.length} weights.`);
  }
  const total = weights.reduce((a, w) => a + w, 0);
  if (!(total > 0) || weights.some((w) => !(w >= 0))) {
    throw badInput("bad-combination", "Combination weights must be zero or positive, with at least one above zero.");
  }
  const h = members[0].forecast.length;
  if (members.some((m) => m.forecast.length !== h)) throw badInput("bad-combination", "Every member of a combination must forecast the same number of periods.");
  const mix = (pick: (m: Interval) => Float64Array) => {
    const out = new Float64Array(h);
    members.forEach((m, i) => {
      if (weights[i] === 0) return;
      const v = pick(m);
      for (let k = 0; k < h; k++) out[k] += (weights[i] / total) * v[k];
    });
    return out;
  };
  return { forecast: mix((m) => m.forecast), low: mix((m) => m.low), high: mix((m) => m.high) };
}
