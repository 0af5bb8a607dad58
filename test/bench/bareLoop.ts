/**
 * The speed limit in JavaScript: the multiplicative recursion with a linear trend (seasonal
 * update on the new level) as one plain loop over a Float64Array, summing squared one-step
 * errors. Same arithmetic as bare-loop.c; no missing-value handling (M3 has none).
 */
export function bareLoopSse(
  y: Float64Array,
  level0: number,
  trend0: number,
  start: Float64Array,
  first: number,
  p: number,
  alpha: number,
  beta: number,
  gamma: number,
  ring: Float64Array,
): number {
  for (let k = 0; k < p; k++) ring[(first + k) % p] = start[k];
  let level = level0;
  let trend = trend0;
  let sse = 0;
  let pos = first % p;
  for (let t = first; t < y.length; t++) {
    const st = ring[pos];
    const base = level + trend;
    const yt = y[t];
    const e = yt - base * st;
    sse += e * e;
    const nl = (alpha * yt) / st + (1 - alpha) * base;
    ring[pos] = (gamma * yt) / nl + (1 - gamma) * st;
    trend = beta * (nl - level) + (1 - beta) * trend;
    level = nl;
    if (++pos === p) pos = 0;
  }
  return sse;
}
