/**
 * Season length detection (detectPeriod), the autocorrelation function (acf) and the M3
 * Naive2 seasonality test (seasonalityTest90). Synthetic series are seeded, so every run sees
 * the same numbers.
 */
import { acf, seasonalityTest90 } from "../../src/engine/acf";
import { EbbError } from "../../src/engine/errors";
import { detectPeriod } from "../../src/engine/period";
import { seededNormal } from "../../src/engine/random";

interface Shape {
  n: number;
  period: number;
  /** Seasonal pattern, one value per season position (used as given, before noise). */
  pattern: number[];
  noise: number;
  trend?: number;
  level?: number;
  /** Random-walk level instead of a fixed one (standard deviation of each step). */
  walk?: number;
}

/** level + trend * t + pattern[t mod p] + noise, seeded. */
function seasonal(shape: Shape, seed: number): number[] {
  const z = seededNormal(seed);
  const y: number[] = [];
  let level = shape.level ?? 100;
  for (let t = 0; t < shape.n; t++) {
    if (shape.walk) level += shape.walk * z();
    y.push(level + (shape.trend ?? 0) * t + shape.pattern[t % shape.period] + shape.noise * z());
  }
  return y;
}

/** A smooth seasonal wave of period p and amplitude a (sine), as a pattern. */
function wave(p: number, a: number): number[] {
  return Array.from({ length: p }, (_, k) => a * Math.sin((2 * Math.PI * k) / p));
}

const SEEDS = [1, 2, 3, 4, 5, 6, 7, 8];

describe("acf", () => {
  test("hand calculation", () => {
    // y = 1 2 3 4: mean 2.5, deviations -1.5 -0.5 0.5 1.5, sum of squares 5
    // lag 1 cross products: (-1.5)(-0.5) + (-0.5)(0.5) + (0.5)(1.5) = 0.75 - 0.25 + 0.75 = 1.25
    // r_1 = 1.25 / 5 = 0.25 (textbook estimator, Hyndman & Athanasopoulos FPP "Autocorrelation")
    // lag 2: (-1.5)(0.5) + (-0.5)(1.5) = -1.5 -> r_2 = -0.3
    const r = acf([1, 2, 3, 4], 2);
    expect(r[0]).toBe(1);
    expect(r[1]).toBeCloseTo(0.25, 14);
    expect(r[2]).toBeCloseTo(-0.3, 14);
  });

  test("missing values are skipped pair by pair", () => {
    // y = 1 NaN 3 5: mean 3, deviations -2 . 0 2, N = 3, c0 = 8/3
    // lag 1 pairs with both present: (3,5) only: 0 * 2 = 0 -> r_1 = 0
    // lag 2 pairs: (1,3): -2 * 0 = 0, (NaN,5) skipped -> r_2 = 0
    // lag 3 pairs: (1,5): -2 * 2 = -4, mean over 1 pair = -4; r_3 = (-4 / (8/3)) * (4-3)/4 = -0.375
    const r = acf([1, NaN, 3, 5], 3);
    expect(r[1]).toBeCloseTo(0, 14);
    expect(r[2]).toBeCloseTo(0, 14);
    expect(r[3]).toBeCloseTo(-0.375, 14);
  });

  test("a constant series has no autocorrelation (zeros, not NaN)", () => {
    expect(Array.from(acf([4, 4, 4, 4, 4], 2))).toEqual([0, 0, 0]);
  });
});

describe("seasonalityTest90 (M3 Naive2 test, Makridakis & Hibon 2000)", () => {
  // y = 1 5 1 5 ... (12 values): deviations -2 +2, so r_k = (+-1) * (12-k)/12
  // r_1 = -11/12, r_2 = 10/12, r_3 = -9/12
  test("seasonal at p = 2", () => {
    // |r_2| = 0.8333 > 1.645 * sqrt((1 + 2 * (11/12)^2) / 12) = 1.645 * sqrt(2.6806/12) = 0.7775
    expect(seasonalityTest90([1, 5, 1, 5, 1, 5, 1, 5, 1, 5, 1, 5], 2)).toBe(true);
  });
  test("not seasonal at p = 3", () => {
    // |r_3| = 0.75 < 1.645 * sqrt((1 + 2 * ((11/12)^2 + (10/12)^2)) / 12) = 1.645 * sqrt(4.0694/12) = 0.9579
    expect(seasonalityTest90([1, 5, 1, 5, 1, 5, 1, 5, 1, 5, 1, 5], 3)).toBe(false);
  });
  test("p < 2 or too few values: false", () => {
    expect(seasonalityTest90([1, 5, 1, 5], 1)).toBe(false);
    expect(seasonalityTest90([1, 5, 1], 4)).toBe(false);
  });
  test("a clearly seasonal monthly series passes at 12", () => {
    expect(seasonalityTest90(seasonal({ n: 72, period: 12, pattern: wave(12, 20), noise: 3 }, 11), 12)).toBe(true);
  });
});

describe("detectPeriod", () => {
  test("hand-checkable case: 5 9 2 repeated four times -> 3", () => {
    // n = 12, K = min(24, floor(12/3)) = 4; after removing the fitted line, r_3 is the only peak:
    // the pattern repeats every 3, r_3 ~ 0.75 (the (n-3)/n taper of a perfect repeat) above the
    // Bonferroni bound z(0.05/3) / sqrt(12) = 2.13 / 3.46 = 0.62, and r_3 - r_2 = 0.745 + 0.364 = 1.11
    // clears the swing bound 1.96 * sqrt(2/12) = 0.80 (computed: r_1 -0.513, r_2 -0.364, r_3 0.745, r_4 -0.388).
    expect(detectPeriod([5, 9, 2, 5, 9, 2, 5, 9, 2, 5, 9, 2])).toBe(3);
  });

  test.each(SEEDS)("quarterly (p = 4) with trend and noise, seed %i", (seed) => {
    const y = seasonal({ n: 40, period: 4, pattern: [-12, 4, 15, -7], noise: 3, trend: 0.8 }, seed);
    expect(detectPeriod(y)).toBe(4);
  });

  test.each(SEEDS)("daily with a weekly cycle (p = 7) and noise, seed %i", (seed) => {
    const y = seasonal({ n: 70, period: 7, pattern: [8, 10, 9, 11, 14, -25, -27], noise: 4 }, seed);
    expect(detectPeriod(y)).toBe(7);
  });

  test.each(SEEDS)("monthly (p = 12) smooth wave with trend and noise, seed %i", (seed) => {
    const y = seasonal({ n: 72, period: 12, pattern: wave(12, 15), noise: 4, trend: 0.5 }, seed);
    expect(detectPeriod(y)).toBe(12);
  });

  test.each(SEEDS)("monthly (p = 12) spring-peak shape, seed %i", (seed) => {
    const pattern = [-20, -15, 0, 25, 40, 30, 10, -5, -12, -15, -18, -20];
    const y = seasonal({ n: 60, period: 12, pattern, noise: 5, trend: 0.3 }, seed);
    expect(detectPeriod(y)).toBe(12);
  });

  test.each(SEEDS)("monthly (p = 12) on a wandering (random-walk) level, seed %i", (seed) => {
    const y = seasonal({ n: 96, period: 12, pattern: wave(12, 12), noise: 2, walk: 2 }, seed);
    expect(detectPeriod(y)).toBe(12);
  });

  test("exact straight line -> 1", () => {
    expect(detectPeriod(Array.from({ length: 48 }, (_, t) => 3 + 2 * t))).toBe(1);
    expect(detectPeriod(Array.from({ length: 48 }, () => 7))).toBe(1);
  });

  test.each(SEEDS)("trend plus noise -> 1, seed %i", (seed) => {
    const y = seasonal({ n: 60, period: 1, pattern: [0], noise: 5, trend: 2 }, seed);
    expect(detectPeriod(y)).toBe(1);
  });

  test.each(SEEDS)("white noise -> 1, seed %i", (seed) => {
    const y = seasonal({ n: 72, period: 1, pattern: [0], noise: 10 }, 100 + seed);
    expect(detectPeriod(y)).toBe(1);
  });

  test("a level shift is not a season -> 1", () => {
    const z = seededNormal(42);
    const y = Array.from({ length: 96 }, (_, t) => (t < 50 ? 100 : 130) + 3 * z());
    expect(detectPeriod(y)).toBe(1);
  });

  test.each(SEEDS)("missing values: p = 12 with about 10% of the months blank, seed %i", (seed) => {
    const y = seasonal({ n: 72, period: 12, pattern: wave(12, 15), noise: 3, trend: 0.4 }, seed);
    const z = seededNormal(1000 + seed);
    const holed = y.map((v) => (z() > 1.28 ? NaN : v));
    expect(holed.filter((v) => Number.isNaN(v)).length).toBeGreaterThan(0);
    expect(detectPeriod(holed)).toBe(12);
  });

  test("missing values at the ends are ignored, and p = 4 survives gaps", () => {
    const y = seasonal({ n: 40, period: 4, pattern: [-12, 4, 15, -7], noise: 2 }, 9);
    y[5] = NaN;
    y[17] = NaN;
    y[30] = NaN;
    expect(detectPeriod([NaN, NaN, ...y, NaN, NaN, NaN])).toBe(4);
  });

  test("too short, empty, all missing or maxPeriod < 2 -> 1", () => {
    expect(detectPeriod([])).toBe(1);
    expect(detectPeriod([NaN, NaN])).toBe(1);
    expect(detectPeriod([1, 2, 1, 2, 1])).toBe(1); // n = 5: K = floor(5/3) = 1
    expect(detectPeriod([5, 9, 2, 5, 9, 2, 5, 9, 2, 5, 9, 2], 1)).toBe(1);
  });

  test("maxPeriod limits the lags considered", () => {
    const y = seasonal({ n: 72, period: 12, pattern: wave(12, 15), noise: 2 }, 3);
    expect(detectPeriod(y, 24)).toBe(12);
    expect(detectPeriod(y, 11)).not.toBe(12);
  });

  test("bad input is #VALUE!", () => {
    expect(() => detectPeriod([1, Infinity, 3, 4, 5, 6])).toThrow(EbbError);
    expect(() => detectPeriod([1, 2, 3, 4, 5, 6], 0)).toThrow(EbbError);
    expect(() => detectPeriod([1, 2, 3, 4, 5, 6], NaN)).toThrow(EbbError);
  });

  test("deterministic", () => {
    const y = seasonal({ n: 72, period: 12, pattern: wave(12, 5), noise: 4 }, 77);
    expect(detectPeriod(y)).toBe(detectPeriod(y.slice()));
  });

  // The rule's error rates on many seeded series, so that the claims in period.ts stay true.
  test("error rates: at most 5% false seasons on non-seasonal series, at least 95% found on clear ones", () => {
    let falseSeasons = 0;
    let nonSeasonal = 0;
    for (let s = 0; s < 150; s++) {
      const z = seededNormal(5000 + s);
      const noise = Array.from({ length: 60 }, () => 100 + 5 * z());
      let w = 100;
      const walk = Array.from({ length: 60 }, () => (w += 2 * z()));
      const trend = Array.from({ length: 60 }, (_, t) => 50 + 1.5 * t + 4 * z());
      for (const y of [noise, walk, trend]) {
        nonSeasonal++;
        if (detectPeriod(y) !== 1) falseSeasons++;
      }
    }
    expect(falseSeasons / nonSeasonal).toBeLessThanOrEqual(0.05);

    let found = 0;
    let seasonalCount = 0;
    for (let s = 0; s < 60; s++) {
      for (const p of [4, 7, 12]) {
        seasonalCount++;
        const y = seasonal({ n: 6 * p + 24, period: p, pattern: wave(p, 2 * Math.SQRT2), noise: 1, trend: 0.3 }, 9000 + 31 * s + p);
        if (detectPeriod(y) === p) found++;
      }
    }
    expect(found / seasonalCount).toBeGreaterThanOrEqual(0.95);
  });
});
