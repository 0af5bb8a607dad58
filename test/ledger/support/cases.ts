import { readFileSync } from "fs";
import { DEMO_CSV_PATH, mulberry32 } from "../../../src/preview/demo/generate-demo";
import type { LedgerCorrections, LedgerSettings } from "../../../src/ledger";

/** Test histories: the invented Larkmere demo data (monthly, 2019-2025) and small made-up series. */
export function demoColumns(): { name: string; values: (number | null)[] }[] {
  const rows = readFileSync(DEMO_CSV_PATH, "utf8").trim().split(/\r?\n/).map((l) => l.split(","));
  return rows[0].slice(1).map((name, j) => ({ name, values: rows.slice(1).map((r) => (r[j + 1] === "" ? null : Number(r[j + 1]))) }));
}

export function demoSeries(name: string): (number | null)[] {
  const c = demoColumns().find((c) => c.name.startsWith(name));
  if (!c) throw new Error(`no demo series ${name}`);
  return c.values;
}

/** An additive-friendly series that crosses zero (a margin in thousands), period 4, with one gap. */
export function quarterlyMargin(): (number | null)[] {
  const shape = [-30, 12, 45, -8];
  const out: (number | null)[] = [];
  for (let t = 0; t < 40; t++) out.push(Math.round((5 + 0.8 * t + shape[t % 4] + 6 * Math.sin(t * 1.7)) * 100) / 100);
  out[21] = null;
  return out;
}

/** A five-day weekly pattern (odd season length) for the odd moving average. */
export function workdays(): (number | null)[] {
  const shape = [1.2, 1.0, 0.9, 0.95, 1.3];
  const out: number[] = [];
  for (let t = 0; t < 45; t++) out.push(Math.round((200 + 1.5 * t) * shape[t % 5] * (1 + 0.03 * Math.cos(t * 2.3)) * 10) / 10);
  return out;
}

export interface LedgerCase {
  label: string;
  history: (number | null)[];
  settings: LedgerSettings;
  /** Planner corrections beside the history (the ledger then shows correction, reason and value used). */
  corrections?: LedgerCorrections;
}

/** Invented corrections: each [period index, figure, reason] on a history of n periods. */
export function correctionsAt(n: number, entries: [number, number, string][]): LedgerCorrections {
  const values: (number | null)[] = new Array(n).fill(null);
  const reasons: (string | null)[] = new Array(n).fill(null);
  for (const [t, v, why] of entries) {
    values[t] = v;
    reasons[t] = why;
  }
  return { values, reasons };
}

/** Both seasonalities (plus none), all trends, both starts; missing values; odd period; 3 start seasons. */
export function ledgerCases(): LedgerCase[] {
  const seed = demoSeries("Seed trays");
  const bulbs = demoSeries("Flower bulbs");
  const cases: LedgerCase[] = [];
  for (const seasonality of ["multiplicative", "additive"]) {
    for (const trend of ["linear", "damped", "none"]) {
      for (const start of ["decomposition", "classic"]) {
        cases.push({ label: `seed trays ${seasonality} ${trend} ${start}`, history: seed, settings: { period: 12, seasonality, trend, start } });
      }
    }
  }
  for (const trend of ["linear", "damped", "none"]) {
    cases.push({ label: `bulbs with gaps multiplicative ${trend}`, history: bulbs, settings: { period: 12, seasonality: "multiplicative", trend } });
    cases.push({ label: `margin additive ${trend} p=4 gap`, history: quarterlyMargin(), settings: { period: 4, seasonality: "additive", trend } });
    cases.push({ label: `no season ${trend} decomposition`, history: seed.slice(0, 30), settings: { period: 1, trend, start: "decomposition" } });
    cases.push({ label: `no season ${trend} classic`, history: seed.slice(0, 30), settings: { period: 1, trend, start: "classic" } });
  }
  // Corrections in the start window and after it, one filling a gap, one on a ledger without seasons.
  cases.push({
    label: "seed trays corrected multiplicative linear",
    history: seed,
    settings: { period: 12, seasonality: "multiplicative", trend: "linear" },
    corrections: correctionsAt(seed.length, [[2, 300, "invented promotion"], [50, 520, "invented stock-out"]]),
  });
  cases.push({
    label: "seed trays corrected additive damped classic",
    history: seed,
    settings: { period: 12, seasonality: "additive", trend: "damped", start: "classic" },
    corrections: correctionsAt(seed.length, [[15, 410, "invented one-off order"], [44, 610, ""]]),
  });
  cases.push({
    label: "margin corrected additive gap filled",
    history: quarterlyMargin(),
    settings: { period: 4, seasonality: "additive", trend: "linear" },
    corrections: correctionsAt(40, [[21, 30, "invented: figure found later"], [30, 20, "invented correction"]]),
  });
  cases.push({
    label: "no season corrected classic",
    history: seed.slice(0, 30),
    settings: { period: 1, trend: "linear", start: "classic" },
    corrections: correctionsAt(30, [[1, 200, "invented promotion"], [20, 250, "invented"]]),
  });
  cases.push({ label: "workdays odd period multiplicative classic", history: workdays(), settings: { period: 5, seasonality: "multiplicative", trend: "linear", start: "classic" } });
  cases.push({ label: "workdays odd period additive 3 seasons", history: workdays(), settings: { period: 5, seasonality: "additive", trend: "damped", cycles: 3 } });
  return cases;
}

/**
 * A long invented monthly series (n periods, seasonal with growth and noise, a few gaps after
 * the start window), for ledgers of thousands of rows. Seeded, so every run is the same.
 */
export function longSeries(n: number, seed = 7): (number | null)[] {
  const rand = mulberry32(seed);
  const out: (number | null)[] = [];
  for (let t = 0; t < n; t++) {
    const season = 1 + 0.35 * Math.sin((2 * Math.PI * t) / 12) + 0.1 * Math.cos((4 * Math.PI * t) / 12);
    out.push(Math.round((400 + 0.05 * t) * season * (0.95 + 0.1 * rand()) * 10) / 10);
  }
  for (let k = 1; k <= 3; k++) out[Math.floor((n * k) / 4)] = null;
  return out;
}

/**
 * The values a corrected case's models run on: the correction where there is one, else the
 * actual (the definition of a correction in the issue, computed here without the engine).
 */
export function usedValues(c: LedgerCase): (number | null)[] {
  if (!c.corrections) return c.history;
  const corr = Array.from(c.corrections.values);
  const n = Math.max(c.history.length, corr.length);
  return Array.from({ length: n }, (_, i) => corr[i] ?? c.history[i] ?? null);
}
