/**
 * Rolling-origin evaluation of the prediction intervals over the M3 training parts (the origins
 * of rolling.ts), and on the competition's holdout for comparison: the share of actuals inside
 * the automatic model's 80% and 95% intervals, per frequency, for three designs of the
 * interval's allowance for estimated quantities (k of them, on n one-step errors):
 *
 * - "normal, s^2 = SSE/(n-k)": the normal quantile, the variance over n - k (the design before);
 * - "t on n-k": Student's t quantile on n - k degrees of freedom (the variance is estimated);
 * - "t, s^2 (1 + k/n)": also the variance times 1 + k/n, the mean leverage (Akaike's final
 *   prediction error): the engine's design now.
 *
 * The engine computes the last; the other two are its half-widths scaled down by the factors
 * the engine adds (t/z, sqrt(1 + k/n)): exact for the analytic intervals, and for the simulated
 * ones (multiplicative seasonality, whose relative sd the engine scales by the same factors)
 * exact up to the simulation's own noise.
 *
 *   npx tsx test/bench/rollingIntervals.ts [--series N] [--seed S]
 *
 * N series per frequency (default: all), drawn with a fixed seed.
 */
import { coverageZ, estimationFactor, fitModel, intervalQuantile, predictionInterval, type FittedModel } from "../../src/engine";
import { loadM3 } from "./m3";
import { holdoutCuts, numberArg as arg, rollingCuts, sample, type Cut } from "./rollingOrigins";

interface IntervalDesign {
  name: string;
  /** The engine's half-width is divided by this. */
  shrink: (m: FittedModel, coverage: number) => number;
}

const DESIGNS: IntervalDesign[] = [
  { name: "normal, s^2 = SSE/(n-k)", shrink: (m, c) => (intervalQuantile(m, c) / coverageZ(c)) * Math.sqrt(estimationFactor(m)) },
  { name: "t on n-k", shrink: (m) => Math.sqrt(estimationFactor(m)) },
  { name: "t, s^2 (1 + k/n) (engine)", shrink: () => 1 },
];

const COVERAGES = [0.8, 0.95] as const;

/** Actuals inside each design's interval, per coverage, over the given cuts (history, actuals after it). */
function tally(cuts: Cut[]): { inside: number[][]; steps: number } {
  const inside = DESIGNS.map(() => COVERAGES.map(() => 0));
  let steps = 0;
  for (const { history, actual, period } of cuts) {
    let m: FittedModel;
    try {
      m = fitModel(history, { period, seasonality: "auto", trend: "auto" });
    } catch {
      continue;
    }
    const h = actual.length;
    COVERAGES.forEach((c, ci) => {
      const band = predictionInterval(m, h, c);
      DESIGNS.forEach((d, di) => {
        const f = 1 / d.shrink(m, c);
        for (let k = 0; k < h; k++) {
          const low = band.forecast[k] - f * (band.forecast[k] - band.low[k]);
          const high = band.forecast[k] + f * (band.high[k] - band.forecast[k]);
          if (actual[k] >= low && actual[k] <= high) inside[di][ci]++;
        }
      });
    });
    steps += h;
  }
  return { inside, steps };
}

const seed = arg("--seed", 20260);
for (const frequency of ["monthly", "quarterly"] as const) {
  const all = loadM3(frequency);
  const series = sample(all, arg("--series", all.length), seed);
  console.log(`\n${frequency}: ${series.length} series; share of actuals inside the 80% / 95% interval`);
  console.log(`${"design".padEnd(30)} ${"rolling origins".padStart(16)} ${"holdout".padStart(14)}`);
  const rolling = tally(rollingCuts(series));
  const holdout = tally(holdoutCuts(series));
  DESIGNS.forEach((d, di) => {
    const pct = (t: typeof rolling) => t.inside[di].map((v) => ((100 * v) / t.steps).toFixed(1)).join(" / ");
    console.log(`${d.name.padEnd(30)} ${pct(rolling).padStart(16)} ${pct(holdout).padStart(14)}`);
  });
  console.log(`(${rolling.steps} rolling-origin steps, ${holdout.steps} holdout steps)`);
}
