import { availableParallelism } from "os";
import { checkConstant, checkHorizon, checkPeriod, EbbError, parseCoverage, parseSeasonality, parseStart, parseTrend, type ModelOptions } from "../engine";
import { CliError } from "./cliError";
import { parseDecimal, parseDelimiter } from "./input/dialect";
import type { ReadOptions } from "./input/readSeries";

/** Plain decimal numbers only: no hex, no "Infinity", no thousands separators (numbers typed as options). */
const DECIMAL = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

export function isNumberText(s: string): boolean {
  return DECIMAL.test(s);
}

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
  force?: boolean;
  workers?: string;
  delimiter?: string;
  decimal?: string;
  labels?: string;
  [own: string]: unknown;
}

/** Shared options a command may take beyond the model options. */
export type OptionGroup = "horizon" | "coverage" | "holdout";

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
  /** Replace an existing --out file. */
  force: boolean;
  /** Worker threads; undefined means every core for a large file. */
  workers?: number;
  read: ReadOptions;
  /** A command's own options (BatchCommand.readOptions). */
  extra: Record<string, unknown>;
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
  const coverage = typedCoverage === undefined ? undefined : flag("--coverage", () => parseCoverage(typedCoverage));
  const holdout = checkHoldout(number("--holdout", raw.holdout));
  const read: ReadOptions = { delimiter: parseDelimiter(raw.delimiter), decimal: parseDecimal(raw.decimal), labels: raw.labels };
  return {
    model,
    horizon,
    coverage,
    holdout,
    format: parseFormat(raw.format),
    out: raw.out,
    progress: raw.progress === true,
    force: raw.force === true,
    workers: checkWorkers(number("--workers", raw.workers)),
    read,
    extra: {},
  };
}

/** Most worker threads accepted: a few per core is already more than helps. */
export const MAX_WORKERS = Math.max(4, availableParallelism() * 4);

function checkWorkers(v: number | undefined): number | undefined {
  if (v === undefined) return undefined;
  if (!Number.isInteger(v) || v < 1 || v > MAX_WORKERS) {
    throw new CliError(`--workers: give a whole number of worker threads from 1 to ${MAX_WORKERS} (1 runs every series on the main thread); got ${v}.`);
  }
  return v;
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
  if (!DECIMAL.test(s)) throw new CliError(`${name} expects a number; got "${text}".`);
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
