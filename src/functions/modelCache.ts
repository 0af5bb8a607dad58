/**
 * The model cache of the worksheet functions: one fit per series and model options, shared by
 * every function and formula in the runtime (EBB.FIT, STATES, FITTED, AHEAD, BAND, and the
 * ledger's formulas over the same range). A planner who types one new actual changes one
 * column; every other column is found here and not refitted.
 *
 * Keyed by the series' values (after trailing blanks are dropped) and the resolved model
 * options, never by cell address, so two formulas over the same numbers share a fit wherever
 * they are. A hit is checked value by value against the stored series, so a hash collision
 * can only cost a refit, never a wrong answer; results are the very objects an uncached fit
 * returns, so cached and uncached results are identical to the last digit. The engine is
 * deterministic, so an error (too little history, say) is cached like a fit.
 *
 * Bounded: at most MAX_ENTRIES series and about MAX_BYTES of estimated memory; the least
 * recently used entries go first.
 */
import { cleanHistory, EbbError, fitModel, type FittedModel, type ModelOptions } from "../engine";

/** Series kept at most. */
export const MAX_ENTRIES = 20000;
/** Estimated memory kept at most (fits, their histories and derived results such as intervals). */
export const MAX_BYTES = 64 * 2 ** 20;

interface Entry {
  values: Float64Array;
  outcome: FittedModel | EbbError;
  /** Results computed from the fit (an interval for a horizon and coverage, the state table). */
  derived: Map<string, unknown>;
  bytes: number;
}

/** Rough size of an entry: its numbers (the history, start details, state) plus object overhead. */
const ENTRY_OVERHEAD = 2048;
const bytesOf = (n: number): number => ENTRY_OVERHEAD + 8 * 6 * n;

class ModelCache {
  private readonly entries = new Map<string, Entry>();
  private bytes = 0;
  enabled = true;
  maxEntries = MAX_ENTRIES;
  maxBytes = MAX_BYTES;
  hits = 0;
  misses = 0;

  lookup(key: string, values: Float64Array): Entry | undefined {
    const e = this.entries.get(key);
    if (!e || !sameValues(e.values, values)) return undefined;
    // Re-inserting marks the entry as the most recently used (a Map keeps insertion order).
    this.entries.delete(key);
    this.entries.set(key, e);
    return e;
  }

  store(key: string, entry: Entry): void {
    const old = this.entries.get(key);
    if (old) this.forget(key, old);
    this.entries.set(key, entry);
    this.bytes += entry.bytes;
    for (const [k, e] of this.entries) {
      if (this.entries.size <= this.maxEntries && this.bytes <= this.maxBytes) break;
      this.forget(k, e);
    }
  }

  grow(entry: Entry, bytes: number): void {
    entry.bytes += bytes;
    this.bytes += bytes;
  }

  private forget(key: string, e: Entry): void {
    this.entries.delete(key);
    this.bytes -= e.bytes;
  }

  clear(): void {
    this.entries.clear();
    this.bytes = 0;
    this.hits = 0;
    this.misses = 0;
  }

  get size(): { entries: number; bytes: number } {
    return { entries: this.entries.size, bytes: this.bytes };
  }
}

const cache = new ModelCache();

/** Same numbers in the same places (a blank, NaN, matches a blank). */
function sameValues(a: Float64Array, b: Float64Array): boolean {
  if (a.length !== b.length) return false;
  for (let i = 0; i < a.length; i++) if (a[i] !== b[i] && !(a[i] !== a[i] && b[i] !== b[i])) return false;
  return true;
}

/** A 64-bit hash (two 32-bit FNV-1a style lanes) of the series' bit patterns. */
function hashValues(y: Float64Array): string {
  const words = new Uint32Array(y.buffer, y.byteOffset, y.length * 2);
  let h1 = 0x811c9dc5;
  let h2 = 0x01000193 ^ y.length;
  for (let i = 0; i < words.length; i++) {
    const w = words[i];
    h1 = Math.imul(h1 ^ w, 0x01000193);
    h2 = Math.imul(h2 ^ w, 0x5bd1e995) ^ (h2 >>> 13);
  }
  return `${(h1 >>> 0).toString(36)}.${(h2 >>> 0).toString(36)}.${y.length}`;
}

function optionsKey(o: ModelOptions): string {
  return [o.period, o.seasonality, o.trend, o.start, o.cycles, o.alpha, o.beta, o.gamma, o.phi].map((v) => (v === undefined ? "" : String(v))).join("|");
}

function entryFor(history: ArrayLike<number | null | undefined>, options: ModelOptions): Entry {
  const y = history instanceof Float64Array ? history : cleanHistory(history);
  const key = `${optionsKey(options)}#${hashValues(y)}`;
  const found = cache.lookup(key, y);
  if (found) {
    cache.hits++;
    return found;
  }
  cache.misses++;
  let outcome: FittedModel | EbbError;
  try {
    outcome = fitModel(y, options);
  } catch (e) {
    if (!(e instanceof EbbError)) throw e;
    outcome = e;
  }
  const entry: Entry = { values: y, outcome, derived: new Map(), bytes: bytesOf(y.length) };
  cache.store(key, entry);
  return entry;
}

/**
 * The fitted model of one series (the same object for the same values and options while it
 * is cached). Callers must not change it.
 */
export function cachedFit(history: ArrayLike<number | null | undefined>, options: ModelOptions): FittedModel {
  if (!cache.enabled) return fitModel(history, options);
  const { outcome } = entryFor(history, options);
  if (outcome instanceof EbbError) throw outcome;
  return outcome;
}

/**
 * A result computed from the fit of one series, kept with the fit: `name` says what it is
 * (including its own arguments, e.g. "band|18|0.95"), `numbers` how many numbers it holds.
 * A failure of `compute` is not kept.
 */
export function cachedDerived<T>(
  history: ArrayLike<number | null | undefined>,
  options: ModelOptions,
  name: string,
  compute: (model: FittedModel) => T,
  numbers: (result: T) => number,
): T {
  if (!cache.enabled) return compute(fitModel(history, options));
  const entry = entryFor(history, options);
  if (entry.outcome instanceof EbbError) throw entry.outcome;
  if (entry.derived.has(name)) return entry.derived.get(name) as T;
  const result = compute(entry.outcome);
  entry.derived.set(name, result);
  cache.grow(entry, 64 + 8 * numbers(result));
  return result;
}

/** Turn the cache on or off (the benchmark and the tests compare both); turning it off empties it. */
export function setModelCache(enabled: boolean): void {
  cache.enabled = enabled;
  if (!enabled) cache.clear();
}

/** Other bounds (the tests use small ones); no arguments restores the defaults. Empties the cache. */
export function setModelCacheLimits(entries = MAX_ENTRIES, bytes = MAX_BYTES): void {
  cache.maxEntries = entries;
  cache.maxBytes = bytes;
  cache.clear();
}

export function clearModelCache(): void {
  cache.clear();
}

export function modelCacheStats(): { entries: number; bytes: number; hits: number; misses: number; enabled: boolean } {
  return { ...cache.size, hits: cache.hits, misses: cache.misses, enabled: cache.enabled };
}
