/**
 * The `options` argument of functions that take their model settings as one text of plain words,
 * in any order, separated by spaces or commas: "additive damped", "auto", "multiplicative none
 * optimized". Each word is a seasonality, a trend or a start word (the engine's own lists);
 * "auto" alone asks for the automatic choice of both seasonality and trend.
 */
import { badInput, parseSeasonality, parseStart, parseTrend, SEASONALITY_WORDS, START_WORDS, TREND_WORDS, type ModelOptions } from "../engine";
import { optionalWordArg } from "./coerce";

export const OPTION_WORDS_HELP =
  'Model settings as plain words in any order: multiplicative or additive; linear, damped or none; decomposition, classic or optimized; "auto" chooses seasonality and trend. Blank: multiplicative linear, as in EBB.AHEAD.';

/** Reads the options text into model options for a given season length; blank keeps every default. */
export function optionWordsArg(v: unknown, period: number): ModelOptions {
  const typed = optionalWordArg(v, "options");
  const options: ModelOptions = { period };
  if (typed === undefined) return options;
  if (typeof typed !== "string") {
    throw badInput("bad-option", `Options must be text of plain words, such as "additive damped"; got ${String(typed)}.`);
  }
  const seen = new Set<string>();
  for (const word of typed.toLowerCase().split(/[\s,;]+/).filter(Boolean)) {
    const what = word === "auto" ? "auto" : (SEASONALITY_WORDS as readonly string[]).includes(word) ? "seasonality" : (TREND_WORDS as readonly string[]).includes(word) ? "trend" : (START_WORDS as readonly string[]).includes(word) ? "start" : undefined;
    if (what === undefined) {
      throw badInput(
        "bad-option",
        `Unknown option word "${word}". Use words from: ${[...new Set([...SEASONALITY_WORDS, ...TREND_WORDS, ...START_WORDS])].join(", ")}.`,
      );
    }
    const slots = what === "auto" ? ["seasonality", "trend"] : [what];
    for (const slot of slots) {
      if (seen.has(slot)) throw badInput("bad-option", `The options "${typed}" give the ${slot} twice. Give one word for each setting.`);
      seen.add(slot);
    }
    if (what === "auto") {
      options.seasonality = "auto";
      options.trend = "auto";
    } else if (what === "seasonality") options.seasonality = parseSeasonality(word);
    else if (what === "trend") options.trend = parseTrend(word);
    else options.start = parseStart(word);
  }
  return options;
}
