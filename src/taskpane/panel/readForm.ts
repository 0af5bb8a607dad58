/**
 * The panel's form as ledger settings: every typed value checked, with a message that says
 * which field is wrong and what to type instead.
 */
import { COVERAGE_FORMS, parseCoverage } from "../../engine";
import type { LedgerSettings } from "../../ledger/describe/types";

export interface FormValues {
  period: string;
  seasonality: string;
  trend: string;
  start: string;
  constantsMode: "fit" | "typed";
  alpha: string;
  beta: string;
  gamma: string;
  phi: string;
  horizon: string;
  coveragePercent: string;
  destination: "new-sheet" | "area";
  sheetName: string;
  areaCell: string;
  /** Optional columns beside the history: corrections and their reasons (C, or Corrections!C). */
  correctionsColumn?: string;
  reasonsColumn?: string;
}

export interface FormSettings {
  settings: LedgerSettings;
  horizon: number;
  coverage: number;
}

export type FormResult = { ok: true; value: FormSettings } | { ok: false; message: string; field: keyof FormValues };

export const MAX_HORIZON = 120;

function wholeNumber(text: string, lo: number, hi: number): number | undefined {
  const t = text.trim();
  if (!/^\d+$/.test(t)) return undefined;
  const n = Number(t);
  return n >= lo && n <= hi ? n : undefined;
}

/** A typed constant: blank means "fit it"; otherwise a number from 0 to 1. */
function constant(text: string): number | undefined | "bad" {
  const t = text.trim();
  if (t === "") return undefined;
  const n = Number(t);
  return Number.isFinite(n) && n >= 0 && n <= 1 ? n : "bad";
}

export function readForm(v: FormValues): FormResult {
  const period = v.period.trim() === "" ? 0 : wholeNumber(v.period, 1, 366);
  if (period === undefined) {
    return { ok: false, field: "period", message: "Season length: type a whole number from 1 to 366 (12 for months in a year), or leave it blank to detect it." };
  }
  const horizon = wholeNumber(v.horizon, 1, MAX_HORIZON);
  if (horizon === undefined) return { ok: false, field: "horizon", message: `Periods ahead: type a whole number from 1 to ${MAX_HORIZON}.` };
  let coverage: number;
  try {
    if (v.coveragePercent.trim() === "") throw new Error("blank");
    // "90%" is read as 90, as a spreadsheet cell reads it.
    coverage = parseCoverage(Number(v.coveragePercent.trim().replace(/\s*%$/, "")));
  } catch {
    return { ok: false, field: "coveragePercent", message: `Interval coverage: type ${COVERAGE_FORMS}.` };
  }
  const settings: LedgerSettings = { period, seasonality: v.seasonality, trend: v.trend, start: v.start };
  if (v.constantsMode === "typed") {
    for (const key of ["alpha", "beta", "gamma", "phi"] as const) {
      const c = constant(v[key]);
      if (c === "bad") return { ok: false, field: key, message: `${key}: type a number from 0 to 1, or leave it blank to fit it.` };
      if (c !== undefined) settings[key] = c;
    }
  }
  return { ok: true, value: { settings, horizon, coverage } };
}

/** A sheet name the hosts accept, made from a series name: at most 31 characters, no : \ / ? * [ ]. */
export function sheetNameFor(series: string, taken: string[]): string {
  const base = shorten(`Ledger ${series}`.replace(/[:\\/?*[\]]/g, " ").replace(/\s+/g, " ").replace(/^'+|'+$/g, "").trim(), 28);
  const lower = new Set(taken.map((t) => t.toLowerCase()));
  if (!lower.has(base.toLowerCase())) return base;
  for (let i = 2; i < 1000; i++) {
    const candidate = `${base.slice(0, 31 - String(i).length - 1)} ${i}`;
    if (!lower.has(candidate.toLowerCase())) return candidate;
  }
  return `${base.slice(0, 20)} ${Date.now() % 100000}`;
}

/** At most `max` characters, cut at a word and without a dangling bracket or punctuation. */
function shorten(text: string, max: number): string {
  if (text.length <= max) return text;
  const cut = text.slice(0, max + 1);
  const space = cut.lastIndexOf(" ");
  const words = (space > 8 ? cut.slice(0, space) : text.slice(0, max)).trim();
  return words.replace(/[\s([{,;.-]+$/, "").trim();
}

/** "Sales!H60", "'Ledger one'!B2" or "H60" (on `activeSheet`) as a sheet and a cell. */
export function parseArea(text: string, activeSheet: string): { sheet: string; cell: string } | undefined {
  const t = text.trim();
  const m = /^(?:'((?:[^']|'')+)'|([^'!]+))!\s*(\$?[A-Za-z]{1,3}\$?\d{1,7})$/.exec(t);
  if (m) return { sheet: (m[1] ?? m[2]).replace(/''/g, "'").trim(), cell: m[3].replace(/\$/g, "").toUpperCase() };
  if (/^\$?[A-Za-z]{1,3}\$?\d{1,7}$/.test(t)) return { sheet: activeSheet, cell: t.replace(/\$/g, "").toUpperCase() };
  return undefined;
}
