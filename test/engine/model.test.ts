/**
 * fitModel and what is built on it: missing values, trailing blanks, errors a user can meet,
 * automatic choice by AICc, prediction intervals, holdout and rolling-origin scores.
 * Data: base R's AirPassengers (Box & Jenkins 1976), read from the committed R fixture.
 * Expected behaviour comes from DESIGN ("The model family", "Prediction intervals", the error
 * rules) and from the published formulas named beside each check.
 */
import { readFileSync } from "fs";
import { join } from "path";
import {
  EbbError,
  fitModel,
  forecastModel,
  holdoutScore,
  modelStates,
  parseSeasonality,
  parseStart,
  parseTrend,
  predictionInterval,
  rollingBacktest,
  type FittedModel,
  type Seasonality,
  type TrendKind,
} from "../../src/engine";

const R = JSON.parse(readFileSync(join(__dirname, "../reference/fixtures/r-holtwinters.json"), "utf8")) as {
  series: Record<string, { values: number[] }>;
};
const AIR = R.series.AirPassengers.values; // monthly, 144 values, strongly seasonal
const P = 12;

/** The error a call throws (fails the test when it throws nothing). */
function thrown(f: () => unknown): EbbError {
  try {
    f();
  } catch (e) {
    if (e instanceof EbbError) return e;
    throw new Error(`expected an EbbError, got ${String(e)}`);
  }
  throw new Error("expected an EbbError, got a result");
}

describe("missing values and trailing blanks", () => {
  it("skips the update of a missing period inside the history: the state carries forward on its forecast", () => {
    const history: (number | null)[] = AIR.slice(0, 60);
    const gap = 40; // 0-based, after the 24-value start window
    history[gap] = null;
    const phi = 0.9;
    const model = fitModel(history, { period: P, seasonality: "multiplicative", trend: "damped", alpha: 0.3, beta: 0.1, gamma: 0.2, phi });
    const t = modelStates(model);
    expect(model.start.firstUpdate).toBe(24);
    // DESIGN: "the update for that period is skipped and the state carries forward on its own forecast"
    expect(t.level[gap]).toBeCloseTo(t.level[gap - 1] + phi * t.trend[gap - 1], 10);
    expect(t.trend[gap]).toBeCloseTo(phi * t.trend[gap - 1], 12);
    expect(t.index[gap]).toBe(t.index[gap - P]); // the index is not updated either
    expect(t.error[gap]).toBeNaN();
    expect(Number.isFinite(t.forecast[gap])).toBe(true);
    // the next period is forecast from the carried state
    expect(t.forecast[gap + 1]).toBeCloseTo((t.level[gap] + phi * t.trend[gap]) * t.index[gap + 1 - P], 9);
    expect(model.errorCount).toBe(60 - 24 - 1);
    let sse = 0;
    for (let i = 24; i < 60; i++) if (i !== gap) sse += t.error[i] ** 2;
    expect(model.sse).toBeCloseTo(sse, 6);
  });

  it("fits constants over a history with gaps and returns finite results", () => {
    const history: (number | null)[] = AIR.slice(0, 72);
    history[30] = null;
    history[50] = undefined as unknown as null;
    const model = fitModel(history, { period: P, seasonality: "multiplicative" });
    expect(Number.isFinite(model.sse)).toBe(true);
    expect(model.errorCount).toBe(72 - 24 - 2);
    for (const v of forecastModel(model, 12)) expect(Number.isFinite(v)).toBe(true);
  });

  it("ignores trailing blanks, so a range longer than the actuals gives the same model", () => {
    const base = AIR.slice(0, 60);
    const a = fitModel(base, { period: P, seasonality: "multiplicative" });
    const b = fitModel([...base, null, undefined, null], { period: P, seasonality: "multiplicative" });
    expect(b.history.length).toBe(60);
    expect(b.sse).toBe(a.sse);
    expect(b.constants).toEqual(a.constants);
    expect(Array.from(forecastModel(b, 12))).toEqual(Array.from(forecastModel(a, 12)));
  });
});

describe("errors a user can meet", () => {
  it('too short a history is #N/A ("na") and says how many values are needed; that many is enough', () => {
    for (const options of [
      { period: P, seasonality: "multiplicative" as const, alpha: 0.3, beta: 0.1, gamma: 0.2 },
      { period: P, seasonality: "multiplicative" as const },
      { period: P, seasonality: "additive" as const, start: "classic" as const },
      { period: P, seasonality: "additive" as const, trend: "damped" as const, start: "optimized" as const },
    ]) {
      const e = thrown(() => fitModel(AIR.slice(0, 10), options));
      expect(e.kind).toBe("na");
      const m = /Needs (\d+) values, has 10\b/.exec(e.message);
      expect(m).not.toBeNull();
      const needed = Number(m![1]);
      // DESIGN: the decomposition start needs at least two full seasons
      expect(needed).toBeGreaterThanOrEqual(2 * P);
      expect(() => fitModel(AIR.slice(0, needed), options)).not.toThrow();
      const short = thrown(() => fitModel(AIR.slice(0, needed - 1), options));
      expect(short.kind).toBe("na");
      expect(short.message).toContain(`Needs ${needed} values, has ${needed - 1}`);
    }
    // with every constant typed, two full seasons are exactly enough (DESIGN "Starts")
    expect(thrown(() => fitModel(AIR.slice(0, 23), { period: P, alpha: 0.3, beta: 0.1, gamma: 0.2 })).message).toContain("Needs 24 values, has 23");
    expect(thrown(() => fitModel([], { period: P })).kind).toBe("na");
    expect(thrown(() => fitModel([null, null], { period: P })).kind).toBe("na");
  });

  it("a zero or negative value with multiplicative seasonality is #VALUE! and names the value", () => {
    for (const bad of [0, -5]) {
      const history = AIR.slice(0, 48);
      history[30] = bad;
      const e = thrown(() => fitModel(history, { period: P, seasonality: "multiplicative" }));
      expect(e.kind).toBe("value");
      expect(e.message).toContain("Value 31");
      expect(e.message).toMatch(/additive/i); // says what to do instead
      expect(() => fitModel(history, { period: P, seasonality: "additive" })).not.toThrow();
      expect(fitModel(history, { period: P, seasonality: "auto" }).spec.seasonality).not.toBe("multiplicative"); // additive, or none when the seasonality test finds no season
    }
  });

  it("an unknown option word is #VALUE! and lists the accepted words; words are case-insensitive", () => {
    const cases: [(v: unknown) => unknown, string, string[]][] = [
      [parseSeasonality, "sideways", ["multiplicative", "additive", "auto"]],
      [parseTrend, "wobbly", ["linear", "damped", "none", "auto"]],
      [parseStart, "random", ["decomposition", "classic", "optimized"]],
    ];
    for (const [parse, word, accepted] of cases) {
      const e = thrown(() => parse(word));
      expect(e.kind).toBe("value");
      expect(e.message).toContain(word);
      for (const w of accepted) expect(e.message).toContain(w);
      expect(thrown(() => parse(42)).kind).toBe("value");
      for (const w of accepted) expect(parse(` ${w.toUpperCase()} `)).toBe(w);
    }
  });

  it("a smoothing constant outside [0, 1] is #VALUE! and names the constant", () => {
    for (const [name, value] of [["alpha", 1.2], ["beta", -0.1], ["gamma", Number.NaN], ["phi", 1.5], ["alpha", Number.POSITIVE_INFINITY]] as const) {
      const e = thrown(() => fitModel(AIR.slice(0, 48), { period: P, [name]: value }));
      expect(e.kind).toBe("value");
      expect(e.message).toContain(name);
      expect(e.message).toMatch(/0 to 1/);
    }
    for (const edge of [0, 1]) expect(() => fitModel(AIR.slice(0, 48), { period: P, alpha: edge, beta: edge, gamma: edge })).not.toThrow();
  });
});

describe("automatic choice of seasonality and trend", () => {
  it("returns the candidate with the lowest AICc among the candidates fitted separately on the same window", () => {
    const history = AIR.slice(0, 96);
    const chosen = fitModel(history, { period: P, seasonality: "auto", trend: "auto" });
    const candidates: FittedModel[] = [];
    for (const seasonality of ["multiplicative", "additive"] as Seasonality[]) {
      // auto's trend candidates: damped and none (src/engine/model.ts, AUTO_TRENDS)
      for (const trend of ["damped", "none"] as TrendKind[]) candidates.push(fitModel(history, { period: P, seasonality, trend }));
    }
    const counts = new Set(candidates.map((m) => m.errorCount));
    expect(counts.size).toBe(1); // same update window, so AICc values are comparable
    const best = candidates.reduce((a, b) => (b.aicc < a.aicc ? b : a));
    expect(chosen.spec.seasonality).toBe(best.spec.seasonality);
    expect(chosen.spec.trend).toBe(best.spec.trend);
    expect(chosen.aicc).toBe(best.aicc);
    for (const m of candidates) expect(chosen.aicc).toBeLessThanOrEqual(m.aicc);
    // AICc (Hurvich & Tsai 1989): n log(SSE/n) + 2k + 2k(k+1)/(n-k-1), k = estimated parameters + 1
    const n = chosen.errorCount;
    const k = chosen.parameterCount + 1;
    expect(chosen.aicc).toBeCloseTo(n * Math.log(chosen.sse / n) + 2 * k + (2 * k * (k + 1)) / (n - k - 1), 9);
  });

  it("falls back on AIC when the history is too short for AICc in every candidate", () => {
    // 16 quarterly values: 8 one-step errors after the two-season window, fewer than AICc needs
    const history = [12, 18, 25, 14, 13, 20, 27, 15, 15, 21, 29, 16, 16, 23, 30, 18];
    const candidates: FittedModel[] = [];
    for (const seasonality of ["multiplicative", "additive"] as Seasonality[]) {
      for (const trend of ["damped", "none"] as TrendKind[]) candidates.push(fitModel(history, { period: 4, seasonality, trend }));
    }
    for (const m of candidates) expect(Number.isNaN(m.aicc)).toBe(true);
    // AIC (Akaike 1974): n log(SSE/n) + 2k, k = estimated parameters + 1
    const aicOf = (m: FittedModel) => m.errorCount * Math.log(m.sse / m.errorCount) + 2 * (m.parameterCount + 1);
    const best = candidates.reduce((a, b) => (aicOf(b) < aicOf(a) ? b : a));
    const chosen = fitModel(history, { period: 4, seasonality: "auto", trend: "auto" });
    expect([chosen.spec.seasonality, chosen.spec.trend]).toEqual([best.spec.seasonality, best.spec.trend]);
  });

  it("auto trend alone compares the damped and the no-trend model under the given seasonality", () => {
    const history = AIR.slice(0, 96);
    const chosen = fitModel(history, { period: P, seasonality: "additive", trend: "auto" });
    const aiccs = (["damped", "none"] as TrendKind[]).map((trend) => fitModel(history, { period: P, seasonality: "additive", trend }).aicc);
    expect(chosen.spec.seasonality).toBe("additive");
    expect(chosen.aicc).toBe(Math.min(...aiccs));
  });
});

describe("prediction intervals", () => {
  // Student t quantiles on 104 degrees of freedom (the additive AirPassengers fit: 120 one-step
  // errors less 4 + 12 estimated quantities), from base R 4.2: qt(0.975, 104), qt(0.9, 104).
  const T975 = 1.98303752648;
  const T90 = 1.28974481603;

  it("additive: analytic widths (Hyndman, Koehler, Ord & Snyder 2008, ch. 6) grow with the horizon; 0.8 is narrower than 0.95", () => {
    const model = fitModel(AIR, { period: P, seasonality: "additive" });
    const h = 36;
    const wide = predictionInterval(model, h, 0.95);
    const narrow = predictionInterval(model, h, 0.8);
    const width = (i: number) => wide.high[i] - wide.low[i];
    for (let i = 0; i < h; i++) {
      expect(wide.high[i] - wide.forecast[i]).toBeCloseTo(wide.forecast[i] - wide.low[i], 8); // symmetric
      if (i > 0) expect(width(i)).toBeGreaterThanOrEqual(width(i - 1));
      expect(narrow.high[i] - narrow.low[i]).toBeLessThan(width(i));
      // same variance, so the half-widths are in the ratio of the t quantiles
      expect((narrow.high[i] - narrow.low[i]) / width(i)).toBeCloseTo(T90 / T975, 9);
    }
    expect(width(h - 1)).toBeGreaterThan(width(0));
    // v_h = sigma^2 (1 + sum_{j<h} c_j^2), c_j = alpha + alpha*beta*j + gamma*(1-alpha)*[j multiple of p]:
    // the book's class-1 form with the classic constants mapped to error-correction form
    // (beta* = alpha*beta; gamma* = gamma*(1-alpha) for the seasonal update on the new level).
    const { alpha, beta, gamma } = model.constants;
    // sigma^2: SSE over the errors less the estimated quantities (Hyndman & Khandakar 2008):
    // alpha, beta, gamma, start level, start trend and p-1 free start indices = 2 + 2 + P
    const k = 2 + 2 + P;
    expect(model.errorCount).toBe(120);
    const sigma2 = model.sse / (model.errorCount - k);
    // widened for the estimated quantities by 1 + k/n, the mean leverage (Akaike's final prediction error)
    const forecastVariance = sigma2 * (1 + k / model.errorCount);
    const variance = (hh: number) => {
      let s = 0;
      for (let j = 1; j < hh; j++) s += (alpha + alpha * beta * j + (j % P === 0 ? gamma * (1 - alpha) : 0)) ** 2;
      return forecastVariance * (1 + s);
    };
    for (const hh of [1, 2, 13, 25]) expect(wide.high[hh - 1] - wide.forecast[hh - 1]).toBeCloseTo(T975 * Math.sqrt(variance(hh)), 6);
  });

  it("multiplicative: the simulated interval is the same on every run, brackets the forecast, and 0.8 is narrower", () => {
    const model = fitModel(AIR, { period: P, seasonality: "multiplicative" });
    const a = predictionInterval(model, 24, 0.95);
    const b = predictionInterval(fitModel(AIR, { period: P, seasonality: "multiplicative" }), 24, 0.95);
    expect(Array.from(b.low)).toEqual(Array.from(a.low));
    expect(Array.from(b.high)).toEqual(Array.from(a.high));
    const narrow = predictionInterval(model, 24, 0.8);
    for (let i = 0; i < 24; i++) {
      expect(Number.isFinite(a.low[i]) && Number.isFinite(a.high[i])).toBe(true);
      expect(a.low[i]).toBeLessThan(a.forecast[i]);
      expect(a.high[i]).toBeGreaterThan(a.forecast[i]);
      expect(narrow.low[i]).toBeGreaterThan(a.low[i]);
      expect(narrow.high[i]).toBeLessThan(a.high[i]);
    }
    expect(a.high[23] - a.low[23]).toBeGreaterThan(a.high[0] - a.low[0]);
  });

  it("rejects a coverage outside (0, 1) with #VALUE!", () => {
    const model = fitModel(AIR.slice(0, 60), { period: P, seasonality: "additive" });
    for (const c of [0, 1, 95, -0.5]) expect(thrown(() => predictionInterval(model, 12, c)).kind).toBe("value");
  });
});

describe("holdout and rolling-origin evaluation", () => {
  const options = { period: P, seasonality: "multiplicative" as const };

  it("holdoutScore fits on all but the last values and scores the forecasts of them", () => {
    const r = holdoutScore(AIR, options, 12, 0.9);
    expect(r.forecast.length).toBe(12);
    expect(Array.from(r.actual)).toEqual(AIR.slice(-12));
    expect(Array.from(r.forecast)).toEqual(Array.from(forecastModel(fitModel(AIR.slice(0, -12), options), 12)));
    for (const v of [r.mad, r.mape, r.smape, r.mase, r.rmse, r.bias]) expect(Number.isFinite(v)).toBe(true);
    // MAD and bias by their definitions (mean absolute error, mean error; error = actual - forecast)
    const errors = AIR.slice(-12).map((a, i) => a - r.forecast[i]);
    expect(r.mad).toBeCloseTo(errors.reduce((s, e) => s + Math.abs(e), 0) / 12, 9);
    expect(r.bias).toBeCloseTo(errors.reduce((s, e) => s + e, 0) / 12, 9);
    expect(r.coverage).toBeGreaterThanOrEqual(0);
    expect(r.coverage).toBeLessThanOrEqual(1);
    expect(r.mape).toBeLessThan(20); // a seasonal model on AirPassengers is far better than 20% off
  });

  it("rollingBacktest returns one row per step with finite scores and the origins used", () => {
    const rows = rollingBacktest(AIR, options, 6, 5);
    expect(rows.map((r) => r.step)).toEqual([1, 2, 3, 4, 5, 6]);
    for (const r of rows) {
      expect(r.origins).toBe(5);
      for (const v of [r.mad, r.mape, r.mase]) expect(Number.isFinite(v) && v > 0).toBe(true);
    }
    expect(rollingBacktest(AIR, options, 3).every((r) => r.origins === 12)).toBe(true); // default: 12 origins
  });

  it("uses only the origins a short history allows, the same for every step", () => {
    const rows = rollingBacktest(AIR.slice(0, 40), options, 6, 12);
    const origins = new Set(rows.map((r) => r.origins));
    expect(origins.size).toBe(1);
    const used = rows[0].origins;
    expect(used).toBeGreaterThanOrEqual(1);
    expect(used).toBeLessThan(12);
    // the earliest origin used still leaves enough history to fit, the next earlier does not
    const earliestEnd = 40 - 6 - (used - 1);
    expect(() => fitModel(AIR.slice(0, earliestEnd), options)).not.toThrow();
    expect(thrown(() => fitModel(AIR.slice(0, earliestEnd - 1), options)).kind).toBe("na");
    expect(thrown(() => rollingBacktest(AIR.slice(0, 20), options, 6)).kind).toBe("na");
  });
});
