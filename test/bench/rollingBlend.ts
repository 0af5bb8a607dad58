/**
 * Design evaluation for item 3 of the automatic model (combination): the automatic model, the
 * Theta method (src/engine/theta.ts) and their equal-weight mean, on rolling origins over the
 * M3 training parts (the origins of rolling.ts; Tashman 2000) and on the competition's holdout.
 *
 * - Point forecasts: the simple mean of the two, the combination that is hard to beat (Clemen
 *   1989, "Combining forecasts: a review and annotated bibliography", IJF 5(4); the M3 and M4
 *   results, Makridakis & Hibon 2000, Makridakis et al. 2020).
 * - Intervals, two ways: the mean of the members' interval ends (averaging quantiles,
 *   Lichtendahl, Grushka-Cockayne & Winkler 2013, "Is it better to average probabilities or
 *   quantiles?", Management Science 59(7)), and their envelope (the lower of the lows, the
 *   higher of the highs), for comparison.
 *
 *   npx tsx test/bench/rollingBlend.ts [--series N] [--seed S]
 *
 * N series per frequency (default: all), drawn with a fixed seed. Prints mean sMAPE, MASE and
 * the share of actuals inside the 80% / 95% intervals, per frequency and evaluation.
 */
import { fitModel, fitTheta, maseScale, predictionInterval, smape, thetaInterval, type Interval } from "../../src/engine";
import { loadM3 } from "./m3";
import { holdoutCuts, numberArg as arg, rollingCuts, sample, type Cut } from "./rollingOrigins";

const COVERAGES = [0.8, 0.95] as const;

/** One method's forecasts and its interval at each coverage. */
type Outlook = { forecast: Float64Array; bands: Interval[] };

const mean = (a: Float64Array, b: Float64Array) => a.map((v, k) => (v + b[k]) / 2);

function auto(history: Float64Array, period: number, h: number): Outlook {
  const m = fitModel(history, { period, seasonality: "auto", trend: "auto" });
  const bands = COVERAGES.map((c) => predictionInterval(m, h, c));
  return { forecast: bands[0].forecast, bands };
}

function theta(history: Float64Array, period: number, h: number): Outlook {
  const fit = fitTheta(history, period);
  const bands = COVERAGES.map((c) => thetaInterval(fit, h, c));
  return { forecast: bands[0].forecast, bands };
}

function quantileMean(a: Outlook, b: Outlook): Outlook {
  const forecast = mean(a.forecast, b.forecast);
  return { forecast, bands: a.bands.map((band, i) => ({ forecast, low: mean(band.low, b.bands[i].low), high: mean(band.high, b.bands[i].high) })) };
}

function envelope(a: Outlook, b: Outlook): Outlook {
  const forecast = mean(a.forecast, b.forecast);
  return {
    forecast,
    bands: a.bands.map((band, i) => ({
      forecast,
      low: band.low.map((v, k) => Math.min(v, b.bands[i].low[k])),
      high: band.high.map((v, k) => Math.max(v, b.bands[i].high[k])),
    })),
  };
}

interface Tally {
  smape: number;
  mase: number;
  n: number;
  nMase: number;
  inside: number[];
  steps: number;
}

const METHODS = ["automatic model", "Theta method", "mean, quantiles averaged", "mean, envelope"] as const;

function evaluate(cuts: Cut[]): Map<string, Tally> {
  const tallies = new Map<string, Tally>(METHODS.map((m) => [m, { smape: 0, mase: 0, n: 0, nMase: 0, inside: COVERAGES.map(() => 0), steps: 0 }]));
  for (const { history, actual, period } of cuts) {
    const h = actual.length;
    let a: Outlook;
    let t: Outlook;
    try {
      a = auto(history, period, h);
      t = theta(history, period, h);
    } catch {
      continue; // both must forecast for a like-for-like comparison
    }
    const outlooks = [a, t, quantileMean(a, t), envelope(a, t)];
    const scale = maseScale(history, period);
    outlooks.forEach((o, i) => {
      const tally = tallies.get(METHODS[i])!;
      tally.smape += smape(actual, o.forecast);
      tally.n++;
      if (scale > 0) {
        let abs = 0;
        for (let k = 0; k < h; k++) abs += Math.abs(actual[k] - o.forecast[k]);
        tally.mase += abs / h / scale;
        tally.nMase++;
      }
      o.bands.forEach((band, ci) => {
        for (let k = 0; k < h; k++) if (actual[k] >= band.low[k] && actual[k] <= band.high[k]) tally.inside[ci]++;
      });
      tally.steps += h;
    });
  }
  return tallies;
}

const seed = arg("--seed", 20260);
for (const frequency of ["monthly", "quarterly"] as const) {
  const all = loadM3(frequency);
  const series = sample(all, arg("--series", all.length), seed);
  for (const [name, cuts] of [["rolling origins", rollingCuts(series)], ["holdout", holdoutCuts(series)]] as const) {
    const tallies = evaluate(cuts);
    console.log(`\n${frequency}, ${name}: ${series.length} series; sMAPE, MASE, share inside the 80% / 95% interval`);
    for (const [method, t] of tallies) {
      const cover = t.inside.map((v) => ((100 * v) / t.steps).toFixed(1)).join(" / ");
      console.log(`  ${method.padEnd(26)} ${(t.smape / t.n).toFixed(2).padStart(6)}  ${(t.mase / t.nMase).toFixed(3)}  ${cover}   (${t.n} forecasts)`);
    }
  }
}
