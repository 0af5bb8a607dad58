/**
 * Lead-time demand and safety stock (EBB.BUFFER's engine side).
 * - Additive models: the engine's lead-time variance against the sum of the full covariance
 *   matrix of the h-step errors, built here from the published class 1 representation
 *   (Hyndman, Koehler, Ord & Snyder 2008, Forecasting with Exponential Smoothing, ch. 6:
 *   e_{n+h} = eps_{n+h} + sum_{j<h} c_j eps_{n+h-j}, c_j = alpha + alpha*beta*phi_j + gamma*(1-alpha)*[p | j]),
 *   to 1e-9, and against a seeded simulation of the recursions written here, to 3%.
 * - Multiplicative models: against a seeded simulation written here (its own generator and
 *   100,000 paths), to 4% of the variance (the engine's 20,000-path estimate has a relative
 *   standard error near 1%, this one near 0.5%).
 * - Safety stock: a hand computation, with the Student t quantiles of base R's qt on the
 *   variance's degrees of freedom (k = 1.2922, 1.6641, 2.3739 for 90%, 95%, 99% on 80 degrees;
 *   a printed normal table's 1.2816, 1.6449, 2.3263 are their limit for a long history).
 */
import { fitModel, leadTimeDemand, predictionInterval, stockBuffer, type FittedModel } from "../../src/engine";
import { readDemo } from "../functions/support/demo";

const demo = readDemo();
const column = (name: string) => demo.columns[demo.names.findIndex((n) => n.startsWith(name))];

/** c_j for j = 0..H-1 (c_0 = 1), restated from the book's class 1 form. */
function weights(m: FittedModel, H: number): number[] {
  const { alpha, beta, gamma, phi } = m.constants;
  const p = m.spec.period;
  const damp = m.spec.trend === "damped" ? phi : 1;
  const c = [1];
  for (let j = 1; j < H; j++) {
    let phiJ = 0;
    for (let i = 1; i <= j; i++) phiJ += damp ** i;
    const trendPart = m.spec.trend === "none" ? 0 : alpha * beta * phiJ;
    const seasonPart = m.spec.seasonality !== "none" && j % p === 0 ? gamma * (1 - alpha) : 0;
    c.push(alpha + trendPart + seasonPart);
  }
  return c;
}

/** Quantities the model estimates: alpha, level, (beta, trend), (phi), (gamma and p - 1 free indices). */
function estimated(m: FittedModel): number {
  return 2 + (m.spec.trend !== "none" ? 2 : 0) + (m.spec.trend === "damped" ? 1 : 0) + (m.spec.seasonality !== "none" ? m.spec.period : 0);
}

/**
 * sigma^2 as the intervals take it: SSE over the errors less the quantities estimated, widened
 * by 1 + k/n for the estimated quantities (Akaike's final prediction error, the mean leverage).
 */
function sigma2(m: FittedModel): number {
  return (m.sse / Math.max(1, m.errorCount - estimated(m))) * (1 + estimated(m) / m.errorCount);
}

/** Student t quantiles qt(0.975, df) from base R 4.2, for the degrees of freedom of the cases here. */
const T975: Record<number, number> = { 43: 2.01669219923, 44: 2.01536757444, 80: 1.99006342125 };

/** Cov(e_h, e_k) = sigma^2 sum_i c_{h-i} c_{k-i}; the variance of the sum is the sum of all entries. */
function covarianceMatrix(m: FittedModel, H: number): number[][] {
  const c = weights(m, H);
  const s2 = sigma2(m);
  return Array.from({ length: H }, (_, h) =>
    Array.from({ length: H }, (_, k) => {
      let sum = 0;
      for (let i = 0; i <= Math.min(h, k); i++) sum += c[h - i] * c[k - i];
      return s2 * sum;
    }),
  );
}

/** An independent generator for the simulations here (xorshift32 + Box-Muller), not the engine's. */
function normals(seed: number): () => number {
  let x = seed >>> 0 || 1;
  const u = () => {
    x ^= x << 13;
    x >>>= 0;
    x ^= x >>> 17;
    x ^= x << 5;
    x >>>= 0;
    return (x + 0.5) / 4294967296;
  };
  return () => Math.sqrt(-2 * Math.log(u())) * Math.cos(2 * Math.PI * u());
}

/** Step values of `paths` simulated futures of the fitted recursions (DESIGN.md's formulas). */
function simulate(m: FittedModel, H: number, paths: number, sigma: number, seed: number): Float64Array[] {
  const draw = normals(seed);
  const p = m.spec.period;
  const mult = m.spec.seasonality === "multiplicative";
  const seasonal = m.spec.seasonality !== "none";
  const { alpha, beta, gamma } = m.constants;
  const phi = m.spec.trend === "damped" ? m.constants.phi : 1;
  const hasTrend = m.spec.trend !== "none";
  const out = Array.from({ length: H }, () => new Float64Array(paths));
  for (let path = 0; path < paths; path++) {
    let level = m.final.level;
    let trend = hasTrend ? m.final.trend : 0;
    const idx = Array.from(m.final.indices);
    for (let h = 0; h < H; h++) {
      const s = seasonal ? idx[h % p] : mult ? 1 : 0;
      const base = level + phi * trend;
      const y = mult ? base * s * (1 + sigma * draw()) : base + s + sigma * draw();
      const nl = mult ? alpha * (y / s) + (1 - alpha) * base : alpha * (y - s) + (1 - alpha) * base;
      if (seasonal) idx[h % p] = mult ? gamma * (y / nl) + (1 - gamma) * s : gamma * (y - nl) + (1 - gamma) * s;
      if (hasTrend) trend = beta * (nl - level) + (1 - beta) * phi * trend;
      level = nl;
      out[h][path] = y;
    }
  }
  return out;
}

function varianceOfSum(steps: Float64Array[]): number {
  const n = steps[0].length;
  const sums = new Float64Array(n);
  for (const s of steps) for (let i = 0; i < n; i++) sums[i] += s[i];
  const mean = sums.reduce((a, v) => a + v, 0) / n;
  return sums.reduce((a, v) => a + (v - mean) ** 2, 0) / (n - 1);
}

const sumAll = (m: number[][]) => m.flat().reduce((a, v) => a + v, 0);

describe("lead-time variance, additive models: the sum of the h-step variances and covariances", () => {
  const cases: [string, Parameters<typeof fitModel>[1], number][] = [
    ["Bird feed, additive linear, L = 3", { period: 12, seasonality: "additive", trend: "linear" }, 3],
    ["Bird feed, additive damped, L = 14 (past a full season)", { period: 12, seasonality: "additive", trend: "damped" }, 14],
    ["Bird feed, no seasons, no trend, L = 6", { period: 12, seasonality: "none", trend: "none" }, 6],
  ];
  test.each(cases)("%s", (_, options, L) => {
    const m = fitModel(column("Bird feed"), options);
    const cov = covarianceMatrix(m, L);
    const lt = leadTimeDemand(m, L);
    expect(lt.method).toBe("analytic");
    expect(Math.abs(lt.variance - sumAll(cov))).toBeLessThanOrEqual(1e-9 * sumAll(cov));
    // the diagonal is the intervals' own h-step variance: half-width / t, squared (t on n - k degrees)
    const band = predictionInterval(m, L, 0.95);
    const t = T975[m.errorCount - estimated(m)];
    expect(t).toBeDefined();
    for (let h = 0; h < L; h++) {
      const v = ((band.high[h] - band.low[h]) / 2 / t) ** 2;
      expect(Math.abs(v - cov[h][h]) / cov[h][h]).toBeLessThan(1e-6);
    }
    // the covariances matter: never below the shortcut sigma^2 * L, and above it once alpha > 0
    expect(lt.variance).toBeGreaterThan(sigma2(m) * L);
    expect(lt.rootPeriodsSd).toBeCloseTo(Math.sqrt(sigma2(m) * L), 9);
    // the forecast is the sum of the point forecasts
    expect(lt.forecast).toBeCloseTo(band.forecast.reduce((a, v) => a + v, 0), 6);
  });

  test("a seeded simulation of the additive recursions agrees to 3%", () => {
    const m = fitModel(column("Bird feed"), { period: 12, seasonality: "additive", trend: "damped" });
    const simulated = varianceOfSum(simulate(m, 6, 100000, Math.sqrt(sigma2(m)), 77));
    expect(Math.abs(leadTimeDemand(m, 6).variance / simulated - 1)).toBeLessThan(0.03);
  });

  test("the shortcut sigma * sqrt(L) holds exactly when nothing carries forward (alpha = 0, gamma = 0)", () => {
    const m = fitModel(column("Bird feed"), { period: 12, seasonality: "additive", trend: "none", alpha: 0, gamma: 0 });
    const lt = leadTimeDemand(m, 15);
    expect(Math.abs(lt.sd / lt.rootPeriodsSd - 1)).toBeLessThan(1e-12);
  });
});

describe("lead-time variance, multiplicative models: against a seeded simulation", () => {
  const cases: [string, string, Parameters<typeof fitModel>[1], number][] = [
    ["Seed trays, mult. linear, L = 3", "Seed trays", { period: 12, seasonality: "multiplicative", trend: "linear" }, 3],
    ["Solar lights, mult. damped, L = 4 + review 2", "Solar", { period: 12, seasonality: "multiplicative", trend: "damped" }, 6],
    ["Hose reels, mult. none, L = 13", "Hose reels", { period: 12, seasonality: "multiplicative", trend: "none" }, 13],
  ];
  test.each(cases)("%s: within 4%", (_, name, options, L) => {
    const m = fitModel(column(name), options);
    const sigma = Math.sqrt((m.relativeSse / (m.errorCount - estimated(m))) * (1 + estimated(m) / m.errorCount));
    const steps = simulate(m, L, 100000, sigma, 4242);
    const lt = leadTimeDemand(m, L);
    expect(lt.method).toBe("simulated");
    const independent = varianceOfSum(steps);
    expect(Math.abs(lt.variance / independent - 1)).toBeLessThan(0.04);
    // and the covariance view: every h-step variance and covariance from the same paths adds up to it
    let covSum = 0;
    const means = steps.map((s) => s.reduce((a, v) => a + v, 0) / s.length);
    for (let h = 0; h < L; h++) {
      for (let k = 0; k < L; k++) {
        let c = 0;
        for (let i = 0; i < steps[h].length; i++) c += (steps[h][i] - means[h]) * (steps[k][i] - means[k]);
        covSum += c / (steps[h].length - 1);
      }
    }
    expect(Math.abs(covSum / independent - 1)).toBeLessThan(1e-9);
    expect(leadTimeDemand(m, L).variance).toBe(lt.variance); // seeded: the same digits every time
  });
});

describe("safety stock and reorder point", () => {
  // Simple smoothing (no seasons, no trend) with alpha fixed at 0.2 on the bird feed column.
  const m = fitModel(column("Bird feed"), { period: 1, seasonality: "none", trend: "none", alpha: 0.2 });
  const sigma = Math.sqrt(sigma2(m));

  test("hand computation: L = 3, 95% cycle service level", () => {
    // c_j = alpha = 0.2, so the shocks of the three periods carry weights 1.4, 1.2 and 1:
    // sd = sigma * sqrt(1.96 + 1.44 + 1) = sigma * sqrt(4.4); k = qt(0.95, 80) = 1.66412 (base R 4.2:
    // Student t on the variance's 82 - 2 degrees; the normal table's 1.6449 for a long history);
    // safety stock = k * sd; reorder point = 3 x the level forecast + safety stock
    // (Silver, Pyke & Thomas 2017: s = forecast over L + k sigma_L).
    const b = stockBuffer(m, { leadTime: 3, serviceLevel: 0.95 });
    expect(b.sd / sigma).toBeCloseTo(Math.sqrt(4.4), 12);
    expect(m.errorCount - estimated(m)).toBe(80);
    expect(b.z).toBeCloseTo(1.66412457859, 9);
    expect(b.safetyStock / sigma).toBeCloseTo(1.66412457859 * Math.sqrt(4.4), 9); // 3.4906
    expect(b.forecast).toBeCloseTo(3 * m.final.level, 9);
    expect(b.reorderPoint).toBeCloseTo(3 * m.final.level + b.safetyStock, 9);
  });

  test("with a review period the protection interval is R + L", () => {
    // L = 2, R = 1: the same three periods as above, so the same spread; 90%: k = qt(0.9, 80) = 1.29222 (base R)
    const b = stockBuffer(m, { leadTime: 2, reviewPeriod: 1, serviceLevel: 0.9 });
    expect(b.periods).toBe(3);
    expect(b.sd / sigma).toBeCloseTo(Math.sqrt(4.4), 12);
    expect(b.z).toBeCloseTo(1.29222358306, 9);
    expect(stockBuffer(m, { leadTime: 3, serviceLevel: 0.99 }).z).toBeCloseTo(2.37386827297, 9); // qt(0.99, 80)
  });

  test("bad settings get a message that says what to type", () => {
    expect(() => stockBuffer(m, { leadTime: 0, serviceLevel: 0.95 })).toThrow(/lead time must be a whole number of periods from 1/);
    expect(() => stockBuffer(m, { leadTime: 2.5, serviceLevel: 0.95 })).toThrow(/Round a part period up/);
    expect(stockBuffer(m, { leadTime: 3, serviceLevel: 95 })).toEqual(stockBuffer(m, { leadTime: 3, serviceLevel: 0.95 })); // a percent, as coverage
    expect(() => stockBuffer(m, { leadTime: 3, serviceLevel: 0.3 })).toThrow(/from 0.5 to 0.9999/);
    expect(() => stockBuffer(m, { leadTime: 3, serviceLevel: 1 })).toThrow(/from 0.5 to 0.9999/);
    expect(() => stockBuffer(m, { leadTime: 3, reviewPeriod: -1, serviceLevel: 0.9 })).toThrow(/review period/);
  });
});
