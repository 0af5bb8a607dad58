/**
 * Design evaluation for item 3 of the automatic model (combination): the automatic model, its
 * members and several combinations, on rolling origins over the training parts (the origins of
 * rolling.ts; Tashman 2000) and on the holdout, for M3 or (--public) for public seasonal series
 * the designs were not chosen on (publicSeries.ts).
 *
 * Combinations of point forecasts:
 * - the simple mean of the automatic model and the Theta method (src/engine/theta.ts), the
 *   combination that is hard to beat (Clemen 1989, IJF 5(4); Makridakis & Hibon 2000);
 * - weights inversely proportional to each member's in-sample one-step MSE (Bates & Granger
 *   1969, "The combination of forecasts", Operational Research Quarterly 20(4));
 * - Akaike weights over the automatic model's own candidates, w_i = exp(-D_i/2) / sum, D_i the
 *   AICc above the lowest (Burnham & Anderson 2002, section 2.9; for exponential smoothing,
 *   Kolassa 2011, "Combining exponential smoothing forecasts using Akaike weights", IJF 27(2)),
 *   over the candidates auto uses, and over the whole family (every trend, and the non-seasonal
 *   candidates beside the seasonal ones).
 * Intervals of a combination: the members' interval ends averaged with the same weights
 * (averaging quantiles, Lichtendahl, Grushka-Cockayne & Winkler 2013, Management Science 59(7)).
 *
 *   npx tsx test/bench/rollingBlend.ts [--series N] [--seed S] [--public]
 *
 * Prints mean sMAPE, MASE and the share of actuals inside the 80% / 95% intervals.
 */
import {
  AUTO_DESIGN,
  fitCandidates,
  fitTheta,
  maseScale,
  predictionInterval,
  smape,
  thetaInterval,
  type AutoDesign,
  type FittedModel,
  type Interval,
} from "../../src/engine";
import { loadM3 } from "./m3";
import { loadPublic } from "./publicSeries";
import { holdoutCuts, numberArg as arg, rollingCuts, sample, type Cut } from "./rollingOrigins";

const COVERAGES = [0.8, 0.95] as const;

/** One method's forecasts and its interval at each coverage, with its in-sample one-step MSE. */
type Outlook = { forecast: Float64Array; bands: Interval[]; mse: number };

function modelOutlook(m: FittedModel, h: number): Outlook {
  const bands = COVERAGES.map((c) => predictionInterval(m, h, c));
  return { forecast: bands[0].forecast, bands, mse: m.sse / m.errorCount };
}

function thetaOutlook(history: Float64Array, period: number, h: number): Outlook {
  const fit = fitTheta(history, period);
  const bands = COVERAGES.map((c) => thetaInterval(fit, h, c));
  // The smoothing's errors are on the adjusted scale; back on the data's scale through the indices.
  const s = fit.smoothing;
  return { forecast: bands[0].forecast, bands, mse: (s.sse / s.errorCount) * meanSquareIndex(fit.indices) };
}

const meanSquareIndex = (indices: Float64Array) => (indices.length === 0 ? 1 : indices.reduce((a, v) => a + v * v, 0) / indices.length);

/** The weighted mean of outlooks: forecasts and interval ends alike. */
function weighted(members: Outlook[], weights: number[]): Outlook {
  const total = weights.reduce((a, w) => a + w, 0);
  const w = weights.map((v) => v / total);
  const mix = (pick: (o: Outlook) => Float64Array) => pick(members[0]).map((_, k) => members.reduce((a, o, i) => a + w[i] * pick(o)[k], 0));
  const forecast = mix((o) => o.forecast);
  return {
    forecast,
    bands: COVERAGES.map((_, ci) => ({ forecast, low: mix((o) => o.bands[ci].low), high: mix((o) => o.bands[ci].high) })),
    mse: NaN,
  };
}

function akaike(history: Float64Array, period: number, h: number, design: AutoDesign): { best: Outlook; blend: Outlook } {
  const scored = fitCandidates(history, { period, seasonality: "auto", trend: "auto" }, design).filter((s) => Number.isFinite(s.aicc));
  const low = Math.min(...scored.map((s) => s.aicc));
  const outlooks = scored.map((s) => modelOutlook(s.model, h));
  const best = outlooks[scored.findIndex((s) => s.aicc === low)];
  return { best, blend: weighted(outlooks, scored.map((s) => Math.exp(-(s.aicc - low) / 2))) };
}

const WHOLE_FAMILY: AutoDesign = { trends: ["none", "linear", "damped"], seasonalityTest: true, noneWhenSeasonal: true };

/** Every method's outlook for one cut, in the order of METHODS. */
function outlooks(history: Float64Array, period: number, h: number): Outlook[] {
  const auto = akaike(history, period, h, AUTO_DESIGN);
  const family = akaike(history, period, h, WHOLE_FAMILY);
  const theta = thetaOutlook(history, period, h);
  return [
    auto.best,
    theta,
    weighted([auto.best, theta], [1, 1]),
    weighted([auto.best, theta], [1 / auto.best.mse, 1 / theta.mse]),
    auto.blend,
    family.best,
    family.blend,
    weighted([family.blend, theta], [1, 1]),
  ];
}

const METHODS = [
  "automatic model",
  "Theta method",
  "auto + Theta, equal",
  "auto + Theta, inverse MSE",
  "Akaike weights, auto's candidates",
  "whole family, lowest AICc",
  "Akaike weights, whole family",
  "family Akaike + Theta, equal",
] as const;

interface Tally {
  smape: number;
  mase: number;
  n: number;
  nMase: number;
  inside: number[];
  steps: number;
}

function evaluate(cuts: Cut[]): Tally[] {
  const tallies: Tally[] = METHODS.map(() => ({ smape: 0, mase: 0, n: 0, nMase: 0, inside: COVERAGES.map(() => 0), steps: 0 }));
  for (const { history, actual, period } of cuts) {
    const h = actual.length;
    let all: Outlook[];
    try {
      all = outlooks(history, period, h);
    } catch {
      continue; // every method must forecast for a like-for-like comparison
    }
    const scale = maseScale(history, period);
    all.forEach((o, i) => {
      const tally = tallies[i];
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
const onPublic = process.argv.includes("--public");
for (const frequency of ["monthly", "quarterly"] as const) {
  const all = onPublic ? loadPublic(frequency) : loadM3(frequency);
  const series = sample(all, arg("--series", all.length), seed);
  for (const [name, cuts] of [["rolling origins", rollingCuts(series)], ["holdout", holdoutCuts(series)]] as const) {
    const tallies = evaluate(cuts);
    console.log(`\n${onPublic ? "public " : "M3 "}${frequency}, ${name}: ${series.length} series; sMAPE, MASE, share inside the 80% / 95% interval`);
    tallies.forEach((t, i) => {
      const cover = t.inside.map((v) => ((100 * v) / t.steps).toFixed(1)).join(" / ");
      console.log(`  ${METHODS[i].padEnd(34)} ${(t.smape / t.n).toFixed(2).padStart(6)}  ${(t.mase / t.nMase).toFixed(3)}  ${cover}   (${t.n} forecasts)`);
    });
  }
}
