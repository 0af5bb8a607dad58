/**
 * EBB.UNUSUAL's engine side: the invented demo's injected promotion and stock-out are flagged
 * (and nothing else in that product), a clean simulated series gets no flag at the default
 * threshold (the benchmark states the rate over 1,000 seeded clean series), and the history is
 * never changed. The robust scale is the Hampel identifier's: 1.4826 x the median absolute
 * deviation (Hampel 1974; Rousseeuw & Croux 1993), checked here by a hand computation.
 */
import { cleanHistory, MAD_TO_SD, unusualPeriods, UNUSUAL_THRESHOLD } from "../../src/engine";
import { seededNormal as seededNormalForTests } from "../../src/engine/random";
import { DEMO_EVENTS, DEMO_STEP, DEMO_STEP_PRODUCT, demoMonths } from "../../src/preview/demo/generate-demo";
import { readDemo } from "../functions/support/demo";

const demo = readDemo();
const months = demoMonths();

test("the demo's promotion and stock-out are flagged, high and low, and nothing else in hose reels", () => {
  const name = DEMO_EVENTS[0].product;
  const values = demo.columns[demo.names.indexOf(name)];
  const before = [...values];
  const u = unusualPeriods(values, { period: 12, seasonality: "auto", trend: "auto" });
  const flagged = [...u.flag].flatMap((f, i) => (f ? [`${months[i]} ${f > 0 ? "high" : "low"}`] : []));
  expect(flagged).toEqual(DEMO_EVENTS.filter((e) => e.product === name).map((e) => `${e.month} ${e.kind === "promotion" ? "high" : "low"}`));
  // the suggestion is a one-step forecast near normal demand: between the distorted actual and it
  for (const e of DEMO_EVENTS) {
    const i = months.indexOf(e.month);
    const actual = values[i]!;
    const normal = actual / e.factor;
    expect(Math.abs(u.suggestion[i] - normal) / normal).toBeLessThan(0.2);
  }
  expect(values).toEqual(before); // it suggests; it never changes the history
});

test("the step product's flags are high and lie in the first months of its lasting step", () => {
  const k = demo.names.indexOf(DEMO_STEP_PRODUCT);
  const u = unusualPeriods(demo.columns[k], { period: 12, seasonality: "auto", trend: "auto" });
  const from = months.indexOf(DEMO_STEP.month);
  // A lasting step looks unusual until the model has followed it; the tracking signal then says it lasts.
  for (let i = 0; i < u.flag.length; i++) {
    if (u.flag[i] === 0) continue;
    expect(u.flag[i]).toBe(1);
    expect(i).toBeGreaterThanOrEqual(from);
    expect(i).toBeLessThan(from + 3);
  }
});

test("the other demo products carry no flag at the default threshold", () => {
  demo.names.forEach((name, k) => {
    if (DEMO_EVENTS.some((e) => e.product === name) || name === DEMO_STEP_PRODUCT) return;
    const u = unusualPeriods(demo.columns[k], { period: 12, seasonality: "auto", trend: "auto" });
    expect({ name, flags: [...u.flag].filter((f) => f !== 0).length }).toEqual({ name, flags: 0 });
  });
});

test("a clean simulated seasonal series gets no flag at the default threshold", () => {
  // seeded: level 500 on a slow random walk, a yearly sine swing of 35%, 6% normal noise
  const z = seededNormalForTests(31);
  const y: number[] = [];
  let level = 500;
  for (let t = 0; t < 96; t++) {
    level += 5 * z();
    y.push(level * (1 + 0.35 * Math.sin((2 * Math.PI * t) / 12)) * (1 + 0.06 * z()));
  }
  const u = unusualPeriods(y, { period: 12, seasonality: "auto", trend: "auto" });
  expect(u.threshold).toBe(UNUSUAL_THRESHOLD);
  expect([...u.flag].filter((f) => f !== 0)).toEqual([]);
  // the same series with one month tripled is flagged there and only there
  const spiked = [...y];
  spiked[70] *= 3;
  const s = unusualPeriods(spiked, { period: 12, seasonality: "auto", trend: "auto" });
  expect([...s.flag].flatMap((f, i) => (f ? [i] : []))).toEqual([70]);
});

test("the scale is 1.4826 x the median absolute deviation of the (relative) one-step errors", () => {
  const values = cleanHistory(demo.columns[0]);
  const u = unusualPeriods(values, { period: 12, seasonality: "multiplicative", trend: "none" });
  // recompute from the model's own forecasts, by the definition
  const errs: number[] = [];
  for (let i = 0; i < values.length; i++) {
    if (!Number.isNaN(u.forecast[i])) errs.push((values[i] - u.forecast[i]) / u.forecast[i]);
  }
  const med = (v: number[]) => {
    const s = [...v].sort((a, b) => a - b);
    return s.length % 2 ? s[(s.length - 1) / 2] : (s[s.length / 2 - 1] + s[s.length / 2]) / 2;
  };
  const centre = med(errs);
  expect(MAD_TO_SD).toBe(1.4826);
  expect(u.relative).toBe(true);
  expect(u.scale).toBeCloseTo(1.4826 * med(errs.map((e) => Math.abs(e - centre))), 12);
});

test("a threshold outside 1..20 is refused with the range to use", () => {
  expect(() => unusualPeriods(demo.columns[0], { period: 12 }, 0.5)).toThrow(/from 1 to 20/);
});
