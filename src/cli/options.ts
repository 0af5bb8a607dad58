import { checkConstant, checkCoverage, checkHorizon, checkPeriod, EbbError, parseSeasonality, parseStart, parseTrend, type ModelOptions } from "../engine";
import { isNumberText } from "./readCsv";
import { CliError } from "./cliError";

/** Options as commander hands them over: the text the user typed. */
export interface RawOptions {
  period?: string;
  seasonality?: string;
  trend?: string;
  start?: string;
  cycles?: string;
  alpha?: string;
  beta?: string;
  gamma?: string;
  phi?: string;
  horizon?: string;
  coverage?: string;
  holdout?: string;
  format?: string;
  out?: string;
  progress?: boolean;
}

export type OutputFormat = "json" | "csv";
export const FORMAT_WORDS: readonly OutputFormat[] = ["json", "csv"];

/** Everything a batch run needs, checked once before any series is read. */
export interface RunSettings {
  model: ModelOptions;
  horizon: number;
  coverage?: number;
  holdout: number;
  format: OutputFormat;
  out?: string;
  progress: boolean;
}

export const DEFAULT_HORIZON = 12;
export const DEFAULT_HOLDOUT = 12;
export const DEFAULT_CYCLES = 2;

/** Defaults when an option is left out; `demo` overrides some of them. */
export interface Defaults {
  seasonality?: "multiplicative" | "additive" | "auto";
  trend?: "linear" | "damped" | "none" | "auto";
  coverage?: number;
}

/** Turn the typed options into engine options, using the engine's own checks and messages. */
export function toRunSettings(raw: RawOptions, defaults: Defaults = {}): RunSettings {
  const model: ModelOptions = {
    period: flag("--period", () => checkPeriod(number("--period", raw.period))),
    seasonality: flag("--seasonality", () => parseSeasonality(raw.seasonality, defaults.seasonality ?? "multiplicative")),
    trend: flag("--trend", () => parseTrend(raw.trend, defaults.trend ?? "linear")),
    start: flag("--start", () => parseStart(raw.start, "decomposition")),
    cycles: flag("--cycles", () => checkCycles(number("--cycles", raw.cycles))),
    alpha: flag("--alpha", () => checkConstant("alpha", number("--alpha", raw.alpha))),
    beta: flag("--beta", () => checkConstant("beta", number("--beta", raw.beta))),
    gamma: flag("--gamma", () => checkConstant("gamma", number("--gamma", raw.gamma))),
    phi: flag("--phi", () => checkConstant("phi", number("--phi", raw.phi))),
  };
  const horizon = flag("--horizon", () => checkHorizon(number("--horizon", raw.horizon) ?? DEFAULT_HORIZON));
  const typedCoverage = number("--coverage", raw.coverage) ?? defaults.coverage;
  const coverage = typedCoverage === undefined ? undefined : flag("--coverage", () => checkCoverage(typedCoverage));
  const holdout = checkHoldout(number("--holdout", raw.holdout));
  return { model, horizon, coverage, holdout, format: parseFormat(raw.format), out: raw.out, progress: raw.progress === true };
}

function parseFormat(v: string | undefined): OutputFormat {
  if (v === undefined) return "json";
  const w = v.trim().toLowerCase();
  if (!(FORMAT_WORDS as readonly string[]).includes(w)) {
    throw new CliError(`--format: unknown format "${v}". Use one of: ${FORMAT_WORDS.join(", ")}.`);
  }
  return w as OutputFormat;
}

/** A number typed for an option, or undefined when the option was left out. */
function number(name: string, text: string | undefined): number | undefined {
  if (text === undefined) return undefined;
  const s = text.trim();
  if (!isNumberText(s)) throw new CliError(`${name} expects a number; got "${text}".`);
  return Number(s);
}

/** Run an engine check and put the option's name in front of its message. */
function flag<T>(name: string, check: () => T): T {
  try {
    return check();
  } catch (e) {
    if (e instanceof EbbError) throw new CliError(`${name}: ${e.message}`);
    throw e;
  }
}

function checkCycles(v: number | undefined): number | undefined {
  if (v === undefined) return undefined;
  if (!Number.isInteger(v) || v < 2 || v > 100) {
    throw new CliError(`--cycles: the start window needs a whole number of seasons from 2 to 100; got ${v}.`);
  }
  return v;
}

function checkHoldout(v: number | undefined): number {
  if (v === undefined) return DEFAULT_HOLDOUT;
  if (!Number.isInteger(v) || v < 1 || v > 1000) {
    throw new CliError(`--holdout: the number of held-out periods must be a whole number from 1 to 1000; got ${v}.`);
  }
  return v;
}
