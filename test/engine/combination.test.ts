/**
 * Akaike weights and the combination of forecasts with their intervals.
 * Expected values are computed by hand from the published definitions:
 * - Akaike weights, w_i = exp(-D_i / 2) / sum_r exp(-D_r / 2) (Burnham & Anderson 2002, "Model
 *   Selection and Multimodel Inference", section 2.9): for D = 0, 2, 4 the weights are
 *   1 / (1 + e^-1 + e^-2) = 0.665241, e^-1 times that = 0.244728, e^-2 times it = 0.090031;
 * - the weighted mean of quantiles (Lichtendahl, Grushka-Cockayne & Winkler 2013): each interval
 *   end is the weighted mean of the members' ends.
 * The link to the product's own choice: the candidate with the largest weight is the one the
 * automatic model picks (the same criterion), checked on base R's AirPassengers.
 */
import { readFileSync } from "fs";
import { join } from "path";
import { akaikeWeights, combineIntervals, EbbError, fitCandidates, fitModel, type FittedModel, type Interval, type Scored } from "../../src/engine";

const stub = (name: string) => ({ spec: { name } }) as unknown as FittedModel;
const scored = (aicc: number[], aic: number[] = aicc): Scored[] => aicc.map((v, i) => ({ model: stub(`m${i}`), aicc: v, aic: aic[i] }));

describe("Akaike weights", () => {
  test("follow the definition for differences 0, 2 and 4, in any order and at any offset", () => {
    const w = akaikeWeights(scored([1004.5, 1000.5, 1002.5])).map((x) => x.weight);
    expect(w[1]).toBeCloseTo(0.665241, 6);
    expect(w[2]).toBeCloseTo(0.244728, 6);
    expect(w[0]).toBeCloseTo(0.090031, 6);
  });

  test("give a candidate without a finite AICc weight 0, and fall back on AIC when no candidate has AICc", () => {
    const some = akaikeWeights(scored([10, NaN, 12])).map((x) => x.weight);
    expect(some[1]).toBe(0);
    expect(some[0]).toBeCloseTo(1 / (1 + Math.exp(-1)), 12);
    const none = akaikeWeights(scored([NaN, NaN], [7, 5])).map((x) => x.weight);
    expect(none[1]).toBeCloseTo(1 / (1 + Math.exp(-1)), 12);
    expect(none[0] + none[1]).toBeCloseTo(1, 12);
  });

  test("put the largest weight on the model the automatic choice picks (AirPassengers)", () => {
    const R = JSON.parse(readFileSync(join(__dirname, "../reference/fixtures/r-holtwinters.json"), "utf8"));
    const air: number[] = R.series.AirPassengers.values;
    const options = { period: 12, seasonality: "auto" as const, trend: "auto" as const };
    const weights = akaikeWeights(fitCandidates(air, options));
    expect(weights.length).toBeGreaterThan(1);
    const top = weights.reduce((a, b) => (b.weight > a.weight ? b : a));
    const chosen = fitModel(air, options);
    expect(top.model.spec).toEqual(chosen.spec);
    expect(weights.reduce((a, w) => a + w.weight, 0)).toBeCloseTo(1, 12);
  });
});

describe("combineIntervals", () => {
  const a: Interval = { forecast: Float64Array.from([10, 20]), low: Float64Array.from([8, 15]), high: Float64Array.from([12, 25]) };
  const b: Interval = { forecast: Float64Array.from([14, 30]), low: Float64Array.from([10, 20]), high: Float64Array.from([18, 40]) };

  test("averages forecasts and interval ends with the weights, scaled to sum to 1", () => {
    const c = combineIntervals([a, b], [3, 1]); // 0.75 and 0.25
    expect(Array.from(c.forecast)).toEqual([11, 22.5]);
    expect(Array.from(c.low)).toEqual([8.5, 16.25]);
    expect(Array.from(c.high)).toEqual([13.5, 28.75]);
  });

  test("explains what to do with bad weights or members of different lengths", () => {
    const short: Interval = { forecast: Float64Array.from([1]), low: Float64Array.from([0]), high: Float64Array.from([2]) };
    for (const [members, weights] of [
      [[a, b], [1]],
      [[a, b], [0, 0]],
      [[a, b], [1, -1]],
      [[a, short], [1, 1]],
    ] as [Interval[], number[]][]) {
      expect(() => combineIntervals(members, weights)).toThrow(EbbError);
    }
  });
});
