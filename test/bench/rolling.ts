/**
 * Rolling-origin evaluation over the M3 training parts, for choosing between designs of the
 * automatic model without looking at the competition's holdout (Tashman 2000, "Out-of-sample
 * tests of forecasting accuracy", IJF 16(4)). Each training part is cut at several origins
 * (the last `horizon` values held back, then one and two further half-horizons back); each
 * design is fitted on the part before an origin and scored on the next `horizon` training values.
 *
 *   npx tsx test/bench/rolling.ts [--series N] [--seed S]
 *
 * N series per frequency (default 200), drawn with a fixed seed; prints mean sMAPE, MASE and
 * 80%/95% coverage per design and frequency.
 */
import { fitModel, forecastModel, maseScale, predictionInterval, smape, type AutoDesign } from "../../src/engine";
import { loadM3, type M3Series } from "./m3";
import { numberArg as arg, rollingOrigins, sample } from "./rollingOrigins";

interface Design {
  name: string;
  design: AutoDesign;
}

const DESIGNS: Design[] = [
  { name: "no test, seasonal, damped/none", design: { trends: ["damped", "none"], seasonalityTest: false, noneWhenSeasonal: false } },
  { name: "test, seasonal or none, damped/none", design: { trends: ["damped", "none"], seasonalityTest: true, noneWhenSeasonal: false } },
  { name: "test, seasonal or none, all trends", design: { trends: ["none", "linear", "damped"], seasonalityTest: true, noneWhenSeasonal: false } },
  { name: "test, whole family", design: { trends: ["none", "linear", "damped"], seasonalityTest: true, noneWhenSeasonal: true, noneSeasonalWindow: true } },
];

interface Tally {
  smape: number;
  mase: number;
  n: number;
  nMase: number;
  in80: number;
  in95: number;
  steps: number;
  ms: number;
}

function evaluate(series: M3Series[], d: Design): Tally {
  const t: Tally = { smape: 0, mase: 0, n: 0, nMase: 0, in80: 0, in95: 0, steps: 0, ms: 0 };
  for (const s of series) {
    const h = s.horizon;
    for (const origin of rollingOrigins(s)) {
      const train = s.train.subarray(0, origin);
      const actual = s.train.subarray(origin, origin + h);
      const t0 = performance.now();
      let fc: Float64Array;
      let m;
      try {
        m = fitModel(train, { period: s.period, seasonality: "auto", trend: "auto" }, d.design);
        fc = forecastModel(m, h);
      } catch {
        continue;
      }
      t.ms += performance.now() - t0;
      t.smape += smape(actual, fc);
      t.n++;
      const q = maseScale(train, s.period);
      if (q > 0) {
        let abs = 0;
        for (let k = 0; k < h; k++) abs += Math.abs(actual[k] - fc[k]);
        t.mase += abs / h / q;
        t.nMase++;
      }
      for (const [c, key] of [[0.8, "in80"], [0.95, "in95"]] as const) {
        const band = predictionInterval(m, h, c);
        for (let k = 0; k < h; k++) if (actual[k] >= band.low[k] && actual[k] <= band.high[k]) t[key]++;
      }
      t.steps += h;
    }
  }
  return t;
}

const count = arg("--series", 200);
const seed = arg("--seed", 20260);
for (const frequency of ["monthly", "quarterly"] as const) {
  const series = sample(loadM3(frequency), count, seed);
  console.log(`\n${frequency}: ${series.length} series, up to 3 origins each`);
  for (const d of DESIGNS) {
    const t = evaluate(series, d);
    console.log(
      `${d.name.padEnd(42)} sMAPE ${(t.smape / t.n).toFixed(3)}  MASE ${(t.mase / t.nMase).toFixed(4)}  80% ${((100 * t.in80) / t.steps).toFixed(1)}  95% ${((100 * t.in95) / t.steps).toFixed(1)}  fits ${t.n}  ms/fit ${(t.ms / t.n).toFixed(2)}`,
    );
  }
}
