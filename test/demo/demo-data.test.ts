import { readFileSync } from "fs";
import {
  DEMO_CSV_PATH,
  DEMO_EVENTS,
  DEMO_MISSING_MONTHS,
  DEMO_NOTICE,
  DEMO_STEP,
  DEMO_STEP_PRODUCT,
  demoCsv,
  generateDemo,
  mulberry32,
} from "../../src/preview/demo/generate-demo";

/** Intended shape of each product: calendar month (1-12) with the highest mean. */
const EXPECTED_PEAK: Record<string, number> = {
  "Seed trays (units)": 4, // spring
  "Hose reels (units)": 6, // summer
  "Bird feed (sacks)": 1, // winter
  "Solar garden lights (units)": 5, // growth product, late-spring peak
  "Flower bulbs (packs)": 9, // autumn bulb season; the product with missing months
  "Rain barrels (units)": 6, // summer; the product whose demand steps up in July 2025
};
const MISSING_PRODUCT = "Flower bulbs (packs)";

function yearTotals(values: (number | null)[]): number[] {
  const totals: number[] = [];
  for (let y = 0; y < values.length / 12; y++) {
    totals.push(values.slice(y * 12, y * 12 + 12).reduce<number>((s, v) => s + (v ?? 0), 0));
  }
  return totals;
}

describe("Larkmere demo data (invented)", () => {
  const data = generateDemo();

  it("is labelled as invented", () => {
    expect(DEMO_NOTICE.startsWith("Invented demo data: Larkmere Garden Supply is a fictional company;")).toBe(true);
  });

  it("is deterministic", () => {
    expect(generateDemo()).toEqual(data);
    const a = mulberry32(7);
    const b = mulberry32(7);
    for (let i = 0; i < 5; i++) expect(a()).toBe(b());
  });

  it("covers Jan 2019 - Dec 2025 for the six intended products", () => {
    expect(data.months).toHaveLength(84);
    expect(data.months[0]).toBe("2019-01");
    expect(data.months[83]).toBe("2025-12");
    expect(new Set(data.months).size).toBe(84);
    expect(data.products.map((p) => p.name)).toEqual(Object.keys(EXPECTED_PEAK));
    for (const p of data.products) expect(p.values).toHaveLength(84);
  });

  it("committed CSV equals the generator output", () => {
    const committed = readFileSync(DEMO_CSV_PATH, "utf8");
    expect(committed).toBe(demoCsv(data));

    // And it reads back to the same numbers: header, then one row per month, blanks for missing.
    const rows = committed.trimEnd().split("\n").map((line) => line.split(","));
    expect(rows[0]).toEqual(["month", ...data.products.map((p) => p.name)]);
    expect(rows).toHaveLength(85);
    rows.slice(1).forEach((row, t) => {
      expect(row[0]).toBe(data.months[t]);
      data.products.forEach((p, j) => {
        const cell = row[j + 1];
        expect(cell === "" ? null : Number(cell)).toBe(p.values[t]);
      });
    });
  });

  it("has only positive integers or blanks", () => {
    for (const p of data.products) {
      for (const v of p.values) {
        if (v !== null) {
          expect(Number.isInteger(v)).toBe(true);
          expect(v).toBeGreaterThan(0);
        }
      }
    }
  });

  it("has exactly the intended missing months, inside the history", () => {
    expect([...DEMO_MISSING_MONTHS]).toEqual(["2023-05", "2023-06", "2023-07"]);
    for (const p of data.products) {
      const blanks = data.months.filter((_, t) => p.values[t] === null);
      expect(blanks).toEqual(p.name === MISSING_PRODUCT ? [...DEMO_MISSING_MONTHS] : []);
    }
  });

  it.each(Object.entries(EXPECTED_PEAK))("%s peaks in calendar month %d", (name, peak) => {
    const p = data.products.find((q) => q.name === name)!;
    const sum = new Array(12).fill(0);
    const n = new Array(12).fill(0);
    p.values.forEach((v, t) => {
      if (v !== null) {
        sum[t % 12] += v;
        n[t % 12] += 1;
      }
    });
    const means = sum.map((s, m) => s / n[m]);
    expect(means.indexOf(Math.max(...means)) + 1).toBe(peak);
  });

  it("solar garden lights grow strongly (~25%/year) with a seasonal swing that grows too", () => {
    const p = data.products.find((q) => q.name === "Solar garden lights (units)")!;
    const totals = yearTotals(p.values);
    const cagr = Math.pow(totals[6] / totals[0], 1 / 6) - 1;
    expect(cagr).toBeGreaterThan(0.18);
    expect(cagr).toBeLessThan(0.32);
    const range = (y: number) => {
      const year = p.values.slice(y * 12, y * 12 + 12) as number[];
      return Math.max(...year) - Math.min(...year);
    };
    expect(range(6)).toBeGreaterThan(3 * range(0));
  });
});

describe("the invented promotion and stock-out", () => {
  const data = generateDemo();
  it("are labelled invented, in one product, inside the update window, with the reason a planner types", () => {
    expect(new Set(DEMO_EVENTS.map((e) => e.product)).size).toBe(1);
    expect(DEMO_EVENTS.map((e) => e.kind).sort()).toEqual(["promotion", "stock-out"]);
    for (const e of DEMO_EVENTS) {
      expect(e.reason).toMatch(/\(invented\)$/);
      expect(data.months.indexOf(e.month)).toBeGreaterThanOrEqual(24); // after the two-season start window
    }
  });
  it("distort their month: the promoted month is that product's highest of its calendar month, the stock-out its lowest", () => {
    const hose = data.products.find((p) => p.name === DEMO_EVENTS[0].product)!;
    for (const e of DEMO_EVENTS) {
      const month = e.month.slice(5);
      const same = data.months.flatMap((m, t) => (m.endsWith(`-${month}`) ? [hose.values[t]!] : []));
      const v = hose.values[data.months.indexOf(e.month)]!;
      expect(v).toBe(e.kind === "promotion" ? Math.max(...same) : Math.min(...same));
    }
  });
});

describe("the invented step change", () => {
  const data = generateDemo();
  it("is labelled invented and lies in the last year, so the review list should see it", () => {
    expect(DEMO_STEP.story).toMatch(/\(invented\)/);
    expect(data.months.indexOf(DEMO_STEP.month)).toBeGreaterThan(data.months.length - 12);
  });
  it("raises every month from its start by about its factor against the same months a year before", () => {
    const p = data.products.find((q) => q.name === DEMO_STEP_PRODUCT)!;
    const from = data.months.indexOf(DEMO_STEP.month);
    const sum = (a: number, b: number) => (p.values.slice(a, b) as number[]).reduce((s, v) => s + v, 0);
    const ratio = sum(from, data.months.length) / sum(from - 12, data.months.length - 12);
    // The recipe's 2% growth a year and its noise move the ratio a little off the factor.
    expect(ratio).toBeGreaterThan(DEMO_STEP.factor - 0.12);
    expect(ratio).toBeLessThan(DEMO_STEP.factor + 0.12);
    // Before the step, the same comparison shows no step.
    const before = sum(from - 12, from) / sum(from - 24, from - 12);
    expect(Math.abs(before - 1)).toBeLessThan(0.12);
  });
});
