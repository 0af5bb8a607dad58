import { badInput } from "./errors";
import type { Seasonality, StartMethod, TrendKind } from "./types";

/** Option words as users type them (case-insensitive); a wrong one lists the accepted words. */
export const SEASONALITY_WORDS = ["multiplicative", "additive", "auto"] as const;
export const TREND_WORDS = ["linear", "damped", "none", "auto"] as const;
export const START_WORDS = ["decomposition", "classic", "optimized"] as const;

export type SeasonalityChoice = Seasonality | "auto";
export type TrendChoice = TrendKind | "auto";

function pick<T extends string>(what: string, words: readonly T[], value: unknown, fallback: T): T {
  if (value === undefined || value === null || value === "") return fallback;
  if (typeof value !== "string") {
    throw badInput("bad-option", `${what} must be one of the words ${words.join(", ")}; got ${String(value)}.`);
  }
  const w = value.trim().toLowerCase() as T;
  if (!words.includes(w)) {
    throw badInput("bad-option", `Unknown ${what} "${value}". Use one of: ${words.join(", ")}.`);
  }
  return w;
}

export const parseSeasonality = (v: unknown, fallback: SeasonalityChoice = "multiplicative"): SeasonalityChoice =>
  pick("seasonality", SEASONALITY_WORDS, v, fallback as (typeof SEASONALITY_WORDS)[number]);
export const parseTrend = (v: unknown, fallback: TrendChoice = "linear"): TrendChoice =>
  pick("trend", TREND_WORDS, v, fallback as (typeof TREND_WORDS)[number]);
export const parseStart = (v: unknown, fallback: StartMethod = "decomposition"): StartMethod =>
  pick("start", START_WORDS, v, fallback);

/** Range of a typed smoothing constant (alpha, beta, gamma, phi), ends included. */
export const CONSTANT_BOUNDS = { low: 0, high: 1 } as const;

/** A smoothing constant typed by the user: must lie in [lo, hi]. */
export function checkConstant(name: string, v: number | undefined, lo: number = CONSTANT_BOUNDS.low, hi: number = CONSTANT_BOUNDS.high): number | undefined {
  if (v === undefined || v === null) return undefined;
  if (typeof v !== "number" || !Number.isFinite(v) || v < lo || v > hi) {
    throw badInput("bad-constant", `${name} must be a number from ${lo} to ${hi}; got ${String(v)}. Leave it blank to fit it.`);
  }
  return v;
}

/** Season length: a whole number, 0 meaning "detect". */
export function checkPeriod(v: number | undefined): number {
  if (v === undefined || v === null) return 0;
  if (typeof v !== "number" || !Number.isInteger(v) || v < 0 || v > 366) {
    throw badInput("bad-period", `The season length must be a whole number from 1 to 366 (0 to detect it); got ${String(v)}.`);
  }
  return v;
}

/** The two ways coverage is written, for messages: say which form a field expects. */
export const COVERAGE_FORMS = "a fraction above 0 and below 1 (such as 0.95) or a percentage above 1 and below 100 (such as 95)";

/** The two open ranges coverage may be typed in: a fraction, or a percentage. */
export const COVERAGE_RANGES = { fraction: { low: 0, high: 1 }, percent: { low: 1, high: 100 } } as const;

/**
 * Interval coverage as typed anywhere (batch command, worksheet functions, panel, ledger):
 * a fraction such as 0.95, or a percentage such as 95 (a number above 1 and below 100 is read
 * as a percentage). Returns the fraction. 1 and 100 are refused: a 100% interval is unbounded.
 */
export function parseCoverage(v: number): number {
  if (typeof v === "number" && Number.isFinite(v)) {
    if (v > COVERAGE_RANGES.fraction.low && v < COVERAGE_RANGES.fraction.high) return v;
    if (v > COVERAGE_RANGES.percent.low && v < COVERAGE_RANGES.percent.high) return v / 100;
  }
  throw badInput("bad-coverage", `Coverage must be ${COVERAGE_FORMS}; got ${String(v)}.`);
}
